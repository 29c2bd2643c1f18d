/**
 * Opening the database file: resolve the path, apply pending migrations, and tell
 * whether the stored seed version matches the seed files. Loads no zod, so read-only
 * commands stay quick; seeding itself lives in catalog.ts.
 */
import type Database from 'better-sqlite3';
import { HesperError } from '../errors.ts';
import { openSqlite } from './connection.ts';
import { applyMigrations, readMigrations } from './migrate.ts';
import { MIGRATIONS_DIR, SEEDS_DIR, resolveDbPath } from './paths.ts';
import { storedSeedHash } from './seed-apply.ts';
import { seedHash } from './seed-hash.ts';

export interface OpenCatalogOptions {
  /** Database file; wins over env.HESPER_DB. Relative paths resolve against cwd. */
  path?: string;
  /** Environment to read HESPER_DB from (default process.env). */
  env?: Record<string, string | undefined>;
  /** Working directory for relative paths (default process.cwd()). */
  cwd?: string;
  /** Seed folder (default seeds/ of the repository); tests point it at a copy. */
  seedsDir?: string;
  /** Migration folder (default db/migrations of the repository). */
  migrationsDir?: string;
}

export interface OpenedDb {
  db: Database.Database;
  file: string;
  seedsDir: string;
  /** The seed files' version, and whether the database already holds it. */
  seedHash: string;
  seedCurrent: boolean;
}

/** Opens and migrates; closes the connection again if anything fails. */
export function openMigrated(options: OpenCatalogOptions): OpenedDb {
  const file = resolveDbPath(options.path, options.env ?? process.env, options.cwd);
  const seedsDir = options.seedsDir ?? SEEDS_DIR;
  const db = openSqlite(file);
  try {
    applyMigrations(db, readMigrations(options.migrationsDir ?? MIGRATIONS_DIR));
    const hash = seedHash(seedsDir);
    return { db, file, seedsDir, seedHash: hash, seedCurrent: storedSeedHash(db) === hash };
  } catch (e) {
    db.close();
    throw asCatalogError(e, file);
  }
}

/** SQLite's "not a database" and corruption errors as HesperError 'bad-database'. */
export function asCatalogError(e: unknown, file: string): unknown {
  if (e instanceof HesperError) return e;
  if (e instanceof Error && /file is not a database|malformed|no such table/i.test(e.message)) {
    return new HesperError('bad-database', `${file} is not a hesper catalog: ${e.message}`, [{ path: 'database', message: e.message, value: file }], 'input');
  }
  return e;
}
