import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { HesperError } from '../../src/errors.ts';
import { catalogEntryInputSchema, openCatalog, type Catalog } from '../../src/catalog/index.ts';
import { cleanupTemp, dumpDatabase, tempDbPath, userEntry } from './helpers.ts';
import { caughtHesperError } from '../helpers/errors.ts';

let catalog: Catalog;
let file: string;
beforeEach(() => {
  file = tempDbPath();
  catalog = openCatalog({ path: file });
});
afterEach(() => {
  catalog.close();
  cleanupTemp();
});


describe('user entries', () => {
  it('adds an entry citing an existing key and lists it with origin user', () => {
    const added = catalog.addUserEntry(userEntry('invented-basalt-slab'));
    expect(added).toMatchObject({ id: 'invented-basalt-slab', origin: 'user', sources: ['Essack2020'], temperatureMinK: null, condensate: null });
    expect(catalog.listEntries({ origin: 'user' }).map((e) => e.id)).toEqual(['invented-basalt-slab']);
    expect(catalog.listEntries({ search: 'INVENTED-basalt' }).map((e) => e.id)).toEqual(['invented-basalt-slab']);
  });

  it('adds a new source record given in full, and reuses it when given again unchanged', () => {
    const record = { key: 'Invented2026', type: 'misc', authors: 'Ødegård, Å. and {An Invented Consortium}', year: 2026, title: 'An invented note on albedo', note: 'invented for a test' };
    catalog.addUserEntry(userEntry('invented-one', { sources: [record, 'Essack2020'] }));
    catalog.addUserEntry(userEntry('invented-two', { sources: [record] }));
    expect(catalog.getEntry('invented-two').sources).toEqual(['Invented2026']);
    expect(catalog.getSources(['Invented2026'])[0]).toMatchObject({ origin: 'user', authors: 'Ødegård, Å. and {An Invented Consortium}', journal: null });
  });

  it('refuses a source record whose key exists with other details', () => {
    const err = caughtHesperError(() => catalog.addUserEntry(userEntry('invented-x', { sources: [{ key: 'Essack2020', authors: 'Someone', title: 'Another title' }] })));
    expect(err.code).toBe('duplicate-id');
    expect(err.kind).toBe('conflict');
    expect(err.issues[0]!.path).toBe('sources[0]');
  });

  it('refuses an unknown source key, a taken id and an entry without sources, naming the field', () => {
    expect(caughtHesperError(() => catalog.addUserEntry(userEntry('invented-y', { sources: ['NoSuch2001'] }))).issues[0]).toMatchObject({ path: 'sources[0]', value: 'NoSuch2001' });
    expect(caughtHesperError(() => catalog.addUserEntry(userEntry('jupiter-bond-li2018'))).code).toBe('duplicate-id');
    const noSource = caughtHesperError(() => catalog.addUserEntry(userEntry('invented-z', { sources: [] })));
    expect(noSource.code).toBe('invalid-input');
    expect(noSource.issues[0]).toMatchObject({ path: 'sources', message: 'at least one source is required' });
  });

  it('validates ranges, bands and enums with one issue per field', () => {
    const err = caughtHesperError(() =>
      catalog.addUserEntry(userEntry('invented-bad', { valueMin: 0.5, valueMax: 0.2, bandMinNm: 900, bandMaxNm: 400, quantity: 'bond', category: 'plasma' })),
    );
    const paths = err.issues.map((i) => i.path);
    expect(paths).toContain('category');
    expect(new Set(paths).size).toBe(paths.length);
    const ranges = caughtHesperError(() => catalog.addUserEntry(userEntry('invented-bad', { valueMin: 0.5, valueMax: 0.2, bandMinNm: 900, bandMaxNm: 400 })));
    expect(ranges.issues.map((i) => i.path).sort()).toEqual(['bandMaxNm', 'valueMin']);
    const bond = caughtHesperError(() => catalog.addUserEntry(userEntry('invented-bad', { quantity: 'bond', valueMax: 1.2 })));
    expect(bond.issues[0]).toMatchObject({ path: 'valueMax' });
    expect(bond.issues[0]!.message).toContain('cannot exceed 1');
    expect(catalog.listEntries({ origin: 'user' })).toEqual([]);
  });

  it('adds several entries all or none', () => {
    const before = dumpDatabase(file);
    expect(() => catalog.addUserEntries([userEntry('invented-a'), userEntry('invented-b', { valueNominal: 9 })])).toThrow(HesperError);
    expect(dumpDatabase(file)).toEqual(before);
    expect(catalog.addUserEntries([userEntry('invented-a'), userEntry('invented-b')]).map((e) => e.id)).toEqual(['invented-a', 'invented-b']);
  });

  it('updates a user entry after validating the merged entry', () => {
    catalog.addUserEntry(userEntry('invented-upd', { spectrum: [{ wavelengthNm: 500, value: 0.12 }] }));
    const changed = catalog.updateUserEntry('invented-upd', { valueNominal: 0.18, sources: ['Essack2020', 'Bell2017'] });
    expect(changed).toMatchObject({ valueNominal: 0.18, sources: ['Essack2020', 'Bell2017'], spectrum: [{ wavelengthNm: 500, value: 0.12 }] });
    expect(caughtHesperError(() => catalog.updateUserEntry('invented-upd', { valueNominal: 0.5 })).issues[0]!.path).toBe('valueNominal');
    expect(caughtHesperError(() => catalog.updateUserEntry('invented-upd', { id: 'renamed' })).code).toBe('invalid-input');
  });

  it('refuses to edit or remove curated rows (kind forbidden) and reports unknown ids (kind not-found)', () => {
    const before = dumpDatabase(file);
    const edit = caughtHesperError(() => catalog.updateUserEntry('jupiter-bond-li2018', { valueNominal: 0.5 }));
    expect([edit.code, edit.kind]).toEqual(['curated-row', 'forbidden']);
    const remove = caughtHesperError(() => catalog.removeUserEntry('jupiter-bond-li2018'));
    expect([remove.code, remove.kind]).toEqual(['curated-row', 'forbidden']);
    expect(remove.message).toContain('curated');
    expect(dumpDatabase(file)).toEqual(before);
    for (const fn of [() => catalog.getEntry('no-such-entry'), () => catalog.removeUserEntry('no-such-entry'), () => catalog.updateUserEntry('no-such-entry', {})]) {
      expect(caughtHesperError(fn)).toMatchObject({ code: 'not-found', kind: 'not-found' });
    }
    expect(caughtHesperError(() => catalog.getSources(['Li2018Jupiter', 'Nope1', 'Nope2'])).issues.map((i) => i.value)).toEqual(['Nope1', 'Nope2']);
  });

  it('removes a user entry with its links and spectrum', () => {
    catalog.addUserEntry(userEntry('invented-rm', { spectrum: [{ wavelengthNm: 500, value: 0.12 }] }));
    expect(catalog.removeUserEntry('invented-rm').id).toBe('invented-rm');
    const dump = dumpDatabase(file, { entry_sources: "entry_id = 'invented-rm'", spectra: "entry_id = 'invented-rm'" });
    expect([dump.entry_sources!.length, dump.spectra!.length]).toEqual([0, 0]);
  });

  it('rejects an unknown category filter with the allowed words', () => {
    const err = caughtHesperError(() => catalog.listEntries({ category: 'plasma' }));
    expect(err.issues[0]).toMatchObject({ path: 'category', value: 'plasma' });
    expect(err.issues[0]!.allowed).toContain('clear-atmosphere');
  });

  it('exposes the entry JSON schema for the API (the documented example entry validates)', () => {
    const example = {
      id: 'fresh-snow', name: 'Fresh snow', category: 'ice', quantity: 'surface', bandMinNm: 300, bandMaxNm: 3000, valueMin: 0.7, valueMax: 0.9,
      valueNominal: 0.8, temperatureMinK: null, temperatureMaxK: 273, description: '...', provenance: 'checked',
      sources: ['Key2020', { key: 'New2026', authors: '...', year: 2026, title: '...', journal: '...', doi: '10.1234/invented' }],
    };
    expect(catalogEntryInputSchema.safeParse(example).success).toBe(true);
    expect(catalogEntryInputSchema.safeParse({ ...example, extra: 1 }).success).toBe(false);
  });
});
