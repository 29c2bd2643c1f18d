/**
 * `hesper serve` as a real process (bin/hesper.mjs) on an ephemeral port with a fresh
 * temporary catalog: it binds loopback by default, answers the API through its worker
 * threads, refuses foreign Host headers, warns when bound beyond loopback, and stops
 * cleanly on SIGTERM.
 */
import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { request } from 'node:http';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const BIN = new URL('../../bin/hesper.mjs', import.meta.url).pathname;
let dir: string;
beforeAll(() => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'hesper-serve-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

interface Served {
  child: ChildProcess;
  url: string;
  stderr: () => string;
  exited: Promise<number | null>;
}

function serve(args: string[]): Promise<Served> {
  const child = spawn(process.execPath, [BIN, 'serve', '--port', '0', '--db', path.join(dir, 'catalog.sqlite'), ...args], { stdio: ['ignore', 'pipe', 'pipe'], env: { PATH: process.env.PATH } });
  let err = '';
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`serve did not start: ${err}`)), 45_000);
    child.stderr!.on('data', (d: Buffer) => {
      err += d.toString();
      const m = /hesper serve: (http:\/\/\S+?)\/ /.exec(err);
      if (m) {
        clearTimeout(timer);
        resolve({ child, url: m[1]!, stderr: () => err, exited });
      }
    });
    child.on('exit', (code) => reject(new Error(`serve exited with ${code}: ${err}`)));
  });
}

/** A GET with a chosen Host header (fetch does not let a page or a test set it). */
function getWithHost(url: string, host: string): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    const req = request(url, { headers: { host } }, (res) => {
      let body = '';
      res.on('data', (d) => { body += d; });
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body }));
    });
    req.on('error', reject);
    req.end();
  });
}

describe('hesper serve', () => {
  it('binds 127.0.0.1 by default, answers through its workers, refuses foreign hosts, stops on SIGTERM', async () => {
    const s = await serve(['--workers', '1']);
    expect(s.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
    expect(s.stderr()).not.toMatch(/warning/);
    const health = await (await fetch(`${s.url}/api/health`)).json();
    expect(health.status).toBe('ok');
    const system = JSON.parse(readFileSync(new URL('../../demo-data/systems/corvina-b.json', import.meta.url), 'utf8'));
    system.assumptions = { samples: 300, gridNodes: 64 };
    const res = await fetch(`${s.url}/api/interpret`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(system) });
    expect(res.status).toBe(200);
    expect((await res.json()).name).toBe('Corvina b');
    const rebound = await getWithHost(`${s.url}/api/health`, 'attacker.example');
    expect(rebound.status).toBe(403);
    expect(JSON.parse(rebound.body).error.code).toBe('bad-host');
    s.child.kill('SIGTERM');
    expect(await s.exited).toBe(0);
    expect(s.stderr()).toMatch(/SIGTERM, stopping/);
  });

  it('warns on stderr when bound to an address other machines can reach', async () => {
    const s = await serve(['--host', '0.0.0.0', '--workers', '0']);
    expect(s.stderr()).toMatch(/warning: listening on 0\.0\.0\.0, which other machines can reach/);
    s.child.kill('SIGTERM');
    expect(await s.exited).toBe(0);
  });
});
