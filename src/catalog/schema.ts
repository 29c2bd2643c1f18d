/**
 * The catalog tables as drizzle-orm sqlite-core definitions.
 * db/migrations is generated from this file with `npx drizzle-kit generate`;
 * test/catalog/migrations.test.ts fails when the two disagree.
 *
 * Values are stored as REAL, wavelengths in nm and temperatures in K (units in the
 * column names). Timestamps are ISO 8601 text in UTC.
 */
import { sql } from 'drizzle-orm';
import { check, index, integer, primaryKey, real, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import {
  APPLIES_TO_TEXTS,
  CATEGORIES,
  COMPARISON_KINDS,
  CURATED_PROVENANCES,
  ORIGINS,
  PROVENANCES,
  QUANTITIES,
  SOURCE_TYPES,
  sqlList,
} from './vocab.ts';

/** Bibliographic records; `key` is the BibTeX citation key. */
export const sources = sqliteTable(
  'sources',
  {
    key: text('key').primaryKey(),
    entryType: text('entry_type', { enum: SOURCE_TYPES }).notNull().default('article'),
    authors: text('authors').notNull(),
    year: integer('year'),
    title: text('title').notNull(),
    journal: text('journal'),
    publisher: text('publisher'),
    volume: text('volume'),
    pages: text('pages'),
    doi: text('doi'),
    arxiv: text('arxiv'),
    /** ADS bibcode (19 characters, e.g. 2017Icar..282...19M). */
    bibcode: text('bibcode'),
    url: text('url'),
    note: text('note'),
    origin: text('origin', { enum: ORIGINS }).notNull(),
    createdAt: text('created_at').notNull(),
    updatedAt: text('updated_at').notNull(),
  },
  (t) => [
    check('sources_key_nonempty', sql`length(${t.key}) > 0`),
    check('sources_bibcode_length', sql`${t.bibcode} IS NULL OR length(${t.bibcode}) = 19`),
    check('sources_entry_type', sql`${t.entryType} IN ${sql.raw(sqlList(SOURCE_TYPES))}`),
    check('sources_authors_nonempty', sql`length(${t.authors}) > 0`),
    check('sources_title_nonempty', sql`length(${t.title}) > 0`),
    check('sources_year_range', sql`${t.year} IS NULL OR (${t.year} >= 1600 AND ${t.year} <= 2200)`),
    check('sources_origin', sql`${t.origin} IN ${sql.raw(sqlList(ORIGINS))}`),
  ],
);

/** Reflectivity values, one quantity in one band each. */
export const entries = sqliteTable(
  'entries',
  {
    id: text('id').primaryKey(),
    name: text('name').notNull(),
    category: text('category', { enum: CATEGORIES }).notNull(),
    description: text('description').notNull().default(''),
    quantity: text('quantity', { enum: QUANTITIES }).notNull(),
    bandMinNm: real('band_min_nm').notNull(),
    bandMaxNm: real('band_max_nm').notNull(),
    valueMin: real('value_min').notNull(),
    valueMax: real('value_max').notNull(),
    valueNominal: real('value_nominal').notNull(),
    temperatureMinK: real('temperature_min_k'),
    temperatureMaxK: real('temperature_max_k'),
    condensate: text('condensate'),
    provenance: text('provenance', { enum: PROVENANCES }).notNull(),
    /**
     * The planet classes the entry applies to, stored as "any" or the classes joined
     * by commas in a fixed order (vocab.ts appliesToText); read back as a list.
     */
    appliesTo: text('applies_to').notNull().default('any'),
    origin: text('origin', { enum: ORIGINS }).notNull(),
    createdAt: text('created_at').notNull(),
    updatedAt: text('updated_at').notNull(),
  },
  (t) => [
    index('entries_category_idx').on(t.category),
    check('entries_applies_to', sql`${t.appliesTo} IN ${sql.raw(sqlList(APPLIES_TO_TEXTS))}`),
    check('entries_id_slug', sql`${t.id} GLOB '[a-z0-9]*' AND ${t.id} NOT GLOB '*[^a-z0-9-]*'`),
    check('entries_name_nonempty', sql`length(${t.name}) > 0`),
    check('entries_category', sql`${t.category} IN ${sql.raw(sqlList(CATEGORIES))}`),
    check('entries_quantity', sql`${t.quantity} IN ${sql.raw(sqlList(QUANTITIES))}`),
    check('entries_provenance', sql`${t.provenance} IN ${sql.raw(sqlList(PROVENANCES))}`),
    check('entries_origin', sql`${t.origin} IN ${sql.raw(sqlList(ORIGINS))}`),
    check('entries_band_order', sql`${t.bandMinNm} > 0 AND ${t.bandMinNm} < ${t.bandMaxNm}`),
    check('entries_value_order', sql`${t.valueMin} >= 0 AND ${t.valueMin} <= ${t.valueNominal} AND ${t.valueNominal} <= ${t.valueMax}`),
    // Only a geometric albedo can exceed 1 (opposition surge, backscattering).
    check('entries_value_unit_interval', sql`${t.quantity} = 'geometric' OR ${t.valueMax} <= 1`),
    check('entries_temperature_min', sql`${t.temperatureMinK} IS NULL OR ${t.temperatureMinK} >= 0`),
    check('entries_temperature_max', sql`${t.temperatureMaxK} IS NULL OR ${t.temperatureMaxK} > 0`),
    check(
      'entries_temperature_order',
      sql`${t.temperatureMinK} IS NULL OR ${t.temperatureMaxK} IS NULL OR ${t.temperatureMinK} <= ${t.temperatureMaxK}`,
    ),
  ],
);

/** Which sources back which entry (many-to-many), in citation order. */
export const entrySources = sqliteTable(
  'entry_sources',
  {
    entryId: text('entry_id')
      .notNull()
      .references(() => entries.id, { onDelete: 'cascade' }),
    sourceKey: text('source_key')
      .notNull()
      .references(() => sources.key, { onDelete: 'restrict' }),
    position: integer('position').notNull().default(0),
  },
  (t) => [
    primaryKey({ columns: [t.entryId, t.sourceKey] }),
    index('entry_sources_source_idx').on(t.sourceKey),
    check('entry_sources_position', sql`${t.position} >= 0`),
  ],
);

/** Bookkeeping (seed version and the like), one text value per key. */
export const catalogMeta = sqliteTable('catalog_meta', {
  key: text('key').primaryKey(),
  value: text('value').notNull(),
});

/** Optional coarse spectra of an entry (value at a wavelength), for band averaging. */
export const spectra = sqliteTable(
  'spectra',
  {
    entryId: text('entry_id')
      .notNull()
      .references(() => entries.id, { onDelete: 'cascade' }),
    wavelengthNm: real('wavelength_nm').notNull(),
    value: real('value').notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.entryId, t.wavelengthNm] }),
    check('spectra_wavelength_positive', sql`${t.wavelengthNm} > 0`),
    check('spectra_value_nonnegative', sql`${t.value} >= 0`),
  ],
);

