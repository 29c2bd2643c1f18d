/**
 * Argument guards shared by the physics functions: each throws a HesperError with the
 * argument name, the value and the allowed range.
 */
import { requireInRange } from '../errors.ts';

/** Rp/R* in (0, 1). */
export function requireRadiusRatio(name: string, value: number): number {
  return requireInRange(name, value, { min: 0, max: 1, minExclusive: true, maxExclusive: true });
}

/** a/R* in (1, inf): the planet orbits outside the star. */
export function requireScaledSemiMajorAxis(name: string, value: number): number {
  return requireInRange(name, value, { min: 1, minExclusive: true });
}

/** Orbital inclination in [0, pi] rad. */
export function requireInclination(name: string, value: number): number {
  return requireInRange(name, value, { min: 0, max: Math.PI });
}

/** Bond albedo in [0, 1]. */
export function requireBondAlbedo(name: string, value: number): number {
  return requireInRange(name, value, { min: 0, max: 1 });
}

/** Heat-redistribution efficiency eps in [0, 1]. */
export function requireRedistribution(name: string, value: number): number {
  return requireInRange(name, value, { min: 0, max: 1 });
}

/** Temperature in [0, inf) K. */
export function requireTemperatureK(name: string, value: number): number {
  return requireInRange(name, value, { min: 0 });
}
