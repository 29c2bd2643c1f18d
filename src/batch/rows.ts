/**
 * Reading a batch CSV: the header is checked as a whole (unknown, repeated or unpaired
 * columns stop the batch with bad-batch-csv); each row becomes a system-file JSON value,
 * or a list of problems naming its columns, so one bad row does not stop the others.
 */
import { parseCsv } from '../catalog/csv.ts';
import { HesperError, type Issue } from '../errors.ts';
import { type BatchField, COLUMN_INDEX, type ColumnRef, type QuantitySuffix } from './columns.ts';

export interface BatchRow {
  /** 1-based line of the row in the file. */
  line: number;
  name: string;
  /** The system-file value to interpret, when the row's cells could be read. */
  system?: Record<string, unknown>;
  /** Problems with the row's cells, each starting with the column name. */
  problems: string[];
}

export interface BatchInput {
  columns: ColumnRef[];
  rows: BatchRow[];
}

function badHeader(issues: Issue[]): HesperError {
  return new HesperError('bad-batch-csv', `batch CSV: ${issues.length} problem${issues.length === 1 ? '' : 's'} with the header`, issues);
}

function checkHeader(header: string[]): ColumnRef[] {
  const issues: Issue[] = [];
  const seen = new Map<string, number>();
  const refs: ColumnRef[] = header.map((raw, i) => {
    const name = raw.trim();
    const ref = COLUMN_INDEX.get(name.toLowerCase());
    const where = `header column ${i + 1}`;
    if (!ref) {
      issues.push({ path: where, message: `unknown column "${name.slice(0, 80)}"; \`hesper batch --help\` lists the columns`, value: name.slice(0, 80) });
      return { column: name };
    }
    const before = seen.get(ref.column);
    if (before !== undefined) issues.push({ path: where, message: `column "${ref.column}" repeats column ${before + 1}`, value: name });
    seen.set(ref.column, i);
    return ref;
  });
  const has = (c: string) => seen.has(c);
  if (!has('band')) issues.push({ path: 'header', message: 'the column "band" is required (a built-in band name or tophat:MIN-MAX)' });
  for (const ref of refs) {
    if (!ref.field || !ref.suffix) continue;
    const x = ref.field.name;
    const need: Record<string, string[]> = { _err: [x], _errplus: [x, `${x}_errminus`], _errminus: [x, `${x}_errplus`], _min: [`${x}_max`], _max: [`${x}_min`] };
    for (const other of need[ref.suffix] ?? []) {
      if (!has(other)) issues.push({ path: `header column ${ref.column}`, message: `column "${ref.column}" needs the column "${other}"` });
    }
  }
  if (issues.length > 0) throw badHeader(issues);
  return refs;
}

function readNumber(cell: string, column: string, problems: string[], integer = false): number | undefined {
  const n = Number(cell);
  if (cell.trim() === '' || !Number.isFinite(n)) {
    problems.push(`${column}: "${cell.slice(0, 40)}" is not a finite number`);
    return undefined;
  }
  if (integer && !Number.isInteger(n)) {
    problems.push(`${column}: ${cell} is not an integer`);
    return undefined;
  }
  return n;
}

type Cells = Partial<Record<QuantitySuffix, number>>;

