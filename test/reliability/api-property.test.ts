/**
 * Property tests of POST /api/interpret and POST /api/report under hostile bodies:
 * fields of an invented demo system replaced by wrong types, extreme
 * numbers, NaN and Infinity spelled as strings, unicode, huge arrays and deep nests;
 * whole bodies of any shape; and raw text: truncated JSON, repeated keys, -0 and 1e999
 * tokens, empty bodies, wrong content types, bytes that are not UTF-8, bodies over the
 * size limit. Every answer keeps the documented error format (harness: never a 5xx, every 4xx a JSON
 * error body with issues naming a path) and no request changes the database. Valid
 * bodies are computed for real on 200 draws and 64 grid nodes, so they stay cheap.
 */
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoSystem, makeApi, type TestApi } from '../api/helpers.ts';
import {
  type Answer,
  DatabaseGuard,
  expectContract,
  extremeNumberTokens,
  hostileValue,
  jsonTypes,
  nonJsonTypes,
  Raw,
  RawObject,
  send,
  toJsonText,
} from './api-harness.ts';
import { allPaths, applyMutation, type Mutation, mutationOf, type PathKey } from './mutate.ts';

let api: TestApi;
let guard: DatabaseGuard;
let sent = 0;
/** Answers by status and error code, to check the properties reached both sides of validation. */
const tally = new Map<string, number>();

/** An invented demo system, made cheap: 200 draws on 64 grid nodes. */
const base = { ...demoSystem('corvina-b'), assumptions: { samples: 200, gridNodes: 64, seed: 3 } };
const baseText = JSON.stringify(base);

beforeAll(() => {
  api = makeApi();
  guard = new DatabaseGuard(api.dbPath);
});
afterAll(() => api.close());

/** Optional fields the demo does not give, so mutations reach them too. */
const extraPaths: PathKey[][] = [
  ['note'], ['$schema'], ['unknownField'], ['__proto__'], ['constructor'],
  ['star', 'unknownField'], ['star', 'metallicity'],
  ['planet', 'radiusRjup'], ['planet', 'radiusRearth'], ['planet', 'semiMajorAxisAu'], ['planet', 'massMearth'],
  ['measurements', 'phaseSemiAmplitudePpm'], ['measurements', 'nightsideFluxPpm'], ['measurements', 'daysideTemperatureK'],
  ['measurements', 'phaseOffsetDeg'], ['measurements', 'ellipsoidalAmplitudePpm'], ['measurements', 'beamingAmplitudePpm'],
  ['measurements', 'depthAmplitudeCorrelation'],
  ['assumptions', 'thermal'], ['assumptions', 'weighting'], ['assumptions', 'redistribution'], ['assumptions', 'phaseIntegral'],
  ['assumptions', 'limbDarkening'], ['assumptions', 'gravityDarkening'], ['assumptions', 'planetClass'],
  ['band', 'tophatNm'], ['band', 'response'], ['band', 'unit'],
];
const paths = [...allPaths(base), ...extraPaths];

/** Draws and grid nodes stay small when valid, so one interpretation stays near 20 ms. */
const cheapWork = fc.oneof(
  fc.integer({ min: -5, max: 400 }),
  fc.constantFrom(99, 100, 99.5, 100_001, 4097, 2 ** 31, 1e308, '200', null, true),
  extremeNumberTokens,
);

/** Values near a valid one: the original scaled, or given with a zero, tiny or huge sigma. */
function nearValid(original: unknown): fc.Arbitrary<unknown> {
  const factor = fc.constantFrom(-1, 0, 1e-9, 1e-3, 0.5, 0.999, 1.001, 2, 10, 1e3, 1e9);
  const value = typeof original === 'number' ? original : 1;
  return fc.oneof(
    factor.map((f) => value * f),
    fc.tuple(factor, fc.constantFrom(0, 1e-12, 0.01, 0.5, 10, 1e6)).map(([f, s]) => ({ value: value * f, sigma: Math.abs(value * s) })),
    fc.tuple(factor, factor).map(([a, b]) => ({ min: value * Math.min(a, b), max: value * Math.max(a, b) })),
    fc.constantFrom({ tophatNm: [400, 900] }, { tophatNm: [900, 400] }, { tophatNm: [1, 1e9] }, { response: [[400, 1], [900, 1]] }, { response: [[400, 0], [900, 0]] }, { response: [[500, 1], [500, 1]] }, 'tess', 'kepler', 'cheops', 'none', 'energy', 'giant', 'rocky'),
  );
}

function valueFor(path: PathKey[], original: unknown): fc.Arbitrary<unknown> {
  const last = path[path.length - 1];
  if (last === 'samples' || last === 'gridNodes') return cheapWork;
  return fc.oneof({ arbitrary: hostileValue, weight: 3 }, { arbitrary: nearValid(original), weight: 2 });
}

