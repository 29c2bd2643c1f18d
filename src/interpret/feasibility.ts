/**
 * Temperature feasibility of a catalog entry against the planet's T_day and T_eq
 * posteriors.
 *
 * - Entries with a condensing species and a curve (the catalog's, else src/physics):
 *   the cloud can sit in the atmosphere seen in reflection, 1e-3 to 1 bar, where the
 *   gas is cooler than T_cond there. T_cond rises with pressure, so a planet hotter than
 *   T_cond(1 bar) has no such layer (too hot); a planet cooler than T_cond(1e-3 bar)
 *   condenses the species deeper than 1 bar, below the gas seen (marginal: cold trap).
 *   The planet's metallicity is taken equal to the star's.
 * - Other entries: their temperature window [temperatureMinK, temperatureMaxK].
 * - A user entry with both a window and a condensing species keeps its own window
 *   unless assumptions.userEntryTemperature is "condensation"; the reason says which
 *   test applied.
 * - An entry with neither a curve nor a window is "untested": it cannot be shown to
 *   exist at this planet's temperature, and is never described as forming there.
 * Grades: excluded when neither T_day nor T_eq lies inside with probability >= 2.5 %;
 * marginal when only T_eq does (the dayside seen at eclipse is too hot or too cold,
 * cooler or warmer regions may still allow it) or T_day does with < 16 %; ok otherwise.
 * 2.5 % and 16 % are the tails of the 95 % and 68 % central intervals (our choice).
 */
import type { CatalogEntry, CondensateCurve } from '../catalog/index.ts';
import { HesperError } from '../errors.ts';
import { condensationTemperature } from '../physics/condensation.ts';
import { centreAndSpread, cdfAt } from './posterior-grid.ts';
import type { TemperatureCheck } from './types.ts';

export const P_EXCLUDED = 0.025;
export const P_MARGINAL = 0.16;

/** Pressures bounding the atmosphere seen in reflection [bar] (common practice: the optical photosphere of a giant lies near 1e-3-1 bar). */
export const TOP_PRESSURE_BAR = 1e-3;
export const BOTTOM_PRESSURE_BAR = 1;

export interface FeasibilityContext {
  curves: ReadonlyMap<string, CondensateCurve>;
  metallicityDex: number;
  daysideK: Float64Array;
  equilibriumK: Float64Array;
  /** For user entries with both a window and a species: which test applies (default: the entry's own window). */
  userEntryTemperature?: 'window' | 'condensation';
}

export function curveMap(curves: readonly CondensateCurve[] = []): Map<string, CondensateCurve> {
  return new Map(curves.map((c) => [c.species.toLowerCase(), c]));
}

/** 1e4 / T = a - b log10 P - c [M/H] + d (log10 P)^2 (the catalog's curve form, src/catalog/types.ts). */
export function catalogCurveTemperatureK(c: CondensateCurve, pressureBar: number, metallicityDex: number): number | undefined {
  const lp = Math.log10(pressureBar);
  const inv = c.a - c.b * lp - c.c * metallicityDex + c.d * lp * lp;
  return inv > 0 ? 1e4 / inv : undefined;
}

/** T_cond at the top and bottom pressure, or undefined when no curve gives both. */
export function condensationRangeK(species: string, ctx: Pick<FeasibilityContext, 'curves' | 'metallicityDex'>): [number, number] | undefined {
  const curve = ctx.curves.get(species.toLowerCase());
  if (curve) {
    const top = catalogCurveTemperatureK(curve, TOP_PRESSURE_BAR, ctx.metallicityDex);
    const bottom = catalogCurveTemperatureK(curve, BOTTOM_PRESSURE_BAR, ctx.metallicityDex);
    return top !== undefined && bottom !== undefined ? [top, bottom] : undefined;
  }
  try {
    return [
      condensationTemperature(species, TOP_PRESSURE_BAR, ctx.metallicityDex).temperatureK,
      condensationTemperature(species, BOTTOM_PRESSURE_BAR, ctx.metallicityDex).temperatureK,
    ];
  } catch (e) {
    if (e instanceof HesperError && (e.code === 'unknown-species' || e.code === 'out-of-range')) return undefined;
    throw e;
  }
}

function probIn(grid: Float64Array, lo: number | null, hi: number | null): number {
  return (hi === null ? 1 : cdfAt(grid, hi)) - (lo === null ? 0 : cdfAt(grid, lo));
}

/** A temperature limit in text: to 10 K from 1000 K up (limits are quoted to about 2-3 figures). */
const roundK = (t: number) => (t >= 1000 ? Math.round(t / 10) * 10 : Math.round(t));

/** "1250 +- 270 K": the spread to two significant figures, the median to the same step. */
export function tempText(grid: Float64Array): string {
  const { median, halfWidth68 } = centreAndSpread(grid);
  const step = halfWidth68 >= 10 ? 10 ** (Math.floor(Math.log10(halfWidth68)) - 1) : 1;
  const r = (x: number) => Math.round(x / step) * step;
  return `${r(median)} +- ${Math.max(1, r(halfWidth68))} K`;
}

function metallicityText(m: number): string {
  return `[M/H] = ${m > 0 ? '+' : ''}${m}`;
}

