/**
 * zod schemas shared by the routes and the OpenAPI document: the error body of
 * the documented error body, posterior summaries, bands and the health answer. Each schema is
 * registered under a component name in `apiRegistry`, so the document is generated
 * from the very schemas the routes and tests use.
 */
import { z } from 'zod';

/** Component names of the OpenAPI document. */
export const apiRegistry = z.registry<{ id: string; description?: string }>();

function named<T extends z.ZodType>(id: string, schema: T, description?: string): T {
  apiRegistry.add(schema, description === undefined ? { id } : { id, description });
  return schema;
}

export const issueSchema = named(
  'Issue',
  z.object({
    path: z.string().describe('Dotted path of the offending field, e.g. "planet.radiusRatio.sigma", or "body" / a query parameter.'),
    message: z.string().describe('What is wrong and what is allowed.'),
    value: z.unknown().optional().describe('The offending value, when it is a scalar.'),
    allowed: z.string().optional().describe('The allowed range or set, in words.'),
  }),
  'One problem with the request, naming the field.',
);

export const errorBodySchema = named(
  'ErrorBody',
  z.object({
    error: z.object({
      code: z.string().describe('Machine code; every code with its meaning and fix is listed in ERROR_CODES (src/errors.ts).'),
      message: z.string(),
      issues: z.array(issueSchema),
    }),
  }),
  'The body of every 4xx and 5xx answer.',
);

export const summarySchema = named(
  'Summary',
  z.object({
    median: z.number(),
    lower68: z.number().describe('15.87th percentile.'),
    upper68: z.number().describe('84.13th percentile.'),
    lower95: z.number().describe('2.5th percentile.'),
    upper95: z.number().describe('97.5th percentile.'),
    upperLimit95: z.number().describe('95th percentile (one-sided upper limit).'),
  }),
  'A posterior summary: median, 68 % and 95 % central intervals and the 95 % upper limit.',
);

/** A summary that is null where a sensitivity corner has no posterior support (NaN in JSON). */
export const optionalSummarySchema = named(
  'SummaryOrNull',
  z.object({
    median: z.number().nullable(),
    lower68: z.number().nullable(),
    upper68: z.number().nullable(),
    lower95: z.number().nullable(),
    upper95: z.number().nullable(),
    upperLimit95: z.number().nullable(),
  }),
  'A posterior summary whose numbers are null where no draw reproduces the measurement.',
);

export const bandDescriptionSchema = named(
  'Band',
  z.object({
    id: z.string(),
    label: z.string(),
    kind: z.enum(['builtin', 'tophat', 'curve']),
    shape: z.enum(['top-hat', 'trapezoid', 'tabulated']),
    minNm: z.number(),
    maxNm: z.number(),
    halfMaxNm: z.tuple([z.number(), z.number()]).nullable(),
    approximate: z.boolean(),
    source: z.string(),
    status: z.enum(['checked', 'secondary', 'computed', 'memory', 'user-supplied']),
    note: z.string(),
  }),
  'A built-in band: coverage, shape, source and whether it is approximate.',
);

export const healthSchema = named(
  'Health',
  z.object({
    status: z.literal('ok'),
    version: z.string(),
    catalog: z.object({ entries: z.number().int(), userEntries: z.number().int(), sources: z.number().int() }),
  }),
  'The server answers and its catalog is open.',
);

export const demoListSchema = named(
  'DemoList',
  z.array(z.object({ name: z.string(), title: z.string(), note: z.string() })),
  'The invented demo systems the server can hand out.',
);
