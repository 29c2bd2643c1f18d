import { describe, expect, it } from 'vitest';
import {
  contactHalfWidthPhase, diskOverlapArea, planetHiddenFraction, projectedSeparation, starCoveredFraction,
} from '../../src/lightcurve/disk-overlap.ts';

const DEG = Math.PI / 180;

describe('diskOverlapArea', () => {
  it('full overlap: the smaller disk entirely inside the larger', () => {
    // derived: a disk of radius 0.1 inside the unit disk overlaps by its own area pi 0.1^2.
    expect(diskOverlapArea(0, 1, 0.1)).toBeCloseTo(Math.PI * 0.01, 14);
    expect(diskOverlapArea(0.5, 1, 0.1)).toBeCloseTo(Math.PI * 0.01, 14);
    // derived: internally tangent (d = 1 - 0.1) is still the whole small disk.
    expect(diskOverlapArea(0.9, 1, 0.1)).toBeCloseTo(Math.PI * 0.01, 12);
    // symmetric in the two radii.
    expect(diskOverlapArea(0.5, 0.1, 1)).toBeCloseTo(Math.PI * 0.01, 14);
  });

  it('no overlap: centres at least r1 + r2 apart', () => {
    // derived: disks of radii 1 and 0.1 are externally tangent at d = 1.1.
    expect(diskOverlapArea(1.1, 1, 0.1)).toBe(0);
    expect(diskOverlapArea(1.5, 1, 0.1)).toBe(0);
  });

  it('partial overlap of two unit disks one radius apart', () => {
    // derived by hand: each disk's chord subtends 120 deg at its centre (the centres and an
    // intersection point form an equilateral triangle), so the lens is two segments of area
    // (theta - sin theta)/2 with theta = 2 pi/3: 2 pi/3 - sqrt(3)/2 = 1.2283697.
    expect(diskOverlapArea(1, 1, 1)).toBeCloseTo((2 * Math.PI) / 3 - Math.sqrt(3) / 2, 12);
  });

  it('partial overlap of two unit disks sqrt(2) apart', () => {
    // derived by hand: the chord subtends 90 deg at each centre (right isosceles triangle),
    // segments (pi/2 - 1)/2 each, lens = pi/2 - 1 = 0.5707963.
    expect(diskOverlapArea(Math.SQRT2, 1, 1)).toBeCloseTo(Math.PI / 2 - 1, 12);
  });

  it('partial overlap with the chord through the small disk centre (3-4-5 triangle)', () => {
    // derived by hand: R = 1, r = 0.6, d = 0.8 and 0.8^2 + 0.6^2 = 1, so the intersection points
    // lie perpendicular to the line of centres through the small disk's centre. Overlap = half
    // the small disk (pi 0.36 / 2) + the large disk's segment beyond the chord, half-angle
    // acos(0.8): R^2 (theta - sin theta cos theta) = acos(0.8) - 0.48. Total 0.7289878.
    const expected = (Math.PI * 0.36) / 2 + Math.acos(0.8) - 0.48;
    expect(diskOverlapArea(0.8, 1, 0.6)).toBeCloseTo(expected, 12);
    expect(expected).toBeCloseTo(0.7289878, 7);
  });

  it('is continuous at both contacts', () => {
    expect(diskOverlapArea(1.1 - 1e-9, 1, 0.1)).toBeLessThan(1e-12);
    expect(diskOverlapArea(0.9 + 1e-9, 1, 0.1)).toBeCloseTo(Math.PI * 0.01, 8);
  });
});

describe('orbit geometry', () => {
  it('projected separation at conjunction and quadrature', () => {
    // derived: z = aR sqrt(sin^2 + cos^2 i cos^2): aR cos i at phi = 0, aR at phi = 0.25.
    expect(projectedSeparation(0, 5, 85 * DEG)).toBeCloseTo(5 * Math.cos(85 * DEG), 14);
    expect(projectedSeparation(0.25, 5, 85 * DEG)).toBeCloseTo(5, 14);
    expect(projectedSeparation(0.5, 5, 90 * DEG)).toBeCloseTo(0, 14);
  });

  it('hidden fraction: 1 at mid-eclipse, 0 at transit and out of eclipse', () => {
    expect(planetHiddenFraction(0.5, 0.1, 5, 90 * DEG)).toBeCloseTo(1, 14);
    expect(planetHiddenFraction(0, 0.1, 5, 90 * DEG)).toBe(0);
    expect(planetHiddenFraction(0.3, 0.1, 5, 90 * DEG)).toBe(0);
  });

  it('covered fraction of the star at mid-transit is k^2 (uniform star)', () => {
    // derived: the whole planet disk (area pi k^2) lies on the stellar disk (area pi).
    expect(starCoveredFraction(0, 0.1, 5, 90 * DEG)).toBeCloseTo(0.01, 14);
    expect(starCoveredFraction(0.5, 0.1, 5, 90 * DEG)).toBe(0);
  });

  it('contact half-width: z = 1 + k at its edges, 0 when the disks never touch', () => {
    const i = 87 * DEG;
    const w = contactHalfWidthPhase(0.1, 5, i);
    expect(projectedSeparation(w, 5, i)).toBeCloseTo(1.1, 12);
    expect(projectedSeparation(0.5 + w, 5, i)).toBeCloseTo(1.1, 12);
    // derived: edge-on, sin(2 pi w) = (1 + k)/aR.
    expect(contactHalfWidthPhase(0.1, 5, 90 * DEG)).toBeCloseTo(Math.asin(1.1 / 5) / (2 * Math.PI), 14);
    // aR cos i = 5 cos 70 deg = 1.71 > 1.1: no transit, no eclipse.
    expect(contactHalfWidthPhase(0.1, 5, 70 * DEG)).toBe(0);
  });

  it('partial eclipse at the contact-point separation z = 1', () => {
    // derived: at z = 1 the planet centre sits on the stellar limb; for a tiny planet the limb
    // is straight across it, so half its disk is hidden (fraction -> 1/2 as k -> 0).
    const k = 1e-4;
    const aR = 5;
    const phase = 0.5 + Math.asin(1 / aR) / (2 * Math.PI);
    expect(planetHiddenFraction(phase, k, aR, 90 * DEG)).toBeCloseTo(0.5, 4);
  });
});
