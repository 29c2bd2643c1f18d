/**
 * Direct integration of a blackbody over a band response R(lambda).
 *
 *   photon weighting: F = (1 / hc) * integral B_lambda(T) R(lambda) lambda dlambda   [photons s^-1 m^-2 sr^-1]
 *   energy weighting: F = integral B_lambda(T) R(lambda) dlambda                     [W m^-2 sr^-1]
 *
 * (Photon-counting band flux: STScI Synphot User's Guide ch. 6; Bessell & Murphy 2012,
 * PASP 124, 140. The constant 1/hc cancels in every ratio.) Both are computed in the variable x = hc / (lambda k T):
 *
 *   photon: F = 2 c T^3 / c2^3 * integral x^2 / (e^x - 1) R dx
 *   energy: F = 2 h c^2 T^4 / c2^4 * integral x^3 / (e^x - 1) R dx      (derived, c2 = hc/k)
 *
 * The Wien factor e^-x is factored out at the red edge of the band (x_s), so ln F is
 * exact even where F itself underflows (optical bands at 10 K), and the integral stops
 * 60 e-folds beyond the peak of the integrand (truncation below 1e-20 relative).
 * Each linear piece of R is split into panels of width <= min(1, x/4) in x, each
 * integrated with Gauss-Legendre.
 */
import { requirePositive } from '../errors.ts';
import { C2_M_K, C_M_PER_S, H_J_S } from './constants.ts';
import { gaussLegendreRule } from './integrate.ts';
import { requireWeighting, type Weighting } from './planck.ts';
import { supportIndices, type ResponseCurve } from './response-curve.ts';

/** e-folds of the Wien factor integrated beyond max(x_s, 3); e^-60 ~ 1e-26. */
const WINDOW_EFOLDS = 60;
const WIDE = gaussLegendreRule(10);
const NARROW = gaussLegendreRule(5);

const LN_2C = Math.log(2 * C_M_PER_S);
const LN_2HC2 = Math.log(2 * H_J_S * C_M_PER_S ** 2);
const LN_C2 = Math.log(C2_M_K);

export interface BandMoments {
  /** ln F_band(T) in the units above. */
  logFlux: number;
  /** d ln F_band / d ln T = band-weighted mean of x e^x / (e^x - 1). */
  logSlope: number;
}

/** ln F_band(T) and its logarithmic temperature derivative by direct integration (T > 0). */
export function bandMoments(curve: ResponseCurve, temperatureK: number, weighting: Weighting): BandMoments {
  requirePositive('temperatureK', temperatureK);
  requireWeighting('weighting', weighting);
  const power = weighting === 'photon' ? 2 : 3;
  const lnT = Math.log(temperatureK);
  const logPrefactor = weighting === 'photon' ? LN_2C + 3 * lnT - 3 * LN_C2 : LN_2HC2 + 4 * lnT - 4 * LN_C2;
  const { wavelengthM, weight } = curve;
  const redEdgeM = wavelengthM[supportIndices(weight).hi]!;
  const xs = C2_M_K / (redEdgeM * temperatureK);
  const xCut = Math.max(xs, 3) + WINDOW_EFOLDS;
  let integral = 0;
  let slopeIntegral = 0;
  // Red to blue: x increases.
  for (let i = weight.length - 2; i >= 0; i--) {
    const wa = weight[i]!;
    const wb = weight[i + 1]!;
    if (wa === 0 && wb === 0) continue;
    const la = wavelengthM[i]!;
    const lb = wavelengthM[i + 1]!;
    const xLo = C2_M_K / (lb * temperatureK);
    if (xLo >= xCut) break;
    const xHi = Math.min(C2_M_K / (la * temperatureK), xCut);
    const dwdl = (wb - wa) / (lb - la);
    let x0 = xLo;
    while (x0 < xHi) {
      let h = Math.min(1, 0.25 * x0);
      const last = xHi - x0 <= 1.25 * h; // no sliver panel at the end
      if (last) h = xHi - x0;
      const rule = h > 0.1 ? WIDE : NARROW;
      const mid = x0 + h / 2;
      const half = h / 2;
      let s = 0;
      let sSlope = 0;
      for (let k = 0; k < rule.nodes.length; k++) {
        const x = mid + half * rule.nodes[k]!;
        const lambda = C2_M_K / (x * temperatureK);
        const r = wa + dwdl * (lambda - la);
        const oneMinusExp = -Math.expm1(-x);
        const f = (x ** power * Math.exp(xs - x) * r) / oneMinusExp;
        const wk = rule.weights[k]!;
        s += wk * f;
        sSlope += wk * f * (x / oneMinusExp);
      }
      integral += s * half;
      slopeIntegral += sSlope * half;
      if (last) break;
      x0 += h;
    }
  }
  return { logFlux: logPrefactor - xs + Math.log(integral), logSlope: slopeIntegral / integral };
}
