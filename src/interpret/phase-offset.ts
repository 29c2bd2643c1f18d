/**
 * Reading a measured phase-curve offset (positive = eastward, peak before eclipse). East: the thermal hotspot shifted downwind by equatorial winds.
 * West (peak after eclipse) in an optical band: reflective clouds on the cooler
 * western dayside (Demory et al. 2013, ApJ 776, L25; Parmentier et al. 2016, ApJ 828, 22). The size of the offset is set
 * against its error: >= 3 sigma significant, 2-3 sigma tentative (common practice).
 */
import type { Dist } from '../io/distribution.ts';
import type { Band } from '../physics/bandpass.ts';
import { measuredRangeNm } from './band-overlap.ts';
import type { PhaseOffsetReading } from './types.ts';

export const SIGNIFICANT_SIGMA = 3;
export const TENTATIVE_SIGMA = 2;
/** Bands ending at or below this wavelength count as optical [nm] (common practice: the CCD limit near 1.1 um). */
export const OPTICAL_MAX_NM = 1100;
/** Thermal share of the depth below which an eastward offset is hard to explain by emission (our choice). */
const LOW_THERMAL_SHARE = 0.1;

function valueAndSigma(d: Dist): { value: number; sigma: number | null } | { limit: number } {
  switch (d.kind) {
    case 'fixed': return { value: d.value, sigma: null };
    case 'normal': return { value: d.mean, sigma: d.sigma };
    case 'split-normal': return { value: d.mode, sigma: d.mode >= 0 ? d.minus : d.plus };
    case 'uniform': return { value: 0.5 * (d.min + d.max), sigma: (d.max - d.min) / Math.sqrt(12) };
    case 'upper-limit': return { limit: d.limit };
    case 'samples': {
      const n = d.values.length;
      const mean = d.values.reduce((a, b) => a + b, 0) / n;
      const sd = Math.sqrt(d.values.reduce((a, b) => a + (b - mean) ** 2, 0) / Math.max(1, n - 1));
      return { value: mean, sigma: sd };
    }
  }
}

const f = (x: number) => Number(x.toPrecision(2)).toString();

export function readPhaseOffset(offset: Dist, band: Band, thermalShareMedian: number): PhaseOffsetReading {
  const vs = valueAndSigma(offset);
  if ('limit' in vs) {
    return {
      valueDeg: 0, sigmaDeg: null, significanceSigma: null, direction: 'none', significant: false, opticalBand: measuredRangeNm(band)[1] <= OPTICAL_MAX_NM,
      interpretation: `only an upper limit on the offset (|offset| < ${f(vs.limit)} deg): no shift of the brightness peak is detected`,
    };
  }
  const { value, sigma } = vs;
  const z = sigma && sigma > 0 ? Math.abs(value) / sigma : null;
  const direction: PhaseOffsetReading['direction'] = value > 0 ? 'east' : value < 0 ? 'west' : 'none';
  const size = sigma ? `${f(Math.abs(value))} +- ${f(sigma)} deg (${z!.toFixed(1)} sigma)` : `${f(Math.abs(value))} deg (no uncertainty given)`;
  const level = z === null ? 'of unknown significance' : z >= SIGNIFICANT_SIGMA ? 'significant' : z >= TENTATIVE_SIGMA ? 'tentative' : 'not significant';
  const optical = measuredRangeNm(band)[1] <= OPTICAL_MAX_NM;
  let meaning: string;
  if (direction === 'east') {
    meaning = thermalShareMedian < LOW_THERMAL_SHARE
      ? 'an eastward (pre-eclipse) peak usually marks a thermal hotspot shifted east by equatorial winds, but thermal emission is a small share of this band, so reflected light should dominate; reflective clouds gather on the cooler western side instead (Parmentier et al. 2016), so check the fit'
      : 'an eastward (pre-eclipse) peak points to a thermal hotspot shifted east by equatorial winds';
  } else if (direction === 'west') {
    meaning = optical
      ? 'a westward (post-eclipse) peak in an optical band points to reflective clouds on the cooler western dayside (Demory et al. 2013; Parmentier et al. 2016)'
      : 'a westward (post-eclipse) peak outside the optical is not the reflective-cloud signature of optical phase curves; it may reflect the thermal structure';
  } else {
    meaning = 'the peak is centred on the substellar point';
  }
  const lead = direction === 'none' ? `offset 0 deg` : `${direction}ward offset of ${size}, ${level}`;
  const hedge = direction !== 'none' && z !== null && z < SIGNIFICANT_SIGMA ? '; if real, ' : ': ';
  return {
    valueDeg: value,
    sigmaDeg: sigma,
    significanceSigma: z === null ? null : Number(z.toFixed(2)),
    direction,
    significant: z !== null && z >= SIGNIFICANT_SIGMA,
    opticalBand: optical,
    interpretation: `${lead}${hedge}${meaning}`,
  };
}
