/**
 * Property tests of the catalog routes under hostile input: POST of mutated
 * entries (with hostile source records), PATCH of a user entry made for the test and of
 * curated entries, DELETE with odd ids, and every GET route with odd query strings and
 * path segments. Every answer keeps the documented error format (harness), and the database (every
 * row of every table) changes only when a writing route answered 2xx; a curated row is
 * never changed and an added row is always a user row.
 */
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeApi, type TestApi } from '../api/helpers.ts';
import { userEntry } from '../catalog/helpers.ts';
import {
  type Answer,
  DatabaseGuard,
  expectContract,
  hostileStrings,
  hostileValue,
  jsonTypes,
  nonJsonTypes,
  RawObject,
  send,
  toJsonText,
} from './api-harness.ts';
import { allPaths, applyMutation, mutationOf, type PathKey } from './mutate.ts';

let api: TestApi;
let guard: DatabaseGuard;
let curatedIds: string[];
let sent = 0;
const tally = new Map<string, number>();
const TARGET = 'reliability-target-basalt';

beforeAll(() => {
  api = makeApi();
  api.catalog.addUserEntry(userEntry(TARGET));
  curatedIds = api.catalog.listEntries({ origin: 'curated' }).map((e) => e.id);
  guard = new DatabaseGuard(api.dbPath);
});
afterAll(() => api.close());

function check(a: Answer, writes: boolean, what: string): ReturnType<typeof expectContract> {
  sent++;
  const e = expectContract(a, what);
  const k = `${a.status}${e ? ` ${e.code}` : ''}`;
  tally.set(k, (tally.get(k) ?? 0) + 1);
  guard.check(a, writes, what);
  expect(api.logged, what).toEqual([]);
  return e;
}

/** A full source record of our own (invented), for entries that bring their record. */
const record = { key: 'Reliability2026', type: 'misc', authors: 'Tester, Invented', year: 2026, title: 'An invented record for hostile-input tests' };
const baseEntry = { ...userEntry('reliability-new'), spectrum: [{ wavelengthNm: 500, value: 0.12 }], sources: ['Essack2020', record] };
const entryPaths: PathKey[][] = [
  ...allPaths(baseEntry),
  ['condensate'], ['origin'], ['unknownField'], ['__proto__'], ['sources', 1, 'doi'], ['sources', 1, 'url'], ['sources', 1, 'origin'],
  ['sources', 1, 'arxiv'], ['sources', 1, 'volume'], ['spectrum', 1],
];

const nearEntryValue = (original: unknown): fc.Arbitrary<unknown> =>
  typeof original === 'number'
    ? fc.constantFrom(-1, 0, -0, 1e-300, 0.5, 1, 1.0000001, 2, 1e308).map((f) => original * f)
    : fc.constantFrom('ice', 'rock', 'surface', 'geometric', 'bond', 'curated', 'user', 'checked', 'memory', 'x', null, 'Essack2020', 'NoSuchKey2020', 'a'.repeat(81), 'fresh-snow');

const entryMutation = mutationOf(entryPaths, baseEntry, (_p, o) => fc.oneof({ arbitrary: hostileValue, weight: 2 }, { arbitrary: nearEntryValue(o), weight: 2 }));

let serial = 0;

describe('POST /api/catalog/entries under hostile bodies', () => {
  it('mutated entries: 201 with a user row, or a documented 4xx and no change', async () => {
    await fc.assert(
      fc.asyncProperty(fc.array(entryMutation, { minLength: 1, maxLength: 3 }), async (ms) => {
        const start = { ...baseEntry, id: `reliability-new-${serial++}` };
        const body = toJsonText(ms.reduce<unknown>((b, m) => applyMutation(b, m), start));
        const what = `POST ${body.slice(0, 200)}`;
        const a = await send(api.app, { method: 'POST', url: '/api/catalog/entries', body, contentType: 'application/json' });
        check(a, true, what);
        if (a.status === 201) {
          const id = (a.json as { id: string }).id;
          expect(api.catalog.getEntry(id).origin, what).toBe('user');
          expect(api.catalog.listEntries({ origin: 'curated' }).map((e) => e.id)).toEqual(curatedIds);
        }
      }),
      { numRuns: 250, seed: 20260811 },
    );
  });

  it('raw text: truncated, repeated keys, wrong content types', async () => {
    const text = JSON.stringify(baseEntry);
    const truncated = fc.integer({ min: 0, max: text.length - 1 }).map((n) => ({ body: text.slice(0, n), contentType: 'application/json' as string | null }));
    const repeated = fc.constantFrom(...Object.keys(baseEntry)).map((k) => ({ body: toJsonText(new RawObject([...Object.entries(baseEntry), [k, 'again']])), contentType: 'application/json' as string | null }));
    const wrongType = nonJsonTypes.map((contentType) => ({ body: JSON.stringify({ ...baseEntry, id: 'reliability-wrong-type' }), contentType }));
    await fc.assert(
      fc.asyncProperty(fc.oneof(truncated, repeated, wrongType), async (r) => {
        const a = await send(api.app, { method: 'POST', url: '/api/catalog/entries', ...r });
        check(a, true, `POST ${String(r.contentType)} ${r.body.slice(0, 100)}`);
        expect([400, 415]).toContain(a.status);
      }),
      { numRuns: 100, seed: 20260812 },
    );
  });
});

