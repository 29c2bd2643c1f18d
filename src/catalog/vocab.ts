/**
 * The closed vocabularies of the catalog. The database CHECK
 * constraints, the zod schemas and the CLI help are all built from these lists, so a
 * new word is added here once.
 */

/** What kind of thing an entry describes. */
export const CATEGORIES = [
  'cloud',
  'haze',
  'ice',
  'ocean',
  'rock',
  'lava',
  'regolith',
  'vegetation',
  'soil',
  'metal',
  'body',
  'clear-atmosphere',
  'model',
] as const;
export type Category = (typeof CATEGORIES)[number];

/**
 * Which reflectivity the value is. geometric: zero-phase albedo relative to a Lambert
 * disk (may exceed 1); bond: bolometric spherical albedo; spherical: spherical albedo in
 * one band; surface: hemispherical (climate-table) reflectance of a surface; single-
 * scattering: albedo of one particle scattering event.
 */
export const QUANTITIES = ['geometric', 'bond', 'spherical', 'surface', 'single-scattering'] as const;
export type Quantity = (typeof QUANTITIES)[number];

/**
 * How far a value was checked: checked (seen in the primary source), secondary (seen
 * only restated elsewhere), computed (derived from checked inputs), memory (recalled,
 * not seen).
 */
export const PROVENANCES = ['checked', 'secondary', 'computed', 'memory'] as const;
export type Provenance = (typeof PROVENANCES)[number];

/** curated rows come from seeds/*.json and are owned by the seeds; user rows are never touched by a re-seed. */
export const ORIGINS = ['curated', 'user'] as const;
export type Origin = (typeof ORIGINS)[number];

/** BibTeX entry types a source record may have. */
export const SOURCE_TYPES = ['article', 'book', 'inproceedings', 'techreport', 'misc'] as const;
export type SourceType = (typeof SOURCE_TYPES)[number];

/** The pattern of an entry id (a slug): lower-case letters, digits and inner hyphens. */
export const ENTRY_ID_PATTERN = /^[a-z0-9](?:[a-z0-9-]{0,78}[a-z0-9])?$/;

/** The pattern of a source key (BibTeX-style citation key). */
export const SOURCE_KEY_PATTERN = /^[A-Za-z][A-Za-z0-9_:.+-]{0,79}$/;

/** SQL list literal of a vocabulary, for CHECK constraints: ('a', 'b'). */
export function sqlList(words: readonly string[]): string {
  return `(${words.map((w) => `'${w}'`).join(', ')})`;
}
