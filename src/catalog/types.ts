/** The shapes the catalog hands out (the catalog-entry JSON, plus origin). */
import type { Category, Origin, Provenance, Quantity, SourceType } from './vocab.ts';

export interface SpectrumPoint {
  wavelengthNm: number;
  value: number;
}

/** A catalog entry as listed: `sources` are keys, `origin` says who owns the row. */
export interface CatalogEntry {
  id: string;
  name: string;
  category: Category;
  quantity: Quantity;
  bandMinNm: number;
  bandMaxNm: number;
  valueMin: number;
  valueMax: number;
  valueNominal: number;
  temperatureMinK: number | null;
  temperatureMaxK: number | null;
  /** Condensing species (matches a condensates.species where a curve exists). */
  condensate: string | null;
  description: string;
  provenance: Provenance;
  sources: string[];
  origin: Origin;
  /** Coarse spectrum of the quantity, present only when the entry has one. */
  spectrum?: SpectrumPoint[];
}

/** A bibliographic record (BibTeX-style key; authors in BibTeX name-list syntax). */
export interface SourceRecord {
  key: string;
  type: SourceType;
  authors: string;
  year: number | null;
  title: string;
  journal: string | null;
  publisher: string | null;
  volume: string | null;
  pages: string | null;
  doi: string | null;
  arxiv: string | null;
  url: string | null;
  note: string | null;
  origin: Origin;
}

/**
 * A condensation curve 1e4/T_cond[K] = a - b log10(P/bar) - c [M/H] + d (log10 P)^2,
 * valid inside the stated pressure and metallicity ranges.
 */
export interface CondensateCurve {
  species: string;
  a: number;
  b: number;
  c: number;
  d: number;
  validPressureBar: [number, number];
  validMetallicityDex: [number, number];
  sourceKey: string;
  provenance: Provenance;
  note: string;
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
