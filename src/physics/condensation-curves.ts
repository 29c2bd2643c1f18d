/**
 * Condensation-curve fits of cloud species,
 *   10^4 / T_cond = a - b log10(P/bar) + quadratic (log10(P/bar))^2 - c [M/H]
 * All coefficients are from memory (sources named per species), with the corroboration noted in `note`. The sign convention is fixed
 * numerically by the check values: Fe gives 1453 K at 1e-3 bar (= Lodders & Fegley 1993)
 * and Cr 1521 K at 1 bar only with the minus signs (Visscher et al. 2010 write the law with these signs).
 */
import type { Provenance } from './bands-builtin.ts';

export interface CondensationCurve {
  readonly a: number;
  readonly b: number;
  readonly c: number;
  /** Coefficient of (log10 P)^2, where the fit has one (Al2O3). */
  readonly quadratic?: number;
  readonly source: string;
  readonly status: Provenance;
  readonly note: string;
  /** Where the fit is trusted; outside it a warning is returned, not an error. */
  readonly pressureRangeBar: readonly [number, number];
  readonly metallicityRangeDex: readonly [number, number];
}

/** "Valid roughly 1e-4 to 1e2 bar, [M/H] within +-1 dex: warn outside" (from memory). */
export const FIT_PRESSURE_RANGE_BAR: readonly [number, number] = [1e-4, 1e2];
export const FIT_METALLICITY_RANGE_DEX: readonly [number, number] = [-1, 1];

const VISSCHER_2010 = 'Visscher, Lodders & Fegley 2010, ApJ 716, 1060';
const VISSCHER_2006 = 'Visscher, Lodders & Fegley 2006, ApJ 648, 1181';
const WAKEFORD_2017 = 'Wakeford et al. 2017, MNRAS 464, 4247';
const MORLEY_2012 = 'Morley et al. 2012, ApJ 756, 172';

function curve(a: number, b: number, c: number, source: string, note: string, quadratic?: number): CondensationCurve {
  const base = { a, b, c, source, status: 'memory' as const, note, pressureRangeBar: FIT_PRESSURE_RANGE_BAR, metallicityRangeDex: FIT_METALLICITY_RANGE_DEX };
  return Object.freeze(quadratic === undefined ? base : { ...base, quadratic });
}

export const CONDENSATION_CURVES: Readonly<Record<string, CondensationCurve>> = Object.freeze({
  Fe: curve(5.44, 0.48, 0.48, VISSCHER_2010, '1453 K at 1e-3 bar, equal to Lodders & Fegley 1993'),
  Mg2SiO4: curve(5.89, 0.37, 0.73, VISSCHER_2010, '1429 K at 1e-3 bar vs Lodders & Fegley 1993 1442 K'),
  MgSiO3: curve(6.26, 0.35, 0.70, VISSCHER_2010,
    'uncertain: 1305 K at 1e-4 bar vs ~1316 K (Lodders 2003, memory); one vapour-pressure fit implies a = 5.88 instead'),
  Al2O3: curve(5.0139, 0.21794, 0.58, WAKEFORD_2017, '1758 K at 1e-3 bar vs Lodders & Fegley 1993 1772 K', 2.2636e-3),
  CaTiO3: curve(5.125, 0.277, 0.554, WAKEFORD_2017, '1679 K at 1e-3 bar vs Lodders & Fegley 1993 1687 K'),
  Cr: curve(6.576, 0.486, 0.486, MORLEY_2012, '1521 K at 1 bar; b close to an independent fit (0.491)'),
  MnS: curve(7.45, 0.42, 0.84, VISSCHER_2006, '1342 K at 1 bar; b, c reproduced exactly by an independent fit'),
  Na2S: curve(10.05, 0.72, 1.08, `${VISSCHER_2006}; ${MORLEY_2012}`, '995 K at 1 bar; b, c reproduced exactly'),
  ZnS: curve(12.52, 0.63, 1.26, `${VISSCHER_2006}; ${MORLEY_2012}`, '799 K at 1 bar; b, c reproduced exactly'),
  KCl: curve(12.479, 0.879, 0.879, MORLEY_2012, '801 K at 1 bar; b = c reproduced'),
});
