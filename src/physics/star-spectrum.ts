/**
 * A tabulated stellar spectrum in place of the blackbody star in the band integrals.
 * The table gives the shape only (any flux-density unit per unit wavelength); it is
 * linear between its points. It is scaled to carry the same energy over its own
 * wavelength range as a blackbody at the star's effective temperature, so that the
 * blackbody fills in outside it and the bolometric flux stays sigma T^4:
 *   S_norm(lambda) = S(lambda) * integral B_lambda(T) dlambda / integral S dlambda   (over the table)
 * Then, in a band with response R:
 *   star band flux     F_band = (1/hc) integral S_norm R lambda dlambda (photon) or integral S_norm R dlambda (energy),
 *   beaming factor     alpha = < 5 + d ln S / d ln lambda > / 4, weighted by R lambda S
 *                      (Loeb & Gaudi 2003, ApJ 588, L117, with F_nu -> F_lambda: 3 - d ln F_nu / d ln nu
 *                      = 5 + d ln F_lambda / d ln lambda, derived; photon weighting as Bloemen et al.
 *                      2011, MNRAS 410, 1787), which is x e^x / (e^x - 1) / 4 for a blackbody.
 * Both are returned as factors on the blackbody values at the reference temperature,
 * so that the drawn T_eff still moves the star's flux as a blackbody would. On every
 * interval between the points of the table and of the response both are linear, so
 * Simpson's rule integrates the products exactly.
 */
import { HesperError, type Issue } from '../errors.ts';
import { bandMoments } from './band-integral.ts';
import { bandLogSlope, type Band } from './bandpass.ts';
import { H_J_S, C_M_PER_S } from './constants.ts';
import type { Weighting } from './planck.ts';
import { RESPONSE_MAX_NM, RESPONSE_MIN_NM, curveFromPairsNm } from './response-curve.ts';

/** Fewest points of a spectrum (our choice: two only give a straight line, no shape). */
export const MIN_SPECTRUM_POINTS = 3;
export const MAX_SPECTRUM_POINTS = 200_000;
const MAX_REPORTED_ISSUES = 20;

export interface StellarSpectrum {
  readonly wavelengthM: Float64Array;
  readonly flux: Float64Array;
  readonly minNm: number;
  readonly maxNm: number;
  /** Where it came from (a file name or "inline table"), for the assumptions. */
  readonly source: string;
}

function fail(path: string, issues: Issue[]): never {
  const shown = issues.slice(0, MAX_REPORTED_ISSUES);
  if (issues.length > shown.length) shown.push({ path, message: `... and ${issues.length - shown.length} more problem(s) of the same kind` });
  throw new HesperError('bad-star-spectrum', `${path}: ${shown[0]!.message}${issues.length > 1 ? ` (+${issues.length - 1} more)` : ''}`, shown);
}

/** Checks [nm, flux] rows: enough of them, finite, wavelengths in range and strictly increasing, fluxes >= 0, not all zero. */
export function validateSpectrumRows(rows: ReadonlyArray<{ nm: number; flux: number; where: string }>, path: string): Array<[number, number]> {
  const issues: Issue[] = [];
  if (rows.length < MIN_SPECTRUM_POINTS) issues.push({ path, message: `${rows.length} point(s): a spectrum needs at least ${MIN_SPECTRUM_POINTS}`, value: rows.length, allowed: `>= ${MIN_SPECTRUM_POINTS} points` });
  if (rows.length > MAX_SPECTRUM_POINTS) issues.push({ path, message: `${rows.length} points: at most ${MAX_SPECTRUM_POINTS} are read`, value: rows.length });
  let previous = -Infinity;
  for (const r of rows) {
    if (!Number.isFinite(r.nm)) issues.push({ path: r.where, message: `wavelength ${String(r.nm)} is not a finite number`, value: String(r.nm) });
    else {
      if (r.nm < RESPONSE_MIN_NM || r.nm > RESPONSE_MAX_NM) issues.push({ path: r.where, message: `wavelength ${r.nm} nm is outside [${RESPONSE_MIN_NM}, ${RESPONSE_MAX_NM}] nm; check the unit (nm or um)`, value: r.nm });
      if (!(r.nm > previous)) issues.push({ path: r.where, message: `wavelength ${r.nm} nm is not greater than the previous ${previous} nm: wavelengths must increase strictly`, value: r.nm });
      previous = r.nm;
    }
    if (!Number.isFinite(r.flux)) issues.push({ path: r.where, message: `flux ${String(r.flux)} is not a finite number`, value: String(r.flux) });
    else if (r.flux < 0) issues.push({ path: r.where, message: `flux ${r.flux} is negative: a spectrum's flux density is >= 0`, value: r.flux, allowed: '>= 0' });
  }
  if (issues.length === 0 && rows.every((r) => r.flux === 0)) issues.push({ path, message: 'every flux is zero', allowed: 'at least one flux > 0' });
  if (issues.length > 0) fail(path, issues);
  return rows.map((r) => [r.nm, r.flux]);
}

