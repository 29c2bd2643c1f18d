/**
 * Thermal emission of the planet in a band, blackbody planet and star:
 *   delta_th = k^2 F_band(T_day) / F_band(T*)        (derived)
 * Phase variation, two-hemisphere approximation (common practice):
 *   F_th(alpha) = F_n + (F_d - F_n)(1 + cos alpha)/2, peak-to-trough (F_d - F_n) sin i.
 * All results are fractions of the stellar flux (multiply by 1e6 for ppm).
 */
import { requireInRange, requirePositive } from '../errors.ts';
import { bandFluxRatio, logBandFlux, type Band } from './bandpass.ts';
import { requireInclination, requireRadiusRatio, requireTemperatureK } from './guards.ts';
import type { Weighting } from './planck.ts';
import { phaseAngleRad } from './reflection.ts';
import { bisect } from './solve.ts';

/** Thermal eclipse depth k^2 F_band(T_day) / F_band(T*). */
export function thermalEclipseDepth(
  radiusRatio: number, daysideTempK: number, starTeffK: number, band: Band, weighting: Weighting = 'photon',
): number {
  requireRadiusRatio('radiusRatio', radiusRatio);
  requireTemperatureK('daysideTempK', daysideTempK);
  requirePositive('starTeffK', starTeffK);
  return radiusRatio ** 2 * bandFluxRatio(band, daysideTempK, starTeffK, weighting);
}

/** Nightside thermal flux ratio k^2 F_band(T_night) / F_band(T*) (the flux at transit phase). */
export function nightsideFluxRatio(
  radiusRatio: number, nightsideTempK: number, starTeffK: number, band: Band, weighting: Weighting = 'photon',
): number {
  requireRadiusRatio('radiusRatio', radiusRatio);
  requireTemperatureK('nightsideTempK', nightsideTempK);
  requirePositive('starTeffK', starTeffK);
  return radiusRatio ** 2 * bandFluxRatio(band, nightsideTempK, starTeffK, weighting);
}

/**
 * Peak-to-trough thermal phase amplitude (F_d - F_n) sin i, F the planet-to-star flux
 * ratios of the two hemispheres. Signed: negative if the nightside is the hotter one.
 */
export function thermalPhaseAmplitude(
  radiusRatio: number, daysideTempK: number, nightsideTempK: number, starTeffK: number, inclinationRad: number,
  band: Band, weighting: Weighting = 'photon',
): number {
  requireInclination('inclinationRad', inclinationRad);
  const day = thermalEclipseDepth(radiusRatio, daysideTempK, starTeffK, band, weighting);
  const night = nightsideFluxRatio(radiusRatio, nightsideTempK, starTeffK, band, weighting);
  return (day - night) * Math.sin(inclinationRad);
}

/** Thermal flux ratio at orbital phase phi (0 at transit) in the two-hemisphere approximation. */
export function thermalFluxRatioAtPhase(
  radiusRatio: number, daysideTempK: number, nightsideTempK: number, starTeffK: number, inclinationRad: number,
  orbitalPhase: number, band: Band, weighting: Weighting = 'photon',
): number {
  const alpha = phaseAngleRad(orbitalPhase, inclinationRad);
  const day = thermalEclipseDepth(radiusRatio, daysideTempK, starTeffK, band, weighting);
  const night = nightsideFluxRatio(radiusRatio, nightsideTempK, starTeffK, band, weighting);
  return night + ((day - night) * (1 + Math.cos(alpha))) / 2;
}

/** Brightness temperatures are solved within these bounds [K]. */
export const BRIGHTNESS_TEMPERATURE_RANGE_K: readonly [number, number] = [1, 1e5];

/**
 * Band brightness temperature [K]: the blackbody temperature whose thermal eclipse depth
 * in this band equals `eclipseDepth` (bisection in ln T within 1 K .. 1e5 K).
 */
export function brightnessTemperatureK(
  radiusRatio: number, eclipseDepth: number, starTeffK: number, band: Band, weighting: Weighting = 'photon',
): number {
  requireRadiusRatio('radiusRatio', radiusRatio);
  requirePositive('eclipseDepth', eclipseDepth);
  requirePositive('starTeffK', starTeffK);
  const [lo, hi] = BRIGHTNESS_TEMPERATURE_RANGE_K;
  const maxDepth = thermalEclipseDepth(radiusRatio, hi, starTeffK, band, weighting);
  requireInRange('eclipseDepth', eclipseDepth, { max: maxDepth });
  // Residual in log space so that it stays finite where the flux itself underflows.
  const offset = 2 * Math.log(radiusRatio) - logBandFlux(band, starTeffK, weighting) - Math.log(eclipseDepth);
  const residual = (lnT: number): number => logBandFlux(band, Math.exp(lnT), weighting) + offset;
  return Math.exp(bisect(residual, Math.log(lo), Math.log(hi), { relTol: 1e-13, what: 'brightnessTemperatureK' }));
}
