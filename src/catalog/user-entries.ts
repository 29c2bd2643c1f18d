/**
 * Adding, changing and removing user entries. Curated rows (origin 'curated') are
 * refused with kind 'forbidden'; every change is one transaction.
 */
import type Database from 'better-sqlite3';
import { HesperError, type ErrorCode, type Issue } from '../errors.ts';
import {
  catalogEntryInputSchema,
  catalogEntryPatchSchema,
  type CatalogEntryParsed,
  type SourceRecordParsed,
} from './entry-schema.ts';
import { findEntry, findSource, requireEntry } from './read.ts';
import type { CatalogEntry, SourceRecord } from './types.ts';
import { deleteEntry, insertEntry, insertSource, normalizeSource, replaceLinks, replaceSpectrum, sameSource, updateEntry } from './write.ts';
import { formatPath, issuesFromZod } from './zod-issues.ts';

/** An issue with the error code it would raise on its own. */
export interface Problem extends Issue {
  code: ErrorCode;
}

/** One item of a batch: the raw JSON-like value and the path prefix its issues get. */
export interface BatchItem {
  raw: unknown;
  prefix: string;
}

export interface PreparedBatch {
  entries: CatalogEntryParsed[];
  /** Source records to insert (new keys only). */
  newSources: Omit<SourceRecord, 'origin'>[];
  problems: Problem[];
}

/**
 * Validates a batch of entries against the schema, each other and the database:
 * ids unused, cited keys known (or given as records in the batch), records with an
 * existing key identical to the stored one. Collects every problem; writes nothing.
 */
export function prepareBatch(db: Database.Database, items: readonly BatchItem[]): PreparedBatch {
  const problems: Problem[] = [];
  const entries: CatalogEntryParsed[] = [];
  const newSources = new Map<string, Omit<SourceRecord, 'origin'>>();
  const ids = new Map<string, string>();
  const parsed: { entry: CatalogEntryParsed; prefix: string }[] = [];
  for (const item of items) {
    const result = catalogEntryInputSchema.safeParse(item.raw);
    if (!result.success) {
      for (const i of issuesFromZod(result.error, item.prefix)) problems.push({ ...i, code: 'invalid-input' });
      continue;
    }
    parsed.push({ entry: result.data, prefix: item.prefix });
  }
  // Source records first, so an entry may cite a key another entry of the batch defines.
  for (const { entry, prefix } of parsed) {
    entry.sources.forEach((s, i) => {
      if (typeof s === 'string') return;
      const record = normalizeSource(s as SourceRecordParsed);
      const path = formatPath(prefix, ['sources', i]);
      const stored = findSource(db, record.key);
      const earlier = newSources.get(record.key);
      if (stored && !sameSource(normalizeSource({ ...stored }), record)) {
        problems.push({ path, code: 'duplicate-id', message: `source key ${record.key} already exists with other details; cite it by key or choose a new key`, value: record.key });
      } else if (earlier && !sameSource(earlier, record)) {
        problems.push({ path, code: 'duplicate-id', message: `source key ${record.key} is defined twice with different details`, value: record.key });
      } else if (!stored) newSources.set(record.key, record);
    });
  }
  for (const { entry, prefix } of parsed) {
    const idPath = formatPath(prefix, ['id']);
    if (findEntry(db, entry.id)) {
      problems.push({ path: idPath, code: 'duplicate-id', message: `an entry with id "${entry.id}" already exists`, value: entry.id });
    } else if (ids.has(entry.id)) {
      problems.push({ path: idPath, code: 'duplicate-id', message: `id "${entry.id}" is also used at ${ids.get(entry.id)}`, value: entry.id });
    }
    ids.set(entry.id, idPath);
    entry.sources.forEach((s, i) => {
      if (typeof s !== 'string' || newSources.has(s) || findSource(db, s)) return;
      problems.push({ path: formatPath(prefix, ['sources', i]), code: 'unknown-source', message: `no source has key "${s}"; cite an existing key or give the full record`, value: s });
    });
    entries.push(entry);
  }
  return { entries, newSources: [...newSources.values()], problems };
}

