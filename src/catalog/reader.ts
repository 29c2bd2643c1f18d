/**
 * Read access to the catalog. CatalogReader holds every query; Catalog (catalog.ts)
 * adds the changes. openCatalogReader() loads the zod-based seeding code only when the
 * database actually needs seeding, which keeps `hesper catalog list` quick.
 */
import type Database from 'better-sqlite3';
import { inputError } from '../errors.ts';
import { entriesToCsv } from './csv-columns.ts';
import { openMigrated, type OpenCatalogOptions } from './open-db.ts';
import { findSource, readCondensates, readEntries, readSources, requireEntry, requireSources } from './read.ts';
import { storedSeedHash } from './seed-apply.ts';
import type { CatalogEntry, CondensateCurve, EntryFilter, SeedReport, SourceRecord } from './types.ts';

export type ExportFormat = 'json' | 'csv';
export const EXPORT_FORMATS: readonly ExportFormat[] = ['json', 'csv'];

/** A catalog entry whose sources are full records (the `export --format json` shape). */
export type ExportedEntry = Omit<CatalogEntry, 'sources'> & { sources: SourceRecord[] };

export interface CatalogStats {
  path: string;
  entries: number;
  userEntries: number;
  sources: number;
  condensates: number;
  categories: number;
  seedHash: string | undefined;
  migrations: number;
}

export class CatalogReader {
  /** The database file in use (or ":memory:"). */
  readonly path: string;
  /** The seed report when this open (re-)seeded the database, else undefined. */
  readonly seededOnOpen: SeedReport | undefined;
  protected readonly db: Database.Database;
  protected readonly seedsDir: string;

  constructor(db: Database.Database, path: string, seedsDir: string, seededOnOpen: SeedReport | undefined) {
    this.db = db;
    this.path = path;
    this.seedsDir = seedsDir;
    this.seededOnOpen = seededOnOpen;
  }

  /** Entries (category, then id order), optionally filtered by category, origin, search text. */
  listEntries(filter: EntryFilter = {}): CatalogEntry[] {
    return readEntries(this.db, filter);
  }

  /** One entry; unknown ids raise HesperError kind 'not-found'. */
  getEntry(id: string): CatalogEntry {
    return requireEntry(this.db, id);
  }

  listSources(): SourceRecord[] {
    return readSources(this.db);
  }

  /** The named sources in order; unknown keys raise kind 'not-found' listing them all. */
  getSources(keys: readonly string[]): SourceRecord[] {
    return requireSources(this.db, keys);
  }

  /** One source, or undefined. */
  findSource(key: string): SourceRecord | undefined {
    return findSource(this.db, key);
  }

  listCondensates(): CondensateCurve[] {
    return readCondensates(this.db);
  }

  /**
   * Entries (all, or filtered) as text: csv in the import format plus an origin column;
   * json as an array of entries whose sources are full records.
   */
  exportEntries(format: ExportFormat, filter: EntryFilter = {}): string {
    if (!EXPORT_FORMATS.includes(format)) {
      throw inputError('invalid-input', 'format', `unknown export format "${String(format)}"`, format, EXPORT_FORMATS.join(', '));
    }
    const list = this.listEntries(filter);
    if (format === 'csv') return entriesToCsv(list);
    const byKey = new Map(this.listSources().map((s) => [s.key, s]));
    const full: ExportedEntry[] = list.map((e) => ({ ...e, sources: e.sources.flatMap((k) => byKey.get(k) ?? []) }));
    return `${JSON.stringify(full, null, 2)}\n`;
  }

  stats(): CatalogStats {
    const count = (sql: string) => (this.db.prepare(sql).get() as { n: number }).n;
    return {
      path: this.path,
      entries: count('SELECT count(*) AS n FROM entries'),
      userEntries: count("SELECT count(*) AS n FROM entries WHERE origin = 'user'"),
      sources: count('SELECT count(*) AS n FROM sources'),
      condensates: count('SELECT count(*) AS n FROM condensates'),
      categories: count('SELECT count(DISTINCT category) AS n FROM entries'),
      seedHash: storedSeedHash(this.db),
      migrations: count('SELECT count(*) AS n FROM "__drizzle_migrations"'),
    };
  }

  close(): void {
    if (this.db.open) this.db.close();
  }
}

/**
 * Opens the catalog for reading (same file rules and first-use set-up as openCatalog);
 * the seeding code is imported only when the database needs seeding.
 */
export async function openCatalogReader(options: OpenCatalogOptions = {}): Promise<CatalogReader> {
  const opened = openMigrated(options);
  if (opened.seedCurrent) return new CatalogReader(opened.db, opened.file, opened.seedsDir, undefined);
  opened.db.close();
  const { openCatalog } = await import('./catalog.ts');
  return openCatalog(options);
}
