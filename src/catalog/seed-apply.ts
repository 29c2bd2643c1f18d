/**
 * Applying the curated seeds: one transaction of prepared upserts. Curated rows are
 * inserted, updated where they changed, and deleted when the seeds no longer list
 * them; user rows (origin 'user') are never written, and a seed row whose id or key a
 * user row already holds is skipped and reported.
 */
import type Database from 'better-sqlite3';
import type { SeedSet } from './seed-load.ts';
import type { SeedReport } from './types.ts';
import { entryParams } from './write.ts';

const SOURCE_FIELDS = ['entry_type', 'authors', 'year', 'title', 'journal', 'publisher', 'volume', 'pages', 'doi', 'arxiv', 'url', 'note'];
const ENTRY_FIELDS = [
  'name', 'category', 'description', 'quantity', 'band_min_nm', 'band_max_nm', 'value_min', 'value_max', 'value_nominal',
  'temperature_min_k', 'temperature_max_k', 'condensate', 'provenance',
];

/** "ON CONFLICT ... DO UPDATE" that touches a curated row only when a field changed. */
function upsertTail(table: string, key: string, fields: string[]): string {
  const set = fields.map((f) => `${f} = excluded.${f}`).join(', ');
  const changed = fields.map((f) => `${table}.${f} IS NOT excluded.${f}`).join(' OR ');
  return `ON CONFLICT(${key}) DO UPDATE SET ${set}, updated_at = excluded.updated_at WHERE ${table}.origin = 'curated' AND (${changed})`;
}

export const META_SEED_HASH = 'seed_hash';

export function storedSeedHash(db: Database.Database): string | undefined {
  const row = db.prepare('SELECT value FROM catalog_meta WHERE key = ?').get(META_SEED_HASH) as { value: string } | undefined;
  return row?.value;
}

/** Writes the seed set; call inside a transaction. */
export function applySeedSet(db: Database.Database, seeds: SeedSet, now: string): SeedReport {
  const userKeys = new Set((db.prepare("SELECT key FROM sources WHERE origin = 'user'").all() as { key: string }[]).map((r) => r.key));
  const userIds = new Set((db.prepare("SELECT id FROM entries WHERE origin = 'user'").all() as { id: string }[]).map((r) => r.id));
  const skipped: string[] = [];

  const upsertSource = db.prepare(`INSERT INTO sources (key, entry_type, authors, year, title, journal, publisher, volume, pages, doi,
    arxiv, url, note, origin, created_at, updated_at) VALUES (@key, @type, @authors, @year, @title, @journal, @publisher, @volume,
    @pages, @doi, @arxiv, @url, @note, 'curated', @now, @now) ${upsertTail('sources', 'key', SOURCE_FIELDS)}`);
  let changedSources = 0;
  for (const s of seeds.sources) {
    if (userKeys.has(s.key)) {
      skipped.push(`source ${s.key}`);
      continue;
    }
    changedSources += upsertSource.run({ ...s, now }).changes;
  }

  const upsertEntry = db.prepare(`INSERT INTO entries (id, name, category, description, quantity, band_min_nm, band_max_nm, value_min,
    value_max, value_nominal, temperature_min_k, temperature_max_k, condensate, provenance, origin, created_at, updated_at)
    VALUES (@id, @name, @category, @description, @quantity, @bandMinNm, @bandMaxNm, @valueMin, @valueMax, @valueNominal,
    @temperatureMinK, @temperatureMaxK, @condensate, @provenance, 'curated', @now, @now) ${upsertTail('entries', 'id', ENTRY_FIELDS)}`);
  const deleteLinks = db.prepare('DELETE FROM entry_sources WHERE entry_id = ?');
  const insertLink = db.prepare('INSERT INTO entry_sources (entry_id, source_key, position) VALUES (?, ?, ?)');
  const deletePoints = db.prepare('DELETE FROM spectra WHERE entry_id = ?');
  const insertPoint = db.prepare('INSERT INTO spectra (entry_id, wavelength_nm, value) VALUES (?, ?, ?)');
  let changedEntries = 0;
  for (const e of seeds.entries) {
    if (userIds.has(e.id)) {
      skipped.push(`entry ${e.id}`);
      continue;
    }
    const params = entryParams(e, 'curated', now);
    delete params.origin;
    changedEntries += upsertEntry.run(params).changes;
    deleteLinks.run(e.id);
    e.sources.forEach((k, i) => insertLink.run(e.id, k, i));
    deletePoints.run(e.id);
    for (const p of e.spectrum) insertPoint.run(e.id, p.wavelengthNm, p.value);
  }
  const ids = JSON.stringify(seeds.entries.map((e) => e.id));
  const removedEntries = db.prepare("DELETE FROM entries WHERE origin = 'curated' AND id NOT IN (SELECT value FROM json_each(?))").run(ids).changes;

  const upsertCurve = db.prepare(`INSERT INTO condensates (species, a, b, c, d, valid_pressure_min_bar, valid_pressure_max_bar,
    valid_metallicity_min_dex, valid_metallicity_max_dex, source_key, provenance, note)
    VALUES (@species, @a, @b, @c, @d, @pMin, @pMax, @mMin, @mMax, @sourceKey, @provenance, @note)
    ON CONFLICT(species) DO UPDATE SET a = excluded.a, b = excluded.b, c = excluded.c, d = excluded.d,
    valid_pressure_min_bar = excluded.valid_pressure_min_bar, valid_pressure_max_bar = excluded.valid_pressure_max_bar,
    valid_metallicity_min_dex = excluded.valid_metallicity_min_dex, valid_metallicity_max_dex = excluded.valid_metallicity_max_dex,
    source_key = excluded.source_key, provenance = excluded.provenance, note = excluded.note`);
  for (const c of seeds.condensates) {
    upsertCurve.run({
      species: c.species, a: c.a, b: c.b, c: c.c, d: c.d, pMin: c.validPressureBar[0], pMax: c.validPressureBar[1],
      mMin: c.validMetallicityDex[0], mMax: c.validMetallicityDex[1], sourceKey: c.sourceKey, provenance: c.provenance, note: c.note,
    });
  }
  db.prepare('DELETE FROM condensates WHERE species NOT IN (SELECT value FROM json_each(?))').run(JSON.stringify(seeds.condensates.map((c) => c.species)));

  // A retired curated source stays while any entry (a user's, say) still cites it.
  const removedSources = db
    .prepare(`DELETE FROM sources WHERE origin = 'curated' AND key NOT IN (SELECT value FROM json_each(?))
      AND key NOT IN (SELECT source_key FROM entry_sources) AND key NOT IN (SELECT source_key FROM condensates)`)
    .run(JSON.stringify(seeds.sources.map((s) => s.key))).changes;

  const meta = db.prepare('INSERT INTO catalog_meta (key, value) VALUES (?, ?) ON CONFLICT(key) DO UPDATE SET value = excluded.value');
  meta.run(META_SEED_HASH, seeds.hash);
  meta.run('seeded_at', now);
  return {
    seedHash: seeds.hash,
    files: seeds.files,
    entries: seeds.entries.length,
    sources: seeds.sources.length,
    condensates: seeds.condensates.length,
    changedEntries,
    changedSources,
    removedEntries,
    removedSources,
    skippedForUserRows: skipped,
  };
}
