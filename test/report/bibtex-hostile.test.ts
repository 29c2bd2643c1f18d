/**
 * The BibTeX writer against hostile source records: text built to close a field early,
 * start a second (forged) entry, define a @string or run a TeX command. Read back with a
 * strict reader that counts braces as BibTeX does, and with the forgiving parser.
 */
import { parse } from '@retorquere/bibtex-parser';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openCatalog, type SourceRecord } from '../../src/catalog/index.ts';
import { bibtexEntry, bibtexFieldProblem, toBibtex } from '../../src/report/bibtex.ts';
import { cleanupTemp, tempDbPath } from '../catalog/helpers.ts';
import { decodeHesperTex, readBibStrict, type StrictEntry } from '../helpers/bibtex-strict.ts';
import { caughtHesperError as catchError } from '../helpers/errors.ts';

const record = (over: Partial<SourceRecord>): SourceRecord => ({
  key: 'Invented2026', type: 'article', authors: 'Nobody, A.', year: 2026, title: 'An invented title', journal: 'Invented Journal', publisher: null,
  volume: '1', pages: '1-2', doi: null, arxiv: null, bibcode: null, url: null, note: null, origin: 'user', ...over,
});

/** The title of the issue report: closes the title, adds fields, forges an entry under a curated key. */
const FORGED_TITLE = 'real title}, year = 1999, note = x} @article(Schmid2006, author = "m", title = "forged") @comment(';

/** Hostile text, each built against one rule of BibTeX's scanner or of TeX. */
const HOSTILE: Record<string, string> = {
  'the forged title': FORGED_TITLE,
  'a lone closing brace': 'a}b',
  'braces closing every level': '}}}} @misc{X, title={y}}',
  'a backslash before the brace': 'a\\}, note = {forged',
  'a double backslash before the brace': 'a\\\\}, note = {forged',
  'an opening brace left open': '{{{ a',
  'a quote field': '", note = "forged',
  'string concatenation': '" # forged # "',
  '@comment then an entry': '@comment{ @article{Forged, title = {x}} }',
  '@string definition': '@string{jan = "forged"}',
  '@preamble with a command': '@preamble{"\\input{/etc/hostname}"}',
  'an entry on a new line': 'x\n@article{Forged,\n  title = {y}\n}\n',
  'TeX input': '\\input{/etc/hostname}\\relax',
  'TeX caret notation for a backslash': '^^5cinput^^7b/etc/hostname^^7d',
  'catcode change': '\\catcode`\\@=0 @input /etc/hostname',
  'every special': '\\ { } $ & # ^ _ ~ % < > | @ " \' `',
  'a paragraph break': 'first\n\nsecond',
};

/** Text as BibTeX reads it: runs of white space are one space (the writer also turns line breaks into spaces). */
const asWritten = (s: string) => s.replace(/\s+/g, ' ');

function onlyEntry(bib: string): StrictEntry {
  const read = readBibStrict(bib);
  expect(read.commands).toEqual([]);
  expect(read.entries.map((e) => `${e.type}:${e.key}`)).toEqual(['article:Invented2026']);
  return read.entries[0]!;
}

function field(e: StrictEntry, name: string): string {
  const f = e.fields.filter((x) => x.name === name);
  expect(f, name).toHaveLength(1);
  expect(f[0]!.pieces, name).toHaveLength(1);
  return f[0]!.pieces[0]!;
}

describe('hostile text in source records (strict brace-depth reader)', () => {
  it('the forged title of the issue report yields one entry with its own fields and the title as text', () => {
    const bib = bibtexEntry(record({ title: FORGED_TITLE }));
    const e = onlyEntry(bib);
    expect(e.fields.map((f) => f.name)).toEqual(['author', 'title', 'journal', 'year', 'volume', 'pages']);
    expect(decodeHesperTex(field(e, 'title'))).toBe(FORGED_TITLE);
    expect(field(e, 'year')).toBe('{2026}');
    expect(bib).not.toContain('@article(');
    expect(bib.match(/@/g)).toHaveLength(1);
  });

  it('the forgiving parser also reads one entry (it only lacks the \\symbol command)', () => {
    const lib = parse(bibtexEntry(record({ title: FORGED_TITLE })));
    expect(lib.entries.map((e) => e.key)).toEqual(['Invented2026']);
    expect(lib.entries[0]!.fields.year).toBe('2026');
    expect(lib.errors.map((e) => e.error)).toEqual(lib.errors.map(() => 'unhandled macro \\symbol'));
  });

  for (const [what, text] of Object.entries(HOSTILE)) {
    it(`${what}: one entry, every field intact, in every text field`, () => {
      const r = record({ title: text, journal: text, publisher: text, volume: text, pages: text, note: text, authors: `Nobody, A. and {${text.replace(/[{}]/g, '')}}` });
      for (const type of ['article', 'book', 'misc'] as const) {
        const bib = bibtexEntry({ ...r, type });
        const read = readBibStrict(bib);
        expect(read.commands).toEqual([]);
        expect(read.entries.map((e) => `${e.type}:${e.key}`)).toEqual([`${type}:Invented2026`]);
        const e = read.entries[0]!;
        expect(new Set(e.fields.map((f) => f.name)).size).toBe(e.fields.length);
        for (const name of ['title', 'volume', 'note']) expect(asWritten(decodeHesperTex(field(e, name))), name).toBe(asWritten(text));
        const hasPublisher = e.fields.some((f) => f.name === 'publisher');
        if (hasPublisher) expect(asWritten(decodeHesperTex(field(e, 'publisher')))).toBe(asWritten(text));
      }
      // no field holds an @, a lone brace or a TeX command other than the writer's own escapes
      expect(bibtexEntry(r).slice(1)).not.toContain('@');
      expect(bibtexEntry(r)).not.toMatch(/\\(input|relax|catcode|string|preamble)\b|\^\^/);
    });
  }

  it('any text at all in any text field, authors included (as a database written before the input rules might hold them), keeps one entry with balanced fields (property, 300 runs)', () => {
    // mostly the characters BibTeX and TeX read as syntax, and some of all of Unicode
    const syntax = fc.constantFrom(...'{}{}\\@"#%,=()^~$&_<>|` \n\tabAB0'.split(''));
    const text = fc.oneof(
      { weight: 3, arbitrary: fc.string({ unit: syntax, minLength: 1, maxLength: 60 }) },
      { weight: 1, arbitrary: fc.string({ unit: 'binary', minLength: 1, maxLength: 60 }) },
    );
    fc.assert(
      fc.property(text, text, text, text, text, (title, journal, note, volume, authors) => {
        const bib = bibtexEntry(record({ title, journal, note, volume, publisher: note, pages: title, authors }));
        const read = readBibStrict(bib);
        if (read.entries.length !== 1 || read.commands.length > 0 || read.entries[0]!.key !== 'Invented2026') return false;
        return read.entries[0]!.fields.every((f) => f.pieces.length === 1 && bibtexFieldProblem(f.pieces[0]!.slice(1, -1)) === undefined);
      }),
      { numRuns: 300, seed: 20261201 },
    );
  });
});

