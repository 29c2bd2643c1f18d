import { describe, expect, it } from 'vitest';
import {
  ASTRONOMICAL_UNIT, BASE_CONSTANTS, BOLTZMANN_K, C2_M_K, KG_PER_MEARTH, KG_PER_MJUP, KG_PER_MSUN, PLANCK_H,
  SIGMA_SB_W_PER_M2_K4, SPEED_OF_LIGHT, WIEN_B_M_K,
} from '../../src/physics/constants.ts';

describe('constants', () => {
  it('every base constant is a record with value, unit and reference', () => {
    for (const [name, c] of Object.entries(BASE_CONSTANTS)) {
      expect(Number.isFinite(c.value), name).toBe(true);
      expect(c.unit.length, name).toBeGreaterThan(0);
      expect(c.reference, name).toMatch(/CODATA 2018|IAU 20(12|15)|IAU/);
      expect(Object.isFrozen(c), name).toBe(true);
    }
  });

  it('keeps the exact SI defining constants', () => {
    expect(PLANCK_H.value).toBe(6.62607015e-34); // CODATA 2018 (exact)
    expect(SPEED_OF_LIGHT.value).toBe(299792458); // CODATA 2018 (exact)
    expect(BOLTZMANN_K.value).toBe(1.380649e-23); // CODATA 2018 (exact)
    expect(ASTRONOMICAL_UNIT.value).toBe(149597870700); // IAU 2012 Resolution B2 (exact)
  });

  // CODATA 2018 prints these derived constants exactly but truncated ("5.670 374 419... x 1e-8"),
  // so the true value lies in [printed, printed + one unit in the last printed digit).
  const withinTruncatedPrint = (value: number, printed: number, lastDigit: number): void => {
    expect(value).toBeGreaterThanOrEqual(printed * (1 - 1e-15));
    expect(value).toBeLessThan(printed + lastDigit);
  };

  it('derives sigma equal to the CODATA 2018 value to its printed precision', () => {
    withinTruncatedPrint(SIGMA_SB_W_PER_M2_K4, 5.670374419e-8, 1e-17); // CODATA 2018: 5.670374419... e-8 W m^-2 K^-4
  });

  it('derives the Wien displacement constant equal to CODATA 2018 to its printed precision', () => {
    withinTruncatedPrint(WIEN_B_M_K, 2.897771955e-3, 1e-12); // CODATA 2018: 2.897771955... e-3 m K
  });

  it('derives the second radiation constant c2 = hc/k', () => {
    withinTruncatedPrint(C2_M_K, 1.438776877e-2, 1e-11); // CODATA 2018: 1.438776877... e-2 m K
  });

  it('derives masses from the nominal GM values and CODATA 2018 G', () => {
    // Solar mass 1.98841e30 kg: derived, GM_sun (IAU 2015 B3) / G (CODATA 2018) = 1.3271244e20 / 6.67430e-11.
    // Tolerance 1e-5 relative: the 6-digit printed value.
    expect(KG_PER_MSUN / 1.98841e30 - 1).toBeLessThan(1e-5);
    expect(1 - KG_PER_MSUN / 1.98841e30).toBeLessThan(1e-5);
    // Jupiter 1.89813e27 kg (NASA Jupiter fact sheet, 1898.13e24 kg; from memory): within 1e-4 relative,
    // the size of the change in G between CODATA editions.
    expect(Math.abs(KG_PER_MJUP / 1.89813e27 - 1)).toBeLessThan(1e-4);
    // Earth 5.9722e24 kg (NASA Earth fact sheet; from memory), same tolerance.
    expect(Math.abs(KG_PER_MEARTH / 5.9722e24 - 1)).toBeLessThan(1e-4);
  });
});
