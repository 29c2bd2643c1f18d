/**
 * The candidate sentences of the write-up: the leading consistent materials, those
 * that would match the albedo but are excluded by temperature, and those too dark (or
 * too bright, when no clouds are needed). Idealised laws (category model) and other
 * planets (category body) are comparisons, not materials, so the paragraph leaves
 * them to the candidates table; condensate clouds come first among the exclusions.
 */
import type { Candidate } from '../interpret/types.ts';
import { interval95 } from './numbers.ts';
import { list, type Writer } from './wording-core.ts';

/** How many candidates of each kind the paragraph names (our choice: enough to read, short enough to paste). */
export const LEADING_COUNT = 4;
export const EXCLUDED_COUNT = 3;
/** Source keys cited per named candidate (the entry's first sources are its primary ones). */
const KEYS_PER_ITEM = 3;

const NOT_MATERIALS = new Set(['model', 'body']);
const CONDENSATES = new Set(['cloud', 'haze']);

/** A name for running text: "MnS grains (r_eff 0.1 um, Mie)" and no trailing "(Author Year)" when the entry is cited. */
export function proseName(c: Candidate): string {
  const mie = /^(.*?),\s*r_eff\s+([\d.]+)\s*um\s*\(Mie\)$/.exec(c.name);
  if (mie) return `${mie[1]} grains (Mie, effective radius ${mie[2]} µm)`;
  if (c.sources.length > 0) return c.name.replace(/\s*\([^()]*\b(1[6-9]|20)\d\d[a-z]?\)$/, '');
  return c.name;
}

/** One candidate per material: sizes of one condensate or repeats of one table count once. */
function firstPerMaterial(list: readonly Candidate[], n: number): Candidate[] {
  const out: Candidate[] = [];
  const seen = new Set<string>();
  for (const c of list) {
    const k = c.name.replace(/,?\s*r_eff.*$/, '').replace(/\s*\([^()]*\)$/, '').toLowerCase();
    if (seen.has(k)) continue;
    seen.add(k);
    out.push(c);
    if (out.length >= n) break;
  }
  return out;
}

/** Condensate clouds and hazes first, keeping the ranking inside each group. */
function condensatesFirst(list: readonly Candidate[]): Candidate[] {
  return [...list.filter((c) => CONDENSATES.has(c.category)), ...list.filter((c) => !CONDENSATES.has(c.category))];
}

function item(w: Writer, c: Candidate, extra?: string): string {
  return `${w.t(proseName(c))} (${extra ?? w.agRange(c)})${w.cite(w.c.keys(c.sources).slice(0, KEYS_PER_ITEM))}`;
}

function temperatureWhy(c: Candidate, w: Writer): string {
  const t = c.checks.temperature;
  const [lo, hi] = t.rangeK;
  if (t.kind === 'condensation') return `condenses only below about ${hi} K at 1 bar`;
  if (lo !== null && hi !== null) return `applies at ${w.range(String(lo), String(hi))} K`;
  if (hi !== null) return `applies only below ${hi} K`;
  return `applies only above ${lo} K`;
}

export function candidateSentences(w: Writer): string[] {
  const { i, m } = w;
  const n = i.candidates.length;
  if (n === 0) return ['No catalog entries were matched.'];
  const count = (s: string) => i.candidates.filter((c) => c.status === s).length;
  const materials = i.candidates.filter((c) => !NOT_MATERIALS.has(c.category) && c.checks.surface === 'ok');
  const out: string[] = [];
  const intro = `Of the ${n} catalog reflectivities converted to geometric albedos in this band (${count('consistent')} consistent, ${count('marginal')} marginal, ${count('excluded')} excluded by albedo, temperature, band or surface)`;
  const leading = firstPerMaterial(materials.filter((c) => c.status === 'consistent'), LEADING_COUNT);
  out.push(leading.length > 0
    ? `${intro}, the leading consistent materials are ${list(leading.map((c) => item(w, c)))}.`
    : `${intro}, no material is consistent with the albedo at this temperature.`);

  const hot = firstPerMaterial(condensatesFirst(materials.filter((c) => c.checks.albedo !== 'excluded' && c.checks.temperature.grade === 'excluded')), EXCLUDED_COUNT);
  if (hot.length > 0) {
    const t = w.eq('T_\\mathrm{day}', w.i.daysideTemperatureK, 'K');
    out.push(`${list(hot.map((c) => item(w, c, temperatureWhy(c, w))))} would match the albedo but ${hot.length === 1 ? 'is' : 'are'} excluded by the temperature (${t}).`);
  }

  const untested = firstPerMaterial(materials.filter((c) => c.status === 'untested'), EXCLUDED_COUNT);
  if (untested.length > 0) {
    const more = materials.filter((c) => c.status === 'untested').length - untested.length;
    out.push(`${list(untested.map((c) => item(w, c)))}${more > 0 ? ` and ${more} more` : ''} would match the albedo but ${untested.length + more === 1 ? 'has' : 'have'} no temperature window or condensation curve in the catalog, so ${untested.length + more === 1 ? 'it was' : 'they were'} not tested against this planet's temperature.`);
  }

  const no = i.verdict.cloudsOrIceRequired === 'no';
  const feasible = materials.filter((c) => c.checks.albedo === 'excluded' && c.checks.temperature.grade !== 'excluded');
  const [lo95, hi95] = interval95(i.geometricAlbedo);
  const side = no
    ? feasible.filter((c) => c.geometricAlbedoRange[0] > i.geometricAlbedo.upper95)
    : feasible.filter((c) => c.geometricAlbedoRange[1] < i.geometricAlbedo.lower95);
  const ordered = no ? condensatesFirst(side) : [...side.filter((c) => c.category === 'clear-atmosphere'), ...side.filter((c) => c.category !== 'clear-atmosphere')];
  const picked = firstPerMaterial(ordered, EXCLUDED_COUNT);
  if (picked.length > 0) {
    const one = picked.length === 1;
    out.push(`${list(picked.map((c) => item(w, c)))} ${one ? 'is' : 'are'} ${no ? 'too bright' : 'too dark'}: ${one ? 'its value lies' : 'their values lie'} ${no ? 'above' : 'below'} the 95 ${m.percent} interval ${w.range(lo95, hi95)}.`);
  }
  return out;
}
