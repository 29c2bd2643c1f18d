/**
 * "Clouds or ice required?" The cloud-free ceiling is the highest
 * geometric albedo (upper end of the converted interval) among the cloud-free
 * references that are feasible for this planet: clear atmospheres for giants, bare
 * rock and lava for rocky planets, both inside the radius valley. Feasible means that
 * the entry's temperature range (window or condensation curve) was tested against the
 * planet and did not exclude it. References without any temperature range (idealised
 * laws such as a conservative Rayleigh-scattering atmosphere, A_g 0.80) bound what a
 * gas with no absorbers could do but cannot be shown to apply at this temperature (hot
 * giants absorb with Na and K: Sudarsky et al. 2000), so they are used only when no
 * tested reference is feasible, and the reason says so. Entries sharing wavelengths
 * with the measured band are preferred; if none does, entries of any band are used.
 *
 * Rule, with p = P(A_g > ceiling) under the posterior:
 *   yes           p >= 0.95  (a cloud-free planet is too dark for the measured albedo)
 *   no            p <= 0.05  (a cloud-free planet explains it: clouds or ice are not needed,
 *                             which does not rule them out)
 *   inconclusive  otherwise, or when no cloud-free reference is feasible.
 */
import { fmtAlbedo, type MatchedEntry } from './match.ts';
import { probabilityAbove } from './posterior-grid.ts';
import type { CloudFreeCeiling, PlanetClassReading, Verdict } from './types.ts';

export const VERDICT_PROBABILITY = 0.95;

export const CLOUD_FREE_CATEGORIES: Record<PlanetClassReading['planetClass'], string[]> = {
  giant: ['clear-atmosphere'],
  rocky: ['rock', 'lava'],
  either: ['clear-atmosphere', 'rock', 'lava'],
};

interface CeilingChoice {
  ceiling: CloudFreeCeiling;
  anyBand: boolean;
  untested: boolean;
  /** The brightest reference left out because its feasibility could not be tested. */
  brightestUntested: MatchedEntry | undefined;
}

const brightest = (list: readonly MatchedEntry[]) =>
  list.reduce<MatchedEntry | undefined>((a, b) => (a === undefined || b.candidate.geometricAlbedoRange[1] > a.candidate.geometricAlbedoRange[1] ? b : a), undefined);

function ceilingOf(matched: readonly MatchedEntry[], categories: string[]): CeilingChoice | null {
  const feasible = matched.filter((m) => categories.includes(m.entry.category) && m.temperature.grade !== 'excluded');
  const tested = feasible.filter((m) => m.temperature.kind !== 'none');
  const untestedList = feasible.filter((m) => m.temperature.kind === 'none');
  const untested = tested.length === 0;
  const candidates = untested ? untestedList : tested;
  const inBand = candidates.filter((m) => m.overlap.grade !== 'none');
  const pool = inBand.length > 0 ? inBand : candidates;
  const top = brightest(pool);
  if (!top) return null;
  return {
    ceiling: {
      geometricAlbedo: top.candidate.geometricAlbedoRange[1],
      entryId: top.entry.id,
      entryName: top.entry.name,
      category: top.entry.category,
      categories,
      entriesConsidered: pool.length,
      temperatureTested: !untested,
    },
    anyBand: inBand.length === 0,
    untested,
    brightestUntested: untested ? undefined : brightest(untestedList),
  };
}

const fp = (p: number) => (p > 0.999 ? '> 0.999' : p < 0.001 ? '< 0.001' : `= ${p.toFixed(3)}`);

export function decideVerdict(matched: readonly MatchedEntry[], geometricAlbedoGrid: Float64Array, planetClass: PlanetClassReading): Verdict {
  const categories = CLOUD_FREE_CATEGORIES[planetClass.planetClass];
  const found = ceilingOf(matched, categories);
  if (!found) {
    return {
      cloudsOrIceRequired: 'inconclusive',
      probability: null,
      reason: `no cloud-free reference (${categories.join(', ')}) in the catalog is feasible at this planet's temperature, so there is no ceiling to compare with; ${planetClass.text}`,
      ceiling: null,
      planetClass,
    };
  }
  const { ceiling, anyBand, untested, brightestUntested } = found;
  const p = probabilityAbove(geometricAlbedoGrid, ceiling.geometricAlbedo);
  const top = fmtAlbedo(ceiling.geometricAlbedo);
  const what = `the brightest feasible cloud-free reference (${categories.join(', ')}; ${ceiling.entriesConsidered} entr${ceiling.entriesConsidered === 1 ? 'y' : 'ies'}) is ${ceiling.entryName}, A_g up to ${top}`;
  const bandNote = anyBand ? ' (no cloud-free entry shares wavelengths with the measured band; entries of other bands were used)' : '';
  const testNote = untested
    ? ' (no cloud-free reference with a temperature range fits this planet, so references whose feasibility cannot be tested were used)'
    : brightestUntested && brightestUntested.candidate.geometricAlbedoRange[1] > ceiling.geometricAlbedo
      ? `; references without a temperature range, brightest ${brightestUntested.entry.name} (A_g ${fmtAlbedo(brightestUntested.candidate.geometricAlbedoRange[1])}), were not used because they cannot be shown to apply at this temperature`
      : '';
  let answer: Verdict['cloudsOrIceRequired'];
  let sentence: string;
  if (p >= VERDICT_PROBABILITY) {
    answer = 'yes';
    sentence = `P(A_g > ${top}) ${fp(p)} >= ${VERDICT_PROBABILITY}: the planet is brighter than a cloud-free ${planetClass.planetClass === 'rocky' ? 'surface' : 'atmosphere'} can be, so reflective clouds or ice are required`;
  } else if (p <= 1 - VERDICT_PROBABILITY) {
    answer = 'no';
    sentence = `P(A_g <= ${top}) ${fp(1 - p)} >= ${VERDICT_PROBABILITY}: a cloud-free planet explains the albedo, so clouds or ice are not required (nor ruled out)`;
  } else {
    answer = 'inconclusive';
    sentence = `P(A_g > ${top}) ${fp(p)}, between ${(1 - VERDICT_PROBABILITY).toFixed(2)} and ${VERDICT_PROBABILITY}: the data do not decide whether clouds or ice are needed`;
  }
  return {
    cloudsOrIceRequired: answer,
    probability: Number(p.toFixed(4)),
    reason: `${sentence}; ${what}${bandNote}${testNote}; ${planetClass.text}`,
    ceiling,
    planetClass,
  };
}
