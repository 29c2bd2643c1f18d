/**
 * Seeded random numbers for the Monte Carlo (the generator is a
 * parameter, never global). Built on pure-rand's xoroshiro128+; doubles use 53 bits.
 */
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';

export interface Rng {
  /** Uniform in [0, 1). */
  uniform(): number;
  /** Standard normal. */
  normal(): number;
}

/** A seeded generator; the same seed gives the same sequence on every machine. */
export function createRng(seed: number): Rng {
  const gen = xoroshiro128plus(mixSeed(seed));
  // Small seeds give correlated first outputs in xoroshiro128+; discard a few.
  for (let i = 0; i < 8; i++) gen.next();
  let spare: number | undefined;
  const uniform = (): number => uniformFloat64(gen);
  return {
    uniform,
    normal(): number {
      if (spare !== undefined) {
        const s = spare;
        spare = undefined;
        return s;
      }
      // Marsaglia polar method (Marsaglia & Bray 1964, SIAM Review 6, 260).
      let u: number;
      let v: number;
      let s: number;
      do {
        u = 2 * uniform() - 1;
        v = 2 * uniform() - 1;
        s = u * u + v * v;
      } while (s >= 1 || s === 0);
      const f = Math.sqrt((-2 * Math.log(s)) / s);
      spare = v * f;
      return u * f;
    },
  };
}

/** A 32-bit avalanche of the seed (the finaliser of MurmurHash3, Appleby 2008; from memory). */
function mixSeed(seed: number): number {
  let h = seed | 0;
  h = Math.imul(h ^ (h >>> 16), 0x85ebca6b);
  h = Math.imul(h ^ (h >>> 13), 0xc2b2ae35);
  return (h ^ (h >>> 16)) | 0;
}
