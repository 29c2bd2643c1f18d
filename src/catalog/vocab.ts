/**
 * The closed vocabularies of the catalog. The database CHECK constraints, the zod
 * schemas and the CLI help are all built from these lists, so a new word is added
 * here once.
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
 * How far a curated value was checked: checked (seen in the primary source), secondary
 * (seen only where the primary source is quoted), computed (derived by us from checked
 * inputs, e.g. a Mie calculation), memory (recalled, not seen).
 */
export const CURATED_PROVENANCES = ['checked', 'secondary', 'computed', 'memory'] as const;
export type CuratedProvenance = (typeof CURATED_PROVENANCES)[number];

/** Every provenance tag: the curated ones plus user, the default of user entries. */
export const PROVENANCES = [...CURATED_PROVENANCES, 'user'] as const;
export type Provenance = (typeof PROVENANCES)[number];

/** The provenance a user entry gets when it names none. */
export const USER_PROVENANCE: Provenance = 'user';

/**
 * The planet classes an entry can apply to: giant (gas giant), sub-neptune (planet with
 * a thick H/He or volatile envelope below Neptune's size), rocky (a solid or molten
 * surface can be seen), any (no restriction).
 */
export const PLANET_CLASSES = ['giant', 'sub-neptune', 'rocky', 'any'] as const;
export type PlanetClass = (typeof PLANET_CLASSES)[number];

/** What user entries apply to when they do not say. */
export const DEFAULT_APPLIES_TO: readonly PlanetClass[] = ['any'];

/** The classes other than any, in their stored order. */
const SPECIFIC_CLASSES = PLANET_CLASSES.filter((c) => c !== 'any');

/**
 * The stored forms of an appliesTo list: "any" alone, or a non-empty set of the other
 * classes in the order of PLANET_CLASSES joined by commas ("giant,sub-neptune").
 */
export const APPLIES_TO_TEXTS: readonly string[] = [
  'any',
  ...Array.from({ length: 2 ** SPECIFIC_CLASSES.length - 1 }, (_, i) =>
    SPECIFIC_CLASSES.filter((_c, bit) => ((i + 1) >> bit) & 1).join(','),
  ),
];

/** An appliesTo list (already validated: no repeats, "any" alone) as stored text. */
export function appliesToText(list: readonly PlanetClass[]): string {
  return PLANET_CLASSES.filter((c) => list.includes(c)).join(',');
}

/** Stored text back to the list, in the order of PLANET_CLASSES. */
export function appliesToList(text: string): PlanetClass[] {
  return text.split(',').filter((c): c is PlanetClass => (PLANET_CLASSES as readonly string[]).includes(c));
}

/** What a comparison row describes: one named planet, or a population of planets. */
export const COMPARISON_KINDS = ['planet', 'population'] as const;
export type ComparisonKind = (typeof COMPARISON_KINDS)[number];

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

/**
 * An ADS bibcode: 19 characters YYYYJJJJJVVVVMPPPPA (year, journal abbreviation padded
 * with dots, volume, qualifier such as L for letters, page, first author's initial),
 * e.g. 2017Icar..282...19M, 2013ApJ...776L..25D, 2017A&A...598A.130C. Page numbers of
 * six digits run into the qualifier (2022Icar..37514803F).
 */
export const BIBCODE_PATTERN = /^\d{4}[A-Za-z0-9&.]{5}[A-Za-z0-9.]{9}[A-Za-z.]$/;

/** The ADS abstract page of a bibcode (& percent-encoded so the URL is TeX-safe). */
export function adsUrl(bibcode: string): string {
  return `https://ui.adsabs.harvard.edu/abs/${bibcode.replace(/&/g, '%26')}`;
}

/** SQL list literal of a vocabulary, for CHECK constraints: ('a', 'b'). */
export function sqlList(words: readonly string[]): string {
  return `(${words.map((w) => `'${w}'`).join(', ')})`;
}
