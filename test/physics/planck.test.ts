import { describe, expect, it } from 'vitest';
import { HesperError } from '../../src/errors.ts';
import { C2_M_K, C_M_PER_S, KB_J_PER_K, SIGMA_SB_W_PER_M2_K4 } from '../../src/physics/constants.ts';
import { integrateAdaptive } from '../../src/physics/integrate.ts';
import {
  blackbodyExitanceWPerM2, planckLambda, planckLogTemperatureSlope, planckPeakWavelengthM, planckPhotonLambda,
  requireWeighting,
} from '../../src/physics/planck.ts';

/** pi * integral of B_lambda d lambda, with u = ln lambda (dlambda = lambda du), from 1e-3 to 1e6 peak wavelengths. */
function totalRadianceTimesPi(temperatureK: number): number {
  const peakM = 2.9e-3 / temperatureK;
  const f = (u: number): number => {
    const lambda = Math.exp(u);
    return planckLambda(lambda, temperatureK) * lambda;
  };
  return Math.PI * integrateAdaptive(f, Math.log(1e-3 * peakM), Math.log(1e6 * peakM), { relTol: 1e-12 });
}

describe('Planck function', () => {
  it('integrates to sigma T^4 over all wavelengths', () => {
    // CODATA 2018 sigma (derived in constants.ts from h, c, k). Substitution u = ln lambda keeps
    // the integrand smooth over 9 decades; the Rayleigh-Jeans tail beyond 1e6 peak wavelengths is
    // 2 pi c k T / (3 Lambda^3 sigma T^4) ~ 6e-18 relative, the Wien tail below 1e-3 peak wavelengths
    // ~ exp(-5000) (derived): both far below the tolerance.
    let worst = 0;
    for (const t of [3, 50, 300, 1500, 5772, 20000, 1e5]) {
      worst = Math.max(worst, Math.abs(totalRadianceTimesPi(t) / (SIGMA_SB_W_PER_M2_K4 * t ** 4) - 1));
    }
    expect(worst).toBeLessThan(1e-6);
  });

  it('peaks at lambda_max T = 2.897771955e-3 m K (Wien)', () => {
    for (const t of [300, 5772, 20000]) {
      const peak = planckPeakWavelengthM(t);
      // CODATA 2018: b = 2.897771955...e-3 m K (printed 10 digits).
      expect(Math.abs(peak * t - 2.897771955e-3)).toBeLessThan(1e-12);
      // It is a maximum of planckLambda itself (1e-4 relative steps either side).
      expect(planckLambda(peak, t)).toBeGreaterThan(planckLambda(peak * (1 + 1e-4), t));
      expect(planckLambda(peak, t)).toBeGreaterThan(planckLambda(peak * (1 - 1e-4), t));
    }
  });

  it('approaches Rayleigh-Jeans at long wavelengths', () => {
    // Textbook limit B_lambda -> 2 c k T / lambda^4 for lambda >> hc/kT; first correction -x/2 (derived).
    const t = 5000;
    const lambda = 1; // 1 m: x = c2 / (lambda T) ~ 2.9e-6
    const rj = (2 * C_M_PER_S * KB_J_PER_K * t) / lambda ** 4;
    const x = C2_M_K / (lambda * t);
    expect(planckLambda(lambda, t) / rj - 1).toBeCloseTo(-x / 2, 10);
  });

  it('converts to photon radiance by lambda / hc', () => {
    // Total photon exitance pi * integral = 1.5205e15 T^3 photons s^-1 m^-2 (derived: 4 pi zeta(3) c (k/hc)^3).
    const t = 1000;
    const peakM = 2.9e-3 / t;
    const n = Math.PI * integrateAdaptive((u) => planckPhotonLambda(Math.exp(u), t) * Math.exp(u), Math.log(1e-3 * peakM), Math.log(1e6 * peakM), { relTol: 1e-12 });
    const zeta3 = 1.2020569031595942; // Apery's constant (from memory; 16 digits)
    const expected = 4 * Math.PI * zeta3 * C_M_PER_S * (t / C2_M_K) ** 3;
    expect(Math.abs(n / expected - 1)).toBeLessThan(1e-9);
  });

  it('gives d ln B / d ln T = x e^x / (e^x - 1) consistent with a finite difference', () => {
    const lambda = 600e-9;
    const t = 5772;
    const h = 1e-4;
    const numeric = (Math.log(planckLambda(lambda, t * Math.exp(h))) - Math.log(planckLambda(lambda, t * Math.exp(-h)))) / (2 * h);
    expect(planckLogTemperatureSlope(lambda, t)).toBeCloseTo(numeric, 7);
  });

  it('returns 0 at 0 K and sigma T^4 as exitance', () => {
    expect(planckLambda(500e-9, 0)).toBe(0);
    expect(blackbodyExitanceWPerM2(5772)).toBeCloseTo(SIGMA_SB_W_PER_M2_K4 * 5772 ** 4, 6);
  });

  it('rejects NaN, infinities and negative arguments with the argument name', () => {
    const err = (() => { try { planckLambda(500e-9, -1); } catch (e) { return e as HesperError; } })();
    expect(err).toBeInstanceOf(HesperError);
    expect(err?.code).toBe('out-of-range');
    expect(err?.issues[0]).toMatchObject({ path: 'temperatureK', value: -1, allowed: '[0, inf)' });
    expect(() => planckLambda(Number.NaN, 300)).toThrowError(/wavelengthM = NaN/);
    expect(() => planckLambda(0, 300)).toThrowError(/wavelengthM/);
    expect(() => planckPeakWavelengthM(Infinity)).toThrowError(/finite/);
    expect(() => requireWeighting('weighting', 'bolometric')).toThrowError(/photon/);
  });
});
