/**
 * zod schemas of the catalog-entry JSON format and of source records. Used by `catalog add`, the HTTP API, CSV import and the seed loader, so
 * every way into the catalog applies the same rules as the database CHECKs.
 */
import { z } from 'zod';
import {
  BIBCODE_PATTERN,
  CATEGORIES,
  CURATED_PROVENANCES,
  DEFAULT_APPLIES_TO,
  ENTRY_ID_PATTERN,
  ORIGINS,
  PLANET_CLASSES,
  PROVENANCES,
  QUANTITIES,
  SOURCE_KEY_PATTERN,
  SOURCE_TYPES,
  USER_PROVENANCE,
  type PlanetClass,
} from './vocab.ts';
import { authorsProblem, DOI_PATTERN, doiProblem, textProblem, URL_PATTERN, urlProblem } from './source-fields.ts';

/** A string refused, with the reason, when the writers could not write it safely (rules in source-fields.ts). */
const writable = (schema: z.ZodString, problem: (s: string) => string | undefined) =>
  schema.superRefine((s, ctx) => {
    const p = problem(s);
    if (p !== undefined) ctx.addIssue({ code: 'custom', message: p });
  });
const bibText = (max: number) => writable(z.string().trim().min(1).max(max), textProblem);
const optionalText = (max: number) => bibText(max).nullable().optional();
const optionalCode = z
  .union([bibText(60), z.number().int().nonnegative()])
  .transform((v) => String(v))
  .nullable()
  .optional();

export const sourceKeySchema = z
  .string()
  .regex(SOURCE_KEY_PATTERN, 'a source key starts with a letter and has only letters, digits and _ : . + - (at most 80 characters)');

/**
 * A bibliographic record. `authors` uses BibTeX name-list syntax: names joined by
 * " and ", each "Last, First" (or "First Last"), a corporate name in braces
 * ("{NASA Space Science Data Coordinated Archive}"), "others" for et al. Text is plain
 * Unicode; the BibTeX writer does the LaTeX escaping.
 */
export const sourceRecordSchema = z
  .object({
    key: sourceKeySchema,
    type: z.enum(SOURCE_TYPES).default('article'),
    authors: writable(z.string().trim().min(1).max(4000), authorsProblem),
    year: z.number().int().min(1600).max(2200).nullable().optional(),
    title: bibText(1000),
    journal: optionalText(300),
    publisher: optionalText(300),
    volume: optionalCode,
    pages: optionalCode,
    doi: writable(z.string().trim(), doiProblem).meta({ pattern: DOI_PATTERN.source, description: 'DOI without https://doi.org/, e.g. 10.1234/abc' }).nullable().optional(),
    arxiv: z
      .string()
      .trim()
      .regex(/^(\d{4}\.\d{4,5}|[a-z-]+(\.[A-Z]{2})?\/\d{7})(v\d+)?$/, 'an arXiv id looks like 1609.05048 or astro-ph/9910504')
      .nullable()
      .optional(),
    bibcode: z
      .string()
      .trim()
      .regex(BIBCODE_PATTERN, 'an ADS bibcode has 19 characters: year, journal, volume, page and initial padded with dots, e.g. 2017Icar..282...19M')
      .nullable()
      .optional(),
    url: writable(z.string().trim().max(2000), urlProblem).meta({ pattern: URL_PATTERN.source, description: 'http(s) URL of RFC 3986 characters, without @' }).nullable().optional(),
    note: optionalText(4000),
    /** Accepted so exported records can be re-added; new records are always user rows. */
    origin: z.enum(ORIGINS).optional(),
  })
  .strict();

const finite = z.number();
const nonNegative = finite.min(0, 'must be >= 0');
const positive = finite.positive('must be > 0');

const spectrumPointSchema = z.object({ wavelengthNm: positive, value: nonNegative }).strict();

/**
 * The planet classes an entry applies to: a non-empty list without repeats, "any"
 * alone; returned in the order of PLANET_CLASSES.
 */
export const appliesToSchema = z
  .array(z.enum(PLANET_CLASSES))
  .min(1, `list at least one planet class (${PLANET_CLASSES.join(', ')})`)
  .superRefine((list, ctx) => {
    const seen = new Set<string>();
    list.forEach((c, i) => {
      if (seen.has(c)) ctx.addIssue({ code: 'custom', path: [i], message: `planet class ${c} is listed twice` });
      seen.add(c);
    });
    if (list.includes('any') && list.length > 1) ctx.addIssue({ code: 'custom', path: [], message: '"any" already covers every planet class: list it alone' });
  })
  .transform((list) => PLANET_CLASSES.filter((c) => list.includes(c)) as PlanetClass[]);

/** The fields every entry shape shares; `sources` differs between users and seeds. */
const entryFields = {
  id: z.string().regex(ENTRY_ID_PATTERN, 'an id is a slug: lower-case letters, digits and inner hyphens, at most 80 characters'),
  name: z.string().trim().min(1).max(200),
  category: z.enum(CATEGORIES),
  quantity: z.enum(QUANTITIES),
  bandMinNm: positive,
  bandMaxNm: positive,
  valueMin: nonNegative,
  valueNominal: nonNegative,
  valueMax: nonNegative,
  temperatureMinK: nonNegative.nullable().default(null),
  temperatureMaxK: positive.nullable().default(null),
  condensate: z.string().trim().min(1).max(60).nullable().default(null),
  description: z.string().max(4000).default(''),
  spectrum: z.array(spectrumPointSchema).max(10000).default([]),
  /** Accepted so exported entries can be re-added; entries added are always user rows. */
  origin: z.enum(ORIGINS).optional(),
};

