/**
 * Property tests of the system-file reader: malformed and extreme bodies always give
 * a HesperError whose issues name a path, never another exception.
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { HesperError } from '../../src/errors.ts';
import { parseSystem } from '../../src/io/system.ts';

const valid = JSON.parse(readFileSync(new URL('../../demo-data/systems/corvina-b.json', import.meta.url), 'utf8'));

/** Every path (as key arrays) of a JSON value. */
function paths(v: unknown, prefix: string[] = []): string[][] {
  if (v === null || typeof v !== 'object') return [prefix];
  return [prefix, ...Object.entries(v as Record<string, unknown>).flatMap(([k, x]) => paths(x, [...prefix, k]))];
}
const allPaths = paths(valid).filter((p) => p.length > 0);

function deep(n: number): unknown {
  let v: unknown = 1;
  for (let i = 0; i < n; i++) v = { a: v };
  return v;
}

const hostile = fc.oneof(
  fc.constantFrom(NaN, Infinity, -Infinity, 1e308, -1e308, -0, 0, -1, 1e-320, 'NaN', 'Infinity', '1e308', '', null, true, [], {}),
  fc.string({ unit: 'grapheme', maxLength: 40 }),
  fc.double(),
  fc.integer(),
  fc.array(fc.double(), { maxLength: 50 }),
  fc.constant(new Array(30_000).fill(1)),
  fc.integer({ min: 10, max: 400 }).map(deep),
  fc.dictionary(fc.string({ maxLength: 8 }), fc.oneof(fc.double(), fc.string({ maxLength: 5 })), { maxKeys: 5 }),
  fc.record({ value: fc.double(), sigma: fc.double() }),
  fc.record({ min: fc.double(), max: fc.double(), unit: fc.constantFrom('au', 'K', 'kg', 'ppm', 'furlong', 'Rjup', '') }),
  fc.record({ upperLimit: fc.double(), confidence: fc.double() }),
);

const mutation = fc.record({
  path: fc.constantFrom(...allPaths),
  value: hostile,
  remove: fc.boolean(),
});

function apply(start: unknown, m: { path: string[]; value: unknown; remove: boolean }): unknown {
  const body = structuredClone(start);
  let node = body as Record<string, unknown>;
  for (const key of m.path.slice(0, -1)) {
    const next = node[key];
    if (next === null || typeof next !== 'object') return body; // an earlier mutation removed this branch
    node = next as Record<string, unknown>;
  }
  const last = m.path[m.path.length - 1]!;
  if (m.remove) delete node[last];
  else node[last] = m.value;
  return body;
}

function checkOutcome(body: unknown): void {
  try {
    parseSystem(body);
  } catch (e) {
    expect(e).toBeInstanceOf(HesperError);
    const err = e as HesperError;
    expect(err.kind).toBe('input');
    expect(err.issues.length).toBeGreaterThan(0);
    for (const issue of err.issues) {
      expect(typeof issue.path).toBe('string');
      expect(issue.path.length).toBeGreaterThan(0);
      expect(typeof issue.message).toBe('string');
    }
  }
}

describe('system file reader under hostile input', () => {
  it('one or two mutated fields: a HesperError naming the path, or a valid system', () => {
    fc.assert(fc.property(fc.array(mutation, { minLength: 1, maxLength: 2 }), (ms) => {
      let body: unknown = valid;
      for (const m of ms) body = apply(body, m);
      checkOutcome(body);
    }), { numRuns: 1000, seed: 20261201 });
  });

  it('whole bodies of any shape', () => {
    fc.assert(fc.property(fc.oneof(hostile, fc.jsonValue({ maxDepth: 6 })), (body) => checkOutcome(body)), { numRuns: 500, seed: 7 });
  });
});
