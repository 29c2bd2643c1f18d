/**
 * The full catalog handle: everything CatalogReader offers plus user entries, CSV
 * import and re-seeding. openCatalog() creates, migrates and seeds the file on first use.
 */
import type Database from 'better-sqlite3';
import { inputError } from '../errors.ts';
import { importEntriesCsv } from './csv-entries.ts';
import { asCatalogError, openMigrated, type OpenCatalogOptions } from './open-db.ts';
import { CatalogReader } from './reader.ts';
import { applySeedSet, storedSeedHash } from './seed-apply.ts';
import { loadSeeds } from './seed-load.ts';
import type { CatalogEntry, ImportReport, SeedReport } from './types.ts';
import { addUserEntries, removeUserEntry, updateUserEntry } from './user-entries.ts';

const now = () => new Date().toISOString();

export class Catalog extends CatalogReader {
  /** Adds one user entry (catalog-entry JSON; sources as keys or new records). */
  addUserEntry(json: unknown): CatalogEntry {
    const [id] = addUserEntries(this.db, [{ raw: json, prefix: '' }], now());
    return this.getEntry(id!);
  }

  /** Adds several user entries in one transaction, all or none. */
  addUserEntries(list: readonly unknown[]): CatalogEntry[] {
    if (list.length === 0) throw inputError('invalid-input', '(root)', 'the list of entries is empty');
    const ids = addUserEntries(this.db, list.map((raw, i) => ({ raw, prefix: `[${i}]` })), now());
    return ids.map((id) => this.getEntry(id));
  }

  /** Changes fields of a user entry; curated entries raise kind 'forbidden'. */
  updateUserEntry(id: string, patch: unknown): CatalogEntry {
    updateUserEntry(this.db, id, patch, now());
    return this.getEntry(id);
  }

  /** Removes a user entry and returns it; curated entries raise kind 'forbidden'. */
  removeUserEntry(id: string): CatalogEntry {
    return removeUserEntry(this.db, id);
  }

  /** Imports CSV rows as user entries in one transaction; any bad row aborts all. */
  importCsv(text: string): ImportReport {
    return importEntriesCsv(this.db, text, now());
  }

  /** Re-applies the curated seeds now, whatever the stored seed version. */
  reseed(): SeedReport {
    const seeds = loadSeeds(this.seedsDir);
    return this.db.transaction(() => applySeedSet(this.db, seeds, now())).immediate();
  }
}

/** Seeds inside one write transaction unless another process did it meanwhile. */
function seed(db: Database.Database, seedsDir: string): SeedReport | undefined {
  const seeds = loadSeeds(seedsDir);
  return db
    .transaction(() => (storedSeedHash(db) === seeds.hash ? undefined : applySeedSet(db, seeds, now())))
    .immediate();
}

/**
 * Opens the catalog database: options.path, else env.HESPER_DB, else db/hesper.sqlite
 * under the repository root. A new or old file is migrated and (re-)seeded on the way.
 */
export function openCatalog(options: OpenCatalogOptions = {}): Catalog {
  const { db, file, seedsDir, seedCurrent } = openMigrated(options);
  try {
    return new Catalog(db, file, seedsDir, seedCurrent ? undefined : seed(db, seedsDir));
  } catch (e) {
    db.close();
    throw asCatalogError(e, file);
  }
}
