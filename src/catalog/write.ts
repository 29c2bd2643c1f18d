/**
 * Row writers shared by user additions, CSV import and updates. Callers run them
 * inside a transaction; each statement is prepared once per connection.
 */
import type Database from 'better-sqlite3';
import type { CatalogEntryParsed, SeedEntryParsed, SourceRecordParsed } from './entry-schema.ts';
import type { SourceRecord, SpectrumPoint } from './types.ts';
import type { Origin } from './vocab.ts';

type EntryValues = Omit<CatalogEntryParsed | SeedEntryParsed, 'sources' | 'spectrum' | 'origin'>;

interface Writers {
  insertEntry: Database.Statement;
  updateEntry: Database.Statement;
  deleteLinks: Database.Statement;
  insertLink: Database.Statement;
  deleteSpectrum: Database.Statement;
  insertPoint: Database.Statement;
  insertSource: Database.Statement;
}

const cache = new WeakMap<Database.Database, Writers>();

function writers(db: Database.Database): Writers {
  let w = cache.get(db);
  if (!w) {
    w = {
      insertEntry: db.prepare(`INSERT INTO entries (id, name, category, description, quantity, band_min_nm, band_max_nm,
        value_min, value_max, value_nominal, temperature_min_k, temperature_max_k, condensate, provenance, origin, created_at, updated_at)
        VALUES (@id, @name, @category, @description, @quantity, @bandMinNm, @bandMaxNm, @valueMin, @valueMax, @valueNominal,
        @temperatureMinK, @temperatureMaxK, @condensate, @provenance, @origin, @now, @now)`),
      updateEntry: db.prepare(`UPDATE entries SET name = @name, category = @category, description = @description, quantity = @quantity,
        band_min_nm = @bandMinNm, band_max_nm = @bandMaxNm, value_min = @valueMin, value_max = @valueMax, value_nominal = @valueNominal,
        temperature_min_k = @temperatureMinK, temperature_max_k = @temperatureMaxK, condensate = @condensate, provenance = @provenance,
        updated_at = @now WHERE id = @id`),
      deleteLinks: db.prepare('DELETE FROM entry_sources WHERE entry_id = ?'),
      insertLink: db.prepare('INSERT INTO entry_sources (entry_id, source_key, position) VALUES (?, ?, ?)'),
      deleteSpectrum: db.prepare('DELETE FROM spectra WHERE entry_id = ?'),
      insertPoint: db.prepare('INSERT INTO spectra (entry_id, wavelength_nm, value) VALUES (?, ?, ?)'),
      insertSource: db.prepare(`INSERT INTO sources (key, entry_type, authors, year, title, journal, publisher, volume, pages, doi, arxiv,
        url, note, origin, created_at, updated_at) VALUES (@key, @type, @authors, @year, @title, @journal, @publisher, @volume, @pages,
        @doi, @arxiv, @url, @note, @origin, @now, @now)`),
    };
    cache.set(db, w);
  }
  return w;
}

/** The entry columns as named statement parameters. */
export function entryParams(e: EntryValues, origin: Origin, now: string): Record<string, unknown> {
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
    origin,
    now,
  };
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
    url: s.url ?? null,
    note: s.note ?? null,
  };
}

/** True when two records carry the same bibliographic details (origin aside). */
export function sameSource(a: Omit<SourceRecord, 'origin'>, b: Omit<SourceRecord, 'origin'>): boolean {
  const fields = ['key', 'type', 'authors', 'year', 'title', 'journal', 'publisher', 'volume', 'pages', 'doi', 'arxiv', 'url', 'note'] as const;
  return fields.every((f) => a[f] === b[f]);
}

export function insertEntry(db: Database.Database, e: EntryValues, origin: Origin, now: string): void {
  writers(db).insertEntry.run(entryParams(e, origin, now));
}

export function updateEntry(db: Database.Database, e: EntryValues, now: string): void {
  const p = entryParams(e, 'user', now);
  delete p.origin;
  writers(db).updateEntry.run(p);
}

export function replaceLinks(db: Database.Database, entryId: string, keys: readonly string[]): void {
  const w = writers(db);
  w.deleteLinks.run(entryId);
  keys.forEach((k, i) => w.insertLink.run(entryId, k, i));
}

export function replaceSpectrum(db: Database.Database, entryId: string, points: readonly SpectrumPoint[]): void {
  const w = writers(db);
  w.deleteSpectrum.run(entryId);
  for (const p of points) w.insertPoint.run(entryId, p.wavelengthNm, p.value);
}

export function insertSource(db: Database.Database, s: Omit<SourceRecord, 'origin'>, origin: Origin, now: string): void {
  writers(db).insertSource.run({ ...s, origin, now });
}
