/**
 * Loading the curated seeds (seeds/*.json). Every row is validated with zod; a bad row
 * fails with the file name, the row's index and id, and the field. The seed version is
 * the sha256 of the files, so an up-to-date database is not re-seeded on every open.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { z } from 'zod';
import { HesperError, type Issue } from '../errors.ts';
import { comparisonSeedSchema, type ComparisonSeedParsed } from './comparison-schema.ts';
import { seedEntrySchema, sourceRecordSchema, type SeedEntryParsed } from './entry-schema.ts';
import type { CondensateCurve, SourceRecord } from './types.ts';
import { CURATED_PROVENANCES } from './vocab.ts';
import { seedFiles, seedHash } from './seed-hash.ts';
import { normalizeSource } from './write.ts';
import { issuesFromZod } from './zod-issues.ts';

const finite = z.number();

export const condensateSeedSchema = z
  .object({
    species: z.string().trim().min(1).max(60),
    a: finite,
    b: finite,
    c: finite,
    d: finite.default(0),
    validPressureBar: z.tuple([finite.positive(), finite.positive()]),
    validMetallicityDex: z.tuple([finite, finite]),
    sourceKey: z.string().min(1),
    provenance: z.enum(CURATED_PROVENANCES),
    note: z.string().max(4000).default(''),
  })
  .strict()
  .superRefine((c, ctx) => {
    if (c.validPressureBar[0] >= c.validPressureBar[1]) ctx.addIssue({ code: 'custom', path: ['validPressureBar'], message: 'the pressure range must be [low, high] with low < high' });
    if (c.validMetallicityDex[0] >= c.validMetallicityDex[1]) ctx.addIssue({ code: 'custom', path: ['validMetallicityDex'], message: 'the metallicity range must be [low, high] with low < high' });
  });

const seedFileShape = z
  .object({
    description: z.string().optional(),
    sources: z.array(z.unknown()).default([]),
    entries: z.array(z.unknown()).default([]),
    condensates: z.array(z.unknown()).default([]),
    comparisons: z.array(z.unknown()).default([]),
  })
  .strict();

export interface SeedSet {
  hash: string;
  files: string[];
  sources: Omit<SourceRecord, 'origin'>[];
  entries: SeedEntryParsed[];
  condensates: CondensateCurve[];
  comparisons: ComparisonSeedParsed[];
}

function rowLabel(file: string, list: string, index: number, row: unknown, idField: string): string {
  const id = row !== null && typeof row === 'object' ? (row as Record<string, unknown>)[idField] : undefined;
  return `${file} ${list}[${index}]${typeof id === 'string' ? ` (${id})` : ''}`;
}

/** Reads and validates every seed file; throws one 'bad-seed' error listing every problem. */
export function loadSeeds(dir: string): SeedSet {
  const files = seedFiles(dir);
  if (files.length === 0) throw new HesperError('bad-seed', `no seed files (*.json) in ${dir}`, [{ path: dir, message: 'no seed files' }], 'internal');
  const hash = seedHash(dir);
  const issues: Issue[] = [];
  const sources: Omit<SourceRecord, 'origin'>[] = [];
  const entries: SeedEntryParsed[] = [];
  const condensates: CondensateCurve[] = [];
  const comparisons: ComparisonSeedParsed[] = [];
  const where = new Map<string, string>();
  const claim = (kind: string, id: string, label: string, field: string) => {
    const k = `${kind}:${id}`;
    const first = where.get(k);
    if (first) issues.push({ path: `${label}.${field}`, message: `${kind} "${id}" is already defined at ${first}`, value: id });
    else where.set(k, label);
  };
  for (const file of files) {
    let json: unknown;
    try {
      json = JSON.parse(readFileSync(path.join(dir, file), 'utf8'));
    } catch (e) {
      issues.push({ path: file, message: `not valid JSON: ${(e as Error).message}` });
      continue;
    }
    const shape = seedFileShape.safeParse(json);
    if (!shape.success) {
      issues.push(...issuesFromZod(shape.error, file));
      continue;
    }
    shape.data.sources.forEach((row, i) => {
      const label = rowLabel(file, 'sources', i, row, 'key');
      const r = sourceRecordSchema.safeParse(row);
      if (!r.success) return void issues.push(...issuesFromZod(r.error, label));
      claim('source', r.data.key, label, 'key');
      sources.push(normalizeSource(r.data));
    });
    shape.data.entries.forEach((row, i) => {
      const label = rowLabel(file, 'entries', i, row, 'id');
      const r = seedEntrySchema.safeParse(row);
      if (!r.success) return void issues.push(...issuesFromZod(r.error, label));
      claim('entry', r.data.id, label, 'id');
      entries.push(r.data);
      where.set(`row:${r.data.id}`, label);
    });
    shape.data.condensates.forEach((row, i) => {
      const label = rowLabel(file, 'condensates', i, row, 'species');
      const r = condensateSeedSchema.safeParse(row);
      if (!r.success) return void issues.push(...issuesFromZod(r.error, label));
      claim('condensate', r.data.species, label, 'species');
      condensates.push(r.data);
      where.set(`curve:${r.data.species}`, label);
    });
    shape.data.comparisons.forEach((row, i) => {
      const label = rowLabel(file, 'comparisons', i, row, 'id');
      const r = comparisonSeedSchema.safeParse(row);
      if (!r.success) return void issues.push(...issuesFromZod(r.error, label));
      claim('comparison', r.data.id, label, 'id');
      comparisons.push(r.data);
      where.set(`cmp:${r.data.id}`, label);
    });
  }
  const keys = new Set(sources.map((s) => s.key));
  for (const e of entries) {
    e.sources.forEach((k, i) => {
      if (!keys.has(k)) issues.push({ path: `${where.get(`row:${e.id}`)}.sources[${i}]`, message: `source key "${k}" is not defined in any seed file`, value: k });
    });
  }
  for (const c of comparisons) {
    c.sources.forEach((k, i) => {
      if (!keys.has(k)) issues.push({ path: `${where.get(`cmp:${c.id}`)}.sources[${i}]`, message: `source key "${k}" is not defined in any seed file`, value: k });
    });
  }
  for (const c of condensates) {
    if (!keys.has(c.sourceKey)) issues.push({ path: `${where.get(`curve:${c.species}`)}.sourceKey`, message: `source key "${c.sourceKey}" is not defined in any seed file`, value: c.sourceKey });
  }
  if (issues.length > 0) {
    const first = issues[0]!;
    const summary = issues.length === 1 ? `${first.path}: ${first.message}` : `${issues.length} problems, first ${first.path}: ${first.message}`;
    throw new HesperError('bad-seed', `seed files in ${dir} are invalid (${summary})`, issues, 'internal');
  }
  return { hash, files, sources, entries, condensates, comparisons };
}
