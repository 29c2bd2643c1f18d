/**
 * Read access to the catalog. CatalogReader holds every query; Catalog (catalog.ts)
 * adds the changes. openCatalogReader() loads the zod-based seeding code only when the
 * database actually needs seeding, which keeps `hesper catalog list` quick.
 */
import type Database from 'better-sqlite3';
import { count, countDistinct, eq } from 'drizzle-orm';
import { inputError } from '../errors.ts';
import { entriesToCsv } from './csv-columns.ts';
import { openMigrated, type OpenCatalogOptions } from './open-db.ts';
import { orm } from './orm.ts';
import { findSource, readComparisons, readCondensates, readEntries, readSources, requireEntry, requireSources } from './read.ts';
import { comparisons, condensates, entries, sources } from './schema.ts';
import { storedSeedHash } from './seed-apply.ts';
import type { CatalogEntry, ComparisonEntry, CondensateCurve, EntryFilter, SeedReport, SourceRecord } from './types.ts';

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
  comparisons: number;
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
   * The comparison set: measured geometric albedos of named exoplanets and of planet
   * populations (planets first, then populations, each by equilibrium temperature).
   */
  listComparisons(): ComparisonEntry[] {
    return readComparisons(this.db);
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
    const d = orm(this.db);
    const n = (row: { n: number } | undefined) => row?.n ?? 0;
    return {
      path: this.path,
      entries: n(d.select({ n: count() }).from(entries).get()),
      userEntries: n(d.select({ n: count() }).from(entries).where(eq(entries.origin, 'user')).get()),
      sources: n(d.select({ n: count() }).from(sources).get()),
      condensates: n(d.select({ n: count() }).from(condensates).get()),
      comparisons: n(d.select({ n: count() }).from(comparisons).get()),
      categories: n(d.select({ n: countDistinct(entries.category) }).from(entries).get()),
      seedHash: storedSeedHash(this.db),
      // drizzle's migration journal table is not part of the schema, so it is counted in SQL.
      migrations: (this.db.prepare('SELECT count(*) AS n FROM "__drizzle_migrations"').get() as { n: number }).n,
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
