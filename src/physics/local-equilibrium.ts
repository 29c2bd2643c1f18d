/**
 * A dayside in local equilibrium, blended toward uniform as the heat redistribution
 * eps rises:
 *   T(theta)^4 = T0^4 (1 - A_B) [(1 - eps) cos theta + eps / 4],
 * theta the angle from the substellar point. At eps = 0 every patch re-radiates what it
 * absorbs, T = T0 (1 - A_B)^(1/4) cos^(1/4) theta; the share eps is spread over the whole
 * sphere, so the nightside is uniform at T0 (1 - A_B)^(1/4) (eps/4)^(1/4). The map is
 * chosen so that its disk-integrated bolometric flux at full phase,
 * 2 int_0^1 T^4 mu dmu = T0^4 (1 - A_B) (2/3 - 5 eps/12), equals the dayside of Cowan &
 * Agol 2011 (ApJ 729, 54) at every eps, and its nightside equals theirs (derived): only
 * the distribution over the disk changes, which matters in the Wien tail of an optical
 * band, where the hot substellar region outshines a uniform disk of the same
 * bolometric flux.
 *
 * In a band, the full-phase flux of the map relative to a uniform disk at the Cowan &
 * Agol dayside temperature T_day is
 *   C(T_day, eps) = 2 int_0^1 F(T_day s(mu)) mu dmu / F(T_day),
 *   s(mu)^4 = [(1 - eps) mu + eps/4] / (2/3 - 5 eps/12),
 * at full phase the emission angle of a patch equals its angle from the substellar point
 * (mu = cos theta), and F is the band flux of a blackbody. C >= 1 (F is convex in T^4 in
 * the Wien tail), C = 1 at eps = 1. It is tabulated per band once on a grid of ln T_day
 * and eps and read by bilinear interpolation of ln C.
 */
import { requireInRange, requirePositive } from '../errors.ts';
import { type BandTable, tableLogFlux } from './band-table.ts';
import { gaussLegendreRule } from './integrate.ts';

/** Gauss-Legendre nodes on mu in [0, 1] for the disk integral (16: within 1e-4 of 64 nodes from 800 K up, see the test). */
const MU_NODES = 16;
/**
 * Table grid: ln T_day from 300 K to 8000 K in 100 steps (clamped outside: cooler daysides
 * emit nothing in an optical band, hotter ones are in the Rayleigh-Jeans side where C -> 1),
 * eps from 0 to 1 in 60 steps;
 * bilinear interpolation of ln C errs by at most 1e-3 relative from 800 K to 5000 K in
 * the built-in optical bands (test/physics/local-equilibrium.test.ts reports the worst case).
 */
export const LE_MIN_K = 300;
export const LE_MAX_K = 8000;
const LE_T_POINTS = 101;
const LE_EPS_POINTS = 61;

/** s(mu)^4 = [(1 - eps) mu + eps/4] / (2/3 - 5 eps/12): the local T^4 over T_day^4. */
export function localEquilibriumShape4(mu: number, redistribution: number): number {
  return ((1 - redistribution) * mu + redistribution / 4) / (2 / 3 - (5 * redistribution) / 12);
}

/** Local temperature of the map [K] at cos theta = mu, for dayside temperature T_day (Cowan & Agol 2011 form). */
export function localEquilibriumTemperatureK(daysideTempK: number, redistribution: number, mu: number): number {
  requirePositive('daysideTempK', daysideTempK);
  requireInRange('redistribution', redistribution, { min: 0, max: 1 });
  requireInRange('mu', mu, { min: 0, max: 1 });
  return daysideTempK * Math.pow(localEquilibriumShape4(mu, redistribution), 0.25);
}

/** C(T_day, eps) by direct quadrature on a band-flux table (see the file comment). */
export function localEquilibriumFluxFactor(table: BandTable, daysideTempK: number, redistribution: number): number {
  requirePositive('daysideTempK', daysideTempK);
  requireInRange('redistribution', redistribution, { min: 0, max: 1 });
  const { nodes, weights } = gaussLegendreRule(MU_NODES);
  const lnDay = Math.log(daysideTempK);
  const lnRef = tableLogFlux(table, lnDay);
  let sum = 0;
  for (let k = 0; k < nodes.length; k++) {
    const mu = 0.5 * (nodes[k]! + 1);
    const s4 = localEquilibriumShape4(mu, redistribution);
    if (s4 <= 0) continue;
    const lnT = lnDay + 0.25 * Math.log(s4);
    if (lnT < Math.log(table.minK)) continue; // a patch below 10 K emits nothing in an optical band
    sum += 0.5 * weights[k]! * mu * Math.exp(tableLogFlux(table, lnT) - lnRef);
  }
  return 2 * sum;
}

export interface LocalEquilibriumTable {
  readonly lnT0: number;
  readonly invStep: number;
  readonly epsPoints: number;
  /** ln C at [t * epsPoints + e]. */
  readonly lnFactor: Float64Array;
}

const cache = new WeakMap<BandTable, LocalEquilibriumTable>();

/** The table of ln C for a band (built once per band and weighting, about 5000 quadratures). */
export function localEquilibriumTable(table: BandTable): LocalEquilibriumTable {
  const hit = cache.get(table);
  if (hit) return hit;
  const lnT0 = Math.log(LE_MIN_K);
  const step = (Math.log(LE_MAX_K) - lnT0) / (LE_T_POINTS - 1);
  const lnFactor = new Float64Array(LE_T_POINTS * LE_EPS_POINTS);
  for (let t = 0; t < LE_T_POINTS; t++) {
    const tK = Math.exp(lnT0 + t * step);
    for (let e = 0; e < LE_EPS_POINTS; e++) {
      lnFactor[t * LE_EPS_POINTS + e] = Math.log(localEquilibriumFluxFactor(table, tK, e / (LE_EPS_POINTS - 1)));
    }
  }
  const out = { lnT0, invStep: 1 / step, epsPoints: LE_EPS_POINTS, lnFactor };
  cache.set(table, out);
  return out;
}

/** C at (ln T_day, eps) from the table (clamped to the table's temperature range). */
export function localEquilibriumFactorAt(t: LocalEquilibriumTable, lnT: number, redistribution: number): number {
  const tPoints = t.lnFactor.length / t.epsPoints;
  let x = (lnT - t.lnT0) * t.invStep;
  if (x < 0) x = 0;
  else if (x > tPoints - 1) x = tPoints - 1;
  let i = x | 0;
  if (i > tPoints - 2) i = tPoints - 2;
  const fx = x - i;
  const y = redistribution * (t.epsPoints - 1);
  let j = y | 0;
  if (j > t.epsPoints - 2) j = t.epsPoints - 2;
  const fy = y - j;
  const a = t.lnFactor[i * t.epsPoints + j]!;
  const b = t.lnFactor[i * t.epsPoints + j + 1]!;
  const c = t.lnFactor[(i + 1) * t.epsPoints + j]!;
  const d = t.lnFactor[(i + 1) * t.epsPoints + j + 1]!;
  return Math.exp((1 - fx) * ((1 - fy) * a + fy * b) + fx * ((1 - fy) * c + fy * d));
}
