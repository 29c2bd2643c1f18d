/**
 * The main job as one call: a parsed system and the catalog data in, the
 * interpretation out. The CLI, the API, batch runs and the
 * tests all come through here. Pure: the catalog is passed in, never opened here.
 */
import type { SystemInput } from '../io/system.ts';
import { type InferOptions, inferAlbedoDetailed } from '../inference/infer.ts';
import type { AlbedoPosterior, PosteriorQuantiles } from '../inference/types.ts';
import { roundSig } from '../inference/summary.ts';
import { FIT_METALLICITY_RANGE_DEX } from '../physics/condensation-curves.ts';
import { curveMap } from './feasibility.ts';
import { matchCatalog, type MatchedEntry } from './match.ts';
import { requiredSingleScatteringAlbedo } from './particle-albedo.ts';
import { readPhaseOffset } from './phase-offset.ts';
import { planetClassOf } from './planet-class.ts';
import type { CatalogData, Interpretation, Verdict } from './types.ts';
import { decideVerdict } from './verdict.ts';

export type { Interpretation } from './types.ts';

export interface InterpretOptions extends InferOptions {
  /** Catalog entries and condensation curves to match; without them the candidate list is empty and the verdict inconclusive. */
  catalog?: CatalogData;
}

/** An interpretation with the matched entries behind the candidates (for the report and the figure). */
export interface DetailedInterpretation {
  interpretation: Interpretation;
  matched: MatchedEntry[];
  quantiles: PosteriorQuantiles;
}

function interpretationAssumptions(s: SystemInput, classText: string): string[] {
  const m = s.star.metallicityDex;
  return [
    `Condensation curves evaluated between 1e-3 and 1 bar at the star's metallicity [M/H] = ${m > 0 ? '+' : ''}${m}: the planet's metallicity is assumed equal to the star's.`,
    'Catalog values as geometric albedos: Bond and spherical albedos divided by the phase-integral range, surface reflectance r as a Lambert sphere (A_g = 2r/3), single-scattering albedos through a semi-infinite isotropic-scattering atmosphere (Chandrasekhar H-function).',
    `${classText[0]!.toUpperCase()}${classText.slice(1)}.`,
  ];
}

/** Interpretation of an existing posterior (the matching step alone; a few ms for a catalog of ~100 entries). */
export function interpretPosterior(s: SystemInput, posterior: AlbedoPosterior, quantiles: PosteriorQuantiles, catalog?: CatalogData): DetailedInterpretation {
  const t0 = performance.now();
  const planetClass = planetClassOf(s);
  const matched = matchCatalog(catalog?.entries ?? [], {
    band: s.band,
    planetClass,
    phaseIntegral: s.assumptions.phaseIntegral,
    geometricAlbedo: posterior.geometricAlbedo,
    quantiles,
    feasibility: {
      curves: curveMap(catalog?.condensates ?? []),
      metallicityDex: s.star.metallicityDex,
      daysideK: quantiles.daysideTemperatureK,
      equilibriumK: quantiles.equilibriumTemperatureK,
      userEntryTemperature: s.assumptions.userEntryTemperature,
    },
  });
  const verdict: Verdict = catalog
    ? decideVerdict(matched, quantiles.geometricAlbedo, planetClass, { constraint: posterior.geometricAlbedo.constraint, reproducesData: posterior.modelFit.reproducesData })
    : { cloudsOrIceRequired: 'inconclusive', probability: null, reason: `no catalog data were given, so there is no cloud-free ceiling to compare with; ${planetClass.text}`, ceiling: null, reference: null, planetClass };
  const required = requiredSingleScatteringAlbedo(posterior.geometricAlbedo, matched);
  const offset = s.measurements.phaseOffsetDeg ? readPhaseOffset(s.measurements.phaseOffsetDeg, s.band, posterior.thermalFraction.median) : undefined;
  const warnings = [...posterior.warnings];
  const m = s.star.metallicityDex;
  if (m < FIT_METALLICITY_RANGE_DEX[0] || m > FIT_METALLICITY_RANGE_DEX[1]) {
    warnings.push(`[M/H] = ${m} lies outside the condensation curves' range ${FIT_METALLICITY_RANGE_DEX[0]} to +${FIT_METALLICITY_RANGE_DEX[1]} dex; the temperature feasibility is extrapolated.`);
  }
  if (catalog && catalog.entries.length === 0) warnings.push('The catalog has no entries: nothing to match.');
  // The posterior's fields first; assumptions, diagnostics and warnings are rewritten below.
  const { diagnostics, warnings: _posteriorWarnings, ...fields } = posterior;
  const interpretation: Interpretation = {
    ...fields,
    assumptions: [...posterior.assumptions, ...interpretationAssumptions(s, planetClass.text)],
    verdict,
    candidates: matched.map((x) => x.candidate),
    requiredSingleScatteringAlbedo: required,
    ...(offset ? { phaseOffset: offset } : {}),
    diagnostics: { ...diagnostics, computeMs: roundSig(diagnostics.computeMs + (performance.now() - t0), 3) },
    warnings,
  };
  return { interpretation, matched, quantiles };
}

/** Posterior, match, verdict, required particle albedo and phase-offset reading, with the matched entries. */
export function interpretSystemDetailed(system: SystemInput, options: InterpretOptions = {}): DetailedInterpretation {
  const { catalog, ...infer } = options;
  const { posterior, quantiles } = inferAlbedoDetailed(system, infer);
  return interpretPosterior(system, posterior, quantiles, catalog);
}

/** The interpretation (the JSON of `interpret --json` and the API). */
export function interpretSystem(system: SystemInput, options: InterpretOptions = {}): Interpretation {
  return interpretSystemDetailed(system, options).interpretation;
}
