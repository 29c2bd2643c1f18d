/** The assumptions that drove a result, in words, for the report and the JSON. */
import type { Dist } from '../io/distribution.ts';
import type { SystemInput } from '../io/system.ts';
import { starAssumption } from './star-model.ts';
import { MASS_MODEL_FRACTION } from './measurements.ts';

export function describeDist(d: Dist, digits = 3): string {
  const f = (x: number) => Number(x.toPrecision(digits)).toString();
  switch (d.kind) {
    case 'fixed': return `${f(d.value)} (fixed)`;
    case 'normal': return `${f(d.mean)} +- ${f(d.sigma)}`;
    case 'split-normal': return `${f(d.mode)} +${f(d.plus)} -${f(d.minus)}`;
    case 'uniform': return `uniform on [${f(d.min)}, ${f(d.max)}]`;
    case 'upper-limit': return `< ${f(d.limit)} (${f(100 * d.confidence)} % confidence)`;
    case 'samples': return `${d.values.length} samples`;
  }
}

/** "400-1050" for a band's coverage in nm, without floating-point noise. */
export function bandRangeNm(band: { minNm: number; maxNm: number }): string {
  return `${Number(band.minNm.toPrecision(6))}-${Number(band.maxNm.toPrecision(6))}`;
}

export function assumptionLines(s: SystemInput): string[] {
  const a = s.assumptions;
  const lines: string[] = [];
  if (a.thermal === 'none') {
    lines.push('Pure reflection: thermal emission of the planet ignored (assumptions.thermal = "none").');
  } else {
    lines.push(`Thermal emission: blackbody planet with dayside and nightside temperatures of Cowan & Agol (2011), heat redistribution eps ${describeDist(a.redistribution)}.`);
    lines.push(a.thermal === 'local-equilibrium'
      ? 'Dayside map: local equilibrium, T^4 = T0^4 (1 - A_B) [(1 - eps) cos theta + eps/4], integrated over the disk in the band (the same bolometric dayside flux as Cowan & Agol 2011, brighter in the Wien tail); the measured dayside temperature, if any, is compared with its bolometric-equivalent T_day.'
      : 'Dayside map: uniform at T_day (assumptions.thermal = "local-equilibrium" puts the hot substellar region in the band integral).');
  }
  if (a.thermal !== 'none' || s.star.spectrum || s.planet.massMjup || s.planet.massMearth) lines.push(starAssumption(s));
  lines.push(`Bond albedo A_B = q A_g with phase integral q ${describeDist(a.phaseIntegral)}; a band geometric albedo stands in for the bolometric one.`);
  lines.push('Lambert phase function; uniform prior on A_g over [0, 1/q] (energy conservation A_B <= 1).');
  lines.push(`Band "${s.band.id}" (${bandRangeNm(s.band)} nm${s.band.approximate ? ', approximate shape' : ''}), integrals weighted per ${a.weighting}.`);
  if (s.measurements.daysideTemperatureK) lines.push('The measured dayside brightness temperature is compared with the model dayside temperature directly.');
  if (s.planet.massMjup || s.planet.massMearth) {
    const u = a.limbDarkening ? `u ${describeDist(a.limbDarkening)} (given)` : 'u from the stellar Teff in the band (gray Eddington atmosphere)';
    const g = a.gravityDarkening ? `g ${describeDist(a.gravityDarkening)} (given)` : 'g from the stellar Teff in the band (von Zeipel 1924 / Lucy 1967 exponents)';
    lines.push(`Mass effects: limb darkening ${u}, gravity darkening ${g}; the predicted ellipsoidal and beaming amplitudes carry a ${Math.round(100 * MASS_MODEL_FRACTION)} % model uncertainty where they meet measured ones (common practice; measured and predicted ellipsoidal amplitudes of hot Jupiters scatter by about this much).`);
  }
  lines.push(...s.notes);
  return lines;
}
