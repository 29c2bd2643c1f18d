import { describe, expect, it } from 'vitest';
import { HesperError } from '../../src/errors.ts';
import { gaussLegendreRule, integrateAdaptive, integrateGaussLegendre } from '../../src/physics/integrate.ts';
import { bisect } from '../../src/physics/solve.ts';

describe('Gauss-Legendre rule', () => {
  it('has weights summing to 2 and symmetric nodes', () => {
    for (const n of [1, 2, 5, 10, 20, 64]) {
      const { nodes, weights } = gaussLegendreRule(n);
      expect(weights.reduce((a, b) => a + b, 0)).toBeCloseTo(2, 13);
      for (let i = 0; i < n; i++) expect(nodes[i]! + nodes[n - 1 - i]!).toBeCloseTo(0, 14);
    }
  });

  it('matches the closed-form 2-point rule', () => {
    // Textbook: nodes +-1/sqrt(3), weights 1 (Abramowitz & Stegun 1964, table 25.4).
    const { nodes, weights } = gaussLegendreRule(2);
    expect(nodes[1]).toBeCloseTo(1 / Math.sqrt(3), 15);
    expect(weights[0]).toBeCloseTo(1, 15);
  });

  it('integrates polynomials of degree 2n - 1 exactly', () => {
    // derived: integral_0^1 x^k dx = 1/(k+1)
    for (const n of [3, 8, 12]) {
      const k = 2 * n - 1;
      expect(integrateGaussLegendre((x) => x ** k, 0, 1, n)).toBeCloseTo(1 / (k + 1), 14);
    }
  });

  it('rejects a bad order', () => {
    expect(() => gaussLegendreRule(0)).toThrowError(HesperError);
    expect(() => gaussLegendreRule(2.5)).toThrowError(/integer/);
  });
});

describe('adaptive quadrature', () => {
  it('integrates a peaked function to its tolerance', () => {
    // derived: integral_-inf^inf exp(-x^2 / (2 s^2)) dx = s sqrt(2 pi); tails beyond 40 s are below 1e-300.
    const s = 1e-3;
    const value = integrateAdaptive((x) => Math.exp(-(x * x) / (2 * s * s)), -40 * s, 40 * s, { relTol: 1e-12 });
    expect(Math.abs(value / (s * Math.sqrt(2 * Math.PI)) - 1)).toBeLessThan(1e-11);
  });

  it('handles an integrable endpoint singularity', () => {
    // derived: integral_0^1 x^-1/2 dx = 2
    expect(integrateAdaptive((x) => 1 / Math.sqrt(x), 0, 1, { relTol: 1e-8, maxEvaluations: 1e6 })).toBeCloseTo(2, 6);
  });

  it('reports no-convergence with its last error estimate at the evaluation cap', () => {
    let caught: unknown;
    try {
      integrateAdaptive((x) => Math.sin(1 / x), 1e-9, 1, { relTol: 1e-14, maxEvaluations: 2000 });
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(HesperError);
    expect((caught as HesperError).code).toBe('no-convergence');
    expect((caught as HesperError).message).toMatch(/last error estimate/);
  });
});

describe('bisection', () => {
  it('finds sqrt(2)', () => {
    expect(bisect((x) => x * x - 2, 0, 2)).toBeCloseTo(Math.SQRT2, 14); // derived
  });

  it('reports a missing bracket and an exhausted cap', () => {
    expect(() => bisect((x) => x * x + 1, -1, 1)).toThrowError(/no sign change/);
    expect(() => bisect((x) => x - 0.3, 0, 1, { maxIterations: 3, relTol: 1e-15 })).toThrowError(/last residual/);
  });
});
