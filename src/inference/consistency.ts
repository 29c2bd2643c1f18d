/**
 * Can the model reproduce the data? Two-sided range checks (a measurement above the
 * largest or below the smallest model signal anywhere in the prior), the best fit's
 * chi-square, sensitivity corners the data rule out, posteriors piling up at a prior
 * edge, a phase amplitude larger than the eclipse depth, and depths that look as if
 * they were typed in percent or ppt. Each finding is a readable warning with its
 * numbers; those that mean the model cannot reproduce the data are also "problems",
 * which the report states first instead of quoting posteriors.
 */
import type { Dist } from '../io/distribution.ts';
import type { SystemInput } from '../io/system.ts';
import { chiSquareSurvival } from './chi-square.ts';
import { CORNER_RULED_OUT_DELTA_CHI2 } from './corners.ts';
import type { GridResult } from './grid.ts';
import { centreAndWidth, measurementTerms } from './measurements.ts';
import type { PosteriorDraws } from './sample-posterior.ts';
import type { ModelFit, SensitivityRow } from './types.ts';

const CAUSES = 'likely causes: a mis-measured depth or amplitude, an inflated radius ratio, emission that is not a blackbody (e.g. strong band emission), or internal heat';

/** p-value of the best fit below which the model does not reproduce the data: 0.0027, two-sided 3 sigma (common practice). */
export const FIT_P_VALUE = 0.0027;
/** Share of the prior in each edge region, and the posterior share there that counts as piling up (six times the prior's; our choice). */
export const EDGE_PRIOR_SHARE = 0.05;
export const EDGE_POSTERIOR_SHARE = 0.3;
/**
 * For the dayside temperature the threshold is higher (ten times the prior share): a
 * dark planet legitimately sits near A_B = 0, which alone puts a third of its T_day
 * posterior in the prior's top 5 % (seen on invented dark hot Jupiters; our choice).
 */
export const EDGE_POSTERIOR_SHARE_TEMPERATURE = 0.5;
/** A phase amplitude this many sigma above the depth is warned about, and above AMPLITUDE_PROBLEM_SIGMA it is a problem (our choice: 1 and 3 sigma). */
export const AMPLITUDE_WARNING_SIGMA = 1;
export const AMPLITUDE_PROBLEM_SIGMA = 3;
/** Depths and amplitudes below this [ppm] with an error below it look like percent or ppt (no instrument measures sub-ppm eclipses; common practice). */
export const SUSPECT_PPM = 1;

const f1 = (x: number) => (Math.abs(x) >= 100 ? x.toFixed(0) : x.toFixed(1));
const fp = (p: number) => (p < 1e-4 ? p.toExponential(1) : p.toPrecision(2));

export interface ConsistencyInput {
  system: SystemInput;
  grid: GridResult;
  posterior: PosteriorDraws;
  corners: readonly SensitivityRow[];
  /** Best log-likelihood anywhere (main grid and corners). */
  bestLogLikelihood: number;
}

export interface ConsistencyResult {
  fit: ModelFit;
  warnings: string[];
}

interface Measured {
  name: string;
  label: string;
  dist: Dist;
}

function measuredSignals(s: SystemInput): Measured[] {
  const m = s.measurements;
  const out: Measured[] = [];
  if (m.eclipseDepthPpm) out.push({ name: 'measurements.eclipseDepthPpm', label: 'eclipse depth', dist: m.eclipseDepthPpm });
  if (m.phaseAmplitudePpm) out.push({ name: 'measurements.phaseAmplitudePpm', label: 'phase amplitude', dist: m.phaseAmplitudePpm });
  if (m.nightsideFluxPpm) out.push({ name: 'measurements.nightsideFluxPpm', label: 'nightside flux', dist: m.nightsideFluxPpm });
  return out;
}

/** "0.0145 ppm" read as percent and as ppt, in ppm. */
function unitHint(value: number): string {
  return `as percent it would be ${f1(value * 1e4)} ppm, as ppt ${f1(value * 1e3)} ppm`;
}

function suspectUnits(s: SystemInput, problems: string[]): void {
  const m = s.measurements;
  const fields: Array<[string, Dist | undefined]> = [
    ['eclipseDepthPpm', m.eclipseDepthPpm], ['phaseAmplitudePpm', m.phaseAmplitudePpm], ['nightsideFluxPpm', m.nightsideFluxPpm],
    ['ellipsoidalAmplitudePpm', m.ellipsoidalAmplitudePpm], ['beamingAmplitudePpm', m.beamingAmplitudePpm],
  ];
  for (const [key, d] of fields) {
    if (!d) continue;
    const { centre, width } = d.kind === 'upper-limit' ? { centre: d.limit, width: 0 } : centreAndWidth(d);
    if (centre > 0 && centre < SUSPECT_PPM && width < SUSPECT_PPM) {
      problems.push(`measurements.${key} = ${centre}${width > 0 ? ` +- ${width}` : ''} ppm is below ${SUSPECT_PPM} ppm with a sub-ppm error: is this in percent? (${unitHint(centre)}); give "unit": "%" or "ppt" if so.`);
    }
  }
}

