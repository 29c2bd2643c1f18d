/**
 * A worker thread of the interpretation pool: runs interpret and report jobs on
 * system-file JSON values (with the catalog snapshot, sent again only when its version
 * changes) and answers with the result or the failure as plain data. Started by
 * InterpretPool through worker-entry.mjs.
 */
import { parentPort } from 'node:worker_threads';
import { HesperError } from '../errors.ts';
import { interpretJob, reportJob } from './jobs.ts';
import type { CatalogSnapshot, FailureData, JobResult, ReadyMessage, ResultMessage, TaskMessage } from './messages.ts';

let cached: CatalogSnapshot | undefined;

function catalogFor(task: TaskMessage): CatalogSnapshot | undefined {
  if (!task.catalog) return undefined;
  if (task.catalog.snapshot) cached = task.catalog.snapshot;
  if (cached?.version !== task.catalog.version) throw new Error(`worker has no catalog snapshot of version ${task.catalog.version}`);
  return cached;
}

function failureOf(e: unknown): FailureData {
  if (e instanceof HesperError) return { code: e.code, kind: e.kind, message: e.message, issues: e.issues };
  const err = e instanceof Error ? e : new Error(String(e));
  return { code: 'internal', kind: 'internal', message: err.message, issues: [], ...(err.stack ? { stack: err.stack } : {}) };
}

async function answer(task: TaskMessage): Promise<ResultMessage> {
  try {
    const catalog = catalogFor(task);
    const job = task.job;
    const result: JobResult = job.kind === 'report'
      ? await reportJob(task.system, catalog, job.format)
      : job.kind === 'interpret-json'
        ? JSON.stringify(interpretJob(task.system, catalog))
        : interpretJob(task.system, catalog);
    return { id: task.id, ok: true, result };
  } catch (e) {
    return { id: task.id, ok: false, failure: failureOf(e) };
  }
}

const port = parentPort;
if (port) {
  port.on('message', (task: TaskMessage) => {
    void answer(task).then((m) => port.postMessage(m));
  });
  port.postMessage({ ready: true } satisfies ReadyMessage);
}
