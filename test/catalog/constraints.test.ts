import Database from 'better-sqlite3';
import { describe, expect, it } from 'vitest';
import { BUSY_TIMEOUT_MS, openSqlite } from '../../src/catalog/connection.ts';
import { applyMigrations, readMigrations } from '../../src/catalog/migrate.ts';

function migrated(): Database.Database {
  const db = openSqlite(':memory:');
  applyMigrations(db, readMigrations());
  db.prepare(`INSERT INTO sources (key, entry_type, authors, title, origin, created_at, updated_at)
    VALUES ('Src', 'misc', 'Nobody, A.', 'Invented', 'user', 't', 't')`).run();
  return db;
}

const good = {
  id: 'ok-row', name: 'ok', category: 'rock', description: '', quantity: 'surface', band_min_nm: 400, band_max_nm: 800,
  value_min: 0.1, value_max: 0.3, value_nominal: 0.2, temperature_min_k: null, temperature_max_k: null, condensate: null,
  provenance: 'memory', origin: 'user', created_at: 't', updated_at: 't',
};

function insert(db: Database.Database, row: Record<string, unknown>): void {
  const cols = Object.keys(row);
  db.prepare(`INSERT INTO entries (${cols.join(', ')}) VALUES (${cols.map((c) => `@${c}`).join(', ')})`).run(row);
}

describe('database CHECK constraints and foreign keys', () => {
  it('accept a valid row', () => {
    const db = migrated();
    insert(db, good);
    expect(db.prepare('SELECT count(*) AS n FROM entries').get()).toEqual({ n: 1 });
  });

  it.each([
    ['value_min above value_nominal', { value_min: 0.25 }],
    ['value_nominal above value_max', { value_nominal: 0.4 }],
    ['a negative value', { value_min: -0.1 }],
    ['band_min_nm not below band_max_nm', { band_min_nm: 800 }],
    ['a Bond albedo above 1', { quantity: 'bond', value_max: 1.2, value_nominal: 0.2 }],
    ['an unknown category', { category: 'plasma' }],
    ['an unknown quantity', { quantity: 'normal' }],
    ['an unknown provenance', { provenance: 'rumour' }],
    ['an unknown origin', { origin: 'someone' }],
    ['temperature_min_k above temperature_max_k', { temperature_min_k: 900, temperature_max_k: 800 }],
    ['an id that is not a slug', { id: 'Not A Slug' }],
  ])('reject %s', (_what, change) => {
    const db = migrated();
    expect(() => insert(db, { ...good, ...change })).toThrow(/CHECK constraint failed/);
  });

  it('allow a geometric albedo above 1 (opposition surge)', () => {
    const db = migrated();
    insert(db, { ...good, quantity: 'geometric', value_min: 1.2, value_nominal: 1.3, value_max: 1.41 });
    expect(db.prepare('SELECT value_max AS v FROM entries').get()).toEqual({ v: 1.41 });
  });

  it('enforce foreign keys: a link to a missing source fails, deleting an entry removes its links', () => {
    const db = migrated();
    insert(db, good);
    expect(() => db.prepare("INSERT INTO entry_sources (entry_id, source_key) VALUES ('ok-row', 'Missing')").run()).toThrow(/FOREIGN KEY/);
    db.prepare("INSERT INTO entry_sources (entry_id, source_key) VALUES ('ok-row', 'Src')").run();
    expect(() => db.prepare("DELETE FROM sources WHERE key = 'Src'").run()).toThrow(/FOREIGN KEY/);
    db.prepare("DELETE FROM entries WHERE id = 'ok-row'").run();
    expect(db.prepare('SELECT count(*) AS n FROM entry_sources').get()).toEqual({ n: 0 });
  });

  it('open connections with foreign keys on and the busy timeout set', () => {
    const db = openSqlite(':memory:');
    expect(db.pragma('foreign_keys', { simple: true })).toBe(1);
    expect(db.pragma('busy_timeout', { simple: true })).toBe(BUSY_TIMEOUT_MS);
    expect(BUSY_TIMEOUT_MS).toBe(5000);
  });
});
