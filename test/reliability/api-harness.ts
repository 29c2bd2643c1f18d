/**
 * Shared pieces of the API property tests: sending a request as raw text with any
 * content type, the rules every answer must keep (never a 5xx; every 4xx a JSON
 * error body whose issues name a path), a guard that the database changes only when a
 * writing route answered 2xx, and generators of hostile JSON values and raw JSON text.
 */
import fc from 'fast-check';
import type { Hono } from 'hono';
import { expect } from 'vitest';
import { dumpDatabase } from '../catalog/helpers.ts';

/** A token written verbatim into JSON text: -0, 1e999, NaN, a deep nest, ... */
export class Raw {
  constructor(readonly text: string) {}
}

/** An object written with its entries as given, so a key may appear twice. */
export class RawObject {
  constructor(readonly entries: Array<[string, unknown]>) {}
}

/** JSON text of a value that may hold Raw tokens and RawObjects (JSON.stringify otherwise). */
export function toJsonText(v: unknown): string {
  if (v instanceof Raw) return v.text;
  if (v instanceof RawObject) return `{${v.entries.map(([k, x]) => `${JSON.stringify(k)}:${toJsonText(x)}`).join(',')}}`;
  if (Array.isArray(v)) return `[${v.map((x) => (x === undefined ? 'null' : toJsonText(x))).join(',')}]`;
  if (v !== null && typeof v === 'object') {
    return `{${Object.entries(v).filter(([, x]) => x !== undefined).map(([k, x]) => `${JSON.stringify(k)}:${toJsonText(x)}`).join(',')}}`;
  }
  return JSON.stringify(v) ?? 'null';
}

export interface Sent {
  method: string;
  url: string;
  /** Body text (or bytes); none for GET and DELETE unless given. */
  body?: string | Uint8Array;
  /** Content-Type header; null sends none (a byte body gets no default type). */
  contentType?: string | null;
}

export interface Answer {
  status: number;
  type: string;
  text: string;
  json: unknown;
}

/** Sends one request in-process; the URL is made absolute so "//x" stays a path. */
export async function send(app: Hono, r: Sent): Promise<Answer> {
  const headers: Record<string, string> = {};
  // Bytes get no default Content-Type from fetch's Request (a string would get text/plain).
  const toBytes = (b: string | Uint8Array): Uint8Array<ArrayBuffer> => new Uint8Array(typeof b === 'string' ? new TextEncoder().encode(b) : b);
  let body: string | Uint8Array<ArrayBuffer> | undefined = typeof r.body === 'string' ? r.body : r.body && toBytes(r.body);
  if (r.contentType !== undefined && r.contentType !== null) headers['content-type'] = r.contentType;
  else if (body !== undefined && r.contentType === null) body = toBytes(body);
  const url = r.url.startsWith('http') ? r.url : `http://127.0.0.1${r.url}`;
  const res = await app.request(url, { method: r.method, headers, ...(body !== undefined ? { body } : {}) });
  const text = await res.text();
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    json = undefined;
  }
  return { status: res.status, type: res.headers.get('content-type') ?? '', text, json };
}

export interface ErrorShape {
  code: string;
  message: string;
  issues: Array<{ path: string; message: string }>;
}

/** Never a 5xx; a 4xx carries the documented error body with at least one issue, each naming a path. */
export function expectContract(a: Answer, what: string): ErrorShape | undefined {
  expect(a.status, `${what}: ${a.text.slice(0, 300)}`).toBeLessThan(500);
  expect(a.status, what).toBeGreaterThanOrEqual(200);
  if (a.status < 400) return undefined;
  expect(a.type, what).toMatch(/^application\/json/);
  const body = a.json as { error?: ErrorShape } | undefined;
  const e = body?.error;
  expect(e, `${what}: ${a.text.slice(0, 300)}`).toBeDefined();
  expect(Object.keys(body!)).toEqual(['error']);
  expect(typeof e!.code).toBe('string');
  expect(e!.code.length).toBeGreaterThan(0);
  expect(typeof e!.message).toBe('string');
  expect(e!.message.length).toBeGreaterThan(0);
  expect(Array.isArray(e!.issues), what).toBe(true);
  expect(e!.issues.length, `${what}: ${a.text.slice(0, 300)}`).toBeGreaterThan(0);
  for (const i of e!.issues) {
    expect(typeof i.path, what).toBe('string');
    expect(i.path.length, `${what}: ${a.text.slice(0, 300)}`).toBeGreaterThan(0);
    expect(typeof i.message, what).toBe('string');
    expect(i.message.length, what).toBeGreaterThan(0);
  }
  // Answers are bounded whatever the request held (http-errors.ts cuts long texts).
  expect(a.text.length, what).toBeLessThan(200_000);
  return e;
}

/**
 * Every row of every table of the database file, compared before and after each
 * request: a refused request (or any request to a route that only reads) must leave it
 * as it was; a 2xx from a writing route moves the baseline.
 */
export class DatabaseGuard {
  private baseline: string;

  constructor(private readonly dbPath: string) {
    this.baseline = this.now();
  }

  private now(): string {
    return JSON.stringify(dumpDatabase(this.dbPath));
  }

  /** Call after each request; `writes` says whether a 2xx of this route may change rows. */
  check(a: Answer, writes: boolean, what: string): void {
    const now = this.now();
    if (writes && a.status >= 200 && a.status < 300) {
      this.baseline = now;
      return;
    }
    if (now !== this.baseline) {
      let i = 0;
      while (i < now.length && now[i] === this.baseline[i]) i++;
      throw new Error(`${what} answered ${a.status} but changed the database near: ${this.baseline.slice(Math.max(0, i - 80), i + 80)} -> ${now.slice(Math.max(0, i - 80), i + 80)}`);
    }
  }
}

