/**
 * Binning in phase. Each bin holds the inverse-variance weighted mean of the flux,
 * with error 1 / sqrt(sum w), and the same weighted mean of every design column. As
 * the model is linear, the binned model is then exactly the weighted mean of the
 * point models: binning loses resolution but introduces no bias, even across the
 * eclipse ingress where the shape changes within a bin. Empty bins are dropped.
 *
 * With `groups`, the bins are formed within each group (a baseline segment, or a
 * segment and an orbital cycle when trends are fitted): averaging points of different
 * segments into one bin would make their normalisations indistinguishable, and
 * averaging over a whole segment would erase the time information a trend needs.
 */
import { inputError, requireInRange } from '../errors.ts';
import type { Design } from './design-matrix.ts';

export function binDesign(design: Design, bins: number, groups?: Int32Array): Design {
  requireInRange('bins', bins, { min: 2 });
  if (!Number.isInteger(bins)) throw inputError('out-of-range', 'bins', `bins = ${bins}: must be a whole number`, bins, 'integers >= 2');
  const { cols } = design;
  // Cell key of each row: group x bins + phase bin; the keys in use are numbered in
  // increasing order (group, then phase), so the binned rows are sorted like the bins.
  const keyOf = new Float64Array(design.rows);
  for (let r = 0; r < design.rows; r++) {
    const pb = Math.min(bins - 1, Math.floor(design.phase[r]! * bins));
    keyOf[r] = (groups ? groups[r]! * bins : 0) + pb;
  }
  const keys = Float64Array.from(new Set(keyOf)).sort();
  const index = new Map<number, number>();
  keys.forEach((k, c) => index.set(k, c));
  const cellOf = new Int32Array(design.rows);
  for (let r = 0; r < design.rows; r++) cellOf[r] = index.get(keyOf[r]!)!;
  const rank = Int32Array.from(keys, (_, c) => c);
  const nCells = keys.length;
  const wSum = new Float64Array(nCells);
  const colSum = new Float64Array(nCells * cols);
  const fluxSum = new Float64Array(nCells);
  const phaseSum = new Float64Array(nCells);
  for (let r = 0; r < design.rows; r++) {
    const b = rank[cellOf[r]!]!;
    const e = design.fluxErr[r]!;
    const w = 1 / (e * e);
    wSum[b] = wSum[b]! + w;
    fluxSum[b] = fluxSum[b]! + w * design.flux[r]!;
    phaseSum[b] = phaseSum[b]! + w * design.phase[r]!;
    const o = r * cols;
    const ob = b * cols;
    for (let j = 0; j < cols; j++) colSum[ob + j] = colSum[ob + j]! + w * design.matrix[o + j]!;
  }
  let used = 0;
  for (let b = 0; b < nCells; b++) if (wSum[b]! > 0) used++;
  const matrix = new Float64Array(used * cols);
  const phase = new Float64Array(used);
  const flux = new Float64Array(used);
  const fluxErr = new Float64Array(used);
  const eclipseCol = design.names.indexOf('eclipse');
  let inEclipse = 0;
  let r = 0;
  for (let b = 0; b < nCells; b++) {
    const w = wSum[b]!;
    if (!(w > 0)) continue;
    for (let j = 0; j < cols; j++) matrix[r * cols + j] = colSum[b * cols + j]! / w;
    if (eclipseCol >= 0 && matrix[r * cols + eclipseCol] !== 0) inEclipse++;
    phase[r] = phaseSum[b]! / w;
    flux[r] = fluxSum[b]! / w;
    fluxErr[r] = 1 / Math.sqrt(w);
    r++;
  }
  return { names: design.names, rows: used, cols, matrix, phase, flux, fluxErr, inEclipse };
}
