import { describe, expect, it } from 'vitest';
import { conditionalSpread, reachesZero, readConstraint } from '../../src/inference/constraint.ts';
import { inferAlbedo } from '../../src/inference/infer.ts';
import { summarize } from '../../src/inference/summary.ts';
import type { SensitivityRow } from '../../src/inference/types.ts';
import { resolveBand } from '../../src/physics/bandpass.ts';
import { daysideTemperatureK } from '../../src/physics/temperature.ts';
import { thermalEclipseDepth } from '../../src/physics/thermal.ts';
import { demoJson as demoSystem, loadDemo, parseJson } from './helpers.ts';

/** Quantile grid of a truncated normal N(mu, 1) on x >= 0 (1001 points), by inverting its CDF numerically. */
function truncatedNormalGrid(mu: number): Float64Array {
  const xs = Float64Array.from({ length: 20001 }, (_, k) => (k * (mu + 8)) / 20000);
  const pdf = xs.map((x) => Math.exp(-0.5 * (x - mu) ** 2));
  const cdf = new Float64Array(xs.length);
  for (let k = 1; k < xs.length; k++) cdf[k] = cdf[k - 1]! + 0.5 * (pdf[k]! + pdf[k - 1]!);
  const total = cdf[cdf.length - 1]!;
  const grid = new Float64Array(1001);
  let j = 0;
  for (let k = 0; k < 1001; k++) {
    const target = (k / 1000) * total;
    while (j < cdf.length - 1 && cdf[j + 1]! < target) j++;
    grid[k] = xs[j]!;
  }
  return grid;
}

const corner = (median: number, ruledOut = false): SensitivityRow => ({
  redistribution: 0, phaseIntegral: 1, geometricAlbedo: summarize([median, median]), deltaChiSquare: ruledOut ? 50 : 0, ruledOut,
});

describe('the albedo constraint states', () => {
  it('reads a truncated Gaussian as consistent with zero below about 1.7 sigma and bounded away above 2.2', () => {
    // derived: the 95 % highest-density interval of N(mu, 1) truncated at 0 reaches 0 for mu <= 1.66.
    expect(reachesZero(truncatedNormalGrid(1))).toBe(true);
    expect(reachesZero(truncatedNormalGrid(1.5))).toBe(true);
    expect(reachesZero(truncatedNormalGrid(2.5))).toBe(false);
    expect(reachesZero(truncatedNormalGrid(4))).toBe(false);
  });

  it('is prior-dominated when the corners the data allow disagree by more than the 68 % width', () => {
    const g = truncatedNormalGrid(4);
    // 68 % width of N(4, 1): 2 (derived).
    expect(readConstraint(g, 3, 5, [corner(3.5), corner(4.5)]).constraint).toBe('measured');
    expect(readConstraint(g, 3, 5, [corner(2), corner(6)]).constraint).toBe('prior-dominated');
    // A corner the data rule out does not count.
    expect(readConstraint(g, 3, 5, [corner(3.9), corner(4.1), corner(9, true)]).constraint).toBe('measured');
    expect(readConstraint(truncatedNormalGrid(1), 0.3, 1.8, [corner(0.9), corner(1.1)]).constraint).toBe('upper-limit');
  });

  it('reads the posterior\'s own dependence on eps', () => {
    // Invented: 900 prior draws with eps = k/899; posterior draws pick every draw once.
    const eps = Float64Array.from({ length: 900 }, (_, k) => k / 899);
    const index = Int32Array.from({ length: 900 }, (_, k) => k);
    // derived: A_g = 0.4 eps gives medians 0.4/6 and 0.4 x 5/6 in the bottom and top thirds: spread 0.267.
    expect(conditionalSpread(eps, index, Float64Array.from(eps, (e) => 0.4 * e))!).toBeCloseTo(0.2667, 2);
    expect(conditionalSpread(eps, index, Float64Array.from(eps, () => 0.3))!).toBe(0);
    // A spread above half the 68 % width makes the albedo prior-dominated even when the corners agree.
    expect(readConstraint(truncatedNormalGrid(4), 3, 5, [corner(3.9), corner(4.1)], 1.2).constraint).toBe('prior-dominated');
    expect(readConstraint(truncatedNormalGrid(4), 3, 5, [corner(3.9), corner(4.1)], 0.8).constraint).toBe('measured');
    // When the data pin eps to one third, the comparison is skipped.
    expect(conditionalSpread(eps, Int32Array.from({ length: 300 }, (_, k) => k), Float64Array.from({ length: 300 }, () => 0.1))).toBeNull();
  });

  it('keeps `detected` for the eclipse signal and reports reflected light separately', () => {
    // Fixture T (invented): a 28-sigma eclipse that is all thermal emission.
    const r = inferAlbedo(loadDemo('fixtures/thermal-only.json'));
    expect(r.detected).toBe(true);
    expect(r.geometricAlbedo.constraint).toBe('upper-limit');
    expect(r.reflectedLightDetected).toBe(false);
  });
});

