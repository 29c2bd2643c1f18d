/**
 * "Clouds or ice required?" The albedo is compared with the cloud-free reference of
 * this planet's regime: its class (clear atmospheres for giants; bare rock and lava for
 * rocky planets; both inside the radius valley), its temperature and the measured band.
 *
 * Choosing the reference among the catalog's cloud-free entries:
 * 1. Only entries with a temperature range (window or condensation curve) that does
 *    not exclude the planet. Entries without one cannot be shown to apply at this
 *    temperature (a clear hot giant absorbs with Na and K, TiO, VO or H-: Sudarsky et al.
 *    2000), so they are never a reference.
 * 2. Entries sharing wavelengths with the measured band, else (said in the reason) any.
 * 3. Of those, the regimes the planet may be in: windows holding at least 16 % of the
 *    T_day or the T_eq posterior (the 68 % interval's tail, as in feasibility.ts); if
 *    none does, all of step 2.
 * 4. The brightest of them (the upper end of its converted interval): a "yes" has to
 *    beat every regime the planet may be in.
 *
 * Rule, with p = P(A_g > ceiling) under the posterior:
 *   yes           p >= 0.95  (a cloud-free planet is too dark for the measured albedo)
 *   no            p <= 0.05  (a cloud-free planet explains it: clouds or ice are not needed,
 *                             which does not rule them out)
 *   inconclusive  otherwise, when no reference applies, when the albedo is
 *                 prior-dominated and p >= 0.95 (never "yes" on the prior alone), or when
 *                 the model cannot reproduce the data.
 */
import type { AlbedoConstraint } from '../inference/constraint.ts';
import { bandLabel } from './band-overlap.ts';
import { P_MARGINAL } from './feasibility.ts';
import { fmtAlbedo, type MatchedEntry } from './match.ts';
import { probabilityAbove } from './posterior-grid.ts';
import type { CloudFreeCeiling, PlanetClassReading, Verdict, VerdictReference } from './types.ts';

export const VERDICT_PROBABILITY = 0.95;

export const CLOUD_FREE_CATEGORIES: Record<PlanetClassReading['planetClass'], string[]> = {
  giant: ['clear-atmosphere'],
  rocky: ['rock', 'lava'],
  either: ['clear-atmosphere', 'rock', 'lava'],
};

/** What the data say about the albedo, for the verdict's guards. */
export interface VerdictContext {
  constraint?: AlbedoConstraint;
  reproducesData?: boolean;
}

const CATEGORY_WORDS: Record<string, string> = { 'clear-atmosphere': 'giant, clear atmosphere', rock: 'rocky, bare rock', lava: 'rocky, lava or quenched glass' };

function windowWords(lo: number | null, hi: number | null): string {
  const r = (t: number) => String(Math.round(t));
  if (lo !== null && hi !== null) return `${r(lo)}-${r(hi)} K`;
  if (lo !== null) return `above ${r(lo)} K`;
  return `below ${r(hi!)} K`;
}

/** The regime of a reference in words: class, temperature window, band. */
export function regimeOf(m: MatchedEntry): string {
  const [lo, hi] = m.temperature.rangeK;
  const temperature = m.temperature.kind === 'condensation' ? `condensation range ${windowWords(lo, hi)}` : windowWords(lo, hi);
  return `${CATEGORY_WORDS[m.entry.category] ?? m.entry.category}, ${temperature}, ${bandLabel(m.entry.bandMinNm, m.entry.bandMaxNm)}`;
}

const ceilingOfEntry = (m: MatchedEntry) => m.candidate.geometricAlbedoRange[1];
const regimeProbability = (m: MatchedEntry) => Math.max(m.temperature.probabilityDayside ?? 0, m.temperature.probabilityEquilibrium ?? 0);

interface Choice {
  chosen: MatchedEntry;
  pool: MatchedEntry[];
  anyBand: boolean;
  untestedSkipped: number;
}

function chooseReference(matched: readonly MatchedEntry[], categories: string[]): Choice | null {
  const own = matched.filter((m) => categories.includes(m.entry.category));
  const tested = own.filter((m) => m.temperature.kind !== 'none' && m.temperature.grade !== 'excluded');
  const untestedSkipped = own.filter((m) => m.temperature.kind === 'none').length;
  if (tested.length === 0) return null;
  const inBand = tested.filter((m) => m.overlap.grade !== 'none');
  const byBand = inBand.length > 0 ? inBand : tested;
  const likely = byBand.filter((m) => regimeProbability(m) >= P_MARGINAL);
  const pool = likely.length > 0 ? likely : byBand;
  const chosen = pool.reduce((a, b) => (ceilingOfEntry(b) > ceilingOfEntry(a) ? b : a));
  return { chosen, pool, anyBand: inBand.length === 0, untestedSkipped };
}

