/**
 * Measurement likelihoods, as log-likelihood functions of the model value (additive
 * constants dropped: only ratios matter for the posterior).
 * - {value, sigma}: Gaussian.
 * - {value, plus, minus}: split normal (two half-Gaussians, John 1982, from memory).
 * - {upperLimit, confidence}: the limit read as the c-quantile of |x| for x ~ N(0, s),
 *   s = UL / Phi^-1((1 + c)/2); a 1-sigma limit (c = 0.6827) gives s = UL, a 95 % limit
 *   s = UL / 1.96. With a flat prior on x >= 0 this returns the quoted limit (common practice).
 * - {min, max}: flat inside, zero outside.
 * - samples: kernel density estimate (kde.ts).
 */
import type { Dist } from '../io/distribution.ts';
import { kdeLogDensity, tabulateKde } from './kde.ts';

/** A log-likelihood: `at` for one model value, `accumulate` adds it for a row of values. */
export interface LogLikelihood {
  at(model: number): number;
  accumulate(models: Float64Array, out: Float64Array, count: number): void;
}

function fromScalar(at: (x: number) => number): LogLikelihood {
  return {
    at,
    accumulate(models, out, count) {
      for (let j = 0; j < count; j++) out[j]! += at(models[j]!);
    },
  };
}

/** Gaussian in (x - centre) / width, written out for the hot loop. */
function gaussian(centre: number, width: number): LogLikelihood {
  const inv = 1 / width;
  return {
    at: (x) => {
      const z = (x - centre) * inv;
      return -0.5 * z * z;
    },
    accumulate(models, out, count) {
      for (let j = 0; j < count; j++) {
        const z = (models[j]! - centre) * inv;
        out[j]! -= 0.5 * z * z;
      }
    },
  };
}

/** Inverse of the standard normal CDF (Acklam 2003 rational approximation, |rel err| < 1.2e-9; from memory). */
export function normalQuantile(p: number): number {
  const a = [-3.969683028665376e1, 2.209460984245205e2, -2.759285104469687e2, 1.38357751867269e2, -3.066479806614716e1, 2.506628277459239];
  const b = [-5.447609879822406e1, 1.615858368580409e2, -1.556989798598866e2, 6.680131188771972e1, -1.328068155288572e1];
  const c = [-7.784894002430293e-3, -3.223964580411365e-1, -2.400758277161838, -2.549732539343734, 4.374664141464968, 2.938163982698783];
  const d = [7.784695709041462e-3, 3.224671290700398e-1, 2.445134137142996, 3.754408661907416];
  const pl = 0.02425;
  if (p < pl) {
    const q = Math.sqrt(-2 * Math.log(p));
    return (((((c[0]! * q + c[1]!) * q + c[2]!) * q + c[3]!) * q + c[4]!) * q + c[5]!) / ((((d[0]! * q + d[1]!) * q + d[2]!) * q + d[3]!) * q + 1);
  }
  if (p > 1 - pl) return -normalQuantile(1 - p);
  const q = p - 0.5;
  const r = q * q;
  return ((((((a[0]! * r + a[1]!) * r + a[2]!) * r + a[3]!) * r + a[4]!) * r + a[5]!) * q) /
    (((((b[0]! * r + b[1]!) * r + b[2]!) * r + b[3]!) * r + b[4]!) * r + 1);
}

/** The Gaussian width an upper limit stands for (see the file comment). */
export function upperLimitSigma(limit: number, confidence: number): number {
  return limit / normalQuantile((1 + confidence) / 2);
}

export function logLikelihoodOf(d: Dist): LogLikelihood {
  switch (d.kind) {
    case 'normal':
      return gaussian(d.mean, d.sigma);
    case 'split-normal': {
      const m = d.mode;
      const up = 1 / d.plus;
      const down = 1 / d.minus;
      return fromScalar((x) => {
        const z = x > m ? (x - m) * up : (m - x) * down;
        return -0.5 * z * z;
      });
    }
    case 'upper-limit':
      return gaussian(0, upperLimitSigma(d.limit, d.confidence));
    case 'uniform': {
      const { min, max } = d;
      return fromScalar((x) => (x >= min && x <= max ? 0 : -Infinity));
    }
    case 'samples': {
      const t = tabulateKde(d.values);
      return fromScalar((x) => kdeLogDensity(t, x));
    }
    case 'fixed':
      // The schema refuses fixed measurements; reaching here is a programming error.
      throw new Error('a measurement needs an uncertainty');
  }
}

/** Significance of a measured signal above zero, in Gaussian sigmas (for `detected`). */
export function significanceSigma(d: Dist): number {
  switch (d.kind) {
    case 'normal': return d.mean / d.sigma;
    case 'split-normal': return d.mode / d.minus;
    case 'uniform': return d.min > 0 ? Infinity : 0;
    case 'upper-limit': return 0;
    case 'fixed': return Infinity;
    case 'samples': {
      const above = d.values.filter((v) => v > 0).length / d.values.length;
      if (above >= 1) return Infinity;
      return above <= 0.5 ? 0 : normalQuantile(above);
    }
  }
}
