/** The albedo posterior as reported in the interpretation JSON. */
import type { AlbedoConstraint } from './constraint.ts';
import type { DayMapShift } from './corners.ts';
import type { NuisancePosterior } from './nuisance-posterior.ts';
import type { Summary } from './summary.ts';

export interface SensitivityRow {
  redistribution: number;
  phaseIntegral: number;
  geometricAlbedo: Summary;
  /** 2 (ln L_best - ln L_corner) of the best fits (null when no draw fits at this corner). */
  deltaChiSquare: number | null;
  /** The data rule this corner out (Delta chi^2 above the 95 % point for two parameters). */
  ruledOut: boolean;
}

/** Whether the model reproduces the data, with the best fit's chi-square and the problems found. */
export interface ModelFit {
  reproducesData: boolean;
  /** -2 ln L of the best fit anywhere in the prior (a chi-square for Gaussian errors); null for sample or uniform measurements. */
  chiSquareMin: number | null;
  degreesOfFreedom: number;
  pValue: number | null;
  /** Why the model cannot reproduce the data, in words (empty when it can). */
  problems: string[];
}

/** The albedo summary with how the data constrain it. */
export type AlbedoSummary = Summary & { constraint: AlbedoConstraint };

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
  geometricAlbedo: AlbedoSummary;
  bondAlbedo: Summary;
  daysideTemperatureK: Summary;
  equilibriumTemperatureK: Summary;
  thermalDepthPpm: Summary;
  reflectedDepthPpm: Summary;
  thermalFraction: Summary;
  allReflectedGeometricAlbedo: Summary;
  /** The eclipse depth or phase amplitude is at least 3 sigma (the signal, not the albedo). */
  detected: boolean;
  /** Reflected light is detected: the albedo constraint is "measured". */
  reflectedLightDetected: boolean;
  sensitivity: SensitivityRow[];
  /** A_g under the other dayside map (uniform vs local equilibrium), on the corner draws; absent without thermal emission. */
  thermalMapSensitivity?: DayMapShift;
  modelFit: ModelFit;
  /** Prior and posterior of eps and q. */
  nuisancePosterior: NuisancePosterior;
  /** Which phase integral the data prefer, if any, in words. */
  phaseIntegralPreference: string;
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
