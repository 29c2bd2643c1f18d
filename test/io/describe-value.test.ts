/**
 * The bounded describer of values in error messages: small values read as JSON, large
 * or deep ones as a cut preview of bounded length, and nothing overflows the stack.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { describeValue, MAX_DESCRIPTION } from '../../src/io/describe-value.ts';

describe('describeValue', () => {
  it('writes small values exactly as JSON.stringify does', () => {
    for (const v of ['NaN', 'abc', '', 0, 1.5, 1e308, null, true, [], {}, [1, 2], { value: 1, sigma: 2 }, { a: [1, { b: 'c' }] }]) {
      expect(describeValue(v)).toBe(JSON.stringify(v));
    }
  });

  it('names what JSON cannot write', () => {
    expect(describeValue(undefined)).toBe('nothing (missing)');
    expect(describeValue(Number.NaN)).toBe('NaN');
    expect(describeValue(Number.POSITIVE_INFINITY)).toBe('Infinity');
    expect(describeValue(-0)).toBe('-0');
  });

  it('cuts long strings, long arrays and many keys, saying how many there were', () => {
    expect(describeValue('x'.repeat(10_000_000))).toBe(`"${'x'.repeat(60)}"... (a string of 10000000 characters)`);
    expect(describeValue(new Array(1_000_000).fill(1))).toBe('[1,1,1,1,1,1,... (1000000 items)]');
    const many = Object.fromEntries(Array.from({ length: 100_000 }, (_, i) => [`k${i}`, i]));
    expect(describeValue(many)).toBe('{"k0":0,"k1":1,"k2":2,"k3":3,"k4":4,"k5":5,...}');
  });

  it('stops three levels down, however deep the value', () => {
    let deep: unknown = [];
    for (let i = 0; i < 200_000; i++) deep = [deep];
    expect(describeValue(deep)).toBe('[[[[... 1 item]]]]');
  });

  it('never exceeds its bound, for any JSON value', () => {
    fc.assert(
      fc.property(fc.jsonValue({ maxDepth: 8 }), (v) => {
        expect(describeValue(v).length).toBeLessThanOrEqual(MAX_DESCRIPTION + 3);
      }),
      { numRuns: 500, seed: 11 },
    );
  });
});
