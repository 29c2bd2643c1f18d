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
  const byFile: number[][] = Array.from({ length: fileCount }, () => []);
  for (let i = 0; i < n; i++) {
    const f = fileIndex ? fileIndex[i]! : 0;
    if (!(f >= 0 && f < fileCount)) throw inputError('invalid-input', 'curve.fileIndex', `point ${i} has file index ${f}, but there are ${fileCount} files`, f);
    byFile[f]!.push(i);
  }
  const segmentOf = new Int32Array(n);
  const segments: Segment[] = [];
  const label = (f: number): string => curve.files?.[f] ?? 'curve';
  const push = (f: number, idx: number[]): void => {
    if (idx.length === 0) return;
    const s = segments.length;
    for (const i of idx) segmentOf[i] = s;
    const timed = curve.column === 'time';
    segments.push({
      number: s + 1, file: label(f), fileIndex: f,
      start: timed ? curve.x[idx[0]!]! : null, end: timed ? curve.x[idx[idx.length - 1]!]! : null,
      indices: Int32Array.from(idx),
    });
  };
  for (let f = 0; f < fileCount; f++) {
    const idx = byFile[f]!;
    if (curve.column === 'phase') {
      push(f, idx);
      continue;
    }
    idx.sort((a, b) => curve.x[a]! - curve.x[b]!);
    let run: number[] = [];
    for (const i of idx) {
      const last = run[run.length - 1];
      if (last !== undefined && curve.x[i]! - curve.x[last]! > gapDays) {
        push(f, run);
        run = [];
      }
      run.push(i);
    }
    push(f, run);
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
  const ids = new Map<string, number>();
  const out: number[] = [];
  for (let i = 0; i < keep.length; i++) {
    if (!keep[i]) continue;
    const s = seg.segmentOf[i]!;
    const cycle = plan.segments[s]!.order > 0 && curve.column === 'time' ? Math.floor((curve.x[i]! - (epochDays ?? 0)) / periodDays) : 0;
    const key = `${s}:${cycle}`;
    let id = ids.get(key);
    if (id === undefined) {
      id = ids.size;
      ids.set(key, id);
    }
    out.push(id);
  }
  return Int32Array.from(out);
}