function rangeChecks(s: SystemInput, grid: GridResult, problems: string[]): void {
  for (const sig of measuredSignals(s)) {
    const isDepth = sig.label === 'eclipse depth';
    const isAmp = sig.label === 'phase amplitude';
    if (!isDepth && !isAmp) continue;
    const max = isDepth ? grid.maxDepthPpm : grid.maxAmplitudePpm;
    const min = isDepth ? grid.minDepthPpm : grid.minAmplitudePpm;
    if (!Number.isFinite(max) || !Number.isFinite(min)) continue;
    if (sig.dist.kind === 'upper-limit') {
      if (sig.dist.limit < min) {
        problems.push(`The ${sig.label} limit (< ${f1(sig.dist.limit)} ppm) is below the smallest signal the model gives anywhere in the prior (${f1(min)} ppm, thermal emission plus reflection at any A_g, eps and q); ${CAUSES}.`);
      }
      continue;
    }
    const { centre, width } = centreAndWidth(sig.dist);
    if (centre - 2 * width > max) {
      problems.push(`The measured ${sig.label} (${f1(centre)} +- ${f1(width)} ppm) is larger than any reflection plus thermal emission can give for this system (at most ${f1(max)} ppm over all draws, at A_B = q A_g <= 1); ${CAUSES}.`);
    }
    if (centre + 2 * width < min) {
      const hint = centre > 0 && centre < SUSPECT_PPM ? ` Is this in percent? (${unitHint(centre)})` : '';
      problems.push(`The measured ${sig.label} (${f1(centre)} +- ${f1(width)} ppm) is smaller than the smallest signal the model gives anywhere in the prior (${f1(min)} ppm: the planet's thermal emission alone exceeds it for every A_g, eps and q); likely causes: a mis-measured ${sig.label}, a planet cooler than energy balance predicts (e.g. a larger a/R* or a cooler star), or emission below a blackbody in this band.${hint}`);
    }
  }
}

function amplitudeAboveDepth(s: SystemInput, warnings: string[], problems: string[]): void {
  const d = s.measurements.eclipseDepthPpm;
  const a = s.measurements.phaseAmplitudePpm;
  if (!d || !a || d.kind === 'upper-limit' || a.kind === 'upper-limit') return;
  const cd = centreAndWidth(d);
  const ca = centreAndWidth(a);
  const z = (ca.centre - cd.centre) / Math.hypot(cd.width, ca.width);
  if (!(z >= AMPLITUDE_WARNING_SIGMA)) return;
  const text = `The phase amplitude (${f1(ca.centre)} +- ${f1(ca.width)} ppm) exceeds the eclipse depth (${f1(cd.centre)} +- ${f1(cd.width)} ppm) by ${z.toFixed(1)} sigma: that implies a negative nightside flux, which no planet gives; check that the amplitude is peak-to-trough of the planet's term alone (semi-amplitudes go in phaseSemiAmplitudePpm) and that the stellar ellipsoidal and beaming terms were removed.`;
  if (z > AMPLITUDE_PROBLEM_SIGMA) problems.push(text);
  else warnings.push(text);
}

function fitQuality(input: ConsistencyInput, problems: string[]): Pick<ModelFit, 'chiSquareMin' | 'degreesOfFreedom' | 'pValue'> {
  const terms = measurementTerms(input.system);
  if (!terms.chiSquareLike || terms.count === 0 || !Number.isFinite(input.bestLogLikelihood)) {
    return { chiSquareMin: null, degreesOfFreedom: terms.count, pValue: null };
  }
  const chi2 = Math.max(0, -2 * input.bestLogLikelihood);
  const p = chiSquareSurvival(chi2, terms.count);
  if (p < FIT_P_VALUE) {
    problems.push(`The best fit anywhere in the prior has chi-square ${chi2.toFixed(1)} for ${terms.count} measurement${terms.count === 1 ? '' : 's'} (${terms.names.join(', ')}; p = ${fp(p)} < ${FIT_P_VALUE}): the model cannot reproduce the data together.`);
  }
  return { chiSquareMin: Number(chi2.toPrecision(4)), degreesOfFreedom: terms.count, pValue: Number(p.toPrecision(3)) };
}

