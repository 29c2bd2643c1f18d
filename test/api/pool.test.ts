/**
 * The worker-thread interpreter `hesper serve` uses gives the same answers as the one in
 * the request's thread (derived: same seed, same draws), passes known failures back as
 * 4xx, and sends the catalog to each worker again only when it changes.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../src/api/app.ts';
import { type Interpreter, pooledInterpreter } from '../../src/api/interpreter.ts';
import { makeApi, postJson, quickSystem, type TestApi } from './helpers.ts';

let api: TestApi;
let pooled: Interpreter;
beforeAll(async () => {
  api = makeApi();
  pooled = await pooledInterpreter(2);
});
afterAll(async () => {
  await pooled.close();
  api.close();
});

const noClock = (r: any) => ({ ...r, diagnostics: { ...r.diagnostics, computeMs: 0 } });

describe('pooled interpreter', () => {
  it('answers /api/interpret and /api/report exactly as the in-thread interpreter does', async () => {
    const app = createApp({ catalog: api.catalog, interpreter: pooled, log: (l) => api.logged.push(l) });
    const systems = [quickSystem('aurelia-b', 300), quickSystem('tessaly-b', 300), quickSystem('corvina-b', 300)];
    const viaPool = await Promise.all(systems.map(async (s) => (await postJson(app, '/api/interpret', s)).json()));
    for (const [i, s] of systems.entries()) {
      const inline = await (await postJson(api.app, '/api/interpret', s)).json();
      expect(noClock(viaPool[i])).toEqual(noClock(inline));
    }
    const report = await (await postJson(app, '/api/report?format=tex', systems[0])).json();
    const inlineReport = await (await postJson(api.app, '/api/report?format=tex', systems[0])).json();
    expect(report.text).toBe(inlineReport.text);
    expect(report.bibtex).toBe(inlineReport.bibtex);
    expect(api.logged).toEqual([]);
  });

  it('turns a failure inside a worker into the same 4xx the in-thread path gives', async () => {
    const app = createApp({ catalog: api.catalog, interpreter: pooled, log: (l) => api.logged.push(l) });
    // An upper limit that no model can reach below: every likelihood is zero (no-posterior-support).
    const s = quickSystem('tessaly-b', 200);
    s.measurements = { eclipseDepthPpm: { min: 1e5, max: 1.1e5 } };
    const a = await postJson(app, '/api/interpret', s);
    const b = await postJson(api.app, '/api/interpret', s);
    expect(a.status).toBe(b.status);
    expect(await a.json()).toEqual(await b.json());
    expect(a.status).toBe(400);
  });
});