describe('synthetic truth: A_g = 0.10, eps = 0.2 injected (invented system)', () => {
  // Invented hot Jupiter in the TESS band: T* = 6000 K, Rp/R* = 0.1, a/R* = 5, i = 90 deg, q = 1.5 (fixed).
  const band = resolveBand('tess');
  const ag = 0.1;
  const q = 1.5;
  const eps = 0.2;
  const tDay = daysideTemperatureK(6000, 5, q * ag, eps);
  // derived: reflected A_g (k/aR)^2 = 400 ppm x 0.1 = 40 ppm, thermal k^2 F(T_day)/F(T*) from the band integrals.
  const depthPpm = 1e6 * (ag * (0.1 / 5) ** 2 + thermalEclipseDepth(0.1, tDay, 6000, band));
  const system = (withDayside: boolean) => parseJson({
    name: 'Synthetic (invented)',
    band: 'tess',
    star: { teffK: { value: 6000, sigma: 30 } },
    planet: { radiusRatio: { value: 0.1, sigma: 0.0005 }, scaledSemiMajorAxis: { value: 5, sigma: 0.02 }, inclinationDeg: 90 },
    measurements: {
      eclipseDepthPpm: { value: depthPpm, sigma: 4 },
      ...(withDayside ? { daysideTemperatureK: { value: tDay, sigma: 30 } } : {}),
    },
    assumptions: { phaseIntegral: q, samples: 4000 },
  });

  it('recovers the injected albedo within the 95 % interval when the dayside temperature is measured', () => {
    const r = inferAlbedo(system(true));
    expect(r.geometricAlbedo.lower95).toBeLessThan(ag);
    expect(r.geometricAlbedo.upper95).toBeGreaterThan(ag);
    expect(Math.abs(r.geometricAlbedo.median - ag)).toBeLessThan(r.geometricAlbedo.upper68 - r.geometricAlbedo.lower68);
    expect(r.geometricAlbedo.constraint).toBe('measured');
    expect(r.reflectedLightDetected).toBe(true);
  });

  it('without the dayside temperature the same depth is not a measurement of the albedo', () => {
    const r = inferAlbedo(system(false));
    expect(r.geometricAlbedo.constraint).not.toBe('measured');
    expect(r.reflectedLightDetected).toBe(false);
    expect(r.detected).toBe(true);
  });
});

describe('the local-equilibrium dayside map in the posterior (invented ultra-hot giant, Tessaly b)', () => {
  it('brightens the thermal term, lowers A_g, and the sensitivity section shows by how much', () => {
    const j = JSON.parse(JSON.stringify(demoSystem('systems/tessaly-b.json')));
    const uniform = inferAlbedo(parseJson(j));
    j.assumptions = { thermal: 'local-equilibrium' };
    const local = inferAlbedo(parseJson(j));
    // The same depth with a brighter thermal term leaves less for reflection (derived: C(T_day, eps) >= 1).
    expect(local.geometricAlbedo.median).toBeLessThan(uniform.geometricAlbedo.median);
    expect(uniform.thermalMapSensitivity).toMatchObject({ used: 'uniform', alternative: 'local-equilibrium' });
    expect(uniform.thermalMapSensitivity!.medianShift).toBeLessThan(0);
    expect(local.thermalMapSensitivity).toMatchObject({ used: 'local-equilibrium', alternative: 'uniform' });
    expect(local.assumptions.join('\n')).toMatch(/Dayside map: local equilibrium/);
  });
});
