/** Posterior summaries: median, 68 % and 95 % central intervals, and the 95th percentile. */

export interface Summary {
  median: number;
  lower68: number;
  upper68: number;
  lower95: number;
  upper95: number;
  upperLimit95: number;
}

/** Quantile of sorted values with linear interpolation (Hyndman & Fan 1996 type 7). */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0) return NaN;
  const x = p * (n - 1);
  const i = Math.floor(x);
  const f = x - i;
  const a = sorted[i]!;
  return i + 1 < n ? a + f * (sorted[i + 1]! - a) : a;
}

/** Rounds to `digits` significant figures so that JSON output stays readable and stable. */
export function roundSig(x: number, digits = 6): number {
  if (!Number.isFinite(x) || x === 0) return x;
  return Number(x.toPrecision(digits));
}

export function summarize(values: ArrayLike<number>): Summary {
  const s = Float64Array.from(values).sort();
  const q = (p: number) => roundSig(quantileSorted(s, p));
  return {
    median: q(0.5),
    lower68: q(0.15865525393145707), // Phi(-1), the 1-sigma lower quantile (common practice: "16 %")
    upper68: q(0.8413447460685429),
    lower95: q(0.025),
    upper95: q(0.975),
    upperLimit95: q(0.95),
  };
}

/** Monte Carlo error of a median from n effective draws: 1.2533 sigma / sqrt(n) (Kendall & Stuart, from memory). */
export function medianStandardError(s: Summary, effectiveN: number): number {
  const sigma = (s.upper68 - s.lower68) / 2;
  return (Math.sqrt(Math.PI / 2) * sigma) / Math.sqrt(Math.max(1, effectiveN));
}
