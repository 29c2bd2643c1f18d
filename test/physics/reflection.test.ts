import { describe, expect, it } from 'vitest';
import { HesperError } from '../../src/errors.ts';
import {
  bondAlbedoFromGeometric, geometricAlbedoFromFluxRatio, lambertPhaseFunction, lambertPhaseIntegral, maxGeometricAlbedo,
  phaseAngleRad, phaseIntegral, reflectedFluxRatio, reflectedFluxRatioAtPhase, reflectedPhaseAmplitude,
} from '../../src/physics/reflection.ts';

const DEG = Math.PI / 180;

describe('Lambert sphere', () => {
  it('has Phi(0) = 1, Phi(90 deg) = 1/pi, Phi(180 deg) = 0', () => {
    // derived from Phi(alpha) = [sin alpha + (pi - alpha) cos alpha] / pi (Russell 1916, ApJ 43, 173)
    expect(lambertPhaseFunction(0)).toBe(1);
    expect(lambertPhaseFunction(Math.PI / 2)).toBeCloseTo(1 / Math.PI, 15);
    expect(lambertPhaseFunction(Math.PI)).toBeCloseTo(0, 15);
    // Phi(5 deg) = 0.9963 (derived by hand from the formula, 4 digits)
    expect(lambertPhaseFunction(5 * DEG)).toBeCloseTo(0.9963, 4);
  });

  it('has phase integral q = 3/2 by numerical integration', () => {
    // derived (Lambert sphere A_g = 2/3, q = 3/2; common practice)
    expect(Math.abs(lambertPhaseIntegral() - 1.5)).toBeLessThan(1e-12);
    // isotropic check of the integrator itself: Phi = 1 gives q = 2 * integral sin = 4 (derived)
    expect(phaseIntegral(() => 1)).toBeCloseTo(4, 12);
  });

  it('gives Phi(90 - i) - Phi(90 + i) = sin i', () => {
    // derived (checked numerically at i = 90, 85, 80, 60, 30 deg)
    for (const iDeg of [90, 85, 80, 60, 30, 5]) {
      const i = iDeg * DEG;
      const diff = lambertPhaseFunction(Math.PI / 2 - i) - lambertPhaseFunction(Math.PI / 2 + i);
      expect(diff).toBeCloseTo(Math.sin(i), 13);
      expect(reflectedPhaseAmplitude(0.3, 0.1, 5, i)).toBeCloseTo(0.3 * (0.1 / 5) ** 2 * Math.sin(i), 16);
    }
  });
});

describe('phase angle', () => {
  it('is 0 at eclipse and pi at transit for an edge-on orbit, 90 deg at quadrature', () => {
    // derived from cos alpha = -sin i cos(2 pi phi)
    expect(phaseAngleRad(0.5, Math.PI / 2)).toBeCloseTo(0, 7);
    expect(phaseAngleRad(0, Math.PI / 2)).toBeCloseTo(Math.PI, 7);
    expect(phaseAngleRad(0.25, 80 * DEG)).toBeCloseTo(Math.PI / 2, 14);
    expect(phaseAngleRad(0.5, 80 * DEG)).toBeCloseTo(10 * DEG, 12);
    expect(phaseAngleRad(1.5, 80 * DEG)).toBeCloseTo(10 * DEG, 12); // periodic in phi
  });
});

describe('reflected flux ratio', () => {
  it('is A_g (k/aR)^2 and inverts exactly', () => {
    // Seager 2010 / Winn 2010: F_r/F* = A_g (Rp/a)^2; derived example: 0.5 (0.1/5)^2 = 2e-4
    expect(reflectedFluxRatio(0.5, 0.1, 5)).toBeCloseTo(2e-4, 18);
    expect(geometricAlbedoFromFluxRatio(2e-4, 0.1, 5)).toBeCloseTo(0.5, 14);
    expect(reflectedFluxRatioAtPhase(0.5, 0.1, 5, 0.5, Math.PI / 2)).toBeCloseTo(2e-4, 12);
  });

  it('relates Bond and geometric albedo through q', () => {
    expect(bondAlbedoFromGeometric(0.2, 1.5)).toBeCloseTo(0.3, 15); // A_B = q A_g (definition of the phase integral)
    expect(maxGeometricAlbedo(1.5)).toBeCloseTo(2 / 3, 15); // A_B <= 1 gives A_g <= 1/q
  });

  it('rejects out-of-range arguments with name, value and range', () => {
    const cases: Array<[() => unknown, string]> = [
      [() => reflectedFluxRatio(0.3, 1.3, 5), 'radiusRatio'],
      [() => reflectedFluxRatio(0.3, 0, 5), 'radiusRatio'],
      [() => reflectedFluxRatio(0.3, 0.1, 1), 'scaledSemiMajorAxis'],
      [() => reflectedFluxRatio(-0.1, 0.1, 5), 'geometricAlbedo'],
      [() => reflectedFluxRatio(Number.NaN, 0.1, 5), 'geometricAlbedo'],
      [() => lambertPhaseFunction(4), 'phaseAngleRad'],
      [() => phaseAngleRad(Infinity, 1), 'orbitalPhase'],
      [() => reflectedPhaseAmplitude(0.3, 0.1, 5, -0.1), 'inclinationRad'],
    ];
    for (const [fn, path] of cases) {
      let caught: unknown;
      try { fn(); } catch (e) { caught = e; }
      expect(caught, path).toBeInstanceOf(HesperError);
      expect((caught as HesperError).issues[0]?.path).toBe(path);
      expect((caught as HesperError).issues[0]?.allowed).toBeDefined();
    }
    expect(() => reflectedFluxRatio(0.3, 1.3, 5)).toThrowError('radiusRatio = 1.3: must be in (0, 1)');
  });
});
