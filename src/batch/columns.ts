/**
 * The column scheme of a batch CSV, one planet per row, derived from the system-file
 * schema so that a field added there is a column here too. A quantity field `x` is given
 * as `x` (a fixed value, or the value with an uncertainty), `x_err` (symmetric 1-sigma),
 * `x_errplus` and `x_errminus` (asymmetric), `x_min` and `x_max` (uniform) or, for
 * measurements, `x_upperlimit` (95 % upper limit). Plain fields (numbers, words) are one
 * column each. `band` takes a built-in band name or tophat:MIN-MAX (nm).
 */
import { z } from 'zod';
import { assumptionsSchema, measurementsSchema, planetSchema, starSchema } from '../io/system-schema.ts';

export type Group = 'star' | 'planet' | 'measurements' | 'assumptions';

export type FieldKind =
  | { kind: 'quantity'; measurement: boolean }
  | { kind: 'number'; integer: boolean }
  | { kind: 'enum'; options: string[] };

export interface BatchField {
  group: Group;
  name: string;
  description: string;
  type: FieldKind;
}

/** Suffixes of the columns of one quantity field, and what they mean. */
export const QUANTITY_SUFFIXES = {
  '': 'value (alone: a fixed value)',
  _err: 'symmetric 1-sigma uncertainty',
  _errplus: 'upper 1-sigma uncertainty',
  _errminus: 'lower 1-sigma uncertainty (its magnitude is used, so -3 and 3 are the same)',
  _min: 'lower end of a uniform range',
  _max: 'upper end of a uniform range',
  _upperlimit: '95 % upper limit (measurements only)',
} as const;
export type QuantitySuffix = keyof typeof QUANTITY_SUFFIXES;

/** Columns that are not system fields. */
export const ROW_COLUMNS = {
  name: 'planet name (default: "line N")',
  band: 'built-in band name (`hesper bands`) or tophat:MIN-MAX in nm; required',
  note: 'free text kept with the row',
} as const;

function unwrap(schema: z.ZodType): z.ZodType {
  let s: z.ZodType = schema;
  while (s instanceof z.ZodOptional || s instanceof z.ZodDefault) s = s.unwrap() as z.ZodType;
  return s;
}

function kindOf(group: Group, schema: z.ZodType): FieldKind | undefined {
  const s = unwrap(schema);
  if (s instanceof z.ZodUnion) return { kind: 'quantity', measurement: group === 'measurements' };
  if (s instanceof z.ZodNumber) return { kind: 'number', integer: s.isInt };
  if (s instanceof z.ZodEnum) return { kind: 'enum', options: s.options.map(String) };
  return undefined;
}

function fieldsOf(group: Group, schema: z.ZodObject): BatchField[] {
  const out: BatchField[] = [];
  for (const [name, field] of Object.entries(schema.shape)) {
    const type = kindOf(group, field as z.ZodType);
    if (!type) continue;
    const description = (field as z.ZodType).description ?? unwrap(field as z.ZodType).description ?? '';
    out.push({ group, name, description, type });
  }
  return out;
}

/** Every system field a batch row may set, in system-file order. */
export const BATCH_FIELDS: readonly BatchField[] = [
  ...fieldsOf('star', starSchema),
  ...fieldsOf('planet', planetSchema),
  ...fieldsOf('measurements', measurementsSchema),
  ...fieldsOf('assumptions', assumptionsSchema),
];

export interface ColumnRef {
  /** The column name as the scheme spells it. */
  column: string;
  field?: BatchField;
  suffix?: QuantitySuffix;
  /** For name, band, note. */
  rowColumn?: keyof typeof ROW_COLUMNS;
}

/** Every accepted column, keyed by its lower-case name (headers match case-insensitively). */
export const COLUMN_INDEX: ReadonlyMap<string, ColumnRef> = (() => {
  const m = new Map<string, ColumnRef>();
  for (const c of Object.keys(ROW_COLUMNS) as Array<keyof typeof ROW_COLUMNS>) m.set(c, { column: c, rowColumn: c });
  for (const f of BATCH_FIELDS) {
    if (f.type.kind !== 'quantity') {
      m.set(f.name.toLowerCase(), { column: f.name, field: f });
      continue;
    }
    for (const suffix of Object.keys(QUANTITY_SUFFIXES) as QuantitySuffix[]) {
      if (suffix === '_upperlimit' && !f.type.measurement) continue;
      m.set(`${f.name}${suffix}`.toLowerCase(), { column: `${f.name}${suffix}`, field: f, suffix });
    }
  }
  return m;
})();

/** The column scheme in words, for `hesper batch --help` and the README. */
export function batchColumnsHelp(): string {
  const lines = [
    'Input CSV: a header line, then one planet per row; lines starting with # are comments; empty cells are absent.',
    'Row columns:',
    ...Object.entries(ROW_COLUMNS).map(([c, d]) => `  ${c.padEnd(12)} ${d}`),
    'A quantity field x takes the columns:',
    ...Object.entries(QUANTITY_SUFFIXES).map(([s, d]) => `  x${s.padEnd(11)} ${d}`),
    '  (x with x_err, x with x_errplus and x_errminus, x_min with x_max, or x_upperlimit)',
  ];
  for (const group of ['star', 'planet', 'measurements', 'assumptions'] as const) {
    const fields = BATCH_FIELDS.filter((f) => f.group === group);
    lines.push(`${group} fields:`);
    for (const f of fields) {
      const kind = f.type.kind === 'quantity' ? (f.type.measurement ? 'measurement' : 'quantity') : f.type.kind === 'enum' ? f.type.options.join('|') : f.type.integer ? 'integer' : 'number';
      lines.push(`  ${f.name.padEnd(24)} ${kind.padEnd(24)} ${f.description}`);
    }
  }
  lines.push('Header names match case-insensitively; an unknown or repeated column stops the batch before any row runs.');
  return lines.join('\n');
}
