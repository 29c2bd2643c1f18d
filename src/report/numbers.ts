/**
 * Numbers for the write-up, as TeX math source (both the Markdown and the LaTeX
 * paragraphs use TeX math): a value with asymmetric 68 % errors, the uncertainty
 * rounded to two significant figures and the value to the same decimal place
 * (common practice).
 */
import type { Dist } from '../io/distribution.ts';
import type { Summary } from '../inference/summary.ts';

/** Decimal places that give `sig` significant figures of x (0 for x >= 10^(sig-1)). */
export function decimalsFor(x: number, sig = 2): number {
  if (!(Math.abs(x) > 0) || !Number.isFinite(x)) return 0;
  return Math.min(8, Math.max(0, sig - 1 - Math.floor(Math.log10(Math.abs(x)))));
}

/** Rounds to a step of 10^(-decimals), with decimals possibly negative (tens, hundreds). */
function fixed(x: number, decimals: number): string {
  if (decimals >= 0) return x.toFixed(decimals);
  const step = 10 ** -decimals;
  return String(Math.round(x / step) * step);
}

/** Decimal places for a value with errors: two significant figures of the smaller error. */
function placesOf(plus: number, minus: number): number {
  const e = Math.min(plus, minus) > 0 ? Math.min(plus, minus) : Math.max(plus, minus);
  if (!(e > 0)) return 3;
  return Math.min(8, 1 - Math.floor(Math.log10(e)));
}

/** median^{+plus}_{-minus} of the 68 % interval (or median \pm err when both round alike). */
export function summaryMath(s: Summary): string {
  const plus = s.upper68 - s.median;
  const minus = s.median - s.lower68;
  const d = placesOf(plus, minus);
  const v = fixed(s.median, d);
  const p = fixed(plus, d);
  const m = fixed(minus, d);
  return p === m ? `${v} \\pm ${p}` : `${v}^{+${p}}_{-${m}}`;
}

/** "0.520--0.853" style range of the 95 % interval, to the decimal place of summaryMath. */
export function interval95(s: Summary): [string, string] {
  const d = placesOf(s.upper68 - s.median, s.median - s.lower68);
  return [fixed(s.lower95, d), fixed(s.upper95, d)];
}

/** Two significant figures (for albedos, shares and probabilities in running text). */
export function sig2(x: number): string {
  if (x === 0) return '0';
  return fixed(x, decimalsFor(x, 2));
}

/** A geometric albedo: two decimals from 0.1 up, two significant figures below. */
export function albedoText(x: number): string {
  if (x === 0) return '0';
  return Math.abs(x) >= 0.1 ? x.toFixed(2) : sig2(x);
}

/** Decimal places needed to write x exactly (at most 6): 62 -> 0, 0.045 -> 3. */
function givenPlaces(x: number): number {
  for (let d = 0; d < 6; d++) if (Math.abs(Number(x.toFixed(d)) - x) <= 1e-9 * Math.max(1, Math.abs(x))) return d;
  return 6;
}

/**
 * A measured quantity in TeX math: 62 \pm 8, 430^{+28}_{-32}, < 30, 10\text{--}20. The
 * error to two significant figures and the value to the same place, but never more
 * places than the numbers were given with (62 +- 8 stays 62 \pm 8).
 */
export function measurementMath(d: Dist): string {
  const g = (x: number) => String(Number(x.toPrecision(6)));
  const withError = (errors: number[], values: number[]) => {
    const e = Math.min(...errors);
    const places = Math.max(0, Math.min(placesOf(e, e), Math.max(...values.map(givenPlaces))));
    return (x: number) => x.toFixed(places);
  };
  switch (d.kind) {
    case 'fixed': return g(d.value);
    case 'normal': {
      const f = withError([d.sigma], [d.mean, d.sigma]);
      return `${f(d.mean)} \\pm ${f(d.sigma)}`;
    }
    case 'split-normal': {
      const f = withError([d.plus, d.minus], [d.mode, d.plus, d.minus]);
      return `${f(d.mode)}^{+${f(d.plus)}}_{-${f(d.minus)}}`;
    }
    case 'uniform': return `${g(d.min)}\\text{--}${g(d.max)}`;
    case 'upper-limit': return `< ${g(d.limit)}`;
    case 'samples': {
      const s = [...d.values].sort((a, b) => a - b);
      return sig2(s[Math.floor(s.length / 2)]!);
    }
  }
}
