/**
 * The seed version: sha256 over the names and bytes of seeds/*.json. Stored in
 * catalog_meta after seeding, so opening an up-to-date database costs one hash of the
 * files and no validation. Loads no zod.
 */
import { createHash } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { HesperError } from '../errors.ts';

/** Bump when the meaning of seed files changes without their bytes changing. */
const SEED_FORMAT_VERSION = 'hesper-seeds-2';

/** The seed files of a folder, sorted by name. */
export function seedFiles(dir: string): string[] {
  let names: string[];
  try {
    names = readdirSync(dir);
  } catch (e) {
    throw new HesperError('bad-seed', `cannot read the seed folder ${dir}: ${(e as Error).message}`, [{ path: dir, message: 'folder unreadable' }], 'internal');
  }
  return names.filter((n) => n.endsWith('.json')).sort();
}

export function seedHash(dir: string): string {
  const h = createHash('sha256').update(SEED_FORMAT_VERSION);
  for (const name of seedFiles(dir)) h.update('\0').update(name).update('\0').update(readFileSync(path.join(dir, name)));
  return h.digest('hex');
}
