/**
 * How the data constrain the geometric albedo:
 * - "prior-dominated": the sensitivity corners that the data do not rule out disagree by
 *   more than the posterior's 68 % width, so the answer follows the assumed heat
 *   redistribution and phase integral, not the measurement;
 * - "upper-limit": otherwise, when the albedo is consistent with 0 at 95 %;
 * - "measured": bounded away from 0 at 95 % and the corners agree within the 68 % width.
 * The corners are a few points; the posterior itself shows the dependence on the heat
 * redistribution (the thermal-reflection degeneracy): its draws with eps in the lowest third of the prior and those in the highest third
 * are compared, and when their median A_g differ by more than half the 68 % width the
 * assumed value drives the answer, so the albedo is prior-dominated as well (our choice:
 * for A_g varying linearly with a uniform eps and nothing else, the two medians differ by
 * about the whole 68 % width; for a measurement independent of eps, by sampling noise).
 * Each third must hold at least 5 % of the posterior draws, else the data already pin the
 * parameter and the comparison is skipped.
 * Consistent with 0 at 95 % means that the shortest interval holding 95 % of the
 * posterior (the highest-density interval of a unimodal posterior) reaches A_g = 0; an
 * interval starting at 0 that is at most 1 % longer than the shortest counts too
 * (sampling tolerance, our choice). For a Gaussian measurement this puts the boundary
 * near 1.7-1.9 sigma (derived for a truncated normal).
 */
import type { SensitivityRow } from './types.ts';

export type AlbedoConstraint = 'measured' | 'upper-limit' | 'prior-dominated';

/** Probability mass of the interval, and the length tolerance for an interval starting at 0 (see the file comment). */
export const CONSTRAINT_MASS = 0.95;
export const ZERO_INTERVAL_TOLERANCE = 0.01;

export interface ConstraintReading {
  constraint: AlbedoConstraint;
  consistentWithZero: boolean;
  /** Spread (max - min) of the medians of the corners not ruled out; null with fewer than two. */
  cornerSpread: number | null;
  width68: number;
  /** Smallest and largest median among those corners (the range the assumptions span). */
  cornerRange: [number, number] | null;
}

/** Whether the shortest 95 % interval of a posterior quantile grid (grid[k] = k/(n-1) quantile) reaches its lower end. */
export function reachesZero(grid: Float64Array, mass = CONSTRAINT_MASS): boolean {
  const n = grid.length;
  const span = Math.round(mass * (n - 1));
  let best = Infinity;
  for (let k = 0; k + span < n; k++) best = Math.min(best, grid[k + span]! - grid[k]!);
  const fromZero = grid[span]! - 0;
  return fromZero <= best * (1 + ZERO_INTERVAL_TOLERANCE) || best === 0;
}

/** Share of the posterior each prior third must hold for the comparison (see the file comment). */
export const THIRD_MIN_SHARE = 0.05;

function medianOf(values: number[]): number {
  const s = Float64Array.from(values).sort();
  const n = s.length;
  return n % 2 ? s[(n - 1) >> 1]! : 0.5 * (s[n / 2 - 1]! + s[n / 2]!);
}

/**
 * |median A_g (parameter in the prior's top third) - median A_g (bottom third)| over the
 * posterior draws; null when the prior is fixed or a third holds under 5 % of the posterior.
 */
export function conditionalSpread(priorValues: ArrayLike<number>, drawIndex: Int32Array, geometricAlbedo: Float64Array): number | null {
  const sorted = Float64Array.from(priorValues).sort();
  const n = sorted.length;
  const lo = sorted[Math.floor((n - 1) / 3)]!;
  const hi = sorted[Math.ceil((2 * (n - 1)) / 3)]!;
  if (!(hi > lo)) return null;
  const low: number[] = [];
  const high: number[] = [];
  for (let k = 0; k < drawIndex.length; k++) {
    const v = priorValues[drawIndex[k]!]!;
    if (v <= lo) low.push(geometricAlbedo[k]!);
    else if (v >= hi) high.push(geometricAlbedo[k]!);
  }
  const min = THIRD_MIN_SHARE * drawIndex.length;
  if (low.length < min || high.length < min) return null;
  return Math.abs(medianOf(high) - medianOf(low));
}

export function readConstraint(
  grid: Float64Array, lower68: number, upper68: number, corners: readonly SensitivityRow[], posteriorSpread: number | null = null,
): ConstraintReading {
  const usable = corners.filter((c) => !c.ruledOut && Number.isFinite(c.geometricAlbedo.median)).map((c) => c.geometricAlbedo.median);
  const width68 = upper68 - lower68;
  const cornerRange: [number, number] | null = usable.length >= 2 ? [Math.min(...usable), Math.max(...usable)] : null;
  const cornerSpread = cornerRange ? cornerRange[1] - cornerRange[0] : null;
  const consistentWithZero = reachesZero(grid);
  const followsPrior = (cornerSpread !== null && cornerSpread > width68) || (posteriorSpread !== null && posteriorSpread > 0.5 * width68);
  const constraint: AlbedoConstraint = followsPrior
    ? 'prior-dominated'
    : consistentWithZero ? 'upper-limit' : 'measured';
  return { constraint, consistentWithZero, cornerSpread, width68, cornerRange };
}
