/**
 * From the linear coefficients (design-matrix.ts) to the reported quantities, each
 * with its gradient so that errors and correlations propagate to first order:
 * Sigma_out = G Sigma G^T.
 *
 * The parameter vector is the fitted coefficients, plus a fixed beaming value B_fix
 * (with its own variance, independent of the fit) when the offset is fitted with the
 * beaming taken from a prediction. The planet's term is
 *   P(phi) = Ap L(phi) + b1 sin(2 pi phi),
 * with b1 = 0 (no offset), b1 = S (offset, no beaming) or b1 = S - B_fix.
 * Its first harmonics are a1 = h1 Ap (coefficient of -cos 2 pi phi) and b1.
 *
 * - phaseAmplitudePpm: peak-to-trough of P(phi): Ap without offset (L has unit
 *   peak-to-trough); sqrt(Ap^2 + 4 b1^2) for the cosine with offset (derived: the sum of
 *   -Ap/2 cos and b1 sin has semi-amplitude sqrt(Ap^2/4 + b1^2)); for the Lambert term
 *   with offset, max - min of P on a grid, whose gradient is the difference of the
 *   columns at the two extremes (envelope theorem).
 * - phaseOffsetDeg: delta = atan2(b1, a1), the phase of the first harmonic: the peak
 *   comes at phi = 0.5 - delta / 360 deg, positive = eastward, before eclipse. Exact peak shift for the cosine term; for the Lambert term the shift of
 *   its first harmonic.
 * - nightsideFluxPpm: P at transit relative to the eclipse depth, D - Ap (L(0.5) - L(0) = 1,
 *   and the sine vanishes at 0 and 0.5).
 * - the brightness-map input: a1, b1 and the orbit-mean planet flux
 *   Fbar = D - Ap (L(0.5) - mean L).
 */
import type { LeastSquaresFit } from './least-squares.ts';
import type { PhaseTermShape } from './phase-term.ts';
import type { ColumnName, SineAttribution, ValueSigma } from './types.ts';

const PPM = 1e6;
const RAD_TO_DEG = 180 / Math.PI;
/** Grid for the Lambert-with-offset peak-to-trough (our choice; error ~ (2 pi / N)^2 / 8 relative). */
const EXTREMUM_GRID = 4096;

/** A derived quantity: value and gradient with respect to the parameter vector. */
export interface Derived {
  value: number;
  grad: Float64Array;
}

export interface ParameterVector {
  values: Float64Array;
  /** m x m, row-major. */
  covariance: Float64Array;
  size: number;
  index: Partial<Record<ColumnName | 'fixedBeaming', number>>;
}

/** The fit coefficients, plus B_fix (flux units) with its variance when given. */
export function parameterVector(fit: LeastSquaresFit, names: readonly ColumnName[], fixedBeaming?: ValueSigma): ParameterVector {
  const p = names.length;
  const size = fixedBeaming ? p + 1 : p;
  const values = new Float64Array(size);
  const covariance = new Float64Array(size * size);
  const index: ParameterVector['index'] = {};
  names.forEach((n, j) => { index[n] = j; });
  for (let i = 0; i < p; i++) {
    values[i] = fit.coefficients[i]!;
    for (let j = 0; j < p; j++) covariance[i * size + j] = fit.covariance[i * p + j]!;
  }
  if (fixedBeaming) {
    values[p] = fixedBeaming.value;
    covariance[p * size + p] = fixedBeaming.sigma ** 2;
    index.fixedBeaming = p;
  }
  return { values, covariance, size, index };
}

export function sigmaOf(d: Derived, pv: ParameterVector): number {
  return Math.sqrt(Math.max(quadratic(d.grad, d.grad, pv), 0));
}

/** g1^T Sigma g2. */
export function quadratic(g1: Float64Array, g2: Float64Array, pv: ParameterVector): number {
  let v = 0;
  for (let i = 0; i < pv.size; i++) {
    if (g1[i] === 0) continue;
    for (let j = 0; j < pv.size; j++) v += g1[i]! * pv.covariance[i * pv.size + j]! * g2[j]!;
  }
  return v;
}

function unit(pv: ParameterVector, key: ColumnName | 'fixedBeaming', scale = 1): Derived {
  const grad = new Float64Array(pv.size);
  const i = pv.index[key];
  if (i === undefined) return { value: 0, grad };
  grad[i] = scale;
  return { value: pv.values[i]! * scale, grad };
}

