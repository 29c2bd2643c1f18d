/** The albedo posterior as reported in the interpretation JSON. */
import type { Summary } from './summary.ts';

export interface SensitivityRow {
  redistribution: number;
  phaseIntegral: number;
  geometricAlbedo: Summary;
}

export interface MassEffects {
  ellipsoidalPpm: Summary;
  beamingPpm: Summary;
  rvSemiAmplitudeMs: Summary;
}

export interface Diagnostics {
  effectiveSampleSize: number;
  samples: number;
  gridNodes: number;
  seed: number;
  computeMs: number;
}

export interface AlbedoPosterior {
  name: string;
  band: { id: string; label: string; minNm: number; maxNm: number; approximate: boolean; weighting: 'photon' | 'energy' };
  geometricAlbedo: Summary;
  bondAlbedo: Summary;
  daysideTemperatureK: Summary;
  equilibriumTemperatureK: Summary;
  thermalDepthPpm: Summary;
  reflectedDepthPpm: Summary;
  thermalFraction: Summary;
  allReflectedGeometricAlbedo: Summary;
  detected: boolean;
  sensitivity: SensitivityRow[];
  massEffects?: MassEffects;
  /** The assumptions that drove the result, in words. */
  assumptions: string[];
  diagnostics: Diagnostics;
  warnings: string[];
}

/**
 * Posterior marginals as sorted quantile grids: values[k] is the k/(n-1) quantile
 * (Hyndman & Fan type 7 over the posterior draws). Handed to the interpretation for
 * probabilities such as P(A_g > x); not part of the JSON output.
 */
export interface PosteriorQuantiles {
  geometricAlbedo: Float64Array;
  daysideTemperatureK: Float64Array;
  equilibriumTemperatureK: Float64Array;
}

/** The posterior with its quantile grids (inferAlbedoDetailed). */
export interface InferenceResult {
  posterior: AlbedoPosterior;
  quantiles: PosteriorQuantiles;
}
