/**
 * Draws from the canonical distributions of the system file (priors on nuisance
 * parameters). Normal and split-normal priors are truncated to the field's physical
 * range by redrawing, so a radius ratio of 0.1 +- 0.08 never yields k <= 0.
 */
import { HesperError, type RangeBounds } from '../errors.ts';
import type { Dist } from '../io/distribution.ts';
import type { Rng } from './random.ts';

const MAX_REDRAWS = 1000;

function inside(x: number, r: RangeBounds): boolean {
  if (r.min !== undefined && (r.minExclusive ? x <= r.min : x < r.min)) return false;
  if (r.max !== undefined && (r.maxExclusive ? x >= r.max : x > r.max)) return false;
  return true;
}

/** One draw from a distribution (no truncation); an upper limit has no draw as a prior. */
export function drawOnce(d: Dist, rng: Rng): number {
  switch (d.kind) {
    case 'fixed': return d.value;
    case 'normal': return d.mean + d.sigma * rng.normal();
    case 'split-normal': {
      // Split normal (two half-Gaussians joined at the mode; John 1982, Commun. Stat.
      // Theory Methods 11, 879, from memory): pick a side in proportion to its width.
      const upper = rng.uniform() < d.plus / (d.plus + d.minus);
      const z = Math.abs(rng.normal());
      return upper ? d.mode + d.plus * z : d.mode - d.minus * z;
    }
    case 'uniform': return d.min + (d.max - d.min) * rng.uniform();
    case 'upper-limit': throw new HesperError('internal', 'an upper limit cannot be used as a prior', [], 'internal');
    case 'samples': return d.values[Math.floor(rng.uniform() * d.values.length)]!;
  }
}

/** One draw, truncated to `range`; `path` names the field if the prior has no mass there. */
export function drawTruncated(path: string, d: Dist, range: RangeBounds, rng: Rng): number {
  for (let i = 0; i < MAX_REDRAWS; i++) {
    const x = drawOnce(d, rng);
    if (inside(x, range)) return x;
  }
  throw new HesperError('out-of-range', `${path}: the prior puts almost no probability inside the allowed range`, [
    { path, message: `${MAX_REDRAWS} draws in a row fell outside the allowed range; the uncertainty is too wide for the value`, value: d },
  ]);
}
