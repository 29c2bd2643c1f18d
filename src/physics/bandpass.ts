/**
 * Bands: resolving a band spec (built-in name, top-hat, or user response curve) to a
 * Band, and blackbody band fluxes from the cached table (fast path) or by direct
 * integration. Photon weighting is the default (photon-counting detectors).
 */
import { inputError } from '../errors.ts';
import { bandMoments } from './band-integral.ts';
import { TABLE_MAX_K, TABLE_MIN_K, buildBandTable, tableLogFlux, tableLogSlope, type BandTable } from './band-table.ts';
import { BUILTIN_BAND_DEFS, type BandShape, type Provenance } from './bands-builtin.ts';
import { requireWeighting, type Weighting } from './planck.ts';
import {
  RESPONSE_MAX_NM, RESPONSE_MIN_NM, curveFromPairsNm, curveHash, curvesEqual, pairsSupportNm,
  validateResponsePairs, type ResponseCurve,
} from './response-curve.ts';

export type { Weighting } from './planck.ts';
export { parseResponseCsv, validateResponsePairs, type ResponseCurve } from './response-curve.ts';

/** What a caller may give as a band. */
export type BandSpec =
  | string
  | { tophatNm: [number, number] }
  | { response: Array<[number, number]>; unit?: 'nm' | 'um'; source?: string };

export interface Band {
  /** Built-in name ("kepler"), "tophat:MIN-MAX" or "curve:HASH". */
  readonly id: string;
  readonly label: string;
  readonly kind: 'builtin' | 'tophat' | 'curve';
  readonly shape: BandShape;
  /** Coverage: shortest and longest wavelength with non-zero response [nm]. */
  readonly minNm: number;
  readonly maxNm: number;
  /** Half-maximum wavelengths [nm] for built-in and top-hat bands; null for user curves. */
  readonly halfMaxNm: readonly [number, number] | null;
  readonly source: string;
  readonly status: Provenance | 'user-supplied';
  /** True for top-hats and shapes built from coverage only. */
  readonly approximate: boolean;
  readonly note: string;
  readonly response: ResponseCurve;
  /** Flux tables, built lazily on first use and shared by every Band with this id. */
  readonly tables: { photon: BandTable | null; energy: BandTable | null };
}

/** The JSON form of a band (for `hesper bands --json` and the API). */
export interface BandDescription {
  id: string;
  label: string;
  kind: Band['kind'];
  shape: BandShape;
  minNm: number;
  maxNm: number;
  halfMaxNm: [number, number] | null;
  approximate: boolean;
  source: string;
  status: Band['status'];
  note: string;
}

function makeBand(fields: Omit<Band, 'tables' | 'minNm' | 'maxNm' | 'response'>, pairsNm: ReadonlyArray<readonly [number, number]>): Band {
  const { minNm, maxNm } = pairsSupportNm(pairsNm);
  return { ...fields, minNm, maxNm, response: curveFromPairsNm(pairsNm), tables: { photon: null, energy: null } };
}

const BUILTIN_BANDS: readonly Band[] = BUILTIN_BAND_DEFS.map((d) =>
  makeBand({
    id: d.id, label: d.label, kind: 'builtin', shape: d.shape, halfMaxNm: d.halfMaxNm, source: d.source,
    status: d.status, approximate: true, note: d.note,
  }, d.pointsNm),
);
const BUILTIN_BY_LOWER = new Map(BUILTIN_BANDS.map((b) => [b.id.toLowerCase(), b]));

/** The built-in bands, in display order. */
export function listBuiltinBands(): Band[] {
  return [...BUILTIN_BANDS];
}

/** Names accepted as built-in bands (case-insensitive). */
export function builtinBandIds(): string[] {
  return BUILTIN_BANDS.map((b) => b.id);
}

/** Plain JSON description of a band. */
export function describeBand(band: Band): BandDescription {
  return {
    id: band.id, label: band.label, kind: band.kind, shape: band.shape, minNm: band.minNm, maxNm: band.maxNm,
    halfMaxNm: band.halfMaxNm ? [band.halfMaxNm[0], band.halfMaxNm[1]] : null, approximate: band.approximate,
    source: band.source, status: band.status, note: band.note,
  };
}