const patchFields = ['name', 'category', 'quantity', 'bandMinNm', 'bandMaxNm', 'valueMin', 'valueNominal', 'valueMax', 'temperatureMinK', 'temperatureMaxK', 'condensate', 'description', 'provenance', 'spectrum', 'sources', 'id', 'origin', 'unknown'];
const patchBody = fc.oneof(
  { arbitrary: fc.dictionary(fc.constantFrom(...patchFields), fc.oneof(hostileValue, nearEntryValue(0.15)), { maxKeys: 4 }).map(toJsonText), weight: 6 },
  { arbitrary: fc.constantFrom('{"valueMax": 0.3}', '{"description": "changed by a property test"}', '{}', '[]', 'null', '{"sources": []}', '{"valueNominal": 0.5}').map((t) => t), weight: 2 },
  { arbitrary: fc.jsonValue({ maxDepth: 3 }).map((v) => JSON.stringify(v)), weight: 1 },
  { arbitrary: fc.constantFrom('', '{', '{"valueMax": 0.3, "valueMax": 0.4}', '{"valueMax": -0}', '{"valueMax": 1e999}', '{"valueMax": NaN}'), weight: 1 },
);
const patchType = fc.oneof(
  { arbitrary: jsonTypes.map((type) => ({ type: type as string | null, json: true })), weight: 5 },
  { arbitrary: nonJsonTypes.map((type) => ({ type, json: false })), weight: 1 },
);

describe('PATCH /api/catalog/entries/:id under hostile bodies', () => {
  it('on a user entry: 200 keeping it a user row with its id, or a documented 4xx and no change', async () => {
    await fc.assert(
      fc.asyncProperty(patchBody, patchType, async (body, t) => {
        const a = await send(api.app, { method: 'PATCH', url: `/api/catalog/entries/${TARGET}`, body, contentType: t.type });
        check(a, true, `PATCH ${String(t.type)} ${body.slice(0, 200)}`);
        if (!t.json) expect(a.status).toBe(415);
        if (a.status === 200) {
          expect((a.json as { id: string; origin: string })).toMatchObject({ id: TARGET, origin: 'user' });
        }
      }),
      { numRuns: 200, seed: 20260813 },
    );
  });

  it('on a curated entry: never a 2xx; a valid patch is a 403 curated-row', async () => {
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...curatedIds.slice(0, 40)), patchBody, patchType, async (id, body, t) => {
        const a = await send(api.app, { method: 'PATCH', url: `/api/catalog/entries/${id}`, body, contentType: t.type });
        const e = check(a, false, `PATCH curated ${id} ${body.slice(0, 200)}`);
        expect(a.status).toBeGreaterThanOrEqual(400);
        if (!t.json) expect(a.status).toBe(415);
        else if (body === '{"description": "changed by a property test"}') expect(e!.code).toBe('curated-row');
      }),
      { numRuns: 100, seed: 20260814 },
    );
  });
});

/** Percent-encoding of the UTF-8 bytes (a lone surrogate becomes U+FFFD, where encodeURIComponent throws). */
function pct(s: string): string {
  return [...Buffer.from(s, 'utf8')].map((b) => (/[A-Za-z0-9_.~-]/.test(String.fromCharCode(b)) ? String.fromCharCode(b) : `%${b.toString(16).toUpperCase().padStart(2, '0')}`)).join('');
}

