/**
 * One-dimensional root finding by bisection: slow but certain for the monotonic
 * functions of this layer (brightness temperature, condensation temperature, Wien's
 * peak). Iteration cap; on failure the error reports the last bracket and residual.
 */
import { HesperError, requireFinite } from '../errors.ts';

export interface BisectOptions {
  /** Stop when the bracket is narrower than this, relative to |x| (default 1e-14). */
  relTol?: number;
  /** Cap on iterations (default 200: enough for 1e-14 from any double bracket). */
  maxIterations?: number;
  /** Name used in error messages. */
  what?: string;
}

/**
 * Root of f in [lo, hi]; f(lo) and f(hi) must have opposite signs (or one be zero).
 * Throws `no-convergence` if they do not, or if the cap is reached.
 */
export function bisect(f: (x: number) => number, lo: number, hi: number, options: BisectOptions = {}): number {
  requireFinite('lo', lo);
  requireFinite('hi', hi);
  const relTol = options.relTol ?? 1e-14;
  const maxIterations = options.maxIterations ?? 200;
  const what = options.what ?? 'bisect';
  let a = Math.min(lo, hi);
  let b = Math.max(lo, hi);
  let fa = f(a);
  const fb = f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (!(Math.sign(fa) * Math.sign(fb) < 0)) {
    throw new HesperError('no-convergence', `${what}: no sign change in [${a}, ${b}] (f = ${fa}, ${fb})`, [
      { path: what, message: `no root bracketed in [${a}, ${b}]: f(lo) = ${fa}, f(hi) = ${fb}`, value: [fa, fb] },
    ], 'internal');
  }
  let mid = (a + b) / 2;
  let fm = fa;
  for (let i = 0; i < maxIterations; i++) {
    mid = (a + b) / 2;
    fm = f(mid);
    if (fm === 0) return mid;
    if (Math.sign(fm) === Math.sign(fa)) {
      a = mid;
      fa = fm;
    } else {
      b = mid;
    }
    if (b - a <= relTol * Math.max(Math.abs(mid), Number.MIN_VALUE)) return (a + b) / 2;
  }
  throw new HesperError('no-convergence', `${what}: no convergence after ${maxIterations} iterations; bracket [${a}, ${b}], last residual ${fm}`, [
    { path: what, message: `bracket [${a}, ${b}] after ${maxIterations} iterations, last residual ${fm}`, value: fm },
  ], 'internal');
}
