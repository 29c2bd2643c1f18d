/**
 * Physical and astronomical constants, SI. Each base constant is a record with its
 * value, unit and reference; derived constants are computed from base ones, never
 * retyped. Status tags: checked (seen in the source), secondary, derived, memory.
 */

export interface Constant {
  readonly value: number;
  readonly unit: string;
  readonly reference: string;
}

function c(value: number, unit: string, reference: string): Constant {
  return Object.freeze({ value, unit, reference });
}

/** Planck constant, exact (CODATA 2018; checked). */
export const PLANCK_H = c(6.62607015e-34, 'J s', 'CODATA 2018 (exact)');
/** Speed of light in vacuum, exact (CODATA 2018; checked). */
export const SPEED_OF_LIGHT = c(299792458, 'm s^-1', 'CODATA 2018 (exact)');
/** Boltzmann constant, exact (CODATA 2018; checked). */
export const BOLTZMANN_K = c(1.380649e-23, 'J K^-1', 'CODATA 2018 (exact)');
/** Newtonian constant of gravitation (CODATA 2018; checked). */
export const GRAVITATIONAL_G = c(6.6743e-11, 'm^3 kg^-1 s^-2', 'CODATA 2018');

/** Nominal solar radius (IAU 2015 Resolution B3; checked). */
export const SOLAR_RADIUS = c(6.957e8, 'm', 'IAU 2015 Resolution B3 (nominal)');
/** Nominal solar luminosity (IAU 2015 Resolution B3; checked). */
export const SOLAR_LUMINOSITY = c(3.828e26, 'W', 'IAU 2015 Resolution B3 (nominal)');
/** Nominal solar effective temperature (IAU 2015 Resolution B3; secondary). */
export const SOLAR_TEFF = c(5772, 'K', 'IAU 2015 Resolution B3 (nominal)');
/** Nominal total solar irradiance (IAU 2015 Resolution B3; memory, = L/(4 pi au^2) to 0.02 %). */
export const SOLAR_IRRADIANCE = c(1361, 'W m^-2', 'IAU 2015 Resolution B3 (nominal)');
/** Nominal solar mass parameter GM (IAU 2015 Resolution B3; checked). */
export const SOLAR_GM = c(1.3271244e20, 'm^3 s^-2', 'IAU 2015 Resolution B3 (nominal)');
/** Nominal Jupiter equatorial radius (IAU 2015 Resolution B3; checked). */
export const JUPITER_RADIUS_EQUATORIAL = c(7.1492e7, 'm', 'IAU 2015 Resolution B3 (nominal)');
/** Nominal Jupiter polar radius (IAU 2015 Resolution B3; secondary: restated as 66854 km in the NASA Jupiter fact sheet and astronomy-engine). */
export const JUPITER_RADIUS_POLAR = c(6.6854e7, 'm', 'IAU 2015 Resolution B3 (nominal)');
/** Nominal Jupiter mass parameter GM (IAU 2015 Resolution B3; checked). */
export const JUPITER_GM = c(1.2668653e17, 'm^3 s^-2', 'IAU 2015 Resolution B3 (nominal)');
/** Nominal Earth equatorial radius (IAU 2015 Resolution B3; checked). */
export const EARTH_RADIUS_EQUATORIAL = c(6.3781e6, 'm', 'IAU 2015 Resolution B3 (nominal)');
/** Nominal Earth mass parameter GM (IAU 2015 Resolution B3; checked). */
export const EARTH_GM = c(3.986004e14, 'm^3 s^-2', 'IAU 2015 Resolution B3 (nominal)');
/** Astronomical unit, exact (IAU 2012 Resolution B2; checked). */
export const ASTRONOMICAL_UNIT = c(149597870700, 'm', 'IAU 2012 Resolution B2 (exact)');

/** Julian day in seconds (IAU definition, exact; common practice). */
export const DAY = c(86400, 's', 'IAU (exact, 86400 SI seconds)');

/** All base constants, for listing and tests. */
export const BASE_CONSTANTS = {
  PLANCK_H, SPEED_OF_LIGHT, BOLTZMANN_K, GRAVITATIONAL_G, SOLAR_RADIUS, SOLAR_LUMINOSITY,
  SOLAR_TEFF, SOLAR_IRRADIANCE, SOLAR_GM, JUPITER_RADIUS_EQUATORIAL, JUPITER_RADIUS_POLAR, JUPITER_GM,
  EARTH_RADIUS_EQUATORIAL, EARTH_GM, ASTRONOMICAL_UNIT, DAY,
} as const;

// ---- Plain numbers for hot paths (SI). ----
export const H_J_S = PLANCK_H.value;
export const C_M_PER_S = SPEED_OF_LIGHT.value;
export const KB_J_PER_K = BOLTZMANN_K.value;
export const G_SI = GRAVITATIONAL_G.value;
export const M_PER_AU = ASTRONOMICAL_UNIT.value;
export const M_PER_RSUN = SOLAR_RADIUS.value;
export const M_PER_RJUP = JUPITER_RADIUS_EQUATORIAL.value;
export const M_PER_REARTH = EARTH_RADIUS_EQUATORIAL.value;
export const S_PER_DAY = DAY.value;

// ---- Derived constants: computed, not retyped. ----
/** Stefan-Boltzmann constant sigma = 2 pi^5 k^4 / (15 h^3 c^2); CODATA 2018 lists 5.670374419e-8. */
export const SIGMA_SB_W_PER_M2_K4 = (2 * Math.PI ** 5 * KB_J_PER_K ** 4) / (15 * H_J_S ** 3 * C_M_PER_S ** 2);
/** Second radiation constant hc/k_B [m K]. */
export const C2_M_K = (H_J_S * C_M_PER_S) / KB_J_PER_K;
/** Wien displacement constant b = hc / (k_B x), x the root of x = 5 (1 - e^-x); CODATA 2018 lists 2.897771955e-3 m K. */
export const WIEN_B_M_K = C2_M_K / solveWienX();
/** Masses from the nominal GM values and CODATA G (IAU 2015 B3 recommends GM; masses follow). */
export const KG_PER_MSUN = SOLAR_GM.value / G_SI;
export const KG_PER_MJUP = JUPITER_GM.value / G_SI;
export const KG_PER_MEARTH = EARTH_GM.value / G_SI;

/** Root of x = 5 (1 - exp(-x)) by fixed-point iteration (converges: derivative 5 e^-x < 0.04 near 4.97). */
function solveWienX(): number {
  let x = 5;
  for (let i = 0; i < 100; i++) {
    const next = 5 * (1 - Math.exp(-x));
    if (Math.abs(next - x) < 1e-15) return next;
    x = next;
  }
  return x;
}
