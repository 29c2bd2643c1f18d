/**
 * A cli-progress bar on stderr: redrawn in place on a terminal; elsewhere (a log
 * file, a test) a plain line every few seconds and at the end, written through io.err.
 */
import { SingleBar } from 'cli-progress';
import type { CliIo } from './io.ts';

export interface Progress {
  update(done: number): void;
  stop(): void;
}

/** Collects what cli-progress writes and hands io.err whole lines. */
function lineStream(io: CliIo): NodeJS.WritableStream & { isTTY: false } {
  let pending = '';
  const stream = {
    isTTY: false as const,
    write(chunk: string | Uint8Array): boolean {
      pending += typeof chunk === 'string' ? chunk : Buffer.from(chunk).toString('utf8');
      let nl = pending.indexOf('\n');
      while (nl >= 0) {
        const line = pending.slice(0, nl).trimEnd();
        if (line !== '') io.err(line);
        pending = pending.slice(nl + 1);
        nl = pending.indexOf('\n');
      }
      return true;
    },
  };
  return stream as unknown as NodeJS.WritableStream & { isTTY: false };
}

export function startProgress(io: CliIo, total: number, label: string): Progress {
  const tty = io.errStream?.isTTY === true;
  const bar = new SingleBar({
    format: `${label} [{bar}] {value}/{total} rows | {percentage}% | {duration_formatted} elapsed | eta {eta_formatted}`,
    stream: tty ? io.errStream : lineStream(io),
    noTTYOutput: !tty,
    notTTYSchedule: 5000,
    hideCursor: tty,
    clearOnComplete: false,
    barsize: 30,
  });
  bar.start(total, 0);
  return {
    update: (done) => bar.update(done),
    stop: () => bar.stop(),
  };
}
