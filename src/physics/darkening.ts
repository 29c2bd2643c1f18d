/**
 * Limb- and gravity-darkening coefficients of the star in a band, as functions of its
 * effective temperature, for the ellipsoidal amplitude (mass-effects.ts).
 *
 * Linear limb darkening u: the Eddington-Barbier relation I(mu) = S(tau = mu) in a gray
 * atmosphere in the Eddington approximation, T^4(tau) = (3/4) T_eff^4 (tau + 2/3)
 * (e.g. Mihalas 1978, Stellar Atmospheres, 2nd ed., ch. 3; from memory), with the band's
 * photon-weighted Planck flux as the source function, fitted by least squares with
 * I(mu)/I(1) = 1 - u (1 - mu) on mu in [0, 1]:
 *   u = 3 int_0^1 [1 - I(mu)/I(1)] (1 - mu) dmu.
 * Gravity darkening g = d ln I / d ln g_surf at fixed mu: with T_eff proportional to
 * g_surf^beta1, g = beta1 <d ln B / d ln T> over the band (derived), beta1 = 0.25 for
 * radiative envelopes (von Zeipel 1924, MNRAS 84, 665) and 0.08 for convective ones
 * (Lucy 1967, Z. Astrophys. 65, 89), taken linearly between 6500 and 8000 K where the
 * convective envelope thins (our choice; the transition follows Claret 1998, A&AS 131,
 * 395, from memory).
 * These are derived estimates, not the tabulated model-atmosphere coefficients of Claret
 * & Bloemen 2011 (A&A 529, A75) or Claret 2017 (A&A 600, A30): the gray atmosphere
 * darkens the limb more than line-blanketed models in the blue. The ellipsoidal
 * prediction carries a fractional model uncertainty that covers the difference
 * (inference/measurements.ts).
 */
import { requireInRange } from '../errors.ts';
import { bandFlux, bandLogSlope, type Band } from './bandpass.ts';
import { gaussLegendreRule } from './integrate.ts';

/** Gravity-darkening exponents beta1 (T_eff proportional to g^beta1): von Zeipel 1924 (radiative), Lucy 1967 (convective). */
export const BETA_RADIATIVE = 0.25;
export const BETA_CONVECTIVE = 0.08;
/** The convective-to-radiative transition [K] (our choice, see the file comment). */
export const TRANSITION_K: readonly [number, number] = [6500, 8000];

const MU_NODES = 16;

/** beta1 at T_eff: convective below 6500 K, radiative above 8000 K, linear between. */
export function gravityDarkeningExponent(teffK: number): number {
  const [lo, hi] = TRANSITION_K;
  if (teffK <= lo) return BETA_CONVECTIVE;
  if (teffK >= hi) return BETA_RADIATIVE;
  return BETA_CONVECTIVE + ((teffK - lo) / (hi - lo)) * (BETA_RADIATIVE - BETA_CONVECTIVE);
}

/** Linear limb-darkening coefficient u of a gray Eddington atmosphere in the band (see the file comment). */
export function limbDarkeningU(band: Band, teffK: number): number {
  requireInRange('teffK', teffK, { min: 1500, max: 20000 });
  const { nodes, weights } = gaussLegendreRule(MU_NODES);
  const t = (tau: number) => teffK * Math.pow(0.75 * (tau + 2 / 3), 0.25);
  const centre = bandFlux(band, t(1), 'photon');
  let s = 0;
  for (let k = 0; k < nodes.length; k++) {
    const mu = 0.5 * (nodes[k]! + 1);
    s += 0.5 * weights[k]! * (1 - bandFlux(band, t(mu), 'photon') / centre) * (1 - mu);
  }
  return Math.min(1, Math.max(0, 3 * s));
}

/** Gravity-darkening coefficient g = beta1 <d ln B / d ln T> in the band, for the star's photon spectrum. */
export function gravityDarkeningG(band: Band, teffK: number): number {
  requireInRange('teffK', teffK, { min: 1500, max: 20000 });
  return gravityDarkeningExponent(teffK) * bandLogSlope(band, teffK, 'photon');
}

/** u and g tabulated per band on a T_eff grid (100 K steps, 1500-20000 K) and interpolated linearly: the grid evaluates them per draw. */
const GRID_MIN_K = 1500;
const GRID_STEP_K = 100;
const GRID_POINTS = 186;
const tables = new WeakMap<Band, { u: Float64Array; g: Float64Array }>();

function tableOf(band: Band): { u: Float64Array; g: Float64Array } {
  const hit = tables.get(band);
  if (hit) return hit;
  const u = new Float64Array(GRID_POINTS);
  const g = new Float64Array(GRID_POINTS);
  for (let k = 0; k < GRID_POINTS; k++) {
    const t = GRID_MIN_K + k * GRID_STEP_K;
    u[k] = limbDarkeningU(band, t);
    g[k] = gravityDarkeningG(band, t);
  }
  const out = { u, g };
  tables.set(band, out);
  return out;
}

/** (u, g) at T_eff from the band's table (clamped to 1500-20000 K). */
export function darkeningCoefficients(band: Band, teffK: number): { u: number; g: number } {
  const t = tableOf(band);
  let x = (teffK - GRID_MIN_K) / GRID_STEP_K;
  if (!(x > 0)) x = 0;
  if (x > GRID_POINTS - 1) x = GRID_POINTS - 1;
  let i = Math.floor(x);
  if (i > GRID_POINTS - 2) i = GRID_POINTS - 2;
  const f = x - i;
  return { u: t.u[i]! + f * (t.u[i + 1]! - t.u[i]!), g: t.g[i]! + f * (t.g[i + 1]! - t.g[i]!) };
}
