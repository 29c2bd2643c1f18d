/**
 * Probabilities from a posterior quantile grid (PosteriorQuantiles): grid[k] is the
 * k/(n-1) quantile, so the CDF at x is found by binary search and linear
 * interpolation between neighbouring quantiles.
 */
import { requireFinite } from '../errors.ts';

/** P(X <= x) from a sorted quantile grid. */
export function cdfAt(grid: Float64Array, x: number): number {
  requireFinite('x', x);
  const n = grid.length;
  if (n === 0) return NaN;
  if (x < grid[0]!) return 0;
  if (x >= grid[n - 1]!) return 1;
  // Largest k with grid[k] <= x.
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1;
    if (grid[mid]! <= x) lo = mid;
    else hi = mid;
  }
  const a = grid[lo]!;
  const b = grid[hi]!;
  const t = b > a ? (x - a) / (b - a) : 1;
  return (lo + t) / (n - 1);
}

/** P(lo <= X <= hi). */
export function massBetween(grid: Float64Array, lo: number, hi: number): number {
  if (hi < lo) return 0;
  return Math.max(0, cdfAt(grid, hi) - cdfAt(grid, lo));
}

/** P(X > x). */
export function probabilityAbove(grid: Float64Array, x: number): number {
  return 1 - cdfAt(grid, x);
}

/** The p-quantile (linear between grid points). */
export function quantileOf(grid: Float64Array, p: number): number {
  const n = grid.length;
  const x = Math.min(1, Math.max(0, p)) * (n - 1);
  const i = Math.floor(x);
  const f = x - i;
  return i + 1 < n ? grid[i]! + f * (grid[i + 1]! - grid[i]!) : grid[n - 1]!;
}

/** Median and half the central 68 % width, for "2200 +- 150 K" style text. */
export function centreAndSpread(grid: Float64Array): { median: number; halfWidth68: number } {
  const median = quantileOf(grid, 0.5);
  const halfWidth68 = (quantileOf(grid, 0.8413447460685429) - quantileOf(grid, 0.15865525393145707)) / 2;
  return { median, halfWidth68 };
}
