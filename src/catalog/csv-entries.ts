/**
 * CSV import (columns in csv-columns.ts): every row is validated like a JSON entry,
 * every bad row is reported with its line number, and nothing is written unless all
 * rows are valid.
 */
import type Database from 'better-sqlite3';
import { HesperError, type Issue } from '../errors.ts';
import { parseCsv } from './csv.ts';
import { CSV_COLUMNS, IGNORED_COLUMNS, type Column } from './csv-columns.ts';
import type { ImportReport } from './types.ts';
import { prepareBatch, writeBatch, type BatchItem, type Problem } from './user-entries.ts';

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** Optional columns whose empty cell means "use the default" rather than null. */
const DEFAULTED_FIELDS = new Set<string>(['provenance', 'appliesTo']);

function cellValue(col: Column, cell: string, at: string, problems: Problem[]): unknown {
  const text = cell.trim();
  if (text === '') {
    if (col.required || DEFAULTED_FIELDS.has(col.field)) return col.kind === 'keys' && col.required ? [] : undefined;
    return col.field === 'description' ? '' : null;
  }
  if (col.kind === 'number') {
    if (!NUMBER.test(text)) {
      problems.push({ path: `${at}, ${col.name}`, code: 'invalid-input', message: `"${text}" is not a number`, value: text });
      return undefined;
    }
    return Number(text);
  }
  if (col.kind === 'keys') return text.split(';').map((k) => k.trim()).filter((k) => k.length > 0);
  return text;
}

/** Translates "line 4.valueMin" style zod paths into "line 4, value_min". */
function csvPath(path: string): string {
  const m = /^(line \d+)\.?(.*)$/.exec(path);
  if (!m) return path;
  const [, line, rest] = m;
  if (!rest) return line!;
  const field = rest.replace(/\[\d+\]$/, '');
  const col = CSV_COLUMNS.find((c) => c.field === field);
  return `${line}, ${col ? col.name : rest}`;
}

/** Imports every row in one transaction; any bad row aborts the whole file. */
export function importEntriesCsv(db: Database.Database, text: string, now: string): ImportReport {
  const { records, errors } = parseCsv(text);
  const problems: Problem[] = errors.map((e) => ({ path: `line ${e.line}`, code: 'bad-csv', message: e.message }));
  const header = records[0];
  if (!header) {
    throw new HesperError('bad-csv', 'the CSV file is empty: a header line naming the columns is required', [{ path: 'line 1', message: 'no header line', allowed: CSV_COLUMNS.map((c) => c.name).join(',') }], 'input');
  }
  const names = header.fields.map((f) => f.trim());
  const index = new Map<string, number>();
  names.forEach((n, i) => {
    if (index.has(n)) problems.push({ path: `line ${header.line}`, code: 'bad-csv', message: `column "${n}" appears twice` });
    else if (!CSV_COLUMNS.some((c) => c.name === n) && !IGNORED_COLUMNS.includes(n)) {
      problems.push({ path: `line ${header.line}`, code: 'bad-csv', message: `unknown column "${n}"`, allowed: CSV_COLUMNS.map((c) => c.name).join(', ') });
    }
    index.set(n, i);
  });
  for (const c of CSV_COLUMNS) {
    if (c.required && !index.has(c.name)) problems.push({ path: `line ${header.line}`, code: 'bad-csv', message: `required column "${c.name}" is missing` });
  }
  if (problems.length > 0) throw rowFailure(problems);
  const items: BatchItem[] = [];
  for (const r of records.slice(1)) {
    const at = `line ${r.line}`;
    if (r.fields.length !== names.length) {
      problems.push({ path: at, code: 'bad-csv', message: `has ${r.fields.length} fields, the header has ${names.length}` });
      continue;
    }
    const raw: Record<string, unknown> = {};
    for (const c of CSV_COLUMNS) {
      const i = index.get(c.name);
      if (i === undefined) continue;
      const v = cellValue(c, r.fields[i]!, at, problems);
      if (v !== undefined) raw[c.field] = v;
    }
    items.push({ raw, prefix: at });
  }
  if (records.length === 1) problems.push({ path: `line ${header.line}`, code: 'bad-csv', message: 'the file has a header but no rows' });
  return db
    .transaction(() => {
      const batch = prepareBatch(db, items);
      // A cell already reported as not-a-number is not reported again by the schema.
      const reported = new Set(problems.map((p) => p.path));
      const later = batch.problems.map((p) => ({ ...p, path: csvPath(p.path) })).filter((p) => !reported.has(p.path));
      const all = [...problems, ...later];
      if (all.length > 0) throw rowFailure(all);
      writeBatch(db, batch, now);
      return { imported: batch.entries.length, ids: batch.entries.map((e) => e.id) };
    })
    .immediate();
}

function lineOf(issue: Issue): number {
  const m = /^line (\d+)/.exec(issue.path);
  return m ? Number(m[1]) : 0;
}

function rowFailure(problems: Problem[]): HesperError {
  const issues: Issue[] = problems.map(({ code: _code, ...i }) => i).sort((a, b) => lineOf(a) - lineOf(b));
  const lines = new Set(issues.map(lineOf));
  return new HesperError(
    'bad-csv',
    `CSV not imported (nothing was changed): ${issues.length} problem${issues.length === 1 ? '' : 's'} on ${lines.size} line${lines.size === 1 ? '' : 's'}`,
    issues,
    'input',
  );
}
