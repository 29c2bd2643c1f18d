import { describe, expect, it } from 'vitest';
import { HesperError } from '../../src/errors.ts';
import { integrateGaussLegendre } from '../../src/physics/integrate.ts';
import {
  conservativeIsotropicGeometricAlbedo, isotropicGeometricAlbedo, singleScatteringAlbedoFor, solveHFunction,
} from '../../src/physics/h-function.ts';

/**
 * Independent H-function: the closed-form integral for isotropic scattering,
 * ln H(mu) = -(mu/pi) int_0^{pi/2} ln(1 - w theta cot theta) / (cos^2 theta + mu^2 sin^2 theta) dtheta
 * (the representation used by Kawabata & Limaye 2011, Ap&SS 332, 365; form from memory).
 * No iteration: a second implementation to run the same checks against.
 */
function closedFormH(mu: number, w: number): number {
  const f = (t: number) => {
    const tcot = t === 0 ? 1 : t / Math.tan(t);
    return Math.log(1 - w * tcot) / (Math.cos(t) ** 2 + mu * mu * Math.sin(t) ** 2);
  };
  return Math.exp((-mu / Math.PI) * integrateGaussLegendre(f, 0, Math.PI / 2, 40, 8));
}

describe('Chandrasekhar H-function for isotropic scattering', () => {
  it('gives the semi-infinite geometric albedos of isotropic scatterers', () => {
    // Computed with H-functions (Chandrasekhar 1960, Radiative Transfer): A_g = 0.69, 0.53, 0.31, 0.09
    // at w = 1, 0.99, 0.90, 0.50, printed to two decimals: tolerance half a unit of the last digit.
    const cases: Array<[number, number]> = [[1, 0.69], [0.99, 0.53], [0.9, 0.31], [0.5, 0.09]];
    for (const [w, ag] of cases) expect(Math.abs(isotropicGeometricAlbedo(w) - ag)).toBeLessThan(0.005);
    // Literature value for w = 1: 0.6897 (from memory); 4 decimals.
    expect(Math.abs(conservativeIsotropicGeometricAlbedo() - 0.6897)).toBeLessThan(0.00005);
  });

  it('has H(1) = 2.9078 in the conservative case', () => {
    // Chandrasekhar 1960, Radiative Transfer, table of H(mu) for w = 1: H(1) = 2.90781 (from memory; 4 decimals used).
    expect(Math.abs(solveHFunction(1).at(1) - 2.9078)).toBeLessThan(0.00005);
  });

  it('satisfies the zeroth-moment identity for every w (worst case reported)', () => {
    // derived: integrating the H-equation over mu gives alpha0 = 1 + (w/4) alpha0^2,
    // so alpha0 = int_0^1 H dmu = 2 (1 - sqrt(1 - w)) / w.
    let worst = 0;
    for (let k = 1; k <= 100; k++) {
      const w = k / 100;
      const sol = solveHFunction(w);
      let a0 = 0;
      for (let i = 0; i < sol.mu.length; i++) a0 += sol.weights[i]! * sol.values[i]!;
      worst = Math.max(worst, Math.abs(a0 - (2 * (1 - Math.sqrt(1 - w))) / w));
    }
    expect(worst).toBeLessThan(1e-10); // observed ~2e-14
  });

  it('has the first moment 2/sqrt(3) when w = 1', () => {
    // Chandrasekhar 1960: for conservative isotropic scattering alpha1 = int H mu dmu = 2/sqrt(3) (from memory).
    const sol = solveHFunction(1);
    let a1 = 0;
    for (let i = 0; i < sol.mu.length; i++) a1 += sol.weights[i]! * sol.values[i]! * sol.mu[i]!;
    expect(Math.abs(a1 - 2 / Math.sqrt(3))).toBeLessThan(1e-10);
  });

  it('agrees with the closed-form integral representation (worst case over w and mu)', () => {
    let worst = 0;
    for (const w of [0.1, 0.5, 0.9, 0.99, 0.999]) {
      const sol = solveHFunction(w);
      for (const mu of [0.01, 0.1, 0.3, 0.5, 0.8, 1]) worst = Math.max(worst, Math.abs(sol.at(mu) / closedFormH(mu, w) - 1));
    }
    expect(worst).toBeLessThan(2e-6); // relative; observed ~1e-6 (24 nodes near mu = 0)
  });

  it('reports its iterations and last residual, and fails at the cap with the residual', () => {
    const sol = solveHFunction(0.9);
    expect(sol.iterations).toBeLessThan(100);
    expect(sol.residual).toBeLessThan(1e-12);
    let error: unknown;
    try {
      solveHFunction(1, { maxIterations: 3 });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(HesperError);
    expect((error as HesperError).code).toBe('no-convergence');
    expect((error as HesperError).message).toMatch(/last relative change \d/);
  });

  it('rejects single-scattering albedos outside [0, 1] and NaN', () => {
    expect(() => isotropicGeometricAlbedo(1.01)).toThrow(/must be in \[0, 1\]/);
    expect(() => isotropicGeometricAlbedo(Number.NaN)).toThrow(HesperError);
    expect(() => singleScatteringAlbedoFor(Number.NaN)).toThrow(HesperError);
  });
});

describe('required single-scattering albedo (inverse of A_g(w))', () => {
  it('round-trips A_g(w) for w across [0.01, 1] (worst case reported)', () => {
    let worst = 0;
    for (let k = 1; k < 100; k++) {
      const w = k / 100;
      worst = Math.max(worst, Math.abs(singleScatteringAlbedoFor(isotropicGeometricAlbedo(w)).singleScatteringAlbedo - w));
    }
    expect(worst).toBeLessThan(1e-8); // observed ~1e-12
  });

  it('maps the check values back (0.53 -> about 0.99, 0.31 -> about 0.90)', () => {
    // Chandrasekhar 1960 H-function values (two decimals in A_g): A_g 0.53 at w = 0.99, 0.31 at w = 0.90.
    expect(Math.abs(singleScatteringAlbedoFor(0.53).singleScatteringAlbedo - 0.99)).toBeLessThan(0.002);
    expect(Math.abs(singleScatteringAlbedoFor(0.31).singleScatteringAlbedo - 0.9)).toBeLessThan(0.005);
  });

  it('clips and flags albedos no isotropic cloud reaches', () => {
    expect(singleScatteringAlbedoFor(0.8)).toEqual({ singleScatteringAlbedo: 1, aboveConservativeLimit: true, atZero: false });
    expect(singleScatteringAlbedoFor(-0.1)).toEqual({ singleScatteringAlbedo: 0, aboveConservativeLimit: false, atZero: true });
  });
});
