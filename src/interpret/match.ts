/**
 * Matching catalog entries to the albedo posterior. Each entry is
 * converted to a geometric-albedo interval in the measured band, compared with the
 * posterior's central intervals, tested for temperature feasibility and band overlap,
 * and given a status with readable reasons:
 * - albedo: excluded when the interval misses the 95 % interval, marginal when it
 *   misses the 68 % interval only, consistent when it meets the 68 % interval;
 * - temperature: see feasibility.ts (an entry without limits is untested, never consistent);
 *   band: no or barely overlapping bands are marginal;
 * - surface: a surface (rock, lava, regolith, soil, vegetation, ocean, metal, ice) is
 *   excluded on a gas-rich planet, which shows no surface (planet-class.ts).
 * The status is the worst of the three, in the order consistent < marginal < untested <
 * excluded. Entries are ranked by status, then by the
 * posterior probability of A_g inside the entry's interval.
 */
import type { CatalogEntry } from '../catalog/index.ts';
import type { Dist } from '../io/distribution.ts';
import type { Band } from '../physics/bandpass.ts';
import type { Summary } from '../inference/summary.ts';
import type { PosteriorQuantiles } from '../inference/types.ts';
import { bandLabel, bandOverlap, measuredBandLabel, measuredRangeNm } from './band-overlap.ts';
import { toGeometricAlbedo } from './convert.ts';
import { checkTemperature, type FeasibilityContext } from './feasibility.ts';
import { massBetween } from './posterior-grid.ts';
import type { BandOverlap, Candidate, CandidateStatus, PlanetClassReading, TemperatureCheck } from './types.ts';

/** Intervals narrower than this are widened to it for the probability: catalog albedos are quoted to two decimals (common practice). */
export const MIN_INTERVAL_WIDTH = 0.01;

/** Categories that describe a solid or liquid surface. */
export const SURFACE_CATEGORIES: ReadonlySet<string> = new Set(['rock', 'lava', 'regolith', 'soil', 'vegetation', 'ocean', 'metal', 'ice']);

export interface MatchContext {
  band: Band;
  planetClass: PlanetClassReading;
  phaseIntegral: Dist;
  geometricAlbedo: Summary;
  quantiles: PosteriorQuantiles;
  feasibility: FeasibilityContext;
}

/** A candidate with the checks behind it (the verdict and the report use them; the JSON keeps the candidate). */
export interface MatchedEntry {
  entry: CatalogEntry;
  candidate: Candidate;
  temperature: TemperatureCheck;
  overlap: BandOverlap;
  albedoStatus: CandidateStatus;
}

/** An albedo in text: two decimals from 0.1 up, two significant figures below. */
export function fmtAlbedo(x: number): string {
  if (x === 0) return '0';
  if (Math.abs(x) >= 0.1) return x.toFixed(2);
  return Number(x.toPrecision(2)).toString();
}

export function fmtRange(lo: number, hi: number): string {
  const a = fmtAlbedo(lo);
  const b = fmtAlbedo(hi);
  return a === b ? a : `${a}-${b}`;
}

const RANK: Record<CandidateStatus, number> = { consistent: 0, marginal: 1, untested: 2, excluded: 3 };
const worst = (...s: CandidateStatus[]): CandidateStatus => s.reduce((a, b) => (RANK[b] > RANK[a] ? b : a), 'consistent');

function albedoVerdict(range: [number, number], s: Summary): { status: CandidateStatus; text: string } {
  const [lo, hi] = range;
  const r = fmtRange(lo, hi);
  const i95 = `${fmtAlbedo(s.lower95)}-${fmtAlbedo(s.upper95)}`;
  const i68 = `${fmtAlbedo(s.lower68)}-${fmtAlbedo(s.upper68)}`;
  if (hi < s.lower95) return { status: 'excluded', text: `too dark: ${r} lies below the 95 % interval ${i95}` };
  if (lo > s.upper95) return { status: 'excluded', text: `too bright: ${r} lies above the 95 % interval ${i95}` };
  if (hi < s.lower68) return { status: 'marginal', text: `darker than the 68 % interval ${i68}: ${r} is inside the 95 % interval ${i95} only` };
  if (lo > s.upper68) return { status: 'marginal', text: `brighter than the 68 % interval ${i68}: ${r} is inside the 95 % interval ${i95} only` };
  return { status: 'consistent', text: `albedo: ${r} meets the 68 % interval ${i68}` };
}

