/**
 * The composition paragraphs of the write-up, shared by the Markdown and LaTeX forms:
 * the measurement, the albedo with its intervals, the thermal share and the
 * assumptions that drove it, the verdict with its ceiling, the particle albedo a cloud
 * would need, the leading and the excluded candidates, the phase offset, and the
 * cautions. A Markup turns text, math and citations into the target format; the
 * numbers come from the interpretation (the same values as its JSON).
 */
import type { SourceRecord } from '../catalog/index.ts';
import { describeDist } from '../inference/assumptions.ts';
import type { SystemInput } from '../io/system.ts';
import type { Interpretation } from '../interpret/types.ts';
import { candidateSentences, proseName } from './wording-candidates.ts';
import { Citations, METHOD_PAPERS } from './cite.ts';
import { albedoText, interval95, measurementMath, sig2 } from './numbers.ts';
import { AB, AG, list, type Markup, pct, Writer } from './wording-core.ts';

export type { Markup } from './wording-core.ts';

export interface WriteUp {
  paragraphs: string[];
  citations: Citations;
}


function measurementSentence(w: Writer): string {
  const { s, i, m } = w;
  const b = i.band;
  const parts: string[] = [];
  const ms = s.measurements;
  if (ms.eclipseDepthPpm) parts.push(`a secondary-eclipse depth of ${m.math(`${measurementMath(ms.eclipseDepthPpm)}`)}${w.t(' ppm')}`);
  if (ms.phaseAmplitudePpm) parts.push(`a peak-to-trough phase-curve amplitude of ${m.math(measurementMath(ms.phaseAmplitudePpm))}${w.t(' ppm')}`);
  if (ms.nightsideFluxPpm) parts.push(`a nightside flux of ${m.math(measurementMath(ms.nightsideFluxPpm))}${w.t(' ppm')}`);
  const band = `${w.t(b.label)} band (${w.range(String(Math.round(b.minNm)), String(Math.round(b.maxNm)))} nm${b.approximate ? ', approximate response' : ''})`;
  let text = `For ${w.t(i.name)} we use ${list(parts)} in the ${band}`;
  if (ms.daysideTemperatureK) text += `, together with a dayside brightness temperature of ${m.math(`${measurementMath(ms.daysideTemperatureK)}\\,\\mathrm{K}`)} from another band`;
  return `${text}.`;
}

function modelSentence(w: Writer): string {
  const a = w.s.assumptions;
  const q = `the phase integral ${w.m.math('q')} (${w.t(describeDist(a.phaseIntegral))}) with ${w.m.math(`${AB} = q\\,${AG}`)}`;
  if (a.thermal === 'none') return `Thermal emission of the planet is neglected (pure reflection), with ${q}.`;
  const map = a.thermal === 'local-equilibrium' ? ' (the dayside in local equilibrium, its temperature falling as the fourth root of the cosine of the angle from the substellar point and blending to uniform as the redistribution rises)' : '';
  return `The planet's thermal emission is modelled as blackbody radiation from a dayside${map} and a nightside hemisphere whose temperatures follow from energy balance${w.cite([w.c.method(METHOD_PAPERS.cowanAgol)])}, marginalising over the heat-redistribution efficiency ${w.m.math('\\varepsilon')} (${w.t(describeDist(a.redistribution))}) and ${q}.`;
}

/** The corner sentence: where the median A_g runs at the corners of the (eps, q) priors, and what drives it. */
function cornerSentence(w: Writer): string | undefined {
  const { i, m } = w;
  const corners = i.sensitivity.filter((r) => Number.isFinite(r.geometricAlbedo.median) && !r.ruledOut);
  if (corners.length < 2) return undefined;
  const med = corners.map((r) => r.geometricAlbedo.median);
  const spread = (key: 'redistribution' | 'phaseIntegral') => {
    const other = key === 'redistribution' ? 'phaseIntegral' : 'redistribution';
    const groups = new Map<number, number[]>();
    for (const r of corners) groups.set(r[other], [...(groups.get(r[other]) ?? []), r.geometricAlbedo.median]);
    return Math.max(...[...groups.values()].map((g) => Math.max(...g) - Math.min(...g)));
  };
  const set = (key: 'redistribution' | 'phaseIntegral') => [...new Set(corners.map((r) => r[key]))].join(', ');
  const driver = spread('redistribution') >= spread('phaseIntegral') ? `the heat redistribution ${m.math('\\varepsilon')}` : `the phase integral ${m.math('q')}`;
  const out = i.sensitivity.filter((r) => r.ruledOut).length;
  const excluded = out > 0 ? ` (${out} corner${out === 1 ? '' : 's'} the data rule out left aside)` : '';
  return `At the corners ${m.math(`\\varepsilon \\in \\{${set('redistribution')}\\}`)}, ${m.math(`q \\in \\{${set('phaseIntegral')}\\}`)} of the priors${excluded} the median ${m.math(AG)} runs from ${albedoText(Math.min(...med))} to ${albedoText(Math.max(...med))}; ${driver} drives it most.`;
}

