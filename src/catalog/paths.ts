/**
 * Where the catalog's files live. Everything is resolved from this module's own
 * location (import.meta.url), never from the working directory, so `hesper` works
 * when started from any folder.
 */
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));

/** The repository (package) root: two levels above src/catalog. */
export const REPO_ROOT = path.resolve(here, '..', '..');

/** Committed drizzle-kit migrations (SQL files and meta/_journal.json). */
export const MIGRATIONS_DIR = path.join(REPO_ROOT, 'db', 'migrations');

/** Curated seed data, one JSON file per group of rows. */
export const SEEDS_DIR = path.join(REPO_ROOT, 'seeds');

/** The database used when neither a path option nor HESPER_DB is given. */
export const DEFAULT_DB_PATH = path.join(REPO_ROOT, 'db', 'hesper.sqlite');

/** SQLite's name for a private in-memory database. */
export const MEMORY_DB = ':memory:';

/**
 * The database file to open: an explicit path wins, then env.HESPER_DB, then the
 * default under the repository root. Relative paths resolve against `cwd`.
 */
export function resolveDbPath(
  explicit: string | undefined,
  env: Record<string, string | undefined>,
  cwd: string = process.cwd(),
): string {
  const chosen = explicit !== undefined && explicit !== '' ? explicit : env.HESPER_DB;
  if (chosen === undefined || chosen === '') return DEFAULT_DB_PATH;
  if (chosen === MEMORY_DB) return MEMORY_DB;
  return path.resolve(cwd, chosen);
}