/**
 * Condensation curves of cloud species in the form
 *   1e4 / T_cond[K] = a - b log10(P/bar) - c [M/H] + d (log10(P/bar))^2
 * (d is zero except where the source fits a quadratic pressure term), valid for
 * pressures and metallicities within the stated ranges.
 */
export const condensates = sqliteTable(
  'condensates',
  {
    species: text('species').primaryKey(),
    a: real('a').notNull(),
    b: real('b').notNull(),
    c: real('c').notNull(),
    d: real('d').notNull().default(0),
    validPressureMinBar: real('valid_pressure_min_bar').notNull(),
    validPressureMaxBar: real('valid_pressure_max_bar').notNull(),
    validMetallicityMinDex: real('valid_metallicity_min_dex').notNull(),
    validMetallicityMaxDex: real('valid_metallicity_max_dex').notNull(),
    sourceKey: text('source_key')
      .notNull()
      .references(() => sources.key, { onDelete: 'restrict' }),
    provenance: text('provenance', { enum: CURATED_PROVENANCES }).notNull(),
    note: text('note').notNull().default(''),
  },
  (t) => [
    check('condensates_species_nonempty', sql`length(${t.species}) > 0`),
    check('condensates_pressure_range', sql`${t.validPressureMinBar} > 0 AND ${t.validPressureMinBar} < ${t.validPressureMaxBar}`),
    check('condensates_metallicity_range', sql`${t.validMetallicityMinDex} < ${t.validMetallicityMaxDex}`),
    check('condensates_provenance', sql`${t.provenance} IN ${sql.raw(sqlList(CURATED_PROVENANCES))}`),
  ],
);

