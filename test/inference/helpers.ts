/** Loading demo-data systems for the inference tests. */
import { readFileSync } from 'node:fs';
import { parseSystem, type SystemInput } from '../../src/io/system.ts';
import { loadSystemFile } from '../../src/io/system-file.ts';

const root = new URL('../../demo-data/', import.meta.url).pathname;

export function loadDemo(relative: string): SystemInput {
  return loadSystemFile(relative, root);
}

/** The raw JSON of a demo-data file, for tests that change a field. */
export function demoJson(relative: string): any {
  return JSON.parse(readFileSync(`${root}${relative}`, 'utf8'));
}

export function parseJson(json: unknown): SystemInput {
  return parseSystem(json);
}
