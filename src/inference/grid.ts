/**
 * The albedo grid. For each nuisance draw the geometric albedo is
 * laid on a uniform grid over [0, 1/q] (uniform prior; equivalently A_B = q A_g on
 * [0, 1]), every measured signal is modelled at every node, the likelihoods weight
 * the nodes, and the draw's evidence is the prior-averaged likelihood (trapezoid
 * rule). Working in log space keeps weak and strong constraints alike finite.
 */
import type { Nuisance } from './nuisance.ts';
import type { LogLikelihood } from './likelihood.ts';
import { type DrawModel, type MassPrediction, type ModelSettings, applyDayMap, dayMapTable, drawModel, planetDenseTable, predictMassEffects, thermalRatioRow } from './signal-model.ts';

/** A bivariate Gaussian likelihood of (eclipse depth, phase amplitude) with correlated errors. */
export interface DepthAmplitudeJoint {
  depthPpm: number;
  amplitudePpm: number;
  /** Inverse covariance entries [a, b, c] of [[a, b], [b, c]]. */
  inverse: [number, number, number];
}

export interface Likelihoods {
  /** Replaces eclipseDepthPpm and phaseAmplitudePpm when their errors are correlated. */
  depthAmplitude?: DepthAmplitudeJoint;
  eclipseDepthPpm?: LogLikelihood;
  phaseAmplitudePpm?: LogLikelihood;
  nightsideFluxPpm?: LogLikelihood;
  daysideTemperatureK?: LogLikelihood;
  ellipsoidalAmplitudePpm?: LogLikelihood;
  beamingAmplitudePpm?: LogLikelihood;
}

export interface GridResult {
  nodes: number;
  draws: Nuisance[];
  models: DrawModel[];
  masses: Array<MassPrediction | undefined>;
  /** Node likelihoods, row i = draw i, scaled so the row maximum is 1. */
  rows: Float64Array;
  /**
   * Cumulative trapezoid masses of the cells of each row (row i at i * (nodes - 1)),
   * so posterior sampling finds a cell by binary search.
   */
  cells: Float64Array;
  /** Normalised evidence weight of each draw. */
  weights: Float64Array;
  /** Whether the model eclipse depth decreases somewhere along the grid, per draw. */
  depthFalls: Uint8Array;
  /** Largest and smallest model eclipse depth and phase amplitude over all draws and nodes [ppm]. */
  maxDepthPpm: number;
  maxAmplitudePpm: number;
  minDepthPpm: number;
  minAmplitudePpm: number;
  /**
   * Largest log-likelihood over all draws and nodes (the best fit anywhere in the prior;
   * additive constants dropped as in likelihood.ts, so -2 x this is the minimum
   * chi-square for Gaussian errors).
   */
  maxLogLikelihood: number;
  /** ln of the prior-averaged likelihood (the evidence, same constants dropped). */
  logEvidence: number;
}

/** ln of (1 - A_B)^(1/4) at the grid's Bond albedos A_B = j / (nodes - 1) (Cowan & Agol 2011 scaling). */
export function lnAlbedoFactors(nodes: number): Float64Array {
  const c = new Float64Array(nodes);
  for (let j = 0; j < nodes; j++) c[j] = 0.25 * Math.log(1 - j / (nodes - 1));
  return c;
}

/**
 * `withMasses`: predict the mass effects of every draw (needed for the reported mass
 * effects and when ellipsoidal or beaming amplitudes are measured; the sensitivity grids
 * skip it otherwise).
 */