/** Path segments of every odd kind, encoded or raw. */
const oddSegment = fc.oneof(
  hostileStrings.map((s) => pct(s.slice(0, 5000))),
  fc.constantFrom('%', '%zz', '%00', '%E0%A4%A', '%ff', '..', '.', '%2e%2e', '..%2f..%2fetc%2fpasswd', '%2F', 'a%2Fb', '%20', '+', '~', "'", '"', '%22', ';', ',', '(', '*', '$', '!', '@'),
  fc.string({ unit: 'grapheme-ascii', maxLength: 30 }).map((s) => s.replace(/[/?#\\]/g, '')),
  fc.integer({ min: 100, max: 20_000 }).map((n) => 'a'.repeat(n)),
);

describe('DELETE /api/catalog/entries/:id with odd ids', () => {
  it('curated ids answer 403, unknown ids 404, and nothing changes', async () => {
    await fc.assert(
      fc.asyncProperty(fc.oneof(oddSegment, fc.constantFrom(...curatedIds.map(encodeURIComponent))), async (seg) => {
        const a = await send(api.app, { method: 'DELETE', url: `/api/catalog/entries/${seg}` });
        const e = check(a, true, `DELETE ${seg.slice(0, 100)}`);
        if (curatedIds.includes(seg)) expect(e?.code).toBe('curated-row');
        else expect([403, 404]).toContain(a.status);
      }),
      { numRuns: 150, seed: 20260815 },
    );
    expect(api.catalog.getEntry(TARGET).origin).toBe('user');
  });
});

const queryName = fc.oneof(fc.constantFrom('category', 'origin', 'search', 'keys', 'format', 'x', '', '__proto__', 'constructor', 'category[]', 'toString'), fc.string({ maxLength: 8 }));
const queryValue = fc.oneof(fc.constantFrom('ice', 'rock', 'user', 'curated', 'Essack2020', 'md', '', '%', '%zz', '%00', '%', 'a,b,,c', '%E0%A4%A', "' OR 1=1 --"), hostileStrings.map((s) => s.slice(0, 300)));
const queryString = fc.array(fc.tuple(queryName, queryValue, fc.boolean()), { maxLength: 4 }).map((ps) =>
  ps.map(([n, v, encode]) => (encode ? `${pct(n)}=${pct(v)}` : `${n}=${v}`.replace(/[#\s]/g, ''))).join('&'),
);
const getUrl = fc.oneof(
  fc.tuple(fc.constantFrom('/api/health', '/api/bands', '/api/catalog/entries', '/api/catalog/sources', '/api/catalog/bibtex', '/api/openapi.json', '/api/demos', '/'), queryString).map(([p, q]) => `${p}?${q}`),
  fc.tuple(fc.constantFrom('/api/catalog/entries/', '/api/demos/', '/assets/', '/vendor/', '/api/', '/', '/api/catalog/'), oddSegment).map(([p, s]) => `${p}${s}`),
  fc.constantFrom(...['/api/catalog/entries/', '/api/catalog/entries//x', '/api//health', '/api/health/', '//api/health', '/api/demos/../catalog/entries', '/api/catalog/bibtex?keys=' + 'a,'.repeat(9_999), '/api/catalog/entries?search=' + 'x'.repeat(201)]),
);

describe('GET routes with odd query strings and path segments', () => {
  it('answer 2xx or a documented 4xx and change nothing', async () => {
    await fc.assert(
      fc.asyncProperty(getUrl, fc.constantFrom('GET', 'HEAD'), async (url, method) => {
        const a = await send(api.app, { method, url });
        if (method === 'HEAD') {
          sent++;
          expect(a.status, url).toBeLessThan(500);
          guard.check(a, false, url);
          return;
        }
        check(a, false, `GET ${url.slice(0, 200)}`);
      }),
      { numRuns: 300, seed: 20260816 },
    );
  });

  it('a parameter named like an object property (__proto__, constructor) is reported, not ignored', async () => {
    for (const name of ['__proto__', 'constructor', 'toString', 'hasOwnProperty']) {
      for (const url of [`/api/catalog/entries?${name}=x`, `/api/catalog/bibtex?${name}=x`]) {
        const a = await send(api.app, { method: 'GET', url });
        const e = check(a, false, url);
        expect(a.status, url).toBe(400);
        expect(e!.issues[0]!.message).toContain(name);
      }
      const a = await send(api.app, { method: 'POST', url: `/api/report?${name}=x`, body: '{}', contentType: 'application/json' });
      expect(check(a, false, name)!.issues[0]!.path).toBe('query');
    }
  });

  it('sent at least 1000 generated requests to the catalog and GET routes, some accepted, some refused in each way', () => {
    // derived: 250 + 100 + 200 + 100 + 150 + 300 runs above, and 4 x 3 fixed requests
    expect(sent).toBe(1112);
    for (const k of ['200', '201', '400 invalid-input', '400 bad-json', '403 curated-row', '404 not-found', '415 unsupported-media-type']) {
      expect(tally.get(k) ?? 0, k).toBeGreaterThan(0);
    }
  });
});
