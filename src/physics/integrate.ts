/**
 * Quadrature. Gauss-Legendre nodes and weights are computed here (Newton's method on
 * the Legendre polynomial, the standard construction, e.g. Press et al., Numerical
 * Recipes, 3rd ed. 2007, section 4.6), so no table of literal coefficients is needed.
 * The adaptive rule compares one Gauss-Legendre panel with its two halves and splits
 * where they disagree; it has an evaluation cap and reports its last error estimate.
 */
import { HesperError, inputError, requireFinite } from '../errors.ts';

export interface QuadratureRule {
  /** Nodes on [-1, 1], ascending. */
  readonly nodes: Float64Array;
  /** Weights summing to 2. */
  readonly weights: Float64Array;
}

const ruleCache = new Map<number, QuadratureRule>();

/** The n-point Gauss-Legendre rule on [-1, 1] (exact for polynomials of degree 2n - 1). */
export function gaussLegendreRule(n: number): QuadratureRule {
  if (!Number.isInteger(n) || n < 1 || n > 200) {
    throw inputError('out-of-range', 'n', `n = ${n}: must be an integer in [1, 200]`, n, '[1, 200]');
  }
  const cached = ruleCache.get(n);
  if (cached) return cached;
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  const half = Math.floor((n + 1) / 2);
  for (let i = 0; i < half; i++) {
    // Initial guess for the i-th largest root (Tricomi's approximation, common practice).
    let z = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 0;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = 0;
      for (let j = 1; j <= n; j++) {
        const p2 = p1;
        p1 = p0;
        p0 = ((2 * j - 1) * z * p1 - (j - 1) * p2) / j;
      }
      // p0 = P_n(z), p1 = P_{n-1}(z); derivative from the recurrence.
      dp = (n * (z * p0 - p1)) / (z * z - 1);
      const dz = p0 / dp;
      z -= dz;
      if (Math.abs(dz) < 1e-16) break;
    }
    const w = 2 / ((1 - z * z) * dp * dp);
    nodes[i] = -z;
    nodes[n - 1 - i] = z;
    weights[i] = w;
    weights[n - 1 - i] = w;
  }
  const rule: QuadratureRule = { nodes, weights };
  ruleCache.set(n, rule);
  return rule;
}

/** Composite Gauss-Legendre integral of f over [a, b]: `panels` equal panels of n points. */
export function integrateGaussLegendre(f: (x: number) => number, a: number, b: number, n = 20, panels = 1): number {
  requireFinite('a', a);
  requireFinite('b', b);
  if (!Number.isInteger(panels) || panels < 1) {
    throw inputError('out-of-range', 'panels', `panels = ${panels}: must be a positive integer`, panels, '[1, inf)');
  }
  const { nodes, weights } = gaussLegendreRule(n);
  const h = (b - a) / panels;
  let sum = 0;
  for (let p = 0; p < panels; p++) {
    const mid = a + (p + 0.5) * h;
    const half = h / 2;
    let s = 0;
    for (let k = 0; k < n; k++) s += weights[k]! * f(mid + half * nodes[k]!);
    sum += s * half;
  }
  return sum;
}

export interface AdaptiveOptions {
  /** Relative tolerance on the whole integral (default 1e-10). */
  relTol?: number;
  /** Absolute tolerance (default 0). */
  absTol?: number;
  /** Points per panel (default 10). */
  order?: number;
  /** Cap on integrand evaluations (default 2e6). */
  maxEvaluations?: number;
}

/**
 * Adaptive Gauss-Legendre integral of f over [a, b]. Each panel's error is estimated by
 * comparing its rule with the sum over its two halves; panels are split until the
 * estimated total error is below max(absTol, relTol |I|). Throws `no-convergence` with
 * the last error estimate when the evaluation cap is hit.
 */
export function integrateAdaptive(f: (x: number) => number, a: number, b: number, options: AdaptiveOptions = {}): number {
  requireFinite('a', a);
  requireFinite('b', b);
  const relTol = options.relTol ?? 1e-10;
  const absTol = options.absTol ?? 0;
  const order = options.order ?? 10;
  const maxEvaluations = options.maxEvaluations ?? 2_000_000;
  if (a === b) return 0;
  const { nodes, weights } = gaussLegendreRule(order);
  let evaluations = 0;
  const panel = (lo: number, hi: number): number => {
    const mid = (lo + hi) / 2;
    const half = (hi - lo) / 2;
    let s = 0;
    for (let k = 0; k < order; k++) s += weights[k]! * f(mid + half * nodes[k]!);
    evaluations += order;
    return s * half;
  };
  interface Piece { lo: number; hi: number; whole: number; left: number; right: number; err: number }
  const split = (lo: number, hi: number, whole: number): Piece => {
    const mid = (lo + hi) / 2;
    const left = panel(lo, mid);
    const right = panel(mid, hi);
    return { lo, hi, whole, left, right, err: Math.abs(left + right - whole) };
  };
  let pieces: Piece[] = [split(a, b, panel(a, b))];
  for (;;) {
    let total = 0;
    let err = 0;
    for (const p of pieces) {
      total += p.left + p.right;
      err += p.err;
    }
    const target = Math.max(absTol, relTol * Math.abs(total));
    if (err <= target || err === 0) return total;
    if (evaluations >= maxEvaluations) {
      throw new HesperError('no-convergence', `adaptive quadrature stopped after ${evaluations} evaluations; last error estimate ${err.toExponential(3)} vs target ${target.toExponential(3)}`, [
        { path: 'integrateAdaptive', message: `last error estimate ${err.toExponential(3)}, integral ${total.toExponential(6)}`, value: err },
      ], 'internal');
    }
    // Split every piece whose error exceeds its fair share of the target.
    const share = target / pieces.length;
    const next: Piece[] = [];
    for (const p of pieces) {
      if (p.err > share) {
        const mid = (p.lo + p.hi) / 2;
        next.push(split(p.lo, mid, p.left), split(mid, p.hi, p.right));
      } else {
        next.push(p);
      }
    }
    pieces = next;
  }
}
