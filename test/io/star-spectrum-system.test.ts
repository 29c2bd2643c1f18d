/**
 * `star.spectrum` in the system file: a tabulated blackbody leaves the interpretation as
 * it is, the solar spectrum moves the thermal depth by its band-flux factor and the
 * beaming by its beaming factor, the assumptions say which star was used, and bad
 * spectra are refused naming the field (CLI exit 2, HTTP 400).
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import type { CliIo } from '../../src/cli/io.ts';
import { main } from '../../src/cli/main.ts';
import { inferAlbedo } from '../../src/inference/infer.ts';
import { starFactors } from '../../src/inference/star-model.ts';
import { parseSystem } from '../../src/io/system.ts';
import { planckLambda } from '../../src/physics/planck.ts';
import { demoSystem, makeApi, postJson } from '../api/helpers.ts';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const SOLAR = path.join(ROOT, 'test/fixtures/solar/e490-sun.csv');

function blackbodyTable(teffK: number): Array<[number, number]> {
  const t: Array<[number, number]> = [];
  for (let nm = 150; nm <= 15000; nm += 2) t.push([nm, planckLambda(nm * 1e-9, teffK) * 1e-13]);
  return t;
}

async function run(argv: string[], cwd: string): Promise<{ code: number; out: string; err: string }> {
  const stdout: string[] = [];
  const stderr: string[] = [];
  const io: CliIo = { out: (t) => stdout.push(t), err: (t) => stderr.push(t), cwd, env: { HESPER_DB: path.join(cwd, 'c.sqlite') } };
  const code = await main(argv, io);
  return { code, out: stdout.join('\n'), err: stderr.join('\n') };
}

describe('star.spectrum in the posterior', () => {
  const base = demoSystem('tessaly-b');
  const teff = base.star.teffK.value as number;

  it('a tabulated blackbody at T_eff reproduces the default thermal depth and beaming to 1e-4', () => {
    const plain = inferAlbedo(parseSystem(base), { samples: 1000 });
    const withTable = parseSystem({ ...base, star: { ...base.star, spectrum: { table: blackbodyTable(teff) } } });
    const f = starFactors(withTable)!;
    expect(Math.abs(f.fluxFactor - 1)).toBeLessThan(1e-4);
    expect(Math.abs(f.beamingFactor - 1)).toBeLessThan(1e-4);
    const tabulated = inferAlbedo(withTable, { samples: 1000 });
    expect(Math.abs(tabulated.thermalDepthPpm.median / plain.thermalDepthPpm.median - 1)).toBeLessThan(1e-4);
    expect(Math.abs(tabulated.massEffects!.beamingPpm.median / plain.massEffects!.beamingPpm.median - 1)).toBeLessThan(1e-4);
    expect(plain.assumptions.join(' ')).toMatch(/Star: blackbody at its effective temperature/);
    expect(tabulated.assumptions.join(' ')).toMatch(/Star: tabulated spectrum "inline table" \(7426 points, 150-15000 nm\) in place of a blackbody/);
  });

  it('a pure-thermal planet: the thermal depth scales as 1 / the spectrum\'s band-flux factor', () => {
    // The solar spectrum on an invented Sun-like host (T_eff 5772 K, IAU 2015 Resolution B3),
    // with a depth so uncertain that the likelihood is flat: the posterior is the prior, so
    // both runs keep the same draws and only the star's band flux differs.
    const sunLike = { ...base, star: { ...base.star, teffK: 5772 }, measurements: { eclipseDepthPpm: { value: 100, sigma: 1e6 } } };
    const table = readFileSync(SOLAR, 'utf8').split('\n').filter((l) => /^\d/.test(l)).map((l) => l.split(',').map(Number) as [number, number]);
    const plain = inferAlbedo(parseSystem(sunLike), { samples: 1000 });
    const solar = parseSystem({ ...sunLike, star: { ...sunLike.star, spectrum: { table } } });
    const f = starFactors(solar)!;
    const r = inferAlbedo(solar, { samples: 1000 });
    // derived: delta_th = k^2 F(T_day) / (F_BB(T*) x factor), the same draws (seeded).
    expect(plain.thermalDepthPpm.median / r.thermalDepthPpm.median).toBeCloseTo(f.fluxFactor, 2);
    expect(r.massEffects!.beamingPpm.median / plain.massEffects!.beamingPpm.median).toBeCloseTo(f.beamingFactor, 3);
    expect(r.assumptions.join(' ')).toMatch(/in band "tess" it gives \+0.\d\d % star band flux and -1.\d\d % beaming factor/);
  });
});

describe('bad spectra: exit 2 and HTTP 400 naming the field', () => {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'hesper-spectrum-'));
  const api = makeApi();
  afterAll(() => api.close());

  const write = (name: string, spectrum: unknown, extra: Record<string, string> = {}): string => {
    for (const [f, text] of Object.entries(extra)) writeFileSync(path.join(dir, f), text);
    const s = demoSystem('tessaly-b');
    s.star.spectrum = spectrum;
    writeFileSync(path.join(dir, name), JSON.stringify(s));
    return name;
  };

  it('CLI: a file with a negative flux, one that does not cover the band; the solar file works', async () => {
    const neg = await run(['interpret', write('neg.json', { file: 'neg.csv' }, { 'neg.csv': 'wavelength_nm,flux\n300,1\n700,-1\n1200,1\n' }), '--json', '--samples', '200'], dir);
    expect(neg.code).toBe(2);
    expect(neg.err).toMatch(/star\.spectrum\.file \(neg\.csv:3\).*flux -1 is negative/);
    const short = await run(['interpret', write('short.json', { file: 'short.csv' }, { 'short.csv': 'wavelength_um,flux\n0.3,1\n0.5,1\n0.8,1\n' }), '--json', '--samples', '200'], dir);
    expect(short.code).toBe(2);
    expect(short.err).toMatch(/star\.spectrum.*covers 300-800 nm but band "tess" needs 600-1000 nm/);
    writeFileSync(path.join(dir, 'sun.csv'), readFileSync(SOLAR));
    const ok = await run(['interpret', write('sun.json', { file: 'sun.csv' }), '--json', '--samples', '200'], dir);
    expect(ok.code).toBe(0);
    expect(JSON.parse(ok.out).assumptions.join(' ')).toMatch(/tabulated spectrum "sun.csv" \(1591 points/);
  });

  it('API: an inline table with a negative flux, too few points, decreasing wavelengths; a file reference', async () => {
    const cases: Array<[unknown, RegExp, RegExp]> = [
      [{ table: [[500, 1], [800, -3], [1100, 1]] }, /^star\.spectrum\.table\[1\]$/, /flux -3 is negative/],
      [{ table: [[500, 1], [1100, 1]] }, /^star\.spectrum\.table$/, /at least 3/],
      [{ table: [[500, 1], [1100, 1], [900, 1]] }, /^star\.spectrum\.table\[2\]$/, /must increase strictly/],
      [{ file: 'sun.csv' }, /^star\.spectrum\.file$/, /read by the CLI only/],
    ];
    for (const [spectrum, pathPattern, message] of cases) {
      const s = demoSystem('tessaly-b');
      s.star.spectrum = spectrum;
      const res = await postJson(api.app, '/api/interpret', s);
      expect(res.status).toBe(400);
      const issues = ((await res.json()) as { error: { issues: Array<{ path: string; message: string }> } }).error.issues;
      expect(issues.some((i) => pathPattern.test(i.path) && message.test(i.message)), JSON.stringify(issues)).toBe(true);
    }
  });
});
