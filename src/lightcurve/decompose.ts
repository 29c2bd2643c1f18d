/**
 * Decomposition of a light curve into the planet's phase term, its eclipse and the
 * star's ellipsoidal and beaming signals: fold, mask the transit, build the linear
 * model (design-matrix.ts), optionally bin, fit by weighted least squares, and derive
 * the reported amplitudes with their covariance, the first-order brightness map and
 * the mass check. Geometry comes in as plain numbers so that any caller (CLI options,
 * a system file) can supply it.
 *
 * The sin(2 pi phi) degeneracy: the star's Doppler beaming and the planet's
 * first-harmonic sine (its phase offset) are the same function of phase, so one
 * coefficient S is fitted and attributed (types.ts SineAttribution):
 * - without fitOffset, S is the beaming and the planet's peak is held at eclipse;
 * - with fitOffset and a predicted beaming, the beaming is fixed at the prediction
 *   (its sigma carried into the offset) and the rest of S is the planet's;
 * - with fitOffset and no prediction, the beaming term is absent (taken as zero) and
 *   all of S is the planet's: a real beaming signal then shows up as an eastward offset.
 */
import { inputError, requireFinite } from '../errors.ts';
import { planetQuantities, parameterVector, quadratic, sigmaOf, type Derived, type ParameterVector } from './amplitudes.ts';
import { binDesign } from './bin.ts';
import { longitudinalMap, type LongitudinalMap } from './brightness-map.ts';
import { buildDesign } from './design-matrix.ts';
import { addDiagnostics } from './diagnostics.ts';
import { foldCurve } from './fold.ts';
import { weightedLeastSquares } from './least-squares.ts';
import { resolveGeometry, transitKeepMask } from './masks.ts';
import { checkMassEffects, type MassCheck } from './mass-check.ts';
import { phaseTermShape } from './phase-term.ts';
import { DEFAULT_GAP_DAYS, DEFAULT_TREND_ORDER, binGroups, checkBaselineOptions, planBaseline, segmentCurve } from './segments.ts';
import type { ColumnName, EclipseGeometry, LightCurve, PhaseModel, SineAttribution, ValueSigma } from './types.ts';

export interface DecomposeOptions {
  periodDays: number;
  /** Mid-transit epoch, days in the time system of the curve; needed for time series only. */
  epochDays?: number;
  geometry: EclipseGeometry;
  /** Default cosine. */
  phaseModel?: PhaseModel;
  /** Fit the planet's first-harmonic sine (phase offset); see the degeneracy above. */
  fitOffset?: boolean;
  /** Bin the folded curve into this many equal phase bins before fitting. */
  bins?: number;
  /**
   * Amplitudes predicted from the masses [ppm], compared with the fitted ones (mass
   * check). With fitOffset, predicted.beamingPpm also fixes the beaming term.
   */
  predicted?: { ellipsoidalPpm?: ValueSigma; beamingPpm?: ValueSigma };
  /** Multiply the covariance by the reduced chi-square when it exceeds 1. */
  scaleErrors?: boolean;
  /** Order of each segment's polynomial trend in time (default 1; 0 = normalisation only). */
  trendOrder?: number;
  /** A gap longer than this [days] starts a new segment (default 0.5). */
  gapDays?: number;
}

/** One baseline segment of the fit: a file, or a stretch of it between long gaps. */
export interface SegmentResult {
  file: string;
  /** First and last time [days, the curve's time system]; null for a folded curve. */
  start: number | null;
  end: number | null;
  /** Points of the segment used in the fit (after the transit mask). */
  points: number;
  /** Order of its polynomial trend (0: normalisation only; -1: no point left to fit). */
  trendOrder: number;
  /** Its fitted normalisation (the constant, in units of the flux column) with sigma; null when not fitted. */
  normalisation: ValueSigma | null;
}

export interface BrightnessMapResult extends LongitudinalMap {
  /** False when no offset was fitted: the hot spot is then held at the substellar point. */
  longitudeFitted: boolean;
  meanPlanetFluxPpm: ValueSigma | null;
}

