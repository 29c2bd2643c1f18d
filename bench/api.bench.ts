/**
 * API and batch figures, printed, never asserted:
 *  - interpretations per second at 8 concurrent clients against `hesper serve` started
 *    on loopback at its default settings (workers = cores) with the invented demo
 *    systems at their default draws; target >= 30 /s with zero errors;
 *  - `hesper batch` on 1000 invented planets with --workers 2; target <= 30 s.
 * Both runs are bounded in count and in time; a run cut short reports what it reached.
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { inventedBatchCsv } from '../scripts/batch-sample.ts';
import type { Figure } from './figure.ts';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const BIN = path.join(ROOT, 'bin', 'hesper.mjs');
const CLIENTS = 8;
const API_REQUESTS = 240;
const API_SECONDS = 60;
const BATCH_ROWS = 1000;
const BATCH_SECONDS = 240;

function demoSystems(): unknown[] {
  const dir = path.join(ROOT, 'demo-data', 'systems');
  return readdirSync(dir).filter((f) => f.endsWith('.json')).sort().map((f) => JSON.parse(readFileSync(path.join(dir, f), 'utf8')));
}

async function startServe(db: string): Promise<{ url: string; stop: () => Promise<void> }> {
  const child = spawn(process.execPath, [BIN, 'serve', '--port', '0', '--db', db], { cwd: ROOT, stdio: ['ignore', 'ignore', 'pipe'] });
  const exited = new Promise<void>((r) => child.on('exit', () => r()));
  const url = await new Promise<string>((resolve, reject) => {
    let text = '';
    const timer = setTimeout(() => reject(new Error(`hesper serve did not start: ${text}`)), 60_000);
    child.stderr.on('data', (d: Buffer) => {
      text += d.toString();
      const m = /hesper serve: (http:\/\/127\.0\.0\.1:\d+)/.exec(text);
      if (m) {
        clearTimeout(timer);
        resolve(m[1]!);
      }
    });
  });
  return { url, stop: async () => { child.kill('SIGTERM'); await exited; } };
}

function percentile(sorted: number[], p: number): number {
  return sorted.length === 0 ? NaN : sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))]!;
}

async function apiThroughput(db: string): Promise<Figure[]> {
  const server = await startServe(db);
  const systems = demoSystems().map((s) => JSON.stringify(s));
  const post = (body: string) => fetch(`${server.url}/api/interpret`, { method: 'POST', headers: { 'content-type': 'application/json' }, body });
  // One untimed request per worker so module loading is not counted.
  await Promise.all(systems.map(post));
  let next = 0;
  let errors = 0;
  const latencies: number[] = [];
  const t0 = performance.now();
  const deadline = t0 + API_SECONDS * 1000;
  await Promise.all(Array.from({ length: CLIENTS }, async () => {
    while (next < API_REQUESTS && performance.now() < deadline) {
      const i = next++;
      const started = performance.now();
      try {
        const res = await post(systems[i % systems.length]!);
        await res.arrayBuffer();
        if (res.status !== 200) errors++;
      } catch {
        errors++;
      }
      latencies.push(performance.now() - started);
    }
  }));
  const seconds = (performance.now() - t0) / 1000;
  await server.stop();
  latencies.sort((a, b) => a - b);
  return [
    { name: `API interpretations/s, ${CLIENTS} clients, ${latencies.length} requests (demo systems, default draws)`, value: latencies.length / seconds, unit: '/s', target: 30, lowerIsBetter: false },
    { name: 'API errors in that run', value: errors, unit: 'errors', target: 0, digits: 0 },
    { name: 'API latency p50', value: percentile(latencies, 0.5), unit: 'ms', digits: 0 },
    { name: 'API latency p99', value: percentile(latencies, 0.99), unit: 'ms', digits: 0 },
  ];
}

async function batchRun(dir: string, db: string): Promise<Figure[]> {
  const input = path.join(dir, 'planets.csv');
  writeFileSync(input, inventedBatchCsv(BATCH_ROWS, 7));
  const child = spawn(process.execPath, [BIN, 'batch', input, '--out', path.join(dir, 'results.csv'), '--workers', '2', '--db', db], { cwd: ROOT, stdio: ['ignore', 'ignore', 'pipe'] });
  let text = '';
  child.stderr.on('data', (d: Buffer) => { text += d.toString(); });
  const t0 = performance.now();
  const timer = setTimeout(() => child.kill('SIGTERM'), BATCH_SECONDS * 1000);
  const code = await new Promise<number | null>((r) => child.on('exit', (c) => r(c)));
  clearTimeout(timer);
  const seconds = (performance.now() - t0) / 1000;
  const done = Number([...text.matchAll(/(\d+)\/\d+ rows/g)].at(-1)?.[1] ?? 0);
  const finished = code === 0;
  const failed = Number(/(\d+) failed/.exec(text)?.[1] ?? NaN);
  return [
    finished
      ? { name: `hesper batch, ${BATCH_ROWS} invented planets, --workers 2 (whole process)`, value: seconds, unit: 's', target: 30 }
      : { name: `hesper batch cut at ${BATCH_SECONDS} s: rows done of ${BATCH_ROWS}`, value: done, unit: 'rows', target: BATCH_ROWS, lowerIsBetter: false, digits: 0 },
    { name: 'hesper batch rows per second', value: (finished ? BATCH_ROWS : done) / seconds, unit: 'rows/s', digits: 1 },
    ...(finished ? [{ name: 'hesper batch rows that failed (see the error column)', value: failed, unit: 'rows', digits: 0 }] : []),
  ];
}

export async function run(): Promise<Figure[]> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'hesper-bench-api-'));
  try {
    const db = path.join(dir, 'catalog.sqlite');
    return [...(await apiThroughput(db)), ...(await batchRun(dir, db))];
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
