import { describe, expect, it } from 'vitest';
import { inferAlbedo } from '../../src/inference/infer.ts';
import { medianStandardError } from '../../src/inference/summary.ts';
import { demoJson, loadDemo, parseJson } from './helpers.ts';

describe('albedo posterior: analytic cases', () => {
  it('pure reflection with fixed geometry and a Gaussian depth gives the analytic A_g', () => {
    // Fixture P (invented): k = 0.1, a/R* = 8, i = 90 deg, depth 40 +- 5 ppm, thermal off.
    // derived: A_g = depth / (k/aR)^2 = 40e-6 / 1.5625e-4 = 0.256, sigma = 5e-6 / 1.5625e-4 = 0.032;
    // the prior edge 1/q = 0.667 is 13 sigma away, so the posterior is Gaussian.
    const r = inferAlbedo(loadDemo('fixtures/pure-reflection.json'));
    const halfWidth = (r.geometricAlbedo.upper68 - r.geometricAlbedo.lower68) / 2;
    expect(Math.abs(r.geometricAlbedo.median / 0.256 - 1)).toBeLessThan(0.02);
    expect(Math.abs(halfWidth / 0.032 - 1)).toBeLessThan(0.02);
    // derived: A_B = q A_g with q = 1.5 fixed
    expect(Math.abs(r.bondAlbedo.median / (1.5 * 0.256) - 1)).toBeLessThan(0.02);
    expect(r.thermalFraction.median).toBe(0);
    expect(r.detected).toBe(true); // 40 / 5 = 8 sigma
  });

  it('a thermal-only planet gives an albedo consistent with zero and an upper limit', () => {
    // Fixture T (invented): the measured depth equals the zero-albedo thermal depth.
    const r = inferAlbedo(loadDemo('fixtures/thermal-only.json'));
    expect(r.geometricAlbedo.lower95).toBeLessThan(0.01);
    expect(r.geometricAlbedo.upperLimit95).toBeGreaterThan(0);
    expect(r.geometricAlbedo.upperLimit95).toBeLessThan(0.15);
    expect(r.thermalFraction.median).toBeGreaterThan(0.9);
    expect(r.warnings.join('\n')).toMatch(/falls as A_g rises/);
    expect(r.warnings.join('\n')).toMatch(/Thermal emission makes up/);
  });

  it('a weak detection is reported as not detected', () => {
    const r = inferAlbedo(loadDemo('fixtures/weak-detection.json'));
    expect(r.detected).toBe(false); // 30 / 20 = 1.5 sigma
  });

  it('warns when the depth exceeds anything reflection and emission can give', () => {
    const j = demoJson('fixtures/pure-reflection.json');
    j.measurements.eclipseDepthPpm = { value: 400, sigma: 10 }; // derived: needs A_g = 2.56 > 1/q
    const r = inferAlbedo(parseJson(j));
    expect(r.warnings.join('\n')).toMatch(/larger than any reflection plus thermal emission/);
    expect(r.warnings.join('\n')).toMatch(/inflated radius ratio/);
  });

  it('reports mass effects and the sensitivity corners', () => {
    const r = inferAlbedo(loadDemo('systems/corvina-b.json'));
    expect(r.massEffects).toBeDefined();
    // The corners sit at the edges of the priors: eps uniform on [0, 1] and the default q
    // prior, uniform on [1, 1.61] (1.61 since the q prior covers isotropic scatterers with w >= 0.5).
    expect(r.sensitivity.map((s) => [s.redistribution, s.phaseIntegral])).toEqual([[0, 1], [0, 1.61], [1, 1], [1, 1.61]]);
    for (const s of r.sensitivity) expect(s.geometricAlbedo.upperLimit95).toBeLessThanOrEqual(1 / s.phaseIntegral + 1e-9);
  });
});

describe('albedo posterior: reproducibility', () => {
  it('the same seed gives byte-identical JSON (apart from the compute time)', () => {
    const s = loadDemo('systems/corvina-b.json');
    const a = inferAlbedo(s, { seed: 7 });
    const b = inferAlbedo(s, { seed: 7 });
    a.diagnostics.computeMs = 0;
    b.diagnostics.computeMs = 0;
    expect(JSON.stringify(b)).toBe(JSON.stringify(a));
  });

  it('a different seed moves the medians by less than the Monte Carlo error', () => {
    const s = loadDemo('systems/aurelia-b.json');
    const a = inferAlbedo(s, { seed: 1 });
    const b = inferAlbedo(s, { seed: 2 });
    for (const key of ['geometricAlbedo', 'bondAlbedo', 'daysideTemperatureK'] as const) {
      // derived: two independent medians differ by sqrt(2) x their standard error; allow 4 of those.
      const se = medianStandardError(a[key], a.diagnostics.effectiveSampleSize);
      expect(Math.abs(a[key].median - b[key].median)).toBeLessThan(4 * Math.SQRT2 * se);
    }
  });
});
