/**
 * The shapes the catalog hands out. Row types come from the drizzle schema
 * (`$inferSelect`); the JSON shapes are built from them, so a column's type is stated
 * once, in schema.ts.
 */
import type { comparisons, condensates, entries, sources } from './schema.ts';
import type { ComparisonKind, CuratedProvenance, PlanetClass, SourceType } from './vocab.ts';

/** Rows as drizzle reads them (timestamps left out where the JSON shapes omit them). */
export type EntryRow = Omit<typeof entries.$inferSelect, 'createdAt' | 'updatedAt'>;
export type SourceRow = Omit<typeof sources.$inferSelect, 'createdAt' | 'updatedAt'>;
export type CondensateRow = typeof condensates.$inferSelect;
export type ComparisonRow = typeof comparisons.$inferSelect;

export interface SpectrumPoint {
  wavelengthNm: number;
  value: number;
}

/**
 * A catalog entry as listed: `sources` are keys, `origin` says who owns the row,
 * `appliesTo` the planet classes it applies to. `condensate` names the condensing
 * species (matches a condensates.species where a curve exists).
 */
export type CatalogEntry = Omit<EntryRow, 'appliesTo'> & {
  appliesTo: PlanetClass[];
  sources: string[];
  /** Coarse spectrum of the quantity, present only when the entry has one. */
  spectrum?: SpectrumPoint[];
};

/** A bibliographic record (BibTeX-style key; authors in BibTeX name-list syntax). */
export type SourceRecord = Omit<SourceRow, 'entryType'> & { type: SourceType };

/**
 * A condensation curve 1e4/T_cond[K] = a - b log10(P/bar) - c [M/H] + d (log10 P)^2,
 * valid inside the stated pressure and metallicity ranges.
 */
export type CondensateCurve = Omit<
  CondensateRow,
  'validPressureMinBar' | 'validPressureMaxBar' | 'validMetallicityMinDex' | 'validMetallicityMaxDex'
> & {
  validPressureBar: [number, number];
  validMetallicityDex: [number, number];
};

/** The band a comparison value was measured in. */
export interface ComparisonBand {
  /** A built-in band id (kepler, tess, cheops, ...), or null for another band. */
  id: string | null;
  minNm: number;
  maxNm: number;
}

/**
 * A measured geometric albedo of a named exoplanet or of a planet population: a point
 * of comparison, never a candidate material.
 */
export interface ComparisonEntry {
  id: string;
  name: string;
  kind: ComparisonKind;
  band: ComparisonBand;
  /** [lowest, highest] geometric albedo the source allows. */
  geometricAlbedoRange: [number, number];
  geometricAlbedoNominal: number;
  /** Nominal equilibrium temperature, K; null only for a population whose source states none. */
  equilibriumTemperatureK: number | null;
  /** The range of equilibrium temperatures of a population, K; null for one planet. */
  equilibriumTemperatureRangeK: [number, number] | null;
  sources: string[];
  provenance: CuratedProvenance;
  description: string;
}

export interface EntryFilter {
  category?: string;
  search?: string;
  origin?: string;
}

/** What a (re-)seed did. */
export interface SeedReport {
  seedHash: string;
  files: string[];
  entries: number;
  sources: number;
  condensates: number;
  comparisons: number;
  /** Curated rows inserted or changed by this seed. */
  changedEntries: number;
  changedSources: number;
  /** Curated rows that are no longer in the seeds and were deleted. */
  removedEntries: number;
  removedSources: number;
  /** Seed rows skipped because a user row already has that id or key (user rows win). */
  skippedForUserRows: string[];
}

export interface ImportReport {
  imported: number;
  ids: string[];
}
