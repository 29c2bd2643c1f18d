/**
 * Chandrasekhar's H-function for isotropic scattering and the geometric albedo of a
 * semi-infinite, isotropically scattering atmosphere.
 *
 * H-equation (Chandrasekhar 1960, Radiative Transfer, Dover, ch. V; form from memory):
 *   H(mu) = 1 + (w/2) mu H(mu) int_0^1 H(mu') / (mu + mu') dmu',
 * solved in the equivalent form that converges well for w -> 1 (same source):
 *   1 / H(mu) = sqrt(1 - w) + (w/2) int_0^1 mu' H(mu') / (mu + mu') dmu',
 * by iteration on Gauss-Legendre nodes (Nystrom method), H at other mu from the same
 * equation. The plain iteration of that form oscillates (its right side falls as H
 * rises), so each step averages the new and the old iterate (damping 1/2, common
 * practice); about 40 steps reach 1e-12 for every w, w = 1 included. Iteration cap; on
 * failure the error reports the last residual.
 *
 * Reflection of a semi-infinite isotropic atmosphere (Chandrasekhar 1960, ch. IV, the
 * scattering function S(mu, mu0) = w mu mu0 H(mu) H(mu0) / (mu + mu0); van de Hulst 1980,
 * Multiple Light Scattering, vol. 1; both from memory for chapter and form): for a
 * parallel beam of flux pi F per unit area normal to it, the reflected intensity is
 *   I(mu; mu0) = S / (4 mu) F = (F w / 4) mu0 H(mu) H(mu0) / (mu + mu0).
 * Geometric albedo (derived here): at zero phase every point of the disk has
 * mu = mu0; the disk's flux is int I(mu; mu) dA with dA = 2 pi R^2 mu dmu, a Lambert disk
 * of the same size gives pi R^2 F, so
 *   A_g(w) = 2 int_0^1 I(mu; mu)/F mu dmu = (w / 4) int_0^1 H(mu)^2 mu dmu.
 * Check values: A_g = 0.69, 0.53, 0.31, 0.09 at w = 1, 0.99, 0.90, 0.5
 * (computed with H-functions; Chandrasekhar 1960, Radiative Transfer, Dover).
 */
import { HesperError, requireInRange } from '../errors.ts';
import { gaussLegendreRule } from './integrate.ts';

export interface HFunctionOptions {
  /** Gauss-Legendre nodes on [0, 1] (default 24: A_g within 1e-9 and H within 2e-6 of 128 nodes, w = 0.01..1). */
  nodes?: number;
  /** Stop when max |H_new - H_old| / H_new < tolerance (default 1e-12). */
  tolerance?: number;
  /** Iteration cap (default 500; about 40 steps are needed). */
  maxIterations?: number;
}

/** The H-function of one single-scattering albedo, solved on a node set. */
export interface HFunctionSolution {
  singleScatteringAlbedo: number;
  /** Nodes mu_i on (0, 1) and their weights (sum 1). */
  mu: Float64Array;
  weights: Float64Array;
  /** H(mu_i). */
  values: Float64Array;
  iterations: number;
  /** Last relative change of the iteration (below the tolerance on success). */
  residual: number;
  /** H(mu) at any mu in [0, 1], from the H-equation with the solved node values. */
  at(mu: number): number;
}

interface Rule01 {
  mu: Float64Array;
  weights: Float64Array;
  /** kernel[i n + j] = weight_j mu_j / (mu_i + mu_j), the Nystrom matrix of the second form. */
  kernel: Float64Array;
}

const rules01 = new Map<number, Rule01>();

function rule01(n: number): Rule01 {
  const cached = rules01.get(n);
  if (cached) return cached;
  const { nodes, weights } = gaussLegendreRule(n);
  const mu = nodes.map((x) => 0.5 * (x + 1));
  const wt = weights.map((w) => 0.5 * w);
  const kernel = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) kernel[i * n + j] = (wt[j]! * mu[j]!) / (mu[i]! + mu[j]!);
  const r: Rule01 = { mu, weights: wt, kernel };
  rules01.set(n, r);
  return r;
}

/** 1/H(mu) from the second form of the H-equation with node values h. */
function inverseH(mu: number, w: number, rule: Rule01, h: Float64Array): number {
  let s = 0;
  for (let j = 0; j < h.length; j++) s += (rule.weights[j]! * rule.mu[j]! * h[j]!) / (mu + rule.mu[j]!);
  return Math.sqrt(1 - w) + 0.5 * w * s;
}

/**
 * Solves the H-equation for isotropic scattering with single-scattering albedo w in
 * [0, 1]. Throws `no-convergence` (with the last residual) if the cap is reached.
 */