function albedoSentences(w: Writer): string[] {
  const { i, m } = w;
  const g = i.geometricAlbedo;
  const out: string[] = [];
  if (g.constraint === 'measured') {
    const [lo, hi] = interval95(g);
    out.push(`This gives a geometric albedo ${w.eq(AG, g)} (68 ${m.percent} interval; 95 ${m.percent}: ${w.range(lo, hi)}) and a Bond albedo ${w.eq(AB, i.bondAlbedo)}; the albedo is bounded away from zero and agrees between the assumed heat redistributions and phase integrals the data allow.`);
  } else if (g.constraint === 'upper-limit') {
    out.push(`The geometric albedo is consistent with zero: we obtain an upper limit ${m.math(`${AG} < ${albedoText(g.upperLimit95)}`)} (95 ${m.percent}), and ${m.math(`${AB} < ${albedoText(i.bondAlbedo.upperLimit95)}`)}.`);
  } else {
    const allowed = i.sensitivity.filter((r) => !r.ruledOut && Number.isFinite(r.geometricAlbedo.median));
    const lo = allowed.reduce((a, b) => (b.geometricAlbedo.median < a.geometricAlbedo.median ? b : a));
    const hi = allowed.reduce((a, b) => (b.geometricAlbedo.median > a.geometricAlbedo.median ? b : a));
    const at = (r: typeof lo) => m.math(`\\varepsilon = ${r.redistribution},\\ q = ${r.phaseIntegral}`);
    out.push(`The measurement does not constrain the geometric albedo beyond the assumptions: depending on the assumed heat redistribution and phase integral, ${m.math(AG)} lies between ${albedoText(lo.geometricAlbedo.median)} (${at(lo)}) and ${albedoText(hi.geometricAlbedo.median)} (${at(hi)}), below ${albedoText(g.upperLimit95)} (95 ${m.percent}) over the priors. A measurement of the planet's thermal emission (an infrared eclipse) or of its dayside temperature would break this degeneracy.`);
  }
  if (w.s.assumptions.thermal !== 'none') {
    const all = g.constraint === 'measured'
      ? w.eq(AG, i.allReflectedGeometricAlbedo)
      : `at most ${m.math(`${AG} < ${albedoText(i.allReflectedGeometricAlbedo.upperLimit95)}`)} (95 ${m.percent})`;
    out.push(`Thermal emission makes up ${pct(i.thermalFraction.median)} ${m.percent} of the signal (95 ${m.percent} upper limit ${pct(i.thermalFraction.upperLimit95)} ${m.percent}); attributing all of it to reflected light would give ${all}.`);
    out.push(`Under these assumptions the model gives a dayside temperature ${w.eq('T_\\mathrm{day}', i.daysideTemperatureK, 'K')}${w.s.measurements.daysideTemperatureK ? ' (fitted to the measured one)' : ''} and an equilibrium temperature ${w.eq('T_\\mathrm{eq}', i.equilibriumTemperatureK, 'K')}.`);
  }
  const corners = cornerSentence(w);
  if (corners) out.push(corners);
  const map = i.thermalMapSensitivity;
  if (map && Number.isFinite(map.medianShift)) {
    const other = map.alternative === 'local-equilibrium' ? 'a dayside in local equilibrium (hotter at the substellar point, brighter in the Wien tail)' : 'a uniform dayside';
    out.push(`Assuming ${other} instead would move the median ${m.math(AG)} by ${map.medianShift >= 0 ? '+' : ''}${sig2(map.medianShift)}.`);
  }
  return out;
}

/** When the model cannot reproduce the data: say so, and quote no posterior. */
function cannotReproduceSentence(w: Writer): string {
  const problems = w.i.modelFit.problems.map((p) => w.t(p.replace(/\.$/, ''))).join('; ');
  return `The model cannot reproduce these measurements: ${problems}. We therefore quote no albedo or temperature from them.`;
}

