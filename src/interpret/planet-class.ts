/**
 * Planet class for the cloud-free ceiling: rocky (bare rock or lava can be the
 * surface seen) or giant (gas-rich: a clear atmosphere is the cloud-free case).
 * assumptions.planetClass decides when it is not "auto"; otherwise the radius does,
 * against the radius valley: Fulton et al. 2017 (AJ 154, 109, doi:10.3847/1538-3881/aa80eb;
 * abstract checked) find a deficit of planets at 1.5-2.0 R_earth separating rocky cores
 * of <= 1.5 R_earth from planets with gas envelopes. Inside the valley the class is
 * "either" and the verdict uses the higher of the two ceilings.
 */
import { centralValue } from '../io/distribution.ts';
import type { SystemInput } from '../io/system.ts';
import { M_PER_REARTH, M_PER_RJUP, M_PER_RSUN } from '../physics/constants.ts';
import type { PlanetClassReading } from './types.ts';

/** Radius valley edges [R_earth] (Fulton et al. 2017). */
export const ROCKY_MAX_REARTH = 1.5;
export const GAS_RICH_MIN_REARTH = 2.0;

const VALLEY = 'the radius valley at 1.5-2.0 R_earth (Fulton et al. 2017)';

function classOf(radiusRearth: number): PlanetClassReading['planetClass'] {
  if (radiusRearth <= ROCKY_MAX_REARTH) return 'rocky';
  if (radiusRearth >= GAS_RICH_MIN_REARTH) return 'giant';
  return 'either';
}

function words(c: PlanetClassReading['planetClass']): string {
  return c === 'rocky' ? 'rocky (bare rock or lava possible)' : c === 'giant' ? 'giant (gas-rich)' : 'rocky or gas-rich (inside the valley)';
}

const f = (x: number) => Number(x.toPrecision(3)).toString();

export function planetClassOf(s: SystemInput): PlanetClassReading {
  const chosen = s.assumptions.planetClass;
  const p = s.planet;
  let radiusRearth: number | null = null;
  let how = '';
  if (p.radiusRearth) {
    radiusRearth = centralValue(p.radiusRearth);
    how = 'given';
  } else if (p.radiusRjup) {
    radiusRearth = (centralValue(p.radiusRjup) * M_PER_RJUP) / M_PER_REARTH;
    how = 'from radiusRjup';
  } else if (p.radiusRatio && s.star.radiusRsun) {
    radiusRearth = (centralValue(p.radiusRatio) * centralValue(s.star.radiusRsun) * M_PER_RSUN) / M_PER_REARTH;
    how = 'from Rp/R* and the stellar radius';
  }
  if (chosen !== 'auto') {
    const r = radiusRearth === null ? '' : ` (radius ${f(radiusRearth)} R_earth)`;
    return { planetClass: chosen, basis: 'assumption', radiusRearth, text: `planet class ${words(chosen)} as given in assumptions.planetClass${r}` };
  }
  if (radiusRearth !== null) {
    const c = classOf(radiusRearth);
    return { planetClass: c, basis: 'radius', radiusRearth, text: `planet class ${words(c)}: radius ${f(radiusRearth)} R_earth (${how}) against ${VALLEY}` };
  }
  // No stellar radius: Rp/R* alone. Fallback stated in the reason: R* = 1 R_sun, and the
  // stellar radius that would move the planet across the valley.
  const k = centralValue(p.radiusRatio!);
  const rearthPerRsun = M_PER_RSUN / M_PER_REARTH;
  const r1 = k * rearthPerRsun;
  const c = classOf(r1);
  const edge = c === 'rocky' ? GAS_RICH_MIN_REARTH : ROCKY_MAX_REARTH;
  const rStar = edge / (k * rearthPerRsun);
  const change = c === 'giant'
    ? `it would be rocky only if R* < ${f(rStar)} R_sun`
    : c === 'rocky' ? `it would be gas-rich only if R* > ${f(rStar)} R_sun` : 'the true stellar radius decides';
  return {
    planetClass: c,
    basis: 'radius',
    radiusRearth: r1,
    text: `planet class ${words(c)}: the stellar radius is not given, so the radius ${f(r1)} R_earth assumes R* = 1 R_sun (${change}), against ${VALLEY}`,
  };
}
