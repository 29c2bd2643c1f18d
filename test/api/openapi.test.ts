/**
 * GET /api/openapi.json: a valid OpenAPI 3.1 document (checked with
 * @seriousme/openapi-schema-validator) that lists every route the app answers, generated
 * from the zod schemas the routes use.
 */
import { Validator } from '@seriousme/openapi-schema-validator';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeApi, type TestApi } from './helpers.ts';

let api: TestApi;
let doc: any;
beforeAll(async () => {
  api = makeApi();
  doc = await (await api.app.request('/api/openapi.json')).json();
});
afterAll(() => api.close());

describe('the OpenAPI document', () => {
  it('is valid OpenAPI 3.1', async () => {
    const validator = new Validator();
    const res = await validator.validate(doc);
    expect(res.errors ?? []).toEqual([]);
    expect(res.valid).toBe(true);
    expect(validator.version).toBe('3.1');
  });

  it('documents every /api route the app answers, with its methods, and nothing else', () => {
    const served = new Set(
      api.app.routes
        .filter((r) => r.path.startsWith('/api/') && r.path !== '/api/*' && r.method !== 'ALL')
        .map((r) => `${r.method.toLowerCase()} ${r.path.replace(/:(\w+)/g, '{$1}')}`),
    );
    const documented = new Set(
      Object.entries(doc.paths).flatMap(([p, ops]) => Object.keys(ops as object).filter((m) => m !== 'parameters').map((m) => `${m} ${p}`)),
    );
    expect([...documented].sort()).toEqual([...served].sort());
    // The documented routes (plus the demo routes of the page).
    for (const r of ['get /api/health', 'post /api/interpret', 'post /api/report', 'get /api/bands', 'get /api/catalog/entries', 'post /api/catalog/entries',
      'get /api/catalog/entries/{id}', 'patch /api/catalog/entries/{id}', 'delete /api/catalog/entries/{id}', 'get /api/catalog/sources',
      'get /api/catalog/bibtex', 'get /api/openapi.json']) {
      expect(documented.has(r), r).toBe(true);
    }
  });

  it('resolves every $ref and publishes the schemas the routes check', () => {
    const refs = JSON.stringify(doc).match(/"#\/components\/schemas\/[^"]+"/g) ?? [];
    for (const r of refs) expect(doc.components.schemas[r.slice(22, -1)], r).toBeDefined();
    const s = doc.components.schemas;
    expect(Object.keys(s)).toEqual(expect.arrayContaining(['SystemFile', 'Interpretation', 'Report', 'ErrorBody', 'CatalogEntry', 'CatalogEntryInput', 'CatalogEntryPatch', 'Source', 'Band', 'Candidate', 'Verdict']));
    expect(s.Interpretation.required).toEqual(expect.arrayContaining(['geometricAlbedo', 'bondAlbedo', 'verdict', 'candidates', 'diagnostics']));
    expect(s.SystemFile.required).toEqual(['name', 'band', 'star', 'planet', 'measurements']);
    expect(s.CatalogEntryInput.properties.category.enum).toContain('cloud');
    expect(s.ErrorBody.properties.error.required).toEqual(['code', 'message', 'issues']);
  });
});
