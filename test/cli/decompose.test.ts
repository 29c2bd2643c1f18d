import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import type { CliIo } from '../../src/cli/io.ts';
import { main } from '../../src/cli/main.ts';
import { syntheticTimeSeries } from '../lightcurve/synthetic.ts';
import { DEMO_TRUTH, demoSpec } from '../lightcurve/make-demo-curve.ts';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const DEMO = 'demo-data/curves/tessaly-b-tess.csv';
const GEOMETRY = ['--period', '1.27', '--epoch', '2460410.3172', '--radius-ratio', '0.0905', '--scaled-semi-major-axis', '3.42', '--inclination', '84.1'];

function capture(cwd = ROOT): CliIo & { stdout: string[]; stderr: string[] } {
  const stdout: string[] = [];
  const stderr: string[] = [];
  return { stdout, stderr, out: (t) => stdout.push(t), err: (t) => stderr.push(t), cwd, env: {} };
}

async function run(argv: string[], cwd = ROOT): Promise<{ code: number; out: string; err: string }> {
  const io = capture(cwd);
  const code = await main(argv, io);
  return { code, out: io.stdout.join('\n'), err: io.stderr.join('\n') };
}

describe('hesper decompose on the invented demo curve', () => {
  it('the demo file is what its generator writes (3888 rows, same numbers)', () => {
    const lines = readFileSync(path.join(ROOT, DEMO), 'utf8').trim().split('\n').filter((l) => !l.startsWith('#'));
    expect(lines[0]).toBe('time,flux,flux_err');
    expect(lines.length - 1).toBe(DEMO_TRUTH.points);
    const c = syntheticTimeSeries(demoSpec());
    for (const i of [0, 1, 1000, DEMO_TRUTH.points - 1]) {
      expect(lines[i + 1]).toBe(`${c.x[i]!.toFixed(6)},${c.flux[i]!.toFixed(7)},${c.fluxErr[i]!.toFixed(6)}`);
    }
  });

  it('--json gives the documented decomposition fields and recovers the injected signals within 3 sigma', async () => {
    const r = await run(['decompose', DEMO, ...GEOMETRY, '--offset', '--predicted-beaming', '3.6,0.5', '--json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    for (const k of ['eclipseDepthPpm', 'phaseAmplitudePpm', 'ellipsoidalAmplitudePpm', 'beamingAmplitudePpm', 'phaseOffsetDeg']) {
      expect(Object.keys(j[k]).sort(), k).toEqual(['sigma', 'value']);
    }
    expect(Object.keys(j.covariance).sort()).toEqual(['matrix', 'names']);
    for (const k of ['reducedChiSquare', 'residualPpm', 'points']) expect(typeof j[k], k).toBe('number');
    // Injected values: demo-data/curves/README.md (invented).
    const near = (q: { value: number; sigma: number }, truth: number): void => {
      expect(Math.abs(q.value - truth) / q.sigma).toBeLessThan(3);
    };
    near(j.eclipseDepthPpm, DEMO_TRUTH.eclipseDepthPpm);
    near(j.phaseAmplitudePpm, DEMO_TRUTH.phaseAmplitudePpm);
    near(j.phaseOffsetDeg, DEMO_TRUTH.phaseOffsetDeg);
    near(j.ellipsoidalAmplitudePpm, DEMO_TRUTH.ellipsoidalAmplitudePpm);
    near(j.brightnessMap.hotspotLongitudeDeg, DEMO_TRUTH.phaseOffsetDeg);
    expect(j.model.sineTerm).toBe('offset-beaming-fixed');
    expect(j.beamingAmplitudePpm).toEqual({ value: 3.6, sigma: 0.5 });
    // derived: 3888 points minus the masked transit.
    expect(j.points + j.data.maskedTransitPoints).toBe(DEMO_TRUTH.points);
  });

  it('prints a readable report by default, with the mass check naming the offset', async () => {
    const r = await run(['decompose', DEMO, ...GEOMETRY, '--predicted-beaming', '3.6,0.5']);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/eclipse depth\s+\d+\.\d \+- \d+\.\d ppm/);
    expect(r.out).toMatch(/phase offset\s+not measured\s+held at 0/);
    expect(r.out).toMatch(/brightness map \(first order/);
    // Without --offset the planet's 8-degree offset lands in the sine term (README: ~29 ppm).
    expect(r.out).toMatch(/beaming\s+.* ppm: \d\.\d sigma, higher/);
    expect(r.out).toMatch(/eastward phase offset/);
  });

  it('--system-out writes the measurement block of a system file', async () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), 'hesper-decompose-'));
    const r = await run(['decompose', path.join(ROOT, DEMO), ...GEOMETRY, '--offset', '--predicted-beaming', '3.6,0.5', '--system-out', 'm.json'], dir);
    expect(r.code).toBe(0);
    expect(r.err).toMatch(/wrote the measurement block to m.json/);
    const block = JSON.parse(readFileSync(path.join(dir, 'm.json'), 'utf8'));
    // The fixed beaming is an input, not a measurement: left out.
    expect(Object.keys(block.measurements)).toEqual(['eclipseDepthPpm', 'phaseAmplitudePpm', 'phaseOffsetDeg', 'ellipsoidalAmplitudePpm']);
    expect(Object.keys(block.measurements.eclipseDepthPpm).sort()).toEqual(['sigma', 'value']);
  });

  it('--help explains the beaming / offset degeneracy', async () => {
    const r = await run(['decompose', '--help']);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/one function for two signals/);
  });
});

