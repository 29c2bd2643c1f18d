/** Likelihoods and simple draws for the measured signals of a system. */
import type { Dist } from '../io/distribution.ts';
import type { SystemInput } from '../io/system.ts';
import type { Likelihoods } from './grid.ts';
import { type LogLikelihood, logLikelihoodOf, upperLimitSigma } from './likelihood.ts';
import type { Rng } from './random.ts';
import { drawOnce } from './draw.ts';

/**
 * Fractional model uncertainty of the predicted ellipsoidal and beaming amplitudes.
 * 25 %: the scatter of measured about predicted ellipsoidal amplitudes of TESS and
 * Kepler hot Jupiters is of this order (Shporer et al. 2019, AJ 157, 178; Wong et al.
 * 2020, AJ 160, 155; Esteves et al. 2015, ApJ 804, 150); the value itself is common
 * practice, not a fit.
 */
export const MASS_MODEL_FRACTION = 0.25;

/** Central predicted mass-effect amplitudes [ppm], whose model uncertainty widens the mass-effect likelihoods. */
export interface MassPredictionScale {
  ellipsoidalPpm: number;
  beamingPpm: number;
}

/** A Gaussian likelihood of a measured mass-effect amplitude, its width widened by the model uncertainty of the prediction. */
function massLikelihood(d: Dist, predictedPpm: number | undefined, fraction: number): LogLikelihood {
  if (predictedPpm === undefined || !(predictedPpm > 0) || fraction === 0) return logLikelihoodOf(d);
  const { centre, width } = centreAndWidth(d);
  const total = Math.hypot(width, fraction * predictedPpm);
  return logLikelihoodOf({ kind: 'normal', mean: centre, sigma: total });
}

export function likelihoodsOf(s: SystemInput, massScale?: MassPredictionScale, massFraction = MASS_MODEL_FRACTION): Likelihoods {
  const lik: Likelihoods = {};
  const m = s.measurements;
  const rho = m.depthAmplitudeCorrelation;
  const depth = m.eclipseDepthPpm;
  const amplitude = m.phaseAmplitudePpm;
  const correlated = rho !== undefined && depth?.kind === 'normal' && amplitude?.kind === 'normal';
  if (correlated) {
    // Inverse of [[sd^2, rho sd sa], [rho sd sa, sa^2]] (common practice).
    const det = depth.sigma ** 2 * amplitude.sigma ** 2 * (1 - rho * rho);
    lik.depthAmplitude = {
      depthPpm: depth.mean,
      amplitudePpm: amplitude.mean,
      inverse: [amplitude.sigma ** 2 / det, (-rho * depth.sigma * amplitude.sigma) / det, depth.sigma ** 2 / det],
    };
  }
  for (const key of ['eclipseDepthPpm', 'phaseAmplitudePpm', 'nightsideFluxPpm', 'daysideTemperatureK', 'ellipsoidalAmplitudePpm', 'beamingAmplitudePpm'] as const) {
    if (correlated && (key === 'eclipseDepthPpm' || key === 'phaseAmplitudePpm')) continue;
    const d = m[key];
    if (!d) continue;
    if (key === 'ellipsoidalAmplitudePpm') lik[key] = massLikelihood(d, massScale?.ellipsoidalPpm, massFraction);
    else if (key === 'beamingAmplitudePpm') lik[key] = massLikelihood(d, massScale?.beamingPpm, massFraction);
    else lik[key] = logLikelihoodOf(d);
  }
  return lik;
}

/** The measured quantities that enter the likelihood, and whether all are Gaussian-like (so -2 ln L is a chi-square). */
export function measurementTerms(s: SystemInput): { count: number; chiSquareLike: boolean; names: string[] } {
  const m = s.measurements;
  const names: string[] = [];
  let chiSquareLike = true;
  for (const key of ['eclipseDepthPpm', 'phaseAmplitudePpm', 'nightsideFluxPpm', 'daysideTemperatureK', 'ellipsoidalAmplitudePpm', 'beamingAmplitudePpm'] as const) {
    const d = m[key];
    if (!d) continue;
    names.push(key);
    if (d.kind === 'samples' || d.kind === 'uniform') chiSquareLike = false;
  }
  return { count: names.length, chiSquareLike, names };
}

/** One draw of a measured value from its stated uncertainty (for the all-reflected albedo). */
export function drawMeasurement(d: Dist, rng: Rng): number {
  // An upper limit is read as a half-normal (see likelihood.ts); every other form draws as a prior does.
  return d.kind === 'upper-limit' ? Math.abs(rng.normal()) * upperLimitSigma(d.limit, d.confidence) : drawOnce(d, rng);
}

/** Central value and a one-sigma width of a measurement, for warnings. */
export function centreAndWidth(d: Dist): { centre: number; width: number } {
  switch (d.kind) {
    case 'fixed': return { centre: d.value, width: 0 };
    case 'normal': return { centre: d.mean, width: d.sigma };
    case 'split-normal': return { centre: d.mode, width: d.minus };
    case 'uniform': return { centre: 0.5 * (d.min + d.max), width: (d.max - d.min) / Math.sqrt(12) };
    case 'upper-limit': return { centre: 0, width: upperLimitSigma(d.limit, d.confidence) };
    case 'samples': {
      const n = d.values.length;
      const mean = d.values.reduce((a, b) => a + b, 0) / n;
      const sd = Math.sqrt(d.values.reduce((a, b) => a + (b - mean) ** 2, 0) / Math.max(1, n - 1));
      return { centre: mean, width: sd };
    }
  }
}
