/**
 * The reference catalog: sourced reflectivities in an embedded SQLite database.
 * Open it with openCatalog() (or openCatalogReader() for read-only use); the file is
 * created, migrated and seeded on first use.
 */

/** Opening the catalog and the handles' methods. */
export { Catalog, openCatalog } from './catalog.ts';
export { CatalogReader, EXPORT_FORMATS, openCatalogReader } from './reader.ts';
export type { CatalogStats, ExportFormat, ExportedEntry } from './reader.ts';
export type { OpenCatalogOptions } from './open-db.ts';

/** JSON shapes the catalog hands out. */
export type {
  CatalogEntry,
  ComparisonBand,
  ComparisonEntry,
  CondensateCurve,
  EntryFilter,
  ImportReport,
  SeedReport,
  SourceRecord,
  SpectrumPoint,
} from './types.ts';

/** zod schemas of the catalog-entry JSON format, for the API and file readers. */
export { appliesToSchema, catalogEntryInputSchema, catalogEntryPatchSchema, sourceRecordSchema, seedEntrySchema } from './entry-schema.ts';
export type { CatalogEntryInput, CatalogEntryPatch, SourceRecordInput } from './entry-schema.ts';

/** Vocabularies (categories, quantities, provenance words) and file locations. */
export {
  CATEGORIES,
  COMPARISON_KINDS,
  CURATED_PROVENANCES,
  DEFAULT_APPLIES_TO,
  ORIGINS,
  PLANET_CLASSES,
  PROVENANCES,
  QUANTITIES,
  SOURCE_TYPES,
  USER_PROVENANCE,
  adsUrl,
} from './vocab.ts';
export type { Category, ComparisonKind, CuratedProvenance, Origin, PlanetClass, Provenance, Quantity, SourceType } from './vocab.ts';
export { DEFAULT_DB_PATH, MIGRATIONS_DIR, SEEDS_DIR, resolveDbPath } from './paths.ts';

/** The CSV columns of `catalog import` / `catalog export --format csv`. */
export { CSV_COLUMNS, csvColumnsHelp } from './csv-columns.ts';
