import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadSystemFile } from '../../src/io/system-file.ts';
import { predictFromSystem, withCurveMeasurements } from '../../src/interpret/from-curve.ts';
import { inferAlbedo } from '../../src/inference/infer.ts';
import { decomposeWithSystem } from '../../src/cli/curve-route.ts';
import { runCli } from '../helpers/run-cli.ts';

const demo = new URL('../../demo-data/', import.meta.url).pathname;
const quietIo = { out: () => {}, err: () => {}, cwd: demo, env: {} };

describe('light-curve route: system file + curve', () => {
  it('takes the geometry and the predicted mass signals from the system', () => {
    const system = loadSystemFile('systems/tessaly-b.json', demo);
    const p = predictFromSystem(system);
    // The invented system file gives Rp/R* 0.0905 +- 0.0007, a/R* 3.42 +- 0.06, i 84.1 +- 0.9 deg.
    expect(p.geometry).toMatchObject({ kind: 'disks' });
    if (p.geometry.kind === 'disks') {
      expect(p.geometry.radiusRatio).toBeCloseTo(0.0905, 3);
      expect(p.geometry.scaledSemiMajorAxis).toBeCloseTo(3.42, 1);
      expect(p.geometry.inclinationDeg).toBeCloseTo(84.1, 0);
    }
    expect(p.periodDays).toBeCloseTo(1.27, 6);
    expect(p.ellipsoidalPpm!.value).toBeGreaterThan(0);
    expect(p.beamingPpm!.value).toBeGreaterThan(0);
  });

  it('feeds the decomposition into the posterior with the depth-amplitude correlation', () => {
    const system = loadSystemFile('systems/tessaly-b.json', demo);
    const d = decomposeWithSystem(system, 'curves/tessaly-b-tess.csv', { epoch: 2460410.3172, offset: true }, quietIo);
    const fromCurve = withCurveMeasurements(system, d, 'curves/tessaly-b-tess.csv');
    expect(fromCurve.measurements.eclipseDepthPpm).toEqual({ kind: 'normal', mean: d.eclipseDepthPpm!.value, sigma: d.eclipseDepthPpm!.sigma });
    expect(fromCurve.measurements.depthAmplitudeCorrelation).toBeGreaterThan(0);
    expect(fromCurve.measurements.phaseOffsetDeg?.kind).toBe('normal');
    expect(fromCurve.measurements.daysideTemperatureK).toBeUndefined();
    const r = inferAlbedo(fromCurve, { samples: 1000 });
    expect(r.assumptions.join(' ')).toMatch(/correlation .* joint likelihood/);
    expect(r.geometricAlbedo.median).toBeGreaterThanOrEqual(0);
  });

  it('decompose --system reads geometry from the system file', async () => {
    const run = await runCli(['decompose', 'curves/tessaly-b-tess.csv', '--system', 'systems/tessaly-b.json', '--epoch', '2460410.3172', '--json'], { cwd: demo });
    expect(run.code).toBe(0);
    const j = JSON.parse(run.stdout);
    // The invented curve was made with a 430 ppm eclipse (demo-data/curves/README.md); 3 sigma.
    expect(Math.abs(j.eclipseDepthPpm.value - 430)).toBeLessThan(3 * j.eclipseDepthPpm.sigma);
  });

  it('decompose --system refuses a second geometry and a time series without epoch', async () => {
    const both = await runCli(['decompose', 'curves/tessaly-b-tess.csv', '--system', 'systems/tessaly-b.json', '--epoch', '2460410.3172', '--duration', '2'], { cwd: demo });
    expect(both.code).toBe(2);
    expect(both.stderr).toMatch(/--duration/);
    const dir = mkdtempSync(path.join(tmpdir(), 'hesper-noepoch-'));
    const j = JSON.parse(readFileSync(`${demo}systems/tessaly-b.json`, 'utf8'));
    delete j.planet.transitEpochBjd;
    writeFileSync(path.join(dir, 'sys.json'), JSON.stringify(j));
    const noEpoch = await runCli(['decompose', `${demo}curves/tessaly-b-tess.csv`, '--system', path.join(dir, 'sys.json')], { cwd: dir });
    expect(noEpoch.code).toBe(2);
    expect(noEpoch.stderr).toMatch(/--epoch/);
  });

  it('interpret --curve builds the interpretation from the curve (epoch from planet.transitEpochBjd)', async () => {
    const run = await runCli(['interpret', 'systems/tessaly-b.json', '--curve', 'curves/tessaly-b-tess.csv', '--offset', '--json', '--samples', '800'], { cwd: demo });
    expect(run.code).toBe(0);
    const j = JSON.parse(run.stdout);
    expect(j.assumptions.join(' ')).toMatch(/Measurements from the light curve curves\/tessaly-b-tess\.csv/);
    expect(j.geometricAlbedo.median).toBeGreaterThanOrEqual(0);
    expect(j.verdict.cloudsOrIceRequired).toMatch(/^(yes|no|inconclusive)$/);
  });
});