const mutations = fc.array(mutationOf(paths, base, valueFor), { minLength: 1, maxLength: 3 });

async function expectSafe(a: Answer, what: string): Promise<void> {
  sent++;
  const e = expectContract(a, what);
  const k = `${a.status}${e ? ` ${e.code}` : ''}`;
  tally.set(k, (tally.get(k) ?? 0) + 1);
  if (a.status === 200) expect(a.json, what).toBeTypeOf('object');
  guard.check(a, false, what);
  expect(api.logged, what).toEqual([]);
}

function describeMutations(ms: Mutation[]): string {
  return ms.map((m) => `${m.path.join('.')}=${m.remove ? '(removed)' : toJsonText(m.value).slice(0, 80)}`).join('; ');
}

describe('POST /api/interpret and /api/report under hostile system bodies', () => {
  it('one to three mutated fields of a demo system: 2xx or a documented 4xx, never a 5xx', async () => {
    await fc.assert(
      fc.asyncProperty(mutations, async (ms) => {
        const body = toJsonText(ms.reduce<unknown>((b, m) => applyMutation(b, m), base));
        const what = `interpret ${describeMutations(ms)}`;
        await expectSafe(await send(api.app, { method: 'POST', url: '/api/interpret', body, contentType: 'application/json' }), what);
      }),
      { numRuns: 400, seed: 20260801 },
    );
  });

  it('valid but extreme values (scaled, zero or huge sigma, odd bands) reach the computation and never make it fail', async () => {
    const near = fc.array(mutationOf(paths.filter((p) => p.length > 1), base, (p, o) => (p[p.length - 1] === 'samples' || p[p.length - 1] === 'gridNodes' ? cheapWork : nearValid(o))), { minLength: 1, maxLength: 2 });
    await fc.assert(
      fc.asyncProperty(near, async (ms) => {
        const body = toJsonText(ms.reduce<unknown>((b, m) => applyMutation(b, m), base));
        await expectSafe(await send(api.app, { method: 'POST', url: '/api/interpret', body, contentType: 'application/json' }), `interpret ${describeMutations(ms)}`);
      }),
      { numRuns: 150, seed: 20260808 },
    );
  });

  it('mutated systems to /api/report in either format', async () => {
    await fc.assert(
      fc.asyncProperty(mutations, fc.constantFrom('md', 'tex'), async (ms, format) => {
        const body = toJsonText(ms.reduce<unknown>((b, m) => applyMutation(b, m), base));
        const what = `report ${format} ${describeMutations(ms)}`;
        await expectSafe(await send(api.app, { method: 'POST', url: `/api/report?format=${format}`, body, contentType: 'application/json' }), what);
      }),
      { numRuns: 120, seed: 20260802 },
    );
  });

  it('whole bodies of any shape are refused with a documented 400 (413 when over 1 MiB)', async () => {
    const anyBody = fc.oneof(hostileValue, fc.jsonValue({ maxDepth: 5 }), fc.array(hostileValue, { maxLength: 5 }));
    await fc.assert(
      fc.asyncProperty(anyBody, fc.constantFrom('/api/interpret', '/api/report'), async (v, url) => {
        const body = toJsonText(v);
        const a = await send(api.app, { method: 'POST', url, body, contentType: 'application/json' });
        await expectSafe(a, `${url} ${body.slice(0, 100)}`);
        expect([400, 413]).toContain(a.status);
      }),
      { numRuns: 200, seed: 20260803 },
    );
  });
});

/** Objects of the demo system with their keys, for repeated-key bodies. */
const objectPaths: PathKey[][] = [[], ...allPaths(base).filter((p) => {
  const v = p.reduce<unknown>((x, k) => (x as Record<PathKey, unknown>)[k], base);
  return v !== null && typeof v === 'object' && !Array.isArray(v);
})];

function withRepeatedKey(path: PathKey[], keyIndex: number, second: unknown): { body: string; issuePath: string } {
  const rebuild = (v: unknown, rest: PathKey[]): unknown => {
    const obj = v as Record<string, unknown>;
    if (rest.length > 0) return { ...obj, [rest[0]!]: rebuild(obj[rest[0] as string], rest.slice(1)) };
    const entries = Object.entries(obj);
    const [key] = entries[keyIndex % entries.length]!;
    return new RawObject([...entries, [key, second]]);
  };
  const target = path.reduce<unknown>((x, k) => (x as Record<PathKey, unknown>)[k], base) as Record<string, unknown>;
  const key = Object.keys(target)[keyIndex % Object.keys(target).length]!;
  return { body: toJsonText(rebuild(base, path)), issuePath: [...path, key].join('.') };
}

