/**
 * One draw of the nuisance parameters theta: the geometry, the
 * star, the heat redistribution and phase integral, and the masses when known. The
 * alternative inputs of the system file are resolved here, per draw, so that their
 * uncertainties propagate (e.g. k = Rp / R* from radiusRjup and radiusRsun).
 */
import { HesperError } from '../errors.ts';
import type { Dist } from '../io/distribution.ts';
import type { SystemInput } from '../io/system.ts';
import { ASSUMPTION_FIELDS, PLANET_FIELDS, STAR_FIELDS } from '../io/system-fields.ts';
import { KG_PER_MEARTH, KG_PER_MJUP, KG_PER_MSUN, M_PER_AU, M_PER_REARTH, M_PER_RJUP, M_PER_RSUN, S_PER_DAY } from '../physics/constants.ts';
import { periodFromSemiMajorAxisS, semiMajorAxisFromPeriodM } from '../physics/orbit.ts';
import { drawTruncated } from './draw.ts';
import type { Rng } from './random.ts';

export interface Nuisance {
  teffK: number;
  radiusRatio: number;
  scaledSemiMajorAxis: number;
  inclinationRad: number;
  redistribution: number;
  phaseIntegral: number;
  /** The star's darkening coefficients in the band; NaN when derived from T_eff (physics/darkening.ts). */
  limbDarkeningU: number;
  gravityDarkeningG: number;
  /** Set when the planet and star masses and the period are known or derivable. */
  planetMassKg: number | undefined;
  starMassKg: number | undefined;
  periodS: number | undefined;
}

const MAX_GEOMETRY_REDRAWS = 1000;
const DEG = Math.PI / 180;

/** The same draw at fixed heat redistribution and phase integral (sensitivity corners), with the same object shape. */
export function withCorner(n: Nuisance, redistribution: number, phaseIntegral: number): Nuisance {
  return {
    teffK: n.teffK,
    radiusRatio: n.radiusRatio,
    scaledSemiMajorAxis: n.scaledSemiMajorAxis,
    inclinationRad: n.inclinationRad,
    redistribution,
    phaseIntegral,
    limbDarkeningU: n.limbDarkeningU,
    gravityDarkeningG: n.gravityDarkeningG,
    planetMassKg: n.planetMassKg,
    starMassKg: n.starMassKg,
    periodS: n.periodS,
  };
}

/** Draws theta; throws out-of-range naming the fields when no valid geometry can be drawn. */
export function drawNuisance(s: SystemInput, rng: Rng): Nuisance {
  const d = (path: string, dist: Dist | undefined, range: import('../errors.ts').RangeBounds): number | undefined =>
    dist === undefined ? undefined : drawTruncated(path, dist, range, rng);
  const a = s.assumptions;
  for (let attempt = 0; attempt < MAX_GEOMETRY_REDRAWS; attempt++) {
    const teffK = d('star.teffK', s.star.teffK, STAR_FIELDS.teffK.range)!;
    const rStarM = mul(d('star.radiusRsun', s.star.radiusRsun, STAR_FIELDS.radiusRsun.range), M_PER_RSUN);
    const mStarKg = mul(d('star.massMsun', s.star.massMsun, STAR_FIELDS.massMsun.range), KG_PER_MSUN);
    const p = s.planet;
    const mPlanetKg = mul(d('planet.massMjup', p.massMjup, PLANET_FIELDS.massMjup.range), KG_PER_MJUP)
      ?? mul(d('planet.massMearth', p.massMearth, PLANET_FIELDS.massMearth.range), KG_PER_MEARTH);
    let periodS = mul(d('planet.periodDays', p.periodDays, PLANET_FIELDS.periodDays.range), S_PER_DAY);

    let k = d('planet.radiusRatio', p.radiusRatio, PLANET_FIELDS.radiusRatio.range);
    if (k === undefined && rStarM !== undefined) {
      const rp = mul(d('planet.radiusRjup', p.radiusRjup, PLANET_FIELDS.radiusRjup.range), M_PER_RJUP)
        ?? mul(d('planet.radiusRearth', p.radiusRearth, PLANET_FIELDS.radiusRearth.range), M_PER_REARTH);
      if (rp !== undefined) k = rp / rStarM;
    }
    let aR = d('planet.scaledSemiMajorAxis', p.scaledSemiMajorAxis, PLANET_FIELDS.scaledSemiMajorAxis.range);
    if (aR === undefined && rStarM !== undefined) {
      const au = d('planet.semiMajorAxisAu', p.semiMajorAxisAu, PLANET_FIELDS.semiMajorAxisAu.range);
      if (au !== undefined) aR = (au * M_PER_AU) / rStarM;
      else if (periodS !== undefined && mStarKg !== undefined) aR = semiMajorAxisFromPeriodM(periodS, mStarKg, mPlanetKg ?? 0) / rStarM;
    }
    if (k === undefined || aR === undefined) {
      throw new HesperError('invalid-input', 'geometry incomplete', [{ path: 'planet', message: 'radius ratio or scaled semi-major axis cannot be formed from the inputs' }]);
    }
    if (!(k > 0 && k < 1 && aR > 1 + k)) continue; // derived geometry outside the allowed range: redraw
    if (periodS === undefined && rStarM !== undefined && mStarKg !== undefined) {
      periodS = periodFromSemiMajorAxisS(aR * rStarM, mStarKg, mPlanetKg ?? 0);
    }
    const inclinationRad = (d('planet.inclinationDeg', p.inclinationDeg, PLANET_FIELDS.inclinationDeg.range) ?? 90) * DEG;
    const n: Nuisance = {
      teffK,
      radiusRatio: k,
      scaledSemiMajorAxis: aR,
      inclinationRad,
      redistribution: d('assumptions.redistribution', a.redistribution, ASSUMPTION_FIELDS.redistribution.range)!,
      phaseIntegral: d('assumptions.phaseIntegral', a.phaseIntegral, ASSUMPTION_FIELDS.phaseIntegral.range)!,
      limbDarkeningU: d('assumptions.limbDarkening', a.limbDarkening, ASSUMPTION_FIELDS.limbDarkening.range) ?? NaN,
      gravityDarkeningG: d('assumptions.gravityDarkening', a.gravityDarkening, ASSUMPTION_FIELDS.gravityDarkening.range) ?? NaN,
      // Always present (undefined when unknown), so every draw has the same object shape
      // and the grid loop stays monomorphic.
      planetMassKg: undefined,
      starMassKg: undefined,
      periodS,
    };
    if (mPlanetKg !== undefined && mStarKg !== undefined && periodS !== undefined) {
      n.planetMassKg = mPlanetKg;
      n.starMassKg = mStarKg;
    }
    return n;
  }
  throw new HesperError('out-of-range', 'no valid geometry', [
    { path: 'planet', message: `${MAX_GEOMETRY_REDRAWS} draws in a row gave Rp/R* outside (0, 1) or a/R* <= 1 + Rp/R*; check the radii and the orbit`, allowed: '0 < Rp/R* < 1, a/R* > 1 + Rp/R*' },
  ]);
}

function mul(x: number | undefined, f: number): number | undefined {
  return x === undefined ? undefined : x * f;
}
