/**
 * Reflected light. Symbols: k = Rp/R*, aR = a/R*, A_g geometric
 * albedo, alpha phase angle (0 at full phase), phi orbital phase (0 at transit).
 *
 * - Full-phase flux ratio F_r/F* = A_g (k/aR)^2 (Seager 2010, Exoplanet Atmospheres,
 *   Princeton UP; Winn 2010, arXiv:1001.2010; memory for the page).
 * - Lambert phase function Phi(alpha) = [sin alpha + (pi - alpha) cos alpha] / pi
 *   (Russell 1916, ApJ 43, 173; the standard form, e.g. Seager 2010).
 * - cos alpha = -sin i cos(2 pi phi) (derived).
 * - Phase integral q = 2 * integral_0^pi Phi(alpha) sin alpha dalpha; A_B = q A_g.
 */
import { requireFinite, requireInRange, requireNonNegative, requirePositive } from '../errors.ts';
import { requireInclination, requireRadiusRatio, requireScaledSemiMajorAxis } from './guards.ts';
import { integrateGaussLegendre } from './integrate.ts';

const HALF_PI = Math.PI / 2;

/** Lambert-sphere phase function Phi(alpha), alpha in [0, pi] rad; Phi(0) = 1, Phi(pi) = 0. */
export function lambertPhaseFunction(phaseAngleRad: number): number {
  requireInRange('phaseAngleRad', phaseAngleRad, { min: 0, max: Math.PI });
  return (Math.sin(phaseAngleRad) + (Math.PI - phaseAngleRad) * Math.cos(phaseAngleRad)) / Math.PI;
}

/** Phase angle [rad, 0..pi] at orbital phase phi (0 at transit, 0.5 at eclipse): cos alpha = -sin i cos(2 pi phi). */
export function phaseAngleRad(orbitalPhase: number, inclinationRad: number): number {
  requireFinite('orbitalPhase', orbitalPhase);
  requireInclination('inclinationRad', inclinationRad);
  const c = -Math.sin(inclinationRad) * Math.cos(2 * Math.PI * orbitalPhase);
  return Math.acos(Math.max(-1, Math.min(1, c)));
}

/** Reflected flux ratio at full phase, A_g (k/aR)^2 (a fraction, not ppm). */
export function reflectedFluxRatio(geometricAlbedo: number, radiusRatio: number, scaledSemiMajorAxis: number): number {
  requireNonNegative('geometricAlbedo', geometricAlbedo);
  requireRadiusRatio('radiusRatio', radiusRatio);
  requireScaledSemiMajorAxis('scaledSemiMajorAxis', scaledSemiMajorAxis);
  return geometricAlbedo * (radiusRatio / scaledSemiMajorAxis) ** 2;
}

/** Inverse of reflectedFluxRatio: A_g = (F_r/F*) (aR/k)^2. */
export function geometricAlbedoFromFluxRatio(fluxRatio: number, radiusRatio: number, scaledSemiMajorAxis: number): number {
  requireNonNegative('fluxRatio', fluxRatio);
  requireRadiusRatio('radiusRatio', radiusRatio);
  requireScaledSemiMajorAxis('scaledSemiMajorAxis', scaledSemiMajorAxis);
  return fluxRatio * (scaledSemiMajorAxis / radiusRatio) ** 2;
}

/** Reflected flux ratio at orbital phase phi for a Lambert sphere: A_g (k/aR)^2 Phi(alpha(phi)). */
export function reflectedFluxRatioAtPhase(
  geometricAlbedo: number, radiusRatio: number, scaledSemiMajorAxis: number, orbitalPhase: number, inclinationRad: number,
): number {
  return reflectedFluxRatio(geometricAlbedo, radiusRatio, scaledSemiMajorAxis) * lambertPhaseFunction(phaseAngleRad(orbitalPhase, inclinationRad));
}

/** Phase integral q = 2 * integral_0^pi Phi(alpha) sin alpha dalpha of any phase function (Gauss-Legendre, 4 x 20 nodes). */
export function phaseIntegral(phaseFunction: (alphaRad: number) => number): number {
  const q = 2 * integrateGaussLegendre((a) => phaseFunction(a) * Math.sin(a), 0, Math.PI, 20, 4);
  return requireFinite('phaseIntegral (the phase function returned a non-finite value)', q);
}

let lambertQ: number | undefined;
/** Phase integral of the Lambert sphere by numerical integration (analytically 3/2). */
export function lambertPhaseIntegral(): number {
  lambertQ ??= phaseIntegral(lambertPhaseFunction);
  return lambertQ;
}

/**
 * Peak-to-trough reflected amplitude of a Lambert sphere on a circular orbit:
 * A_g (k/aR)^2 [Phi(alpha_min) - Phi(alpha_max)], alpha_min = 90deg - i, alpha_max = 90deg + i
 * (equal to A_g (k/aR)^2 sin i, derived).
 */
export function reflectedPhaseAmplitude(
  geometricAlbedo: number, radiusRatio: number, scaledSemiMajorAxis: number, inclinationRad: number,
): number {
  const full = reflectedFluxRatio(geometricAlbedo, radiusRatio, scaledSemiMajorAxis);
  requireInclination('inclinationRad', inclinationRad);
  const alphaMin = phaseAngleRad(0.5, inclinationRad);
  const alphaMax = phaseAngleRad(0, inclinationRad);
  return full * (lambertPhaseFunction(alphaMin) - lambertPhaseFunction(alphaMax));
}

/** Bond albedo A_B = q A_g. */
export function bondAlbedoFromGeometric(geometricAlbedo: number, phaseIntegralQ: number): number {
  requireNonNegative('geometricAlbedo', geometricAlbedo);
  requirePositive('phaseIntegralQ', phaseIntegralQ);
  return geometricAlbedo * phaseIntegralQ;
}

/** Largest geometric albedo allowed by energy conservation (A_B <= 1): 1/q. */
export function maxGeometricAlbedo(phaseIntegralQ: number): number {
  requirePositive('phaseIntegralQ', phaseIntegralQ);
  return 1 / phaseIntegralQ;
}

/** Phase angle at superior conjunction (eclipse) for inclination i: 90deg - i for i <= 90deg. */
export function minimumPhaseAngleRad(inclinationRad: number): number {
  requireInclination('inclinationRad', inclinationRad);
  return Math.abs(HALF_PI - inclinationRad);
}
