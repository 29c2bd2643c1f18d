/**
 * Baseline segments of a light curve. Each input file, and each stretch of a file
 * between gaps longer than `gapDays`, is one segment with its own normalisation and
 * a low-order polynomial trend in time. These are columns of the same weighted least
 * squares as the phase curve (design-matrix.ts), never removed beforehand, so the
 * phase-curve uncertainties include their correlations with the baseline.
 *
 * The trend of segment s is sum_k b_sk P_k(tau), with P_k the Legendre polynomials
 * and tau = (t - t_mid) / half-span in [-1, 1] over the segment (well-conditioned
 * columns; common practice). A folded curve carries no time: one segment per file,
 * constant only.
 */
import { inputError, requireInRange } from '../errors.ts';
import type { BaselineColumn, LightCurve } from './types.ts';

/** Default longest gap inside one segment [days] (our choice: splits the ~1-day data downlink gaps of Kepler quarters and TESS sectors, keeps momentum-dump gaps of minutes). */
export const DEFAULT_GAP_DAYS = 0.5;
/** Default order of the polynomial trend of each segment (our choice: a linear drift per segment). */
export const DEFAULT_TREND_ORDER = 1;
export const MAX_TREND_ORDER = 5;
/** Fewer fitted points than this in a segment: its trend is dropped, only its normalisation fitted (our choice). */
export const MIN_TREND_POINTS = 20;

export interface Segment {
  /** 1-based number, in file order then time order. */
  number: number;
  file: string;
  fileIndex: number;
  /** First and last time of the segment's points [days, the curve's time system]; null for folded curves. */
  start: number | null;
  end: number | null;
  /** Indices (into the curve) of the segment's points, in time order. */
  indices: Int32Array;
}

export interface Segmentation {
  /** Segment index (0-based) of every point of the curve. */
  segmentOf: Int32Array;
  segments: Segment[];
}

export function checkBaselineOptions(trendOrder: number, gapDays: number): void {
  requireInRange('trendOrder', trendOrder, { min: 0, max: MAX_TREND_ORDER });
  if (!Number.isInteger(trendOrder)) throw inputError('out-of-range', 'trendOrder', `trendOrder = ${trendOrder}: must be a whole number`, trendOrder, `0..${MAX_TREND_ORDER}`);
  if (!(gapDays > 0)) throw inputError('out-of-range', 'gapDays', `gapDays = ${gapDays}: must be > 0 (days)`, gapDays, '(0, inf]');
}

/** Splits a curve into segments by file and by gaps longer than gapDays. */
export function segmentCurve(curve: LightCurve, gapDays: number): Segmentation {
  const n = curve.x.length;
  const fileCount = curve.files?.length ?? 1;
  const fileIndex = curve.fileIndex;
  if (fileIndex && fileIndex.length !== n) throw inputError('invalid-input', 'curve.fileIndex', `fileIndex has ${fileIndex.length} entries for ${n} points`);
  // Counting sort of the point indices by file (stable: each file keeps its order).
  const start = new Int32Array(fileCount + 1);
  for (let i = 0; i < n; i++) {
    const f = fileIndex ? fileIndex[i]! : 0;
    if (!(f >= 0 && f < fileCount)) throw inputError('invalid-input', 'curve.fileIndex', `point ${i} has file index ${f}, but there are ${fileCount} files`, f);
    start[f + 1]!++;
  }
  for (let f = 0; f < fileCount; f++) start[f + 1] = start[f + 1]! + start[f]!;
  const order = new Int32Array(n);
  const fill = start.slice(0, fileCount);
  for (let i = 0; i < n; i++) order[fill[fileIndex ? fileIndex[i]! : 0]!++] = i;
  const segmentOf = new Int32Array(n);
  const segments: Segment[] = [];
  const timed = curve.column === 'time';
  const x = curve.x;
  const push = (f: number, from: number, to: number): void => {
    if (to <= from) return;
    const s = segments.length;
    const indices = order.subarray(from, to);
    for (let k = 0; k < indices.length; k++) segmentOf[indices[k]!] = s;
    segments.push({
      number: s + 1, file: curve.files?.[f] ?? 'curve', fileIndex: f,
      start: timed ? x[indices[0]!]! : null, end: timed ? x[indices[indices.length - 1]!]! : null, indices,
    });
  };
  for (let f = 0; f < fileCount; f++) {
    const a = start[f]!;
    const b = start[f + 1]!;
    if (!timed) {
      push(f, a, b);
      continue;
    }
    let sorted = true;
    for (let k = a + 1; k < b && sorted; k++) sorted = x[order[k]!]! >= x[order[k - 1]!]!;
    if (!sorted) order.set(Array.from(order.subarray(a, b)).sort((p, q) => x[p]! - x[q]!), a);
    let from = a;
    for (let k = a + 1; k < b; k++) {
      if (x[order[k]!]! - x[order[k - 1]!]! > gapDays) {
        push(f, from, k);
        from = k;
      }
    }
    push(f, from, b);
  }
  return { segmentOf, segments };
}

