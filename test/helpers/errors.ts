/** The HesperError a call throws (fails the test when it throws nothing or something else). */
import { HesperError } from '../../src/errors.ts';

export function caughtHesperError(fn: () => unknown): HesperError {
  try {
    fn();
  } catch (e) {
    if (e instanceof HesperError) return e;
    throw e;
  }
  throw new Error('expected a HesperError');
}
