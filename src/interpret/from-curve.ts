/**
 * From a light curve to the measurements of a system (the light-curve route): the
 * system supplies the geometry for the masks and the eclipse shape and the masses for
 * the predicted ellipsoidal and beaming signals; the decomposition's depth,
 * amplitude, offset and fitted mass-effect amplitudes then replace the system's
 * measurements, with the depth-amplitude correlation of the fit.
 */
import type { Dist } from '../io/distribution.ts';
import type { SystemInput } from '../io/system.ts';
import { MASS_MODEL_FRACTION } from '../inference/measurements.ts';
import { drawNuisance } from '../inference/nuisance.ts';
import { createRng } from '../inference/random.ts';
import { predictMassEffects } from '../inference/signal-model.ts';
import { starFactors } from '../inference/star-model.ts';
import type { Decomposition } from '../lightcurve/decompose.ts';
import type { EclipseGeometry, ValueSigma } from '../lightcurve/types.ts';

const PRIOR_DRAWS = 2000;

export interface SystemPrediction {
  geometry: EclipseGeometry;
  periodDays: number | undefined;
  ellipsoidalPpm?: ValueSigma;
  beamingPpm?: ValueSigma;
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

/** Mean and spread of the prior predictions, the spread widened by the prediction's fractional model uncertainty (MASS_MODEL_FRACTION). */
function meanSigma(values: number[]): ValueSigma {
  const n = values.length;
  const mean = values.reduce((a, b) => a + b, 0) / n;
  const sd = Math.sqrt(values.reduce((a, b) => a + (b - mean) ** 2, 0) / Math.max(1, n - 1));
  return { value: mean, sigma: Math.hypot(sd, MASS_MODEL_FRACTION * Math.abs(mean)) };
}

/** Geometry (medians of the prior draws) and predicted mass signals (mean, and spread including the model uncertainty) of a system. */
export function predictFromSystem(system: SystemInput, seed = system.assumptions.seed): SystemPrediction {
  const rng = createRng(seed);
  const draws = Array.from({ length: PRIOR_DRAWS }, () => drawNuisance(system, rng));
  const geometry: EclipseGeometry = {
    kind: 'disks',
    radiusRatio: median(draws.map((d) => d.radiusRatio)),
    scaledSemiMajorAxis: median(draws.map((d) => d.scaledSemiMajorAxis)),
    inclinationDeg: (median(draws.map((d) => d.inclinationRad)) * 180) / Math.PI,
  };
  const periods = draws.map((d) => d.periodS).filter((p): p is number => p !== undefined);
  const out: SystemPrediction = { geometry, periodDays: periods.length > 0 ? median(periods) / 86400 : undefined };
  const beaming = starFactors(system, system.band, 'photon')?.beamingFactor;
  const masses = draws.map((d) => predictMassEffects(d, system.band, beaming)).filter((m) => m !== undefined);
  if (masses.length > 0) {
    out.ellipsoidalPpm = meanSigma(masses.map((m) => m.ellipsoidalPpm));
    out.beamingPpm = meanSigma(masses.map((m) => m.beamingPpm));
  }
  return out;
}

const normal = (q: ValueSigma): Dist => ({ kind: 'normal', mean: q.value, sigma: q.sigma });

/** The system with its measurements replaced by those of the decomposition. */
export function withCurveMeasurements(system: SystemInput, d: Decomposition, curveLabel: string): SystemInput {
  const m: SystemInput['measurements'] = {};
  const used: string[] = [];
  const cov = d.covariance;
  if (d.eclipseDepthPpm) {
    m.eclipseDepthPpm = normal(d.eclipseDepthPpm);
    used.push('eclipse depth');
  }
  m.phaseAmplitudePpm = normal(d.phaseAmplitudePpm);
  used.push('phase amplitude');
  if (d.phaseOffsetDeg) {
    m.phaseOffsetDeg = normal(d.phaseOffsetDeg);
    used.push('phase offset');
  }
  m.ellipsoidalAmplitudePpm = normal(d.ellipsoidalAmplitudePpm);
  used.push('ellipsoidal amplitude');
  if (d.beamingAmplitudePpm && d.model.sineTerm === 'beaming') {
    m.beamingAmplitudePpm = normal(d.beamingAmplitudePpm);
    used.push('beaming amplitude');
  }
  const iD = cov.names.indexOf('eclipseDepthPpm');
  const iA = cov.names.indexOf('phaseAmplitudePpm');
  let rhoNote = '';
  if (iD >= 0 && iA >= 0) {
    const c = cov.matrix[iD]![iA]! / Math.sqrt(cov.matrix[iD]![iD]! * cov.matrix[iA]![iA]!);
    if (Number.isFinite(c) && Math.abs(c) < 1) {
      m.depthAmplitudeCorrelation = c;
      rhoNote = ` (depth-amplitude correlation ${c.toFixed(2)} used in a joint likelihood)`;
    }
  }
  const replaced = Object.keys(system.measurements).length > 0 ? '; they replace the measurements of the system file' : '';
  return {
    ...system,
    measurements: m,
    notes: [
      ...system.notes,
      `Measurements from the light curve ${curveLabel}: ${used.join(', ')}${rhoNote}${replaced}. The ellipsoidal and beaming amplitudes enter with their marginal errors.`,
    ],
  };
}
