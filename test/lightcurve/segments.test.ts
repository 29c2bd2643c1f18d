/**
 * Baseline segments: splitting by file and gap, Legendre trend columns, and a trend
 * fitted jointly with the phase curve (its correlations enter the uncertainties).
 */
import { describe, expect, it } from 'vitest';
import { decompose, type DecomposeOptions } from '../../src/lightcurve/decompose.ts';
import { legendre, segmentCurve } from '../../src/lightcurve/segments.ts';
import type { LightCurve } from '../../src/lightcurve/types.ts';
import { cosinePlanet, syntheticTimeSeries, type SyntheticSpec } from './synthetic.ts';

const PPM = 1e-6;
// Invented synthetic curve (as in decompose.test.ts): depth 80 ppm, peak-to-trough 60 ppm.
const SPEC: SyntheticSpec = {
  points: 3000, periodDays: 1.5, epochDays: 2460000.25, spanDays: 12,
  radiusRatio: 0.1, scaledSemiMajorAxis: 4, inclinationDeg: 87,
  planetFlux: cosinePlanet(50 * PPM, 30 * PPM, 0), ellipsoidal: 20 * PPM, beaming: 10 * PPM, noise: 100 * PPM, seed: 31,
};
const OPTIONS: DecomposeOptions = {
  periodDays: SPEC.periodDays, epochDays: SPEC.epochDays,
  geometry: { kind: 'disks', radiusRatio: 0.1, scaledSemiMajorAxis: 4, inclinationDeg: 87 },
};

describe('segments', () => {
  it('split by file and by gaps longer than the chosen length', () => {
    const x = Float64Array.from([0, 0.1, 0.2, 1.0, 1.1, 5, 5.1, 0.05, 0.15]);
    const curve: LightCurve = {
      column: 'time', x, flux: new Float64Array(9).fill(1), fluxErr: new Float64Array(9).fill(1e-3),
      fileIndex: Int32Array.from([0, 0, 0, 0, 0, 0, 0, 1, 1]), files: ['a.fits', 'b.fits'],
    };
    const s = segmentCurve(curve, 0.5);
    expect(s.segments.map((g) => [g.file, g.start, g.end, g.indices.length])).toEqual([
      ['a.fits', 0, 0.2, 3], ['a.fits', 1.0, 1.1, 2], ['a.fits', 5, 5.1, 2], ['b.fits', 0.05, 0.15, 2],
    ]);
    expect(segmentCurve(curve, 10).segments).toHaveLength(2);
  });

  it('Legendre polynomials by recurrence match the closed forms', () => {
    const out = new Float64Array(3);
    for (const t of [-1, -0.3, 0, 0.7, 1]) {
      legendre(t, 3, out);
      // P1 = t, P2 = (3t^2 - 1)/2, P3 = (5t^3 - 3t)/2 (Abramowitz & Stegun 1964, table 22.9).
      expect(out[0]).toBeCloseTo(t, 14);
      expect(out[1]).toBeCloseTo((3 * t * t - 1) / 2, 14);
      expect(out[2]).toBeCloseTo((5 * t ** 3 - 3 * t) / 2, 14);
    }
  });
});

describe('a trend fitted jointly with the phase curve', () => {
  const base = syntheticTimeSeries(SPEC);
  const t0 = base.x[0]!;
  const span = base.x[base.x.length - 1]! - t0;
  // Invented drift: 0.1 % over the span, ten times the noise per point.
  const drifting: LightCurve = { ...base, flux: base.flux.map((f, i) => f * (1 + 1e-3 * ((base.x[i]! - t0) / span - 0.5))) };

  it('recovers the signals under a drift that a constant alone cannot fit', () => {
    const r = decompose(drifting, OPTIONS);
    expect(r.trendTerms).toBe(1);
    expect(r.segments).toEqual([expect.objectContaining({ file: 'curve', points: r.points, trendOrder: 1 })]);
    for (const [q, truth] of [[r.eclipseDepthPpm!, 80], [r.phaseAmplitudePpm, 60], [r.ellipsoidalAmplitudePpm, 20], [r.beamingAmplitudePpm!, 10]] as const) {
      expect(Math.abs(q.value - truth) / q.sigma).toBeLessThan(3);
    }
    expect(r.reducedChiSquare).toBeLessThan(1.15);
    const flat = decompose(drifting, { ...OPTIONS, trendOrder: 0 });
    // derived: a 0.1 % ramp leaves residuals of 1000/sqrt(12) = 289 ppm rms against 100 ppm noise.
    expect(flat.reducedChiSquare).toBeGreaterThan(5);
  });

  it('the trend terms widen the uncertainties when a segment is short against the orbit', () => {
    const first = (periods: number): LightCurve => {
      const keep = Array.from(base.x.keys()).filter((i) => base.x[i]! < t0 + periods * SPEC.periodDays);
      return { column: 'time', x: Float64Array.from(keep, (i) => base.x[i]!), flux: Float64Array.from(keep, (i) => base.flux[i]!), fluxErr: Float64Array.from(keep, (i) => base.fluxErr[i]!) };
    };
    // 1.2 periods: a quadratic trend is partly degenerate with the phase curve.
    const short = first(1.2);
    const withTrend = decompose(short, { ...OPTIONS, trendOrder: 2 });
    const without = decompose(short, { ...OPTIONS, trendOrder: 0 });
    const ratio = withTrend.phaseAmplitudePpm.sigma / without.phaseAmplitudePpm.sigma;
    expect(ratio).toBeGreaterThan(1.1);
    expect(withTrend.warnings.join(' ')).not.toMatch(/partly degenerate/);
    // 0.9 periods (from 0.3 before the transit to 0.6 after it, so the eclipse is in): flagged.
    expect(decompose(first(0.9), OPTIONS).warnings.join(' ')).toMatch(/spans 0.\d\d orbital periods: its trend is partly degenerate with the phase curve/);
  });
});