function combine(terms: Array<[number, Derived]>, size: number): Derived {
  const grad = new Float64Array(size);
  let value = 0;
  for (const [c, d] of terms) {
    value += c * d.value;
    for (let i = 0; i < size; i++) grad[i] = grad[i]! + c * d.grad[i]!;
  }
  return { value, grad };
}

export interface PlanetQuantities {
  /** Planet first-harmonic sine coefficient b1 [ppm]; zero gradient when not fitted. */
  b1: Derived;
  /** Planet first-harmonic cosine coefficient a1 [ppm]. */
  a1: Derived;
  phaseAmplitudePpm: Derived;
  phaseOffsetDeg: Derived | null;
  eclipseDepthPpm: Derived | null;
  nightsideFluxPpm: Derived | null;
  meanPlanetFluxPpm: Derived | null;
  ellipsoidalAmplitudePpm: Derived;
  beamingAmplitudePpm: Derived | null;
}

export function planetQuantities(pv: ParameterVector, shape: PhaseTermShape, attribution: SineAttribution): PlanetQuantities {
  const n = pv.size;
  const ap = unit(pv, 'phaseTerm', PPM);
  const sine = unit(pv, 'sine', PPM);
  const zero: Derived = { value: 0, grad: new Float64Array(n) };
  const b1 = attribution === 'beaming' ? zero
    : attribution === 'offset-no-beaming' ? sine
      : combine([[1, sine], [-1, unit(pv, 'fixedBeaming', PPM)]], n);
  const a1 = combine([[shape.firstHarmonic, ap]], n);
  const offset = attribution !== 'beaming';
  let phaseAmplitudePpm: Derived;
  if (!offset) phaseAmplitudePpm = ap;
  else if (shape.model === 'cosine') {
    const ptt = Math.hypot(ap.value, 2 * b1.value);
    phaseAmplitudePpm = ptt > 0 ? combine([[ap.value / ptt, ap], [(4 * b1.value) / ptt, b1]], n) : { value: 0, grad: ap.grad };
  } else phaseAmplitudePpm = lambertPeakToTrough(ap, b1, shape, n);
  let phaseOffsetDeg: Derived | null = null;
  if (offset) {
    const r2 = a1.value ** 2 + b1.value ** 2;
    const d = combine([[(-b1.value / r2) * RAD_TO_DEG, a1], [(a1.value / r2) * RAD_TO_DEG, b1]], n);
    phaseOffsetDeg = { value: Math.atan2(b1.value, a1.value) * RAD_TO_DEG, grad: r2 > 0 ? d.grad : new Float64Array(n) };
  }
  const hasEclipse = pv.index.eclipse !== undefined;
  const depth = hasEclipse ? unit(pv, 'eclipse', PPM) : null;
  const beamingAmplitudePpm = attribution === 'beaming' ? sine
    : attribution === 'offset-beaming-fixed' ? unit(pv, 'fixedBeaming', PPM) : null;
  return {
    a1,
    b1,
    phaseAmplitudePpm,
    phaseOffsetDeg,
    eclipseDepthPpm: depth,
    nightsideFluxPpm: depth ? combine([[1, depth], [-1, ap]], n) : null,
    meanPlanetFluxPpm: depth ? combine([[1, depth], [-(shape.atFullPhase - shape.mean), ap]], n) : null,
    ellipsoidalAmplitudePpm: unit(pv, 'ellipsoidal', PPM),
    beamingAmplitudePpm,
  };
}

/** max - min of Ap L(phi) + b1 sin(2 pi phi) on a grid, with the envelope-theorem gradient. */
function lambertPeakToTrough(ap: Derived, b1: Derived, shape: PhaseTermShape, size: number): Derived {
  let maxV = -Infinity;
  let minV = Infinity;
  let maxAt = 0;
  let minAt = 0;
  for (let j = 0; j < EXTREMUM_GRID; j++) {
    const phase = j / EXTREMUM_GRID;
    const v = ap.value * shape.value(phase) + b1.value * Math.sin(2 * Math.PI * phase);
    if (v > maxV) { maxV = v; maxAt = phase; }
    if (v < minV) { minV = v; minAt = phase; }
  }
  const dL = shape.value(maxAt) - shape.value(minAt);
  const dS = Math.sin(2 * Math.PI * maxAt) - Math.sin(2 * Math.PI * minAt);
  return { value: maxV - minV, grad: combine([[dL, ap], [dS, b1]], size).grad };
}
