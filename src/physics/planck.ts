/**
 * Blackbody radiation, SI. B_lambda(T) = 2 h c^2 lambda^-5 / (exp(hc / (lambda k T)) - 1)
 * (Planck 1901). Band integrals over response curves live in
 * band-integral.ts; this file holds the monochromatic functions.
 */
import { inputError, requireInRange, requirePositive } from '../errors.ts';
import { C2_M_K, C_M_PER_S, H_J_S, SIGMA_SB_W_PER_M2_K4 } from './constants.ts';
import { bisect } from './solve.ts';

/** How a band integral weights the spectrum: per photon (photon-counting detector, default) or per unit energy. */
export type Weighting = 'photon' | 'energy';
export const WEIGHTINGS: readonly Weighting[] = ['photon', 'energy'];

/** Rejects anything other than 'photon' or 'energy'. */
export function requireWeighting(path: string, weighting: unknown): Weighting {
  if (weighting === 'photon' || weighting === 'energy') return weighting;
  throw inputError('invalid-input', path, `${path} = ${String(weighting)}: must be "photon" or "energy"`, weighting, 'photon, energy');
}

function requireTemperature(name: string, temperatureK: number): number {
  return requireInRange(name, temperatureK, { min: 0 });
}

/** Spectral radiance B_lambda [W m^-2 m^-1 sr^-1]; 0 at T = 0. */
export function planckLambda(wavelengthM: number, temperatureK: number): number {
  requirePositive('wavelengthM', wavelengthM);
  requireTemperature('temperatureK', temperatureK);
  if (temperatureK === 0) return 0;
  const x = C2_M_K / (wavelengthM * temperatureK);
  // expm1 keeps the Rayleigh-Jeans limit (x -> 0) accurate.
  return (2 * H_J_S * C_M_PER_S ** 2) / (wavelengthM ** 5 * Math.expm1(x));
}

/** Spectral photon radiance B_lambda lambda / (h c) [photons s^-1 m^-2 m^-1 sr^-1]. */
export function planckPhotonLambda(wavelengthM: number, temperatureK: number): number {
  return (planckLambda(wavelengthM, temperatureK) * wavelengthM) / (H_J_S * C_M_PER_S);
}

/**
 * d ln B_lambda / d ln T at one wavelength: x e^x / (e^x - 1), x = hc / (lambda k T).
 * (Differentiating Planck's law; the same factor sets Doppler beaming, Loeb & Gaudi 2003.)
 */
export function planckLogTemperatureSlope(wavelengthM: number, temperatureK: number): number {
  requirePositive('wavelengthM', wavelengthM);
  requirePositive('temperatureK', temperatureK);
  const x = C2_M_K / (wavelengthM * temperatureK);
  return x / -Math.expm1(-x);
}

/** Bolometric exitance of a blackbody, sigma T^4 [W m^-2] (= pi times the integral of B_lambda). */
export function blackbodyExitanceWPerM2(temperatureK: number): number {
  requireTemperature('temperatureK', temperatureK);
  return SIGMA_SB_W_PER_M2_K4 * temperatureK ** 4;
}

/**
 * Wavelength of the maximum of B_lambda(T) [m], found numerically as the zero of
 * d ln B_lambda / d ln lambda = -5 + x e^x / (e^x - 1) (bisection on x in [1, 10]).
 */
export function planckPeakWavelengthM(temperatureK: number): number {
  requirePositive('temperatureK', temperatureK);
  const slope = (x: number): number => x / -Math.expm1(-x) - 5;
  const xPeak = bisect(slope, 1, 10, { relTol: 1e-15, what: 'planckPeakWavelengthM' });
  return C2_M_K / (xPeak * temperatureK);
}
