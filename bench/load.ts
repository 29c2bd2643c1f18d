/**
 * `npm run load`: a bounded load run against a server this script starts on loopback.
 * Concurrent clients send interpret requests and catalog reads
 * (and a few user-entry writes) until a request count or a time limit is reached,
 * whichever comes first. Reports throughput, p50/p99 latency, errors, and the server's
 * resident memory in the first and last tenth of the run (growth must stay under 20 %).
 * Traffic goes to 127.0.0.1 only.
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const args = new Map(process.argv.slice(2).map((a) => a.replace(/^--/, '').split('=') as [string, string]));
const MAX_REQUESTS = Number(args.get('requests') ?? 3000);
const MAX_SECONDS = Number(args.get('seconds') ?? 60);
const CLIENTS = Number(args.get('clients') ?? 8);
const WARMUP = Number(args.get('warmup') ?? 40);

const demoSystems = readdirSync(path.join(root, 'demo-data/systems'))
  .filter((f) => f.endsWith('.json'))
  .map((f) => JSON.parse(readFileSync(path.join(root, 'demo-data/systems', f), 'utf8')));

function rssMb(pid: number): number {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? NaN);
  return kb / 1024;
}

async function startServer(db: string): Promise<{ url: string; pid: number; stop: () => Promise<void> }> {
  const child = spawn(process.execPath, ['bin/hesper.mjs', 'serve', '--port', '0', '--host', '127.0.0.1', '--db', db], { cwd: root, stdio: ['ignore', 'ignore', 'pipe'] });
  const url = await new Promise<string>((resolve, reject) => {
    let text = '';
    const timer = setTimeout(() => reject(new Error(`server did not start: ${text}`)), 30_000);
    child.stderr.on('data', (chunk: Buffer) => {
      text += chunk.toString();
      const m = /(http:\/\/127\.0\.0\.1:\d+)/.exec(text);
      if (m) {
        clearTimeout(timer);
        resolve(m[1]!);
      }
    });
    child.on('exit', (code) => reject(new Error(`server exited with ${code}: ${text}`)));
  });
  return {
    url,
    pid: child.pid!,
    stop: () => new Promise((resolve) => {
      child.once('exit', () => resolve());
      child.kill('SIGTERM');
    }),
  };
}

interface Sample { ms: number; ok: boolean; at: number }

async function main(): Promise<void> {
  const dir = mkdtempSync(path.join(tmpdir(), 'hesper-load-'));
  const server = await startServer(path.join(dir, 'load.sqlite'));
  const samples: Sample[] = [];
  const memory: Array<{ at: number; mb: number }> = [];
  // Warm-up, not counted: the workers compile their code and fill their caches (JIT,
  // band tables, catalog copies) in the first requests, which is start-up, not growth.
  for (let b = 0; b < WARMUP; b += CLIENTS) {
    await Promise.all(Array.from({ length: CLIENTS }, (_, c) => request(1_000_000 + b + c).catch(() => false)));
  }
  const t0 = performance.now();
  const deadline = t0 + MAX_SECONDS * 1000;
  let issued = 0;
  const sampler = setInterval(() => memory.push({ at: performance.now() - t0, mb: rssMb(server.pid) }), 250);
  memory.push({ at: 0, mb: rssMb(server.pid) });

  async function request(k: number): Promise<boolean> {
    const kind = k % 10;
    if (kind < 6) {
      const body = { ...demoSystems[k % demoSystems.length], assumptions: { seed: k % 1000 } };
      const r = await fetch(`${server.url}/api/interpret`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) });
      await r.arrayBuffer();
      return r.status === 200;
    }
    if (kind < 9) {
      const r = await fetch(`${server.url}/api/catalog/entries?search=${['ice', 'cloud', 'rock'][k % 3]}`);
      await r.arrayBuffer();
      return r.status === 200;
    }
    const entry = {
      id: `load-entry-${k}`, name: `Load-test entry ${k}`, category: 'rock', quantity: 'surface', bandMinNm: 400, bandMaxNm: 900,
      valueMin: 0.1, valueMax: 0.3, valueNominal: 0.2, provenance: 'memory', description: 'invented row written by npm run load',
      sources: [{ key: `LoadTest${k}`, authors: 'Nobody, A.', year: 2026, title: 'Invented for a load test', journal: 'none' }],
    };
    const r = await fetch(`${server.url}/api/catalog/entries`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(entry) });
    await r.arrayBuffer();
    return r.status === 201 || r.status === 200;
  }

  async function client(): Promise<void> {
    while (issued < MAX_REQUESTS && performance.now() < deadline) {
      const k = issued++;
      const start = performance.now();
      let ok = false;
      try {
        ok = await request(k);
      } catch {
        ok = false;
      }
      samples.push({ ms: performance.now() - start, ok, at: start - t0 });
    }
  }
  await Promise.all(Array.from({ length: CLIENTS }, client));
  const elapsed = (performance.now() - t0) / 1000;
  clearInterval(sampler);
  memory.push({ at: performance.now() - t0, mb: rssMb(server.pid) });
  await server.stop();
  rmSync(dir, { recursive: true, force: true });

  const lat = samples.map((s) => s.ms).sort((a, b) => a - b);
  const q = (p: number) => lat[Math.min(lat.length - 1, Math.floor(p * lat.length))]!;
  const errors = samples.filter((s) => !s.ok).length;
  const span = memory[memory.length - 1]!.at;
  const tenth = (from: number, to: number) => {
    const xs = memory.filter((m) => m.at >= from && m.at <= to).map((m) => m.mb);
    return xs.reduce((a, b) => a + b, 0) / Math.max(1, xs.length);
  };
  const first = tenth(0, span / 10);
  const last = tenth((9 * span) / 10, span);
  const growth = (last - first) / first;
  console.log(`hesper load: ${samples.length} requests from ${CLIENTS} clients in ${elapsed.toFixed(1)} s (limits: ${MAX_REQUESTS} requests, ${MAX_SECONDS} s; after ${WARMUP} warm-up requests not counted)`);
  console.log(`  mix: 60 % POST /api/interpret, 30 % GET /api/catalog/entries, 10 % POST /api/catalog/entries`);
  console.log(`  throughput       ${(samples.length / elapsed).toFixed(1)} requests/s`);
  console.log(`  latency          p50 ${q(0.5).toFixed(1)} ms, p99 ${q(0.99).toFixed(1)} ms`);
  console.log(`  errors           ${errors}`);
  console.log(`  server memory    ${memory[0]!.mb.toFixed(1)} MB at start, ${first.toFixed(1)} MB mean of the first tenth, ${last.toFixed(1)} MB mean of the last tenth, ${memory[memory.length - 1]!.mb.toFixed(1)} MB at the end`);
  console.log(`  memory growth    ${(100 * growth).toFixed(1)} % between the first and last tenth (limit 20 %): ${growth <= 0.2 ? 'ok' : 'TOO MUCH'}`);
  if (errors > 0 || growth > 0.2) process.exitCode = 1;
}

await main();