interface CrossFields {
  quantity: string;
  bandMinNm: number;
  bandMaxNm: number;
  valueMin: number;
  valueNominal: number;
  valueMax: number;
  temperatureMinK: number | null;
  temperatureMaxK: number | null;
  spectrum: { wavelengthNm: number }[];
  sources: (string | { key: string })[];
}

/** Rules between fields, mirroring the CHECK constraints of schema.ts. */
function checkCrossFields(e: CrossFields, ctx: z.RefinementCtx): void {
  const say = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
  if (e.bandMinNm >= e.bandMaxNm) say('bandMaxNm', `bandMaxNm = ${e.bandMaxNm} must be greater than bandMinNm = ${e.bandMinNm}`);
  if (e.valueMin > e.valueMax) say('valueMin', `valueMin = ${e.valueMin} must not exceed valueMax = ${e.valueMax}`);
  else if (e.valueNominal < e.valueMin || e.valueNominal > e.valueMax) {
    say('valueNominal', `valueNominal = ${e.valueNominal} must lie in [valueMin, valueMax] = [${e.valueMin}, ${e.valueMax}]`);
  }
  if (e.quantity !== 'geometric' && e.valueMax > 1) {
    say('valueMax', `valueMax = ${e.valueMax}: a ${e.quantity} albedo cannot exceed 1 (only a geometric albedo can)`);
  }
  if (e.temperatureMinK !== null && e.temperatureMaxK !== null && e.temperatureMinK > e.temperatureMaxK) {
    say('temperatureMinK', `temperatureMinK = ${e.temperatureMinK} must not exceed temperatureMaxK = ${e.temperatureMaxK}`);
  }
  const seen = new Set<number>();
  e.spectrum.forEach((p, i) => {
    if (seen.has(p.wavelengthNm)) ctx.addIssue({ code: 'custom', path: ['spectrum', i, 'wavelengthNm'], message: `wavelength ${p.wavelengthNm} nm appears twice` });
    seen.add(p.wavelengthNm);
  });
  const keys = new Set<string>();
  e.sources.forEach((s, i) => {
    const key = typeof s === 'string' ? s : s.key;
    if (keys.has(key)) ctx.addIssue({ code: 'custom', path: ['sources', i], message: `source ${key} is cited twice` });
    keys.add(key);
  });
}

/**
 * A catalog entry as users and the API give it: sources are keys or full records;
 * provenance defaults to user and appliesTo to ["any"].
 */
export const catalogEntryInputSchema = z
  .object({
    ...entryFields,
    provenance: z.enum(PROVENANCES).default(USER_PROVENANCE),
    appliesTo: appliesToSchema.default([...DEFAULT_APPLIES_TO]),
    sources: z.array(z.union([sourceKeySchema, sourceRecordSchema])).min(1, 'at least one source is required'),
  })
  .strict()
  .superRefine(checkCrossFields);

/**
 * A curated entry in seeds/*.json: sources are keys of the seed source records; the
 * provenance is one of the curated tags and appliesTo is required.
 */
export const seedEntrySchema = z
  .object({
    ...entryFields,
    provenance: z.enum(CURATED_PROVENANCES),
    appliesTo: appliesToSchema,
    sources: z.array(sourceKeySchema).min(1, 'at least one source is required'),
  })
  .strict()
  .superRefine(checkCrossFields);

/** A partial update of a user entry (any field but the id); checked again after merging. */
export const catalogEntryPatchSchema = z
  .object({
    name: entryFields.name,
    category: entryFields.category,
    quantity: entryFields.quantity,
    bandMinNm: entryFields.bandMinNm,
    bandMaxNm: entryFields.bandMaxNm,
    valueMin: entryFields.valueMin,
    valueNominal: entryFields.valueNominal,
    valueMax: entryFields.valueMax,
    temperatureMinK: nonNegative.nullable(),
    temperatureMaxK: positive.nullable(),
    condensate: z.string().trim().min(1).max(60).nullable(),
    description: z.string().max(4000),
    provenance: z.enum(PROVENANCES),
    appliesTo: appliesToSchema,
    spectrum: z.array(spectrumPointSchema).max(10000),
    sources: z.array(z.union([sourceKeySchema, sourceRecordSchema])).min(1, 'at least one source is required'),
  })
  .partial()
  .strict();

export type SourceRecordInput = z.input<typeof sourceRecordSchema>;
export type SourceRecordParsed = z.output<typeof sourceRecordSchema>;
export type CatalogEntryInput = z.input<typeof catalogEntryInputSchema>;
export type CatalogEntryParsed = z.output<typeof catalogEntryInputSchema>;
export type SeedEntryParsed = z.output<typeof seedEntrySchema>;
export type CatalogEntryPatch = z.input<typeof catalogEntryPatchSchema>;
