/**
 * How the data constrain the geometric albedo:
 * - "prior-dominated": the sensitivity corners that the data do not rule out disagree by
 *   more than the posterior's 68 % width, so the answer follows the assumed heat
 *   redistribution and phase integral, not the measurement;
 * - "upper-limit": otherwise, when the albedo is consistent with 0 at 95 %;
 * - "measured": bounded away from 0 at 95 % and the corners agree within the 68 % width.
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

export function readConstraint(grid: Float64Array, lower68: number, upper68: number, corners: readonly SensitivityRow[]): ConstraintReading {
  const usable = corners.filter((c) => !c.ruledOut && Number.isFinite(c.geometricAlbedo.median)).map((c) => c.geometricAlbedo.median);
  const width68 = upper68 - lower68;
  const cornerRange: [number, number] | null = usable.length >= 2 ? [Math.min(...usable), Math.max(...usable)] : null;
  const cornerSpread = cornerRange ? cornerRange[1] - cornerRange[0] : null;
  const consistentWithZero = reachesZero(grid);
  const constraint: AlbedoConstraint = cornerSpread !== null && cornerSpread > width68
    ? 'prior-dominated'
    : consistentWithZero ? 'upper-limit' : 'measured';
  return { constraint, consistentWithZero, cornerSpread, width68, cornerRange };
}