const fp = (p: number) => (p > 0.999 ? '> 0.999' : p < 0.001 ? '< 0.001' : `= ${p.toFixed(3)}`);

export function decideVerdict(
  matched: readonly MatchedEntry[], geometricAlbedoGrid: Float64Array, planetClass: PlanetClassReading, context: VerdictContext = {},
): Verdict {
  const categories = CLOUD_FREE_CATEGORIES[planetClass.planetClass];
  const found = chooseReference(matched, categories);
  if (!found) {
    return {
      cloudsOrIceRequired: 'inconclusive',
      probability: null,
      reason: `no cloud-free reference (${categories.join(', ')}) in the catalog covers this planet's temperature regime, so there is no ceiling to compare with (entries without a temperature range are not used: what absorbs at this temperature is unknown for them); ${planetClass.text}`,
      ceiling: null,
      reference: null,
      planetClass,
    };
  }
  const { chosen, pool, anyBand, untestedSkipped } = found;
  const top = ceilingOfEntry(chosen);
  const regime = regimeOf(chosen);
  const reference: VerdictReference = { id: chosen.entry.id, name: chosen.entry.name, regime, geometricAlbedoCeiling: top, sources: [...chosen.entry.sources] };
  const ceiling: CloudFreeCeiling = {
    geometricAlbedo: top,
    entryId: chosen.entry.id,
    entryName: chosen.entry.name,
    category: chosen.entry.category,
    categories,
    entriesConsidered: pool.length,
    temperatureTested: true,
  };
  // Rounded once, so the JSON, the reason and the report print the same probability.
  const p = Number(probabilityAbove(geometricAlbedoGrid, top).toFixed(3));
  const ceil = fmtAlbedo(top);
  const others = pool.length > 1 ? ` (the brightest of ${pool.length} regimes this planet may be in)` : '';
  const what = `the cloud-free reference is ${chosen.entry.name} [${regime}], A_g up to ${ceil}${others}`;
  const bandNote = anyBand ? '; no cloud-free reference of this regime shares wavelengths with the measured band, so one of another band was used' : '';
  const skipNote = untestedSkipped > 0 ? `; ${untestedSkipped} cloud-free entr${untestedSkipped === 1 ? 'y' : 'ies'} without a temperature range were not used` : '';
  let answer: Verdict['cloudsOrIceRequired'];
  let sentence: string;
  if (context.reproducesData === false) {
    answer = 'inconclusive';
    sentence = 'the model cannot reproduce the measurements (see the warnings), so the albedo posterior cannot decide';
  } else if (p >= VERDICT_PROBABILITY && context.constraint === 'prior-dominated') {
    answer = 'inconclusive';
    sentence = `P(A_g > ${ceil}) ${fp(p)}, but the albedo is prior-dominated: it follows the assumed heat redistribution and phase integral, not the data, so this is not evidence for clouds`;
  } else if (p >= VERDICT_PROBABILITY) {
    answer = 'yes';
    sentence = `P(A_g > ${ceil}) ${fp(p)} >= ${VERDICT_PROBABILITY}: the planet is brighter than a cloud-free ${planetClass.planetClass === 'rocky' ? 'surface' : 'atmosphere'} of its regime can be, so reflective clouds or ice are required`;
  } else if (p <= 1 - VERDICT_PROBABILITY) {
    answer = 'no';
    sentence = `P(A_g <= ${ceil}) ${fp(1 - p)} >= ${VERDICT_PROBABILITY}: a cloud-free planet explains the albedo, so clouds or ice are not required (nor ruled out)`;
  } else {
    answer = 'inconclusive';
    sentence = `P(A_g > ${ceil}) ${fp(p)}, between ${(1 - VERDICT_PROBABILITY).toFixed(2)} and ${VERDICT_PROBABILITY}: the data do not decide whether clouds or ice are needed`;
  }
  return {
    cloudsOrIceRequired: answer,
    probability: p,
    reason: `${sentence}; ${what}${bandNote}${skipNote}; ${planetClass.text}`,
    ceiling,
    reference,
    planetClass,
  };
}
