/**
 * The sensitivity corners: the albedo posterior with the heat redistribution eps and
 * the phase integral q held at the edges of their priors (so the corners follow the
 * priors the user chose), each with how well it fits the data compared with the best
 * fit anywhere in the prior.
 *
 * Fit of a corner: Delta chi^2 = 2 (ln L_best - ln L_corner), with ln L the largest
 * log-likelihood over the draws and albedo nodes (-2 ln of the likelihood ratio; the
 * chi-square difference for Gaussian errors). A corner is ruled out by the data above
 * 5.99, the 95 % point of a chi-square with two degrees of freedom (eps and q; Wilks
 * 1938, Ann. Math. Stat. 9, 60; the value from any chi-square table).
 */
import type { RangeBounds } from '../errors.ts';
import type { Dist } from '../io/distribution.ts';
import { ASSUMPTION_FIELDS } from '../io/system-fields.ts';
import type { SystemInput } from '../io/system.ts';
import { runGrid, type GridResult, type Likelihoods } from './grid.ts';
import { type Nuisance, withCorner } from './nuisance.ts';
import { createRng } from './random.ts';
import { samplePosterior } from './sample-posterior.ts';
import type { ModelSettings } from './signal-model.ts';
import { quantileSorted, roundSig, summarize, type Summary } from './summary.ts';
import type { SensitivityRow } from './types.ts';

/** Delta chi^2 above which a corner is ruled out (95 % for two parameters; chi-square table). */
export const CORNER_RULED_OUT_DELTA_CHI2 = 5.99;

/** The two edges of a prior: the support of a uniform, +-2 sigma of a Gaussian, the 2.5 and 97.5 % points of samples, clipped to the field's range. */
export function priorEdges(d: Dist, range: RangeBounds): number[] {
  const clip = (x: number) => Math.min(range.max ?? Infinity, Math.max(range.min ?? -Infinity, x));
  let lo: number;
  let hi: number;
  switch (d.kind) {
    case 'fixed': return [d.value];
    case 'uniform': lo = d.min; hi = d.max; break;
    case 'normal': lo = d.mean - 2 * d.sigma; hi = d.mean + 2 * d.sigma; break;
    case 'split-normal': lo = d.mode - 2 * d.minus; hi = d.mode + 2 * d.plus; break;
    case 'samples': {
      const s = Float64Array.from(d.values).sort();
      lo = quantileSorted(s, 0.025);
      hi = quantileSorted(s, 0.975);
      break;
    }
    case 'upper-limit': lo = 0; hi = d.limit; break;
  }
  const a = roundSig(clip(lo), 4);
  const b = roundSig(clip(hi), 4);
  return a === b ? [a] : [a, b];
}

/** The corners (eps, q) at the edges of the two priors, eps first. */
export function sensitivityCorners(s: SystemInput): Array<{ redistribution: number; phaseIntegral: number }> {
  const eps = priorEdges(s.assumptions.redistribution, ASSUMPTION_FIELDS.redistribution.range);
  const q = priorEdges(s.assumptions.phaseIntegral, ASSUMPTION_FIELDS.phaseIntegral.range);
  return eps.flatMap((redistribution) => q.map((phaseIntegral) => ({ redistribution, phaseIntegral })));
}

/** Draws used for the corners: a sixteenth of the main grid's (at least 250), on a quarter of its nodes (at least 64). */
export function cornerBudget(draws: number, nodes: number): { count: number; nodes: number } {
  return { count: Math.min(draws, Math.max(250, Math.floor(draws / 16))), nodes: Math.max(64, Math.floor(nodes / 4)) };
}

export interface CornerRun {
  rows: SensitivityRow[];
  /** Largest log-likelihood over the corners (with the main grid's, the best fit). */
  maxLogLikelihood: number;
}

/**
 * Corner grids on the first draws at fixed (eps, q). `bestLogLikelihood` is the main
 * grid's best fit; the best fit overall is the larger of it and the corners'.
 */
export function runCorners(
  s: SystemInput, draws: Nuisance[], settings: ModelSettings, lik: Likelihoods, seed: number, main: GridResult,
): CornerRun {
  const { count, nodes } = cornerBudget(draws.length, s.assumptions.gridNodes);
  const subset = draws.slice(0, count);
  const runs = sensitivityCorners(s).map((corner, c) => {
    const fixed = subset.map((th) => withCorner(th, corner.redistribution, corner.phaseIntegral));
    const grid = runGrid(fixed, settings, lik, nodes, false);
    if (!grid.weights.some((w) => w > 0)) return { corner, grid, albedo: summarize([NaN]) };
    const post = samplePosterior(grid, settings, createRng(seed * 7919 + 101 + c), count);
    return { corner, grid, albedo: summarize(post.geometricAlbedo) };
  });
  const maxLogLikelihood = Math.max(-Infinity, ...runs.map((r) => r.grid.maxLogLikelihood));
  const best = Math.max(main.maxLogLikelihood, maxLogLikelihood);
  const rows = runs.map(({ corner, grid, albedo }): SensitivityRow => {
    const delta = Number.isFinite(best) && Number.isFinite(grid.maxLogLikelihood) ? Math.max(0, 2 * (best - grid.maxLogLikelihood)) : null;
    return {
      ...corner,
      geometricAlbedo: albedo,
      deltaChiSquare: delta === null ? null : roundSig(delta, 4),
      ruledOut: delta === null ? !Number.isFinite(grid.maxLogLikelihood) : delta > CORNER_RULED_OUT_DELTA_CHI2,
    };
  });
  return { rows, maxLogLikelihood };
}

/** How much the dayside map moves A_g: the same draws under the other map (uniform vs local equilibrium). */
export interface DayMapShift {
  /** The map of the main result and the alternative compared with it. */
  used: 'uniform' | 'local-equilibrium';
  alternative: 'uniform' | 'local-equilibrium';
  /** A_g on the corner draws with the map used and with the alternative. */
  geometricAlbedoUsed: Summary;
  geometricAlbedoAlternative: Summary;
  /** Median under the alternative minus median under the map used. */
  medianShift: number;
}

/** The A_g posterior on the corner draws (eps and q as drawn) under both dayside maps; undefined without thermal emission. */
export function runDayMapShift(
  s: SystemInput, draws: Nuisance[], settings: ModelSettings, lik: Likelihoods, seed: number,
): DayMapShift | undefined {
  if (!settings.thermal) return undefined;
  const { count, nodes } = cornerBudget(draws.length, s.assumptions.gridNodes);
  const subset = draws.slice(0, count);
  const alternative = settings.dayMap === 'uniform' ? 'local-equilibrium' : 'uniform';
  const albedoUnder = (dayMap: ModelSettings['dayMap'], c: number) => {
    const m = { ...settings, dayMap };
    const grid = runGrid(subset, m, lik, nodes, false);
    if (!grid.weights.some((w) => w > 0)) return summarize([NaN]);
    return summarize(samplePosterior(grid, m, createRng(seed * 7919 + 211 + c), count).geometricAlbedo);
  };
  const used = albedoUnder(settings.dayMap, 0);
  const alt = albedoUnder(alternative, 0);
  return {
    used: settings.dayMap, alternative, geometricAlbedoUsed: used, geometricAlbedoAlternative: alt,
    medianShift: roundSig(alt.median - used.median, 4),
  };
}
