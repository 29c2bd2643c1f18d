/**
 * Folding a time series on the orbital period: phi = frac((t - T0) / P), 0 at the
 * mid-transit epoch T0. Times and epoch must share one time system (e.g. BJD_TDB) and
 * be in days; the period is in days.
 */
import { inputError, requireFinite, requirePositive } from '../errors.ts';
import type { FoldedCurve, LightCurve } from './types.ts';

/** Wraps any phase into [0, 1). */
export function wrapPhase(phase: number): number {
  const f = phase - Math.floor(phase);
  // Rounding can give exactly 1 for tiny negative inputs (e.g. -1e-17).
  return f >= 1 ? 0 : f;
}

/** Orbital phase in [0, 1) of each time, 0 at mid-transit. */
export function foldTimes(timeDays: Float64Array, epochDays: number, periodDays: number): Float64Array {
  requireFinite('epoch', epochDays);
  requirePositive('period', periodDays);
  const out = new Float64Array(timeDays.length);
  for (let i = 0; i < timeDays.length; i++) out[i] = wrapPhase((timeDays[i]! - epochDays) / periodDays);
  return out;
}

/**
 * A folded curve from either kind of light curve. Time series need the epoch; folded
 * curves are only wrapped into [0, 1) (the epoch is not used).
 */
export function foldCurve(curve: LightCurve, periodDays: number, epochDays?: number): FoldedCurve {
  let phase: Float64Array;
  if (curve.column === 'time') {
    if (epochDays === undefined) {
      throw inputError('invalid-input', 'epoch', 'a time series needs the mid-transit epoch (days, same time system as the time column) to be folded');
    }
    phase = foldTimes(curve.x, epochDays, periodDays);
  } else {
    phase = new Float64Array(curve.x.length);
    for (let i = 0; i < phase.length; i++) phase[i] = wrapPhase(curve.x[i]!);
  }
  return { phase, flux: curve.flux, fluxErr: curve.fluxErr };
}
