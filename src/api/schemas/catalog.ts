/**
 * Catalog shapes of the API: entries and sources as the catalog hands them out, the
 * query of GET /api/catalog/entries, and the request bodies (the catalog's own zod
 * schemas, registered here under component names for the OpenAPI document).
 */
import { z } from 'zod';
import {
  CATEGORIES, ORIGINS, PLANET_CLASSES, PROVENANCES, QUANTITIES, SOURCE_TYPES,
  catalogEntryInputSchema, catalogEntryPatchSchema,
  type CatalogEntry, type SourceRecord,
} from '../../catalog/index.ts';
import { apiRegistry } from './common.ts';

/** Request bodies are documented in their input form (defaults optional). */
export const requestRegistry = z.registry<{ id: string; description?: string }>();
requestRegistry.add(catalogEntryInputSchema, {
  id: 'CatalogEntryInput',
  description: 'A new user entry: sources are keys of existing sources or full source records.',
});
requestRegistry.add(catalogEntryPatchSchema, {
  id: 'CatalogEntryPatch',
  description: 'Fields of a user entry to change (any but the id); the merged entry is checked again.',
});

export const catalogEntrySchema = z.object({
  id: z.string(),
  name: z.string(),
  category: z.enum(CATEGORIES),
  quantity: z.enum(QUANTITIES),
  bandMinNm: z.number(),
  bandMaxNm: z.number(),
  valueMin: z.number(),
  valueMax: z.number(),
  valueNominal: z.number(),
  temperatureMinK: z.number().nullable(),
  temperatureMaxK: z.number().nullable(),
  condensate: z.string().nullable(),
  description: z.string(),
  provenance: z.enum(PROVENANCES),
  appliesTo: z.array(z.enum(PLANET_CLASSES)).describe('Planet classes the entry applies to; ["any"] when it is not restricted.'),
  sources: z.array(z.string()).describe('Keys of the sources; GET /api/catalog/sources has the records.'),
  origin: z.enum(ORIGINS).describe('curated rows come from the seeds and cannot be changed here; user rows can.'),
  spectrum: z.array(z.object({ wavelengthNm: z.number(), value: z.number() })).optional(),
});
apiRegistry.add(catalogEntrySchema, { id: 'CatalogEntry', description: 'A reference reflectivity with its band, temperature window and sources.' });

export const catalogEntryListSchema = z.array(catalogEntrySchema);
apiRegistry.add(catalogEntryListSchema, { id: 'CatalogEntryList' });

export const sourceSchema = z.object({
  key: z.string(),
  type: z.enum(SOURCE_TYPES),
  authors: z.string().describe('BibTeX name list ("Last, First and Last, First").'),
  year: z.number().int().nullable(),
  title: z.string(),
  journal: z.string().nullable(),
  publisher: z.string().nullable(),
  volume: z.string().nullable(),
  pages: z.string().nullable(),
  doi: z.string().nullable(),
  arxiv: z.string().nullable(),
  bibcode: z.string().nullable().describe('ADS bibcode (19 characters).'),
  url: z.string().nullable(),
  note: z.string().nullable(),
  origin: z.enum(ORIGINS),
});
apiRegistry.add(sourceSchema, { id: 'Source', description: 'A bibliographic record cited by catalog entries.' });

export const sourceListSchema = z.array(sourceSchema);
apiRegistry.add(sourceListSchema, { id: 'SourceList' });

const listWords = (words: readonly string[]) => `one of ${words.join(', ')}`;

/** Query of GET /api/catalog/entries; unknown parameters are refused so typos show. */
export const entryQuerySchema = z
  .object({
    category: z.enum(CATEGORIES, { error: listWords(CATEGORIES) }).optional().describe('Only entries of this category.'),
    origin: z.enum(ORIGINS, { error: listWords(ORIGINS) }).optional().describe('Only curated or only user entries.'),
    search: z.string().trim().max(200).optional().describe('Case-insensitive text found in the id, name, description, condensate or source keys; empty means no filter.'),
  })
  .strict();

/** Query of GET /api/catalog/bibtex. */
export const bibtexQuerySchema = z
  .object({
    keys: z
      .string()
      .max(20_000)
      .optional()
      .describe('Comma-separated source keys; all sources when absent.'),
  })
  .strict();

/** Path parameter :id. */
export const entryIdSchema = z.string().min(1).max(80).describe('Entry id (a slug).');

/** Compile-time checks that the catalog's types fit the published schemas. */
export function entryConforms(entry: CatalogEntry): z.input<typeof catalogEntrySchema> {
  return entry;
}
export function sourceConforms(source: SourceRecord): z.input<typeof sourceSchema> {
  return source;
}
