/**
 * Band overlap between a catalog entry's band and the measured band. The fraction is
 * the shared wavelength range over the width of the narrower band: 1 when one band
 * contains the other (a V-band value inside the Kepler band, a bolometric Bond albedo
 * around any optical band), 0 when they do not meet (a V-band value and TESS).
 */
import { listBuiltinBands, type Band } from '../physics/bandpass.ts';
import type { BandOverlap } from './types.ts';

/** Below this fraction an entry's band counts as barely overlapping (our choice: less than half the narrower band shared). */
export const BARELY_OVERLAPPING = 0.5;

/** The measured band's range [nm]: half-maximum points where known, else the full coverage. */
export function measuredRangeNm(band: Band): [number, number] {
  return band.halfMaxNm ? [band.halfMaxNm[0], band.halfMaxNm[1]] : [band.minNm, band.maxNm];
}

export function bandOverlap(entryMinNm: number, entryMaxNm: number, measured: readonly [number, number]): BandOverlap {
  const shared = Math.min(entryMaxNm, measured[1]) - Math.max(entryMinNm, measured[0]);
  const narrower = Math.min(entryMaxNm - entryMinNm, measured[1] - measured[0]);
  const fraction = shared <= 0 || narrower <= 0 ? 0 : Math.min(1, shared / narrower);
  const grade = fraction === 0 ? 'none' : fraction < BARELY_OVERLAPPING ? 'barely' : 'good';
  return { fraction, grade };
}

const fmtNm = (x: number) => String(Math.round(x));

/** Tolerance for recognising a built-in band by its half-maximum points [nm] (common practice: filter tables differ by a few nm). */
const BAND_MATCH_NM = 3;

/**
 * A readable name of an entry's band: a built-in band's label when the range matches its
 * half-maximum points ("Johnson V (507-595 nm)"), else the range ("350-650 nm").
 */
export function bandLabel(minNm: number, maxNm: number): string {
  const range = `${fmtNm(minNm)}-${fmtNm(maxNm)} nm`;
  for (const b of listBuiltinBands()) {
    const hm = b.halfMaxNm;
    if (hm && Math.abs(hm[0] - minNm) <= BAND_MATCH_NM && Math.abs(hm[1] - maxNm) <= BAND_MATCH_NM) return `${b.label} (${range})`;
  }
  return range;
}

/** The measured band in words: "TESS 600-1000 nm". */
export function measuredBandLabel(band: Band): string {
  const [lo, hi] = measuredRangeNm(band);
  const range = `${fmtNm(lo)}-${fmtNm(hi)} nm`;
  return band.kind === 'builtin' ? `${band.label} ${range}` : range;
}
