/** Likelihoods and simple draws for the measured signals of a system. */
import type { Dist } from '../io/distribution.ts';
import type { SystemInput } from '../io/system.ts';
import type { Likelihoods } from './grid.ts';
import { logLikelihoodOf, upperLimitSigma } from './likelihood.ts';
import type { Rng } from './random.ts';
import { drawOnce } from './draw.ts';

export function likelihoodsOf(s: SystemInput): Likelihoods {
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
    if (d) lik[key] = logLikelihoodOf(d);
  }
  return lik;
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
