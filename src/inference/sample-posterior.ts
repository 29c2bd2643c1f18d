/**
 * Posterior draws from the grid: a nuisance draw by its evidence weight, a grid cell
 * by its trapezoid mass, and a position inside the cell from the linear interpolant
 * of the node likelihoods, so the albedo posterior is continuous, not stepped.
 * Derived quantities are then computed at the drawn albedo.
 */
import type { GridResult } from './grid.ts';
import type { Rng } from './random.ts';
import { localEquilibriumFactorAt } from '../physics/local-equilibrium.ts';
import { type ModelSettings, dayMapTable, thermalRatio } from './signal-model.ts';

export interface PosteriorDraws {
  count: number;
  drawIndex: Int32Array;
  geometricAlbedo: Float64Array;
  bondAlbedo: Float64Array;
  daysideTemperatureK: Float64Array;
  equilibriumTemperatureK: Float64Array;
  thermalDepthPpm: Float64Array;
  reflectedDepthPpm: Float64Array;
  thermalFraction: Float64Array;
}

/** Index i with probability cumulative[i] - cumulative[i-1] (binary search). */
export function pickCumulative(cumulative: Float64Array, u: number): number {
  return pickCumulativeIn(cumulative, 0, cumulative.length, u);
}

/** pickCumulative on cumulative[offset .. offset + length), returning an index into that range. */
export function pickCumulativeIn(cumulative: Float64Array, offset: number, length: number, u: number): number {
  let lo = 0;
  let hi = length - 1;
  const target = u * cumulative[offset + hi]!;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (cumulative[offset + mid]! > target) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

/** Position t in [0, 1] from the density proportional to a + (b - a) t. */
export function linearCellPosition(a: number, b: number, u: number): number {
  const d = b - a;
  if (Math.abs(d) < 1e-12 * Math.max(a, b, 1e-300)) return u;
  // CDF(t) = (a t + d t^2 / 2) / ((a + b) / 2) = u  ->  d/2 t^2 + a t - u (a + b)/2 = 0
  const t = (-a + Math.sqrt(a * a + d * u * (a + b))) / d;
  return Math.min(1, Math.max(0, t));
}

export function samplePosterior(grid: GridResult, settings: ModelSettings, rng: Rng, count: number): PosteriorDraws {
  const { nodes, rows, weights } = grid;
  const cum = new Float64Array(weights.length);
  let s = 0;
  for (let i = 0; i < weights.length; i++) cum[i] = s += weights[i]!;
  const out: PosteriorDraws = {
    count,
    drawIndex: new Int32Array(count),
    geometricAlbedo: new Float64Array(count),
    bondAlbedo: new Float64Array(count),
    daysideTemperatureK: new Float64Array(count),
    equilibriumTemperatureK: new Float64Array(count),
    thermalDepthPpm: new Float64Array(count),
    reflectedDepthPpm: new Float64Array(count),
    thermalFraction: new Float64Array(count),
  };
  const dayMap = dayMapTable(settings);
  for (let k = 0; k < count; k++) {
    const i = pickCumulative(cum, rng.uniform());
    const base = i * nodes;
    const cell = pickCumulativeIn(grid.cells, i * (nodes - 1), nodes - 1, rng.uniform());
    const t = linearCellPosition(rows[base + cell]!, rows[base + cell + 1]!, rng.uniform());
    const th = grid.draws[i]!;
    const dm = grid.models[i]!;
    const bond = (cell + t) / (nodes - 1);
    const ag = bond / th.phaseIntegral;
    const factor = Math.pow(1 - bond, 0.25);
    const tDay = dm.dayZeroK * factor;
    const uniform = 1e6 * thermalRatio(dm, settings, tDay);
    const thermal = dayMap && uniform > 0 ? uniform * localEquilibriumFactorAt(dayMap, Math.log(tDay), th.redistribution) : uniform;
    const reflected = 1e6 * ag * dm.reflectedDepthPerAg;
    out.drawIndex[k] = i;
    out.geometricAlbedo[k] = ag;
    out.bondAlbedo[k] = bond;
    out.daysideTemperatureK[k] = tDay;
    out.equilibriumTemperatureK[k] = dm.equilibriumZeroK * factor;
    out.thermalDepthPpm[k] = thermal;
    out.reflectedDepthPpm[k] = reflected;
    out.thermalFraction[k] = thermal + reflected > 0 ? thermal / (thermal + reflected) : 0;
  }
  return out;
}
