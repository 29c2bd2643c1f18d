/**
 * Units for user input (the edge of the program). mathjs parses
 * strings such as "0.045 au" or "1.2 Rjup"; the astronomical units are defined here
 * from constants.ts so that there is one table of values. Physics functions never
 * parse strings: callers convert once with toSi / convertValue.
 */
import { createRequire } from 'node:module';
import type { MathJsInstance, Unit } from 'mathjs';
import { inputError } from '../errors.ts';
import { KG_PER_MEARTH, KG_PER_MJUP, KG_PER_MSUN, M_PER_AU, M_PER_REARTH, M_PER_RJUP, M_PER_RSUN } from './constants.ts';

// mathjs ships a single-file build next to its module tree; it loads in about a tenth
// of the time (70 ms against 500 ms here), which matters for every CLI start. Its
// default instance is private to this module: nothing else in hesper uses mathjs.
const require = createRequire(import.meta.url);
const math = require('mathjs/lib/browser/math.js') as MathJsInstance;

// mathjs unit names must be alphanumeric. mathjs already knows "au" as a length, but
// with its own value; we override it so that every unit comes from constants.ts.
math.createUnit(
  {
    au: { definition: `${M_PER_AU} m`, aliases: ['AU'] },
    Rsun: { definition: `${M_PER_RSUN} m` },
    Rjup: { definition: `${M_PER_RJUP} m` },
    Rearth: { definition: `${M_PER_REARTH} m` },
    Msun: { definition: `${KG_PER_MSUN} kg` },
    Mjup: { definition: `${KG_PER_MJUP} kg` },
    Mearth: { definition: `${KG_PER_MEARTH} kg` },
    ppm: { definition: '1e-6' },
  },
  { override: true },
);

/** Parses "value unit" into a mathjs Unit, or throws a bad-unit error naming the field. */
export function parseQuantity(path: string, text: string): Unit {
  try {
    const u = math.unit(text);
    return u;
  } catch (e) {
    throw inputError('bad-unit', path, `cannot read "${text}" as a quantity: ${(e as Error).message}`, text);
  }
}

/**
 * Converts `value` given in `fromUnit` to `toUnit` (both mathjs unit strings).
 * Throws bad-unit when the unit is unknown or the dimensions differ.
 */
export function convertValue(path: string, value: number, fromUnit: string, toUnit: string): number {
  if (fromUnit === toUnit) return value;
  let from: Unit;
  try {
    from = math.unit(value, fromUnit);
  } catch (e) {
    throw inputError('bad-unit', `${path}.unit`, `unknown unit "${fromUnit}"`, fromUnit);
  }
  try {
    if (toUnit === '') {
      if (from.dimensions.some((d) => d !== 0)) throw new Error('not dimensionless');
      return from.value ?? value;
    }
    return from.toNumber(toUnit);
  } catch {
    throw inputError('bad-unit', `${path}.unit`, `unit "${fromUnit}" cannot be converted to ${toUnit || 'a pure number'}`, fromUnit, toUnit || 'dimensionless');
  }
}

/** True when `unit` is a unit mathjs (with our additions) knows. */
export function isKnownUnit(unit: string): boolean {
  try {
    math.unit(1, unit);
    return true;
  } catch {
    return false;
  }
}

/** Temperature conversion handles offsets (degC to K) through mathjs as well. */
export function toKelvin(path: string, value: number, unit: string): number {
  return convertValue(path, value, unit, 'K');
}
