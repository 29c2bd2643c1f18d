import { describe, expect, it } from 'vitest';
import { resolveBand } from '../../src/physics/bandpass.ts';
import { C_M_PER_S, KG_PER_MJUP, KG_PER_MSUN, S_PER_DAY } from '../../src/physics/constants.ts';
import {
  beamingAmplitude, beamingFactor, beamingFactorAtWavelength, ellipsoidalAmplitude, ellipsoidalCoefficient,
  rvSemiAmplitudeMs,
} from '../../src/physics/mass-effects.ts';
import { semiMajorAxisFromPeriodM } from '../../src/physics/orbit.ts';

const DEG = Math.PI / 180;

describe('RV semi-amplitude', () => {
  // Jupiter: sidereal period 4332.589 d, e = 0.0489 (NASA Jupiter fact sheet).
  const periodS = 4332.589 * S_PER_DAY;

  it('gives the Sun a reflex of about 12.5 m/s from Jupiter', () => {
    // Widely quoted 12.5 m/s for Jupiter's pull on the Sun (from memory); tolerance half the last digit.
    expect(Math.abs(rvSemiAmplitudeMs(periodS, KG_PER_MJUP, KG_PER_MSUN, 90 * DEG, 0.0489) - 12.5)).toBeLessThan(0.05);
  });

  it('equals the momentum form 2 pi a Mp sin i / ((M* + Mp) P sqrt(1 - e^2))', () => {
    // derived: K = (Mp / (M* + Mp)) * orbital speed, with a from Kepler's third law
    const a = semiMajorAxisFromPeriodM(periodS, KG_PER_MSUN, KG_PER_MJUP);
    const e = 0.2;
    const i = 60 * DEG;
    const expected = (2 * Math.PI * a * KG_PER_MJUP * Math.sin(i)) / ((KG_PER_MSUN + KG_PER_MJUP) * periodS * Math.sqrt(1 - e * e));
    expect(rvSemiAmplitudeMs(periodS, KG_PER_MJUP, KG_PER_MSUN, i, e) / expected).toBeCloseTo(1, 12);
  });

  it('rejects eccentricity >= 1 and negative masses', () => {
    expect(() => rvSemiAmplitudeMs(periodS, KG_PER_MJUP, KG_PER_MSUN, 1, 1)).toThrowError(/eccentricity = 1: must be in \[0, 1\)/);
    expect(() => rvSemiAmplitudeMs(periodS, -1, KG_PER_MSUN, 1)).toThrowError(/planetMassKg/);
    expect(() => rvSemiAmplitudeMs(0, 1, KG_PER_MSUN, 1)).toThrowError(/periodS/);
  });
});

describe('Doppler beaming', () => {
  it('has alpha_beam = 1.055 at 600 nm and 0.815 at 800 nm for 5772 K', () => {
    // Derived from Loeb & Gaudi 2003, ApJ 588, L117: printed to 3 decimals.
    expect(beamingFactorAtWavelength(5772, 600e-9)).toBeCloseTo(1.055, 3);
    expect(beamingFactorAtWavelength(5772, 800e-9)).toBeCloseTo(0.815, 3);
  });

  it('reduces to the monochromatic value for a narrow band', () => {
    const narrow = resolveBand({ tophatNm: [599.9, 600.1] });
    expect(beamingFactor(5772, narrow)).toBeCloseTo(beamingFactorAtWavelength(5772, 600e-9), 6);
  });

  it('lies between the values at the band edges (a weighted mean)', () => {
    const tess = resolveBand('tess');
    const f = beamingFactor(5772, tess);
    expect(f).toBeLessThan(beamingFactorAtWavelength(5772, 600e-9));
    expect(f).toBeGreaterThan(beamingFactorAtWavelength(5772, 1000e-9));
  });

  it('gives A_beam = alpha_beam 4 K / c', () => {
    const tess = resolveBand('tess');
    // derived: Loeb & Gaudi 2003 amplitude with K = 200 m/s
    expect(beamingAmplitude(5772, tess, 200)).toBeCloseTo((beamingFactor(5772, tess) * 800) / C_M_PER_S, 18);
  });
});

describe('ellipsoidal variation', () => {
  it('has alpha_ellip(u = 0.6, g = 0.32) = 1.287', () => {
    // Hand check (derived from 0.15 (15 + u)(1 + g)/(3 - u); a copy with (3 - g) would give 1.153)
    expect(ellipsoidalCoefficient(0.6, 0.32)).toBeCloseTo(1.287, 3);
  });

  it('gives alpha_ellip (Mp/M*) (R*/a)^3 sin^2 i', () => {
    // derived example: Mp/M* = 1e-3, aR = 5, i = 90 deg, u = 0.6, g = 0.32 -> 1.287e-3 / 125
    expect(ellipsoidalAmplitude(1e-3 * KG_PER_MSUN, KG_PER_MSUN, 5, 90 * DEG, 0.6, 0.32)).toBeCloseTo(1.287e-3 / 125, 12);
    expect(ellipsoidalAmplitude(1e-3 * KG_PER_MSUN, KG_PER_MSUN, 5, 30 * DEG, 0.6, 0.32)).toBeCloseTo((1.287e-3 / 125) / 4, 12);
  });

  it('rejects limb darkening outside [0, 1] and a/R* <= 1', () => {
    expect(() => ellipsoidalCoefficient(3, 0.3)).toThrowError(/limbDarkeningU = 3: must be in \[0, 1\]/);
    expect(() => ellipsoidalAmplitude(1, 1, 0.5, 1, 0.6, 0.3)).toThrowError(/scaledSemiMajorAxis/);
  });
});
