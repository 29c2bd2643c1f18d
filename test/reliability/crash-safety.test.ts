/**
 * Crash safety of the catalog: a process killed with SIGKILL in
 * the middle of a 10 000-row import leaves all of the rows or none; two processes
 * adding user entries at once both succeed (busy timeout) and every row is present.
 */
import { spawn, spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { openCatalog } from '../../src/catalog/index.ts';

const root = new URL('../../', import.meta.url).pathname;
const bin = path.join(root, 'bin/hesper.mjs');

function importCsv(rows: number, prefix: string): string {
  const header = 'id,name,category,quantity,band_min_nm,band_max_nm,value_min,value_nominal,value_max,provenance,sources,description';
  const lines = [header];
  // Invented rows (test data): a user's own measurements, each citing a curated source.
  for (let i = 0; i < rows; i++) lines.push(`${prefix}-${i},Invented row ${i},rock,surface,400,900,0.1,0.2,0.3,memory,Buratti2004Borrelly,test row`);
  return `${lines.join('\n')}\n`;
}

function userRows(db: string): number {
  const c = openCatalog({ path: db });
  try {
    return c.listEntries({ origin: 'user' }).length;
  } finally {
    c.close();
  }
}

function freshDb(): { dir: string; db: string } {
  const dir = mkdtempSync(path.join(tmpdir(), 'hesper-crash-'));
  const db = path.join(dir, 'catalog.sqlite');
  openCatalog({ path: db }).close(); // created, migrated and seeded before the race
  return { dir, db };
}

function killAfter(args: string[], ms: number): Promise<number | null> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, [bin, ...args], { stdio: 'ignore' });
    const timer = setTimeout(() => child.kill('SIGKILL'), ms);
    child.on('exit', (code) => {
      clearTimeout(timer);
      resolve(code);
    });
  });
}

describe('crash safety', () => {
  it('SIGKILL during a 10 000-row import leaves all rows or none', async () => {
    const outcomes: number[] = [];
    let killedMidway = 0;
    // Time one uninterrupted import, then kill others late in theirs, where the rows are written.
    const probe = freshDb();
    const probeCsv = path.join(probe.dir, 'rows.csv');
    writeFileSync(probeCsv, importCsv(10_000, 'probe'));
    const t0 = performance.now();
    expect(spawnSync(process.execPath, [bin, 'catalog', 'import', probeCsv, '--db', probe.db]).status).toBe(0);
    const fullMs = performance.now() - t0;
    expect(userRows(probe.db)).toBe(10_000);
    for (const ms of [0.5, 0.7, 0.8, 0.88, 0.94, 0.98].map((f) => Math.round(f * fullMs))) {
      const { dir, db } = freshDb();
      const csv = path.join(dir, 'rows.csv');
      writeFileSync(csv, importCsv(10_000, `crash${ms}`));
      const code = await killAfter(['catalog', 'import', csv, '--db', db], ms);
      const n = userRows(db);
      outcomes.push(n);
      expect([0, 10_000]).toContain(n);
      if (code === null) killedMidway++;
    }
    // The range of kill times must include at least one kill before the process finished.
    expect(killedMidway).toBeGreaterThan(0);
  }, 120_000);

  it('two processes adding user entries at once both succeed', async () => {
    const { dir, db } = freshDb();
    const a = path.join(dir, 'a.csv');
    const b = path.join(dir, 'b.csv');
    writeFileSync(a, importCsv(2000, 'alpha'));
    writeFileSync(b, importCsv(2000, 'beta'));
    const run = (file: string) => new Promise<number | null>((resolve) => {
      spawn(process.execPath, [bin, 'catalog', 'import', file, '--db', db], { stdio: 'ignore' }).on('exit', resolve);
    });
    const codes = await Promise.all([run(a), run(b)]);
    expect(codes).toEqual([0, 0]);
    expect(userRows(db)).toBe(4000);
  }, 60_000);

  it('a file input that is not a regular file is refused', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'hesper-notfile-'));
    const r = spawnSync(process.execPath, [bin, 'interpret', dir], { encoding: 'utf8' });
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/not a regular file/);
  });
});
