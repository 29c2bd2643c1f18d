/**
 * The albedo posterior of a system: nuisance draws, the albedo
 * grid per draw, evidence weights, posterior draws and their summaries, the
 * all-reflected albedo, the (eps, q) sensitivity corners, mass effects, warnings.
 * Pure apart from the clock used for diagnostics.computeMs; the random generator
 * comes from the seed (or is passed in by tests).
 */
import { HesperError } from '../errors.ts';
import { lambertPhaseFunction } from '../physics/reflection.ts';
import type { SystemInput } from '../io/system.ts';
import { assumptionLines } from './assumptions.ts';
import { effectiveSampleSize, runGrid } from './grid.ts';
import { significanceSigma } from './likelihood.ts';
import { checkConsistency } from './consistency.ts';
import { conditionalSpread, readConstraint } from './constraint.ts';
import { runCorners, runDayMapShift } from './corners.ts';
import { drawMeasurement, likelihoodsOf, type MassPredictionScale } from './measurements.ts';
import { type Nuisance, drawNuisance } from './nuisance.ts';
import { nuisancePosterior, phaseIntegralSentence } from './nuisance-posterior.ts';
import { createRng, type Rng } from './random.ts';
import { samplePosterior } from './sample-posterior.ts';
import { type ModelSettings, predictMassEffects } from './signal-model.ts';
import { starFactors } from './star-model.ts';
import { quantileSorted, roundSig, summarize } from './summary.ts';
import type { AlbedoPosterior, InferenceResult, MassEffects, PosteriorQuantiles } from './types.ts';
import { posteriorWarnings } from './warnings.ts';

/** Thermal share (95 % upper limit) below which the dayside-map comparison is skipped. */
export const DAY_MAP_MIN_THERMAL_SHARE = 0.01;

export interface InferOptions {
  samples?: number;
  gridNodes?: number;
  seed?: number;
  /** A generator to use instead of one seeded from `seed` (tests). */
  rng?: Rng;
}

function settingsOf(s: SystemInput): ModelSettings {
  const star = starFactors(s);
  return {
    band: s.band, weighting: s.assumptions.weighting, thermal: s.assumptions.thermal !== 'none',
    dayMap: s.assumptions.thermal === 'local-equilibrium' ? 'local-equilibrium' : 'uniform',
    ...(star ? { star } : {}),
  };
}

function allReflected(s: SystemInput, draws: Nuisance[], rng: Rng) {
  const useDepth = s.measurements.eclipseDepthPpm !== undefined;
  const d = (useDepth ? s.measurements.eclipseDepthPpm : s.measurements.phaseAmplitudePpm)!;
  const values = new Float64Array(draws.length);
  for (let i = 0; i < draws.length; i++) {
    const th = draws[i]!;
    const geom = (th.radiusRatio / th.scaledSemiMajorAxis) ** 2;
    const perAg = useDepth
      ? geom * lambertPhaseFunction(Math.abs(Math.PI / 2 - th.inclinationRad))
      : geom * Math.sin(th.inclinationRad);
    values[i] = (1e-6 * drawMeasurement(d, rng)) / perAg;
  }
  return summarize(values);
}

/** Median predicted mass-effect amplitudes over the first prior draws (the scale of their model uncertainty), when masses are known. */
function massScaleOf(draws: Nuisance[], band: ModelSettings['band'], beamingFactor = 1): MassPredictionScale | undefined {
  const e: number[] = [];
  const b: number[] = [];
  for (let i = 0; i < draws.length && e.length < 500; i++) {
    const m = predictMassEffects(draws[i]!, band, beamingFactor);
    if (!m) continue;
    e.push(m.ellipsoidalPpm);
    b.push(m.beamingPpm);
  }
  if (e.length === 0) return undefined;
  const med = (v: number[]) => quantileSorted(Float64Array.from(v).sort(), 0.5);
  return { ellipsoidalPpm: med(e), beamingPpm: med(b) };
}

function massEffectsOf(grid: ReturnType<typeof runGrid>, drawIndex: Int32Array): MassEffects | undefined {
  if (grid.masses.every((m) => m === undefined)) return undefined;
  const e: number[] = [];
  const b: number[] = [];
  const k: number[] = [];
  for (const i of drawIndex) {
    const m = grid.masses[i];
    if (!m) continue;
    e.push(m.ellipsoidalPpm);
    b.push(m.beamingPpm);
    k.push(m.rvSemiAmplitudeMs);
  }
  return { ellipsoidalPpm: summarize(e), beamingPpm: summarize(b), rvSemiAmplitudeMs: summarize(k) };
}

/** Points of each quantile grid in PosteriorQuantiles: a CDF resolution of 0.001. */
export const QUANTILE_GRID_POINTS = 1001;

function quantileGrid(values: Float64Array): Float64Array {
  const sorted = Float64Array.from(values).sort();
  const grid = new Float64Array(QUANTILE_GRID_POINTS);
  for (let k = 0; k < QUANTILE_GRID_POINTS; k++) grid[k] = quantileSorted(sorted, k / (QUANTILE_GRID_POINTS - 1));
  return grid;
}

