import { describe, expect, it } from 'vitest';
import { foldCurve, foldTimes, wrapPhase } from '../../src/lightcurve/fold.ts';

describe('folding', () => {
  it('wraps phases into [0, 1)', () => {
    // derived: frac(x) = x - floor(x).
    expect(wrapPhase(-0.25)).toBeCloseTo(0.75, 15);
    expect(wrapPhase(1)).toBe(0);
    expect(wrapPhase(2.5)).toBeCloseTo(0.5, 15);
    expect(wrapPhase(-1e-17)).toBeGreaterThanOrEqual(0);
    expect(wrapPhase(-1e-17)).toBeLessThan(1);
  });

  it('folds times on period and epoch', () => {
    const t = Float64Array.from([100, 100.5, 101.25, 99.75]);
    // derived: (t - 100) / 2 mod 1 = 0, 0.25, 0.625, 0.875.
    expect(Array.from(foldTimes(t, 100, 2))).toEqual([0, 0.25, 0.625, 0.875]);
  });

  it('needs an epoch for a time series, not for a folded curve', () => {
    const c = { column: 'time' as const, x: Float64Array.from([1, 2]), flux: Float64Array.from([1, 1]), fluxErr: Float64Array.from([1, 1]) };
    expect(() => foldCurve(c, 2)).toThrow(/epoch/);
    const f = foldCurve({ ...c, column: 'phase', x: Float64Array.from([-0.1, 0.4]) }, 2);
    expect(f.phase[0]).toBeCloseTo(0.9, 15);
    expect(f.phase[1]).toBeCloseTo(0.4, 15);
  });

  it('rejects a non-positive period', () => {
    expect(() => foldTimes(Float64Array.from([1]), 0, 0)).toThrow(/period/);
  });
});
