/**
 * Running a batch: rows whose cells could be read go to the worker pool, every row
 * yields an outcome in input order, and a failing row (bad values, no posterior
 * support, even a worker that dies) is reported in its own outcome while the rest go on.
 */
import { HesperError } from '../errors.ts';
import type { CatalogSnapshot } from './messages.ts';
import { InterpretPool } from './pool.ts';
import { problemsOf, type RowOutcome } from './results.ts';
import type { BatchRow } from './rows.ts';

export interface BatchRunOptions {
  /** Worker threads (capped at the number of rows to run). */
  workers: number;
  catalog?: CatalogSnapshot;
  /** Called after each finished row with the count done so far. */
  onProgress?: (done: number, total: number) => void;
}

export async function runBatch(rows: readonly BatchRow[], options: BatchRunOptions): Promise<RowOutcome[]> {
  const total = rows.length;
  let done = 0;
  const tick = () => options.onProgress?.(++done, total);
  const runnable = rows.filter((r) => r.system !== undefined).length;
  const pool = runnable > 0 ? new InterpretPool(Math.max(1, Math.min(options.workers, runnable))) : undefined;
  try {
    return await Promise.all(
      rows.map(async (row): Promise<RowOutcome> => {
        if (!row.system || !pool) {
          tick();
          return { line: row.line, name: row.name, ok: false, problems: row.problems };
        }
        try {
          const result = await pool.run(row.system, options.catalog);
          tick();
          return { line: row.line, name: row.name, ok: true, result };
        } catch (e) {
          tick();
          const problems = e instanceof HesperError ? problemsOf(e) : [`internal: ${e instanceof Error ? e.message.split('\n')[0] : String(e)}`];
          return { line: row.line, name: row.name, ok: false, problems };
        }
      }),
    );
  } finally {
    await pool?.close();
  }
}
