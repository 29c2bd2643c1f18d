/**
 * Two uniform disks: the area of their overlap, the projected star-planet separation
 * on a circular orbit, and from them the eclipse shape (the fraction of the planet's
 * disk hidden behind the star) and the transit shape (the fraction of the star's disk
 * covered by the planet). Lengths are in stellar radii.
 */

/**
 * Area of the intersection of two disks of radii r1 and r2 whose centres are `d` apart:
 * the sum of the two circular segments cut by the common chord,
 *   A = r1^2 acos((d^2 + r1^2 - r2^2) / (2 d r1)) + r2^2 acos((d^2 + r2^2 - r1^2) / (2 d r2))
 *       - 1/2 sqrt((-d + r1 + r2)(d + r1 - r2)(d - r1 + r2)(d + r1 + r2))
 * (standard circle-circle intersection, e.g. Weisstein, "Circle-Circle Intersection",
 * MathWorld), with the limits: no overlap for d >= r1 + r2 and the whole smaller disk
 * for d <= |r1 - r2|.
 */
export function diskOverlapArea(d: number, r1: number, r2: number): number {
  const dist = Math.abs(d);
  if (dist >= r1 + r2) return 0;
  const rMin = Math.min(r1, r2);
  if (dist <= Math.abs(r1 - r2)) return Math.PI * rMin * rMin;
  const c1 = clamp((dist * dist + r1 * r1 - r2 * r2) / (2 * dist * r1));
  const c2 = clamp((dist * dist + r2 * r2 - r1 * r1) / (2 * dist * r2));
  const kite = (-dist + r1 + r2) * (dist + r1 - r2) * (dist - r1 + r2) * (dist + r1 + r2);
  return r1 * r1 * Math.acos(c1) + r2 * r2 * Math.acos(c2) - 0.5 * Math.sqrt(Math.max(kite, 0));
}

function clamp(x: number): number {
  return x < -1 ? -1 : x > 1 ? 1 : x;
}

/**
 * Sky-projected centre separation (stellar radii) on a circular orbit at phase phi:
 * z = aR sqrt(sin^2(2 pi phi) + cos^2 i cos^2(2 pi phi)) (geometry of a circular orbit,
 * phase 0 at conjunction with the planet in front).
 */
export function projectedSeparation(phase: number, scaledSemiMajorAxis: number, inclinationRad: number): number {
  const theta = 2 * Math.PI * phase;
  const s = Math.sin(theta);
  const c = Math.cos(theta) * Math.cos(inclinationRad);
  return scaledSemiMajorAxis * Math.sqrt(s * s + c * c);
}

/** True when the planet is on the far side of the star (cos 2 pi phi < 0). */
export function planetBehindStar(phase: number): boolean {
  return Math.cos(2 * Math.PI * phase) < 0;
}

/**
 * Eclipse shape: fraction of the planet's disk (radius k) hidden by the star at phase
 * phi, 0 outside the eclipse and 1 at full eclipse (for a non-grazing orbit).
 */
export function planetHiddenFraction(phase: number, radiusRatio: number, scaledSemiMajorAxis: number, inclinationRad: number): number {
  if (!planetBehindStar(phase)) return 0;
  const z = projectedSeparation(phase, scaledSemiMajorAxis, inclinationRad);
  if (z >= 1 + radiusRatio) return 0;
  return diskOverlapArea(z, 1, radiusRatio) / (Math.PI * radiusRatio * radiusRatio);
}

/**
 * Transit shape of a uniform (not limb-darkened) star: fraction of the stellar disk
 * covered by the planet at phase phi, 0 outside the transit. Used for the transit
 * window and by synthetic curves; the transit itself is masked, never fitted.
 */
export function starCoveredFraction(phase: number, radiusRatio: number, scaledSemiMajorAxis: number, inclinationRad: number): number {
  if (planetBehindStar(phase)) return 0;
  const z = projectedSeparation(phase, scaledSemiMajorAxis, inclinationRad);
  if (z >= 1 + radiusRatio) return 0;
  return diskOverlapArea(z, 1, radiusRatio) / Math.PI;
}

/**
 * Half-width in phase of the contact window (first to fourth contact) on a circular
 * orbit, or 0 when the disks never touch: z = 1 + k at
 * sin(2 pi phi) = sqrt(((1 + k)/aR)^2 - cos^2 i) / sin i (from the separation above).
 */
export function contactHalfWidthPhase(radiusRatio: number, scaledSemiMajorAxis: number, inclinationRad: number): number {
  const reach = (1 + radiusRatio) / scaledSemiMajorAxis;
  const cosI = Math.cos(inclinationRad);
  const sinI = Math.sin(inclinationRad);
  const num = reach * reach - cosI * cosI;
  if (num <= 0) return 0;
  const s = Math.sqrt(num) / sinI;
  return s >= 1 ? 0.25 : Math.asin(s) / (2 * Math.PI);
}
