import { parse } from '@retorquere/bibtex-parser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openCatalog, type SourceRecord } from '../../src/catalog/index.ts';
import { bibtexEntry, escapeLatex, formatAuthors, protectTitle, splitNames, toBibtex } from '../../src/report/bibtex.ts';
import { cleanupTemp, tempDbPath } from '../catalog/helpers.ts';

let sources: SourceRecord[];
let lib: ReturnType<typeof parse>;
beforeAll(() => {
  const catalog = openCatalog({ path: tempDbPath() });
  sources = catalog.listSources();
  catalog.close();
  lib = parse(toBibtex(sources));
});

/** The parser may return decomposed accents; compare canonical (NFC) text. */
const nfc = (s: string | undefined) => s?.normalize('NFC');
afterAll(cleanupTemp);

const record = (over: Partial<SourceRecord>): SourceRecord => ({
  key: 'Invented2026', type: 'article', authors: 'Nobody, A.', year: 2026, title: 'An invented title', journal: null, publisher: null,
  volume: null, pages: null, doi: null, arxiv: null, bibcode: null, url: null, note: null, origin: 'user', ...over,
});

describe('BibTeX of the whole catalog', () => {
  it('parses without errors, one entry per source, and every source key appears', () => {
    expect(lib.errors).toEqual([]);
    expect(lib.entries.length).toBe(sources.length);
    expect(lib.entries.map((e) => e.key).sort()).toEqual(sources.map((s) => s.key).sort());
  });

  it('keeps accented author names, journals and titles through a parser', () => {
    const get = (key: string) => lib.entries.find((e) => e.key === key)!;
    expect(nfc(get('GarciaMunozIsaak2015').fields.author?.[0]?.lastName)).toBe('García Muñoz');
    expect(get('GarciaMunozIsaak2015').fields.author?.[0]?.firstName).toBe('A.');
    expect(nfc(get('Dorschner1995').fields.author?.[3]?.lastName)).toBe('Jäger');
    expect(nfc(get('Rakic1998').fields.author?.[0]?.lastName)).toBe('Rakić');
    expect(nfc(get('Eftekhar2022').fields.journal)).toBe('Revista Mexicana de Astronomía y Astrofísica');
    expect(nfc(get('WagnerPruss2002').fields.author?.[1]?.lastName)).toBe('Pruß');
    expect(get('Filacchione2022').fields.author?.[2]?.lastName).toBe("D'Aversa");
  });

  it('keeps corporate authors whole and writes "others" for et al.', () => {
    const jpl = lib.entries.find((e) => e.key === 'JPLApproxPositions')!;
    expect(jpl.fields.author).toEqual([{ name: 'JPL Solar System Dynamics Group' }]);
    const li = lib.entries.find((e) => e.key === 'Li2018Jupiter')!;
    expect(li.fields.author?.map((a) => a.lastName)).toEqual(expect.arrayContaining(['Li', 'Jiang', 'others']));
    expect(li.fields.author?.at(-1)?.lastName).toBe('others');
  });

  it('round-trips DOIs with special characters and arXiv ids', () => {
    expect(lib.entries.find((e) => e.key === 'Payne1972')!.fields.doi).toBe('10.1175/1520-0469(1972)029<0959:AOTSS>2.0.CO;2');
    expect(lib.entries.find((e) => e.key === 'Sudarsky2000')!.fields.eprint).toBe('astro-ph/9910504');
  });
});

describe('escaping', () => {
  it('escapes the TeX special characters so they survive parsing', () => {
    const title = 'Ratios of 50% & more: $x_1$ #2 {braced} ~tilde^ back\\slash';
    const lib = parse(bibtexEntry(record({ title: title, note: title, journal: 'A & B' })), { english: false });
    expect(lib.errors).toEqual([]);
    expect(lib.entries[0]!.fields.note).toBe(title);
    expect(lib.entries[0]!.fields.journal).toBe('A & B');
    expect(escapeLatex('50% & $5 #1 a_b {c} ~ ^ \\')).toBe('50\\% \\& \\$5 \\#1 a\\_b {\\textbraceleft}c{\\textbraceright} {\\textasciitilde} {\\textasciicircum} {\\textbackslash}');
    expect(escapeLatex('<a> | @b')).toBe('{\\textless}a{\\textgreater} {\\textbar} {\\symbol{64}}b');
  });

  it('writes accents as commands and symbols as text commands', () => {
    expect(escapeLatex('García Muñoz Blažek Jäger Ødegård ß')).toBe("Garc{\\'i}a Mu{\\~n}oz Bla{\\v{z}}ek J{\\\"a}ger {\\O}deg{\\aa}rd {\\ss}");
    expect(escapeLatex('0.4–0.5 ± 0.1 µm')).toBe('0.4--0.5 {\\textpm} 0.1 {\\textmu}m');
  });

  it('protects words whose capitals a style must keep', () => {
    expect(protectTitle('Albedo of Jupiter and HD 209458 b from TESS')).toBe('Albedo of {Jupiter} and {HD} 209458 b from {TESS}');
    expect(protectTitle('The albedo of Earth')).toBe('The albedo of {Earth}');
  });

  it('splits names only at top-level "and"', () => {
    expect(splitNames('{Smith and Sons} and Doe, J. and others')).toEqual(['{Smith and Sons}', 'Doe, J.', 'others']);
    expect(formatAuthors('{R&D Group} and Nobody, A.')).toBe('{R\\&D Group} and Nobody, A.');
  });

  it('chooses fields by entry type', () => {
    const book = bibtexEntry(record({ type: 'book', publisher: 'Dover', title: 'Radiative Transfer' }));
    expect(book).toMatch(/^@book\{Invented2026,/);
    expect(book).toContain('publisher = {Dover}');
    const misc = parse(bibtexEntry(record({ type: 'misc', journal: 'A web site', url: 'https://example.org/a_b%20c', year: null })));
    expect(misc.errors).toEqual([]);
    expect(misc.entries[0]!.fields).toMatchObject({ howpublished: 'A web site', url: 'https://example.org/a_b%20c' });
    expect(misc.entries[0]!.fields.year).toBeUndefined();
  });
});
