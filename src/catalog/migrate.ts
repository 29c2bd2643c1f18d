/**
 * Applies the committed drizzle-kit migrations (db/migrations) to a database.
 *
 * Reads drizzle's own journal (meta/_journal.json) and records applied migrations in
 * drizzle's table `__drizzle_migrations` (sha256 of the SQL file, journal timestamp),
 * so the bookkeeping matches drizzle-orm's migrator. Unlike that migrator it follows
 * SQLite's procedure for schema changes (sqlite.org/lang_altertable.html, section 7):
 * foreign keys off, BEGIN IMMEDIATE, all pending migrations, `PRAGMA foreign_key_check`,
 * COMMIT, foreign keys on. A migration that rebuilds a table therefore cannot cascade-
 * delete rows, and a failed migration leaves the file as it was.
 */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import type Database from 'better-sqlite3';
import { HesperError } from '../errors.ts';
import { MIGRATIONS_DIR } from './paths.ts';

export interface Migration {
  /** File name without .sql, e.g. "0000_initial". */
  tag: string;
  /** Journal timestamp (ms); drizzle orders and records migrations by it. */
  when: number;
  /** Absolute path of the SQL file. */
  file: string;
}

interface JournalEntry {
  idx: number;
  when: number;
  tag: string;
}

const MIGRATIONS_TABLE = '__drizzle_migrations';
const STATEMENT_BREAK = '--> statement-breakpoint';

/** The migrations listed in the journal, oldest first. */
export function readMigrations(dir: string = MIGRATIONS_DIR): Migration[] {
  const journalPath = path.join(dir, 'meta', '_journal.json');
  let journal: { entries?: JournalEntry[] };
  try {
    journal = JSON.parse(readFileSync(journalPath, 'utf8')) as { entries?: JournalEntry[] };
  } catch (e) {
    throw new HesperError('internal', `cannot read the migration journal ${journalPath}: ${(e as Error).message}`, [], 'internal');
  }
  const list = (journal.entries ?? []).map((j) => ({ tag: j.tag, when: j.when, file: path.join(dir, `${j.tag}.sql`) }));
  return list.sort((a, b) => a.when - b.when);
}

function ensureTable(db: Database.Database): void {
  // Same definition as drizzle-orm's sqlite migrator, so either tool can continue.
  db.exec(`CREATE TABLE IF NOT EXISTS "${MIGRATIONS_TABLE}" (id SERIAL PRIMARY KEY, hash text NOT NULL, created_at numeric)`);
}

function lastAppliedWhen(db: Database.Database): number | undefined {
  const row = db.prepare(`SELECT max(created_at) AS last FROM "${MIGRATIONS_TABLE}"`).get() as { last: number | null };
  return row.last === null ? undefined : Number(row.last);
}

/** Migrations not yet applied to db (drizzle's rule: newer than the last recorded one). */
export function pendingMigrations(db: Database.Database, migrations: Migration[]): Migration[] {
  ensureTable(db);
  const last = lastAppliedWhen(db);
  const newest = migrations.at(-1)?.when;
  if (last !== undefined && newest !== undefined && last > newest) {
    throw new HesperError(
      'bad-database',
      `the database ${db.name} was migrated by a newer hesper (migration of ${new Date(last).toISOString()}); this version knows migrations up to ${new Date(newest).toISOString()}`,
      [{ path: 'database', message: 'schema is newer than this hesper', value: db.name }],
      'conflict',
    );
  }
  return last === undefined ? migrations : migrations.filter((m) => m.when > last);
}

function statementsOf(m: Migration): { sql: string[]; hash: string } {
  const text = readFileSync(m.file, 'utf8');
  const sql = text
    .split(STATEMENT_BREAK)
    .map((s) => s.trim())
    .filter((s) => s.length > 0);
  return { sql, hash: createHash('sha256').update(text).digest('hex') };
}

/**
 * Applies every pending migration in one transaction. Returns the tags applied
 * (empty when the database was up to date). Safe against a second process doing the
 * same at the same time: the pending list is re-read after the write lock is taken.
 */
export function applyMigrations(db: Database.Database, migrations: Migration[] = readMigrations()): string[] {
  if (pendingMigrations(db, migrations).length === 0) return [];
  db.pragma('foreign_keys = OFF');
  try {
    db.exec('BEGIN IMMEDIATE');
    try {
      const pending = pendingMigrations(db, migrations);
      const record = db.prepare(`INSERT INTO "${MIGRATIONS_TABLE}" ("hash", "created_at") VALUES (?, ?)`);
      for (const m of pending) {
        const { sql, hash } = statementsOf(m);
        for (const statement of sql) db.exec(statement);
        record.run(hash, m.when);
      }
      const broken = db.pragma('foreign_key_check') as unknown[];
      if (broken.length > 0) {
        throw new HesperError('bad-database', `migration would leave ${broken.length} broken foreign key reference(s); nothing was changed`, [], 'internal');
      }
      db.exec('COMMIT');
      return pending.map((m) => m.tag);
    } catch (e) {
      if (db.inTransaction) db.exec('ROLLBACK');
      throw e;
    }
  } finally {
    if (db.open) db.pragma('foreign_keys = ON');
  }
}