/**
 * Measured geometric albedos of named exoplanets and of planet populations: what a
 * planet is compared with, never a candidate material. Curated only (seeds).
 */
export const comparisons = sqliteTable(
  'comparisons',
  {
    id: text('id').primaryKey(),
    name: text('name').notNull(),
    kind: text('kind', { enum: COMPARISON_KINDS }).notNull(),
    /** A built-in band id (kepler, tess, cheops, ...) or null for another band. */
    bandId: text('band_id'),
    bandMinNm: real('band_min_nm').notNull(),
    bandMaxNm: real('band_max_nm').notNull(),
    geometricAlbedoMin: real('geometric_albedo_min').notNull(),
    geometricAlbedoNominal: real('geometric_albedo_nominal').notNull(),
    geometricAlbedoMax: real('geometric_albedo_max').notNull(),
    /** Nominal equilibrium temperature; null only for a population whose source states none. */
    equilibriumTemperatureK: real('equilibrium_temperature_k'),
    equilibriumTemperatureMinK: real('equilibrium_temperature_min_k'),
    equilibriumTemperatureMaxK: real('equilibrium_temperature_max_k'),
    provenance: text('provenance', { enum: CURATED_PROVENANCES }).notNull(),
    description: text('description').notNull().default(''),
  },
  (t) => [
    check('comparisons_id_slug', sql`${t.id} GLOB '[a-z0-9]*' AND ${t.id} NOT GLOB '*[^a-z0-9-]*'`),
    check('comparisons_name_nonempty', sql`length(${t.name}) > 0`),
    check('comparisons_kind', sql`${t.kind} IN ${sql.raw(sqlList(COMPARISON_KINDS))}`),
    check('comparisons_provenance', sql`${t.provenance} IN ${sql.raw(sqlList(CURATED_PROVENANCES))}`),
    check('comparisons_band_order', sql`${t.bandMinNm} > 0 AND ${t.bandMinNm} < ${t.bandMaxNm}`),
    check(
      'comparisons_albedo_order',
      sql`${t.geometricAlbedoMin} >= 0 AND ${t.geometricAlbedoMin} <= ${t.geometricAlbedoNominal} AND ${t.geometricAlbedoNominal} <= ${t.geometricAlbedoMax}`,
    ),
    check('comparisons_temperature_positive', sql`${t.equilibriumTemperatureK} IS NULL OR ${t.equilibriumTemperatureK} > 0`),
    check('comparisons_planet_temperature', sql`${t.kind} = 'population' OR ${t.equilibriumTemperatureK} IS NOT NULL`),
    check(
      'comparisons_temperature_range',
      sql`(${t.equilibriumTemperatureMinK} IS NULL OR ${t.equilibriumTemperatureMinK} <= ${t.equilibriumTemperatureK}) AND (${t.equilibriumTemperatureMaxK} IS NULL OR ${t.equilibriumTemperatureK} <= ${t.equilibriumTemperatureMaxK})`,
    ),
  ],
);

/** Which sources back which comparison row, in citation order. */
export const comparisonSources = sqliteTable(
  'comparison_sources',
  {
    comparisonId: text('comparison_id')
      .notNull()
      .references(() => comparisons.id, { onDelete: 'cascade' }),
    sourceKey: text('source_key')
      .notNull()
      .references(() => sources.key, { onDelete: 'restrict' }),
    position: integer('position').notNull().default(0),
  },
  (t) => [
    primaryKey({ columns: [t.comparisonId, t.sourceKey] }),
    index('comparison_sources_source_idx').on(t.sourceKey),
    check('comparison_sources_position', sql`${t.position} >= 0`),
  ],
);
