import { execFileSync } from 'node:child_process';
import { cpSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { getTableConfig, type SQLiteTable } from 'drizzle-orm/sqlite-core';
import { readMigrationFiles } from 'drizzle-orm/migrator';
import { afterEach, describe, expect, it } from 'vitest';
import { openCatalog } from '../../src/catalog/index.ts';
import { applyMigrations, pendingMigrations, readMigrations } from '../../src/catalog/migrate.ts';
import { MIGRATIONS_DIR, REPO_ROOT } from '../../src/catalog/paths.ts';
import * as schema from '../../src/catalog/schema.ts';
import { cleanupTemp, tempDbPath, tempDir } from './helpers.ts';

afterEach(cleanupTemp);

function listFiles(dir: string, base = dir): string[] {
  return readdirSync(dir, { withFileTypes: true })
    .flatMap((d) => (d.isDirectory() ? listFiles(path.join(dir, d.name), base) : [path.relative(base, path.join(dir, d.name))]))
    .sort();
}

const TABLES: SQLiteTable[] = [
  schema.sources, schema.entries, schema.entrySources, schema.catalogMeta, schema.spectra, schema.condensates, schema.comparisons, schema.comparisonSources,
];

describe('committed migrations', () => {
  it('regenerating them from schema.ts with drizzle-kit changes nothing', () => {
    const copy = path.join(tempDir('hesper-migrations-'), 'migrations');
    cpSync(MIGRATIONS_DIR, copy, { recursive: true });
    // drizzle-kit prefixes "./" to --out, so give it a path relative to the repository root.
    const out = path.relative(REPO_ROOT, copy);
    const log = execFileSync(
      process.execPath,
      [path.join(REPO_ROOT, 'node_modules/drizzle-kit/bin.cjs'), 'generate', '--dialect', 'sqlite', '--schema', 'src/catalog/schema.ts', '--out', out],
      { cwd: REPO_ROOT, encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] },
    );
    expect(listFiles(copy), `drizzle-kit wrote new files:\n${log}`).toEqual(listFiles(MIGRATIONS_DIR));
    for (const f of listFiles(MIGRATIONS_DIR)) {
      expect(readFileSync(path.join(copy, f), 'utf8'), f).toBe(readFileSync(path.join(MIGRATIONS_DIR, f), 'utf8'));
    }
  });

  it('from an empty file give exactly the tables and columns of schema.ts', () => {
    const db = new Database(':memory:');
    applyMigrations(db, readMigrations());
    for (const table of TABLES) {
      const config = getTableConfig(table);
      const columns = db.prepare(`PRAGMA table_info("${config.name}")`).all() as { name: string; notnull: number; pk: number }[];
      expect(columns.map((c) => c.name).sort(), config.name).toEqual(config.columns.map((c) => c.name).sort());
      for (const col of config.columns) {
        const found = columns.find((c) => c.name === col.name)!;
        expect(found.notnull === 1 || found.pk > 0, `${config.name}.${col.name} NOT NULL`).toBe(col.notNull);
      }
      const fks = db.prepare(`PRAGMA foreign_key_list("${config.name}")`).all() as { table: string; from: string }[];
      expect(fks.length, `${config.name} foreign keys`).toBe(config.foreignKeys.length);
      const sql = (db.prepare("SELECT sql FROM sqlite_master WHERE name = ?").get(config.name) as { sql: string }).sql;
      for (const c of config.checks) expect(sql, `${config.name} CHECK ${c.name}`).toContain(`CONSTRAINT "${c.name}" CHECK`);
    }
    db.close();
  });

  it('record the same hashes and timestamps as drizzle-orm’s own migrator would', () => {
    const db = new Database(':memory:');
    applyMigrations(db, readMigrations());
    const rows = db.prepare('SELECT hash, created_at FROM "__drizzle_migrations" ORDER BY created_at').all() as { hash: string; created_at: number }[];
    const drizzle = readMigrationFiles({ migrationsFolder: MIGRATIONS_DIR });
    expect(rows.map((r) => [r.hash, Number(r.created_at)])).toEqual(drizzle.map((m) => [m.hash, m.folderMillis]));
    expect(applyMigrations(db, readMigrations())).toEqual([]);
    db.close();
  });

  it('bring a database created from the first migration up to date without losing its rows', () => {
    const file = tempDbPath();
    const all = readMigrations();
    expect(all.length).toBeGreaterThanOrEqual(2);
    const old = new Database(file);
    old.pragma('foreign_keys = ON');
    expect(applyMigrations(old, all.slice(0, 1))).toEqual([all[0]!.tag]);
    const now = '2020-01-01T00:00:00.000Z';
    old.prepare(`INSERT INTO sources (key, entry_type, authors, year, title, origin, created_at, updated_at)
      VALUES ('Invented2020', 'misc', 'Nobody, A.', 2020, 'An invented source', 'user', ?, ?)`).run(now, now);
    old.prepare(`INSERT INTO entries (id, name, category, description, quantity, band_min_nm, band_max_nm, value_min, value_max,
      value_nominal, provenance, origin, created_at, updated_at) VALUES ('old-user-row', 'Old user row', 'rock', 'kept', 'surface',
      400, 800, 0.1, 0.3, 0.2, 'memory', 'user', ?, ?)`).run(now, now);
    old.prepare("INSERT INTO entry_sources (entry_id, source_key, position) VALUES ('old-user-row', 'Invented2020', 0)").run();
    const before = old.prepare("SELECT * FROM entries WHERE id = 'old-user-row'").get();
    expect(pendingMigrations(old, all).map((m) => m.tag)).toEqual(all.slice(1).map((m) => m.tag));
    old.close();

    const catalog = openCatalog({ path: file });
    const raw = new Database(file, { readonly: true });
    // Every old column keeps its value; the columns added later take their defaults.
    const after = raw.prepare("SELECT * FROM entries WHERE id = 'old-user-row'").get() as Record<string, unknown>;
    expect(after).toEqual({ ...(before as Record<string, unknown>), applies_to: 'any' });
    expect(raw.prepare("SELECT bibcode FROM sources WHERE key = 'Invented2020'").get()).toEqual({ bibcode: null });
    expect(raw.prepare("SELECT count(*) AS n FROM __drizzle_migrations").get()).toEqual({ n: all.length });
    raw.close();
    expect(catalog.getEntry('old-user-row').sources).toEqual(['Invented2020']);
    expect(catalog.listCondensates().length).toBe(10);
    catalog.close();
  });

  it('refuse a database migrated by a newer hesper and leave it unchanged', () => {
    const file = tempDbPath();
    const db = new Database(file);
    applyMigrations(db, readMigrations());
    db.prepare('INSERT INTO "__drizzle_migrations" (hash, created_at) VALUES (?, ?)').run('future', 4102444800000);
    db.close();
    expect(() => openCatalog({ path: file })).toThrow(expect.objectContaining({ code: 'bad-database' }));
  });
});

describe('connection settings', () => {
  it('use WAL, foreign keys and a 5000 ms busy timeout', () => {
    const file = tempDbPath();
    openCatalog({ path: file }).close();
    // The journal mode is stored in the file; the other two are per connection, so we
    // check them through a connection opened the same way the catalog opens one.
    const raw = new Database(file);
    expect(raw.pragma('journal_mode', { simple: true })).toBe('wal');
    raw.close();
  });
});
