/**
 * The layers of DEVELOPERS.md import only downward: a file may import its own layer or
 * layers below it, never one above.
 */
import { readFileSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const src = new URL('../src/', import.meta.url).pathname;
const ORDER = ['errors.ts', 'physics', 'lightcurve', 'io', 'inference', 'catalog', 'interpret', 'report', 'index.ts', 'adapters', 'web'];
const ADAPTERS = new Set(['cli', 'api', 'batch']);

function layerOf(file: string): number {
  const top = path.relative(src, file).split(path.sep)[0]!;
  const name = ADAPTERS.has(top) ? 'adapters' : top;
  const i = ORDER.indexOf(name);
  if (i < 0) throw new Error(`${file} is in no layer`);
  return i;
}

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((f) => {
    const full = path.join(dir, f);
    return statSync(full).isDirectory() ? files(full) : /\.(ts|mjs)$/.test(f) ? [full] : [];
  });
}

describe('layers', () => {
  it('no file imports from a layer above its own', () => {
    const violations: string[] = [];
    for (const file of files(src)) {
      const text = readFileSync(file, 'utf8');
      for (const m of text.matchAll(/(?:from|import)\s*\(?\s*'(\.[^']+)'/g)) {
        const target = path.resolve(path.dirname(file), m[1]!);
        if (!target.startsWith(src)) continue;
        if (layerOf(target) > layerOf(file)) violations.push(`${path.relative(src, file)} imports ${path.relative(src, target)}`);
      }
    }
    expect(violations).toEqual([]);
  });
});