/** Legendre polynomials P_1..P_order at tau, by the recurrence (k+1) P_{k+1} = (2k+1) tau P_k - k P_{k-1}. */
export function legendre(tau: number, order: number, out: Float64Array): void {
  let pPrev = 1;
  let p = tau;
  for (let k = 1; k <= order; k++) {
    out[k - 1] = p;
    const next = ((2 * k + 1) * tau * p - k * pPrev) / (k + 1);
    pPrev = p;
    p = next;
  }
}

/** Baseline columns of the fit: per fitted segment its constant and trend terms. */
export interface BaselinePlan {
  /** Column names, in order. */
  names: BaselineColumn[];
  /** Per segment: first column, trend order used (-1 when the segment has no fitted point), mid-time and half-span. */
  segments: Array<{ firstColumn: number; order: number; midTime: number; halfSpan: number; fittedPoints: number }>;
}

/**
 * Plans the baseline columns from the points kept for the fit: a segment with no kept
 * point gets no column; one with fewer than MIN_TREND_POINTS, or spanning no time,
 * gets its constant only.
 */
export function planBaseline(curve: LightCurve, seg: Segmentation, keep: Uint8Array, trendOrder: number): BaselinePlan {
  const several = seg.segments.length > 1;
  const names: BaselineColumn[] = [];
  const plan: BaselinePlan['segments'] = [];
  for (const s of seg.segments) {
    let kept = 0;
    let tMin = Infinity;
    let tMax = -Infinity;
    for (const i of s.indices) {
      if (!keep[i]) continue;
      kept++;
      const t = curve.x[i]!;
      if (t < tMin) tMin = t;
      if (t > tMax) tMax = t;
    }
    if (kept === 0) {
      plan.push({ firstColumn: -1, order: -1, midTime: 0, halfSpan: 0, fittedPoints: 0 });
      continue;
    }
    const timed = curve.column === 'time' && tMax > tMin;
    const order = timed && kept >= MIN_TREND_POINTS ? trendOrder : 0;
    const firstColumn = names.length;
    names.push(several ? `segment${s.number}.constant` : 'constant');
    for (let k = 1; k <= order; k++) names.push(several ? `segment${s.number}.trend${k}` : `trend${k}`);
    plan.push({ firstColumn, order, midTime: timed ? (tMin + tMax) / 2 : 0, halfSpan: timed ? (tMax - tMin) / 2 : 1, fittedPoints: kept });
  }
  return { names, segments: plan };
}

/**
 * Groups for phase binning (bin.ts), one id per kept point in curve order: the
 * segment, and for a segment with a trend also the orbital cycle, so that binning
 * keeps the segments apart and the time information of the trends.
 */
export function binGroups(curve: LightCurve, seg: Segmentation, plan: BaselinePlan, keep: Uint8Array, periodDays: number, epochDays: number | undefined): Int32Array {
  const nSeg = seg.segments.length;
  const byCycle = (s: number): boolean => plan.segments[s]!.order > 0 && curve.column === 'time';
  const cycleOf = (i: number): number => Math.floor((curve.x[i]! - (epochDays ?? 0)) / periodDays);
  // First and last cycle of each segment, then a block of ids per segment.
  const lo = new Float64Array(nSeg).fill(Infinity);
  const hi = new Float64Array(nSeg).fill(-Infinity);
  let rows = 0;
  for (let i = 0; i < keep.length; i++) {
    if (!keep[i]) continue;
    rows++;
    const s = seg.segmentOf[i]!;
    const c = byCycle(s) ? cycleOf(i) : 0;
    if (c < lo[s]!) lo[s] = c;
    if (c > hi[s]!) hi[s] = c;
  }
  const first = new Float64Array(nSeg);
  let next = 0;
  for (let s = 0; s < nSeg; s++) {
    first[s] = next;
    if (hi[s]! >= lo[s]!) next += hi[s]! - lo[s]! + 1;
  }
  const out = new Int32Array(rows);
  let r = 0;
  for (let i = 0; i < keep.length; i++) {
    if (!keep[i]) continue;
    const s = seg.segmentOf[i]!;
    out[r++] = first[s]! + (byCycle(s) ? cycleOf(i) - lo[s]! : 0);
  }
  return out;
}
