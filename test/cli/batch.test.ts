/**
 * `hesper batch FILE.csv --out RESULTS.csv`: run in-process with a captured CliIo on
 * temporary files and a fresh catalog. Every input row gets a results row in order; a
 * failing row carries its problems, led by the input column, and the others go on;
 * results equal the library's interpret() on the same rows (derived: same seed and
 * draws); a malformed header stops the batch with exit 2.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BATCH_FIELDS, batchColumnsHelp } from '../../src/batch/columns.ts';
import { columnOfPath, RESULT_COLUMNS } from '../../src/batch/results.ts';
import { readBatchCsv } from '../../src/batch/rows.ts';
import { parseCsv } from '../../src/catalog/csv.ts';
import { openCatalog } from '../../src/catalog/index.ts';
import { interpret } from '../../src/index.ts';
import { runCli } from '../helpers/run-cli.ts';

let dir: string;
let db: string;
beforeAll(() => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'hesper-batch-'));
  db = path.join(dir, 'catalog.sqlite');
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Invented rows: four good ones in different column forms, three bad ones. */
const INPUT = [
  '# invented planets for a test; none is real',
  'name,band,teffK,teffK_err,radiusRatio,radiusRatio_err,scaledSemiMajorAxis,scaledSemiMajorAxis_err,eclipseDepthPpm,eclipseDepthPpm_err,eclipseDepthPpm_errplus,eclipseDepthPpm_errminus,eclipseDepthPpm_upperlimit,phaseAmplitudePpm_min,phaseAmplitudePpm_max,samples,gridNodes,seed',
  'Good One b,tess,5600,80,0.1,0.001,6,0.1,40,8,,,,,,400,64,1',
  'Good Two b,kepler,5800,70,0.09,0.001,7.5,0.1,25,,5,-4,,,,400,64,2',
  '"Bad, Ratio b",cheops,5500,60,1.5,0.01,5,0.1,30,6,,,,,,400,64,3',
  'Good Three b,tophat:500-900,6100,90,0.11,0.002,5.2,0.1,,,,,60,,,400,64,4',
  'Bad Cell b,tess,5400,abc,0.1,0.001,6,0.1,40,8,,,,,,400,64,5',
  'No Band b,,5400,50,0.1,0.001,6,0.1,40,8,,,,,,400,64,6',
  'Good Four b,cheops,5300,50,0.08,0.001,8,0.2,20,6,,,,10,30,400,64,7',
].join('\n');

function results(file: string): Array<Record<string, string>> {
  const { records } = parseCsv(readFileSync(file, 'utf8'));
  const [head, ...rows] = records;
  return rows.map((r) => Object.fromEntries(head!.fields.map((h, i) => [h, r.fields[i] ?? ''])));
}

