/**
 * The shared core of the write-up wording: the Markup a format supplies (text escaping,
 * math, citations) and the Writer that sentences are built with.
 */
import type { Summary } from '../inference/summary.ts';
import type { SystemInput } from '../io/system.ts';
import type { Candidate, Interpretation } from '../interpret/types.ts';
import type { Citations, Ref } from './cite.ts';
import { albedoText, sig2, summaryMath } from './numbers.ts';

export interface Markup {
  /** Plain text, escaped for the format. */
  text(s: string): string;
  /** Inline math from TeX source. */
  math(tex: string): string;
  /** Parenthetical citation. */
  citep(refs: readonly Ref[]): string;
  /** Textual citation ("Marley et al. (1999)"). */
  citet(ref: Ref): string;
  /** Range dash between two numbers in text. */
  dash: string;
  percent: string;
}

export const AG = 'A_\\mathrm{g}';
export const AB = 'A_\\mathrm{B}';

export function list(items: string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/** Percent with two significant figures. */
export function pct(x: number): string {
  return sig2(100 * x);
}

export class Writer {
  constructor(
    readonly i: Interpretation,
    readonly s: SystemInput,
    readonly c: Citations,
    readonly m: Markup,
  ) {}

  t(s: string): string {
    return this.m.text(s);
  }

  cite(refs: Ref[]): string {
    const seen = new Set<string>();
    const known = refs.filter((r) => {
      const id = 'key' in r ? `k:${r.key}` : `t:${r.text}`;
      if (seen.has(id) || ('key' in r && !this.c.source(r.key))) return false;
      seen.add(id);
      return true;
    });
    if (known.length === 0) return '';
    this.c.note(known);
    return ` ${this.m.citep(known)}`;
  }

  citet(ref: Ref): string {
    this.c.note([ref]);
    return this.m.citet(ref);
  }

  eq(symbol: string, s: Summary, unit = ''): string {
    return this.m.math(`${symbol} = ${summaryMath(s)}${unit ? `\\,\\mathrm{${unit}}` : ''}`);
  }

  range(lo: string, hi: string): string {
    return `${lo}${this.m.dash}${hi}`;
  }

  agRange(c: Candidate): string {
    const [lo, hi] = c.geometricAlbedoRange;
    const a = albedoText(lo);
    const b = albedoText(hi);
    return this.m.math(`${AG} = ${a === b ? a : `${a}\\text{--}${b}`}`);
  }
}

