import { describe, expect, it } from 'vitest';
import { HesperError } from '../../src/errors.ts';
import { KG_PER_MJUP, M_PER_AU, M_PER_RJUP, M_PER_RSUN } from '../../src/physics/constants.ts';
import { convertValue, isKnownUnit, parseQuantity, toKelvin } from '../../src/physics/units.ts';

describe('units', () => {
  it('defines the astronomical units from constants.ts', () => {
    expect(convertValue('a', 1, 'au', 'm')).toBe(M_PER_AU);
    expect(convertValue('r', 1, 'Rjup', 'm')).toBeCloseTo(M_PER_RJUP, 3);
    expect(convertValue('m', 1, 'Mjup', 'kg') / KG_PER_MJUP).toBeCloseTo(1, 14);
    // derived: 1 au / R_sun = 149597870700 / 6.957e8 = 215.0322...
    expect(convertValue('a', 1, 'au', 'Rsun')).toBeCloseTo(M_PER_AU / M_PER_RSUN, 10);
    expect(convertValue('a', 1, 'au', 'Rsun')).toBeCloseTo(215.032, 3);
  });

  it('converts wavelengths between nm and um', () => {
    expect(convertValue('w', 500, 'nm', 'um')).toBeCloseTo(0.5, 14); // SI prefixes: 1 um = 1000 nm
    expect(convertValue('w', 1.05, 'um', 'nm')).toBeCloseTo(1050, 10);
  });

  it('gives the same temperature in K and degC', () => {
    // SI definition of the Celsius scale: T/K = t/degC + 273.15.
    expect(toKelvin('t', 25, 'degC')).toBeCloseTo(298.15, 10);
    expect(toKelvin('t', -273.15, 'degC')).toBeCloseTo(0, 10);
    expect(toKelvin('t', 1500, 'K')).toBe(1500);
  });

  it('reads ppm as a pure number', () => {
    expect(convertValue('depth', 60, 'ppm', '')).toBeCloseTo(6e-5, 18); // definition: 1 ppm = 1e-6
  });

  it('parses quantities with astro units', () => {
    expect(parseQuantity('planet.a', '0.045 au').toNumber('m')).toBeCloseTo(0.045 * M_PER_AU, 0);
    expect(isKnownUnit('Rearth')).toBe(true);
    expect(isKnownUnit('furlongsxyz')).toBe(false);
  });

  it('rejects unknown units and wrong dimensions with bad-unit naming the field', () => {
    const unknown = (() => { try { convertValue('planet.a', 1, 'furlongsxyz', 'm'); } catch (e) { return e; } })();
    expect(unknown).toBeInstanceOf(HesperError);
    expect((unknown as HesperError).code).toBe('bad-unit');
    expect((unknown as HesperError).issues[0]?.path).toBe('planet.a.unit');
    expect(() => convertValue('planet.a', 1, 'kg', 'm')).toThrowError(/cannot be converted/);
    expect(() => parseQuantity('star.teffK', 'hot')).toThrowError(HesperError);
  });
});
