/**
 * POST /api/interpret and POST /api/report: the API is a thin door onto the library, so
 * its answers must equal what interpret() gives for the same input (derived: the
 * library's own result; the seed fixes the draws), and must fit the published schemas.
 */
import { parse } from '@retorquere/bibtex-parser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { interpretationSchema } from '../../src/api/schemas/interpretation.ts';
import { reportSchema } from '../../src/api/schemas/report.ts';
import { interpret } from '../../src/index.ts';
import { parseXml } from '../helpers/xml.ts';
import { makeApi, postJson, quickSystem, type TestApi } from './helpers.ts';

let api: TestApi;
beforeAll(() => {
  api = makeApi();
});
afterAll(() => api.close());

/** Everything but the wall-clock time. */
function withoutClock<T extends { diagnostics: { computeMs: number } }>(r: T): T {
  return { ...r, diagnostics: { ...r.diagnostics, computeMs: 0 } };
}

describe('POST /api/interpret', () => {
  it('answers the interpretation JSON, equal to the library result for the same system', async () => {
    const system = quickSystem('corvina-b');
    const res = await postJson(api.app, '/api/interpret', system);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/^application\/json/);
    const body = await res.json();
    const parsed = interpretationSchema.safeParse(body);
    expect(parsed.success ? [] : parsed.error.issues).toEqual([]);
    const library = interpret(system, { catalog: { entries: api.catalog.listEntries(), condensates: api.catalog.listCondensates() } });
    expect(withoutClock(body)).toEqual(withoutClock(JSON.parse(JSON.stringify(library))));
    // The demo's invented planet is a dark hot Jupiter (demo-data/README.md): candidates are matched from the catalog.
    expect(body.candidates.length).toBe(api.catalog.listEntries().length);
    expect(['yes', 'no', 'inconclusive']).toContain(body.verdict.cloudsOrIceRequired);
  });

  it('gives the same answer twice for the same seed', async () => {
    const system = quickSystem('aurelia-b', 300);
    const a = await (await postJson(api.app, '/api/interpret', system)).json();
    const b = await (await postJson(api.app, '/api/interpret', system)).json();
    expect(withoutClock(a)).toEqual(withoutClock(b));
  });
});

describe('POST /api/report', () => {
  it('writes Markdown paragraphs whose cited keys are all in the BibTeX, which parses; the SVG parses as XML', async () => {
    const system = quickSystem('aurelia-b');
    const res = await postJson(api.app, '/api/report', system);
    expect(res.status).toBe(200);
    const body = await res.json();
    const parsed = reportSchema.safeParse(body);
    expect(parsed.success ? [] : parsed.error.issues).toEqual([]);
    expect(body.format).toBe('md');
    expect(body.text).toContain(system.name);
    expect(body.text).not.toContain('\\citep');
    const lib = parse(body.bibtex);
    expect(lib.errors).toEqual([]);
    expect(lib.entries.map((e) => e.key).sort()).toEqual([...body.citedKeys].sort());
    expect(body.citedKeys.length).toBeGreaterThan(0);
    expect(parseXml(body.figure.svg).name).toBe('svg');
    expect(body.figure.vegaLite.vconcat).toBeInstanceOf(Array);
    const direct = await (await postJson(api.app, '/api/interpret', system)).json();
    expect(withoutClock(body.interpretation)).toEqual(withoutClock(direct));
  });

  it('writes LaTeX with \\citep keys on ?format=tex, and refuses an unknown format naming the parameter', async () => {
    const system = quickSystem('tessaly-b', 400);
    const tex = await (await postJson(api.app, '/api/report?format=tex', system)).json();
    expect(tex.format).toBe('tex');
    expect(tex.text).toMatch(/\\citep\{[^}]+\}/);
    for (const key of tex.text.match(/\\cite[pt]\{([^}]+)\}/g)!.flatMap((m: string) => m.slice(7, -1).split(','))) {
      expect(tex.citedKeys).toContain(key.trim());
    }
    const bad = await postJson(api.app, '/api/report?format=docx', system);
    expect(bad.status).toBe(400);
    const err = (await bad.json()).error;
    expect(err.issues[0].path).toBe('query.format');
    expect(err.issues[0].message).toMatch(/"md", "tex"/);
  });
});

describe('GET routes', () => {
  it('GET /api/health reports the catalog counts', async () => {
    const body = await (await api.app.request('/api/health')).json();
    const s = api.catalog.stats();
    expect(body).toEqual({ status: 'ok', version: expect.any(String), catalog: { entries: s.entries, userEntries: s.userEntries, sources: s.sources } });
  });

  it('GET /api/bands lists the built-in bands with their sources', async () => {
    const bands = await (await api.app.request('/api/bands')).json();
    expect(bands.map((b: { id: string }) => b.id)).toEqual(expect.arrayContaining(['kepler', 'tess', 'cheops']));
    // TESS 600-1000 nm: Ricker et al. 2015, JATIS 1, 014003 (the band's own source line).
    expect(bands.find((b: { id: string }) => b.id === 'tess')).toMatchObject({ minNm: 600, maxNm: 1000, approximate: true });
  });

  it('GET /api/demos lists the invented demo systems and hands one out by name only', async () => {
    const list = await (await api.app.request('/api/demos')).json();
    expect(list.map((d: { name: string }) => d.name)).toEqual(['aurelia-b', 'corvina-b', 'tessaly-b']);
    for (const d of list) expect(d.note).toMatch(/invented/i);
    const demo = await (await api.app.request('/api/demos/tessaly-b')).json();
    expect(demo.name).toBe('Tessaly b');
    expect(demo.$schema).toBeUndefined();
    for (const name of ['..%2F..%2Fpackage.json', '..%2Fsystems%2Faurelia-b.json', '%2E%2E']) {
      const res = await api.app.request(`/api/demos/${name}`);
      expect(res.status).toBe(404);
      expect((await res.json()).error.code).toMatch(/^(not-found|unknown-route)$/);
    }
    for (const name of ['aurelia-b.json', 'AURELIA-B', '.env']) {
      const res = await api.app.request(`/api/demos/${name}`);
      expect(res.status).toBe(404);
      expect((await res.json()).error.issues[0].allowed).toBe('aurelia-b, corvina-b, tessaly-b');
    }
  });
});
