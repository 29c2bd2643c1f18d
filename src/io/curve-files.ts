/**
 * Reading light-curve files, CSV or FITS (told apart by their first bytes: a FITS
 * file starts with the card "SIMPLE  ="), one or several at once (one per sector or
 * quarter). Several files are joined into one curve whose points remember their file,
 * so that each file gets its own baseline segments in the decomposition.
 */
import { HesperError } from '../errors.ts';
import type { LightCurve } from '../lightcurve/types.ts';
import { parseCurveCsv } from './curve-csv.ts';
import { parseFitsCurve, type CurveColumnOptions, type CurveFileSummary } from './curve-fits.ts';
import { looksLikeFits } from './fits/file.ts';
import { readInputBytes } from './files.ts';

export type { CurveColumnOptions, CurveFileSummary } from './curve-fits.ts';

/** Most files read into one curve (our choice: a Kepler mission has 18 quarters, TESS a few dozen sectors per star). */
export const MAX_CURVE_FILES = 200;

export interface ReadCurves {
  /** All points, with `fileIndex` and `files` set when there are several files. */
  curve: LightCurve;
  files: CurveFileSummary[];
}

/** Parses one light curve from its bytes (CSV text or FITS). */
export function parseLightCurveBytes(bytes: Uint8Array, label: string, options: CurveColumnOptions = {}): { curve: LightCurve; summary: CurveFileSummary } {
  if (looksLikeFits(bytes)) return parseFitsCurve(bytes, label, options);
  const curve = parseCurveCsv(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).toString('utf8'), label);
  const n = curve.x.length;
  return { curve, summary: { file: label, format: 'csv', rows: n, points: n, dropped: { nonFinite: 0, nonPositiveError: 0, quality: 0 }, notes: [] } };
}

/** Reads one light-curve file (relative paths resolve against baseDir). */
export function readLightCurveFile(baseDir: string, file: string, options: CurveColumnOptions = {}): { curve: LightCurve; summary: CurveFileSummary } {
  return parseLightCurveBytes(readInputBytes('curve', baseDir, file), file, options);
}

/** Joins curves read from several files into one (fileIndex and files set). */
export function joinCurves(parts: Array<{ curve: LightCurve; label: string }>): LightCurve {
  if (parts.length === 0) throw new HesperError('invalid-input', 'no light-curve file given', [{ path: 'curve', message: 'give at least one light-curve file' }]);
  const kind = parts[0]!.curve.column;
  const odd = parts.find((p) => p.curve.column !== kind);
  if (odd) {
    const message = `${odd.label} is a ${odd.curve.column} series but ${parts[0]!.label} is a ${kind} series: give all files as time series or all as folded curves`;
    throw new HesperError('bad-light-curve', message, [{ path: odd.label, message }]);
  }
  if (parts.length === 1) return parts[0]!.curve;
  let n = 0;
  for (const p of parts) n += p.curve.x.length;
  const x = new Float64Array(n);
  const flux = new Float64Array(n);
  const fluxErr = new Float64Array(n);
  const fileIndex = new Int32Array(n);
  let o = 0;
  parts.forEach((p, f) => {
    x.set(p.curve.x, o);
    flux.set(p.curve.flux, o);
    fluxErr.set(p.curve.fluxErr, o);
    fileIndex.fill(f, o, o + p.curve.x.length);
    o += p.curve.x.length;
  });
  return { column: kind, x, flux, fluxErr, fileIndex, files: parts.map((p) => p.label) };
}

/** Reads one or several light-curve files (CSV or FITS) into one curve with file labels. */
export function readLightCurveFiles(baseDir: string, files: readonly string[], options: CurveColumnOptions = {}): ReadCurves {
  if (files.length > MAX_CURVE_FILES) {
    throw new HesperError('invalid-input', `${files.length} light-curve files`, [{ path: 'curve', message: `${files.length} light-curve files: at most ${MAX_CURVE_FILES} are read at once`, value: files.length }]);
  }
  const seen = new Set<string>();
  for (const f of files) {
    if (seen.has(f)) throw new HesperError('invalid-input', `${f} is given twice`, [{ path: f, message: `${f} is given twice: each file is one set of points` }]);
    seen.add(f);
  }
  const read = files.map((f) => readLightCurveFile(baseDir, f, options));
  const curve = joinCurves(read.map((r, k) => ({ curve: r.curve, label: files[k]! })));
  return { curve, files: read.map((r) => r.summary) };
}
