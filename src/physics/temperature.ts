/**
 * Planetary temperatures (Cowan & Agol 2011, ApJ 729, 54, arXiv:1001.0012):
 *   T0 = T* aR^(-1/2)                                    (checked)
 *   T_day = T0 (1 - A_B)^(1/4) (2/3 - 5 eps/12)^(1/4)     (secondary)
 *   T_night = T0 (1 - A_B)^(1/4) (eps/4)^(1/4)           (secondary)
 * eps = 0: no redistribution (dayside (2/3)^(1/4) T0 for A_B = 0, checked); eps = 1: uniform,
 * both equal the equilibrium temperature T0 (1 - A_B)^(1/4) / sqrt(2).
 * Energy balance from an irradiance S: T_eq = [S (1 - A_B) / (4 sigma)]^(1/4) (common practice).
 */
import { requireInRange, requirePositive } from '../errors.ts';
import { SIGMA_SB_W_PER_M2_K4 } from './constants.ts';
import { requireBondAlbedo, requireRedistribution, requireScaledSemiMajorAxis } from './guards.ts';

/** Irradiation temperature T0 = T* (R* / a)^(1/2) [K]. */
export function irradiationTemperatureK(teffK: number, scaledSemiMajorAxis: number): number {
  requirePositive('teffK', teffK);
  requireScaledSemiMajorAxis('scaledSemiMajorAxis', scaledSemiMajorAxis);
  return teffK / Math.sqrt(scaledSemiMajorAxis);
}

/** Dayside temperature for Bond albedo A_B and redistribution efficiency eps in [0, 1] [K]. */
export function daysideTemperatureK(teffK: number, scaledSemiMajorAxis: number, bondAlbedo: number, redistribution: number): number {
  const t0 = irradiationTemperatureK(teffK, scaledSemiMajorAxis);
  requireBondAlbedo('bondAlbedo', bondAlbedo);
  requireRedistribution('redistribution', redistribution);
  return t0 * ((1 - bondAlbedo) * (2 / 3 - (5 * redistribution) / 12)) ** 0.25;
}

/** Nightside temperature [K] (0 K for eps = 0). */
export function nightsideTemperatureK(teffK: number, scaledSemiMajorAxis: number, bondAlbedo: number, redistribution: number): number {
  const t0 = irradiationTemperatureK(teffK, scaledSemiMajorAxis);
  requireBondAlbedo('bondAlbedo', bondAlbedo);
  requireRedistribution('redistribution', redistribution);
  return t0 * ((1 - bondAlbedo) * (redistribution / 4)) ** 0.25;
}

/** Equilibrium temperature with full redistribution, T0 (1 - A_B)^(1/4) / sqrt(2) [K]. */
export function equilibriumTemperatureK(teffK: number, scaledSemiMajorAxis: number, bondAlbedo: number): number {
  const t0 = irradiationTemperatureK(teffK, scaledSemiMajorAxis);
  requireBondAlbedo('bondAlbedo', bondAlbedo);
  return (t0 * (1 - bondAlbedo) ** 0.25) / Math.SQRT2;
}

/** Equilibrium temperature from the stellar irradiance S at the planet [K]. */
export function equilibriumTemperatureFromIrradianceK(irradianceWPerM2: number, bondAlbedo: number): number {
  requireInRange('irradianceWPerM2', irradianceWPerM2, { min: 0 });
  requireBondAlbedo('bondAlbedo', bondAlbedo);
  return ((irradianceWPerM2 * (1 - bondAlbedo)) / (4 * SIGMA_SB_W_PER_M2_K4)) ** 0.25;
}

/** Bolometric luminosity of a blackbody star, 4 pi R^2 sigma T^4 [W]. */
export function stellarLuminosityW(radiusM: number, teffK: number): number {
  requirePositive('radiusM', radiusM);
  requirePositive('teffK', teffK);
  return 4 * Math.PI * radiusM ** 2 * SIGMA_SB_W_PER_M2_K4 * teffK ** 4;
}

/** Irradiance at distance d from a source of luminosity L, L / (4 pi d^2) [W m^-2]. */
export function irradianceWPerM2(luminosityW: number, distanceM: number): number {
  requireInRange('luminosityW', luminosityW, { min: 0 });
  requirePositive('distanceM', distanceM);
  return luminosityW / (4 * Math.PI * distanceM ** 2);
}
