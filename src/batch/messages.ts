/** Messages between the interpretation pool and its worker threads (plain data only). */
import type { SourceRecord } from '../catalog/index.ts';
import type { Issue } from '../errors.ts';
import type { Interpretation } from '../index.ts';
import type { CatalogData } from '../interpret/types.ts';
import type { ReportFormat, ReportResult } from './jobs.ts';

/**
 * Catalog data with a version. A worker keeps the last snapshot it was sent and is sent
 * the data again only when the version changes.
 */
export interface CatalogSnapshot {
  version: string;
  data: CatalogData;
  sources: readonly SourceRecord[];
}

/** `interpret-json` answers with the interpretation as JSON text (cheaper to pass between threads). */
export type Job = { kind: 'interpret' } | { kind: 'interpret-json' } | { kind: 'report'; format: ReportFormat };

export interface TaskMessage {
  id: number;
  job: Job;
  /** A system-file JSON value. */
  system: unknown;
  catalog?: { version: string; snapshot?: CatalogSnapshot };
}

export interface FailureData {
  code: string;
  kind: 'input' | 'not-found' | 'conflict' | 'forbidden' | 'internal';
  message: string;
  issues: Issue[];
  /** Stack of an unexpected error, for the server log only. */
  stack?: string;
}

export type JobResult = Interpretation | ReportResult | string;

export type ResultMessage =
  | { id: number; ok: true; result: JobResult }
  | { id: number; ok: false; failure: FailureData };

/** Sent once by a worker when its modules are loaded. */
export interface ReadyMessage {
  ready: true;
}
