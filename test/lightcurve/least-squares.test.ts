import { describe, expect, it } from 'vitest';
import { HesperError } from '../../src/errors.ts';
import { weightedLeastSquares } from '../../src/lightcurve/least-squares.ts';

function design(xs: number[], f: (x: number) => number[]): Float64Array {
  const cols = f(0).length;
  const m = new Float64Array(xs.length * cols);
  xs.forEach((x, r) => f(x).forEach((v, j) => { m[r * cols + j] = v; }));
  return m;
}

describe('weightedLeastSquares', () => {
  it('matches the closed-form weighted straight-line fit', () => {
    const xs = [0, 1, 2, 3, 4, 5];
    const ys = [1.1, 2.9, 5.2, 7.1, 8.8, 11.3];
    const sig = [0.1, 0.2, 0.1, 0.3, 0.2, 0.1];
    const fit = weightedLeastSquares(design(xs, (x) => [1, x]), xs.length, 2, Float64Array.from(ys), Float64Array.from(sig), ['a', 'b']);
    // derived: Press et al., Numerical Recipes 3rd ed. (2007) section 15.2: with S = sum w,
    // Sx = sum w x, Sy, Sxx, Sxy and Delta = S Sxx - Sx^2: a = (Sxx Sy - Sx Sxy)/Delta,
    // b = (S Sxy - Sx Sy)/Delta, var a = Sxx/Delta, var b = S/Delta, cov ab = -Sx/Delta.
    let S = 0, Sx = 0, Sy = 0, Sxx = 0, Sxy = 0;
    xs.forEach((x, i) => {
      const w = 1 / sig[i]! ** 2;
      S += w; Sx += w * x; Sy += w * ys[i]!; Sxx += w * x * x; Sxy += w * x * ys[i]!;
    });
    const D = S * Sxx - Sx * Sx;
    expect(fit.coefficients[0]).toBeCloseTo((Sxx * Sy - Sx * Sxy) / D, 12);
    expect(fit.coefficients[1]).toBeCloseTo((S * Sxy - Sx * Sy) / D, 12);
    expect(fit.covariance[0]).toBeCloseTo(Sxx / D, 12);
    expect(fit.covariance[3]).toBeCloseTo(S / D, 12);
    expect(fit.covariance[1]).toBeCloseTo(-Sx / D, 12);
    expect(fit.dof).toBe(4);
    let chi2 = 0;
    xs.forEach((x, i) => { chi2 += ((ys[i]! - fit.coefficients[0]! - fit.coefficients[1]! * x) / sig[i]!) ** 2; });
    expect(fit.chiSquare).toBeCloseTo(chi2, 10);
  });

  it('recovers noiseless coefficients of badly scaled columns exactly', () => {
    const xs = Array.from({ length: 50 }, (_, i) => i / 49);
    const f = (x: number): number[] => [1, 1e-6 * x, 1e4 * x * x];
    const ys = xs.map((x) => 3 + 2e6 * (1e-6 * x) - 5e-4 * (1e4 * x * x));
    const fit = weightedLeastSquares(design(xs, f), xs.length, 3, Float64Array.from(ys), new Float64Array(50).fill(1), ['c', 'b', 'a']);
    expect(fit.coefficients[0]).toBeCloseTo(3, 9);
    expect(fit.coefficients[1]! / 2e6).toBeCloseTo(1, 9);
    expect(fit.coefficients[2]! / -5e-4).toBeCloseTo(1, 9);
  });

  it('names a column that has no data or is a combination of the others', () => {
    const xs = [0, 1, 2, 3];
    const sig = new Float64Array(4).fill(1);
    const y = Float64Array.from([1, 2, 3, 4]);
    expect(() => weightedLeastSquares(design(xs, (x) => [1, x, 0]), 4, 3, y, sig, ['constant', 'slope', 'eclipse'])).toThrow(/eclipse term cannot be fitted: it has no data/);
    try {
      weightedLeastSquares(design(xs, (x) => [1, x, 2 * x - 1]), 4, 3, y, sig, ['constant', 'slope', 'copy']);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(HesperError);
      expect((e as HesperError).code).toBe('degenerate-fit');
      expect((e as HesperError).issues[0]!.path).toBe('model.copy');
    }
    expect(() => weightedLeastSquares(design([0, 1], (x) => [1, x]), 2, 2, Float64Array.from([1, 2]), Float64Array.from([1, 1]), ['a', 'b'])).toThrow(/more points than terms/);
  });
});