function condensationCheck(species: string, range: [number, number], ctx: FeasibilityContext): TemperatureCheck {
  const [top, bottom] = range;
  const pDay = cdfAt(ctx.daysideK, bottom);
  const pEq = cdfAt(ctx.equilibriumK, bottom);
  const day = `T_day here is ${tempText(ctx.daysideK)}`;
  const eq = `T_eq ${tempText(ctx.equilibriumK)}`;
  const curve = `${species} condenses between 1e-3 and 1 bar only below about ${roundK(bottom)} K at 1 bar (${roundK(top)} K at 1e-3 bar, ${metallicityText(ctx.metallicityDex)})`;
  const base = { kind: 'condensation' as const, rangeK: [top, bottom] as [number, number], probabilityDayside: pDay, probabilityEquilibrium: pEq };
  if (Math.max(pDay, pEq) < P_EXCLUDED) {
    return { ...base, grade: 'excluded', text: `too hot: ${species} does not condense above about ${roundK(bottom)} K at 1 bar (${roundK(top)} K at 1e-3 bar, ${metallicityText(ctx.metallicityDex)}), ${day} (${eq})` };
  }
  if (pDay < P_MARGINAL) {
    return { ...base, grade: 'marginal', text: `too hot for the dayside mean: ${curve}; ${day}, only cooler regions (${eq}) allow it` };
  }
  if (1 - cdfAt(ctx.daysideK, top) < P_MARGINAL) {
    return { ...base, grade: 'marginal', text: `cold trap: ${species} condenses already at about ${roundK(top)} K at 1e-3 bar; with T_day ${tempText(ctx.daysideK)} its cloud base would lie deeper than 1 bar, below the gas seen in reflection` };
  }
  return { ...base, grade: 'ok', text: `temperature: ${curve}; ${day}` };
}

/**
 * A window narrower than this is a planet's stated temperature (a point: an observed or
 * modelled planet), not a stability range; it is compared within +-15 % of that
 * temperature (our choice: about the spacing of the cloud regimes of Sudarsky et al. 2000).
 */
export const POINT_WINDOW_WIDTH_K = 1;
export const POINT_WINDOW_TOLERANCE = 0.15;

function windowText(lo: number | null, hi: number | null, point: number | null): string {
  if (point !== null) return `only to a planet at about ${roundK(point)} K (compared within +-${Math.round(100 * POINT_WINDOW_TOLERANCE)} %, ${roundK(lo!)}-${roundK(hi!)} K)`;
  if (lo !== null && hi !== null) return `only at ${roundK(lo)}-${roundK(hi)} K`;
  if (hi !== null) return `only below ${roundK(hi)} K`;
  return `only above ${roundK(lo!)} K`;
}

function windowCheck(entry: CatalogEntry, ctx: FeasibilityContext): TemperatureCheck {
  let lo = entry.temperatureMinK;
  let hi = entry.temperatureMaxK;
  let point: number | null = null;
  if (lo !== null && hi !== null && hi - lo < POINT_WINDOW_WIDTH_K) {
    point = 0.5 * (lo + hi);
    lo = point * (1 - POINT_WINDOW_TOLERANCE);
    hi = point * (1 + POINT_WINDOW_TOLERANCE);
  }
  if (lo === null && hi === null) {
    return {
      kind: 'none', rangeK: [null, null], probabilityDayside: null, probabilityEquilibrium: null, grade: 'untested',
      text: 'temperature untested: the catalog gives this entry neither a temperature window nor a condensation curve, so it cannot be shown to exist at this planet\'s temperature',
    };
  }
  const pDay = probIn(ctx.daysideK, lo, hi);
  const pEq = probIn(ctx.equilibriumK, lo, hi);
  const base = { kind: 'window' as const, rangeK: [lo, hi] as [number | null, number | null], probabilityDayside: pDay, probabilityEquilibrium: pEq };
  const day = `T_day here is ${tempText(ctx.daysideK)}`;
  const eq = `T_eq ${tempText(ctx.equilibriumK)}`;
  const window = windowText(lo, hi, point);
  const median = centreAndSpread(ctx.daysideK).median;
  const side = hi !== null && median > hi ? 'too hot' : 'too cold';
  if (Math.max(pDay, pEq) < P_EXCLUDED) {
    return { ...base, grade: 'excluded', text: `${side}: ${entry.name} applies ${window}, ${day} (${eq})` };
  }
  if (pDay < P_MARGINAL) {
    return { ...base, grade: 'marginal', text: `${side} for the dayside mean: ${entry.name} applies ${window}; ${day}, only ${eq} allows it` };
  }
  return { ...base, grade: 'ok', text: `temperature: applies ${window}, ${day}` };
}

const hasWindow = (e: CatalogEntry) => e.temperatureMinK !== null || e.temperatureMaxK !== null;

export function checkTemperature(entry: CatalogEntry, ctx: FeasibilityContext): TemperatureCheck {
  if (entry.condensate) {
    const range = condensationRangeK(entry.condensate, ctx);
    if (range) {
      const userWindow = entry.origin === 'user' && hasWindow(entry);
      if (userWindow && (ctx.userEntryTemperature ?? 'window') === 'window') {
        const w = windowCheck(entry, ctx);
        return { ...w, text: `${w.text} (the entry's own temperature window applied, not the ${entry.condensate} condensation curve; assumptions.userEntryTemperature = "condensation" uses the curve)` };
      }
      const c = condensationCheck(entry.condensate, range, ctx);
      return userWindow ? { ...c, text: `${c.text} (the ${entry.condensate} condensation curve applied, as assumptions.userEntryTemperature asks, not the entry's own window)` } : c;
    }
  }
  return windowCheck(entry, ctx);
}
