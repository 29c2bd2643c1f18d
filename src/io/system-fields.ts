/**
 * Canonical unit and physical range of every quantity field of the system file.
 * Ranges are what the formulas allow (a/R* > 1, 0 < Rp/R* < 1, ...); the stellar
 * temperature range is that of the band-flux tables.
 */
import type { FieldSpec } from './distribution.ts';

const positive = { min: 0, minExclusive: true } as const;
const any = {} as const;

export const STAR_FIELDS = {
  teffK: { unit: 'K', range: { min: 1500, max: 20000 } },
  radiusRsun: { unit: 'Rsun', range: positive },
  massMsun: { unit: 'Msun', range: positive },
} satisfies Record<string, FieldSpec>;

export const PLANET_FIELDS = {
  radiusRatio: { unit: '', range: { min: 0, max: 1, minExclusive: true, maxExclusive: true } },
  radiusRjup: { unit: 'Rjup', range: positive },
  radiusRearth: { unit: 'Rearth', range: positive },
  scaledSemiMajorAxis: { unit: '', range: { min: 1, minExclusive: true } },
  semiMajorAxisAu: { unit: 'au', range: positive },
  periodDays: { unit: 'day', range: positive },
  inclinationDeg: { unit: 'deg', range: { min: 0, max: 180 } },
  massMjup: { unit: 'Mjup', range: positive },
  massMearth: { unit: 'Mearth', range: positive },
} satisfies Record<string, FieldSpec>;

export const MEASUREMENT_FIELDS = {
  eclipseDepthPpm: { unit: 'ppm', range: any },
  phaseAmplitudePpm: { unit: 'ppm', range: any },
  phaseSemiAmplitudePpm: { unit: 'ppm', range: any },
  nightsideFluxPpm: { unit: 'ppm', range: any },
  daysideTemperatureK: { unit: 'K', range: positive },
  phaseOffsetDeg: { unit: 'deg', range: { min: -180, max: 180 } },
  ellipsoidalAmplitudePpm: { unit: 'ppm', range: any },
  beamingAmplitudePpm: { unit: 'ppm', range: any },
} satisfies Record<string, FieldSpec>;

export const ASSUMPTION_FIELDS = {
  redistribution: { unit: '', range: { min: 0, max: 1 } },
  // Phase integrals of Solar System bodies run from about 0.7 (Charon, Buratti et al.
  // 2019) to 1.5 (Lambert); 2 leaves room for strongly forward-scattering clouds.
  phaseIntegral: { unit: '', range: { min: 0.5, max: 2 } },
  limbDarkening: { unit: '', range: { min: 0, max: 1 } },
  gravityDarkening: { unit: '', range: { min: 0, max: 1.5 } },
} satisfies Record<string, FieldSpec>;
