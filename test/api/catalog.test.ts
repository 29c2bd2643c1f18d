/**
 * The catalog routes: list with filters, add / change / remove user entries (curated
 * rows answer 403 with a clear message), sources, BibTeX; an entry added through the API
 * takes part in the next interpretation. The database is a fresh temporary file.
 */
import { parse } from '@retorquere/bibtex-parser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { catalogEntryListSchema, catalogEntrySchema, sourceListSchema } from '../../src/api/schemas/catalog.ts';
import { userEntry } from '../catalog/helpers.ts';
import { errorOf, makeApi, postJson, quickSystem, type TestApi } from './helpers.ts';

let api: TestApi;
beforeAll(() => {
  api = makeApi();
});
afterAll(() => api.close());

describe('GET /api/catalog/entries', () => {
  it('lists every entry, and filters by category, origin and search text as the catalog does', async () => {
    const all = await (await api.app.request('/api/catalog/entries')).json();
    expect(catalogEntryListSchema.safeParse(all).success).toBe(true);
    expect(all).toEqual(api.catalog.listEntries());
    const ice = await (await api.app.request('/api/catalog/entries?category=ice')).json();
    expect(ice.length).toBeGreaterThan(0);
    expect(ice.every((e: { category: string }) => e.category === 'ice')).toBe(true);
    expect(ice).toEqual(api.catalog.listEntries({ category: 'ice' }));
    const found = await (await api.app.request('/api/catalog/entries?search=MgSiO3')).json();
    expect(found).toEqual(api.catalog.listEntries({ search: 'MgSiO3' }));
    expect(found.length).toBeGreaterThan(0);
    const mine = await (await api.app.request('/api/catalog/entries?origin=user')).json();
    expect(mine).toEqual([]);
  });
});

describe('user entries through the API', () => {
  it('adds (201 with Location), shows, changes and removes a user entry', async () => {
    const add = await postJson(api.app, '/api/catalog/entries', userEntry('api-test-basalt'));
    expect(add.status).toBe(201);
    expect(add.headers.get('location')).toBe('/api/catalog/entries/api-test-basalt');
    const added = await add.json();
    expect(catalogEntrySchema.safeParse(added).success).toBe(true);
    expect(added).toMatchObject({ id: 'api-test-basalt', origin: 'user', valueNominal: 0.15 });

    const shown = await (await api.app.request('/api/catalog/entries/api-test-basalt')).json();
    expect(shown).toEqual(added);

    const patch = await postJson(api.app, '/api/catalog/entries/api-test-basalt', { valueMax: 0.25, description: 'changed' }, 'PATCH');
    expect(patch.status).toBe(200);
    expect(await patch.json()).toMatchObject({ valueMax: 0.25, description: 'changed', valueMin: 0.1 });

    const badPatch = await postJson(api.app, '/api/catalog/entries/api-test-basalt', { valueNominal: 0.9 }, 'PATCH');
    expect(badPatch.status).toBe(400);
    expect((await errorOf(badPatch)).issues.map((i) => i.path)).toContain('valueNominal');

    const del = await api.app.request('/api/catalog/entries/api-test-basalt', { method: 'DELETE' });
    expect(del.status).toBe(200);
    expect((await del.json()).id).toBe('api-test-basalt');
    const gone = await api.app.request('/api/catalog/entries/api-test-basalt');
    expect(gone.status).toBe(404);
    expect((await errorOf(gone)).code).toBe('not-found');
  });

  it('refuses to change or remove curated entries with 403 and a clear message, and leaves them as they were', async () => {
    const curated = api.catalog.listEntries({ origin: 'curated' })[0]!;
    const patch = await postJson(api.app, `/api/catalog/entries/${curated.id}`, { description: 'vandalised' }, 'PATCH');
    expect(patch.status).toBe(403);
    const err = await errorOf(patch);
    expect(err.code).toBe('curated-row');
    expect(err.message).toMatch(/curated.*only user entries/);
    const del = await api.app.request(`/api/catalog/entries/${curated.id}`, { method: 'DELETE' });
    expect(del.status).toBe(403);
    expect(api.catalog.getEntry(curated.id)).toEqual(curated);
  });

  it('answers 409 for a taken id and 400 naming the field for a bad entry', async () => {
    const curated = api.catalog.listEntries({ origin: 'curated' })[0]!;
    const taken = await postJson(api.app, '/api/catalog/entries', userEntry(curated.id));
    expect(taken.status).toBe(409);
    expect((await errorOf(taken)).issues[0]!.path).toBe('id');
    const bad = await postJson(api.app, '/api/catalog/entries', userEntry('api-test-bad', { category: 'plasma', bandMaxNm: -3 }));
    expect(bad.status).toBe(400);
    const paths = (await errorOf(bad)).issues.map((i) => i.path);
    expect(paths).toEqual(expect.arrayContaining(['category', 'bandMaxNm']));
  });

  it('uses an entry added through the API in the next interpretation', async () => {
    const system = quickSystem('corvina-b', 300);
    const before = await (await postJson(api.app, '/api/interpret', system)).json();
    expect(before.candidates.some((c: { id: string }) => c.id === 'api-test-dark-soot')).toBe(false);
    const entry = userEntry('api-test-dark-soot', { quantity: 'geometric', valueMin: 0.02, valueNominal: 0.04, valueMax: 0.06, temperatureMaxK: 3000 });
    expect((await postJson(api.app, '/api/catalog/entries', entry)).status).toBe(201);
    const after = await (await postJson(api.app, '/api/interpret', system)).json();
    const candidate = after.candidates.find((c: { id: string }) => c.id === 'api-test-dark-soot');
    expect(candidate).toBeDefined();
    // derived: a geometric-albedo entry is used as is, so its interval is the entry's own.
    expect(candidate.geometricAlbedoRange).toEqual([0.02, 0.06]);
    await api.app.request('/api/catalog/entries/api-test-dark-soot', { method: 'DELETE' });
  });
});

describe('sources and BibTeX', () => {
  it('lists the sources and writes BibTeX that parses, for all or for chosen keys', async () => {
    const sources = await (await api.app.request('/api/catalog/sources')).json();
    expect(sourceListSchema.safeParse(sources).success).toBe(true);
    expect(sources.length).toBe(api.catalog.stats().sources);
    const all = await api.app.request('/api/catalog/bibtex');
    expect(all.headers.get('content-type')).toMatch(/^application\/x-bibtex/);
    expect(all.headers.get('content-disposition')).toMatch(/attachment/);
    const lib = parse(await all.text());
    expect(lib.errors).toEqual([]);
    expect(lib.entries.length).toBe(sources.length);
    const two = sources.slice(0, 2).map((s: { key: string }) => s.key);
    const some = parse(await (await api.app.request(`/api/catalog/bibtex?keys=${two.join(',')}`)).text());
    expect(some.entries.map((e) => e.key)).toEqual(two);
    const missing = await api.app.request('/api/catalog/bibtex?keys=NoSuchKey2099');
    expect(missing.status).toBe(404);
  });
});
