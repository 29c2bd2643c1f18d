/**
 * Reading the catalog: rows to the JSON shapes of types.ts, through drizzle-orm's query
 * builder (row types are the schema's own inferred types). The text search runs over
 * the listed entries in JavaScript, where it also covers the cited source keys.
 */
import type Database from 'better-sqlite3';
import { and, asc, eq, getTableColumns } from 'drizzle-orm';
import { HesperError, inputError } from '../errors.ts';
import { orm } from './orm.ts';
import { comparisonSources, comparisons, condensates, entries, entrySources, sources, spectra } from './schema.ts';
import type {
  CatalogEntry,
  ComparisonEntry,
  ComparisonRow,
  CondensateCurve,
  EntryFilter,
  EntryRow,
  SourceRecord,
  SourceRow,
  SpectrumPoint,
} from './types.ts';
import { CATEGORIES, ORIGINS, appliesToList, type Category, type Origin } from './vocab.ts';

const { createdAt: _entryCreated, updatedAt: _entryUpdated, ...ENTRY_COLUMNS } = getTableColumns(entries);
const { createdAt: _sourceCreated, updatedAt: _sourceUpdated, ...SOURCE_COLUMNS } = getTableColumns(sources);

function toEntry(row: EntryRow, keys: string[], spectrum: SpectrumPoint[] | undefined): CatalogEntry {
  const entry: CatalogEntry = {
    id: row.id,
    name: row.name,
    category: row.category,
    quantity: row.quantity,
    bandMinNm: row.bandMinNm,
    bandMaxNm: row.bandMaxNm,
    valueMin: row.valueMin,
    valueMax: row.valueMax,
    valueNominal: row.valueNominal,
    temperatureMinK: row.temperatureMinK,
    temperatureMaxK: row.temperatureMaxK,
    condensate: row.condensate,
    description: row.description,
    provenance: row.provenance,
    appliesTo: appliesToList(row.appliesTo),
    sources: keys,
    origin: row.origin,
  };
  if (spectrum !== undefined && spectrum.length > 0) entry.spectrum = spectrum;
  return entry;
}

function groupBy<T, V>(rows: T[], keyOf: (r: T) => string, pick: (r: T) => V): Map<string, V[]> {
  const out = new Map<string, V[]>();
  for (const r of rows) {
    const list = out.get(keyOf(r));
    if (list) list.push(pick(r));
    else out.set(keyOf(r), [pick(r)]);
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
  const d = orm(db);
  const where = and(
    filter.category !== undefined ? eq(entries.category, filter.category as Category) : undefined,
    filter.origin !== undefined ? eq(entries.origin, filter.origin as Origin) : undefined,
  );
  const rows = d.select(ENTRY_COLUMNS).from(entries).where(where).orderBy(asc(entries.category), asc(entries.id)).all();
  const links = d
    .select({ entryId: entrySources.entryId, sourceKey: entrySources.sourceKey })
    .from(entrySources)
    .orderBy(asc(entrySources.entryId), asc(entrySources.position), asc(entrySources.sourceKey))
    .all();
  const points = d
    .select({ entryId: spectra.entryId, wavelengthNm: spectra.wavelengthNm, value: spectra.value })
    .from(spectra)
    .orderBy(asc(spectra.entryId), asc(spectra.wavelengthNm))
    .all();
  const keysOf = groupBy(links, (l) => l.entryId, (l) => l.sourceKey);
  const spectrumOf = groupBy(points, (p) => p.entryId, (p) => ({ wavelengthNm: p.wavelengthNm, value: p.value }));
  const list = rows.map((r) => toEntry(r, keysOf.get(r.id) ?? [], spectrumOf.get(r.id)));
  const needle = filter.search?.trim().toLowerCase();
  return needle ? list.filter((e) => matches(e, needle)) : list;
}

/** One entry, or undefined. */
export function findEntry(db: Database.Database, id: string): CatalogEntry | undefined {
  const d = orm(db);
  const row = d.select(ENTRY_COLUMNS).from(entries).where(eq(entries.id, id)).get();
  if (!row) return undefined;
  const keys = d
    .select({ k: entrySources.sourceKey })
    .from(entrySources)
    .where(eq(entrySources.entryId, id))
    .orderBy(asc(entrySources.position), asc(entrySources.sourceKey))
    .all();
  const spectrum = d
    .select({ wavelengthNm: spectra.wavelengthNm, value: spectra.value })
    .from(spectra)
    .where(eq(spectra.entryId, id))
    .orderBy(asc(spectra.wavelengthNm))
    .all();
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
    type: row.entryType,
    authors: row.authors,
    year: row.year,
    title: row.title,
    journal: row.journal,
    publisher: row.publisher,
    volume: row.volume,
    pages: row.pages,
    doi: row.doi,
    arxiv: row.arxiv,
    bibcode: row.bibcode,
    url: row.url,
    note: row.note,
    origin: row.origin,
  };
}

export function readSources(db: Database.Database): SourceRecord[] {
  return orm(db).select(SOURCE_COLUMNS).from(sources).orderBy(asc(sources.key)).all().map(toSource);
}

export function findSource(db: Database.Database, key: string): SourceRecord | undefined {
  const row = orm(db).select(SOURCE_COLUMNS).from(sources).where(eq(sources.key, key)).get();
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
  const rows = orm(db).select().from(condensates).orderBy(asc(condensates.species)).all();
  return rows.map((r) => ({
    species: r.species,
    a: r.a,
    b: r.b,
    c: r.c,
    d: r.d,
    validPressureBar: [r.validPressureMinBar, r.validPressureMaxBar],
    validMetallicityDex: [r.validMetallicityMinDex, r.validMetallicityMaxDex],
    sourceKey: r.sourceKey,
    provenance: r.provenance,
    note: r.note,
  }));
}

function toComparison(r: ComparisonRow, keys: string[]): ComparisonEntry {
  const lo = r.equilibriumTemperatureMinK;
  const hi = r.equilibriumTemperatureMaxK;
  return {
    id: r.id,
    name: r.name,
    kind: r.kind,
    band: { id: r.bandId, minNm: r.bandMinNm, maxNm: r.bandMaxNm },
    geometricAlbedoRange: [r.geometricAlbedoMin, r.geometricAlbedoMax],
    geometricAlbedoNominal: r.geometricAlbedoNominal,
    equilibriumTemperatureK: r.equilibriumTemperatureK,
    equilibriumTemperatureRangeK: lo !== null && hi !== null ? [lo, hi] : null,
    sources: keys,
    provenance: r.provenance,
    description: r.description,
  };
}

/** The comparison set: planets first, then populations, each by equilibrium temperature. */
export function readComparisons(db: Database.Database): ComparisonEntry[] {
  const d = orm(db);
  const rows = d
    .select()
    .from(comparisons)
    .orderBy(asc(comparisons.kind), asc(comparisons.equilibriumTemperatureK), asc(comparisons.id))
    .all();
  const links = d
    .select({ id: comparisonSources.comparisonId, key: comparisonSources.sourceKey })
    .from(comparisonSources)
    .orderBy(asc(comparisonSources.comparisonId), asc(comparisonSources.position), asc(comparisonSources.sourceKey))
    .all();
  const keysOf = groupBy(links, (l) => l.id, (l) => l.key);
  return rows.map((r) => toComparison(r, keysOf.get(r.id) ?? []));
}
