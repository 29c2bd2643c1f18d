/** Fresh temporary database files and seed folders for the catalog tests. */
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { SEEDS_DIR } from '../../src/catalog/paths.ts';

const made: string[] = [];

/** A new empty folder under the system temp dir, removed by cleanupTemp(). */
export function tempDir(prefix = 'hesper-catalog-'): string {
  const dir = mkdtempSync(path.join(os.tmpdir(), prefix));
  made.push(dir);
  return dir;
}

/** A path for a database file that does not exist yet. */
export function tempDbPath(): string {
  return path.join(tempDir(), 'catalog.sqlite');
}

/** A copy of seeds/ that a test may edit. */
export function copySeeds(): string {
  const dir = path.join(tempDir('hesper-seeds-'), 'seeds');
  cpSync(SEEDS_DIR, dir, { recursive: true });
  return dir;
}

export function readJson<T = any>(file: string): T {
  return JSON.parse(readFileSync(file, 'utf8')) as T;
}

export function writeJson(file: string, value: unknown): void {
  writeFileSync(file, `${JSON.stringify(value, null, 2)}\n`);
}

export function cleanupTemp(): void {
  for (const d of made.splice(0)) rmSync(d, { recursive: true, force: true });
}

/**
 * Every row of every catalog table in a fixed order, for before/after comparisons;
 * with `where`, only the tables named there, filtered by their clause.
 */
export function dumpDatabase(file: string, where: Record<string, string> = {}): Record<string, unknown[]> {
  const db = new Database(file, { readonly: true });
  try {
    const order: Record<string, string> = {
      sources: 'key',
      entries: 'id',
      entry_sources: 'entry_id, source_key',
      spectra: 'entry_id, wavelength_nm',
      condensates: 'species',
      comparisons: 'id',
      comparison_sources: 'comparison_id, source_key',
      catalog_meta: 'key',
    };
    const out: Record<string, unknown[]> = {};
    const tables = Object.keys(where).length > 0 ? Object.entries(order).filter(([t]) => t in where) : Object.entries(order);
    for (const [table, by] of tables) {
      const clause = where[table] ? `WHERE ${where[table]}` : '';
      out[table] = db.prepare(`SELECT * FROM ${table} ${clause} ORDER BY ${by}`).all();
    }
    return out;
  } finally {
    db.close();
  }
}

/** A valid user entry of our own (invented values, for write tests only). */
export function userEntry(id: string, extra: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    id,
    name: `Invented test surface ${id}`,
    category: 'rock',
    quantity: 'surface',
    bandMinNm: 400,
    bandMaxNm: 900,
    valueMin: 0.1,
    valueNominal: 0.15,
    valueMax: 0.2,
    temperatureMinK: null,
    temperatureMaxK: 1200,
    description: 'invented for a test',
    provenance: 'memory',
    sources: ['Essack2020'],
    ...extra,
  };
}
