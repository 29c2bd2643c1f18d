/**
 * Spherical (Bond) albedo and phase integral of a semi-infinite atmosphere of
 * isotropic scatterers, from Chandrasekhar's H-function (h-function.ts).
 *
 * Plane albedo of a semi-infinite isotropic atmosphere (Chandrasekhar 1960, Radiative
 * Transfer, Dover, ch. IV; form from memory): r(mu0) = 1 - sqrt(1 - w) H(mu0). The
 * spherical albedo is its flux-weighted mean over the illuminated hemisphere,
 *   A_s = 2 int_0^1 r(mu0) mu0 dmu0 = 1 - 2 sqrt(1 - w) int_0^1 H(mu) mu dmu   (derived),
 * which is exactly 1 for w = 1 (conservative scattering). The phase integral is
 * q = A_s / A_g with A_g the geometric albedo of the same atmosphere.
 * Check values (computed here): q = 1.450 at w = 1 (A_g = 0.690), 1.46 at w = 0.99,
 * 1.63 at w = 0.5.
 */
import { requireInRange } from '../errors.ts';
import { isotropicGeometricAlbedo, solveHFunction } from './h-function.ts';

/** Spherical albedo of a semi-infinite isotropic-scattering atmosphere (w in (0, 1]). */
export function isotropicSphericalAlbedo(singleScatteringAlbedo: number): number {
  const w = requireInRange('singleScatteringAlbedo', singleScatteringAlbedo, { min: 0, max: 1, minExclusive: true });
  const sol = solveHFunction(w);
  let moment = 0;
  for (let i = 0; i < sol.mu.length; i++) moment += sol.weights[i]! * sol.values[i]! * sol.mu[i]!;
  return 1 - 2 * Math.sqrt(1 - w) * moment;
}

/** Phase integral q = A_s / A_g of a semi-infinite isotropic-scattering atmosphere (w in (0, 1]). */
export function isotropicPhaseIntegral(singleScatteringAlbedo: number): number {
  return isotropicSphericalAlbedo(singleScatteringAlbedo) / isotropicGeometricAlbedo(singleScatteringAlbedo);
}