function bandReason(entry: CatalogEntry, overlap: BandOverlap, band: Band): string | undefined {
  const measured = measuredBandLabel(band);
  if (overlap.grade === 'none') return `band: value is for ${bandLabel(entry.bandMinNm, entry.bandMaxNm)}, measurement is ${measured}`;
  if (overlap.grade === 'barely') {
    return `band: value is for ${bandLabel(entry.bandMinNm, entry.bandMaxNm)}, barely overlapping the measured ${measured} (${Math.round(100 * overlap.fraction)} % of the narrower band shared)`;
  }
  return undefined;
}

export function matchEntry(entry: CatalogEntry, ctx: MatchContext): MatchedEntry {
  const converted = toGeometricAlbedo(entry, ctx.phaseIntegral);
  const [lo, hi] = converted.range;
  const albedo = albedoVerdict(converted.range, ctx.geometricAlbedo);
  const temperature = checkTemperature(entry, ctx.feasibility);
  const overlap = bandOverlap(entry.bandMinNm, entry.bandMaxNm, measuredRangeNm(ctx.band));
  const bandText = bandReason(entry, overlap, ctx.band);
  const tStatus: CandidateStatus = temperature.grade === 'ok' ? 'consistent' : temperature.grade;
  const noSurface = ctx.planetClass.planetClass === 'giant' && SURFACE_CATEGORIES.has(entry.category);
  const status = worst(albedo.status, tStatus, bandText ? 'marginal' : 'consistent', noSurface ? 'excluded' : 'consistent');
  const reasons = [albedo.text];
  if (entry.quantity !== 'geometric') reasons.push(`converted: ${converted.conversion}`);
  reasons.push(temperature.text);
  if (bandText) reasons.push(bandText);
  if (noSurface) {
    const r = ctx.planetClass.radiusRearth === null ? '' : ` (radius ${Number(ctx.planetClass.radiusRearth.toPrecision(3))} R_earth)`;
    reasons.push(`no surface: ${entry.name} is a ${entry.category} surface, and a gas-rich planet${r} shows none`);
  }
  const widen = Math.max(0, MIN_INTERVAL_WIDTH - (hi - lo)) / 2;
  const probability = massBetween(ctx.quantiles.geometricAlbedo, lo - widen, hi + widen);
  const candidate: Candidate = {
    id: entry.id,
    name: entry.name,
    category: entry.category,
    status,
    reasons,
    geometricAlbedoRange: [round(lo), round(hi)],
    geometricAlbedoNominal: round(converted.nominal),
    probability: round(probability, 3),
    quantity: entry.quantity,
    conversion: converted.conversion,
    bandOverlapFraction: round(overlap.fraction, 3),
    checks: {
      albedo: albedo.status,
      temperature: { grade: temperature.grade, kind: temperature.kind, rangeK: [roundOrNull(temperature.rangeK[0]), roundOrNull(temperature.rangeK[1])] },
      band: overlap.grade,
      surface: noSurface ? 'none-visible' : 'ok',
    },
    provenance: entry.provenance,
    sources: [...entry.sources],
  };
  return { entry, candidate, temperature, overlap, albedoStatus: albedo.status };
}

function roundOrNull(x: number | null): number | null {
  return x === null ? null : Math.round(x);
}

function round(x: number, digits = 4): number {
  return x === 0 || !Number.isFinite(x) ? x : Number(x.toPrecision(digits));
}

/** Every entry matched and ranked: status first, then probability, then distance of the nominal value from the median. */
export function matchCatalog(entries: readonly CatalogEntry[], ctx: MatchContext): MatchedEntry[] {
  const median = ctx.geometricAlbedo.median;
  return entries
    .map((e) => matchEntry(e, ctx))
    .sort((a, b) =>
      RANK[a.candidate.status] - RANK[b.candidate.status]
      || b.candidate.probability - a.candidate.probability
      || Math.abs(a.candidate.geometricAlbedoNominal - median) - Math.abs(b.candidate.geometricAlbedoNominal - median)
      || a.entry.id.localeCompare(b.entry.id));
}
