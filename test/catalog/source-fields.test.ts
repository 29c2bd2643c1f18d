/**
 * Source records that the writers could not write safely are refused at input, naming
 * the field and the problem: through the schema, `catalog add` (exit 2), `catalog
 * import` (exit 2) and the API (400). Nothing is written.
 */
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { sourceRecordSchema } from '../../src/catalog/index.ts';
import { authorsProblem, doiProblem, textProblem, urlProblem } from '../../src/catalog/source-fields.ts';
import type { CliIo } from '../../src/cli/io.ts';
import { main } from '../../src/cli/main.ts';
import { errorOf, makeApi, postJson, type TestApi } from '../api/helpers.ts';
import { cleanupTemp, dumpDatabase, tempDir, userEntry } from './helpers.ts';

const FORGED_TITLE = 'real title}, year = 1999, note = x} @article(Schmid2006, author = "m", title = "forged") @comment(';

const source = (over: Record<string, unknown>) => ({ key: 'Invented2026a', authors: 'Nobody, A.', year: 2026, title: 'An invented title', journal: 'Invented Journal', ...over });

/** The message zod gives for one field, or undefined when the record is accepted. */
function refusal(over: Record<string, unknown>): { path: string; message: string } | undefined {
  const r = sourceRecordSchema.safeParse(source(over));
  if (r.success) return undefined;
  const issue = r.error.issues[0]!;
  return { path: issue.path.join('.'), message: issue.message };
}

