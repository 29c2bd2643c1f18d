/** Parsers for numeric command-line options: bad values are input errors naming the option. */
import { inputError } from '../errors.ts';

export function intOption(name: string, min: number, max: number): (value: string) => number {
  return (value: string) => {
    const n = Number(value);
    if (!Number.isInteger(n) || n < min || n > max) {
      throw inputError('out-of-range', `--${name}`, `--${name} ${value}: must be an integer in [${min}, ${max}]`, value, `[${min}, ${max}]`);
    }
    return n;
  };
}

export function numberOption(name: string, min = -Infinity, max = Infinity): (value: string) => number {
  return (value: string) => {
    const n = Number(value);
    if (value.trim() === '' || !Number.isFinite(n) || n < min || n > max) {
      throw inputError('out-of-range', `--${name}`, `--${name} ${value}: must be a finite number in [${min}, ${max}]`, value, `[${min}, ${max}]`);
    }
    return n;
  };
}
