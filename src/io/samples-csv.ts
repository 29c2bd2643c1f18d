/**
 * Posterior samples from a CSV file: a header row, then one sample per row. The
 * column is chosen by header name or zero-based index. Lines starting with # are
 * comments. Bad cells are reported with their line number.
 */
import { HesperError, type Issue } from '../errors.ts';

export function parseSamplesCsv(fieldPath: string, text: string, column: string | number): number[] {
  const lines = text.split(/\r?\n/);
  let header: string[] | undefined;
  let index = -1;
  const values: number[] = [];
  const issues: Issue[] = [];
  for (let n = 0; n < lines.length; n++) {
    const raw = lines[n]!.trim();
    if (raw === '' || raw.startsWith('#')) continue;
    const cells = raw.split(',').map((c) => c.trim());
    if (!header) {
      header = cells;
      index = typeof column === 'number' ? column : cells.indexOf(column);
      if (index < 0 || index >= cells.length) {
        throw new HesperError('file-unreadable', `${fieldPath}: no column ${JSON.stringify(column)}`, [
          { path: fieldPath, message: `line ${n + 1}: no column ${JSON.stringify(column)} in header (${cells.join(', ')})`, value: column },
        ]);
      }
      continue;
    }
    const cell = cells[index];
    const x = cell === undefined || cell === '' ? NaN : Number(cell);
    if (!Number.isFinite(x)) {
      issues.push({ path: fieldPath, message: `line ${n + 1}: ${cell === undefined ? 'missing cell' : `"${cell}" is not a finite number`}`, value: cell });
      if (issues.length >= 20) break;
    } else values.push(x);
  }
  if (issues.length > 0) throw new HesperError('file-unreadable', `${fieldPath}: bad samples`, issues);
  if (values.length < 20) {
    throw new HesperError('file-unreadable', `${fieldPath}: too few samples`, [
      { path: fieldPath, message: `${values.length} samples found; at least 20 are needed`, value: values.length, allowed: '>= 20' },
    ]);
  }
  return values;
}
