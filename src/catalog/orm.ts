/**
 * The drizzle-orm handle of a better-sqlite3 connection, made once per connection.
 * Catalog queries go through drizzle's query builder, so they are typed by the
 * schema; the seed upserts stay raw SQL (seed-apply.ts says why).
 */
import type Database from 'better-sqlite3';
import { drizzle, type BetterSQLite3Database } from 'drizzle-orm/better-sqlite3';

export type Orm = BetterSQLite3Database;

const handles = new WeakMap<Database.Database, Orm>();

export function orm(db: Database.Database): Orm {
  let d = handles.get(db);
  if (!d) {
    d = drizzle({ client: db });
    handles.set(db, d);
  }
  return d;
}
