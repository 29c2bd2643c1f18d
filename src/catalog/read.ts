/**
 * Reading the catalog: rows to the JSON shapes of types.ts. Plain prepared statements
 * on better-sqlite3 (column aliases give drizzle's field names, so the row types are
 * the schema's own inferred types); drizzle-orm's query builder is not loaded on this
 * path, which keeps `hesper catalog list` quick.
 */
import type Database from 'better-sqlite3';
import { HesperError, inputError } from '../errors.ts';
import type { condensates, entries, sources } from './schema.ts';
import type { CatalogEntry, CondensateCurve, EntryFilter, SourceRecord, SpectrumPoint } from './types.ts';
import { CATEGORIES, ORIGINS, type Category, type Origin, type Provenance, type Quantity, type SourceType } from './vocab.ts';

type EntryRow = Omit<typeof entries.$inferSelect, 'createdAt' | 'updatedAt'>;
type SourceRow = Omit<typeof sources.$inferSelect, 'createdAt' | 'updatedAt'>;
type CondensateRow = typeof condensates.$inferSelect;

const ENTRY_COLUMNS = `id, name, category, description, quantity, band_min_nm AS bandMinNm, band_max_nm AS bandMaxNm,
  value_min AS valueMin, value_max AS valueMax, value_nominal AS valueNominal,
  temperature_min_k AS temperatureMinK, temperature_max_k AS temperatureMaxK, condensate, provenance, origin`;

const SOURCE_COLUMNS = `key, entry_type AS entryType, authors, year, title, journal, publisher, volume, pages, doi, arxiv, url, note, origin`;

function toEntry(row: EntryRow, keys: string[], spectrum: SpectrumPoint[] | undefined): CatalogEntry {
  const entry: CatalogEntry = {
    id: row.id,
    name: row.name,
    category: row.category as Category,
    quantity: row.quantity as Quantity,
    bandMinNm: row.bandMinNm,
    bandMaxNm: row.bandMaxNm,
    valueMin: row.valueMin,
    valueMax: row.valueMax,
    valueNominal: row.valueNominal,
    temperatureMinK: row.temperatureMinK,
    temperatureMaxK: row.temperatureMaxK,
    condensate: row.condensate,
    description: row.description,
    provenance: row.provenance as Provenance,
    sources: keys,
    origin: row.origin as Origin,
  };
  if (spectrum !== undefined && spectrum.length > 0) entry.spectrum = spectrum;
  return entry;
}

function groupBy<T extends { entryId: string }, V>(rows: T[], pick: (r: T) => V): Map<string, V[]> {
  const out = new Map<string, V[]>();
  for (const r of rows) {
    const list = out.get(r.entryId);
    if (list) list.push(pick(r));
    else out.set(r.entryId, [pick(r)]);
  }
  return out;
}

/** Rejects an unknown category or origin with the allowed words. */
export function checkFilter(filter: EntryFilter): void {
  if (filter.category !== undefined && !(CATEGORIES as readonly string[]).includes(filter.category)) {
    throw inputError('invalid-input', 'category', `unknown category "${filter.category}"`, filter.category, `one of ${CATEGORIES.join(', ')}`);
  }
  if (filter.origin !== undefined && !(ORIGINS as readonly string[]).includes(filter.origin)) {
    throw inputError('invalid-input', 'origin', `unknown origin "${filter.origin}"`, filter.origin, `one of ${ORIGINS.join(', ')}`);
  }
}

function matches(entry: CatalogEntry, needle: string): boolean {
  const hay = [entry.id, entry.name, entry.description, entry.category, entry.quantity, entry.condensate ?? '', ...entry.sources];
  return hay.some((h) => h.toLowerCase().includes(needle));
}

/** Entries ordered by category then id, filtered by category, origin and a search text. */
export function readEntries(db: Database.Database, filter: EntryFilter = {}): CatalogEntry[] {
  checkFilter(filter);
  const where: string[] = [];
  const params: string[] = [];
  if (filter.category !== undefined) {
    where.push('category = ?');
    params.push(filter.category);
  }
  if (filter.origin !== undefined) {
    where.push('origin = ?');
    params.push(filter.origin);
  }
  const clause = where.length > 0 ? `WHERE ${where.join(' AND ')}` : '';
  const rows = db.prepare(`SELECT ${ENTRY_COLUMNS} FROM entries ${clause} ORDER BY category, id`).all(...params) as EntryRow[];
  const links = db
    .prepare('SELECT entry_id AS entryId, source_key AS sourceKey FROM entry_sources ORDER BY entry_id, position, source_key')
    .all() as { entryId: string; sourceKey: string }[];
  const points = db
    .prepare('SELECT entry_id AS entryId, wavelength_nm AS wavelengthNm, value FROM spectra ORDER BY entry_id, wavelength_nm')
    .all() as (SpectrumPoint & { entryId: string })[];
  const keysOf = groupBy(links, (l) => l.sourceKey);
  const spectrumOf = groupBy(points, (p) => ({ wavelengthNm: p.wavelengthNm, value: p.value }));
  const list = rows.map((r) => toEntry(r, keysOf.get(r.id) ?? [], spectrumOf.get(r.id)));
  const needle = filter.search?.trim().toLowerCase();
  return needle ? list.filter((e) => matches(e, needle)) : list;
}