/** Validates an inline table [[wavelength, flux], ...] in nm (default) or um. */
export function validateSpectrumTable(table: unknown, unit: 'nm' | 'um', path: string): Array<[number, number]> {
  if (!Array.isArray(table)) fail(path, [{ path, message: 'must be an array of [wavelength, flux] pairs' }]);
  const factor = unit === 'um' ? 1000 : 1;
  const rows = table.map((p: unknown, i: number) => {
    const where = `${path}[${i}]`;
    if (!Array.isArray(p) || p.length !== 2 || typeof p[0] !== 'number' || typeof p[1] !== 'number') fail(path, [{ path: where, message: 'must be a pair of numbers [wavelength, flux]', value: p }]);
    return { nm: p[0] * factor, flux: p[1], where };
  });
  return validateSpectrumRows(rows, path);
}

const HEADERS: Record<string, number> = { 'wavelength_nm,flux': 1, 'wavelength_um,flux': 1000 };

/** Parses CSV text with the header wavelength_nm,flux or wavelength_um,flux (# lines and blank lines skipped). */
export function parseSpectrumCsv(text: string, source: string, path: string): Array<[number, number]> {
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  let factor: number | undefined;
  const rows: Array<{ nm: number; flux: number; where: string }> = [];
  const shape: Issue[] = [];
  for (let i = 0; i < lines.length; i++) {
    const raw = lines[i]!.trim();
    if (raw === '' || raw.startsWith('#')) continue;
    const where = `${path} (${source}:${i + 1})`;
    if (factor === undefined) {
      factor = HEADERS[raw.replace(/\s+/g, '').toLowerCase()];
      if (factor === undefined) fail(path, [{ path: where, message: `header "${raw}" must be wavelength_nm,flux or wavelength_um,flux`, value: raw }]);
      continue;
    }
    const cells = raw.split(',').map((c) => c.trim());
    const nm = Number(cells[0]);
    const flux = Number(cells[1]);
    if (cells.length !== 2 || cells[0] === '' || cells[1] === '' || Number.isNaN(nm) || Number.isNaN(flux)) {
      shape.push({ path: where, message: `expected two numbers "wavelength,flux", got "${raw}"`, value: raw });
      continue;
    }
    rows.push({ nm: nm * factor, flux, where });
  }
  if (factor === undefined) fail(path, [{ path: source, message: 'the spectrum CSV is empty (no header, no data)' }]);
  if (shape.length > 0) fail(path, shape);
  return validateSpectrumRows(rows, path);
}

export function spectrumFromPairsNm(pairs: ReadonlyArray<readonly [number, number]>, source: string): StellarSpectrum {
  const c = curveFromPairsNm(pairs);
  return { wavelengthM: c.wavelengthM, flux: c.weight, minNm: pairs[0]![0], maxNm: pairs[pairs.length - 1]![0], source };
}

/** Throws bad-star-spectrum unless the spectrum covers the band's whole response. */
export function requireSpectrumCoversBand(s: StellarSpectrum, band: Band, path: string): void {
  if (s.minNm <= band.minNm && s.maxNm >= band.maxNm) return;
  fail(path, [{
    path,
    message: `the spectrum covers ${s.minNm}-${s.maxNm} nm but band "${band.id}" needs ${band.minNm}-${band.maxNm} nm: extend the spectrum over the whole band`,
    allowed: `wavelengths from <= ${band.minNm} nm to >= ${band.maxNm} nm`,
  }]);
}

/** Linear interpolation of (xs, ys) at x, for x inside [xs[0], xs[last]]; index hint advanced monotonically. */
function interp(xs: Float64Array, ys: Float64Array, x: number, hint: { i: number }): number {
  let i = hint.i;
  while (i < xs.length - 2 && xs[i + 1]! < x) i++;
  hint.i = i;
  const x0 = xs[i]!;
  const x1 = xs[i + 1]!;
  return ys[i]! + ((ys[i + 1]! - ys[i]!) * (x - x0)) / (x1 - x0);
}

