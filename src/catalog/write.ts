/**
 * Row writers shared by user additions, CSV import and updates, through drizzle-orm's
 * query builder. Callers run them inside a transaction.
 */
import type Database from 'better-sqlite3';
import { eq } from 'drizzle-orm';
import type { CatalogEntryParsed, SeedEntryParsed, SourceRecordParsed } from './entry-schema.ts';
import { orm } from './orm.ts';
import { entries, entrySources, sources, spectra } from './schema.ts';
import type { SourceRecord, SpectrumPoint } from './types.ts';
import { appliesToText, type Origin } from './vocab.ts';

type EntryValues = Omit<CatalogEntryParsed | SeedEntryParsed, 'sources' | 'spectrum' | 'origin'>;
type EntryInsert = typeof entries.$inferInsert;

/** The entry's columns (appliesTo as stored text), without origin and timestamps. */
function entryColumns(e: EntryValues): Omit<EntryInsert, 'origin' | 'createdAt' | 'updatedAt'> {
  return {
    id: e.id,
    name: e.name,
    category: e.category,
    description: e.description,
    quantity: e.quantity,
    bandMinNm: e.bandMinNm,
    bandMaxNm: e.bandMaxNm,
    valueMin: e.valueMin,
    valueMax: e.valueMax,
    valueNominal: e.valueNominal,
    temperatureMinK: e.temperatureMinK,
    temperatureMaxK: e.temperatureMaxK,
    condensate: e.condensate,
    provenance: e.provenance,
    appliesTo: appliesToText(e.appliesTo),
  };
}

/** The entry columns as named parameters of the raw seed upsert (seed-apply.ts). */
export function entryParams(e: EntryValues, now: string): Record<string, unknown> {
  return { ...entryColumns(e), now };
}

/** A source record with every optional field present (null when absent). */
export function normalizeSource(s: SourceRecordParsed): Omit<SourceRecord, 'origin'> {
  return {
    key: s.key,
    type: s.type,
    authors: s.authors,
    year: s.year ?? null,
    title: s.title,
    journal: s.journal ?? null,
    publisher: s.publisher ?? null,
    volume: s.volume ?? null,
    pages: s.pages ?? null,
    doi: s.doi ?? null,
    arxiv: s.arxiv ?? null,
    bibcode: s.bibcode ?? null,
    url: s.url ?? null,
    note: s.note ?? null,
  };
}

const SOURCE_FIELDS = ['key', 'type', 'authors', 'year', 'title', 'journal', 'publisher', 'volume', 'pages', 'doi', 'arxiv', 'bibcode', 'url', 'note'] as const;

/** True when two records carry the same bibliographic details (origin aside). */
export function sameSource(a: Omit<SourceRecord, 'origin'>, b: Omit<SourceRecord, 'origin'>): boolean {
  return SOURCE_FIELDS.every((f) => a[f] === b[f]);
}

export function insertEntry(db: Database.Database, e: EntryValues, origin: Origin, now: string): void {
  orm(db)
    .insert(entries)
    .values({ ...entryColumns(e), origin, createdAt: now, updatedAt: now })
    .run();
}

export function updateEntry(db: Database.Database, e: EntryValues, now: string): void {
  const { id, ...columns } = entryColumns(e);
  orm(db)
    .update(entries)
    .set({ ...columns, updatedAt: now })
    .where(eq(entries.id, id))
    .run();
}

export function deleteEntry(db: Database.Database, id: string): void {
  orm(db).delete(entries).where(eq(entries.id, id)).run();
}

export function replaceLinks(db: Database.Database, entryId: string, keys: readonly string[]): void {
  const d = orm(db);
  d.delete(entrySources).where(eq(entrySources.entryId, entryId)).run();
  if (keys.length > 0) d.insert(entrySources).values(keys.map((sourceKey, position) => ({ entryId, sourceKey, position }))).run();
}

/** Rows per multi-row INSERT of spectrum points: 3 parameters each, well below SQLite's limit of 32766. */
const POINTS_PER_INSERT = 1000;

export function replaceSpectrum(db: Database.Database, entryId: string, points: readonly SpectrumPoint[]): void {
  const d = orm(db);
  d.delete(spectra).where(eq(spectra.entryId, entryId)).run();
  for (let i = 0; i < points.length; i += POINTS_PER_INSERT) {
    const chunk = points.slice(i, i + POINTS_PER_INSERT);
    d.insert(spectra).values(chunk.map((p) => ({ entryId, wavelengthNm: p.wavelengthNm, value: p.value }))).run();
  }
}

export function insertSource(db: Database.Database, s: Omit<SourceRecord, 'origin'>, origin: Origin, now: string): void {
  const { type, ...rest } = s;
  orm(db)
    .insert(sources)
    .values({ ...rest, entryType: type, origin, createdAt: now, updatedAt: now })
    .run();
}
