/**
 * Light curves from FITS binary tables, as the missions distribute them (Kepler, K2,
 * TESS light-curve files: a LIGHTCURVE extension with TIME, SAP_FLUX, PDCSAP_FLUX,
 * their _ERR columns and QUALITY). Columns are chosen by name, with defaults that fit
 * those files:
 * - time: TIME, in days; BJD = TIME + BJDREFI + BJDREFF (or + BJDREF), the keywords
 *   read from the table's header, then the primary header;
 * - flux: PDCSAP_FLUX, else SAP_FLUX, else FLUX; its error: the same name + _ERR;
 * - quality: QUALITY when present; a point is masked when (QUALITY & mask) != 0, every
 *   bit by default.
 * Points with a NaN time, flux or error, or an error <= 0, are dropped and counted.
 * The flux and its error are divided by the median flux of the file, so that the
 * fitted amplitudes are fractions of the star's flux (each segment's normalisation is
 * then fitted near 1).
 */
import { HesperError } from '../errors.ts';
import type { LightCurve } from '../lightcurve/types.ts';
import { binaryTable, findColumn, readColumn, type BinaryTable } from './fits/bintable.ts';
import { parseFits, type FitsFile, type FitsHdu } from './fits/file.ts';

export interface CurveColumnOptions {
  /** Which extension holds the table: its EXTNAME or its number (1 = the first extension). */
  extension?: string | number;
  timeColumn?: string;
  fluxColumn?: string;
  fluxErrColumn?: string;
  /** Quality-flag column; null = do not mask by quality. */
  qualityColumn?: string | null;
  /** Bits of the quality flags that mask a point (default: every bit, any flag set). */
  qualityMask?: number;
}

export const DEFAULT_FLUX_COLUMNS = ['PDCSAP_FLUX', 'SAP_FLUX', 'FLUX'] as const;
export const ALL_QUALITY_BITS = 2 ** 53 - 1;

/** What reading one file did, for the output and the report. */
export interface CurveFileSummary {
  file: string;
  format: 'csv' | 'fits';
  /** Rows in the file, and points kept. */
  rows: number;
  points: number;
  dropped: { nonFinite: number; nonPositiveError: number; quality: number };
  /** FITS only: the extension and columns used, the time offset added and the flux divided out. */
  extension?: string;
  columns?: { time: string; flux: string; fluxErr: string; quality: string | null };
  qualityMask?: number;
  timeOffsetDays?: number;
  timeSystem?: string;
  medianFlux?: number;
  notes: string[];
}

function columnError(label: string, where: string, message: string, table: BinaryTable): HesperError {
  const present = table.columns.map((c) => c.name).join(', ');
  const full = `${message}; columns present: ${present}`;
  return new HesperError('bad-light-curve', `${label}: ${full}`, [{ path: `${label}, ${where}`, message: full }]);
}

function pickTable(fits: FitsFile, options: CurveColumnOptions): BinaryTable {
  const tables = fits.hdus.filter((h) => h.type === 'BINTABLE');
  const describe = (h: FitsHdu): string => `${h.index} ${h.type}${h.name ? ` (${h.name})` : ''}`;
  const listing = fits.hdus.slice(1).map(describe).join(', ') || 'none';
  const ext = options.extension;
  if (ext !== undefined) {
    const hdu = typeof ext === 'number'
      ? fits.hdus[ext]
      : fits.hdus.find((h) => h.index > 0 && h.name.toUpperCase() === ext.trim().toUpperCase());
    if (!hdu || hdu.index === 0) {
      throw new HesperError('bad-light-curve', `${fits.label}: no extension ${JSON.stringify(ext)}`, [
        { path: `${fits.label}, extension`, message: `no extension ${JSON.stringify(ext)}; extensions present: ${listing}`, value: ext },
      ]);
    }
    return binaryTable(fits, hdu);
  }
  if (tables.length === 0) {
    throw new HesperError('bad-light-curve', `${fits.label}: no binary-table extension`, [
      { path: fits.label, message: `no binary-table (BINTABLE) extension to read a light curve from; extensions present: ${listing}` },
    ]);
  }
  const time = (options.timeColumn ?? 'TIME');
  for (const h of tables) {
    const t = binaryTable(fits, h);
    if (findColumn(t, time)) return t;
  }
  return binaryTable(fits, tables[0]!);
}

