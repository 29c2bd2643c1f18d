/**
 * What the API answers to bad requests: 400 with issues naming the field, 413 over
 * 1 MiB, 415 for a body that is not JSON, 404 with the same error shape for unknown
 * routes, 403 for a foreign Host when host checking is on, and for anything unexpected
 * a generic 500 with no internals (logged, not sent).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../src/api/app.ts';
import { checkJsonText, MAX_JSON_DEPTH } from '../../src/api/json-text.ts';
import { inlineInterpreter } from '../../src/api/interpreter.ts';
import { MAX_BODY_BYTES, MAX_WORK } from '../../src/api/limits.ts';
import { errorBodySchema } from '../../src/api/schemas/common.ts';
import { errorOf, makeApi, postJson, quickSystem, type TestApi } from './helpers.ts';

let api: TestApi;
beforeAll(() => {
  api = makeApi();
});
afterAll(() => api.close());

async function expectError(res: Response, status: number, code: string) {
  expect(res.status).toBe(status);
  const body = await res.json();
  expect(errorBodySchema.safeParse(body).success).toBe(true);
  expect(body.error.code).toBe(code);
  expect(JSON.stringify(body)).not.toMatch(/\bat .*\.ts:\d+|node_modules|SQLITE|stack/i);
  return body.error as { code: string; message: string; issues: Array<{ path: string; message: string; allowed?: string }> };
}

describe('400: bad system files name the field', () => {
  it.each([
    ['a radius ratio above 1', (s: any) => { s.planet.radiusRatio = { value: 1.3, sigma: 0.01 }; }, 'planet.radiusRatio.value', /\(0, 1\)/],
    ['a negative sigma', (s: any) => { s.star.teffK = { value: 5400, sigma: -5 }; }, 'star.teffK.sigma', /> 0/],
    ['NaN written as a string', (s: any) => { s.planet.scaledSemiMajorAxis = 'NaN'; }, 'planet.scaledSemiMajorAxis', /got "NaN"/],
    ['an unknown band', (s: any) => { s.band = 'johnson-z'; }, 'band', /kepler/],
    ['a missing star', (s: any) => { delete s.star; }, 'star', /missing/],
    ['an unknown field', (s: any) => { s.planet.radiusRatioo = 0.1; }, 'planet', /radiusRatioo/],
  ])('%s', async (_what, change, path, message) => {
    const system = quickSystem();
    change(system);
    const err = await expectError(await postJson(api.app, '/api/interpret', system), 400, 'invalid-input');
    const issue = err.issues.find((i) => i.path === path);
    expect(issue, JSON.stringify(err.issues)).toBeDefined();
    expect(issue!.message).toMatch(message);
  });

  it('refuses file references with a 400 naming the field: the API reads no paths', async () => {
    const a = quickSystem();
    a.band = { responseFile: '/etc/passwd' };
    const errA = await expectError(await postJson(api.app, '/api/interpret', a), 400, 'invalid-input');
    expect(errA.issues.map((i) => i.path)).toContain('band.responseFile');
    const b = quickSystem();
    b.measurements.eclipseDepthPpm = { samplesFile: '../../package.json', column: 0 };
    const errB = await expectError(await postJson(api.app, '/api/report', b), 400, 'invalid-input');
    expect(errB.issues.map((i) => i.path)).toContain('measurements.eclipseDepthPpm.samplesFile');
  });

  it('refuses more work than the API limit, naming samples and gridNodes', async () => {
    const s = quickSystem();
    s.assumptions = { samples: 100_000, gridNodes: 4096 };
    const err = await expectError(await postJson(api.app, '/api/interpret', s), 400, 'out-of-range');
    expect(err.issues.map((i) => i.path)).toEqual(['assumptions.samples', 'assumptions.gridNodes']);
    expect(err.issues[0]!.allowed).toBe(`samples x gridNodes <= ${MAX_WORK}`);
  });

  it('refuses text that is not JSON, an empty body and repeated keys', async () => {
    const bad = await expectError(await postJson(api.app, '/api/interpret', '{"name": '), 400, 'bad-json');
    expect(bad.issues[0]!.path).toBe('body');
    await expectError(await postJson(api.app, '/api/interpret', '   '), 400, 'bad-json');
    const dup = await expectError(await postJson(api.app, '/api/interpret', '{"planet": {"radiusRatio": 0.1, "radiusRatio": 0.2}}'), 400, 'bad-json');
    expect(dup.issues[0]!.path).toBe('planet.radiusRatio');
  });

  it('never echoes a long value back in full', async () => {
    const s = quickSystem();
    s.band = 'x'.repeat(500_000);
    const res = await postJson(api.app, '/api/interpret', s);
    expect(res.status).toBe(400);
    const text = await res.text();
    expect(text.length).toBeLessThan(5000);
    expect(JSON.parse(text).error.issues[0].path).toBe('band');
  });

  it('refuses bad query strings: unknown, repeated, malformed escapes', async () => {
    const unknown = await expectError(await api.app.request('/api/catalog/entries?colour=blue'), 400, 'invalid-input');
    expect(unknown.issues[0]!.message).toMatch(/colour/);
    const repeated = await expectError(await api.app.request('/api/catalog/entries?category=ice&category=rock'), 400, 'invalid-input');
    expect(repeated.issues[0]!.path).toBe('query.category');
    await expectError(await api.app.request('/api/catalog/entries?search=%E0%A4%A'), 400, 'invalid-input');
    const cat = await expectError(await api.app.request('/api/catalog/entries?category=plasma'), 400, 'invalid-input');
    expect(cat.issues[0]!.path).toBe('query.category');
  });
});

describe('413, 415, 404', () => {
  it('answers 413 for a body over 1 MiB, with or without Content-Length', async () => {
    const big = `{"name": "${'x'.repeat(MAX_BODY_BYTES)}"}`;
    await expectError(await postJson(api.app, '/api/interpret', big), 413, 'payload-too-large');
    const chunk = new TextEncoder().encode('x'.repeat(256 * 1024));
    let sent = 0;
    const stream = new ReadableStream<Uint8Array>({
      pull(controller) {
        if (sent++ < 6) controller.enqueue(chunk);
        else controller.close();
      },
    });
    const res = await api.app.request('/api/catalog/entries', { method: 'POST', body: stream, headers: { 'content-type': 'application/json', 'transfer-encoding': 'chunked' }, duplex: 'half' } as RequestInit);
    await expectError(res, 413, 'payload-too-large');
  });

  it('answers 415 for a body that is not sent as JSON', async () => {
    const text = await expectError(await api.app.request('/api/interpret', { method: 'POST', body: '{}', headers: { 'content-type': 'text/plain' } }), 415, 'unsupported-media-type');
    expect(text.issues[0]!.path).toBe('Content-Type');
    const form = await api.app.request('/api/catalog/entries', { method: 'POST', body: 'a=1', headers: { 'content-type': 'application/x-www-form-urlencoded' } });
    await expectError(form, 415, 'unsupported-media-type');
  });

  it('answers 404 with the error shape for unknown routes and methods', async () => {
    const a = await expectError(await api.app.request('/api/nothing-here'), 404, 'unknown-route');
    expect(a.message).toContain('GET /api/nothing-here');
    await expectError(await api.app.request('/api/interpret'), 404, 'unknown-route');
    await expectError(await api.app.request('/assets/..%2F..%2Fpackage.json'), 404, 'unknown-route');
    await expectError(await api.app.request('/vendor/vega.js'), 404, 'unknown-route');
  });
});

describe('unexpected failures and hosts', () => {
  it('answers a generic 500 without internals and logs the stack', async () => {
    const logged: string[] = [];
    const broken = inlineInterpreter();
    broken.run = async () => {
      throw new Error('SQLITE_CORRUPT: secret detail at /home/someone/db.sqlite');
    };
    const app = createApp({ catalog: api.catalog, interpreter: broken, log: (l) => logged.push(l) });
    const res = await postJson(app, '/api/interpret', quickSystem());
    expect(res.status).toBe(500);
    const text = await res.text();
    expect(text).not.toMatch(/SQLITE|secret|someone|Error:/);
    expect(JSON.parse(text).error.code).toBe('internal');
    expect(logged.join('\n')).toMatch(/500 POST \/api\/interpret: Error: SQLITE_CORRUPT/);
  });

  it('refuses a foreign Host header when host checking is on (loopback serving)', async () => {
    const app = createApp({ catalog: api.catalog, allowedHosts: ['127.0.0.1:4173', 'localhost:4173'], log: () => undefined });
    const ok = await app.request('http://127.0.0.1:4173/api/health');
    expect(ok.status).toBe(200);
    const evil = await app.request('http://attacker.example/api/health');
    const err = await expectError(evil, 403, 'bad-host');
    const rebound = await app.request('http://127.0.0.1:4173/api/health', { headers: { host: 'rebound.example:4173' } });
    await expectError(rebound, 403, 'bad-host');
    expect(err.issues[0]!.path).toBe('Host');
  });

  it('sends no stack traces anywhere in the logs of this file', () => {
    expect(api.logged).toEqual([]);
  });
});

describe('JSON text checks', () => {
  it('find repeated keys at any depth, including in arrays, and ignore keys that only look alike', () => {
    expect(checkJsonText('{"a": 1, "b": {"c": [1, {"d": 1, "d": 2}]}}')).toEqual({ kind: 'duplicate', objectPath: 'b.c[1]', key: 'd' });
    expect(checkJsonText('{"a": "a", "b": "\\"a\\"", "c": {"a": 1}, "[": "{"}')).toBeUndefined();
    expect(checkJsonText('{"\\u0061": 1, "a": 2}')).toEqual({ kind: 'duplicate', objectPath: '', key: 'a' });
  });

  it('stop at the depth limit with the path, without recursion', () => {
    expect(checkJsonText(`${'['.repeat(MAX_JSON_DEPTH)}${']'.repeat(MAX_JSON_DEPTH)}`)).toBeUndefined();
    expect(checkJsonText('{"a": {"b": [[1]]}}', 3)).toEqual({ kind: 'too-deep', path: 'a.b[0]', maxDepth: 3 });
    expect(checkJsonText(`${'['.repeat(500_000)}${']'.repeat(500_000)}`)?.kind).toBe('too-deep');
  });

  it.each(['/api/interpret', '/api/report', '/api/catalog/entries'])('answer 400, not 500, for a body nested 400 000 deep to %s', async (route) => {
    const deep = `{"name": ${'['.repeat(400_000)}${']'.repeat(400_000)}}`;
    const err = await expectError(await postJson(api.app, route, deep), 400, 'bad-json');
    expect(err.issues[0]!.path).toBe(`name${'[0]'.repeat(MAX_JSON_DEPTH - 1)}`);
    expect(err.issues[0]!.allowed).toBe(`at most ${MAX_JSON_DEPTH} levels`);
  });
});
