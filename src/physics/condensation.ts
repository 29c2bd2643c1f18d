/**
 * Condensation temperatures of cloud species at a pressure and metallicity: the fits of
 * condensation-curves.ts for refractory and salt species, saturation vapour pressure
 * (saturation-curves.ts) for H2O, NH3 and CH4. Outside a curve's validity range the
 * result carries warnings; it is not an error.
 */
import { inputError, requireFinite, requireInRange, requirePositive } from '../errors.ts';
import { CONDENSATION_CURVES, type CondensationCurve } from './condensation-curves.ts';
import { SATURATION_CURVES, type SaturationCurve } from './saturation-curves.ts';
import { bisect } from './solve.ts';

export { CONDENSATION_CURVES, type CondensationCurve } from './condensation-curves.ts';
export { SATURATION_CURVES, type SaturationCurve } from './saturation-curves.ts';

export interface CondensationResult {
  species: string;
  temperatureK: number;
  pressureBar: number;
  metallicityDex: number;
  method: 'fit' | 'saturation';
  /** False when a warning applies (pressure, metallicity or temperature outside the curve's range). */
  inValidityRange: boolean;
  warnings: string[];
  source: string;
  status: string;
}

export interface CondensationOptions {
  /** Volume mixing ratio at [M/H] = 0 for H2O, NH3, CH4 (default: solar, all of the element in the molecule). */
  solarMixingRatio?: number;
}

/** Every species with a curve: the fitted ones, then H2O, NH3, CH4. */
export function condensationSpecies(): string[] {
  return [...Object.keys(CONDENSATION_CURVES), ...Object.keys(SATURATION_CURVES)];
}

function findSpecies(species: string): string {
  const all = condensationSpecies();
  if (typeof species === 'string') {
    if (all.includes(species)) return species;
    const match = all.find((s) => s.toLowerCase() === species.trim().toLowerCase());
    if (match) return match;
  }
  throw inputError('unknown-species', 'species', `species = "${String(species)}": no condensation curve; known species are ${all.join(', ')}`, species, all.join(', '));
}

function rangeWarnings(name: string, pressureBar: number, metallicityDex: number, pRange: readonly [number, number], mRange: readonly [number, number]): string[] {
  const w: string[] = [];
  if (pressureBar < pRange[0] || pressureBar > pRange[1]) {
    w.push(`${name}: pressure ${pressureBar} bar is outside the curve's range ${pRange[0]}-${pRange[1]} bar; extrapolated`);
  }
  if (metallicityDex < mRange[0] || metallicityDex > mRange[1]) {
    w.push(`${name}: [M/H] = ${metallicityDex} is outside the curve's range ${mRange[0]} to +${mRange[1]} dex; extrapolated`);
  }
  return w;
}

function fromFit(name: string, c: CondensationCurve, pressureBar: number, metallicityDex: number): number {
  const logP = Math.log10(pressureBar);
  const inverse = c.a - c.b * logP + (c.quadratic ?? 0) * logP ** 2 - c.c * metallicityDex;
  if (!(inverse > 0)) {
    throw inputError('out-of-range', 'pressureBar', `${name}: the fit gives no condensation temperature at ${pressureBar} bar and [M/H] = ${metallicityDex} (10^4/T = ${inverse.toFixed(3)})`, pressureBar, `${c.pressureRangeBar[0]}-${c.pressureRangeBar[1]} bar`);
  }
  return 1e4 / inverse;
}

function fromSaturation(name: string, s: SaturationCurve, pressureBar: number, metallicityDex: number, solarX: number): number {
  const partialBar = solarX * 10 ** metallicityDex * pressureBar;
  const [lo, hi] = s.searchRangeK;
  const pLo = s.saturationPressureBar(lo);
  const pHi = s.saturationPressureBar(hi);
  if (!(partialBar > pLo && partialBar < pHi)) {
    throw inputError('out-of-range', 'pressureBar', `${name}: partial pressure ${partialBar.toExponential(3)} bar lies outside the vapour-pressure curve (${pLo.toExponential(3)}-${pHi.toExponential(3)} bar over ${lo}-${hi} K)`, pressureBar, `partial pressure within ${pLo.toExponential(2)}-${pHi.toExponential(2)} bar`);
  }
  // ln p_sat is monotonic in T; bisection on ln p_sat - ln(x P).
  return bisect((t) => Math.log(s.saturationPressureBar(t)) - Math.log(partialBar), lo, hi, { relTol: 1e-13, what: `condensation ${name}` });
}

/**
 * Condensation temperature with its validity report. pressureBar > 0; metallicityDex
 * finite. Throws `unknown-species` for a species without a curve.
 */
export function condensationTemperature(species: string, pressureBar: number, metallicityDex = 0, options: CondensationOptions = {}): CondensationResult {
  const name = findSpecies(species);
  requirePositive('pressureBar', pressureBar);
  requireFinite('metallicityDex', metallicityDex);
  const fit = CONDENSATION_CURVES[name];
  if (fit) {
    const warnings = rangeWarnings(name, pressureBar, metallicityDex, fit.pressureRangeBar, fit.metallicityRangeDex);
    return {
      species: name, temperatureK: fromFit(name, fit, pressureBar, metallicityDex), pressureBar, metallicityDex, method: 'fit',
      inValidityRange: warnings.length === 0, warnings, source: fit.source, status: fit.status,
    };
  }
  const sat = SATURATION_CURVES[name]!;
  const solarX = options.solarMixingRatio ?? sat.solarMixingRatio;
  requireInRange('solarMixingRatio', solarX, { min: 0, max: 1, minExclusive: true });
  const temperatureK = fromSaturation(name, sat, pressureBar, metallicityDex, solarX);
  const warnings = rangeWarnings(name, pressureBar, metallicityDex, sat.pressureRangeBar, sat.metallicityRangeDex);
  const [tLo, tHi] = sat.temperatureRangeK;
  if (temperatureK < tLo || temperatureK > tHi) {
    warnings.push(`${name}: ${temperatureK.toFixed(1)} K is outside the vapour-pressure formula's range ${tLo}-${tHi} K; extrapolated`);
  }
  return {
    species: name, temperatureK, pressureBar, metallicityDex, method: 'saturation',
    inValidityRange: warnings.length === 0, warnings, source: sat.source, status: sat.status,
  };
}

/** Condensation temperature [K] alone (use condensationTemperature for the validity warnings). */
export function condensationTemperatureK(species: string, pressureBar: number, metallicityDex = 0): number {
  return condensationTemperature(species, pressureBar, metallicityDex).temperatureK;
}
