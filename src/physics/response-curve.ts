/**
 * Band response curves: validation of user curves (inline arrays or CSV text) and the
 * piecewise-linear representation the integrator uses. A curve is zero outside its
 * first and last point and linear in wavelength between points.
 */
import { HesperError, type Issue } from '../errors.ts';

/** A validated response curve, SI wavelengths, ascending. */
export interface ResponseCurve {
  readonly wavelengthM: Float64Array;
  readonly weight: Float64Array;
}

/** Wavelengths accepted for response curves [nm]; outside this a unit mistake is likely. */
export const RESPONSE_MIN_NM = 10;
export const RESPONSE_MAX_NM = 1e6;
const MAX_REPORTED_ISSUES = 20;

interface Row {
  wavelengthNm: number;
  weight: number;
  where: string;
}

function issue(path: string, message: string, value?: unknown, allowed?: string): Issue {
  const i: Issue = { path, message };
  if (value !== undefined) i.value = value;
  if (allowed !== undefined) i.allowed = allowed;
  return i;
}

function fail(what: string, issues: Issue[]): never {
  const shown = issues.slice(0, MAX_REPORTED_ISSUES);
  if (issues.length > shown.length) {
    shown.push(issue(what, `... and ${issues.length - shown.length} more problem(s) of the same kind`));
  }
  const first = shown[0]?.message ?? 'invalid response curve';
  throw new HesperError('bad-response-curve', `${what}: ${first}${issues.length > 1 ? ` (+${issues.length - 1} more)` : ''}`, shown, 'input');
}

/** Checks rows (wavelengths in nm): finite, positive, in range, strictly increasing, weights >= 0, not all zero. */
function checkRows(rows: Row[], what: string, leadIssues: Issue[] = []): Array<[number, number]> {
  const issues = [...leadIssues];
  let previous = -Infinity;
  for (const r of rows) {
    if (!Number.isFinite(r.wavelengthNm)) {
      issues.push(issue(r.where, `${r.where}: wavelength ${String(r.wavelengthNm)} is not a finite number`, String(r.wavelengthNm), 'finite numbers'));
      continue;
    }
    if (r.wavelengthNm < RESPONSE_MIN_NM || r.wavelengthNm > RESPONSE_MAX_NM) {
      issues.push(issue(r.where, `${r.where}: wavelength ${r.wavelengthNm} nm is outside [${RESPONSE_MIN_NM}, ${RESPONSE_MAX_NM}] nm; check the unit (nm or um)`, r.wavelengthNm, `[${RESPONSE_MIN_NM}, ${RESPONSE_MAX_NM}] nm`));
    }
    if (!(r.wavelengthNm > previous)) {
      issues.push(issue(r.where, `${r.where}: wavelength ${r.wavelengthNm} nm is not greater than the previous ${previous} nm; wavelengths must increase strictly`, r.wavelengthNm, `> ${previous} nm`));
    }
    previous = r.wavelengthNm;
    if (!Number.isFinite(r.weight)) {
      issues.push(issue(r.where, `${r.where}: weight ${String(r.weight)} is not a finite number`, String(r.weight), 'finite numbers >= 0'));
    } else if (r.weight < 0) {
      issues.push(issue(r.where, `${r.where}: weight ${r.weight} is negative`, r.weight, '>= 0'));
    }
  }
  if (rows.length === 0) issues.push(issue(what, `${what}: the response curve has no data points`, 0, 'at least 2 points'));
  else if (rows.length < 2) issues.push(issue(what, `${what}: the response curve has ${rows.length} point; at least 2 are needed`, rows.length, 'at least 2 points'));
  if (issues.length === 0 && rows.every((r) => r.weight === 0)) {
    issues.push(issue(what, `${what}: every weight is zero`, 0, 'at least one weight > 0'));
  }
  if (issues.length > 0) fail(what, issues);
  return rows.map((r) => [r.wavelengthNm, r.weight]);
}

/**
 * Validates an inline curve [[wavelength, weight], ...] given in nm (default) or um.
 * Returns [nm, weight] pairs. Throws `bad-response-curve` naming each bad point.
 */
export function validateResponsePairs(pairs: unknown, unit: 'nm' | 'um' = 'nm', path = 'band.response'): Array<[number, number]> {
  if (unit !== 'nm' && unit !== 'um') {
    fail(path, [issue(`${path}.unit`, `${path}.unit = ${String(unit)}: must be "nm" or "um"`, unit, 'nm, um')]);
  }
  if (!Array.isArray(pairs)) fail(path, [issue(path, `${path}: must be an array of [wavelength, weight] pairs`, typeof pairs, 'array of pairs')]);
  const factor = unit === 'um' ? 1000 : 1;
  const shapeIssues: Issue[] = [];
  const rows: Row[] = [];
  pairs.forEach((p: unknown, i: number) => {
    const where = `${path}[${i}]`;
    if (!Array.isArray(p) || p.length !== 2 || typeof p[0] !== 'number' || typeof p[1] !== 'number') {
      shapeIssues.push(issue(where, `${where}: must be a pair of numbers [wavelength, weight]`, p, '[number, number]'));
      return;
    }
    rows.push({ wavelengthNm: p[0] * factor, weight: p[1], where });
  });
  if (shapeIssues.length > 0) fail(path, shapeIssues);
  return checkRows(rows, path);
}