describe('hesper batch', () => {
  it('writes one results row per input row, in order; failing rows name their column and the rest go on', async () => {
    const input = path.join(dir, 'planets.csv');
    const out = path.join(dir, 'results.csv');
    writeFileSync(input, INPUT);
    const run = await runCli(['batch', 'planets.csv', '--out', 'results.csv', '--workers', '2', '--db', db], { cwd: dir, env: {} });
    expect(run.stderr).toMatch(/hesper batch: 7 rows, 4 ok, 3 failed \(see the error column\)/);
    expect(run.stderr).toMatch(/7\/7 rows \| 100%/);
    expect(run.code).toBe(0);
    expect(run.stdout).toBe('');

    const rows = results(out);
    expect(Object.keys(rows[0]!)).toEqual([...RESULT_COLUMNS]);
    expect(rows.map((r) => [r.line, r.name, r.status])).toEqual([
      ['3', 'Good One b', 'ok'], ['4', 'Good Two b', 'ok'], ['5', 'Bad, Ratio b', 'error'], ['6', 'Good Three b', 'ok'],
      ['7', 'Bad Cell b', 'error'], ['8', 'No Band b', 'error'], ['9', 'Good Four b', 'ok'],
    ]);
    expect(rows[2]!.error).toMatch(/^radiusRatio: .*\(0, 1\)/);
    expect(rows[4]!.error).toMatch(/^teffK_err: "abc" is not a finite number/);
    expect(rows[5]!.error).toMatch(/^band: empty/);
    for (const r of rows.filter((x) => x.status === 'ok')) expect(r.error).toBe('');

    // derived: the library on the same rows and catalog gives the same numbers (the CSV prints them in full).
    const catalog = openCatalog({ path: db, env: {} });
    const data = { entries: catalog.listEntries(), condensates: catalog.listCondensates() };
    catalog.close();
    const parsed = readBatchCsv(INPUT).rows;
    for (const [i, r] of rows.entries()) {
      if (r.status !== 'ok') continue;
      const lib = interpret(parsed[i]!.system, { catalog: data });
      expect(Number(r.geometricAlbedo_median)).toBe(lib.geometricAlbedo.median);
      expect(Number(r.geometricAlbedo_upper95)).toBe(lib.geometricAlbedo.upper95);
      expect(Number(r.thermalFraction_lower68)).toBe(lib.thermalFraction.lower68);
      expect(r.clouds_or_ice_required).toBe(lib.verdict.cloudsOrIceRequired);
      expect(r.band).toBe(lib.band.id);
    }
    // The asymmetric row kept |errminus|; the upper-limit row and the uniform phase amplitude were read as such.
    expect(parsed[1]!.system!.measurements).toEqual({ eclipseDepthPpm: { value: 25, plus: 5, minus: 4 } });
    expect(parsed[3]!.system!.measurements).toEqual({ eclipseDepthPpm: { upperLimit: 60, confidence: 0.95 } });
    expect(parsed[3]!.system!.band).toEqual({ tophatNm: [500, 900] });
    expect(parsed[6]!.system!.measurements).toEqual({ eclipseDepthPpm: { value: 20, sigma: 6 }, phaseAmplitudePpm: { min: 10, max: 30 } });
  });

  it('runs the invented demo sample of at least 50 planets, a results row for each', async () => {
    const sample = new URL('../../demo-data/batch/invented-sample.csv', import.meta.url).pathname;
    const text = readFileSync(sample, 'utf8');
    expect(text.split('\n')[0]).toMatch(/^# Invented planets/);
    const { rows } = readBatchCsv(text);
    expect(rows.length).toBe(60); // the count scripts/batch-sample.ts wrote (demo-data/batch/README.md)
    expect(rows.filter((r) => r.problems.length > 0)).toEqual([]);
    const out = path.join(dir, 'sample-results.csv');
    const run = await runCli(['batch', sample, '--out', out, '--samples', '200', '--db', db], { cwd: dir, env: {} });
    expect(run.code).toBe(0);
    const got = results(out);
    expect(got.length).toBe(60);
    expect(got.map((r) => r.name)).toEqual(rows.map((r) => r.name));
    expect(got.filter((r) => r.status === 'ok').length).toBeGreaterThanOrEqual(55);
    expect(new Set(got.map((r) => r.samples))).toEqual(new Set(['200']));
  });

  it.each([
    ['an unknown column', 'name,band,teffK,radiusRatio,scaledSemiMajorAxis,eclipseDepth', /unknown column "eclipseDepth"/],
    ['no band column', 'name,teffK,radiusRatio,scaledSemiMajorAxis,eclipseDepthPpm,eclipseDepthPpm_err', /"band" is required/],
    ['a repeated column', 'name,band,teffK,TEFFK,radiusRatio', /"teffK" repeats column 3/],
    ['an unpaired asymmetric error', 'name,band,teffK,eclipseDepthPpm,eclipseDepthPpm_errplus', /"eclipseDepthPpm_errplus" needs the column "eclipseDepthPpm_errminus"/],
  ])('stops before any row runs on %s (exit 2, message names the column)', async (_what, header, message) => {
    const input = path.join(dir, 'bad-header.csv');
    const out = path.join(dir, 'never.csv');
    writeFileSync(input, `${header}\nX b,tess,5000,0.1,5,40\n`);
    const run = await runCli(['batch', input, '--out', out, '--db', db], { cwd: dir, env: {} });
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/bad-batch-csv/);
    expect(run.stderr).toMatch(message);
    expect(() => readFileSync(out)).toThrow();
  });

  it('refuses an output file that is the input, and a missing input, with exit 2', async () => {
    const input = path.join(dir, 'same.csv');
    writeFileSync(input, INPUT);
    const same = await runCli(['batch', input, '--out', input, '--db', db], { cwd: dir, env: {} });
    expect(same.code).toBe(2);
    expect(same.stderr).toMatch(/--out .* is the input file/);
    expect(readFileSync(input, 'utf8')).toBe(INPUT);
    const missing = await runCli(['batch', 'nothing.csv', '--out', 'x.csv', '--db', db], { cwd: dir, env: {} });
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/file-unreadable/);
  });

  it('documents every column in --help, from the system-file schema', async () => {
    const help = await runCli(['batch', '--help']);
    expect(help.code).toBe(0);
    for (const f of BATCH_FIELDS) expect(help.stdout, f.name).toContain(f.name);
    for (const word of ['x_err', 'x_errplus', 'x_errminus', 'x_min', 'x_max', 'x_upperlimit', 'tophat:MIN-MAX', '--workers']) expect(help.stdout).toContain(word);
    expect(batchColumnsHelp()).toContain('eclipseDepthPpm');
    expect(BATCH_FIELDS.map((f) => f.name)).toEqual(expect.arrayContaining(['teffK', 'radiusRatio', 'scaledSemiMajorAxis', 'eclipseDepthPpm', 'phaseAmplitudePpm', 'samples', 'seed']));
  });

  it('maps issue paths of the system file back to input columns', () => {
    expect(columnOfPath('planet.radiusRatio.sigma')).toBe('radiusRatio_err');
    expect(columnOfPath('measurements.eclipseDepthPpm.minus')).toBe('eclipseDepthPpm_errminus');
    expect(columnOfPath('measurements.eclipseDepthPpm.upperLimit')).toBe('eclipseDepthPpm_upperlimit');
    expect(columnOfPath('star.teffK')).toBe('teffK');
    expect(columnOfPath('band.tophatNm')).toBe('band');
    expect(columnOfPath('measurements')).toBe('measurements');
  });
});