export interface Decomposition {
  eclipseDepthPpm: ValueSigma | null;
  phaseAmplitudePpm: ValueSigma;
  phaseOffsetDeg: ValueSigma | null;
  ellipsoidalAmplitudePpm: ValueSigma;
  beamingAmplitudePpm: ValueSigma | null;
  /** Planet flux at transit phase (eclipse depth minus peak-to-trough), from the same fit. */
  nightsideFluxPpm: ValueSigma | null;
  /** Covariance of the measured quantities above (ppm, deg), in the order of `names`. */
  covariance: { names: string[]; matrix: number[][] };
  reducedChiSquare: number;
  degreesOfFreedom: number;
  /** RMS of the residuals of the fitted points (or bins) [ppm]. */
  residualPpm: number;
  /** Light-curve points used in the fit (after the transit mask). */
  points: number;
  /** The baseline segments, each with its own normalisation and trend, fitted with the signals. */
  segments: SegmentResult[];
  /** Number of trend coefficients in the fit (normalisations not counted). */
  trendTerms: number;
  brightnessMap: BrightnessMapResult;
  massCheck: MassCheck[];
  model: {
    phaseModel: PhaseModel;
    offsetFitted: boolean;
    sineTerm: SineAttribution;
    eclipseShape: 'two-disk overlap' | 'box' | 'none';
    inclinationDeg: number;
    errorsScaled: boolean;
    /** Requested trend order and the gap that splits segments [days]. */
    trendOrder: number;
    gapDays: number;
  };
  /** The linear coefficients (flux units) and their covariance, as fitted. */
  linearFit: { names: ColumnName[]; values: number[]; covariance: number[][] };
  data: { inputPoints: number; maskedTransitPoints: number; inEclipsePoints: number; bins: number | null; fittedRows: number };
  notes: string[];
  warnings: string[];
}

const vs = (d: Derived, pv: ParameterVector): ValueSigma => ({ value: d.value, sigma: sigmaOf(d, pv) });

function checkValueSigma(path: string, q: ValueSigma | undefined): void {
  if (!q) return;
  requireFinite(`${path}.value`, q.value);
  requireFinite(`${path}.sigma`, q.sigma);
  if (q.sigma < 0) throw inputError('out-of-range', `${path}.sigma`, `${path}.sigma = ${q.sigma}: must be >= 0`, q.sigma, '[0, inf)');
}

