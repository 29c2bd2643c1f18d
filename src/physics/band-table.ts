/**
 * Precomputed band-flux table F_band(T) on a uniform grid in ln T from 10 K to 20000 K,
 * interpolated in log-log space by cubic Hermite interpolation of
 * ln F against ln T, using the exact slope d ln F / d ln T from band-integral.ts at each
 * node. With 400 nodes (step 0.019 in ln T) the interpolation error is below 1e-6
 * relative from 100 K to 15000 K for every band tested (test/physics/band-table.test.ts
 * reports the worst case). A lookup is a log, an exp and a dozen flops on typed arrays;
 * it allocates nothing.
 */
import { inputError } from '../errors.ts';
import { bandMoments } from './band-integral.ts';
import type { Weighting } from './planck.ts';
import type { ResponseCurve } from './response-curve.ts';

export const TABLE_MIN_K = 10;
export const TABLE_MAX_K = 20000;
export const TABLE_POINTS = 400;

export interface BandTable {
  readonly weighting: Weighting;
  readonly minK: number;
  readonly maxK: number;
  /** ln T of the first node. */
  readonly lnT0: number;
  /** Grid step in ln T and its inverse. */
  readonly step: number;
  readonly invStep: number;
  /** ln F at the nodes. */
  readonly lnFlux: Float64Array;
  /** step * d ln F / d ln T at the nodes (Hermite tangents, pre-scaled). */
  readonly tangent: Float64Array;
}

/** Builds the table by direct integration at every node (about a millisecond per band). */
export function buildBandTable(curve: ResponseCurve, weighting: Weighting, points = TABLE_POINTS): BandTable {
  if (!Number.isInteger(points) || points < 16 || points > 100_000) {
    throw inputError('out-of-range', 'points', `points = ${points}: must be an integer in [16, 100000]`, points, '[16, 100000]');
  }
  const lnT0 = Math.log(TABLE_MIN_K);
  const step = (Math.log(TABLE_MAX_K) - lnT0) / (points - 1);
  const lnFlux = new Float64Array(points);
  const tangent = new Float64Array(points);
  for (let i = 0; i < points; i++) {
    const t = i === points - 1 ? TABLE_MAX_K : Math.exp(lnT0 + i * step);
    const m = bandMoments(curve, t, weighting);
    lnFlux[i] = m.logFlux;
    tangent[i] = m.logSlope * step;
  }
  return { weighting, minK: TABLE_MIN_K, maxK: TABLE_MAX_K, lnT0, step, invStep: 1 / step, lnFlux, tangent };
}

/** ln F from the table at ln T (caller keeps T within [minK, maxK]). */
/** The table cell holding ln T (clamped to the table) and the position t in [0, 1] inside it. */
function cellOf(table: BandTable, lnT: number): { i: number; t: number } {
  const s = (lnT - table.lnT0) * table.invStep;
  const last = table.lnFlux.length - 2;
  let i = Math.floor(s);
  if (i < 0) i = 0;
  else if (i > last) i = last;
  return { i, t: s - i };
}

export function tableLogFlux(table: BandTable, lnT: number): number {
  const { i, t } = cellOf(table, lnT);
  const u = 1 - t;
  const y0 = table.lnFlux[i]!;
  const y1 = table.lnFlux[i + 1]!;
  const m0 = table.tangent[i]!;
  const m1 = table.tangent[i + 1]!;
  // Cubic Hermite basis (common practice).
  return (1 + 2 * t) * u * u * y0 + t * u * u * m0 + t * t * (3 - 2 * t) * y1 - t * t * u * m1;
}

/**
 * d ln F / d ln T from the table: the derivative of the same cubic Hermite interpolant
 * (common practice), used for the band-averaged beaming factor in hot loops.
 */
export function tableLogSlope(table: BandTable, lnT: number): number {
  const { i, t } = cellOf(table, lnT);
  const y0 = table.lnFlux[i]!;
  const y1 = table.lnFlux[i + 1]!;
  const m0 = table.tangent[i]!;
  const m1 = table.tangent[i + 1]!;
  const dpdt = (6 * t * t - 6 * t) * (y0 - y1) + (3 * t * t - 4 * t + 1) * m0 + (3 * t * t - 2 * t) * m1;
  return dpdt * table.invStep;
}

/**
 * A dense table of F itself (not ln F) on a uniform ln T grid, for loops that need the
 * linear flux at millions of temperatures: a lookup is one linear interpolation and no
 * exp. Built from the Hermite table above. Linear interpolation errs by
 * (d ln F / d ln T)^2 h^2 / 8 relative (common practice); with 2^16 nodes
 * (h = 1.16e-4) that is at most 4e-6 above 500 K in optical bands, and the flux of
 * cooler planets is negligible there (test/inference/signal-model.test.ts reports the
 * worst case).
 */
export interface DenseFluxTable {
  readonly lnT0: number;
  readonly invStep: number;
  readonly flux: Float64Array;
}

export const DENSE_POINTS = 65536;
const denseCache = new WeakMap<BandTable, DenseFluxTable>();

export function denseFluxTable(table: BandTable): DenseFluxTable {
  const cached = denseCache.get(table);
  if (cached) return cached;
  const lnT0 = Math.log(table.minK);
  const step = (Math.log(table.maxK) - lnT0) / (DENSE_POINTS - 1);
  const flux = new Float64Array(DENSE_POINTS);
  for (let i = 0; i < DENSE_POINTS; i++) flux[i] = Math.exp(tableLogFlux(table, lnT0 + i * step));
  const dense = { lnT0, invStep: 1 / step, flux };
  denseCache.set(table, dense);
  return dense;
}