function verdictSentence(w: Writer): string {
  const v = w.i.verdict;
  const m = w.m;
  const pc = v.planetClass;
  const fulton = w.cite([w.c.method(METHOD_PAPERS.fulton)]);
  const r = pc.radiusRearth === null ? '' : `${sig2(pc.radiusRearth)}\\,R_\\oplus`;
  const classText = pc.basis === 'assumption'
    ? `The planet is treated as ${pc.planetClass === 'rocky' ? 'a rocky planet' : 'a gas-rich planet'}, as assumed.`
    : pc.planetClass === 'either'
      ? `The planet's radius of ${m.math(r)} lies in the radius valley${fulton}, so both clear atmospheres and bare rock count as cloud-free.`
      : `The planet's radius of ${m.math(r)}${w.s.star.radiusRsun ? '' : ` (for ${m.math('R_\\star = 1\\,R_\\odot')}; the stellar radius is not given)`} places it ${pc.planetClass === 'rocky' ? 'below' : 'above'} the radius valley${fulton}, so the cloud-free reference is ${pc.planetClass === 'rocky' ? 'bare rock or lava' : 'a clear atmosphere'}.`;
  if (!w.i.modelFit.reproducesData) {
    return 'Whether clouds or ice are required cannot be decided until the model reproduces the measurements.';
  }
  if (!v.ceiling || !v.reference || v.probability === null) {
    return `No cloud-free reference in the catalog covers this planet's temperature regime, so whether clouds or ice are required cannot be decided. ${classText}`;
  }
  const ceil = albedoText(v.ceiling.geometricAlbedo);
  const entry = w.i.candidates.find((c) => c.id === v.reference!.id);
  const ref = entry ? `${w.t(proseName(entry))}${w.cite(w.c.keys(entry.sources))}` : w.t(v.reference.name);
  const p = v.probability;
  const prob = (x: number) => (x > 0.999 ? '> 0.999' : x < 0.001 ? '< 0.001' : `= ${x.toFixed(3)}`);
  const what = `the cloud-free reference for this planet's regime (${ref}; ${w.t(v.reference.regime)})`;
  let sentence: string;
  if (v.cloudsOrIceRequired === 'inconclusive' && w.i.geometricAlbedo.constraint === 'prior-dominated' && p >= 0.95) {
    sentence = `Whether clouds or ice are required cannot be decided: ${m.math(AG)} would exceed ${ceil}, ${what}, with probability ${m.math(`P ${prob(p)}`)}, but only under the assumed heat redistribution, not because the data require it.`;
  } else if (v.cloudsOrIceRequired === 'yes') {
    sentence = `Reflective clouds or ice are required: the probability that ${m.math(AG)} exceeds ${ceil}, ${what}, is ${m.math(`P ${prob(p)}`)}.`;
  } else if (v.cloudsOrIceRequired === 'no') {
    sentence = `Clouds or ice are not required: ${m.math(AG)} stays below ${ceil}, ${what}, with probability ${m.math(`P ${prob(1 - p)}`)}, so a cloud-free planet explains the measurement (clouds are not ruled out).`;
  } else {
    sentence = `The data do not decide whether clouds or ice are required: the probability that ${m.math(AG)} exceeds ${ceil}, ${what}, is ${m.math(`P ${prob(p)}`)}, between 0.05 and 0.95.`;
  }
  return `${sentence} ${classText}`;
}

function particleSentence(w: Writer): string {
  const r = w.i.requiredSingleScatteringAlbedo;
  const m = w.m;
  const chandra = w.cite([w.c.method(METHOD_PAPERS.chandrasekhar)]);
  const omega = (x: number) => (x >= 0.9995 ? '1' : x.toFixed(3));
  const need = r.lower68 === r.upper68
    ? m.math(`\\varpi_0 = ${omega(r.median)}`)
    : m.math(`\\varpi_0 = ${omega(r.lower68)}\\text{--}${omega(r.upper68)}`);
  let text = `A semi-infinite cloud of isotropic scatterers${chandra} would need particles with single-scattering albedo ${need} (68 ${m.percent} interval) to reflect this much`;
  if (r.aboveConservativeLimit) text += `; even conservative scatterers (${m.math('\\varpi_0 = 1')}) give only ${m.math(`${AG} = ${albedoText(r.conservativeGeometricAlbedo)}`)}, below part of the interval`;
  const temperatureOk = new Set(w.i.candidates.filter((c) => c.checks.temperature.grade === 'ok').map((c) => c.id));
  const particles = [...r.reachedBy, ...r.notReached].filter((p) => temperatureOk.has(p.id));
  const species = (list: typeof particles) => {
    const seen = new Map<string, (typeof particles)[number]>();
    for (const p of list) if (!seen.has(p.condensate ?? p.name)) seen.set(p.condensate ?? p.name, p);
    return [...seen.values()];
  };
  const matching = species(particles.filter((p) => p.withinRange));
  const brighter = species(particles.filter((p) => p.singleScatteringAlbedoMin > r.upper68));
  const keysOf = (list: typeof particles) => [...new Set(list.flatMap((p) => w.i.candidates.find((c) => c.id === p.id)?.sources ?? []))];
  const kh = w.c.method(METHOD_PAPERS.kitzmannHeng);
  if (matching.length > 0) {
    const names = matching.slice(0, 6).map((p) => w.t(p.name.replace(/,\s*r_eff.*$/, '')));
    text += `; among the catalog's Mie values for condensates that can form at this temperature, those of ${list(names)} reach it${w.cite([kh, ...w.c.keys(keysOf(matching)).slice(0, 6)])}`;
  } else if (brighter.length > 0) {
    text += `; every catalog condensate that can form at this temperature has brighter grains (${m.math(`\\varpi_0 > ${omega(r.upper68)}`)})${w.cite([kh])}, so a cloud of them would have to be thin or patchy to match`;
  } else {
    text += '; none of the catalog\'s Mie values for condensates that can form at this temperature reaches it';
  }
  return `${text}. Forward-scattering grains need a higher ${m.math('\\varpi_0')} for the same ${m.math(AG)}, so this is a lower bound.`;
}