describe('hesper decompose: bad input exits 2', () => {
  let dir = '';
  beforeAll(() => {
    dir = mkdtempSync(path.join(os.tmpdir(), 'hesper-badcsv-'));
  });

  const cases: Array<[string, string, RegExp]> = [
    ['missing column', '# c\ntime,flux\n1,1\n', /line 2: header lacks column flux_err/],
    ['non-numeric cell', 'time,flux,flux_err\n1,1,0.001\n2,one,0.001\n', /line 3, flux: "one" is not a number/],
    ['unsorted times', 'time,flux,flux_err\n1,1,0.001\n3,1,0.001\n2,1,0.001\n', /line 4, time: time 2 is earlier than 3 on line 3/],
    ['duplicate times', 'time,flux,flux_err\n1,1,0.001\n1,1,0.001\n', /line 3, time: time 1 duplicates line 2/],
    ['short row', 'time,flux,flux_err\n1,1,0.001\n2,1\n', /line 3: 2 cells/],
    ['zero error', 'time,flux,flux_err\n1,1,0\n', /line 2, flux_err: flux_err = 0: must be > 0/],
  ];
  for (const [name, text, pattern] of cases) {
    it(name, async () => {
      const file = `${name.replace(/ /g, '-')}.csv`;
      writeFileSync(path.join(dir, file), text);
      const r = await run(['decompose', file, ...GEOMETRY], dir);
      expect(r.code).toBe(2);
      expect(r.err).toMatch(/error \[bad-light-curve\]/);
      expect(r.err).toMatch(pattern);
      expect(r.out).toBe('');
    });
  }

  it('a missing file, a missing geometry and bad options', async () => {
    const missing = await run(['decompose', 'nope.csv', ...GEOMETRY], dir);
    expect(missing.code).toBe(2);
    expect(missing.err).toMatch(/file-unreadable/);
    const noGeometry = await run(['decompose', path.join(ROOT, DEMO), '--period', '1.27', '--epoch', '2460410.3172']);
    expect(noGeometry.code).toBe(2);
    expect(noGeometry.err).toMatch(/--radius-ratio, --scaled-semi-major-axis, --inclination/);
    const both = await run(['decompose', DEMO, ...GEOMETRY, '--duration', '2']);
    expect(both.code).toBe(2);
    expect(both.err).toMatch(/either --duration or --radius-ratio/);
    const noPeriod = await run(['decompose', DEMO, '--duration', '2']);
    expect(noPeriod.code).toBe(2);
    expect(noPeriod.err).toMatch(/--period/);
    const badModel = await run(['decompose', DEMO, ...GEOMETRY, '--phase-model', 'sphere']);
    expect(badModel.code).toBe(2);
    const badPrediction = await run(['decompose', DEMO, ...GEOMETRY, '--predicted-beaming', '3,x']);
    expect(badPrediction.code).toBe(2);
    expect(badPrediction.err).toMatch(/--predicted-beaming 3,x/);
    const badK = await run(['decompose', DEMO, ...GEOMETRY.slice(0, 4), '--radius-ratio', '1.2', '--scaled-semi-major-axis', '3.42', '--inclination', '84.1']);
    expect(badK.code).toBe(2);
    expect(badK.err).toMatch(/radiusRatio = 1.2: must be in \(0, 1\)/);
  });

  it('a time series without --epoch; a folded curve notes that --epoch is unused', async () => {
    const noEpoch = await run(['decompose', DEMO, '--period', '1.27', '--duration', '3']);
    expect(noEpoch.code).toBe(2);
    expect(noEpoch.err).toMatch(/epoch/);
    const lines = ['phase,flux,flux_err'];
    for (let i = 0; i < 400; i++) lines.push(`${(i + 0.5) / 400},${1 + 1e-4 * Math.cos((4 * Math.PI * (i + 0.5)) / 400)},0.0001`);
    writeFileSync(path.join(dir, 'folded.csv'), lines.join('\n'));
    const folded = await run(['decompose', 'folded.csv', '--period', '1.27', '--epoch', '5', '--duration', '3', '--json'], dir);
    expect(folded.code).toBe(0);
    expect(folded.err).toMatch(/--epoch is not used/);
    // derived: the curve is 1 + 100 ppm cos(4 pi phi), i.e. an ellipsoidal coefficient of -100 ppm.
    expect(JSON.parse(folded.out).ellipsoidalAmplitudePpm.value).toBeCloseTo(-100, 6);
  });
});
