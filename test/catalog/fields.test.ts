/** The source bibcode, the entries' appliesTo and the user provenance, through every way in and out. */
import { parse } from '@retorquere/bibtex-parser';
import Database from 'better-sqlite3';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { openCatalog, type Catalog } from '../../src/catalog/index.ts';
import { adsUrl, APPLIES_TO_TEXTS, BIBCODE_PATTERN } from '../../src/catalog/vocab.ts';
import { toBibtex } from '../../src/report/bibtex.ts';
import { caughtHesperError } from '../helpers/errors.ts';
import { cleanupTemp, dumpDatabase, tempDbPath, userEntry } from './helpers.ts';

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

const HEADER = 'id,name,category,quantity,band_min_nm,band_max_nm,value_min,value_nominal,value_max,provenance,applies_to,sources';

describe('ADS bibcodes of sources', () => {
  it('accept the 19-character form, including letters, A&A article numbers and six-digit pages', () => {
    // Bibcodes in the form ADS gives them (common practice): Icarus 282, 19; ApJL 776, L25; A&A 598, A130; Icarus 375, 114803.
    for (const b of ['2017Icar..282...19M', '2013ApJ...776L..25D', '2017A&A...598A.130C', '2022Icar..37514803F']) {
      expect(BIBCODE_PATTERN.test(b), b).toBe(true);
    }
    for (const b of ['2017Icar..282...19', '2017Icar..282...19MM', '17Icar..282....19M', '2017Icar..282.. 19M', '2017Icar..282...19\\']) {
      expect(BIBCODE_PATTERN.test(b), b).toBe(false);
    }
  });

  it('are stored, read back, exported and written to BibTeX as adsurl', () => {
    const record = { key: 'Invented2026b', type: 'article', authors: 'Nobody, A.', year: 2026, title: 'An invented paper', journal: 'Invented Journal', bibcode: '2026InvJ...12..345N' };
    catalog.addUserEntry(userEntry('invented-bib', { sources: [record] }));
    const stored = catalog.getSources(['Invented2026b'])[0]!;
    expect(stored.bibcode).toBe('2026InvJ...12..345N');
    const exported = JSON.parse(catalog.exportEntries('json', { origin: 'user' }));
    expect(exported[0].sources[0].bibcode).toBe('2026InvJ...12..345N');
    const bib = parse(toBibtex([stored]));
    expect(bib.entries[0]!.fields.adsurl).toBe('https://ui.adsabs.harvard.edu/abs/2026InvJ...12..345N');
    // The & of A&A is percent-encoded, so the URL needs no TeX escaping.
    expect(adsUrl('2017A&A...598A.130C')).toBe('https://ui.adsabs.harvard.edu/abs/2017A%26A...598A.130C');
  });

  it('refuse a malformed bibcode, naming the field, and write nothing', () => {
    const before = dumpDatabase(file);
    const record = { key: 'Invented2026c', authors: 'Nobody, A.', title: 'x', bibcode: '2026InvJ.12.345N' };
    const err = caughtHesperError(() => catalog.addUserEntry(userEntry('invented-badbib', { sources: [record] })));
    expect(err.code).toBe('invalid-input');
    expect(err.issues[0]!.path).toBe('sources[0].bibcode');
    expect(err.issues[0]!.message).toContain('19 characters');
    expect(dumpDatabase(file)).toEqual(before);
  });
});

describe('appliesTo and the user provenance', () => {
  it('default to ["any"] and "user" for a user entry that names neither', () => {
    const { provenance: _p, ...bare } = userEntry('invented-defaults');
    const added = catalog.addUserEntry(bare);
    expect(added).toMatchObject({ appliesTo: ['any'], provenance: 'user', origin: 'user' });
    expect(catalog.listEntries({ origin: 'user' })[0]).toMatchObject({ appliesTo: ['any'], provenance: 'user' });
  });

  it('keep the classes given, in the fixed order giant, sub-neptune, rocky', () => {
    const added = catalog.addUserEntry(userEntry('invented-classes', { appliesTo: ['rocky', 'giant'] }));
    expect(added.appliesTo).toEqual(['giant', 'rocky']);
    expect(catalog.updateUserEntry('invented-classes', { appliesTo: ['sub-neptune'] }).appliesTo).toEqual(['sub-neptune']);
  });

  it('refuse an empty list, an unknown class, a repeat and "any" with another class, naming the field', () => {
    const cases: [unknown, string][] = [
      [[], 'appliesTo'],
      [['giant', 'brown-dwarf'], 'appliesTo[1]'],
      [['rocky', 'rocky'], 'appliesTo[1]'],
      [['any', 'giant'], 'appliesTo'],
    ];
    for (const [appliesTo, path] of cases) {
      const err = caughtHesperError(() => catalog.addUserEntry(userEntry('invented-bad-classes', { appliesTo })));
      expect(err.code, JSON.stringify(appliesTo)).toBe('invalid-input');
      expect(err.issues[0]!.path, JSON.stringify(appliesTo)).toBe(path);
    }
    expect(catalog.listEntries({ origin: 'user' })).toEqual([]);
  });

  it('go through CSV: empty cells take the defaults, lists use ";", and export then import gives the same entries', () => {
    catalog.importCsv(
      [
        HEADER,
        'invented-csv-any,CSV any,soil,surface,300,3000,0.1,0.2,0.3,,,Payne1972',
        'invented-csv-two,CSV two,cloud,geometric,400,900,0.2,0.3,0.4,checked,sub-neptune;giant,Payne1972',
      ].join('\n'),
    );
    expect(catalog.getEntry('invented-csv-any')).toMatchObject({ appliesTo: ['any'], provenance: 'user' });
    expect(catalog.getEntry('invented-csv-two')).toMatchObject({ appliesTo: ['giant', 'sub-neptune'], provenance: 'checked' });
    const csv = catalog.exportEntries('csv', { origin: 'user' });
    expect(csv).toContain(',giant;sub-neptune,');
    const other = openCatalog({ path: tempDbPath() });
    other.importCsv(csv);
    for (const id of ['invented-csv-any', 'invented-csv-two']) expect(other.getEntry(id)).toEqual(catalog.getEntry(id));
    other.close();
  });

  it('are enforced by the database too (CHECK constraints)', () => {
    catalog.addUserEntry(userEntry('invented-check'));
    const raw = new Database(file);
    expect(() => raw.prepare("UPDATE entries SET applies_to = 'rocky,giant' WHERE id = 'invented-check'").run()).toThrow(/CHECK constraint failed/);
    expect(() => raw.prepare("UPDATE entries SET applies_to = '' WHERE id = 'invented-check'").run()).toThrow(/CHECK constraint failed/);
    expect(() => raw.prepare("UPDATE entries SET provenance = 'rumour' WHERE id = 'invented-check'").run()).toThrow(/CHECK constraint failed/);
    expect(() => raw.prepare("UPDATE sources SET bibcode = 'short' WHERE key = 'Payne1972'").run()).toThrow(/CHECK constraint failed/);
    raw.close();
    // The stored forms: "any" alone or a non-empty ordered set of the three classes (2^3 - 1 = 7).
    expect(APPLIES_TO_TEXTS.length).toBe(8);
  });
});
