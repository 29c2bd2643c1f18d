import { describe, expect, it } from 'vitest';
import { bandLabel, bandOverlap, measuredBandLabel, measuredRangeNm } from '../../src/interpret/band-overlap.ts';
import { phaseIntegralRange, toGeometricAlbedo } from '../../src/interpret/convert.ts';
import { resolveBand } from '../../src/physics/bandpass.ts';
import { isotropicGeometricAlbedo } from '../../src/physics/h-function.ts';
import { entry } from './helpers.ts';

const qDefault = { kind: 'uniform', min: 1, max: 1.5 } as const;

describe('catalog values as geometric albedos', () => {
  it('keeps geometric albedos as they are', () => {
    const c = toGeometricAlbedo(entry({ id: 'g', quantity: 'geometric', valueMin: 0.3, valueNominal: 0.35, valueMax: 0.4 }), qDefault);
    expect(c.range).toEqual([0.3, 0.4]);
    expect(c.nominal).toBe(0.35);
  });

  it('divides Bond and spherical albedos by the q range', () => {
    // derived: A_g in [A_min / q_max, A_max / q_min] = [0.3 / 1.5, 0.6 / 1]
    const bond = toGeometricAlbedo(entry({ id: 'b', quantity: 'bond', valueMin: 0.3, valueNominal: 0.45, valueMax: 0.6 }), qDefault);
    expect(bond.range[0]).toBeCloseTo(0.2, 12);
    expect(bond.range[1]).toBeCloseTo(0.6, 12);
    expect(bond.nominal).toBeCloseTo(0.45 / 1.25, 12);
    expect(bond.conversion).toMatch(/q = 1-1\.5/);
    const fixedQ = toGeometricAlbedo(entry({ id: 's', quantity: 'spherical', valueMin: 0.9, valueNominal: 0.9, valueMax: 0.9 }), { kind: 'fixed', value: 1.35 });
    // Venus: spherical albedo 0.90 with q = 1.35 gives A_g = 0.667 (Mallama et al. 2006, Icarus 182, 10, quote 0.67).
    expect(Math.abs(fixedQ.nominal - 0.67)).toBeLessThan(0.005);
  });

  it('takes the 95 % range of a Gaussian q, inside the allowed [0.5, 2]', () => {
    // derived: 1.2 +- 1.96 * 0.1
    const r = phaseIntegralRange({ kind: 'normal', mean: 1.2, sigma: 0.1 });
    expect(r.min).toBeCloseTo(1.2 - 0.196, 3);
    expect(r.max).toBeCloseTo(1.2 + 0.196, 3);
    expect(phaseIntegralRange({ kind: 'normal', mean: 1.9, sigma: 0.5 }).max).toBe(2);
  });

  it('treats a surface reflectance as a Lambert sphere, A_g = 2r/3', () => {
    // A Lambert surface of albedo a has A_g = 2a/3 (derived from the Lambert phase function; common practice).
    const c = toGeometricAlbedo(entry({ id: 'r', quantity: 'surface', valueMin: 0.6, valueNominal: 0.75, valueMax: 0.9 }), qDefault);
    expect(c.range[0]).toBeCloseTo(0.4, 12);
    expect(c.range[1]).toBeCloseTo(0.6, 12);
  });

  it('maps a single-scattering albedo through A_g(w) of the H-function', () => {
    // Semi-infinite isotropic scattering (Chandrasekhar 1960 H-function, computed): A_g = 0.69 at w = 1 and 0.31 at w = 0.90 (two decimals).
    const c = toGeometricAlbedo(entry({ id: 'w', quantity: 'single-scattering', valueMin: 0.9, valueNominal: 0.95, valueMax: 1 }), qDefault);
    expect(Math.abs(c.range[0] - 0.31)).toBeLessThan(0.005);
    expect(Math.abs(c.range[1] - 0.69)).toBeLessThan(0.005);
    expect(c.nominal).toBe(isotropicGeometricAlbedo(0.95));
  });
});

describe('band overlap', () => {
  const tess = resolveBand('tess');
  const kepler = resolveBand('kepler');

  it('measures the overlap against the narrower band', () => {
    // derived: V (507-595 nm) lies inside Kepler's half-maximum range 430-840 nm; it misses TESS 600-1000 nm.
    expect(bandOverlap(507, 595, measuredRangeNm(kepler))).toEqual({ fraction: 1, grade: 'good' });
    expect(bandOverlap(507, 595, measuredRangeNm(tess))).toEqual({ fraction: 0, grade: 'none' });
    // derived: 350-650 nm against 600-1000 nm shares 50 nm of the narrower 300 nm.
    const barely = bandOverlap(350, 650, measuredRangeNm(tess));
    expect(barely.fraction).toBeCloseTo(50 / 300, 12);
    expect(barely.grade).toBe('barely');
    // a bolometric band contains the measured one
    expect(bandOverlap(200, 5000, measuredRangeNm(tess)).fraction).toBe(1);
  });

  it('names built-in bands and the measured band', () => {
    expect(bandLabel(507, 595)).toBe('Johnson V (507-595 nm)');
    expect(bandLabel(350, 650)).toBe('350-650 nm');
    expect(measuredBandLabel(tess)).toBe('TESS 600-1000 nm');
  });
});