function numberKeyword(fits: FitsFile, table: BinaryTable, key: string): number | undefined {
  for (const h of [table.hdu.header, fits.hdus[0]!.header]) {
    const v = h.get(key);
    if (typeof v === 'number') return v;
  }
  return undefined;
}

function stringKeyword(fits: FitsFile, table: BinaryTable, key: string): string | undefined {
  for (const h of [table.hdu.header, fits.hdus[0]!.header]) {
    const v = h.get(key);
    if (typeof v === 'string') return v.trim();
  }
  return undefined;
}

function median(values: Float64Array): number {
  const s = Float64Array.from(values).sort();
  const n = s.length;
  return n % 2 ? s[(n - 1) / 2]! : (s[n / 2 - 1]! + s[n / 2]!) / 2;
}

/** Reads a light curve from the bytes of a FITS file. */
export function parseFitsCurve(bytes: Uint8Array, label: string, options: CurveColumnOptions = {}): { curve: LightCurve; summary: CurveFileSummary } {
  const fits = parseFits(bytes, label);
  const table = pickTable(fits, options);
  const where = `extension ${table.hdu.index}${table.hdu.name ? ` (${table.hdu.name})` : ''}`;
  const notes: string[] = [];

  const timeName = options.timeColumn ?? 'TIME';
  const timeCol = findColumn(table, timeName);
  if (!timeCol) throw columnError(label, where, `no time column ${timeName}${options.timeColumn ? '' : ' (the default; choose another with --time-column)'}`, table);
  let fluxCol;
  if (options.fluxColumn !== undefined) {
    fluxCol = findColumn(table, options.fluxColumn);
    if (!fluxCol) throw columnError(label, where, `no flux column ${options.fluxColumn}`, table);
  } else {
    for (const n of DEFAULT_FLUX_COLUMNS) if ((fluxCol = findColumn(table, n))) break;
    if (!fluxCol) throw columnError(label, where, `no flux column: none of ${DEFAULT_FLUX_COLUMNS.join(', ')} is present (choose one with --flux-column)`, table);
  }
  const errName = options.fluxErrColumn ?? `${fluxCol.name}_ERR`;
  const errCol = findColumn(table, errName);
  if (!errCol) throw columnError(label, where, `no flux-error column ${errName}${options.fluxErrColumn ? '' : ` (the default for ${fluxCol.name}; choose another with --flux-error-column)`}`, table);
  let qualityCol = null;
  if (options.qualityColumn !== null) {
    const qName = options.qualityColumn ?? 'QUALITY';
    qualityCol = findColumn(table, qName) ?? null;
    if (!qualityCol && options.qualityColumn !== undefined) throw columnError(label, where, `no quality column ${qName}`, table);
    if (!qualityCol) notes.push('no QUALITY column: no point masked by quality flags.');
  }
  for (const c of [timeCol, fluxCol, errCol, ...(qualityCol ? [qualityCol] : [])]) {
    if (c.repeat !== 1) throw columnError(label, where, `column ${c.name} holds ${c.repeat} values per row (format ${c.repeat}${c.type}); a light-curve column holds one`, table);
  }
  const timeUnit = table.hdu.header.get('TIMEUNIT') ?? fits.hdus[0]!.header.get('TIMEUNIT');
  if (typeof timeUnit === 'string' && !['d', 'day', 'days'].includes(timeUnit.trim().toLowerCase())) {
    throw new HesperError('bad-light-curve', `${label}: TIMEUNIT = '${timeUnit}'`, [{ path: `${label}, ${where}, TIMEUNIT`, message: `TIMEUNIT = '${timeUnit}': times must be in days`, value: timeUnit }]);
  }
  const refI = numberKeyword(fits, table, 'BJDREFI');
  const refF = numberKeyword(fits, table, 'BJDREFF');
  const ref = numberKeyword(fits, table, 'BJDREF');
  let offset = 0;
  if (refI !== undefined || refF !== undefined) offset = (refI ?? 0) + (refF ?? 0);
  else if (ref !== undefined) offset = ref;
  else notes.push(`no BJDREFI/BJDREFF or BJDREF keyword: ${timeCol.name} used as it is (give the epoch in the same time system).`);
  const timeSystem = stringKeyword(fits, table, 'TIMESYS');

  const t = readColumn(table, timeCol).values;
  const f = readColumn(table, fluxCol).values;
  const e = readColumn(table, errCol).values;
  const q = qualityCol ? readColumn(table, qualityCol).values : null;
  const mask = options.qualityMask ?? ALL_QUALITY_BITS;
  const bigMask = BigInt(Math.trunc(mask));
  const dropped = { nonFinite: 0, nonPositiveError: 0, quality: 0 };
  const keep: number[] = [];
  for (let r = 0; r < table.rows; r++) {
    if (q && mask !== 0) {
      const flag = q[r]!;
      if (Number.isFinite(flag) && flag !== 0) {
        const hit = flag >= 0 && flag <= 0x7fffffff && mask <= 0x7fffffff ? (flag & mask) !== 0 : (BigInt.asUintN(64, BigInt(Math.trunc(flag))) & bigMask) !== 0n;
        if (hit) {
          dropped.quality++;
          continue;
        }
      }
    }
    if (!Number.isFinite(t[r]!) || !Number.isFinite(f[r]!) || !Number.isFinite(e[r]!)) {
      dropped.nonFinite++;
      continue;
    }
    if (!(e[r]! > 0)) {
      dropped.nonPositiveError++;
      continue;
    }
    keep.push(r);
  }
  if (keep.length === 0) {
    const message = `no usable point in ${table.rows} rows (${dropped.quality} masked by quality flags, ${dropped.nonFinite} with a NaN time, flux or error, ${dropped.nonPositiveError} with an error <= 0)`;
    throw new HesperError('bad-light-curve', `${label}: ${message}`, [{ path: `${label}, ${where}`, message }]);
  }
  const x = Float64Array.from(keep, (r) => t[r]! + offset);
  for (let k = 1; k < x.length; k++) {
    if (!(x[k]! > x[k - 1]!)) {
      const message = `${timeCol.name} is not strictly increasing: row ${keep[k]! + 1} (${t[keep[k]!]}) follows row ${keep[k - 1]! + 1} (${t[keep[k - 1]!]})`;
      throw new HesperError('bad-light-curve', `${label}: ${message}`, [{ path: `${label}, ${where}, ${timeCol.name}`, message }]);
    }
  }
  const rawFlux = Float64Array.from(keep, (r) => f[r]!);
  const med = median(rawFlux);
  if (!(med > 0)) {
    const message = `the median of ${fluxCol.name} is ${med}: a flux column must be positive`;
    throw new HesperError('bad-light-curve', `${label}: ${message}`, [{ path: `${label}, ${where}, ${fluxCol.name}`, message, value: med }]);
  }
  const flux = rawFlux.map((v) => v / med);
  const fluxErr = Float64Array.from(keep, (r) => e[r]! / med);
  if (fluxCol.name.toUpperCase() === 'SAP_FLUX') {
    notes.push('SAP_FLUX is not corrected for the light of other stars in the aperture: that light dilutes every amplitude (PDCSAP_FLUX is corrected).');
  }
  return {
    curve: { column: 'time', x, flux, fluxErr },
    summary: {
      file: label, format: 'fits', rows: table.rows, points: keep.length, dropped,
      extension: where,
      columns: { time: timeCol.name, flux: fluxCol.name, fluxErr: errCol.name, quality: qualityCol ? qualityCol.name : null },
      ...(qualityCol ? { qualityMask: mask } : {}),
      timeOffsetDays: offset,
      ...(timeSystem ? { timeSystem } : {}),
      medianFlux: med,
      notes,
    },
  };
}
