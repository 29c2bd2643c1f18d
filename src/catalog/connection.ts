/**
 * Opens the SQLite file with the settings the catalog relies on: WAL journal (readers
 * do not block the writer), foreign keys enforced, and a busy timeout so a second
 * process waits for a lock instead of failing at once.
 */
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { HesperError } from '../errors.ts';
import { MEMORY_DB } from './paths.ts';

/** How long a connection waits for another connection's write lock (ms). */
export const BUSY_TIMEOUT_MS = 5000;

export function openSqlite(file: string): Database.Database {
  if (file !== MEMORY_DB) mkdirSync(path.dirname(file), { recursive: true });
  let db: Database.Database;
  try {
    db = new Database(file, { timeout: BUSY_TIMEOUT_MS });
  } catch (e) {
    throw new HesperError(
      'bad-database',
      `cannot open the catalog database ${file}: ${(e as Error).message}`,
      [{ path: 'database', message: (e as Error).message, value: file }],
      'input',
    );
  }
  try {
    if (file !== MEMORY_DB) db.pragma('journal_mode = WAL');
    db.pragma(`busy_timeout = ${BUSY_TIMEOUT_MS}`);
    db.pragma('foreign_keys = ON');
    db.pragma('synchronous = NORMAL');
  } catch (e) {
    db.close();
    throw new HesperError(
      'bad-database',
      `${file} is not a usable SQLite database: ${(e as Error).message}`,
      [{ path: 'database', message: (e as Error).message, value: file }],
      'input',
    );
  }
  return db;
}
