/**
 * A pool of interpretation worker threads, one task per worker at a time, tasks queued
 * in arrival order. Used by `hesper batch` (rows across the cores) and by the HTTP
 * server (interpretations off the event loop). Known failures come back as the
 * HesperError they were; a worker that dies is replaced and its task fails as internal.
 */
import os from 'node:os';
import { Worker } from 'node:worker_threads';
import { type ErrorCode, ERROR_CODES, HesperError } from '../errors.ts';
import type { Interpretation } from '../index.ts';
import type { ReportFormat, ReportResult } from './jobs.ts';
import type { CatalogSnapshot, FailureData, Job, JobResult, ReadyMessage, ResultMessage, TaskMessage } from './messages.ts';

const ENTRY = new URL('./worker-entry.mjs', import.meta.url);

/** Worker count when none is given: the cores this process may use. */
export function defaultWorkerCount(): number {
  return Math.max(1, os.availableParallelism());
}

interface Task {
  id: number;
  job: Job;
  system: unknown;
  catalog: CatalogSnapshot | undefined;
  resolve: (r: JobResult) => void;
  reject: (e: Error) => void;
}

interface Slot {
  worker: Worker;
  ready: Promise<void>;
  busy: Task | undefined;
  /** Version of the catalog snapshot this worker holds. */
  catalogVersion: string | undefined;
}

/** A worker's failure as the error it was: HesperError for known codes, Error otherwise. */
export function failureToError(f: FailureData): Error {
  if (f.kind === 'internal' || !Object.hasOwn(ERROR_CODES, f.code)) {
    const e = new Error(`worker failure [${f.code}]: ${f.message}`);
    if (f.stack) e.stack = f.stack;
    return e;
  }
  return new HesperError(f.code as ErrorCode, f.message, f.issues, f.kind);
}

export class InterpretPool {
  readonly size: number;
  private readonly slots: Slot[] = [];
  private readonly queue: Task[] = [];
  private nextId = 1;
  private closed = false;

  constructor(size: number = defaultWorkerCount()) {
    if (!Number.isInteger(size) || size < 1) throw new RangeError(`pool size must be a positive integer, got ${size}`);
    this.size = size;
    for (let i = 0; i < size; i++) this.slots.push(this.spawn());
  }

  /** Resolves when every worker has loaded its modules. */
  async ready(): Promise<void> {
    await Promise.all(this.slots.map((s) => s.ready));
  }

  /** Interprets one system-file JSON value on the next free worker, matched against `catalog`. */
  run(system: unknown, catalog?: CatalogSnapshot): Promise<Interpretation> {
    return this.submit({ kind: 'interpret' }, system, catalog) as Promise<Interpretation>;
  }

  /** As run, answered as JSON text: the worker serialises, so no object graph crosses threads. */
  runJson(system: unknown, catalog?: CatalogSnapshot): Promise<string> {
    return this.submit({ kind: 'interpret-json' }, system, catalog) as Promise<string>;
  }

  /** The write-up of one system (paragraphs, BibTeX, figure) on the next free worker. */
  report(system: unknown, catalog: CatalogSnapshot | undefined, format: ReportFormat): Promise<ReportResult> {
    return this.submit({ kind: 'report', format }, system, catalog) as Promise<ReportResult>;
  }

  /** Stops the workers; queued tasks fail. */
  async close(): Promise<void> {
    this.closed = true;
    for (const t of this.queue.splice(0)) t.reject(new Error('the interpretation pool was closed'));
    await Promise.all(this.slots.map((s) => s.worker.terminate()));
  }

  private submit(job: Job, system: unknown, catalog: CatalogSnapshot | undefined): Promise<JobResult> {
    if (this.closed) return Promise.reject(new Error('the interpretation pool is closed'));
    return new Promise((resolve, reject) => {
      this.queue.push({ id: this.nextId++, job, system, catalog, resolve, reject });
      this.dispatch();
    });
  }

  private spawn(): Slot {
    const worker = new Worker(ENTRY);
    let markReady: () => void = () => undefined;
    const slot: Slot = { worker, ready: new Promise<void>((r) => { markReady = r; }), busy: undefined, catalogVersion: undefined };
    worker.on('message', (msg: ResultMessage | ReadyMessage) => {
      if ('ready' in msg) {
        markReady();
        return;
      }
      const task = slot.busy;
      if (!task || task.id !== msg.id) return;
      slot.busy = undefined;
      if (msg.ok) task.resolve(msg.result);
      else task.reject(failureToError(msg.failure));
      this.dispatch();
    });
    const lost = (why: string) => {
      markReady();
      const task = slot.busy;
      slot.busy = undefined;
      if (task) task.reject(new Error(`interpretation worker stopped: ${why}`));
      const index = this.slots.indexOf(slot);
      if (this.closed || index < 0) return;
      this.slots[index] = this.spawn();
      this.dispatch();
    };
    worker.on('error', (e) => lost(e.message));
    worker.on('exit', (code) => lost(`exit code ${code}`));
    return slot;
  }

  private dispatch(): void {
    for (const slot of this.slots) {
      if (slot.busy) continue;
      const task = this.queue.shift();
      if (!task) return;
      slot.busy = task;
      const message: TaskMessage = { id: task.id, job: task.job, system: task.system };
      if (task.catalog) {
        const fresh = slot.catalogVersion !== task.catalog.version;
        message.catalog = fresh ? { version: task.catalog.version, snapshot: task.catalog } : { version: task.catalog.version };
        slot.catalogVersion = task.catalog.version;
      }
      slot.worker.postMessage(message);
    }
  }
}
