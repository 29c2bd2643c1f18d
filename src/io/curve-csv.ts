/**
 * Light-curve CSV: a header row naming `time,flux,flux_err` (a time series, times in
 * days) or `phase,flux,flux_err` (already folded, phase in cycles with 0 at transit),
 * in any order and with extra columns ignored, then one point per row. Lines that
 * start with # and blank lines are skipped. Every problem names its line; up to
 * MAX_ISSUES are collected before giving up.
 */
import { HesperError, type Issue } from '../errors.ts';
import type { LightCurve } from '../lightcurve/types.ts';
import { readInputText } from './files.ts';

const MAX_ISSUES = 20;
/** A plain decimal number (no hex, no "Infinity", no empty cell). */
const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

export function parseCurveCsv(text: string, label = 'curve'): LightCurve {
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  const issues: Issue[] = [];
  const add = (line: number, column: string | null, message: string, value?: unknown): void => {
    const issue: Issue = { path: `${label} line ${line}${column ? `, ${column}` : ''}`, message };
    if (value !== undefined) issue.value = value;
    issues.push(issue);
  };
  let header: { line: number; cols: number; xName: 'time' | 'phase'; ix: number; iFlux: number; iErr: number } | undefined;
  const x: number[] = [];
  const flux: number[] = [];
  const fluxErr: number[] = [];
  let prev: { value: number; line: number } | undefined;
  for (let n = 0; n < lines.length && issues.length < MAX_ISSUES; n++) {
    const line = n + 1;
    const raw = lines[n]!.trim();
    if (raw === '' || raw.startsWith('#')) continue;
    const cells = raw.split(',').map((c) => c.trim());
    if (!header) {
      const names = cells.map((c) => c.toLowerCase());
      const hasTime = names.includes('time');
      const hasPhase = names.includes('phase');
      const missing = ['flux', 'flux_err'].filter((c) => !names.includes(c));
      if (hasTime && hasPhase) add(line, null, 'header has both time and phase columns: give one of them');
      if (!hasTime && !hasPhase) missing.unshift('time (or phase)');
      if (missing.length > 0) {
        add(line, null, `header lacks column${missing.length > 1 ? 's' : ''} ${missing.join(', ')} (found: ${cells.join(', ')}); expected time,flux,flux_err or phase,flux,flux_err`);
      }
      if (issues.length > 0) break;
      const xName = hasTime ? 'time' : 'phase';
      header = { line, cols: cells.length, xName, ix: names.indexOf(xName), iFlux: names.indexOf('flux'), iErr: names.indexOf('flux_err') };
      continue;
    }
    if (cells.length !== header.cols) {
      add(line, null, `${cells.length} cells, but the header (line ${header.line}) has ${header.cols}`);
      continue;
    }
    const read = (index: number, name: string): number | undefined => {
      const cell = cells[index]!;
      if (!NUMBER.test(cell)) {
        add(line, name, cell === '' ? 'empty cell' : `"${cell}" is not a number`, cell);
        return undefined;
      }
      return Number(cell);
    };
    const xv = read(header.ix, header.xName);
    const f = read(header.iFlux, 'flux');
    const e = read(header.iErr, 'flux_err');
    if (e !== undefined && !(e > 0)) add(line, 'flux_err', `flux_err = ${e}: must be > 0`, e);
    if (xv !== undefined && header.xName === 'phase' && (xv < -1 || xv > 1)) {
      add(line, 'phase', `phase = ${xv}: must be in [-1, 1] (orbital phase in cycles, 0 at transit); for times use a time column`, xv);
    }
    if (xv !== undefined && header.xName === 'time') {
      if (prev && xv === prev.value) add(line, 'time', `time ${xv} duplicates line ${prev.line}: times must be strictly increasing`, xv);
      else if (prev && xv < prev.value) add(line, 'time', `time ${xv} is earlier than ${prev.value} on line ${prev.line}: times must be sorted (strictly increasing)`, xv);
      prev = { value: xv, line };
    }
    if (xv !== undefined && f !== undefined && e !== undefined) {
      x.push(xv);
      flux.push(f);
      fluxErr.push(e);
    }
  }
  if (!header && issues.length === 0) add(lines.length, null, 'no header row: expected time,flux,flux_err or phase,flux,flux_err');
  if (header && issues.length === 0 && x.length === 0) add(header.line, null, 'no data rows after the header');
  if (issues.length > 0) {
    const more = issues.length >= MAX_ISSUES ? ` (stopped after ${MAX_ISSUES})` : '';
    throw new HesperError('bad-light-curve', `${label}: ${issues.length} problem${issues.length === 1 ? '' : 's'}${more}`, issues);
  }
  return { column: header!.xName, x: Float64Array.from(x), flux: Float64Array.from(flux), fluxErr: Float64Array.from(fluxErr) };
}

/** Reads and parses a light-curve CSV file; relative paths resolve against `baseDir`. */
export function readCurveCsv(baseDir: string, file: string): LightCurve {
  const text = readInputText('curve', baseDir, file);
  return parseCurveCsv(text, file);
}