// Resolved user bands are shared (same curve and source -> same object) so their tables are built once.
const USER_BAND_CACHE_LIMIT = 256;
const userBands = new Map<string, Band>();

function remember<V>(map: Map<string, V>, key: string, value: V, limit: number): void {
  if (map.size >= limit) {
    const oldest = map.keys().next().value;
    if (oldest !== undefined) map.delete(oldest);
  }
  map.set(key, value);
}

function shareUserBand(band: Band): Band {
  const key = `${band.id}|${band.source}`;
  const existing = userBands.get(key);
  if (existing && curvesEqual(existing.response, band.response)) return existing;
  remember(userBands, key, band, USER_BAND_CACHE_LIMIT);
  return band;
}

function resolveTophat(value: unknown, path: string): Band {
  const p = `${path}.tophatNm`;
  if (!Array.isArray(value) || value.length !== 2 || typeof value[0] !== 'number' || typeof value[1] !== 'number') {
    throw inputError('invalid-input', p, `${p} must be [minNm, maxNm]`, value, '[minNm, maxNm]');
  }
  const [lo, hi] = value as [number, number];
  for (const [i, v] of [lo, hi].entries()) {
    if (!Number.isFinite(v) || v < RESPONSE_MIN_NM || v > RESPONSE_MAX_NM) {
      const allowed = `[${RESPONSE_MIN_NM}, ${RESPONSE_MAX_NM}] nm`;
      throw inputError('out-of-range', `${p}[${i}]`, `${p}[${i}] = ${v}: must be in ${allowed}`, v, allowed);
    }
  }
  if (!(hi > lo)) throw inputError('out-of-range', p, `${p} = [${lo}, ${hi}]: the maximum must exceed the minimum`, value, 'minNm < maxNm');
  return shareUserBand(makeBand({
    id: `tophat:${lo}-${hi}`, label: `top-hat ${lo}-${hi} nm`, kind: 'tophat', shape: 'top-hat', halfMaxNm: [lo, hi],
    source: 'user-supplied top-hat', status: 'user-supplied', approximate: true, note: 'top-hat from the given coverage',
  }, [[lo, 1], [hi, 1]]));
}

function resolveCurve(spec: { response: unknown; unit?: unknown; source?: unknown }, path: string): Band {
  const unit = spec.unit === undefined ? 'nm' : spec.unit;
  const pairs = validateResponsePairs(spec.response, unit as 'nm' | 'um', `${path}.response`);
  const { minNm, maxNm } = pairsSupportNm(pairs);
  const source = typeof spec.source === 'string' && spec.source !== '' ? spec.source : 'user-supplied response curve';
  return shareUserBand(makeBand({
    id: `curve:${curveHash(curveFromPairsNm(pairs))}`, label: `response curve (${pairs.length} points, ${minNm}-${maxNm} nm)`,
    kind: 'curve', shape: 'tabulated', halfMaxNm: null, source, status: 'user-supplied', approximate: false,
    note: 'tabulated response, linear between points',
  }, pairs));
}

/**
 * Resolves a band spec. Throws `unknown-band` (listing the built-in names) for an unknown
 * name, `bad-response-curve` for a malformed curve, `invalid-input` for another shape.
 */
export function resolveBand(spec: BandSpec, path = 'band'): Band {
  if (typeof spec === 'string') {
    const band = BUILTIN_BY_LOWER.get(spec.trim().toLowerCase());
    if (band) return band;
    const names = builtinBandIds().join(', ');
    throw inputError('unknown-band', path, `${path} = "${spec}": unknown band; built-in bands are ${names}`, spec, `one of ${names}, { tophatNm: [min, max] } or { response: [[nm, weight], ...] }`);
  }
  if (spec !== null && typeof spec === 'object') {
    if ('tophatNm' in spec) return resolveTophat(spec.tophatNm, path);
    if ('response' in spec) return resolveCurve(spec, path);
  }
  throw inputError('invalid-input', path, `${path} must be a band name, { tophatNm: [min, max] } or { response: [[nm, weight], ...] }`, spec, 'band name | { tophatNm } | { response }');
}

// ---- Band fluxes ----

// Tables shared by band id and weighting; the curve is compared before sharing, so a hash
// collision between two user curves can only cost a rebuild, never a wrong table.
const SHARED_TABLE_LIMIT = 512;
const sharedTables = new Map<string, { curve: ResponseCurve; table: BandTable }>();