/** Integrals over the band of S R lambda, S R, and R lambda^2 dS/dlambda (SI wavelengths). */
function bandIntegrals(s: StellarSpectrum, band: Band): { photon: number; energy: number; slope: number } {
  const rw = band.response.wavelengthM;
  const rv = band.response.weight;
  const lo = rw[0]!;
  const hi = rw[rw.length - 1]!;
  // Breakpoints: both grids inside [lo, hi].
  const knots: number[] = [];
  for (const x of rw) knots.push(x);
  for (const x of s.wavelengthM) if (x > lo && x < hi) knots.push(x);
  knots.sort((a, b) => a - b);
  const hs = { i: 0 };
  const hr = { i: 0 };
  let photon = 0;
  let energy = 0;
  let slope = 0;
  let j = 0; // spectrum interval holding the current sub-interval
  for (let k = 0; k + 1 < knots.length; k++) {
    const a = knots[k]!;
    const b = knots[k + 1]!;
    if (!(b > a)) continue;
    const m = (a + b) / 2;
    while (j < s.wavelengthM.length - 2 && s.wavelengthM[j + 1]! <= m) j++;
    const dS = (s.flux[j + 1]! - s.flux[j]!) / (s.wavelengthM[j + 1]! - s.wavelengthM[j]!);
    const sa = interp(s.wavelengthM, s.flux, a, hs);
    const sm = interp(s.wavelengthM, s.flux, m, hs);
    const sb = interp(s.wavelengthM, s.flux, b, hs);
    const ra = interp(rw, rv, a, hr);
    const rm = interp(rw, rv, m, hr);
    const rb = interp(rw, rv, b, hr);
    const w = (b - a) / 6; // Simpson's rule (exact for cubics, common practice)
    photon += w * (sa * ra * a + 4 * sm * rm * m + sb * rb * b);
    energy += w * (sa * ra + 4 * sm * rm + sb * rb);
    slope += w * dS * (ra * a * a + 4 * rm * m * m + rb * b * b);
  }
  return { photon, energy, slope };
}

/** integral of S over the table (trapezoids: exact for a linear S). */
function tableEnergy(s: StellarSpectrum): number {
  let e = 0;
  for (let i = 0; i + 1 < s.flux.length; i++) e += ((s.flux[i]! + s.flux[i + 1]!) / 2) * (s.wavelengthM[i + 1]! - s.wavelengthM[i]!);
  return e;
}

export interface StarBandFactors {
  /** Star band flux of the spectrum / that of the blackbody at the reference T_eff. */
  fluxFactor: number;
  /** Beaming factor of the spectrum / that of the blackbody at the reference T_eff. */
  beamingFactor: number;
  referenceTeffK: number;
}

/** Band-flux and beaming factors of a spectrum against the blackbody at teffK. */
export function starBandFactors(s: StellarSpectrum, band: Band, teffK: number, weighting: Weighting): StarBandFactors {
  requireSpectrumCoversBand(s, band, 'star.spectrum');
  const { photon, energy, slope } = bandIntegrals(s, band);
  if (!(photon > 0) || !(energy > 0)) {
    fail('star.spectrum', [{ path: 'star.spectrum', message: `the spectrum is zero over band "${band.id}" (${band.minNm}-${band.maxNm} nm): the star would send no light in the band` }]);
  }
  // Blackbody energy over the table's range: a top-hat band over it, energy weighting.
  const range = curveFromPairsNm([[s.minNm, 1], [s.maxNm, 1]]);
  const bbRange = Math.exp(bandMoments(range, teffK, 'energy').logFlux);
  const scale = bbRange / tableEnergy(s);
  const bbBand = Math.exp(bandMoments(band.response, teffK, weighting).logFlux);
  const specBand = weighting === 'photon' ? (scale * photon) / (H_J_S * C_M_PER_S) : scale * energy;
  const alphaSpec = (5 + slope / photon) / 4;
  const alphaBb = bandLogSlope(band, teffK, 'photon') / 4;
  return { fluxFactor: specBand / bbBand, beamingFactor: alphaSpec / alphaBb, referenceTeffK: teffK };
}
