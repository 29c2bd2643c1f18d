/**
 * First-order longitudinal brightness map from the first harmonics of a phase curve
 * (the sinusoidal map of Cowan & Agol 2008, ApJ 678, L129, for an edge-on orbit).
 *
 * Derivation (ours, following their edge-on kernel). Let the planet be tidally locked
 * with a brightness map J(lambda) depending on longitude only, lambda measured from the
 * substellar point, positive eastward (the direction of rotation). On an edge-on orbit
 * the sub-observer longitude at orbital phase phi (0 at transit) is
 *   lambda_obs = pi - 2 pi phi
 * (0 at eclipse; before eclipse we look at the eastern hemisphere, so an eastward hot
 * spot is seen before eclipse). With uniform-disk (Lambertian) emission the disk-
 * integrated flux is, up to a constant that the latitude integral absorbs,
 *   F(lambda_obs) = integral J(lambda) max(cos(lambda - lambda_obs), 0) dlambda.
 * For the first-order map J = J0 + J1 cos(lambda - lambda0):
 *   integral_{-pi/2}^{pi/2} cos u du = 2 and
 *   integral_{-pi/2}^{pi/2} cos(u + lambda_obs - lambda0) cos u du = (pi/2) cos(lambda_obs - lambda0),
 * so F = 2 J0 + (pi/2) J1 cos(lambda_obs - lambda0) = 2 J0 - (pi/2) J1 cos(2 pi phi + lambda0).
 * A phase curve written with its first harmonics as
 *   F_p(phi) = Fbar - a1 cos(2 pi phi) + b1 sin(2 pi phi) = Fbar - R cos(2 pi phi + delta),
 *   R = sqrt(a1^2 + b1^2), delta = atan2(b1, a1),
 * therefore gives
 *   lambda0 = delta (the hot-spot longitude equals the phase offset at first order),
 *   J0 = Fbar / 2,  J1 = 2 R / pi.
 * We express the map as M(lambda) = 2 J(lambda), the flux a uniform planet of that local
 * brightness would give (same ppm unit as the phase curve):
 *   M(lambda) = Fbar + (4 R / pi) cos(lambda - lambda0),
 *   M_max = Fbar + 4R/pi (at lambda0), M_min = Fbar - 4R/pi (at lambda0 + 180 deg),
 * and the day-night contrast as (M_max - M_min) / M_max = (8R/pi) / (Fbar + 4R/pi),
 * 0 for a uniform planet and 1 when the coldest longitude is dark (our definition).
 * A contrast above 1 means M_min < 0: the first-order map is then unphysical and a
 * higher-order map or a different model is needed.
 *
 * Applied to an optical phase curve this treats the reflected and emitted light alike;
 * for reflected light the kernel also carries the illumination, so the map is an
 * effective one. Errors are propagated to first order with the covariance of
 * (a1, b1, Fbar).
 */
import { requireFinite } from '../errors.ts';
import type { ValueSigma } from './types.ts';

export interface HarmonicInput {
  /** a1: coefficient of -cos(2 pi phi) in the planet's flux [ppm] (positive: brighter at eclipse). */
  cosinePpm: number;
  /** b1: coefficient of +sin(2 pi phi) in the planet's flux [ppm] (positive: eastward). */
  sinePpm: number;
  /** Fbar: orbit-mean planet flux [ppm], or null when it is not measured (no eclipse). */
  meanFluxPpm: number | null;
  /** Covariance of (a1, b1, Fbar) [ppm^2], 3 x 3 (2 x 2 when meanFluxPpm is null). */
  covariance: number[][];
}

export interface LongitudinalMap {
  /** Longitude of the brightest point [deg], positive east of the substellar point, in (-180, 180]. */
  hotspotLongitudeDeg: ValueSigma;
  /** (M_max - M_min) / M_max, null without the mean flux. */
  dayNightContrast: ValueSigma | null;
  /** Map at its brightest and darkest longitude, as uniform-planet flux [ppm]. */
  maxBrightnessPpm: ValueSigma | null;
  minBrightnessPpm: ValueSigma | null;
  /** False when M_min < 0 by more than one sigma (the first-order map is unphysical). */
  physical: boolean;
}

const RAD_TO_DEG = 180 / Math.PI;

function propagate(grad: number[], cov: number[][]): number {
  let v = 0;
  for (let i = 0; i < grad.length; i++) for (let j = 0; j < grad.length; j++) v += grad[i]! * grad[j]! * (cov[i]?.[j] ?? 0);
  return Math.sqrt(Math.max(v, 0));
}

export function longitudinalMap(input: HarmonicInput): LongitudinalMap {
  const a1 = requireFinite('cosinePpm', input.cosinePpm);
  const b1 = requireFinite('sinePpm', input.sinePpm);
  const r2 = a1 * a1 + b1 * b1;
  const r = Math.sqrt(r2);
  const delta = Math.atan2(b1, a1);
  // d delta / d a1 = -b1 / R^2, d delta / d b1 = a1 / R^2 (undefined at R = 0: no variation, no spot).
  const gDelta = r2 > 0 ? [-b1 / r2, a1 / r2, 0] : [0, 0, 0];
  const hotspotLongitudeDeg = {
    value: delta * RAD_TO_DEG,
    sigma: r2 > 0 ? propagate(gDelta, input.covariance) * RAD_TO_DEG : Number.POSITIVE_INFINITY,
  };
  if (input.meanFluxPpm === null) {
    return { hotspotLongitudeDeg, dayNightContrast: null, maxBrightnessPpm: null, minBrightnessPpm: null, physical: true };
  }
  const mean = requireFinite('meanFluxPpm', input.meanFluxPpm);
  const m = (4 / Math.PI) * r;
  // dm/da1 = (4/pi) a1/R, dm/db1 = (4/pi) b1/R.
  const gm = r > 0 ? [(4 / Math.PI) * (a1 / r), (4 / Math.PI) * (b1 / r)] : [4 / Math.PI, 0];
  const gMax = [gm[0]!, gm[1]!, 1];
  const gMin = [-gm[0]!, -gm[1]!, 1];
  const top = mean + m;
  const min = { value: mean - m, sigma: propagate(gMin, input.covariance) };
  // c = 2m / (Fbar + m): dc/dFbar = -2m/(Fbar+m)^2, dc/dm = 2 Fbar/(Fbar+m)^2.
  const dcdm = (2 * mean) / (top * top);
  const gC = [dcdm * gm[0]!, dcdm * gm[1]!, (-2 * m) / (top * top)];
  return {
    hotspotLongitudeDeg,
    dayNightContrast: top !== 0 ? { value: (2 * m) / top, sigma: propagate(gC, input.covariance) } : null,
    maxBrightnessPpm: { value: top, sigma: propagate(gMax, input.covariance) },
    minBrightnessPpm: min,
    physical: min.value >= -min.sigma,
  };
}
