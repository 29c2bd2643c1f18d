/**
 * Canonical unit and physical range of every quantity field of the system file.
 * Ranges are what the formulas allow (a/R* > 1, 0 < Rp/R* < 1, ...); the stellar
 * temperature range is that of the band-flux tables.
 */
import { isotropicPhaseIntegral } from '../physics/isotropic-phase-integral.ts';
import type { FieldSpec } from './distribution.ts';

/**
 * Default prior of the phase integral q, uniform on [1, q_max]. It covers the scattering
 * laws the catalog conversion uses: conservative Rayleigh scattering (q = 1.25, derived
 * from A_g = 0.796 of Schmid, Joos & Tschan 2006, A&A 452, 657), the Lambert sphere
 * (1.5) and semi-infinite isotropic scatterers with single-scattering albedo w from
 * 0.5 to 1 (q = 1.45 at w = 1 rising to 1.61 at w = 0.5, computed with the H-function:
 * isotropicPhaseIntegral). q_max is q(w = 0.5) rounded up to 0.01. The lower end 1
 * leaves room for backscattering surfaces and clouds below the Rayleigh value.
 */
export const DEFAULT_PHASE_INTEGRAL = { min: 1, max: Math.ceil(isotropicPhaseIntegral(0.5) * 100) / 100 } as const;

const positive = { min: 0, minExclusive: true } as const;
const any = {} as const;

/** Units of depths and amplitudes, with their factor to ppm. */
export const PPM_FACTORS = { ppm: 1, ppt: 1e3, '%': 1e4 } as const;
const ppm = { unit: 'ppm', range: any, accepts: Object.keys(PPM_FACTORS), factors: PPM_FACTORS };
const pure = ['', '1'];
const length = (canonical: string) => [canonical, 'Rsun', 'Rjup', 'Rearth', 'au', 'km', 'm'];
const mass = (canonical: string) => [canonical, 'Msun', 'Mjup', 'Mearth', 'kg'];

export const STAR_FIELDS = {
  teffK: { unit: 'K', range: { min: 1500, max: 20000 }, accepts: ['K', 'degC'] },
  radiusRsun: { unit: 'Rsun', range: positive, accepts: length('Rsun') },
  massMsun: { unit: 'Msun', range: positive, accepts: mass('Msun') },
} satisfies Record<string, FieldSpec>;

export const PLANET_FIELDS = {
  radiusRatio: { unit: '', range: { min: 0, max: 1, minExclusive: true, maxExclusive: true }, accepts: pure },
  radiusRjup: { unit: 'Rjup', range: positive, accepts: length('Rjup') },
  radiusRearth: { unit: 'Rearth', range: positive, accepts: length('Rearth') },
  scaledSemiMajorAxis: { unit: '', range: { min: 1, minExclusive: true }, accepts: pure },
  semiMajorAxisAu: { unit: 'au', range: positive, accepts: length('au') },
  periodDays: { unit: 'day', range: positive, accepts: ['day', 'h', 'min', 's'] },
  inclinationDeg: { unit: 'deg', range: { min: 0, max: 180 }, accepts: ['deg', 'rad'] },
  massMjup: { unit: 'Mjup', range: positive, accepts: mass('Mjup') },
  massMearth: { unit: 'Mearth', range: positive, accepts: mass('Mearth') },
} satisfies Record<string, FieldSpec>;

export const MEASUREMENT_FIELDS = {
  eclipseDepthPpm: ppm,
  phaseAmplitudePpm: ppm,
  phaseSemiAmplitudePpm: ppm,
  nightsideFluxPpm: ppm,
  daysideTemperatureK: { unit: 'K', range: positive, accepts: ['K', 'degC'] },
  phaseOffsetDeg: { unit: 'deg', range: { min: -180, max: 180 }, accepts: ['deg', 'rad'] },
  ellipsoidalAmplitudePpm: ppm,
  beamingAmplitudePpm: ppm,
} satisfies Record<string, FieldSpec>;

export const ASSUMPTION_FIELDS = {
  redistribution: { unit: '', range: { min: 0, max: 1 }, accepts: pure },
  // Phase integrals of Solar System bodies run from about 0.7 (Charon, Buratti et al.
  // 2019) to 1.5 (Lambert); 2 leaves room for strongly forward-scattering clouds.
  phaseIntegral: { unit: '', range: { min: 0.5, max: 2 }, accepts: pure },
  limbDarkening: { unit: '', range: { min: 0, max: 1 }, accepts: pure },
  gravityDarkening: { unit: '', range: { min: 0, max: 1.5 }, accepts: pure },
} satisfies Record<string, FieldSpec>;
