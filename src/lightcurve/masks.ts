/**
 * From the geometry to what the fit needs: which points lie in the transit (masked:
 * the transit is far deeper than the signals fitted here and its shape depends on limb
 * darkening) and the eclipse shape h(phi), the hidden fraction of the planet.
 */
import { requireInRange, requirePositive } from '../errors.ts';
import { wrapPhase } from './fold.ts';
import { contactHalfWidthPhase, planetHiddenFraction, starCoveredFraction } from './disk-overlap.ts';
import type { EclipseGeometry } from './types.ts';

const DEG = Math.PI / 180;

/**
 * Transit window widened by this fraction of its half-width on each side, so that a
 * slightly wrong geometry does not leak ingress or egress points into the fit (our
 * choice, common practice to pad a mask).
 */
export const TRANSIT_MASK_PADDING = 0.1;

/** Geometry checked and turned into the numbers the shapes need. */
export interface ResolvedGeometry {
  kind: EclipseGeometry['kind'];
  /** Radians; 90 deg when a window was given without an inclination. */
  inclinationRad: number;
  /** False when the window was given without an inclination (edge-on assumed). */
  inclinationGiven: boolean;
  /** Half-width (phase) of the contact window of the transit and of the eclipse. */
  contactHalfWidth: number;
  /** Eclipse shape h(phi): fraction of the planet hidden (0..1). */
  hiddenFraction(phase: number): number;
  /** Whether the transit mask removes this phase. */
  inTransit(phase: number): boolean;
}

/** Distance in phase from mid-transit (0) on the circle, in [0, 0.5]. */
function fromTransit(phase: number): number {
  const p = wrapPhase(phase);
  return p > 0.5 ? 1 - p : p;
}

export function resolveGeometry(geometry: EclipseGeometry, periodDays: number): ResolvedGeometry {
  requirePositive('periodDays', periodDays);
  if (geometry.kind === 'disks') {
    const k = requireInRange('radiusRatio', geometry.radiusRatio, { min: 0, max: 1, minExclusive: true, maxExclusive: true });
    const aR = requireInRange('scaledSemiMajorAxis', geometry.scaledSemiMajorAxis, { min: 1 + k, minExclusive: true });
    const iDeg = requireInRange('inclinationDeg', geometry.inclinationDeg, { min: 0, max: 180, minExclusive: true, maxExclusive: true });
    const iRad = iDeg * DEG;
    const half = contactHalfWidthPhase(k, aR, iRad);
    const maskHalf = half * (1 + TRANSIT_MASK_PADDING);
    return {
      kind: 'disks',
      inclinationRad: iRad,
      inclinationGiven: true,
      contactHalfWidth: half,
      hiddenFraction: (phase) => planetHiddenFraction(phase, k, aR, iRad),
      // The padded window, and anything the disks say is covered (they agree unpadded).
      inTransit: (phase) => fromTransit(phase) < maskHalf || starCoveredFraction(phase, k, aR, iRad) > 0,
    };
  }
  const hours = requirePositive('durationHours', geometry.durationHours);
  const half = hours / 24 / periodDays / 2;
  requireInRange('durationHours / (24 periodDays)', 2 * half, { max: 0.25 });
  const iDeg = geometry.inclinationDeg === undefined
    ? 90
    : requireInRange('inclinationDeg', geometry.inclinationDeg, { min: 0, max: 180, minExclusive: true, maxExclusive: true });
  const maskHalf = half * (1 + TRANSIT_MASK_PADDING);
  return {
    kind: 'window',
    inclinationRad: iDeg * DEG,
    inclinationGiven: geometry.inclinationDeg !== undefined,
    contactHalfWidth: half,
    // A box: the ingress and egress are not resolved without k and a/R*.
    hiddenFraction: (phase) => (Math.abs(wrapPhase(phase) - 0.5) < half ? 1 : 0),
    inTransit: (phase) => fromTransit(phase) < maskHalf,
  };
}

/** Keep-flags (1 = used in the fit) for a phase array: the transit is masked. */
export function transitKeepMask(phase: Float64Array, geometry: ResolvedGeometry): Uint8Array {
  const keep = new Uint8Array(phase.length);
  for (let i = 0; i < phase.length; i++) keep[i] = geometry.inTransit(phase[i]!) ? 0 : 1;
  return keep;
}
