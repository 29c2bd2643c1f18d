/**
 * Canonical distributions: a parsed quantity converted once, at the edge, into the
 * canonical unit of its field and checked against the field's
 * physical range. The inference draws from these; it never sees units.
 */
import { type Issue, type RangeBounds } from '../errors.ts';
import { convertValue } from '../physics/units.ts';
import type { QuantityInput } from './quantity-schema.ts';

export type Dist =
  | { kind: 'fixed'; value: number }
  | { kind: 'normal'; mean: number; sigma: number }
  | { kind: 'split-normal'; mode: number; plus: number; minus: number }
  | { kind: 'uniform'; min: number; max: number }
  | { kind: 'upper-limit'; limit: number; confidence: number }
  | { kind: 'samples'; values: number[] };

/** How a field is read: its canonical unit (mathjs syntax, '' = pure number) and range. */
export interface FieldSpec {
  unit: string;
  range: RangeBounds;
  /**
   * The units this field accepts, for messages (examples for fields read through
   * mathjs; the complete list when `factors` is given).
   */
  accepts: readonly string[];
  /** When given, the only units accepted, each with its factor to the canonical unit (e.g. "%" = 1e4 ppm). */
  factors?: Readonly<Record<string, number>>;
}

/** Reads a samples file for a {samplesFile, column} quantity (CLI only). */
export type SamplesReader = (path: string, file: string, column: string | number) => number[];

function inRange(x: number, r: RangeBounds): boolean {
  if (!Number.isFinite(x)) return false;
  if (r.min !== undefined && (r.minExclusive ? x <= r.min : x < r.min)) return false;
  if (r.max !== undefined && (r.maxExclusive ? x >= r.max : x > r.max)) return false;
  return true;
}

export function rangeWords(r: RangeBounds): string {
  const lo = r.min === undefined ? '(-inf' : `${r.minExclusive ? '(' : '['}${r.min}`;
  const hi = r.max === undefined ? 'inf)' : `${r.max}${r.maxExclusive ? ')' : ']'}`;
  return `${lo}, ${hi}`;
}

/** The central value of a distribution, for messages and quick estimates. */
export function centralValue(d: Dist): number {
  switch (d.kind) {
    case 'fixed': return d.value;
    case 'normal': return d.mean;
    case 'split-normal': return d.mode;
    case 'uniform': return 0.5 * (d.min + d.max);
    case 'upper-limit': return 0;
    case 'samples': {
      const s = [...d.values].sort((a, b) => a - b);
      return s[Math.floor(s.length / 2)] ?? NaN;
    }
  }
}

/**
 * Converts a validated quantity into a canonical Dist, or pushes issues (with the
 * field path, the value and the allowed range) and returns undefined.
 */
export function toDist(path: string, q: QuantityInput, spec: FieldSpec, issues: Issue[], readSamples?: SamplesReader): Dist | undefined {
  const unit = typeof q === 'object' && q.unit !== undefined ? q.unit : spec.unit;
  const before = issues.length;
  const accepted = spec.accepts.length > 0 ? spec.accepts.map((u) => (u === '' ? 'no unit (a pure number)' : `"${u}"`)).join(', ') : 'no unit';
  const conv = (x: number): number => {
    if (spec.factors) {
      const factor = spec.factors[unit];
      if (factor === undefined) {
        if (issues.length === before) issues.push({ path: `${path}.unit`, message: `unit "${unit}" is not accepted here; ${path} accepts ${accepted}`, value: unit, allowed: accepted });
        return NaN;
      }
      return x * factor;
    }
    try {
      return convertValue(path, x, unit, spec.unit);
    } catch (e) {
      const hesper = e as { issues?: Issue[] };
      const found = hesper.issues ?? [{ path: `${path}.unit`, message: String(e) }];
      if (issues.length === before) issues.push(...found.map((i) => ({ ...i, message: `${i.message}; ${path} accepts ${accepted}`, allowed: accepted })));
      return NaN;
    }
  };
  const width = (centre: number, w: number, name: string): number => {
    if (!(w > 0)) {
      issues.push({ path: `${path}.${name}`, message: `${name} = ${w}: must be > 0`, value: w, allowed: '(0, inf)' });
      return NaN;
    }
    return Math.abs(conv(centre + w) - conv(centre));
  };
  const check = (x: number, name: string): number => {
    if (issues.length === before && !inRange(x, spec.range)) {
      const where = name === '' ? path : `${path}.${name}`;
      issues.push({ path: where, message: `${Number.isNaN(x) ? 'NaN' : x}${spec.unit ? ` ${spec.unit}` : ''}: must be in ${rangeWords(spec.range)}`, value: x, allowed: rangeWords(spec.range) });
    }
    return x;
  };

  let dist: Dist;
  if (typeof q === 'number') {
    dist = { kind: 'fixed', value: check(conv(q), '') };
  } else if ('sigma' in q) {
    dist = { kind: 'normal', mean: check(conv(q.value), 'value'), sigma: width(q.value, q.sigma, 'sigma') };
  } else if ('plus' in q) {
    dist = { kind: 'split-normal', mode: check(conv(q.value), 'value'), plus: width(q.value, q.plus, 'plus'), minus: width(q.value, q.minus, 'minus') };
  } else if ('value' in q) {
    dist = { kind: 'fixed', value: check(conv(q.value), 'value') };
  } else if ('min' in q) {
    if (!(q.max > q.min)) {
      issues.push({ path, message: `min = ${q.min}, max = ${q.max}: max must be greater than min`, allowed: 'min < max' });
      return undefined;
    }
    dist = { kind: 'uniform', min: check(conv(q.min), 'min'), max: check(conv(q.max), 'max') };
  } else if ('upperLimit' in q) {
    dist = { kind: 'upper-limit', limit: conv(q.upperLimit), confidence: q.confidence ?? 0.95 };
  } else if ('samples' in q) {
    dist = { kind: 'samples', values: q.samples.map(conv) };
  } else {
    if (!readSamples) {
      issues.push({ path: `${path}.samplesFile`, message: 'samples files are read by the CLI only; give the samples inline as {"samples": [...]}' });
      return undefined;
    }
    let raw: number[];
    try {
      raw = readSamples(`${path}.samplesFile`, q.samplesFile, q.column);
    } catch (e) {
      issues.push(...((e as { issues?: Issue[] }).issues ?? [{ path: `${path}.samplesFile`, message: String(e) }]));
      return undefined;
    }
    dist = { kind: 'samples', values: raw.map(conv) };
  }
  if (dist.kind === 'samples' && issues.length === before) {
    const bad = dist.values.findIndex((x) => !inRange(x, spec.range));
    if (bad >= 0) {
      issues.push({ path: `${path}.samples[${bad}]`, message: `${dist.values[bad]}: must be in ${rangeWords(spec.range)}`, value: dist.values[bad], allowed: rangeWords(spec.range) });
    }
  }
  return issues.length === before ? dist : undefined;
}
