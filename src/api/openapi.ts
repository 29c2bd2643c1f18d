/**
 * The OpenAPI 3.1 document of the API, generated from the zod schemas the routes use
 * (z.toJSONSchema over the component registries) and the system-file JSON Schema, so
 * the document cannot drift from what the server checks and answers.
 */
import { z } from 'zod';
import { systemJsonSchema } from '../index.ts';
import { MAX_BODY_BYTES, MAX_WORK } from './limits.ts';
import { bibtexQuerySchema, entryQuerySchema, requestRegistry } from './schemas/catalog.ts';
import { apiRegistry } from './schemas/common.ts';
import './schemas/interpretation.ts';
import { reportQuerySchema } from './schemas/report.ts';
import { HESPER_VERSION } from './version.ts';

type Json = Record<string, unknown>;

const ref = (id: string): Json => ({ $ref: `#/components/schemas/${id}` });

function componentSchemas(): Json {
  const uri = (id: string) => `#/components/schemas/${id}`;
  const out = z.toJSONSchema(apiRegistry, { uri, io: 'output', unrepresentable: 'any' }).schemas;
  const inp = z.toJSONSchema(requestRegistry, { uri, io: 'input', unrepresentable: 'any' }).schemas;
  const clean = (s: Json): Json => {
    const { $schema: _s, $id: _i, ...rest } = s;
    return rest;
  };
  const all: Json = {};
  for (const [id, s] of Object.entries({ ...out, ...inp })) all[id] = clean(s as Json);
  all.SystemFile = clean(systemJsonSchema());
  return all;
}

const errorResponse = (description: string): Json => ({ description, content: { 'application/json': { schema: ref('ErrorBody') } } });
const jsonResponse = (description: string, schema: Json): Json => ({ description, content: { 'application/json': { schema } } });
const jsonBody = (schema: Json, description: string): Json => ({ required: true, description, content: { 'application/json': { schema } } });

const ERRORS = {
  '400': errorResponse('Bad input: each issue names the field (or query parameter) and the problem.'),
  '413': errorResponse(`The body is larger than ${MAX_BODY_BYTES} bytes.`),
  '415': errorResponse('The body is not sent as application/json.'),
  '500': errorResponse('Unexpected failure; the body holds no internals.'),
};
const NOT_FOUND = { '404': errorResponse('No entry has this id.') };
const FORBIDDEN = { '403': errorResponse('The entry is curated: only user entries can be changed or removed.') };

/** Query parameters from a strict zod object, each with its own JSON Schema. */
function queryParameters(schema: z.ZodObject): Json[] {
  return Object.entries(schema.shape).map(([name, field]) => {
    const s = z.toJSONSchema(field as z.ZodType, { io: 'input', unrepresentable: 'any' }) as Json;
    const { $schema: _s, description, ...rest } = s;
    return { name, in: 'query', required: false, ...(description ? { description } : {}), schema: rest };
  });
}

const idParameter: Json = { name: 'id', in: 'path', required: true, description: 'Entry id (a slug).', schema: { type: 'string', maxLength: 80 } };

const systemBody = jsonBody(ref('SystemFile'), `A system file. Data only: {responseFile} and {samplesFile} are refused; give curves and samples inline. samples x gridNodes may be at most ${MAX_WORK}.`);

