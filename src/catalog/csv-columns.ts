/**
 * The catalog CSV format: one entry per row, a header naming the columns (any order).
 * Sources are existing source keys separated by ";" (add new source records with
 * `catalog add --file`, which takes full records). Import is all-or-nothing
 * (csv-entries.ts); this module holds the columns and the export, and loads no zod.
 */
import { csvLine } from './csv.ts';
import type { CatalogEntry } from './types.ts';
import { CATEGORIES, PLANET_CLASSES, PROVENANCES, QUANTITIES, USER_PROVENANCE } from './vocab.ts';

/** keys: a list separated by ";" (source keys, planet classes). */
type Kind = 'text' | 'number' | 'keys';

export interface Column {
  name: string;
  field: keyof CatalogEntry;
  kind: Kind;
  required: boolean;
  help: string;
}

/** The columns, in export order. */
export const CSV_COLUMNS: readonly Column[] = [
  { name: 'id', field: 'id', kind: 'text', required: true, help: 'slug: lower-case letters, digits, hyphens' },
  { name: 'name', field: 'name', kind: 'text', required: true, help: 'readable name' },
  { name: 'category', field: 'category', kind: 'text', required: true, help: CATEGORIES.join('|') },
  { name: 'quantity', field: 'quantity', kind: 'text', required: true, help: QUANTITIES.join('|') },
  { name: 'band_min_nm', field: 'bandMinNm', kind: 'number', required: true, help: 'band start, nm' },
  { name: 'band_max_nm', field: 'bandMaxNm', kind: 'number', required: true, help: 'band end, nm (> band_min_nm)' },
  { name: 'value_min', field: 'valueMin', kind: 'number', required: true, help: 'lowest value (>= 0)' },
  { name: 'value_nominal', field: 'valueNominal', kind: 'number', required: true, help: 'nominal value, in [value_min, value_max]' },
  { name: 'value_max', field: 'valueMax', kind: 'number', required: true, help: 'highest value (<= 1 unless geometric)' },
  { name: 'temperature_min_k', field: 'temperatureMinK', kind: 'number', required: false, help: 'lowest temperature where it applies, K (empty = none)' },
  { name: 'temperature_max_k', field: 'temperatureMaxK', kind: 'number', required: false, help: 'highest temperature where it applies, K (empty = none)' },
  { name: 'condensate', field: 'condensate', kind: 'text', required: false, help: 'condensing species, e.g. MgSiO3 (empty = none)' },
  { name: 'provenance', field: 'provenance', kind: 'text', required: false, help: `${PROVENANCES.join('|')} (empty = ${USER_PROVENANCE})` },
  { name: 'applies_to', field: 'appliesTo', kind: 'keys', required: false, help: `planet classes separated by ";": ${PLANET_CLASSES.join('|')} (empty = any)` },
  { name: 'sources', field: 'sources', kind: 'keys', required: true, help: 'existing source keys separated by ";"' },
  { name: 'description', field: 'description', kind: 'text', required: false, help: 'free text' },
];

/** Accepted in a header and ignored (exports carry it; imported rows are always user rows). */
export const IGNORED_COLUMNS = ['origin'];

/** The column list as help text, one column a line. */
export function csvColumnsHelp(): string {
  const width = Math.max(...CSV_COLUMNS.map((c) => c.name.length));
  return CSV_COLUMNS.map((c) => `  ${c.name.padEnd(width)}  ${c.required ? 'required' : 'optional'}  ${c.help}`).join('\n');
}

/** Entries as CSV in the import format, plus an origin column. */
export function entriesToCsv(list: readonly CatalogEntry[]): string {
  const head = [...CSV_COLUMNS.map((c) => c.name), 'origin'];
  const lines = [csvLine(head)];
  for (const e of list) {
    const cells = CSV_COLUMNS.map((c) => {
      const v = e[c.field];
      if (Array.isArray(v)) return v.join(';');
      return v as string | number | null;
    });
    lines.push(csvLine([...cells, e.origin]));
  }
  return `${lines.join('\n')}\n`;
}
