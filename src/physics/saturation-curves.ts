/**
 * Volatile condensates without a fit of the 10^4/T form: the
 * cloud base is where the saturation vapour pressure equals the partial pressure,
 * p_sat(T) = x P, with x the volume mixing ratio of the species (scaled by 10^[M/H]).
 */
import type { Provenance } from './bands-builtin.ts';
import { FIT_METALLICITY_RANGE_DEX, FIT_PRESSURE_RANGE_BAR } from './condensation-curves.ts';

export interface SaturationCurve {
  /** Saturation vapour pressure [bar] at temperature T [K]. */
  readonly saturationPressureBar: (temperatureK: number) => number;
  /** Bracket searched for T_cond [K] (below the critical point, above the formula's pole). */
  readonly searchRangeK: readonly [number, number];
  /** Range the vapour-pressure formula was fitted over; outside it a warning is returned. */
  readonly temperatureRangeK: readonly [number, number];
  /** Volume mixing ratio at solar metallicity (all of the element in this molecule). */
  readonly solarMixingRatio: number;
  readonly source: string;
  readonly status: Provenance;
  readonly note: string;
  readonly pressureRangeBar: readonly [number, number];
  readonly metallicityRangeDex: readonly [number, number];
}

// Solar abundances log eps (H = 12): He 10.93, C 8.43, N 7.83, O 8.69 (Asplund, Grevesse,
// Sauval & Scott 2009, ARA&A 47, 481; memory). In an H2-He gas there are 0.5 + He/H molecules
// per H atom, so x = (X/H) / (0.5 + He/H) if all of element X is in the molecule (derived).
const HE_PER_H = 10 ** (10.93 - 12);
const MOLECULES_PER_H = 0.5 + HE_PER_H;
const solarX = (logEps: number): number => 10 ** (logEps - 12) / MOLECULES_PER_H;

const HPA_PER_BAR = 1000; // 1 bar = 1000 hPa (SI definition of the bar)
const ZERO_CELSIUS_K = 273.15; // SI definition of the Celsius scale

/**
 * Water: Buck's equations, over liquid water above 0 degC and over ice below
 * (Buck 1981, J. Appl. Meteorol. 20, 1527, as revised in the Buck Research CR-1A manual 1996;
 * liquid form secondary (restated), ice form memory). T in degC, e in hPa:
 *   water: e = 6.1121 exp((18.678 - t/234.5) t / (257.14 + t))
 *   ice:   e = 6.1115 exp((23.036 - t/333.7) t / (279.82 + t))
 */
function waterSaturationBar(temperatureK: number): number {
  const t = temperatureK - ZERO_CELSIUS_K;
  const hPa = t >= 0
    ? 6.1121 * Math.exp(((18.678 - t / 234.5) * t) / (257.14 + t))
    : 6.1115 * Math.exp(((23.036 - t / 333.7) * t) / (279.82 + t));
  return hPa / HPA_PER_BAR;
}

/** Ammonia: ln p[bar] = 10.53 - 2161/T - 86596/T^2 (secondary: quoted without its primary source; from memory). */
function ammoniaSaturationBar(temperatureK: number): number {
  return Math.exp(10.53 - 2161 / temperatureK - 86596 / temperatureK ** 2);
}

// Methane: Clausius-Clapeyron through the triple point (90.68 K, 0.11719 bar; secondary,
// from memory) and the normal boiling point (111.67 K at 1.01325 bar; memory). L/R from the two (derived).
const CH4_TRIPLE_K = 90.68;
const CH4_TRIPLE_BAR = 0.11719;
const CH4_BOILING_K = 111.67;
const STANDARD_ATMOSPHERE_BAR = 1.01325; // 101325 Pa by definition
const CH4_L_OVER_R_K = Math.log(STANDARD_ATMOSPHERE_BAR / CH4_TRIPLE_BAR) / (1 / CH4_TRIPLE_K - 1 / CH4_BOILING_K);

function methaneSaturationBar(temperatureK: number): number {
  return CH4_TRIPLE_BAR * Math.exp(-CH4_L_OVER_R_K * (1 / temperatureK - 1 / CH4_TRIPLE_K));
}

const common = { pressureRangeBar: FIT_PRESSURE_RANGE_BAR, metallicityRangeDex: FIT_METALLICITY_RANGE_DEX };

export const SATURATION_CURVES: Readonly<Record<string, SaturationCurve>> = Object.freeze({
  H2O: Object.freeze({
    ...common,
    saturationPressureBar: waterSaturationBar,
    searchRangeK: [60, 640] as const,
    temperatureRangeK: [193, 323] as const, // Buck's stated range, about -80..+50 degC (memory)
    solarMixingRatio: solarX(8.69),
    source: 'Buck 1981, J. Appl. Meteorol. 20, 1527 (1996 revision); solar O from Asplund et al. 2009',
    status: 'secondary' as const,
    note: 'x assumes all O in H2O (an upper bound: O in silicates lowers it by roughly a fifth, memory)',
  }),
  NH3: Object.freeze({
    ...common,
    saturationPressureBar: ammoniaSaturationBar,
    searchRangeK: [40, 405] as const,
    temperatureRangeK: [150, 300] as const, // memory
    solarMixingRatio: solarX(7.83),
    source: 'vapour-pressure fit ln p = 10.53 - 2161/T - 86596/T^2 (secondary, from memory); solar N from Asplund et al. 2009',
    status: 'secondary' as const,
    note: 'x assumes all N in NH3',
  }),
  CH4: Object.freeze({
    ...common,
    saturationPressureBar: methaneSaturationBar,
    searchRangeK: [20, 190] as const,
    temperatureRangeK: [60, 190] as const, // triple point to near the critical point (190.6 K, memory)
    solarMixingRatio: solarX(8.43),
    source: 'Clausius-Clapeyron through the CH4 triple point (90.68 K, 0.11719 bar) and normal boiling point; solar C from Asplund et al. 2009',
    status: 'secondary' as const,
    note: 'x assumes all C in CH4 (cool atmospheres); one latent heat above and below the triple point',
  }),
});
