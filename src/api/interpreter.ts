/**
 * Who computes for the API: in the request's own thread (tests, small machines) or on a
 * pool of worker threads (`hesper serve`), so that interpretations use every core and
 * the event loop stays free for other requests.
 */
import { interpretJob, type ReportFormat, type ReportResult, reportJob } from '../batch/jobs.ts';
import type { CatalogSnapshot } from '../batch/messages.ts';
import { InterpretPool } from '../batch/pool.ts';
import type { Interpretation } from '../index.ts';

export interface Interpreter {
  /** Interprets a system-file JSON value that has already passed validation. */
  run(system: unknown, catalog: CatalogSnapshot): Promise<Interpretation>;
  /** The same as JSON text, when the interpreter can produce it more cheaply than run + stringify. */
  runJson?(system: unknown, catalog: CatalogSnapshot): Promise<string>;
  /** The write-up (paragraphs, BibTeX, figure) of a validated system-file JSON value. */
  report(system: unknown, catalog: CatalogSnapshot, format: ReportFormat): Promise<ReportResult>;
  close(): Promise<void>;
}

/** Computes in the calling thread. */
export function inlineInterpreter(): Interpreter {
  return {
    run: async (system, catalog) => interpretJob(system, catalog),
    report: (system, catalog, format) => reportJob(system, catalog, format),
    close: async () => undefined,
  };
}

/** Computes on `workers` worker threads; resolves once they have started. */
export async function pooledInterpreter(workers: number): Promise<Interpreter> {
  const pool = new InterpretPool(workers);
  await pool.ready();
  return {
    run: (system, catalog) => pool.run(system, catalog),
    runJson: (system, catalog) => pool.runJson(system, catalog),
    report: (system, catalog, format) => pool.report(system, catalog, format),
    close: () => pool.close(),
  };
}