/** The albedo posterior (the fields of the interpretation JSON). */
export function inferAlbedo(s: SystemInput, options: InferOptions = {}): AlbedoPosterior {
  return inferAlbedoDetailed(s, options).posterior;
}

/** The albedo posterior plus quantile grids of A_g, T_day and T_eq for the interpretation. */
export function inferAlbedoDetailed(s: SystemInput, options: InferOptions = {}): InferenceResult {
  const t0 = performance.now();
  const samples = options.samples ?? s.assumptions.samples;
  const nodes = options.gridNodes ?? s.assumptions.gridNodes;
  const seed = options.seed ?? s.assumptions.seed;
  const rng = options.rng ?? createRng(seed);
  const settings = settingsOf(s);

  const draws: Nuisance[] = new Array(samples);
  for (let i = 0; i < samples; i++) draws[i] = drawNuisance(s, rng);
  const massMeasured = s.measurements.ellipsoidalAmplitudePpm !== undefined || s.measurements.beamingAmplitudePpm !== undefined;
  const lik = likelihoodsOf(s, massMeasured ? massScaleOf(draws, settings.band, settings.star?.beamingFactor) : undefined);
  const grid = runGrid(draws, settings, lik, nodes);
  if (!grid.weights.some((w) => w > 0)) {
    throw new HesperError('no-posterior-support', 'no draw reproduces the measurements', [
      { path: 'measurements', message: 'every model signal has zero likelihood under the measurements; check the values and their uncertainties' },
    ]);
  }
  const post = samplePosterior(grid, settings, rng, samples);
  const ess = effectiveSampleSize(grid.weights);
  const thermalFraction = summarize(post.thermalFraction);
  const massEffects = massEffectsOf(grid, post.drawIndex);
  const m = s.measurements;
  const detected = [m.eclipseDepthPpm, m.phaseAmplitudePpm].some((d) => d !== undefined && significanceSigma(d) >= 3);
  const corners = runCorners(s, draws, settings, lik, seed, grid);
  const nuisance = nuisancePosterior(draws, post.drawIndex);
  // The dayside map only reshapes the thermal term: when it is below 1 % of the signal at
  // 95 % (our choice), the map cannot move A_g noticeably and the comparison is skipped.
  const dayMapShift = thermalFraction.upperLimit95 >= DAY_MAP_MIN_THERMAL_SHARE ? runDayMapShift(s, draws, settings, lik, seed) : undefined;
  const agGrid = quantileGrid(post.geometricAlbedo);
  const agSummary = summarize(post.geometricAlbedo);
  // The posterior's own dependence on the heat redistribution (the thermal-reflection degeneracy); q enters
  // through the corners, since a bright planet's q dependence is the energy bound A_g <= 1/q, not the data.
  const epsSpread = conditionalSpread(Float64Array.from(draws, (d) => d.redistribution), post.drawIndex, post.geometricAlbedo);
  const constraint = readConstraint(agGrid, agSummary.lower68, agSummary.upper68, corners.rows, epsSpread);
  const consistency = checkConsistency({
    system: s, grid, posterior: post, corners: corners.rows, bestLogLikelihood: Math.max(grid.maxLogLikelihood, corners.maxLogLikelihood),
  });

  const result: AlbedoPosterior = {
    name: s.name,
    band: { id: s.band.id, label: s.band.label, minNm: roundSig(s.band.minNm, 6), maxNm: roundSig(s.band.maxNm, 6), approximate: s.band.approximate, weighting: s.assumptions.weighting },
    geometricAlbedo: { ...agSummary, constraint: constraint.constraint },
    bondAlbedo: summarize(post.bondAlbedo),
    daysideTemperatureK: summarize(post.daysideTemperatureK),
    equilibriumTemperatureK: summarize(post.equilibriumTemperatureK),
    thermalDepthPpm: summarize(post.thermalDepthPpm),
    reflectedDepthPpm: summarize(post.reflectedDepthPpm),
    thermalFraction,
    allReflectedGeometricAlbedo: allReflected(s, draws, rng),
    detected,
    reflectedLightDetected: constraint.constraint === 'measured' && consistency.fit.reproducesData,
    sensitivity: corners.rows,
    ...(dayMapShift ? { thermalMapSensitivity: dayMapShift } : {}),
    modelFit: consistency.fit,
    nuisancePosterior: nuisance,
    phaseIntegralPreference: phaseIntegralSentence(nuisance),
    ...(massEffects ? { massEffects } : {}),
    assumptions: assumptionLines(s),
    diagnostics: { effectiveSampleSize: roundSig(ess, 4), samples, gridNodes: nodes, seed, computeMs: 0 },
    warnings: [
      ...consistency.warnings,
      ...posteriorWarnings({ system: s, grid, posterior: post, thermalFraction, ...(massEffects ? { massEffects } : {}), effectiveSampleSize: ess }),
    ],
  };
  const quantiles: PosteriorQuantiles = {
    geometricAlbedo: agGrid,
    daysideTemperatureK: quantileGrid(post.daysideTemperatureK),
    equilibriumTemperatureK: quantileGrid(post.equilibriumTemperatureK),
  };
  result.diagnostics.computeMs = roundSig(performance.now() - t0, 3);
  return { posterior: result, quantiles };
}
