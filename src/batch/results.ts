/**
 * The results CSV of a batch: one row per input row, in input order. Summaries are
 * spread over columns QUANTITY_median, _lower68, _upper68, _lower95, _upper95,
 * _upperLimit95; a row that failed has status "error" and its problems in `error`,
 * each starting with the input column it concerns.
 */
import { csvLine } from '../catalog/csv.ts';
import type { HesperError, Issue } from '../errors.ts';
import type { Interpretation, Summary } from '../index.ts';

export const SUMMARY_FIELDS = [
  'geometricAlbedo', 'bondAlbedo', 'daysideTemperatureK', 'equilibriumTemperatureK',
  'thermalDepthPpm', 'reflectedDepthPpm', 'thermalFraction', 'allReflectedGeometricAlbedo',
] as const satisfies ReadonlyArray<keyof Interpretation>;

const SUMMARY_PARTS = ['median', 'lower68', 'upper68', 'lower95', 'upper95', 'upperLimit95'] as const satisfies ReadonlyArray<keyof Summary>;

/** How many candidates (best first) the results list. */
export const LISTED_CANDIDATES = 3;

export const RESULT_COLUMNS: readonly string[] = [
  'line', 'name', 'band', 'status',
  ...SUMMARY_FIELDS.flatMap((f) => SUMMARY_PARTS.map((p) => `${f}_${p}`)),
  'detected', 'clouds_or_ice_required', 'verdict_probability', 'consistent_candidates',
  'effective_sample_size', 'samples', 'seed', 'warnings', 'error',
];

export type RowOutcome =
  | { line: number; name: string; ok: true; result: Interpretation }
  | { line: number; name: string; ok: false; problems: string[] };

const SUFFIX_OF_PART: Record<string, string> = {
  value: '', sigma: '_err', plus: '_errplus', minus: '_errminus', min: '_min', max: '_max', upperLimit: '_upperlimit', confidence: '_upperlimit',
};

/** The input column an issue path of the system file points at ("planet.radiusRatio.sigma" -> "radiusRatio_err"). */
export function columnOfPath(path: string): string {
  const parts = path.split('.');
  if (parts[0] === 'band') return 'band';
  if (parts.length === 1) return path;
  const [group, field, part] = parts;
  if (group === 'star' || group === 'planet' || group === 'measurements' || group === 'assumptions') {
    if (field === undefined) return path;
    return part === undefined ? field : `${field}${SUFFIX_OF_PART[part] ?? ''}`;
  }
  return path;
}

/** One line per issue, led by the input column. */
export function problemsOf(error: HesperError | { issues: Issue[]; message: string }): string[] {
  if (error.issues.length === 0) return [error.message];
  return error.issues.map((i) => `${columnOfPath(i.path)}: ${i.message}`);
}

function summaryCells(s: Summary): number[] {
  return SUMMARY_PARTS.map((p) => s[p]);
}

function resultCells(r: Interpretation): (string | number)[] {
  const consistent = r.candidates.filter((c) => c.status === 'consistent').slice(0, LISTED_CANDIDATES).map((c) => c.id);
  return [
    ...SUMMARY_FIELDS.flatMap((f) => summaryCells(r[f])),
    r.detected ? 'yes' : 'no',
    r.verdict.cloudsOrIceRequired,
    r.verdict.probability ?? '',
    consistent.join(';'),
    r.diagnostics.effectiveSampleSize,
    r.diagnostics.samples,
    r.diagnostics.seed,
    r.warnings.join(' | '),
  ];
}

export function resultLine(o: RowOutcome): string {
  if (o.ok) return csvLine([o.line, o.name, o.result.band.id, 'ok', ...resultCells(o.result), '']);
  const blanks = RESULT_COLUMNS.length - 5;
  return csvLine([o.line, o.name, '', 'error', ...new Array<string>(blanks).fill(''), o.problems.join('; ')]);
}

export function resultsCsv(outcomes: readonly RowOutcome[]): string {
  return `${[csvLine(RESULT_COLUMNS), ...outcomes.map(resultLine)].join('\n')}\n`;
}
