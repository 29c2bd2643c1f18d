import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { parse } from '@retorquere/bibtex-parser';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { CliIo } from '../../src/cli/io.ts';
import { main } from '../../src/cli/main.ts';
import { cleanupTemp, dumpDatabase, tempDir, userEntry } from '../catalog/helpers.ts';

let dir: string;
let db: string;
beforeEach(() => {
  dir = tempDir('hesper-cli-');
  db = path.join(dir, 'catalog.sqlite');
});
afterEach(cleanupTemp);

async function run(args: string[], env: Record<string, string | undefined> = {}) {
  const out: string[] = [];
  const err: string[] = [];
  const io: CliIo = { out: (t) => out.push(t), err: (t) => err.push(t), cwd: dir, env };
  const code = await main(args, io);
  return { code, out: out.join('\n'), err: err.join('\n') };
}

describe('hesper catalog', () => {
  it('list prints an aligned table of the curated catalog, created on first use', async () => {
    const r = await run(['catalog', 'list', '--db', db]);
    expect(r.code).toBe(0);
    const lines = r.out.split('\n');
    expect(lines[0]).toMatch(/^ID\s+CATEGORY\s+QUANTITY\s+BAND nm\s+NOMINAL\s+RANGE\s+T K\s+PROVENANCE\s+ORIGIN$/);
    expect(lines[1]).toMatch(/^-+( +-+)+$/);
    const col = lines[0]!.indexOf('CATEGORY');
    const jupiter = lines.find((l) => l.startsWith('jupiter-bond-li2018 '))!;
    expect(jupiter.slice(col, col + 4)).toBe('body');
    expect(jupiter).toMatch(/bond\s+200-5000\s+0\.503\s+0\.491-0\.515\s+<=150\s+checked\s+curated/);
    expect(r.err).toMatch(/^\d+ entries$/);
  });

  it('list --json --category gives catalog-entry JSON with source keys and origin', async () => {
    const r = await run(['catalog', 'list', '--category', 'clear-atmosphere', '--json', '--db', db]);
    const list = JSON.parse(r.out) as Record<string, unknown>[];
    // The clear-atmosphere references of seeds/cloud-free.json: five regime-and-band entries.
    expect(list.length).toBeGreaterThanOrEqual(5);
    expect(list.every((e) => e.category === 'clear-atmosphere' && e.origin === 'curated' && Array.isArray(e.sources))).toBe(true);
    expect(Object.keys(list[0]!)).toEqual(expect.arrayContaining(['id', 'name', 'category', 'quantity', 'bandMinNm', 'bandMaxNm', 'valueMin', 'valueMax', 'valueNominal', 'temperatureMinK', 'temperatureMaxK', 'description', 'provenance', 'sources', 'origin']));
    const bad = await run(['catalog', 'list', '--category', 'plasma', '--db', db]);
    expect(bad.code).toBe(2);
    expect(bad.err).toContain('plasma');
  });

  it('list --search filters; the database comes from HESPER_DB when --db is absent', async () => {
    const r = await run(['catalog', 'list', '--search', 'titan', '--json'], { HESPER_DB: 'from-env.sqlite' });
    expect((JSON.parse(r.out) as { id: string }[]).map((e) => e.id)).toContain('titan-geometric-1075nm-coustenis1995');
    expect(dumpDatabase(path.join(dir, 'from-env.sqlite')).entries!.length).toBeGreaterThan(100);
  });

  it('show prints the entry with its citations; --json the entry; an unknown id exits 2', async () => {
    const r = await run(['catalog', 'show', 'mars-geometric-v-nssdc', '--db', db]);
    expect(r.code).toBe(0);
    expect(r.out).toContain('value        0.17 (range 0.17)');
    expect(r.out).toContain('[NSSDCMarsFact] Williams, D. R. (n.d.). Mars Fact Sheet.');
    const j = await run(['catalog', 'show', 'mars-geometric-v-nssdc', '--json', '--db', db]);
    expect(JSON.parse(j.out)).toMatchObject({ id: 'mars-geometric-v-nssdc', valueNominal: 0.17, sources: ['NSSDCMarsFact'], origin: 'curated' });
    const missing = await run(['catalog', 'show', 'no-such-entry', '--db', db]);
    expect(missing.code).toBe(2);
    expect(missing.err).toContain('error [not-found]');
    expect(missing.err).toContain('no catalog entry has id "no-such-entry"');
  });

  it('add --file adds a user entry; a bad file exits 2 naming each field', async () => {
    writeFileSync(path.join(dir, 'entry.json'), JSON.stringify(userEntry('invented-cli-entry')));
    const ok = await run(['catalog', 'add', '--file', 'entry.json', '--db', db]);
    expect([ok.code, ok.out]).toEqual([0, 'added invented-cli-entry']);
    writeFileSync(path.join(dir, 'bad.json'), JSON.stringify(userEntry('invented-cli-bad', { valueMin: 0.5, valueMax: 0.1, quantity: 'albedo' })));
    const bad = await run(['catalog', 'add', '--file', 'bad.json', '--db', db]);
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/^ {2}quantity: /m);
    writeFileSync(path.join(dir, 'broken.json'), '{ not json');
    expect((await run(['catalog', 'add', '--file', 'broken.json', '--db', db])).err).toContain('--file: broken.json is not valid JSON');
    expect((await run(['catalog', 'add', '--file', 'missing.json', '--db', db])).err).toContain('error [file-unreadable]');
  });

  it('remove deletes user rows and refuses curated rows, leaving the database unchanged', async () => {
    writeFileSync(path.join(dir, 'entry.json'), JSON.stringify([userEntry('invented-rm-1'), userEntry('invented-rm-2')]));
    expect((await run(['catalog', 'add', '--file', 'entry.json', '--db', db])).out).toBe('added invented-rm-1\nadded invented-rm-2');
    expect((await run(['catalog', 'remove', 'invented-rm-1', '--db', db])).out).toBe('removed invented-rm-1');
    const before = dumpDatabase(db);
    const refused = await run(['catalog', 'remove', 'jupiter-bond-li2018', '--db', db]);
    expect(refused.code).toBe(2);
    expect(refused.err).toContain('error [curated-row]');
    expect(refused.err).toContain('curated entries cannot be removed');
    expect(dumpDatabase(db)).toEqual(before);
  });

  it('import loads a CSV in one go and reports every bad row by line; help lists the columns', async () => {
    const header = 'id,name,category,quantity,band_min_nm,band_max_nm,value_min,value_nominal,value_max,provenance,sources';
    writeFileSync(path.join(dir, 'good.csv'), `${header}\ninvented-csv-1,One,soil,surface,300,3000,0.1,0.2,0.3,memory,Payne1972\n`);
    expect((await run(['catalog', 'import', 'good.csv', '--db', db])).out).toBe('imported 1 entry: invented-csv-1');
    writeFileSync(path.join(dir, 'bad.csv'), `${header}\ninvented-csv-2,Two,soil,surface,300,3000,0.1,0.2,0.3,memory,Payne1972\ninvented-csv-3,Three,soil,surface,300,3000,0.4,0.2,0.3,memory,Payne1972\ninvented-csv-4,Four,soil,surface,300,3000,0.1,0.2,0.3,rumour,Payne1972\n`);
    const before = dumpDatabase(db);
    const bad = await run(['catalog', 'import', 'bad.csv', '--db', db]);
    expect(bad.code).toBe(2);
    expect(bad.err).toContain('error [bad-csv]');
    expect(bad.err).toContain('line 3, value_min');
    expect(bad.err).toContain('line 4, provenance');
    expect(dumpDatabase(db)).toEqual(before);
    const help = await run(['catalog', 'import', '--help']);
    expect(help.code).toBe(0);
    for (const column of ['band_min_nm', 'value_nominal', 'temperature_max_k', 'provenance', 'sources']) expect(help.out).toContain(column);
  });

  it('export writes csv or json; bib emits parseable BibTeX for all or named keys', async () => {
    const csv = await run(['catalog', 'export', '--format', 'csv', '--category', 'lava', '--db', db]);
    expect(csv.out.split('\n')).toHaveLength(2);
    const json = JSON.parse((await run(['catalog', 'export', '--format', 'json', '--origin', 'curated', '--db', db])).out) as { sources: { key: string }[] }[];
    expect(json[0]!.sources[0]!.key).toBeTypeOf('string');
    expect((await run(['catalog', 'export', '--format', 'xml', '--db', db])).code).toBe(2);
    const bib = await run(['catalog', 'bib', 'Li2018Jupiter', 'GarciaMunozIsaak2015', '--db', db]);
    const lib = parse(bib.out);
    expect(lib.errors).toEqual([]);
    expect(lib.entries.map((e) => e.key)).toEqual(['Li2018Jupiter', 'GarciaMunozIsaak2015']);
    const unknown = await run(['catalog', 'bib', 'NoSuchKey', '--db', db]);
    expect([unknown.code, unknown.err.includes('no source has key "NoSuchKey"')]).toEqual([2, true]);
  });

  it('seed re-applies the curated seeds and keeps user entries', async () => {
    writeFileSync(path.join(dir, 'entry.json'), JSON.stringify(userEntry('invented-kept')));
    await run(['catalog', 'add', '--file', 'entry.json', '--db', db]);
    const r = await run(['catalog', 'seed', '--db', db]);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^seeded \d+ entries, \d+ sources and 10 condensation curves from \d+ files \(0 entries and 0 sources new or changed; 0 entries and 0 sources retired\)$/);
    expect(JSON.parse((await run(['catalog', 'show', 'invented-kept', '--json', '--db', db])).out).origin).toBe('user');
  });
});
