/**
 * Orbit geometry for circular orbits: Kepler's third law a^3 = G (M* + Mp) P^2 / (4 pi^2)
 * (textbook; G from CODATA 2018) and the scaled semi-major axis a/R*.
 */
import { requireNonNegative, requirePositive } from '../errors.ts';
import { G_SI } from './constants.ts';

/** Semi-major axis [m] from the period [s] and the masses [kg]. */
export function semiMajorAxisFromPeriodM(periodS: number, starMassKg: number, planetMassKg = 0): number {
  requirePositive('periodS', periodS);
  requirePositive('starMassKg', starMassKg);
  requireNonNegative('planetMassKg', planetMassKg);
  return ((G_SI * (starMassKg + planetMassKg) * periodS ** 2) / (4 * Math.PI ** 2)) ** (1 / 3);
}

/** Orbital period [s] from the semi-major axis [m] and the masses [kg]. */
export function periodFromSemiMajorAxisS(semiMajorAxisM: number, starMassKg: number, planetMassKg = 0): number {
  requirePositive('semiMajorAxisM', semiMajorAxisM);
  requirePositive('starMassKg', starMassKg);
  requireNonNegative('planetMassKg', planetMassKg);
  return 2 * Math.PI * Math.sqrt(semiMajorAxisM ** 3 / (G_SI * (starMassKg + planetMassKg)));
}

/** a / R* (dimensionless). */
export function scaledSemiMajorAxis(semiMajorAxisM: number, starRadiusM: number): number {
  requirePositive('semiMajorAxisM', semiMajorAxisM);
  requirePositive('starRadiusM', starRadiusM);
  return semiMajorAxisM / starRadiusM;
}
