/**
 * The chi-square distribution's survival function P(X > x) for k degrees of freedom,
 * through the regularised upper incomplete gamma function Q(k/2, x/2): a series for
 * x < a + 1 and Lentz's continued fraction otherwise (Press et al. 2007, Numerical
 * Recipes, 3rd ed., section 6.2; from memory), with an iteration cap.
 */
import { requireInRange } from '../errors.ts';

/** ln Gamma(z) for z > 0 (Lanczos approximation, g = 7, n = 9; coefficients from memory, |rel err| < 1e-13). */
export function lnGamma(z: number): number {
  const c = [0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
    12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7];
  if (z < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * z)) - lnGamma(1 - z);
  const x = z - 1;
  let a = c[0]!;
  const t = x + 7.5;
  for (let i = 1; i < 9; i++) a += c[i]! / (x + i);
  return 0.5 * Math.log(2 * Math.PI) + (x + 0.5) * Math.log(t) - t + Math.log(a);
}

const MAX_TERMS = 500;
const EPS = 1e-14;

/** Regularised upper incomplete gamma Q(a, x). */
export function upperGammaQ(a: number, x: number): number {
  requireInRange('a', a, { min: 0, minExclusive: true });
  requireInRange('x', x, { min: 0 });
  if (x === 0) return 1;
  const lnPre = -x + a * Math.log(x) - lnGamma(a);
  if (x < a + 1) {
    let sum = 1 / a;
    let term = sum;
    for (let n = 1; n < MAX_TERMS; n++) {
      term *= x / (a + n);
      sum += term;
      if (Math.abs(term) < Math.abs(sum) * EPS) break;
    }
    return Math.max(0, 1 - sum * Math.exp(lnPre));
  }
  const tiny = 1e-300;
  let b = x + 1 - a;
  let c = 1 / tiny;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < MAX_TERMS; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < tiny) d = tiny;
    c = b + an / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < EPS) break;
  }
  return Math.min(1, Math.exp(lnPre) * h);
}

/** P(chi^2_k > x). */
export function chiSquareSurvival(x: number, degreesOfFreedom: number): number {
  return upperGammaQ(degreesOfFreedom / 2, Math.max(0, x) / 2);
}
