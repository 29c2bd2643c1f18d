import { mkdtempSync, readFileSync, writeFileSync, copyFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/run-cli.ts';

const demoDir = new URL('../../demo-data/', import.meta.url).pathname;
const base = () => JSON.parse(readFileSync(`${demoDir}systems/corvina-b.json`, 'utf8'));

function writeCase(name: string, json: unknown | string, extra: Record<string, string> = {}): { dir: string; file: string } {
  const dir = mkdtempSync(path.join(tmpdir(), 'hesper-interpret-'));
  const file = path.join(dir, `${name}.json`);
  writeFileSync(file, typeof json === 'string' ? json : JSON.stringify(json));
  for (const [f, text] of Object.entries(extra)) writeFileSync(path.join(dir, f), text);
  return { dir, file };
}

async function expectBadInput(json: unknown | string, field: RegExp, extra: Record<string, string> = {}) {
  const { dir, file } = writeCase('case', json, extra);
  const run = await runCli(['interpret', file, '--json'], { cwd: dir });
  expect(run.code).toBe(2);
  expect(run.stdout).toBe('');
  expect(run.stderr).toMatch(field);
  return run;
}

describe('hesper interpret', () => {
  it('prints the interpretation JSON with every documented field', async () => {
    const run = await runCli(['interpret', 'systems/corvina-b.json', '--json', '--samples', '1000', '--seed', '3'], { cwd: demoDir });
    expect(run.code).toBe(0);
    const j = JSON.parse(run.stdout);
    expect(Object.keys(j.geometricAlbedo)).toEqual(['median', 'lower68', 'upper68', 'lower95', 'upper95', 'upperLimit95', 'constraint']);
    expect(['measured', 'upper-limit', 'prior-dominated']).toContain(j.geometricAlbedo.constraint);
    expect(typeof j.reflectedLightDetected).toBe('boolean');
    for (const key of ['bondAlbedo', 'daysideTemperatureK', 'equilibriumTemperatureK', 'thermalDepthPpm', 'reflectedDepthPpm', 'thermalFraction', 'allReflectedGeometricAlbedo']) {
      expect(Object.keys(j[key])).toEqual(['median', 'lower68', 'upper68', 'lower95', 'upper95', 'upperLimit95']);
    }
    expect(typeof j.detected).toBe('boolean');
    expect(j.sensitivity).toHaveLength(4);
    expect(Object.keys(j.massEffects)).toEqual(['ellipsoidalPpm', 'beamingPpm', 'rvSemiAmplitudeMs']);
    expect(j.diagnostics).toMatchObject({ samples: 1000, seed: 3 });
    expect(j.diagnostics.effectiveSampleSize).toBeGreaterThan(0);
    expect(j.diagnostics.computeMs).toBeGreaterThan(0);
    expect(Array.isArray(j.warnings)).toBe(true);
  });

  it('prints a readable report by default', async () => {
    const run = await runCli(['interpret', 'systems/aurelia-b.json', '--samples', '500'], { cwd: demoDir });
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/geometric albedo A_g/);
    expect(run.stdout).toMatch(/assumptions that drove the result/);
  });

  it('bad input: missing field', async () => {
    const j = base();
    delete j.planet.radiusRatio;
    await expectBadInput(j, /planet\.radiusRatio: missing/);
  });

  it('bad input: NaN, as a JSON literal and as a string', async () => {
    await expectBadInput(JSON.stringify(base()).replace('"value":14', '"value":NaN'), /not valid JSON at line 1/);
    const j = base();
    j.measurements.eclipseDepthPpm.value = 'NaN';
    await expectBadInput(j, /measurements\.eclipseDepthPpm\.value: expected number, got "NaN"/);
  });

  it('bad input: negative radius', async () => {
    const j = base();
    j.star.radiusRsun = { value: -1.08, sigma: 0.03 };
    await expectBadInput(j, /star\.radiusRsun\.value: -1\.08 Rsun: must be in \(0, inf\)/);
  });

  it('bad input: a/R* < 1 and Rp/R* >= 1', async () => {
    const a = base();
    a.planet.scaledSemiMajorAxis = 0.9;
    await expectBadInput(a, /planet\.scaledSemiMajorAxis: 0\.9: must be in \(1, inf\)/);
    const k = base();
    k.planet.radiusRatio = 1;
    await expectBadInput(k, /planet\.radiusRatio: 1: must be in \(0, 1\)/);
  });

  it('bad input: unknown band', async () => {
    const j = base();
    j.band = 'ultraviolet-x';
    await expectBadInput(j, /band: .*ultraviolet-x.*kepler/);
  });

  it('bad input: unreadable samples file', async () => {
    const j = base();
    j.measurements.eclipseDepthPpm = { samplesFile: 'missing.csv', column: 'depth' };
    await expectBadInput(j, /measurements\.eclipseDepthPpm\.samplesFile: cannot read "missing\.csv"/);
    const bad = base();
    bad.measurements.eclipseDepthPpm = { samplesFile: 'bad.csv', column: 'depth' };
    await expectBadInput(bad, /line 3: "abc" is not a finite number/, { 'bad.csv': 'depth\n1\nabc\n' });
  });

  it('bad input: malformed response curve', async () => {
    const j = base();
    j.band = { responseFile: 'curve.csv' };
    await expectBadInput(j, /line 3/, { 'curve.csv': 'wavelength_nm,weight\n500,1\n480,1\n600,0\n' });
  });

  it('bad input: every problem on its own line, results never on stdout', async () => {
    const j = base();
    j.planet.radiusRatio = -0.1;
    j.planet.scaledSemiMajorAxis = 0.5;
    const run = await expectBadInput(j, /2 problems/);
    expect(run.stderr.split('\n').filter((l) => l.startsWith('  '))).toHaveLength(2);
  });

  it('bad options exit 2', async () => {
    const run = await runCli(['interpret', 'systems/corvina-b.json', '--samples', 'many'], { cwd: demoDir });
    expect(run.code).toBe(2);
    expect(run.stderr).toMatch(/--samples/);
  });

  it('a samples file next to the system file is read relative to it', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'hesper-samples-'));
    copyFileSync(`${demoDir}fixtures/samples-depth.json`, path.join(dir, 'sys.json'));
    copyFileSync(`${demoDir}fixtures/depth-samples.csv`, path.join(dir, 'depth-samples.csv'));
    const run = await runCli(['interpret', path.join(dir, 'sys.json'), '--json', '--samples', '500'], { cwd: tmpdir() });
    expect(run.code).toBe(0);
  });
});