/** A quantity from its cells, in the forms of the system file. */
function quantityOf(field: BatchField, c: Cells, problems: string[]): unknown {
  const x = field.name;
  const given = (Object.keys(c) as QuantitySuffix[]).filter((s) => c[s] !== undefined);
  if (given.length === 0) return undefined;
  const only = (allowed: QuantitySuffix[]) => given.every((s) => allowed.includes(s));
  const conflict = (what: string) => {
    problems.push(`${x}: ${what}; give ${x} with ${x}_err, ${x} with ${x}_errplus and ${x}_errminus, ${x}_min with ${x}_max, or ${x}_upperlimit`);
    return undefined;
  };
  if (c._upperlimit !== undefined) return only(['_upperlimit']) ? { upperLimit: c._upperlimit, confidence: 0.95 } : conflict(`${x}_upperlimit cannot be combined with other ${x} columns`);
  if (c._min !== undefined || c._max !== undefined) {
    if (!only(['_min', '_max'])) return conflict(`${x}_min/${x}_max cannot be combined with other ${x} columns`);
    if (c._min === undefined || c._max === undefined) return conflict(`${x}_min and ${x}_max must both be given`);
    return { min: c._min, max: c._max };
  }
  if (c[''] === undefined) return conflict(`an uncertainty is given without the value ${x}`);
  if (c._err !== undefined) return only(['', '_err']) ? { value: c[''], sigma: c._err } : conflict(`${x}_err cannot be combined with ${x}_errplus/${x}_errminus`);
  if (c._errplus !== undefined || c._errminus !== undefined) {
    if (c._errplus === undefined || c._errminus === undefined) return conflict(`${x}_errplus and ${x}_errminus must both be given`);
    return { value: c[''], plus: c._errplus, minus: Math.abs(c._errminus) };
  }
  return c[''];
}

function bandOf(cell: string): unknown {
  const m = /^tophat:\s*([-+0-9.eE]+)\s*-\s*([-+0-9.eE]+)$/i.exec(cell.trim());
  return m ? { tophatNm: [Number(m[1]), Number(m[2])] } : cell.trim();
}

function readRow(refs: ColumnRef[], fields: string[], line: number): BatchRow {
  const problems: string[] = [];
  const groups: Record<string, Record<string, unknown>> = { star: {}, planet: {}, measurements: {}, assumptions: {} };
  const quantities = new Map<BatchField, Cells>();
  let name = `line ${line}`;
  let band: unknown;
  let note: string | undefined;
  if (fields.length > refs.length) problems.push(`row has ${fields.length} cells but the header has ${refs.length} columns`);
  refs.forEach((ref, i) => {
    const cell = (fields[i] ?? '').trim();
    if (cell === '') return;
    if (ref.rowColumn === 'name') name = cell.slice(0, 200);
    else if (ref.rowColumn === 'band') band = bandOf(cell);
    else if (ref.rowColumn === 'note') note = cell.slice(0, 2000);
    else if (ref.field && ref.suffix !== undefined) {
      const v = readNumber(cell, ref.column, problems);
      if (v !== undefined) quantities.set(ref.field, { ...quantities.get(ref.field), [ref.suffix]: v });
    } else if (ref.field) {
      const t = ref.field.type;
      groups[ref.field.group]![ref.field.name] = t.kind === 'number' ? readNumber(cell, ref.column, problems, t.integer) : cell;
    }
  });
  for (const [field, cells] of quantities) {
    const q = quantityOf(field, cells, problems);
    if (q !== undefined) groups[field.group]![field.name] = q;
  }
  if (band === undefined) problems.push('band: empty; give a built-in band name or tophat:MIN-MAX');
  if (problems.length > 0) return { line, name, problems };
  const system: Record<string, unknown> = { name, band, star: groups.star, planet: groups.planet, measurements: groups.measurements };
  if (note !== undefined) system.note = note;
  if (Object.keys(groups.assumptions!).length > 0) system.assumptions = groups.assumptions;
  return { line, name, system, problems };
}

/** Reads the whole file; header faults throw, row faults are kept with their row. */
export function readBatchCsv(text: string): BatchInput {
  const parsed = parseCsv(text);
  if (parsed.errors.length > 0) {
    throw new HesperError('bad-batch-csv', 'batch CSV: the file is not well-formed CSV', parsed.errors.map((e) => ({ path: `line ${e.line}`, message: e.message })));
  }
  const records = parsed.records.filter((r) => !(r.fields[0] ?? '').trimStart().startsWith('#'));
  const [head, ...body] = records;
  if (!head) throw badHeader([{ path: 'line 1', message: 'the file has no header line' }]);
  const columns = checkHeader(head.fields);
  if (body.length === 0) throw badHeader([{ path: 'rows', message: 'the file has a header but no rows' }]);
  return { columns, rows: body.map((r) => readRow(columns, r.fields, r.line)) };
}