describe('POST /api/interpret and /api/report under hostile raw text', () => {
  const urls = fc.constantFrom('/api/interpret', '/api/report', '/api/report?format=tex');

  it('truncated JSON is a 400 bad-json', async () => {
    await fc.assert(
      fc.asyncProperty(fc.integer({ min: 0, max: baseText.length - 1 }), urls, async (cut, url) => {
        const a = await send(api.app, { method: 'POST', url, body: baseText.slice(0, cut), contentType: 'application/json' });
        await expectSafe(a, `${url} cut at ${cut}`);
        expect(a.status).toBe(400);
        expect(expectContract(a, 'truncated')!.code).toBe('bad-json');
      }),
      { numRuns: 100, seed: 20260804 },
    );
  });

  it('a key given twice in any object is a 400 naming that key', async () => {
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...objectPaths), fc.nat(20), fc.oneof(fc.jsonValue({ maxDepth: 1 }), hostileValue), urls, async (path, k, second, url) => {
        const { body, issuePath } = withRepeatedKey(path, k, second);
        const a = await send(api.app, { method: 'POST', url, body, contentType: 'application/json' });
        await expectSafe(a, `${url} repeated ${issuePath}`);
        expect(a.status).toBe(400);
        const e = expectContract(a, 'repeated key')!;
        expect(e.code).toBe('bad-json');
        expect(e.issues[0]!.path).toBe(issuePath);
      }),
      { numRuns: 100, seed: 20260805 },
    );
  });

  it('a body that is not JSON with a JSON content type, or JSON with another type, is refused', async () => {
    const garbage = fc.oneof(
      fc.constantFrom('', ' ', '\n\t', '\ufeff', 'null', 'NaN', '-0', '1e999', 'undefined', '{', '}', '[', '{"name":}', "{'name':'x'}", '{name:"x"}', '{"a":1,}', '[1,]', '"unterminated', '{"a":1}{"b":2}', '\u0000'),
      fc.string({ unit: 'binary', maxLength: 60 }),
      fc.integer({ min: 65, max: 100_000 }).map((n) => '['.repeat(n) + ']'.repeat(n)),
      fc.constant('[' + '1,'.repeat(600_000) + '1]'),
    );
    const garbageCase = garbage.map((body) => ({ body, contentType: 'application/json' as string | null, wrongType: false }));
    const wrongTypeCase = nonJsonTypes.map((contentType) => ({ body: baseText, contentType, wrongType: true }));
    const jsonTypeCase = jsonTypes.map((contentType) => ({ body: baseText, contentType, wrongType: false }));
    await fc.assert(
      fc.asyncProperty(fc.oneof(garbageCase, wrongTypeCase, jsonTypeCase), urls, async (r, url) => {
        const a = await send(api.app, { method: 'POST', url, body: r.body, contentType: r.contentType });
        await expectSafe(a, `${url} ${String(r.contentType)} ${r.body.slice(0, 60)}`);
        if (r.wrongType) {
          expect(a.status).toBe(415);
          expect(expectContract(a, 'type')!.issues[0]!.path).toBe('Content-Type');
        }
        if (r.body !== baseText) expect([400, 413]).toContain(a.status);
      }),
      { numRuns: 150, seed: 20260806 },
    );
  });

  it('bytes that are not UTF-8, and raw number tokens in fields, are answered with documented errors', async () => {
    const bytes = fc.uint8Array({ minLength: 0, maxLength: 200 });
    const tokens = fc.tuple(fc.constantFrom(...paths.filter((p) => p.length > 1)), extremeNumberTokens);
    await fc.assert(
      fc.asyncProperty(fc.oneof(bytes, tokens), urls, async (v, url) => {
        const body = v instanceof Uint8Array ? v : toJsonText(applyMutation(base, { path: v[0], value: v[1] as Raw, remove: false }));
        const a = await send(api.app, { method: 'POST', url, body, contentType: 'application/json' });
        await expectSafe(a, `${url} ${v instanceof Uint8Array ? `bytes ${[...v.slice(0, 20)]}` : `${v[0].join('.')}=${v[1].text}`}`);
      }),
      { numRuns: 100, seed: 20260807 },
    );
  });

  it('sent at least 1000 generated bodies to the system routes, some valid, some refused in each way', () => {
    // derived: 400 + 150 + 120 + 200 + 100 + 100 + 150 + 100 runs above
    expect(sent).toBe(1320);
    // Both sides of validation were reached: interpretations computed, each kind of refusal seen.
    for (const k of ['200', '400 invalid-input', '400 bad-json', '413 payload-too-large', '415 unsupported-media-type']) {
      expect(tally.get(k) ?? 0, k).toBeGreaterThan(0);
    }
    expect(tally.get('200')!).toBeGreaterThan(100);
  });
});