function cornerWarnings(corners: readonly SensitivityRow[], warnings: string[]): void {
  const out = corners.filter((c) => c.ruledOut);
  if (out.length === 0) return;
  const list = out.map((c) => `eps = ${c.redistribution}, q = ${c.phaseIntegral}: ${c.deltaChiSquare === null ? 'no draw reproduces the data' : `Delta chi^2 = ${c.deltaChiSquare.toFixed(1)}, likelihood ratio ${fp(Math.exp(-c.deltaChiSquare / 2))}`}`).join('; ');
  warnings.push(`Sensitivity corners that fit much worse than the best fit (Delta chi^2 > ${CORNER_RULED_OUT_DELTA_CHI2}, the 95 % point for two parameters): ${list}. The data rule these assumptions out; they are left out when judging whether the albedo follows the assumptions.`);
}

/** Share of posterior draws at or beyond the prior's edge quantiles (lower, upper). */
function edgeShares(prior: ArrayLike<number>, posterior: ArrayLike<number>): { lo: number; hi: number; loEdge: number; hiEdge: number } | null {
  const sorted = Float64Array.from(prior).sort();
  const n = sorted.length;
  if (n < 20 || sorted[n - 1]! - sorted[0]! <= 1e-9 * Math.max(1, Math.abs(sorted[0]!))) return null;
  const loEdge = sorted[Math.floor(EDGE_PRIOR_SHARE * (n - 1))]!;
  const hiEdge = sorted[Math.ceil((1 - EDGE_PRIOR_SHARE) * (n - 1))]!;
  let lo = 0;
  let hi = 0;
  for (let k = 0; k < posterior.length; k++) {
    const v = posterior[k]!;
    if (v <= loEdge) lo++;
    if (v >= hiEdge) hi++;
  }
  return { lo: lo / posterior.length, hi: hi / posterior.length, loEdge, hiEdge };
}

/** The golden-ratio sequence frac(k phi): evenly spread values in [0, 1) without a random generator (common practice). */
function spread(k: number): number {
  const x = (k + 0.5) * 0.6180339887498949;
  return x - Math.floor(x);
}

function edgeWarnings(input: ConsistencyInput, warnings: string[]): void {
  const { grid, posterior } = input;
  const pct = (x: number) => `${Math.round(100 * x)} %`;
  const epsPrior = grid.draws.map((d) => d.redistribution);
  const epsPost = Array.from(posterior.drawIndex, (i) => grid.draws[i]!.redistribution);
  const eps = edgeShares(epsPrior, epsPost);
  if (eps) {
    for (const [share, edge, side] of [[eps.lo, eps.loEdge, 'lower'], [eps.hi, eps.hiEdge, 'upper']] as const) {
      if (share >= EDGE_POSTERIOR_SHARE) {
        warnings.push(`The heat-redistribution posterior piles up at the ${side} edge of its prior: ${pct(share)} of it lies at eps ${side === 'lower' ? '<=' : '>='} ${edge.toFixed(2)}, where the prior has ${pct(EDGE_PRIOR_SHARE)}. The data would move eps beyond the prior if they could; the temperatures and the albedo are then bounded by the prior, not measured.`);
      }
    }
  }
  // The dayside-temperature prior: every draw's T_day at A_B spread evenly over [0, 1).
  const tPrior = grid.models.map((m, k) => m.dayZeroK * Math.pow(1 - spread(k), 0.25));
  const t = edgeShares(tPrior, posterior.daysideTemperatureK);
  if (t) {
    for (const [share, edge, side] of [[t.lo, t.loEdge, 'lower'], [t.hi, t.hiEdge, 'upper']] as const) {
      if (share >= EDGE_POSTERIOR_SHARE_TEMPERATURE) {
        warnings.push(`The dayside-temperature posterior piles up at the ${side} edge of what the prior allows: ${pct(share)} of it lies ${side === 'lower' ? 'below' : 'above'} ${Math.round(edge)} K, where the prior has ${pct(EDGE_PRIOR_SHARE)}. Its narrow interval reflects that edge (${side === 'upper' ? 'no redistribution and A_B near 0' : 'full redistribution and A_B near 1'}), not a measured temperature.`);
      }
    }
  }
}

export function checkConsistency(input: ConsistencyInput): ConsistencyResult {
  const problems: string[] = [];
  const warnings: string[] = [];
  suspectUnits(input.system, problems);
  rangeChecks(input.system, input.grid, problems);
  amplitudeAboveDepth(input.system, warnings, problems);
  const quality = fitQuality(input, problems);
  cornerWarnings(input.corners, warnings);
  edgeWarnings(input, warnings);
  return { fit: { reproducesData: problems.length === 0, ...quality, problems }, warnings: [...problems, ...warnings] };
}
