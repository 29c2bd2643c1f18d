/**
 * Gaussian kernel density estimate of measurement samples, tabulated once on a fine
 * grid so that evaluating it inside the posterior loop costs one interpolation.
 * Bandwidth by Silverman's rule of thumb, h = 0.9 min(sd, IQR/1.34) n^(-1/5)
 * (Silverman 1986, Density Estimation for Statistics and Data Analysis, eq. 3.31).
 */
const TABLE_POINTS = 1024;
const TAIL_BANDWIDTHS = 6;

export interface TabulatedDensity {
  lo: number;
  step: number;
  logDensity: Float64Array;
  bandwidth: number;
}

function quantileSorted(s: number[], p: number): number {
  const x = p * (s.length - 1);
  const i = Math.floor(x);
  const f = x - i;
  return s[i]! + f * ((s[Math.min(i + 1, s.length - 1)] ?? s[i]!) - s[i]!);
}

export function silvermanBandwidth(values: number[]): number {
  const n = values.length;
  const mean = values.reduce((a, b) => a + b, 0) / n;
  const sd = Math.sqrt(values.reduce((a, b) => a + (b - mean) ** 2, 0) / (n - 1));
  const s = [...values].sort((a, b) => a - b);
  const iqr = quantileSorted(s, 0.75) - quantileSorted(s, 0.25);
  const spread = iqr > 0 ? Math.min(sd, iqr / 1.34) : sd;
  const h = 0.9 * spread * n ** -0.2;
  return h > 0 ? h : Math.max(Math.abs(mean) * 1e-6, 1e-12);
}

export function tabulateKde(values: number[]): TabulatedDensity {
  const h = silvermanBandwidth(values);
  let min = Infinity;
  let max = -Infinity;
  for (const v of values) {
    if (v < min) min = v;
    if (v > max) max = v;
  }
  const lo = min - TAIL_BANDWIDTHS * h;
  const hi = max + TAIL_BANDWIDTHS * h;
  const step = (hi - lo) / (TABLE_POINTS - 1);
  const density = new Float64Array(TABLE_POINTS);
  // Bin the samples onto the table, then convolve with the kernel: O(points x kernel width).
  const counts = new Float64Array(TABLE_POINTS);
  for (const v of values) counts[Math.round((v - lo) / step)]! += 1;
  const reach = Math.ceil((TAIL_BANDWIDTHS * h) / step);
  const kernel = new Float64Array(2 * reach + 1);
  for (let k = -reach; k <= reach; k++) kernel[k + reach] = Math.exp(-0.5 * ((k * step) / h) ** 2);
  for (let i = 0; i < TABLE_POINTS; i++) {
    const c = counts[i]!;
    if (c === 0) continue;
    for (let k = -reach; k <= reach; k++) {
      const j = i + k;
      if (j >= 0 && j < TABLE_POINTS) density[j]! += c * kernel[k + reach]!;
    }
  }
  const norm = 1 / (values.length * h * Math.sqrt(2 * Math.PI));
  const logDensity = new Float64Array(TABLE_POINTS);
  for (let i = 0; i < TABLE_POINTS; i++) logDensity[i] = density[i]! > 0 ? Math.log(density[i]! * norm) : -Infinity;
  return { lo, step, logDensity, bandwidth: h };
}

/** log density at x (linear interpolation of the log table; -Infinity outside). */
export function kdeLogDensity(t: TabulatedDensity, x: number): number {
  const u = (x - t.lo) / t.step;
  if (!(u >= 0) || u > t.logDensity.length - 1) return -Infinity;
  const i = Math.min(Math.floor(u), t.logDensity.length - 2);
  const f = u - i;
  const a = t.logDensity[i]!;
  const b = t.logDensity[i + 1]!;
  if (a === -Infinity || b === -Infinity) return f < 0.5 ? a : b;
  return a + f * (b - a);
}
