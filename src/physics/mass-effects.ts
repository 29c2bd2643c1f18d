/**
 * Signals the planet's mass induces in the star's light, as fractions of the stellar flux.
 *
 * - RV semi-amplitude K = (2 pi G / P)^(1/3) Mp sin i / (M* + Mp)^(2/3) / sqrt(1 - e^2)
 *   (textbook, memory; G from CODATA 2018).
 * - Doppler beaming (Loeb & Gaudi 2003, ApJ 588, L117, checked): A_beam = alpha_beam 4 K / c,
 *   alpha_beam = <x e^x / (e^x - 1)> / 4, x = hc / (lambda k T*), averaged over the band
 *   weighted by the stellar photon flux and the response (derived). Signal ~ +sin(2 pi phi).
 * - Ellipsoidal variation (Morris 1985, ApJ 295, 143; Morris & Naftilan 1993, ApJ 419, 344;
 *   form of Faigler & Mazeh 2011, MNRAS 415, 3921 and Shporer et al. 2019, AJ 157, 178 eq. 9;
 *   secondary): A_ellip = alpha_ellip (Mp/M*) (R* / a)^3 sin^2 i,
 *   alpha_ellip = 0.15 (15 + u)(1 + g) / (3 - u). Signal ~ -cos(4 pi phi).
 */
import { requireInRange, requireNonNegative, requirePositive } from '../errors.ts';
import { bandLogSlope, type Band } from './bandpass.ts';
import { C_M_PER_S, G_SI } from './constants.ts';
import { requireInclination, requireScaledSemiMajorAxis } from './guards.ts';
import { planckLogTemperatureSlope } from './planck.ts';

/** Allowed linear limb-darkening coefficient u (intensity stays positive across the disc). */
export const LIMB_DARKENING_RANGE: readonly [number, number] = [0, 1];
/** Allowed gravity-darkening coefficient g (band values reach ~1 for hot stars; common practice). */
export const GRAVITY_DARKENING_RANGE: readonly [number, number] = [0, 2];

/** Stellar RV semi-amplitude K [m/s]. */
export function rvSemiAmplitudeMs(
  periodS: number, planetMassKg: number, starMassKg: number, inclinationRad: number, eccentricity = 0,
): number {
  requirePositive('periodS', periodS);
  requireNonNegative('planetMassKg', planetMassKg);
  requirePositive('starMassKg', starMassKg);
  requireInclination('inclinationRad', inclinationRad);
  requireInRange('eccentricity', eccentricity, { min: 0, max: 1, maxExclusive: true });
  return (
    (((2 * Math.PI * G_SI) / periodS) ** (1 / 3) * planetMassKg * Math.sin(inclinationRad)) /
    (starMassKg + planetMassKg) ** (2 / 3) /
    Math.sqrt(1 - eccentricity ** 2)
  );
}

/** Monochromatic beaming factor x e^x / (4 (e^x - 1)) of a blackbody star. */
export function beamingFactorAtWavelength(teffK: number, wavelengthM: number): number {
  requirePositive('teffK', teffK);
  requirePositive('wavelengthM', wavelengthM);
  return planckLogTemperatureSlope(wavelengthM, teffK) / 4;
}

/**
 * Band-averaged beaming factor of a blackbody star: the mean of x e^x / (e^x - 1) / 4
 * weighted by B_lambda(T*) lambda R(lambda) (stellar photon flux times response).
 */
export function beamingFactor(teffK: number, band: Band): number {
  requirePositive('teffK', teffK);
  return bandLogSlope(band, teffK, 'photon') / 4;
}

/** Beaming semi-amplitude alpha_beam 4 K / c (fraction). */
export function beamingAmplitude(teffK: number, band: Band, rvSemiAmplitudeMs: number): number {
  requireNonNegative('rvSemiAmplitudeMs', rvSemiAmplitudeMs);
  return (beamingFactor(teffK, band) * 4 * rvSemiAmplitudeMs) / C_M_PER_S;
}

/** alpha_ellip = 0.15 (15 + u)(1 + g) / (3 - u). */
export function ellipsoidalCoefficient(limbDarkeningU: number, gravityDarkeningG: number): number {
  requireInRange('limbDarkeningU', limbDarkeningU, { min: LIMB_DARKENING_RANGE[0], max: LIMB_DARKENING_RANGE[1] });
  requireInRange('gravityDarkeningG', gravityDarkeningG, { min: GRAVITY_DARKENING_RANGE[0], max: GRAVITY_DARKENING_RANGE[1] });
  return (0.15 * (15 + limbDarkeningU) * (1 + gravityDarkeningG)) / (3 - limbDarkeningU);
}

/** Ellipsoidal semi-amplitude alpha_ellip (Mp/M*) (R* / a)^3 sin^2 i (fraction). */
export function ellipsoidalAmplitude(
  planetMassKg: number, starMassKg: number, scaledSemiMajorAxis: number, inclinationRad: number,
  limbDarkeningU: number, gravityDarkeningG: number,
): number {
  requireNonNegative('planetMassKg', planetMassKg);
  requirePositive('starMassKg', starMassKg);
  requireScaledSemiMajorAxis('scaledSemiMajorAxis', scaledSemiMajorAxis);
  requireInclination('inclinationRad', inclinationRad);
  const alpha = ellipsoidalCoefficient(limbDarkeningU, gravityDarkeningG);
  return (alpha * (planetMassKg / starMassKg) * Math.sin(inclinationRad) ** 2) / scaledSemiMajorAxis ** 3;
}
