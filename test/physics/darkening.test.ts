import { describe, expect, it } from 'vitest';
import { MASS_MODEL_FRACTION } from '../../src/inference/measurements.ts';
import { resolveBand } from '../../src/physics/bandpass.ts';
import { KG_PER_MJUP, KG_PER_MSUN, M_PER_RSUN, S_PER_DAY } from '../../src/physics/constants.ts';
import { BETA_CONVECTIVE, BETA_RADIATIVE, darkeningCoefficients, gravityDarkeningG, limbDarkeningU } from '../../src/physics/darkening.ts';
import { integrateGaussLegendre } from '../../src/physics/integrate.ts';
import { ellipsoidalAmplitude } from '../../src/physics/mass-effects.ts';
import { semiMajorAxisFromPeriodM } from '../../src/physics/orbit.ts';

/** Planck B_lambda up to constants, x = hc / (lambda k T) with hc/k = 14387.77 um K (CODATA 2018, derived). */
const planck = (wavelengthUm: number, tK: number) => 1 / (Math.exp(14387.77 / (wavelengthUm * tK)) - 1);

describe('limb and gravity darkening from the stellar temperature in the band', () => {
  it('gives the gray-atmosphere linear coefficient of a monochromatic band (second implementation)', () => {
    // derived: I(mu) = B(T(tau = mu)), T^4 = 3/4 T_eff^4 (tau + 2/3); u = 3 int (1 - I/I(1)) (1 - mu) dmu.
    for (const [um, teff] of [[0.6, 5800], [0.8, 6500], [0.5, 4500]] as const) {
      const t = (tau: number) => teff * (0.75 * (tau + 2 / 3)) ** 0.25;
      const expected = 3 * integrateGaussLegendre((mu) => (1 - planck(um, t(mu)) / planck(um, t(1))) * (1 - mu), 0, 1, 40);
      const narrow = resolveBand({ tophatNm: [1000 * um - 0.1, 1000 * um + 0.1] });
      expect(limbDarkeningU(narrow, teff)).toBeCloseTo(expected, 4);
    }
  });

  it('gives beta1 times the Planck temperature slope, convective for Sun-like stars and radiative for A stars', () => {
    // derived: g = beta1 x e^x / (e^x - 1); beta1 = 0.08 (Lucy 1967) below 6500 K, 0.25 (von Zeipel 1924) above 8000 K.
    const narrow = resolveBand({ tophatNm: [799.9, 800.1] });
    const slope = (t: number) => {
      const x = 14387.77 / (0.8 * t);
      return (x * Math.exp(x)) / (Math.exp(x) - 1);
    };
    expect(gravityDarkeningG(narrow, 5800)).toBeCloseTo(BETA_CONVECTIVE * slope(5800), 4);
    expect(gravityDarkeningG(narrow, 9000)).toBeCloseTo(BETA_RADIATIVE * slope(9000), 4);
  });

  it('darkens the limb more in bluer bands and in cooler stars, and its table follows the direct values', () => {
    const kepler = resolveBand('kepler');
    const tess = resolveBand('tess');
    expect(limbDarkeningU(kepler, 5800)).toBeGreaterThan(limbDarkeningU(tess, 5800));
    expect(limbDarkeningU(kepler, 5000)).toBeGreaterThan(limbDarkeningU(kepler, 6500));
    // The table interpolates linearly on a 100 K grid; at a node it returns the direct value.
    expect(darkeningCoefficients(kepler, 5800).u).toBeCloseTo(limbDarkeningU(kepler, 5800), 10);
    expect(Math.abs(darkeningCoefficients(kepler, 5850).u - limbDarkeningU(kepler, 5850))).toBeLessThan(1e-3);
  });
});

describe('predicted ellipsoidal amplitudes against published measurements, within the model uncertainty', () => {
  const DEG = Math.PI / 180;
  const predict = (band: string, teffK: number, mpMjup: number, msMsun: number, aR: number, iDeg: number) => {
    const d = darkeningCoefficients(resolveBand(band), teffK);
    return 1e6 * ellipsoidalAmplitude(mpMjup * KG_PER_MJUP, msMsun * KG_PER_MSUN, aR, iDeg * DEG, d.u, d.g);
  };
  const within = (predicted: number, measured: number, sigma: number) =>
    expect(Math.abs(predicted - measured)).toBeLessThanOrEqual(Math.hypot(MASS_MODEL_FRACTION * predicted, sigma));

  it('TrES-2b in the Kepler band', () => {
    // Barclay et al. 2012, ApJ 761, 53 (abstract checked): ellipsoidal semi-amplitude 2.79 +0.44 -0.62 ppm,
    // M* = 0.94 +- 0.05 Msun, R* = 0.95 +- 0.02 Rsun. Mp = 1.20 Mjup from radial velocities and P = 2.47063 d
    // (secondary), i = 83.9 deg and Teff = 5850 K (from memory). a/R* from Kepler's third law (derived).
    const aR = semiMajorAxisFromPeriodM(2.47063 * S_PER_DAY, 0.94 * KG_PER_MSUN, 1.2 * KG_PER_MJUP) / (0.95 * M_PER_RSUN);
    within(predict('kepler', 5850, 1.2, 0.94, aR, 83.9), 2.79, 0.62);
  });

  it('WASP-18b in the CHEOPS band', () => {
    // Deline et al. 2025, A&A 699, A150, Table 3 (checked): CHEOPS ellipsoidal amplitude 217.0 +- 5.0 ppm,
    // a/R* = 3.493, i = 84.08 deg. Mp = 10.4 +- 0.4 Mjup (Coulombe et al. 2023, Nature 620, 292; checked);
    // M* = 1.22 Msun and Teff = 6400 K (Hellier et al. 2009, Nature 460, 1098; from memory).
    within(predict('cheops', 6400, 10.4, 1.22, 3.493, 84.08), 217.0, 5.0);
  });
});