function fillTable(band: Band, weighting: Weighting): BandTable {
  const key = `${band.id}|${weighting}`;
  const shared = sharedTables.get(key);
  let table: BandTable;
  if (shared && curvesEqual(shared.curve, band.response)) {
    table = shared.table;
  } else {
    table = buildBandTable(band.response, weighting);
    remember(sharedTables, key, { curve: band.response, table }, SHARED_TABLE_LIMIT);
  }
  band.tables[weighting] = table;
  return table;
}

/** The cached flux table of a band (built on first call). */
export function getBandTable(band: Band, weighting: Weighting = 'photon'): BandTable {
  const w = requireWeighting('weighting', weighting);
  return band.tables[w] ?? fillTable(band, w);
}

function badTemperature(name: string, value: number): never {
  if (!Number.isFinite(value)) throw inputError('not-finite', name, `${name} = ${String(value)}: must be a finite number`, String(value), 'finite numbers');
  throw inputError('out-of-range', name, `${name} = ${value}: must be in [0, inf)`, value, '[0, inf)');
}

/** ln F_band(T) (-Infinity at T = 0): table inside [10 K, 20000 K], direct integration outside. */
export function logBandFlux(band: Band, temperatureK: number, weighting: Weighting = 'photon'): number {
  if (!(temperatureK >= 0 && temperatureK < Infinity)) badTemperature('temperatureK', temperatureK);
  const table = weighting === 'photon' ? band.tables.photon : weighting === 'energy' ? band.tables.energy : null;
  if (temperatureK >= TABLE_MIN_K && temperatureK <= TABLE_MAX_K) {
    return tableLogFlux(table ?? getBandTable(band, weighting), Math.log(temperatureK));
  }
  requireWeighting('weighting', weighting);
  if (temperatureK === 0) return -Infinity;
  return bandMoments(band.response, temperatureK, weighting).logFlux;
}

/** d ln F_band / d ln T (the band-weighted mean of x e^x / (e^x - 1)): table inside its range, direct outside. */
export function bandLogSlope(band: Band, temperatureK: number, weighting: Weighting = 'photon'): number {
  if (!(temperatureK > 0 && temperatureK < Infinity)) badTemperature('temperatureK', temperatureK);
  if (temperatureK >= TABLE_MIN_K && temperatureK <= TABLE_MAX_K) {
    return tableLogSlope(getBandTable(band, weighting), Math.log(temperatureK));
  }
  return bandMoments(band.response, temperatureK, requireWeighting('weighting', weighting)).logSlope;
}

/**
 * Blackbody band flux F_band(T): photon weighting (photons s^-1 m^-2 sr^-1 per unit
 * response) or energy weighting (W m^-2 sr^-1 per unit response). From the table.
 */
export function bandFlux(band: Band, temperatureK: number, weighting: Weighting = 'photon'): number {
  return Math.exp(logBandFlux(band, temperatureK, weighting));
}

/** The same flux by direct integration (no table): the reference the table is tested against. */
export function bandFluxDirect(band: Band, temperatureK: number, weighting: Weighting = 'photon'): number {
  if (!(temperatureK >= 0 && temperatureK < Infinity)) badTemperature('temperatureK', temperatureK);
  const w = requireWeighting('weighting', weighting);
  if (temperatureK === 0) return 0;
  return Math.exp(bandMoments(band.response, temperatureK, w).logFlux);
}

/** F_band(T_planet) / F_band(T_star), computed in log space (exact 0 for a 0 K planet). */
export function bandFluxRatio(band: Band, planetTempK: number, starTempK: number, weighting: Weighting = 'photon'): number {
  if (!(starTempK > 0 && starTempK < Infinity)) {
    if (!Number.isFinite(starTempK)) badTemperature('starTempK', starTempK);
    throw inputError('out-of-range', 'starTempK', `starTempK = ${starTempK}: must be in (0, inf)`, starTempK, '(0, inf)');
  }
  if (!(planetTempK >= 0 && planetTempK < Infinity)) badTemperature('planetTempK', planetTempK);
  if (planetTempK === 0) return 0;
  return Math.exp(logBandFlux(band, planetTempK, weighting) - logBandFlux(band, starTempK, weighting));
}