describe('the field rules', () => {
  it('DOIs: the registered forms pass, backslashes, braces, ^, %, #, ", ?, @ and white space do not', () => {
    // DOIs as registered: Payne 1972 (SICI form, seeds/sources.json), Fulton et al. 2017 AJ 154, 109.
    for (const ok of ['10.1175/1520-0469(1972)029<0959:AOTSS>2.0.CO;2', '10.3847/1538-3881/aa80eb', '10.1002/(SICI)1097-4571[1]', '10.1000.10/abc']) {
      expect(doiProblem(ok), ok).toBeUndefined();
    }
    for (const [bad, why] of [
      ['10.1234/x\\input/etc/hostname\\relax', /"\\"/],
      ['10.1234/x{y}', /"\{"/],
      ['10.1234/^^5cinput', /"\^"/],
      ['10.1234/a b', /white space/],
      ['10.1234/a%2Fb', /"%"/],
      ['10.1234/a#b', /"#"/],
      ['10.1234/a@b', /"@"/],
      ['https://doi.org/10.1234/x', /without https:\/\/doi\.org/],
      ['11.1234/x', /starts with 10\./],
      ['10.12/x', /starts with 10\./],
    ] as const) {
      expect(doiProblem(bad), bad).toMatch(why);
    }
  });

  it('URLs: RFC 3986 characters and %XX escapes pass; backslash, braces, ^, |, <, >, ", `, space, @ and a bare % do not', () => {
    for (const ok of ['https://ssd.jpl.nasa.gov/planets/phys_par.html', 'http://example.org/a_b%20c?x=1&y=2#top', 'https://example.org:8080/a/(b)/c;d=e,f*g+h!i~j', 'https://example.org']) {
      expect(urlProblem(ok), ok).toBeUndefined();
    }
    for (const [bad, why] of [
      ['https://example.org/\\input', /"\\"/],
      ['https://example.org/{x}', /"\{"/],
      ['https://example.org/^^5c', /"\^"/],
      ['https://example.org/a|b', /"\|"/],
      ['https://example.org/<script>', /"<"/],
      ['https://example.org/a"b', /"""/],
      ['https://example.org/a`b', /"`"/],
      ['https://example.org/a b', /white space/],
      ['https://user@example.org/', /may not contain @/],
      ['https://example.org/100%', /% in a URL must start a percent-escape/],
      ['javascript:alert(1)', /starts with http/],
      ['ftp://example.org/', /starts with http/],
    ] as const) {
      expect(urlProblem(bad), bad).toMatch(why);
    }
  });

  it('text: control and bidirectional characters are refused, everything printable passes', () => {
    expect(textProblem(FORGED_TITLE)).toBeUndefined();
    expect(textProblem('García Muñoz, α-MnS, 50 % & more, <b> | ~^\\')).toBeUndefined();
    expect(textProblem('right-to-left \u202E override')).toMatch(/U\+202E at position 15/);
    expect(textProblem('isolate \u2066')).toMatch(/U\+2066/);
    expect(textProblem('bell \u0007')).toMatch(/U\+0007/);
    expect(textProblem('lone \uD800 surrogate')).toMatch(/unpaired surrogate/);
  });

  it('authors: braces only around a whole corporate name, no empty name, at most two commas, one line', () => {
    for (const ok of ['Nobody, A. and {NASA Space Science Data Coordinated Archive} and others', 'Smith, Jr., J.', 'A. Nobody']) expect(authorsProblem(ok), ok).toBeUndefined();
    expect(authorsProblem('Nobody, A.} and {x')).toMatch(/balanced/);
    expect(authorsProblem('{A} {B}')).toMatch(/whole corporate name/);
    expect(authorsProblem('Sm{i}th, J.')).toMatch(/whole corporate name/);
    expect(authorsProblem('{{nested}}')).toMatch(/whole corporate name/);
    expect(authorsProblem('Nobody, A. and and Doe, J.')).toMatch(/name 2 is empty/);
    expect(authorsProblem('a, b, c, d')).toMatch(/more than two commas/);
    expect(authorsProblem('Nobody, A.\nDoe, J.')).toMatch(/line break/);
  });

  it('the record schema names the field: title, authors, doi, url, note, volume', () => {
    expect(refusal({ title: FORGED_TITLE })).toBeUndefined();
    expect(refusal({ title: 'x \u202E y' })).toMatchObject({ path: 'title', message: expect.stringMatching(/U\+202E/) });
    expect(refusal({ authors: '{A} {B}' })).toMatchObject({ path: 'authors' });
    expect(refusal({ doi: '10.1234/x\\input/etc/hostname\\relax' })).toMatchObject({ path: 'doi', message: expect.stringMatching(/not allowed in a DOI/) });
    expect(refusal({ url: 'https://example.org/{x}' })).toMatchObject({ path: 'url', message: expect.stringMatching(/RFC 3986/) });
    expect(refusal({ note: 'x\u0000' })).toMatchObject({ path: 'note' });
    expect(refusal({ volume: 'x\u0085' })).toMatchObject({ path: 'volume' });
    expect(refusal({ key: 'x},@article{y' })).toMatchObject({ path: 'key' });
  });
});

describe('refusal through the CLI and the API', () => {
  let dir: string;
  let db: string;
  beforeEach(() => {
    dir = tempDir('hesper-fields-');
    db = path.join(dir, 'catalog.sqlite');
  });
  afterEach(cleanupTemp);

  async function run(args: string[]) {
    const out: string[] = [];
    const err: string[] = [];
    const io: CliIo = { out: (t) => out.push(t), err: (t) => err.push(t), cwd: dir, env: {} };
    const code = await main(args, io);
    return { code, out: out.join('\n'), err: err.join('\n') };
  }

  it('catalog add exits 2 naming the source field, and the database is unchanged', async () => {
    expect((await run(['catalog', 'list', '--db', db])).code).toBe(0);
    const before = dumpDatabase(db);
    for (const [over, field, why] of [
      [{ doi: '10.1234/x\\input/etc/hostname\\relax' }, 'doi', /not allowed in a DOI/],
      [{ url: 'https://example.org/a b{c}' }, 'url', /not allowed in a URL/],
      [{ authors: 'Nobody, A.} and {x' }, 'authors', /balanced/],
      [{ title: 'title \u202E reversed' }, 'title', /U\+202E/],
    ] as const) {
      writeFileSync(path.join(dir, 'entry.json'), JSON.stringify(userEntry('invented-hostile-source', { sources: [source(over)] })));
      const r = await run(['catalog', 'add', '--file', 'entry.json', '--db', db]);
      expect(r.code, field).toBe(2);
      expect(r.err).toMatch(new RegExp(`sources\\[0\\]\\.${field}: `));
      expect(r.err).toMatch(why);
      expect(dumpDatabase(db)).toEqual(before);
    }
  });

  it('catalog add accepts the forged title as plain text (the writer escapes it)', async () => {
    writeFileSync(path.join(dir, 'entry.json'), JSON.stringify(userEntry('invented-forged-title', { sources: [source({ title: FORGED_TITLE })] })));
    expect(await run(['catalog', 'add', '--file', 'entry.json', '--db', db])).toMatchObject({ code: 0, out: 'added invented-forged-title' });
    const bib = await run(['catalog', 'bib', 'Invented2026a', '--db', db]);
    expect(bib.out.match(/@/g)).toHaveLength(1);
  });

  it('catalog import exits 2 for a source key that would close a BibTeX entry', async () => {
    const header = 'id,name,category,quantity,band_min_nm,band_max_nm,value_min,value_nominal,value_max,provenance,sources';
    writeFileSync(path.join(dir, 'bad.csv'), `${header}\ninvented-csv-key,One,soil,surface,300,3000,0.1,0.2,0.3,memory,"x},@article{y"\n`);
    const r = await run(['catalog', 'import', 'bad.csv', '--db', db]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/line 2, sources: .*source key/);
  });
});

describe('refusal through the API', () => {
  let api: TestApi;
  beforeAll(() => {
    api = makeApi();
  });
  afterAll(() => api.close());

  it('answers 400 naming sources[0].doi and sources[0].url, and adds nothing', async () => {
    const before = api.catalog.listSources().length;
    const res = await postJson(api.app, '/api/catalog/entries', userEntry('api-hostile-source', {
      sources: [source({ doi: '10.1234/x\\input/etc/hostname\\relax', url: 'https://example.org/\\input{x}' })],
    }));
    expect(res.status).toBe(400);
    const issues = (await errorOf(res)).issues;
    expect(issues.map((i) => i.path)).toEqual(expect.arrayContaining(['sources[0].doi', 'sources[0].url']));
    expect(issues.find((i) => i.path === 'sources[0].doi')!.message).toMatch(/"\\"/);
    expect(api.catalog.listSources().length).toBe(before);
  });
});