/** One entry, or undefined. */
export function findEntry(db: Database.Database, id: string): CatalogEntry | undefined {
  const row = db.prepare(`SELECT ${ENTRY_COLUMNS} FROM entries WHERE id = ?`).get(id) as EntryRow | undefined;
  if (!row) return undefined;
  const keys = db.prepare('SELECT source_key AS k FROM entry_sources WHERE entry_id = ? ORDER BY position, source_key').all(id) as { k: string }[];
  const spectrum = db
    .prepare('SELECT wavelength_nm AS wavelengthNm, value FROM spectra WHERE entry_id = ? ORDER BY wavelength_nm')
    .all(id) as SpectrumPoint[];
  return toEntry(row, keys.map((k) => k.k), spectrum);
}

/** One entry; unknown ids raise kind 'not-found'. */
export function requireEntry(db: Database.Database, id: string): CatalogEntry {
  const entry = findEntry(db, id);
  if (!entry) {
    throw new HesperError('not-found', `no catalog entry has id "${id}"`, [{ path: 'id', message: `no catalog entry has id "${id}"`, value: id }], 'not-found');
  }
  return entry;
}

function toSource(row: SourceRow): SourceRecord {
  return {
    key: row.key,
    type: row.entryType as SourceType,
    authors: row.authors,
    year: row.year,
    title: row.title,
    journal: row.journal,
    publisher: row.publisher,
    volume: row.volume,
    pages: row.pages,
    doi: row.doi,
    arxiv: row.arxiv,
    url: row.url,
    note: row.note,
    origin: row.origin as Origin,
  };
}

export function readSources(db: Database.Database): SourceRecord[] {
  const rows = db.prepare(`SELECT ${SOURCE_COLUMNS} FROM sources ORDER BY key`).all() as SourceRow[];
  return rows.map(toSource);
}

export function findSource(db: Database.Database, key: string): SourceRecord | undefined {
  const row = db.prepare(`SELECT ${SOURCE_COLUMNS} FROM sources WHERE key = ?`).get(key) as SourceRow | undefined;
  return row ? toSource(row) : undefined;
}

/** The named sources in the order given; every unknown key is reported (kind 'not-found'). */
export function requireSources(db: Database.Database, keys: readonly string[]): SourceRecord[] {
  const found: SourceRecord[] = [];
  const missing: string[] = [];
  for (const key of keys) {
    const s = findSource(db, key);
    if (s) found.push(s);
    else missing.push(key);
  }
  if (missing.length > 0) {
    throw new HesperError(
      'not-found',
      `unknown source key${missing.length === 1 ? '' : 's'}: ${missing.join(', ')}`,
      missing.map((k) => ({ path: 'key', message: `no source has key "${k}"`, value: k })),
      'not-found',
    );
  }
  return found;
}

export function readCondensates(db: Database.Database): CondensateCurve[] {
  const rows = db
    .prepare(
      `SELECT species, a, b, c, d, valid_pressure_min_bar AS validPressureMinBar, valid_pressure_max_bar AS validPressureMaxBar,
        valid_metallicity_min_dex AS validMetallicityMinDex, valid_metallicity_max_dex AS validMetallicityMaxDex,
        source_key AS sourceKey, provenance, note FROM condensates ORDER BY species`,
    )
    .all() as CondensateRow[];
  return rows.map((r) => ({
    species: r.species,
    a: r.a,
    b: r.b,
    c: r.c,
    d: r.d,
    validPressureBar: [r.validPressureMinBar, r.validPressureMaxBar],
    validMetallicityDex: [r.validMetallicityMinDex, r.validMetallicityMaxDex],
    sourceKey: r.sourceKey,
    provenance: r.provenance as Provenance,
    note: r.note,
  }));
}