export function runGrid(draws: Nuisance[], settings: ModelSettings, lik: Likelihoods, nodes: number, withMasses = true): GridResult {
  const n = draws.length;
  const rows = new Float64Array(n * nodes);
  const cells = new Float64Array(n * (nodes - 1));
  const logZ = new Float64Array(n);
  const depthFalls = new Uint8Array(n);
  const models: DrawModel[] = new Array(n);
  const masses: Array<MassPrediction | undefined> = new Array(n);
  const lnC = lnAlbedoFactors(nodes);
  const factor = lnC.map(Math.exp);
  const table = planetDenseTable(settings);
  const dayMap = dayMapTable(settings);
  const joint = lik.depthAmplitude;
  const needNight = lik.phaseAmplitudePpm !== undefined || lik.nightsideFluxPpm !== undefined || joint !== undefined;
  const depthRow = new Float64Array(nodes);
  const logL = new Float64Array(nodes);
  let maxDepthPpm = -Infinity;
  let maxAmplitudePpm = -Infinity;
  let minDepthPpm = Infinity;
  let minAmplitudePpm = Infinity;
  let maxLogLikelihood = -Infinity;
  const inv = 1 / (nodes - 1);

  const dayRow = new Float64Array(nodes);
  const nightRow = new Float64Array(nodes);
  const signal = new Float64Array(nodes);
  const agUnit = new Float64Array(nodes);
  for (let j = 0; j < nodes; j++) agUnit[j] = j * inv;
  const { eclipseDepthPpm, phaseAmplitudePpm, nightsideFluxPpm, daysideTemperatureK } = lik;

  for (let i = 0; i < n; i++) {
    const th = draws[i]!;
    const dm = drawModel(th, settings);
    models[i] = dm;
    const mp = withMasses || lik.ellipsoidalAmplitudePpm || lik.beamingAmplitudePpm ? predictMassEffects(th, settings.band, settings.star?.beamingFactor) : undefined;
    masses[i] = mp;
    let constant = 0;
    if (mp && lik.ellipsoidalAmplitudePpm) constant += lik.ellipsoidalAmplitudePpm.at(mp.ellipsoidalPpm);
    if (mp && lik.beamingAmplitudePpm) constant += lik.beamingAmplitudePpm.at(mp.beamingPpm);
    logL.fill(constant);
    const invQ = 1 / th.phaseIntegral;

    thermalRatioRow(dm, table, dm.lnDayZeroK, lnC, dayRow);
    if (dayMap) applyDayMap(dayMap, dm.lnDayZeroK, lnC, th.redistribution, dayRow);
    const perAg = 1e6 * dm.reflectedDepthPerAg * invQ;
    let prevDepth = -Infinity;
    for (let j = 0; j < nodes; j++) {
      const depth = agUnit[j]! * perAg + 1e6 * dayRow[j]!;
      depthRow[j] = depth;
      if (depth > maxDepthPpm) maxDepthPpm = depth;
      if (depth < minDepthPpm) minDepthPpm = depth;
      if (depth < prevDepth) depthFalls[i] = 1;
      prevDepth = depth;
    }
    if (eclipseDepthPpm) eclipseDepthPpm.accumulate(depthRow, logL, nodes);
    if (needNight) {
      thermalRatioRow(dm, table, dm.lnNightZeroK, lnC, nightRow);
      if (phaseAmplitudePpm || joint) {
        const perAgAmp = 1e6 * dm.reflectedAmplitudePerAg * invQ;
        const thermalAmp = 1e6 * dm.sinI;
        for (let j = 0; j < nodes; j++) {
          const amplitude = agUnit[j]! * perAgAmp + (dayRow[j]! - nightRow[j]!) * thermalAmp;
          signal[j] = amplitude;
          if (amplitude > maxAmplitudePpm) maxAmplitudePpm = amplitude;
          if (amplitude < minAmplitudePpm) minAmplitudePpm = amplitude;
        }
        if (phaseAmplitudePpm) phaseAmplitudePpm.accumulate(signal, logL, nodes);
        if (joint) {
          const [a, b, c] = joint.inverse;
          for (let j = 0; j < nodes; j++) {
            const x = depthRow[j]! - joint.depthPpm;
            const y = signal[j]! - joint.amplitudePpm;
            logL[j]! -= 0.5 * (a * x * x + 2 * b * x * y + c * y * y);
          }
        }
      }
      if (nightsideFluxPpm) {
        const perAgNight = 1e6 * dm.reflectedNightPerAg * invQ;
        for (let j = 0; j < nodes; j++) signal[j] = agUnit[j]! * perAgNight + 1e6 * nightRow[j]!;
        nightsideFluxPpm.accumulate(signal, logL, nodes);
      }
    }
    if (daysideTemperatureK) {
      for (let j = 0; j < nodes; j++) signal[j] = dm.dayZeroK * factor[j]!;
      daysideTemperatureK.accumulate(signal, logL, nodes);
    }
    let rowMax = -Infinity;
    for (let j = 0; j < nodes; j++) if (logL[j]! > rowMax) rowMax = logL[j]!;
    const base = i * nodes;
    if (rowMax > maxLogLikelihood) maxLogLikelihood = rowMax;
    if (rowMax === -Infinity) {
      logZ[i] = -Infinity;
      continue;
    }
    let trap = 0;
    let cum = 0;
    let prev = 0;
    const cellBase = i * (nodes - 1) - 1;
    for (let j = 0; j < nodes; j++) {
      const d = logL[j]! - rowMax;
      // e^-60 ~ 1e-26: such nodes carry no weight; skipping the exp saves time.
      const v = d > -60 ? Math.exp(d) : 0;
      rows[base + j] = v;
      trap += v;
      if (j > 0) {
        cum += prev + v;
        cells[cellBase + j] = cum;
      }
      prev = v;
    }
    trap -= 0.5 * (rows[base]! + rows[base + nodes - 1]!);
    logZ[i] = rowMax + Math.log(trap * inv);
  }
  return {
    nodes, draws, models, masses, rows, cells, weights: normaliseLogWeights(logZ), depthFalls,
    maxDepthPpm, maxAmplitudePpm, minDepthPpm, minAmplitudePpm, maxLogLikelihood, logEvidence: logMeanExp(logZ),
  };
}

/** ln of the mean of exp(logZ) (the prior average of the draws' evidences); -Infinity when none has support. */
export function logMeanExp(logZ: Float64Array): number {
  let max = -Infinity;
  for (const v of logZ) if (v > max) max = v;
  if (max === -Infinity) return -Infinity;
  let sum = 0;
  for (const v of logZ) sum += Math.exp(v - max);
  return max + Math.log(sum / logZ.length);
}

/** exp(logZ - max) normalised to sum 1; all zeros if no draw has support. */
export function normaliseLogWeights(logZ: Float64Array): Float64Array {
  let max = -Infinity;
  for (const v of logZ) if (v > max) max = v;
  const w = new Float64Array(logZ.length);
  if (max === -Infinity) return w;
  let sum = 0;
  for (let i = 0; i < logZ.length; i++) {
    w[i] = Math.exp(logZ[i]! - max);
    sum += w[i]!;
  }
  for (let i = 0; i < w.length; i++) w[i]! /= sum;
  return w;
}

/** Kish's effective sample size 1 / sum w^2 of normalised weights (Kish 1965, Survey Sampling). */
export function effectiveSampleSize(w: Float64Array): number {
  let s = 0;
  for (const v of w) s += v * v;
  return s > 0 ? 1 / s : 0;
}
