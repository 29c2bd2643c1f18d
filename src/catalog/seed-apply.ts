/**
 * Applying the curated seeds: one transaction of prepared upserts. Curated rows are
 * inserted, updated where they changed, and deleted when the seeds no longer list
 * them; user rows (origin 'user') are never written, and a seed row whose id or key a
 * user row already holds is skipped and reported.
 *
 * Raw SQL on purpose: each upsert touches a curated row only when a field changed
 * ("ON CONFLICT ... DO UPDATE ... WHERE origin = 'curated' AND (a IS NOT excluded.a
 * OR ...)") and counts the rows it changed, and the retirements compare against the
 * seed ids in one json_each() statement; prepared once, run a few hundred times.
 */
import type Database from 'better-sqlite3';
import { eq } from 'drizzle-orm';
import { orm } from './orm.ts';
import { catalogMeta } from './schema.ts';
import type { SeedSet } from './seed-load.ts';
import type { SeedReport } from './types.ts';
import { entryParams } from './write.ts';

const SOURCE_FIELDS = ['entry_type', 'authors', 'year', 'title', 'journal', 'publisher', 'volume', 'pages', 'doi', 'arxiv', 'bibcode', 'url', 'note'];
const ENTRY_FIELDS = [
  'name', 'category', 'description', 'quantity', 'band_min_nm', 'band_max_nm', 'value_min', 'value_max', 'value_nominal',
  'temperature_min_k', 'temperature_max_k', 'condensate', 'provenance', 'applies_to',
];

/** "ON CONFLICT ... DO UPDATE" that touches a curated row only when a field changed. */
function upsertTail(table: string, key: string, fields: string[]): string {
  const set = fields.map((f) => `${f} = excluded.${f}`).join(', ');
  const changed = fields.map((f) => `${table}.${f} IS NOT excluded.${f}`).join(' OR ');
  return `ON CONFLICT(${key}) DO UPDATE SET ${set}, updated_at = excluded.updated_at WHERE ${table}.origin = 'curated' AND (${changed})`;
}

export const META_SEED_HASH = 'seed_hash';

export function storedSeedHash(db: Database.Database): string | undefined {
  return orm(db).select({ value: catalogMeta.value }).from(catalogMeta).where(eq(catalogMeta.key, META_SEED_HASH)).get()?.value;
}

/** Writes the seed set; call inside a transaction. */
export function applySeedSet(db: Database.Database, seeds: SeedSet, now: string): SeedReport {
  const userKeys = new Set((db.prepare("SELECT key FROM sources WHERE origin = 'user'").all() as { key: string }[]).map((r) => r.key));
  const userIds = new Set((db.prepare("SELECT id FROM entries WHERE origin = 'user'").all() as { id: string }[]).map((r) => r.id));
  const skipped: string[] = [];

  const upsertSource = db.prepare(`INSERT INTO sources (key, entry_type, authors, year, title, journal, publisher, volume, pages, doi,
    arxiv, bibcode, url, note, origin, created_at, updated_at) VALUES (@key, @type, @authors, @year, @title, @journal, @publisher, @volume,
    @pages, @doi, @arxiv, @bibcode, @url, @note, 'curated', @now, @now) ${upsertTail('sources', 'key', SOURCE_FIELDS)}`);
  let changedSources = 0;
  for (const s of seeds.sources) {
    if (userKeys.has(s.key)) {
      skipped.push(`source ${s.key}`);
      continue;
    }
    changedSources += upsertSource.run({ ...s, now }).changes;
  }

  const upsertEntry = db.prepare(`INSERT INTO entries (id, name, category, description, quantity, band_min_nm, band_max_nm, value_min,
    value_max, value_nominal, temperature_min_k, temperature_max_k, condensate, provenance, applies_to, origin, created_at, updated_at)
    VALUES (@id, @name, @category, @description, @quantity, @bandMinNm, @bandMaxNm, @valueMin, @valueMax, @valueNominal,
    @temperatureMinK, @temperatureMaxK, @condensate, @provenance, @appliesTo, 'curated', @now, @now) ${upsertTail('entries', 'id', ENTRY_FIELDS)}`);
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
    changedEntries += upsertEntry.run(entryParams(e, now)).changes;
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

  // Comparison rows are curated only: replace them all, with their source links.
  db.prepare('DELETE FROM comparisons').run();
  const insertComparison = db.prepare(`INSERT INTO comparisons (id, name, kind, band_id, band_min_nm, band_max_nm, geometric_albedo_min,
    geometric_albedo_nominal, geometric_albedo_max, equilibrium_temperature_k, equilibrium_temperature_min_k, equilibrium_temperature_max_k,
    provenance, description) VALUES (@id, @name, @kind, @bandId, @bandMinNm, @bandMaxNm, @geometricAlbedoMin, @geometricAlbedoNominal,
    @geometricAlbedoMax, @equilibriumTemperatureK, @equilibriumTemperatureMinK, @equilibriumTemperatureMaxK, @provenance, @description)`);
  const insertComparisonLink = db.prepare('INSERT INTO comparison_sources (comparison_id, source_key, position) VALUES (?, ?, ?)');
  for (const c of seeds.comparisons) {
    const { sources: keys, ...row } = c;
    insertComparison.run(row);
    keys.forEach((k, i) => insertComparisonLink.run(c.id, k, i));
  }

  // A retired curated source stays while any entry (a user's, say) still cites it.
  const removedSources = db
    .prepare(`DELETE FROM sources WHERE origin = 'curated' AND key NOT IN (SELECT value FROM json_each(?))
      AND key NOT IN (SELECT source_key FROM entry_sources) AND key NOT IN (SELECT source_key FROM condensates)
      AND key NOT IN (SELECT source_key FROM comparison_sources)`)
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
    comparisons: seeds.comparisons.length,
    changedEntries,
    changedSources,
    removedEntries,
    removedSources,
    skippedForUserRows: skipped,
  };
}
