/**
 * The star in the band integrals: a blackbody at T_eff (default) or the system's
 * tabulated spectrum, which enters as factors on the blackbody's band flux and beaming
 * factor at the star's central T_eff (physics/star-spectrum.ts). The factors are cached
 * per spectrum, band and weighting.
 */
import { centralValue } from '../io/distribution.ts';
import type { SystemInput } from '../io/system.ts';
import type { Band } from '../physics/bandpass.ts';
import { starBandFactors, type StarBandFactors, type StellarSpectrum } from '../physics/star-spectrum.ts';
import type { Weighting } from '../physics/planck.ts';

const cache = new WeakMap<StellarSpectrum, Map<string, StarBandFactors>>();

/** The spectrum's factors in this band, or undefined for a blackbody star. */
export function starFactors(s: SystemInput, band: Band = s.band, weighting: Weighting = s.assumptions.weighting): StarBandFactors | undefined {
  const spectrum = s.star.spectrum;
  if (!spectrum) return undefined;
  const teffK = centralValue(s.star.teffK);
  const key = `${band.id}|${band.source}|${weighting}|${teffK}`;
  let perSpectrum = cache.get(spectrum);
  if (!perSpectrum) {
    perSpectrum = new Map();
    cache.set(spectrum, perSpectrum);
  }
  let f = perSpectrum.get(key);
  if (!f) {
    f = starBandFactors(spectrum, band, teffK, weighting);
    perSpectrum.set(key, f);
  }
  return f;
}

/** One line for the assumptions: which star model the band integrals used. */
export function starAssumption(s: SystemInput): string {
  const f = starFactors(s);
  const spectrum = s.star.spectrum;
  if (!f || !spectrum) return 'Star: blackbody at its effective temperature in the band-flux ratio and the beaming factor.';
  const pct = (x: number): string => `${x >= 1 ? '+' : ''}${((x - 1) * 100).toFixed(2)} %`;
  return `Star: tabulated spectrum "${spectrum.source}" (${spectrum.wavelengthM.length} points, ${spectrum.minNm}-${spectrum.maxNm} nm) in place of a blackbody, scaled to a ${f.referenceTeffK} K blackbody's energy over its range; in band "${s.band.id}" it gives ${pct(f.fluxFactor)} star band flux and ${pct(f.beamingFactor)} beaming factor against the blackbody, held as factors while T_eff varies.`;
}