function paths(): Json {
  return {
    '/api/health': {
      get: { operationId: 'health', summary: 'The server answers and its catalog is open.', responses: { '200': jsonResponse('Health', ref('Health')), '500': ERRORS['500'] } },
    },
    '/api/interpret': {
      post: {
        operationId: 'interpret',
        summary: 'Interpret one system: albedo posteriors, thermal share, mass effects.',
        requestBody: systemBody,
        responses: { '200': jsonResponse('The interpretation.', ref('Interpretation')), ...ERRORS },
      },
    },
    '/api/report': {
      post: {
        operationId: 'report',
        summary: 'Interpret one system and write the composition paragraph, its BibTeX and the figure.',
        parameters: queryParameters(reportQuerySchema),
        requestBody: systemBody,
        responses: { '200': jsonResponse('The report and the interpretation it was written from.', ref('Report')), ...ERRORS },
      },
    },
    '/api/bands': {
      get: { operationId: 'listBands', summary: 'The built-in bands.', responses: { '200': jsonResponse('Bands', { type: 'array', items: ref('Band') }), '500': ERRORS['500'] } },
    },
    '/api/catalog/entries': {
      get: {
        operationId: 'listEntries',
        summary: 'Catalog entries, optionally filtered.',
        parameters: queryParameters(entryQuerySchema),
        responses: { '200': jsonResponse('Entries in category, then id order.', ref('CatalogEntryList')), '400': ERRORS['400'], '500': ERRORS['500'] },
      },
      post: {
        operationId: 'addEntry',
        summary: 'Add a user entry.',
        requestBody: jsonBody(ref('CatalogEntryInput'), 'The entry; sources are keys or full records.'),
        responses: {
          '201': { ...jsonResponse('The entry as stored.', ref('CatalogEntry')), headers: { Location: { description: 'URL of the new entry.', schema: { type: 'string' } } } },
          '409': errorResponse('The id or a source key is taken.'),
          ...ERRORS,
        },
      },
    },
    '/api/catalog/entries/{id}': {
      parameters: [idParameter],
      get: { operationId: 'getEntry', summary: 'One entry.', responses: { '200': jsonResponse('The entry.', ref('CatalogEntry')), ...NOT_FOUND, '500': ERRORS['500'] } },
      patch: {
        operationId: 'updateEntry',
        summary: 'Change fields of a user entry.',
        requestBody: jsonBody(ref('CatalogEntryPatch'), 'The fields to change.'),
        responses: { '200': jsonResponse('The entry after the change.', ref('CatalogEntry')), ...FORBIDDEN, ...NOT_FOUND, '409': errorResponse('A new source key is taken with other details.'), ...ERRORS },
      },
      delete: {
        operationId: 'removeEntry',
        summary: 'Remove a user entry.',
        responses: { '200': jsonResponse('The entry that was removed.', ref('CatalogEntry')), ...FORBIDDEN, ...NOT_FOUND, '500': ERRORS['500'] },
      },
    },
    '/api/catalog/sources': {
      get: { operationId: 'listSources', summary: 'The bibliographic sources.', responses: { '200': jsonResponse('Sources in key order.', ref('SourceList')), '500': ERRORS['500'] } },
    },
    '/api/catalog/bibtex': {
      get: {
        operationId: 'sourcesBibtex',
        summary: 'The sources as a BibTeX file.',
        parameters: queryParameters(bibtexQuerySchema),
        responses: {
          '200': { description: 'A .bib file.', content: { 'application/x-bibtex': { schema: { type: 'string' } } } },
          '400': ERRORS['400'],
          '404': errorResponse('A key names no source.'),
          '500': ERRORS['500'],
        },
      },
    },
    '/api/demos': {
      get: { operationId: 'listDemos', summary: 'The invented demo systems.', responses: { '200': jsonResponse('Demo systems.', ref('DemoList')), '500': ERRORS['500'] } },
    },
    '/api/demos/{name}': {
      get: {
        operationId: 'getDemo',
        summary: 'One invented demo system as a system file.',
        parameters: [{ name: 'name', in: 'path', required: true, description: 'A name from GET /api/demos.', schema: { type: 'string' } }],
        responses: { '200': jsonResponse('The system file.', ref('SystemFile')), '404': errorResponse('No demo has this name.'), '500': ERRORS['500'] },
      },
    },
    '/api/openapi.json': {
      get: { operationId: 'openapi', summary: 'This document.', responses: { '200': jsonResponse('OpenAPI 3.1 document.', { type: 'object' }) } },
    },
  };
}

export function openApiDocument(): Record<string, unknown> {
  return {
    openapi: '3.1.0',
    info: {
      title: 'hesper HTTP API',
      version: HESPER_VERSION,
      description: 'Geometric and Bond albedo, thermal share and sourced composition statements from a measured optical eclipse depth or phase amplitude. Served on loopback by `hesper serve`; every error body is {"error": {"code", "message", "issues": [{"path", "message"}]}}.',
      license: { name: 'MIT', identifier: 'MIT' },
    },
    servers: [{ url: 'http://127.0.0.1:4173', description: 'hesper serve (default address)' }],
    paths: paths(),
    components: { schemas: componentSchemas() },
  };
}