describe('verbatim fields and keys', () => {
  it('a DOI or URL stored before the input rules (backslash, braces, ^, @, spaces) is percent-encoded, never verbatim', () => {
    const r = record({ doi: '10.1234/x\\input/etc/hostname\\relax{}^^5c @', url: 'https://example.org/a b\\input{x}^^5c@d"<>|`', arxiv: 'x}{@\\' });
    const e = onlyEntry(bibtexEntry(r));
    expect(field(e, 'doi')).toBe('{10.1234/x%5Cinput/etc/hostname%5Crelax%7B%7D%5E%5E5c%20%40}');
    expect(field(e, 'url')).toBe('{https://example.org/a%20b%5Cinput%7Bx%7D%5E%5E5c%40d%22%3C%3E%7C%60}');
    expect(field(e, 'eprint')).toBe('{x%7D%7B%40%5C}');
  });

  it('a valid DOI and URL are written unchanged, including SICI characters and %XX escapes', () => {
    // Payne 1972, J. Atmos. Sci. 29, 959: the SICI-style DOI as registered (seeds/sources.json).
    const e = onlyEntry(bibtexEntry(record({ doi: '10.1175/1520-0469(1972)029<0959:AOTSS>2.0.CO;2', url: 'https://example.org/a_b%20c?x=1&y=2#top' })));
    expect(field(e, 'doi')).toBe('{10.1175/1520-0469(1972)029<0959:AOTSS>2.0.CO;2}');
    expect(field(e, 'url')).toBe('{https://example.org/a_b%20c?x=1&y=2#top}');
  });

  it('refuses to write an unsafe key or a key that would close the entry', () => {
    for (const key of ['x},@article{y', 'a b', 'Key,', '{x}', '']) {
      const err = catchError(() => bibtexEntry(record({ key })));
      expect(err.code, key).toBe('internal');
      expect(err.issues[0]!.path).toBe('key');
    }
  });

  it('the header names the versions in comment lines that hold no @, even from hostile version strings', () => {
    const bib = toBibtex([record({})], { hesperVersion: '0.2.0\n@article{Forged,', catalogVersion: 'abcdef0123456789@}' });
    expect(bib.split('\n')[0]).toBe('% written by hesper 0.2.0articleForged, catalog abcdef012345');
    expect(bib.match(/@/g)).toHaveLength(1);
    onlyEntry(bib);
    const plain = toBibtex([record({})], { hesperVersion: '0.2.0', catalogVersion: 'ffeeddccbbaa99887766' });
    expect(plain.split('\n')[0]).toBe('% written by hesper 0.2.0, catalog ffeeddccbbaa');
    expect(plain.split('\n')[1]).toMatch(/url .*hyperref/);
    expect(toBibtex([record({})])).toMatch(/^@article\{/);
  });
});

describe('the whole curated catalog through the strict reader', () => {
  let sources: SourceRecord[];
  beforeAll(() => {
    const catalog = openCatalog({ path: tempDbPath() });
    sources = catalog.listSources();
    catalog.close();
  });
  afterAll(cleanupTemp);

  it('gives exactly one entry per source, under its key, with no repeated field', () => {
    const read = readBibStrict(toBibtex(sources, { hesperVersion: '0.1.0', catalogVersion: '0123456789abcdef' }));
    expect(read.commands).toEqual([]);
    expect(read.entries.map((e) => e.key)).toEqual(sources.map((s) => s.key));
    for (const e of read.entries) expect(new Set(e.fields.map((f) => f.name)).size, e.key).toBe(e.fields.length);
  });
});