function nest(n: number, open: string, close: string, inner: string): Raw {
  return new Raw(open.repeat(n) + inner + close.repeat(n));
}

/** Numbers JSON can carry but code may mishandle, written as raw tokens. */
export const extremeNumberTokens = fc.constantFrom(
  '-0', '0.0', '-0.0e0', '1e308', '-1e308', '1.7976931348623157e308', '1e999', '-1e999', '5e-324', '1e-400',
  '123456789012345678901234567890', '0.1e1', '9007199254740993', '2147483648', '-2147483649', '4096.0000000001',
).map((t) => new Raw(t));

/** Strings of every kind: NaN spelled out, numbers as text, unicode, control characters, long. */
export const hostileStrings = fc.oneof(
  fc.constantFrom('NaN', 'Infinity', '-Infinity', '1e308', '-0', '0x10', '', ' ', '\u0000', '\ud800', '\udfff\ud800', '\u202e', 'e\u0301', '🪐', '../../etc/passwd', '/etc/passwd', 'C:\\Windows\\win.ini', '<script>alert(1)</script>', "'; DROP TABLE entries; --", '${process.env}', '__proto__', 'constructor', 'tess', 'kepler', 'self-consistent'),
  fc.string({ unit: 'binary', maxLength: 30 }),
  fc.string({ unit: 'grapheme', maxLength: 20 }),
  fc.integer({ min: 1000, max: 300_000 }).map((n) => 'x'.repeat(n)),
);

/** A JSON value of any hostile kind: wrong type, extreme number, deep nest, huge array. */
export const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  { arbitrary: fc.constantFrom(null, true, false, 0, -1, 1, 0.5, 1e308, -1e308, 5e-324, 2 ** 53, [], {}, [null], [[]], { value: null }), weight: 3 },
  { arbitrary: extremeNumberTokens, weight: 3 },
  { arbitrary: hostileStrings, weight: 3 },
  { arbitrary: fc.double(), weight: 2 },
  { arbitrary: fc.integer(), weight: 2 },
  { arbitrary: fc.array(fc.oneof(fc.double({ noNaN: true }), fc.string({ maxLength: 4 })), { maxLength: 40 }), weight: 1 },
  { arbitrary: fc.integer({ min: 1000, max: 60_000 }).map((n) => new Array(n).fill(1)), weight: 1 },
  { arbitrary: fc.integer({ min: 2, max: 300 }).map((n) => nest(n, '[', ']', '1')), weight: 1 },
  { arbitrary: fc.integer({ min: 2, max: 300 }).map((n) => nest(n, '{"a":', '}', '1')), weight: 1 },
  { arbitrary: fc.constant(nest(100_000, '[', ']', '')), weight: 1 },
  { arbitrary: fc.dictionary(fc.string({ maxLength: 10 }), fc.oneof(fc.double(), fc.string({ maxLength: 6 }), fc.constant(null)), { maxKeys: 6 }), weight: 2 },
  { arbitrary: fc.record({ value: fc.oneof(fc.double(), extremeNumberTokens, fc.string({ maxLength: 5 })), sigma: fc.oneof(fc.double(), extremeNumberTokens) }), weight: 3 },
  { arbitrary: fc.record({ value: fc.double(), plus: fc.double(), minus: fc.double() }, { requiredKeys: [] }), weight: 1 },
  { arbitrary: fc.record({ min: fc.double(), max: fc.double(), unit: fc.constantFrom('au', 'K', 'kg', 'ppm', 'furlong', 'Rjup', 'Rsun', 'degC', '') }), weight: 2 },
  { arbitrary: fc.record({ upperLimit: fc.double(), confidence: fc.double() }), weight: 1 },
  { arbitrary: fc.record({ samples: fc.array(fc.oneof(fc.double(), fc.constant(null)), { maxLength: 300 }) }), weight: 1 },
  { arbitrary: fc.record({ samplesFile: fc.constantFrom('/etc/passwd', '../../secret.csv', 'samples.csv'), column: fc.string({ maxLength: 5 }) }), weight: 1 },
  { arbitrary: fc.record({ responseFile: fc.constantFrom('/etc/passwd', '../x.csv', 'C:\\x.csv') }), weight: 1 },
  { arbitrary: fc.tuple(fc.string({ maxLength: 6 }), fc.jsonValue({ maxDepth: 2 }), fc.jsonValue({ maxDepth: 2 })).map(([k, a, b]) => new RawObject([[k, a], [k, b]])), weight: 1 },
);

/** Content types a JSON route must refuse with 415 (null: no Content-Type header at all). */
export const nonJsonTypes = fc.constantFrom<string | null>(
  null, 'text/plain', 'text/plain;charset=UTF-8', 'text/json', 'text/html', 'application/x-www-form-urlencoded',
  'multipart/form-data; boundary=xyz', 'application/xml', 'application/jsonp', 'application/json-seq', 'application/octet-stream',
  'json', 'application', '*/*', 'application/ json', 'application/json5', 'image/svg+xml',
);

/** Content types that are JSON: the body is read. */
export const jsonTypes = fc.constantFrom('application/json', 'application/json; charset=utf-8', 'APPLICATION/JSON', 'application/merge-patch+json', 'application/problem+json');
