import { describe, expect, it } from 'vitest';
import { longitudinalMap } from '../../src/lightcurve/brightness-map.ts';
import { gaussian, seededRng } from './synthetic.ts';

const N = 2048;

/**
 * Phase curve of a longitudinal map by direct numerical integration of the edge-on
 * kernel (Cowan & Agol 2008, ApJ 678, L129): F(phi) = (1/2) integral M(lambda)
 * max(cos(lambda - lambda_obs), 0) dlambda with lambda_obs = pi - 2 pi phi; the factor 1/2
 * makes a uniform map M = Fbar give F = Fbar. Returns the first harmonics of F.
 */
function harmonicsOfMap(map: (lambda: number) => number): { a1: number; b1: number; mean: number } {
  let mean = 0, a1 = 0, b1 = 0;
  for (let j = 0; j < N; j++) {
    const phase = (j + 0.5) / N;
    const obs = Math.PI - 2 * Math.PI * phase;
    let f = 0;
    for (let k = 0; k < N; k++) {
      const lambda = ((k + 0.5) / N) * 2 * Math.PI;
      f += map(lambda) * Math.max(Math.cos(lambda - obs), 0);
    }
    f *= (2 * Math.PI) / N / 2;
    mean += f / N;
    a1 += (-2 * f * Math.cos(2 * Math.PI * phase)) / N;
    b1 += (2 * f * Math.sin(2 * Math.PI * phase)) / N;
  }
  return { a1, b1, mean };
}

describe('longitudinalMap', () => {
  it('inverts the edge-on kernel: hot spot, brightest and darkest longitude', () => {
    const lambda0 = (25 * Math.PI) / 180;
    const mean = 100;
    const m = 60;
    // A second harmonic in the map changes the phase curve only at second order and is
    // invisible to the first-order map (derived: the kernel's n = 2 term is orthogonal to n = 1).
    const h = harmonicsOfMap((l) => mean + m * Math.cos(l - lambda0) + 20 * Math.cos(2 * (l - lambda0)));
    const zero = [[0, 0, 0], [0, 0, 0], [0, 0, 0]];
    const map = longitudinalMap({ cosinePpm: h.a1, sinePpm: h.b1, meanFluxPpm: h.mean, covariance: zero });
    // derived: the map was built with its hot spot at +25 deg (east), M_max = 160, M_min = 40.
    expect(map.hotspotLongitudeDeg.value).toBeCloseTo(25, 4);
    expect(map.maxBrightnessPpm!.value).toBeCloseTo(160, 3);
    expect(map.minBrightnessPpm!.value).toBeCloseTo(40, 3);
    expect(map.dayNightContrast!.value).toBeCloseTo(120 / 160, 5);
    expect(map.physical).toBe(true);
    // An eastward hot spot brightens the planet before eclipse: positive sine coefficient.
    expect(h.b1).toBeGreaterThan(0);
  });

  it('propagates errors like a Monte Carlo over (a1, b1, Fbar)', () => {
    const x = [30, 12, 80];
    // a covariance with correlations (ppm^2)
    const cov = [[4, 0.5, -1.5], [0.5, 3, 0.2], [-1.5, 0.2, 9]];
    const map = longitudinalMap({ cosinePpm: x[0]!, sinePpm: x[1]!, meanFluxPpm: x[2]!, covariance: cov });
    // Cholesky factor of cov, by hand-coded 3x3 decomposition.
    const L = [[0, 0, 0], [0, 0, 0], [0, 0, 0]];
    for (let i = 0; i < 3; i++) for (let j = 0; j <= i; j++) {
      let s = cov[i]![j]!;
      for (let k = 0; k < j; k++) s -= L[i]![k]! * L[j]![k]!;
      L[i]![j] = i === j ? Math.sqrt(s) : s / L[j]![j]!;
    }
    const rng = seededRng(7);
    const draws = 20000;
    const lon: number[] = [], con: number[] = [], mn: number[] = [];
    for (let d = 0; d < draws; d++) {
      const z = [gaussian(rng), gaussian(rng), gaussian(rng)];
      const v = [0, 1, 2].map((i) => x[i]! + [0, 1, 2].reduce((s, k) => s + L[i]![k]! * z[k]!, 0));
      const r = longitudinalMap({ cosinePpm: v[0]!, sinePpm: v[1]!, meanFluxPpm: v[2]!, covariance: cov });
      lon.push(r.hotspotLongitudeDeg.value);
      con.push(r.dayNightContrast!.value);
      mn.push(r.minBrightnessPpm!.value);
    }
    const sd = (a: number[]): number => {
      const m = a.reduce((s, v) => s + v, 0) / a.length;
      return Math.sqrt(a.reduce((s, v) => s + (v - m) ** 2, 0) / (a.length - 1));
    };
    // Tolerance 4 %: the Monte Carlo standard deviation has a relative error of
    // 1/sqrt(2 N) = 0.5 % (derived), plus the curvature of the map at these sigmas.
    expect(Math.abs(sd(lon) / map.hotspotLongitudeDeg.sigma - 1)).toBeLessThan(0.04);
    expect(Math.abs(sd(con) / map.dayNightContrast!.sigma - 1)).toBeLessThan(0.04);
    expect(Math.abs(sd(mn) / map.minBrightnessPpm!.sigma - 1)).toBeLessThan(0.04);
  });

  it('flags a map that goes negative and leaves the contrast out without a mean flux', () => {
    const cov = [[1, 0, 0], [0, 1, 0], [0, 0, 1]];
    const bad = longitudinalMap({ cosinePpm: 50, sinePpm: 0, meanFluxPpm: 20, covariance: cov });
    // derived: M_min = 20 - (4/pi) 50 = -43.7 < 0, contrast above 1.
    expect(bad.physical).toBe(false);
    expect(bad.dayNightContrast!.value).toBeGreaterThan(1);
    const noMean = longitudinalMap({ cosinePpm: 10, sinePpm: -10, meanFluxPpm: null, covariance: [[1, 0], [0, 1]] });
    // derived: atan2(-10, 10) = -45 deg (westward).
    expect(noMean.hotspotLongitudeDeg.value).toBeCloseTo(-45, 12);
    expect(noMean.dayNightContrast).toBeNull();
  });

  it('rejects NaN input', () => {
    expect(() => longitudinalMap({ cosinePpm: Number.NaN, sinePpm: 0, meanFluxPpm: 1, covariance: [] })).toThrow(/cosinePpm/);
  });
});