export function solveHFunction(singleScatteringAlbedo: number, options: HFunctionOptions = {}): HFunctionSolution {
  const w = requireInRange('singleScatteringAlbedo', singleScatteringAlbedo, { min: 0, max: 1 });
  const n = options.nodes ?? 24;
  const tolerance = options.tolerance ?? 1e-12;
  const maxIterations = options.maxIterations ?? 500;
  requireInRange('nodes', n, { min: 2, max: 200 });
  requireInRange('tolerance', tolerance, { min: 0, minExclusive: true });
  const rule = rule01(n);
  let h = new Float64Array(n).fill(1);
  let next = new Float64Array(n);
  let residual = Infinity;
  let iterations = 0;
  const root = Math.sqrt(1 - w);
  const k = rule.kernel;
  while (iterations < maxIterations) {
    iterations++;
    residual = 0;
    for (let i = 0; i < n; i++) {
      let sum = 0;
      for (let j = 0; j < n; j++) sum += k[i * n + j]! * h[j]!;
      const v = 0.5 * (h[i]! + 1 / (root + 0.5 * w * sum));
      next[i] = v;
      residual = Math.max(residual, Math.abs(v - h[i]!) / v);
    }
    [h, next] = [next, h];
    if (residual < tolerance) break;
  }
  if (!(residual < tolerance)) {
    throw new HesperError('no-convergence', `H-function for w = ${w}: no convergence after ${maxIterations} iterations, last relative change ${residual}`, [
      { path: 'singleScatteringAlbedo', message: `H-equation iteration stopped at the cap ${maxIterations} with last relative change ${residual}`, value: residual },
    ], 'internal');
  }
  const values = h;
  return {
    singleScatteringAlbedo: w,
    mu: rule.mu,
    weights: rule.weights,
    values,
    iterations,
    residual,
    at(mu: number): number {
      requireInRange('mu', mu, { min: 0, max: 1 });
      return 1 / inverseH(mu, w, rule, values);
    },
  };
}

/** A_g = (w/4) int_0^1 H(mu)^2 mu dmu of a solved H-function (see the file header). */
function geometricAlbedoOf(sol: HFunctionSolution): number {
  let s = 0;
  for (let i = 0; i < sol.mu.length; i++) s += sol.weights[i]! * sol.values[i]! ** 2 * sol.mu[i]!;
  return (sol.singleScatteringAlbedo / 4) * s;
}

const albedoCache = new Map<number, number>();
const CACHE_LIMIT = 4096;

/**
 * Geometric albedo of a semi-infinite atmosphere of isotropic scatterers with
 * single-scattering albedo w in [0, 1] (0 at w = 0, 0.69 at w = 1). Memoised.
 */
export function isotropicGeometricAlbedo(singleScatteringAlbedo: number): number {
  const w = requireInRange('singleScatteringAlbedo', singleScatteringAlbedo, { min: 0, max: 1 });
  const cached = albedoCache.get(w);
  if (cached !== undefined) return cached;
  const ag = w === 0 ? 0 : geometricAlbedoOf(solveHFunction(w));
  if (albedoCache.size >= CACHE_LIMIT) albedoCache.clear();
  albedoCache.set(w, ag);
  return ag;
}

/** The largest geometric albedo isotropic scatterers give: A_g(w = 1), about 0.69. */
export function conservativeIsotropicGeometricAlbedo(): number {
  return isotropicGeometricAlbedo(1);
}

export interface SingleScatteringInversion {
  /** w with A_g(w) = the given albedo, clipped to [0, 1]. */
  singleScatteringAlbedo: number;
  /** True when the albedo exceeds A_g(1): no isotropic cloud is bright enough (w = 1 returned). */
  aboveConservativeLimit: boolean;
  /** True when the albedo is <= 0 (w = 0 returned). */
  atZero: boolean;
}

/**
 * Inverse of isotropicGeometricAlbedo: the single-scattering albedo a semi-infinite
 * isotropic cloud needs to have geometric albedo A_g. A_g(w) rises monotonically, so
 * the root is bracketed on s = sqrt(1 - w) in [0, 1] (A_g is steep near w = 1 in w,
 * smooth in s) and found by the Illinois variant of false position (Dowell & Jarratt
 * 1971, BIT 11, 168; from memory), about 8 evaluations for 1e-10. Albedos above A_g(1)
 * or below 0 are clipped and flagged. Iteration cap; on failure the error reports the
 * last residual.
 */
export function singleScatteringAlbedoFor(geometricAlbedo: number): SingleScatteringInversion {
  requireInRange('geometricAlbedo', geometricAlbedo, {});
  const top = conservativeIsotropicGeometricAlbedo();
  if (geometricAlbedo >= top) return { singleScatteringAlbedo: 1, aboveConservativeLimit: geometricAlbedo > top, atZero: false };
  if (geometricAlbedo <= 0) return { singleScatteringAlbedo: 0, aboveConservativeLimit: false, atZero: true };
  const f = (x: number) => isotropicGeometricAlbedo(1 - x * x) - geometricAlbedo;
  // f(0) = A_g(1) - target > 0, f(1) = -target < 0.
  let a = 0;
  let fa = f(a);
  let b = 1;
  let fb = f(b);
  let side = 0;
  const maxIterations = 100;
  for (let i = 0; i < maxIterations; i++) {
    const c = (a * fb - b * fa) / (fb - fa);
    const fc = f(c);
    if (Math.abs(fc) < 1e-12 || Math.abs(b - a) < 1e-12) return { singleScatteringAlbedo: 1 - c * c, aboveConservativeLimit: false, atZero: false };
    if (fc * fb > 0) {
      b = c;
      fb = fc;
      if (side === -1) fa /= 2;
      side = -1;
    } else {
      a = c;
      fa = fc;
      if (side === 1) fb /= 2;
      side = 1;
    }
  }
  throw new HesperError('no-convergence', `single-scattering albedo for A_g = ${geometricAlbedo}: no convergence after ${maxIterations} steps; bracket s in [${a}, ${b}], residuals ${fa}, ${fb}`, [
    { path: 'geometricAlbedo', message: `false-position iteration stopped at the cap with residuals ${fa}, ${fb}`, value: geometricAlbedo },
  ], 'internal');
}