function phaseSentence(w: Writer): string | undefined {
  const p = w.i.phaseOffset;
  if (!p) return undefined;
  const m = w.m;
  const refs = w.cite([w.c.method(METHOD_PAPERS.demory2013), w.c.method(METHOD_PAPERS.parmentier)]);
  if (p.direction === 'none') return p.sigmaDeg === null && p.valueDeg === 0 && p.significanceSigma === null ? 'Only an upper limit on the phase-curve offset is available.' : 'The phase-curve peak is not offset from the substellar point.';
  const size = p.sigmaDeg === null
    ? m.math(`${sig2(Math.abs(p.valueDeg))}^\\circ`)
    : m.math(`${sig2(Math.abs(p.valueDeg))}^\\circ \\pm ${sig2(p.sigmaDeg)}^\\circ`);
  const z = p.significanceSigma === null ? '' : ` (${m.math(`${p.significanceSigma.toFixed(1)}\\sigma`)})`;
  const level = p.significanceSigma === null ? '' : p.significant ? '' : p.significanceSigma >= 2 ? ', a tentative offset' : ', not significant';
  const lead = `The phase-curve peak is offset ${p.direction}ward by ${size}${z}${level}`;
  const pronoun = p.significant ? '; this' : '; if real, it';
  if (p.direction === 'west') {
    return p.opticalBand
      ? `${lead}${pronoun} points to reflective clouds on the cooler western dayside${refs}.`
      : `${lead}${pronoun} lies outside the optical, where the westward reflective-cloud signature${refs} does not apply.`;
  }
  return `${lead}${pronoun} points to a thermal hotspot shifted east by equatorial winds${refs}.`;
}

function cautionSentences(w: Writer): string {
  const m = w.m;
  const met = w.s.star.metallicityDex;
  const mh = `${met > 0 ? '+' : ''}${met}`;
  const thermal = w.s.assumptions.thermal === 'none' ? 'thermal emission is neglected' : 'the thermal emission follows a two-hemisphere model';
  const star = w.s.star.spectrum
    ? `the star's band flux comes from the tabulated spectrum given (${w.t(w.s.star.spectrum.source)}), scaled to a blackbody's energy at its effective temperature`
    : 'the star radiates as a blackbody at its effective temperature';
  return `These numbers depend on the model: ${star}, the planet scatters as a Lambert sphere, ${thermal}, and the Bond albedo assumes that the band geometric albedo holds at all wavelengths (${m.math(`${AB} = q\\,${AG}`)}). The condensation curves are evaluated between ${m.math('10^{-3}')} and 1 bar with the planet's metallicity taken equal to the star's (${m.math(`[\\mathrm{M/H}] = ${mh}`)}), and catalog values were converted to geometric albedos (Bond and spherical albedos divided by ${m.math('q')}, surface reflectances as Lambert spheres, single-scattering albedos through the isotropic semi-infinite relation).`;
}

/** The paragraphs of the write-up in the given markup, and the citations they used. */
export function composeWriteUp(i: Interpretation, s: SystemInput, sources: readonly SourceRecord[], m: Markup): WriteUp {
  const c = new Citations(sources);
  const w = new Writer(i, s, c, m);
  if (!i.modelFit.reproducesData) {
    const p1 = [measurementSentence(w), cannotReproduceSentence(w), modelSentence(w)].join(' ');
    return { paragraphs: [p1, verdictSentence(w), cautionSentences(w)], citations: c };
  }
  const p1 = [measurementSentence(w), modelSentence(w), ...albedoSentences(w)].join(' ');
  const phase = phaseSentence(w);
  const p2 = [verdictSentence(w), particleSentence(w), ...candidateSentences(w), ...(phase ? [phase] : [])].join(' ');
  const p3 = cautionSentences(w);
  return { paragraphs: [p1, p2, p3], citations: c };
}