/** The error a list of problems raises: the most basic kind of problem decides the code. */
export function failure(problems: Problem[], what: string, code?: ErrorCode): HesperError {
  const issues: Issue[] = problems.map(({ code: _code, ...issue }) => issue);
  const chosen: ErrorCode =
    code ??
    (problems.some((p) => p.code === 'invalid-input') ? 'invalid-input' : problems.some((p) => p.code === 'unknown-source') ? 'unknown-source' : (problems[0]?.code ?? 'invalid-input'));
  const kind = chosen === 'duplicate-id' ? 'conflict' : 'input';
  const first = issues[0];
  const summary = issues.length === 1 && first ? `${first.path}: ${first.message}` : `${issues.length} problems`;
  return new HesperError(chosen, `${what}: ${summary}`, issues, kind);
}

/** Writes a validated batch (call inside a transaction). */
export function writeBatch(db: Database.Database, batch: PreparedBatch, now: string): void {
  for (const s of batch.newSources) insertSource(db, s, 'user', now);
  for (const e of batch.entries) {
    insertEntry(db, e, 'user', now);
    replaceLinks(db, e.id, e.sources.map((s) => (typeof s === 'string' ? s : s.key)));
    replaceSpectrum(db, e.id, e.spectrum);
  }
}

/** Adds user entries, all or none. */
export function addUserEntries(db: Database.Database, items: readonly BatchItem[], now: string): string[] {
  return db
    .transaction(() => {
      const batch = prepareBatch(db, items);
      if (batch.problems.length > 0) throw failure(batch.problems, items.length === 1 ? 'entry not added' : 'no entries added');
      writeBatch(db, batch, now);
      return batch.entries.map((e) => e.id);
    })
    .immediate();
}

function requireUserEntry(db: Database.Database, id: string, action: string): CatalogEntry {
  const entry = requireEntry(db, id);
  if (entry.origin !== 'user') {
    throw new HesperError(
      'curated-row',
      `entry "${id}" is curated (from the seed files) and cannot be ${action}; only user entries can`,
      [{ path: 'id', message: `curated entries cannot be ${action}`, value: id, allowed: 'ids of user entries' }],
      'forbidden',
    );
  }
  return entry;
}

export function removeUserEntry(db: Database.Database, id: string): CatalogEntry {
  return db
    .transaction(() => {
      const entry = requireUserEntry(db, id, 'removed');
      deleteEntry(db, id);
      return entry;
    })
    .immediate();
}

/** Applies a partial change to a user entry; the merged entry is validated as a whole. */
export function updateUserEntry(db: Database.Database, id: string, patch: unknown, now: string): void {
  const checked = catalogEntryPatchSchema.safeParse(patch);
  if (!checked.success) {
    throw failure(issuesFromZod(checked.error).map((i) => ({ ...i, code: 'invalid-input' as const })), `entry ${id} not changed`);
  }
  db.transaction(() => {
    const current = requireUserEntry(db, id, 'edited');
    const { origin: _origin, ...base } = current;
    const merged = { ...base, spectrum: current.spectrum ?? [], ...checked.data, id };
    const result = catalogEntryInputSchema.safeParse(merged);
    if (!result.success) {
      throw failure(issuesFromZod(result.error).map((i) => ({ ...i, code: 'invalid-input' as const })), `entry ${id} not changed`);
    }
    const entry = result.data;
    const newSources: Omit<SourceRecord, 'origin'>[] = [];
    const problems: Problem[] = [];
    entry.sources.forEach((s, i) => {
      const path = `sources[${i}]`;
      if (typeof s === 'string') {
        if (!findSource(db, s)) problems.push({ path, code: 'unknown-source', message: `no source has key "${s}"`, value: s });
        return;
      }
      const record = normalizeSource(s);
      const stored = findSource(db, record.key);
      if (!stored) newSources.push(record);
      else if (!sameSource(normalizeSource({ ...stored }), record)) {
        problems.push({ path, code: 'duplicate-id', message: `source key ${record.key} already exists with other details`, value: record.key });
      }
    });
    if (problems.length > 0) throw failure(problems, `entry ${id} not changed`);
    for (const s of newSources) insertSource(db, s, 'user', now);
    updateEntry(db, entry, now);
    replaceLinks(db, id, entry.sources.map((s) => (typeof s === 'string' ? s : s.key)));
    replaceSpectrum(db, id, entry.spectrum);
  }).immediate();
}