const HEADERS: Record<string, number> = { 'wavelength_nm,weight': 1, 'wavelength_um,weight': 1000 };

/**
 * Parses CSV text with header `wavelength_nm,weight` or `wavelength_um,weight` (lines
 * starting with # and blank lines are skipped). Returns [nm, weight] pairs. Problems are
 * reported with the line number, e.g. "tess.csv:7", code `bad-response-curve`.
 */
export function parseResponseCsv(text: string, source: string): Array<[number, number]> {
  if (typeof text !== 'string') fail(source, [issue(source, `${source}: response CSV must be text`, typeof text)]);
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  let factor: number | undefined;
  const rows: Row[] = [];
  const lead: Issue[] = [];
  for (let i = 0; i < lines.length; i++) {
    const raw = lines[i]!.trim();
    if (raw === '' || raw.startsWith('#')) continue;
    const where = `${source}:${i + 1}`;
    if (factor === undefined) {
      const header = raw.replace(/\s+/g, '').toLowerCase();
      factor = HEADERS[header];
      if (factor === undefined) {
        fail(source, [issue(where, `line ${i + 1}: header "${raw}" must be wavelength_nm,weight or wavelength_um,weight`, raw, 'wavelength_nm,weight | wavelength_um,weight')]);
      }
      continue;
    }
    const cells = raw.split(',').map((c) => c.trim());
    if (cells.length !== 2 || cells[0] === '' || cells[1] === '') {
      lead.push(issue(where, `line ${i + 1}: expected two values "wavelength,weight", got "${raw}"`, raw, 'two comma-separated numbers'));
      continue;
    }
    const w = Number(cells[0]);
    const r = Number(cells[1]);
    if (Number.isNaN(w) || Number.isNaN(r)) {
      lead.push(issue(where, `line ${i + 1}: "${raw}" is not a pair of numbers`, raw, 'two comma-separated numbers'));
      continue;
    }
    rows.push({ wavelengthNm: w * factor, weight: r, where: `line ${i + 1}` });
  }
  if (factor === undefined) fail(source, [issue(source, `${source}: the response CSV is empty (no header, no data)`, '', 'header wavelength_nm,weight and at least 2 rows')]);
  // Row issues name "line N"; give them the file as path prefix.
  try {
    return checkRows(rows, source, lead);
  } catch (e) {
    if (e instanceof HesperError) {
      for (const iss of e.issues) if (iss.path.startsWith('line ')) iss.path = `${source}:${iss.path.slice(5)}`;
    }
    throw e;
  }
}

/** Builds the SI curve from validated [nm, weight] pairs. */
export function curveFromPairsNm(pairs: ReadonlyArray<readonly [number, number]>): ResponseCurve {
  const n = pairs.length;
  const wavelengthM = new Float64Array(n);
  const weight = new Float64Array(n);
  pairs.forEach(([nm, w], i) => {
    wavelengthM[i] = nm * 1e-9;
    weight[i] = w;
  });
  return { wavelengthM, weight };
}

/** Indices of the first and last point of the non-zero part of a curve's weights. */
export function supportIndices(weight: ArrayLike<number>): { lo: number; hi: number } {
  const n = weight.length;
  let lo = 0;
  while (lo < n - 1 && weight[lo] === 0 && weight[lo + 1] === 0) lo++;
  let hi = n - 1;
  while (hi > 0 && weight[hi] === 0 && weight[hi - 1] === 0) hi--;
  return { lo, hi };
}

/** Shortest and longest wavelength with non-zero response [nm] (the coverage), from [nm, weight] pairs. */
export function pairsSupportNm(pairs: ReadonlyArray<readonly [number, number]>): { minNm: number; maxNm: number } {
  const { lo, hi } = supportIndices(pairs.map((p) => p[1]));
  return { minNm: pairs[lo]![0], maxNm: pairs[hi]![0] };
}

/** 64-bit content hash of the curve (two FNV-1a 32-bit passes with different offsets; common practice). */
export function curveHash(curve: ResponseCurve): string {
  let h1 = 0x811c9dc5;
  let h2 = 0x01000193 ^ 0x5bd1e995;
  const mix = (arr: Float64Array): void => {
    const bytes = new Uint8Array(arr.buffer, arr.byteOffset, arr.byteLength);
    for (const b of bytes) {
      h1 = Math.imul(h1 ^ b, 0x01000193) >>> 0;
      h2 = Math.imul(h2 ^ b, 0x01000193) >>> 0;
      h2 = (h2 ^ (h2 >>> 13)) >>> 0;
    }
  };
  mix(curve.wavelengthM);
  mix(curve.weight);
  return h1.toString(16).padStart(8, '0') + h2.toString(16).padStart(8, '0');
}

/** True when two curves have identical points. */
export function curvesEqual(a: ResponseCurve, b: ResponseCurve): boolean {
  if (a.weight.length !== b.weight.length) return false;
  for (let i = 0; i < a.weight.length; i++) {
    if (a.wavelengthM[i] !== b.wavelengthM[i] || a.weight[i] !== b.weight[i]) return false;
  }
  return true;
}
