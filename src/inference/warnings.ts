/** Warnings users need when reading an albedo posterior (a dominant thermal share, a depth that falls with A_g, mass effects, sampling); the range and fit checks are in consistency.ts. */
import type { SystemInput } from '../io/system.ts';
import { bandRangeNm } from './assumptions.ts';
import type { GridResult } from './grid.ts';
import { centreAndWidth } from './measurements.ts';
import type { PosteriorDraws } from './sample-posterior.ts';
import type { MassEffects } from './types.ts';
import type { Summary } from './summary.ts';

const fmt = (x: number, d = 1) => x.toFixed(d);

export interface WarningInput {
  system: SystemInput;
  grid: GridResult;
  posterior: PosteriorDraws;
  thermalFraction: Summary;
  massEffects?: MassEffects;
  effectiveSampleSize: number;
}

/** Effective sample size below which the intervals are unstable: the larger of 200 and 5 % of the draws (our choice). */
export function essFloor(draws: number): number {
  return Math.max(200, 0.05 * draws);
}

export function posteriorWarnings(w: WarningInput): string[] {
  const out: string[] = [];
  const { system: s, grid } = w;
  const m = s.measurements;
  if (w.thermalFraction.median > 0.5) {
    out.push(`Thermal emission makes up ${fmt(100 * w.thermalFraction.median, 0)} % (median) of the eclipse depth: the albedo rests on the thermal model (blackbody planet, two-hemisphere heat redistribution) more than on the measurement.`);
  }
  let falls = 0;
  for (let k = 0; k < w.posterior.count; k++) falls += grid.depthFalls[w.posterior.drawIndex[k]!]!;
  const fallShare = falls / Math.max(1, w.posterior.count);
  if (fallShare > 0.1) {
    out.push(`In ${fmt(100 * fallShare, 0)} % of the posterior draws the model eclipse depth falls as A_g rises (a brighter planet is cooler and emits less in this band: a hot planet in a red band). Dividing the depth by (Rp/a)^2 and subtracting a fixed thermal term would be ill-posed here; the grid handles it, but the albedo then depends on the thermal model.`);
  }
  if (w.massEffects && m.phaseAmplitudePpm) {
    const amp = centreAndWidth(m.phaseAmplitudePpm).centre;
    const e = 2 * w.massEffects.ellipsoidalPpm.median;
    const b = 2 * w.massEffects.beamingPpm.median;
    if (amp > 0 && e > 0.2 * amp) out.push(`The predicted ellipsoidal variation (peak-to-trough ${fmt(e)} ppm) exceeds 20 % of the measured phase amplitude (${fmt(amp)} ppm): make sure the amplitude is the planet's term alone.`);
    if (amp > 0 && b > 0.2 * amp) out.push(`The predicted Doppler beaming (peak-to-trough ${fmt(b)} ppm) exceeds 20 % of the measured phase amplitude (${fmt(amp)} ppm): make sure the amplitude is the planet's term alone.`);
  }
  const n = grid.draws.length;
  const floor = essFloor(n);
  if (w.effectiveSampleSize < floor) {
    out.push(`Low effective sample size (${fmt(w.effectiveSampleSize, 0)} of ${n} draws, below the floor of ${fmt(floor, 0)}: the larger of 200 and 5 % of the draws): the measurements constrain the nuisance parameters strongly, or hardly any draw reproduces them; raise assumptions.samples for stable intervals, and check the inputs if it stays this low.`);
  }
  if (s.band.approximate) {
    out.push(`The band "${s.band.id}" is approximated (${bandRangeNm(s.band)} nm, shape from its coverage only); give a tabulated response curve for precise thermal estimates.`);
  }
  if (s.planet.inclinationDeg === undefined) out.push('No inclination given: an edge-on orbit (i = 90 deg) was assumed.');
  if (m.phaseOffsetDeg) out.push('The phase offset does not enter the albedo posterior; it is used when the result is interpreted.');
  return out;
}