export function decompose(curve: LightCurve, options: DecomposeOptions): Decomposition {
  const phaseModel = options.phaseModel ?? 'cosine';
  const fitOffset = options.fitOffset ?? false;
  checkValueSigma('predicted.beamingPpm', options.predicted?.beamingPpm);
  checkValueSigma('predicted.ellipsoidalPpm', options.predicted?.ellipsoidalPpm);
  const trendOrder = options.trendOrder ?? DEFAULT_TREND_ORDER;
  const gapDays = options.gapDays ?? DEFAULT_GAP_DAYS;
  checkBaselineOptions(trendOrder, gapDays);
  const geometry = resolveGeometry(options.geometry, options.periodDays);
  const folded = foldCurve(curve, options.periodDays, options.epochDays);
  const keep = transitKeepMask(folded.phase, geometry);
  const shape = phaseTermShape(phaseModel, geometry.inclinationRad);
  const segmentation = segmentCurve(curve, gapDays);
  const plan = planBaseline(curve, segmentation, keep, trendOrder);
  let design = buildDesign({ ...folded, keep, baseline: { plan, segmentOf: segmentation.segmentOf, time: curve.x } }, shape, geometry);
  const points = design.rows;
  if (options.bins !== undefined) {
    design = binDesign(design, options.bins, binGroups(curve, segmentation, plan, keep, options.periodDays, options.epochDays));
  }
  const fit = weightedLeastSquares(design.matrix, design.rows, design.cols, design.flux, design.fluxErr, design.names);
  const reducedChiSquare = fit.chiSquare / fit.dof;
  const errorsScaled = (options.scaleErrors ?? false) && reducedChiSquare > 1;
  if (errorsScaled) for (let i = 0; i < fit.covariance.length; i++) fit.covariance[i] = fit.covariance[i]! * reducedChiSquare;

  const predictedBeaming = options.predicted?.beamingPpm;
  const sineTerm: SineAttribution = !fitOffset ? 'beaming' : predictedBeaming ? 'offset-beaming-fixed' : 'offset-no-beaming';
  const fixed = sineTerm === 'offset-beaming-fixed' && predictedBeaming
    ? { value: predictedBeaming.value / 1e6, sigma: predictedBeaming.sigma / 1e6 } : undefined;
  const pv = parameterVector(fit, design.names, fixed);
  const q = planetQuantities(pv, shape, sineTerm);

  // Covariance of the measured quantities (a fixed beaming is an input, not a measurement).
  const measured: Array<[string, Derived]> = [];
  if (q.eclipseDepthPpm) measured.push(['eclipseDepthPpm', q.eclipseDepthPpm]);
  measured.push(['phaseAmplitudePpm', q.phaseAmplitudePpm]);
  if (q.phaseOffsetDeg) measured.push(['phaseOffsetDeg', q.phaseOffsetDeg]);
  measured.push(['ellipsoidalAmplitudePpm', q.ellipsoidalAmplitudePpm]);
  if (sineTerm === 'beaming' && q.beamingAmplitudePpm) measured.push(['beamingAmplitudePpm', q.beamingAmplitudePpm]);
  const covariance = {
    names: measured.map(([n]) => n),
    matrix: measured.map(([, a]) => measured.map(([, b]) => quadratic(a.grad, b.grad, pv))),
  };

  const harmonics = q.meanPlanetFluxPpm ? [q.a1, q.b1, q.meanPlanetFluxPpm] : [q.a1, q.b1];
  const map = longitudinalMap({
    cosinePpm: q.a1.value,
    sinePpm: q.b1.value,
    meanFluxPpm: q.meanPlanetFluxPpm ? q.meanPlanetFluxPpm.value : null,
    covariance: harmonics.map((a) => harmonics.map((b) => quadratic(a.grad, b.grad, pv))),
  });

  const fitted = {
    ellipsoidalPpm: vs(q.ellipsoidalAmplitudePpm, pv),
    beamingPpm: sineTerm === 'beaming' && q.beamingAmplitudePpm ? vs(q.beamingAmplitudePpm, pv) : null,
  };
  const mass = checkMassEffects({
    fitted,
    predicted: { ellipsoidalPpm: options.predicted?.ellipsoidalPpm ?? null, beamingPpm: sineTerm === 'beaming' ? predictedBeaming ?? null : null },
    offsetFitted: fitOffset,
  });

  const segments: SegmentResult[] = segmentation.segments.map((seg, k) => {
    const p = plan.segments[k]!;
    const c = p.firstColumn;
    return {
      file: seg.file, start: seg.start, end: seg.end, points: p.fittedPoints, trendOrder: p.order,
      normalisation: c < 0 ? null : { value: fit.coefficients[c]!, sigma: Math.sqrt(fit.covariance[c * design.cols + c]!) },
    };
  });
  const trendTerms = plan.segments.reduce((n, p) => n + Math.max(p.order, 0), 0);

  let sumSq = 0;
  for (let r = 0; r < fit.residuals.length; r++) sumSq += fit.residuals[r]! ** 2;
  const inclinationDeg = (geometry.inclinationRad * 180) / Math.PI;
  const eclipseShape = !q.eclipseDepthPpm ? 'none' : geometry.kind === 'disks' ? 'two-disk overlap' : 'box';
  const result: Decomposition = {
    eclipseDepthPpm: q.eclipseDepthPpm ? vs(q.eclipseDepthPpm, pv) : null,
    phaseAmplitudePpm: vs(q.phaseAmplitudePpm, pv),
    phaseOffsetDeg: q.phaseOffsetDeg ? vs(q.phaseOffsetDeg, pv) : null,
    ellipsoidalAmplitudePpm: vs(q.ellipsoidalAmplitudePpm, pv),
    beamingAmplitudePpm: q.beamingAmplitudePpm ? vs(q.beamingAmplitudePpm, pv) : null,
    nightsideFluxPpm: q.nightsideFluxPpm ? vs(q.nightsideFluxPpm, pv) : null,
    covariance,
    reducedChiSquare,
    degreesOfFreedom: fit.dof,
    residualPpm: Math.sqrt(sumSq / fit.residuals.length) * 1e6,
    points,
    segments,
    trendTerms,
    brightnessMap: { ...map, longitudeFitted: fitOffset, meanPlanetFluxPpm: q.meanPlanetFluxPpm ? vs(q.meanPlanetFluxPpm, pv) : null },
    massCheck: mass.checks,
    model: { phaseModel, offsetFitted: fitOffset, sineTerm, eclipseShape, inclinationDeg, errorsScaled, trendOrder, gapDays },
    linearFit: {
      names: design.names,
      values: Array.from(fit.coefficients),
      covariance: design.names.map((_, i) => design.names.map((__, j) => fit.covariance[i * design.cols + j]!)),
    },
    data: {
      inputPoints: folded.phase.length,
      maskedTransitPoints: folded.phase.length - points,
      inEclipsePoints: countInEclipse(folded.phase, keep, geometry.hiddenFraction),
      bins: options.bins === undefined ? null : design.rows,
      fittedRows: design.rows,
    },
    notes: [],
    warnings: [...mass.warnings],
  };
  addDiagnostics(result, geometry.kind === 'window' && !geometry.inclinationGiven, curve.column === 'time', options.periodDays);
  return result;
}

function countInEclipse(phase: Float64Array, keep: Uint8Array, hidden: (p: number) => number): number {
  let n = 0;
  for (let i = 0; i < phase.length; i++) if (keep[i] && hidden(phase[i]!) > 0) n++;
  return n;
}
