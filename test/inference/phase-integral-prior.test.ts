import { describe, expect, it } from 'vitest';
import { sensitivityCorners } from '../../src/inference/corners.ts';
import { DEFAULT_PHASE_INTEGRAL } from '../../src/io/system-fields.ts';
import { isotropicPhaseIntegral, isotropicSphericalAlbedo } from '../../src/physics/isotropic-phase-integral.ts';
import { lambertPhaseIntegral } from '../../src/physics/reflection.ts';
import { demoJson, parseJson } from './helpers.ts';

describe('the default phase-integral prior covers the scattering laws the catalog conversion uses', () => {
  it('holds q of semi-infinite isotropic scatterers at w = 0.5, 0.9 and 0.99 (H-function)', () => {
    for (const w of [0.5, 0.9, 0.99]) {
      const q = isotropicPhaseIntegral(w);
      expect(q).toBeGreaterThanOrEqual(DEFAULT_PHASE_INTEGRAL.min);
      expect(q).toBeLessThanOrEqual(DEFAULT_PHASE_INTEGRAL.max);
    }
    // The Lambert sphere (q = 3/2, exact) and conservative Rayleigh scattering (q = 1/0.796 = 1.256,
    // derived from A_g = 0.796 of Schmid, Joos & Tschan 2006, A&A 452, 657) are inside too.
    for (const q of [lambertPhaseIntegral(), 1 / 0.796]) {
      expect(q).toBeGreaterThan(DEFAULT_PHASE_INTEGRAL.min);
      expect(q).toBeLessThan(DEFAULT_PHASE_INTEGRAL.max);
    }
  });

  it('gives q = 1.45 for conservative isotropic scattering, where the spherical albedo is exactly 1', () => {
    // derived: A_s = 1 - 2 sqrt(1 - w) int H mu dmu is 1 at w = 1, so q = 1 / A_g(1) = 1 / 0.6897 = 1.450
    // (A_g(1) = 0.6897, Chandrasekhar 1960, from memory; test/physics/h-function.test.ts checks it).
    expect(isotropicSphericalAlbedo(1)).toBeCloseTo(1, 12);
    expect(Math.abs(isotropicPhaseIntegral(1) - 1 / 0.6897)).toBeLessThan(2e-4);
    // q rises as w falls (more absorbing grains reflect relatively more at large phase angles): derived, monotonic.
    expect(isotropicPhaseIntegral(0.5)).toBeGreaterThan(isotropicPhaseIntegral(0.9));
    expect(isotropicPhaseIntegral(0.9)).toBeGreaterThan(isotropicPhaseIntegral(0.99));
  });

  it('puts the sensitivity corners at the edges of the priors the user chose', () => {
    const j = demoJson('systems/corvina-b.json');
    j.assumptions = { redistribution: { min: 0.2, max: 0.6 }, phaseIntegral: { value: 1.3, sigma: 0.1 } };
    // derived: uniform eps -> its bounds; Gaussian q -> mean +- 2 sigma.
    expect(sensitivityCorners(parseJson(j))).toEqual([
      { redistribution: 0.2, phaseIntegral: 1.1 }, { redistribution: 0.2, phaseIntegral: 1.5 },
      { redistribution: 0.6, phaseIntegral: 1.1 }, { redistribution: 0.6, phaseIntegral: 1.5 },
    ]);
    j.assumptions = { redistribution: 0.3, phaseIntegral: 1.5 };
    expect(sensitivityCorners(parseJson(j))).toEqual([{ redistribution: 0.3, phaseIntegral: 1.5 }]);
  });
});
