/**
 * The system file, parsed and converted to canonical units (SystemInput). Shape
 * errors come from zod, range errors from the field specs, and the alternatives of
 * the system file (semiMajorAxisAu or periodDays instead of scaledSemiMajorAxis,
 * radiusRjup or radiusRearth instead of radiusRatio) are checked for completeness.
 * All problems are collected and reported together.
 */
import { HesperError, type Issue } from '../errors.ts';
import { type Band, type BandSpec, parseResponseCsv, resolveBand } from '../physics/bandpass.ts';
import type { StellarSpectrum } from '../physics/star-spectrum.ts';
import { readStarSpectrum } from './star-spectrum.ts';
import { type Dist, type FieldSpec, type SamplesReader, toDist } from './distribution.ts';
import { ASSUMPTION_FIELDS, MEASUREMENT_FIELDS, PLANET_FIELDS, STAR_FIELDS } from './system-fields.ts';
import { type SystemFile, systemFileSchema } from './system-schema.ts';
import { zodIssuesToIssues } from './zod-issues.ts';
import type { QuantityInput } from './quantity-schema.ts';

type Fields<T extends Record<string, FieldSpec>> = { [K in keyof T]?: Dist };

export interface SystemInput {
  name: string;
  band: Band;
  star: Fields<typeof STAR_FIELDS> & { teffK: Dist; metallicityDex: number; spectrum?: StellarSpectrum };
  planet: Fields<typeof PLANET_FIELDS> & { transitEpochBjd?: number };
  measurements: Omit<Fields<typeof MEASUREMENT_FIELDS>, 'phaseSemiAmplitudePpm'> & {
    /** Correlation of the depth and phase-amplitude errors (both Gaussian), when given. */
    depthAmplitudeCorrelation?: number;
  };
  assumptions: Omit<SystemFile['assumptions'], keyof typeof ASSUMPTION_FIELDS> & {
    redistribution: Dist; phaseIntegral: Dist;
    /** Given by the user, or undefined: then derived from the stellar Teff in the band (physics/darkening.ts). */
    limbDarkening?: Dist; gravityDarkening?: Dist;
  };
  /** What the reader did that the user should know (e.g. a semi-amplitude doubled). */
  notes: string[];
}

export interface ParseOptions {
  /** Reads {samplesFile, column} (CLI only; undefined in the API). */
  readSamples?: SamplesReader;
  /** Reads {responseFile} as text (CLI only; undefined in the API). */
  readText?: (fieldPath: string, file: string) => string;
}

function convertGroup<T extends Record<string, FieldSpec>>(
  group: string, specs: T, values: Partial<Record<keyof T, QuantityInput | undefined>>, issues: Issue[], opts: ParseOptions,
): Fields<T> {
  const out: Fields<T> = {};
  for (const key of Object.keys(specs) as Array<keyof T & string>) {
    const q = values[key];
    if (q === undefined) continue;
    const d = toDist(`${group}.${key}`, q, specs[key] as FieldSpec, issues, opts.readSamples);
    if (d) out[key] = d;
  }
  return out;
}

function scale(d: Dist, f: number): Dist {
  switch (d.kind) {
    case 'fixed': return { kind: 'fixed', value: d.value * f };
    case 'normal': return { kind: 'normal', mean: d.mean * f, sigma: d.sigma * f };
    case 'split-normal': return { kind: 'split-normal', mode: d.mode * f, plus: d.plus * f, minus: d.minus * f };
    case 'uniform': return { kind: 'uniform', min: d.min * f, max: d.max * f };
    case 'upper-limit': return { kind: 'upper-limit', limit: d.limit * f, confidence: d.confidence };
    case 'samples': return { kind: 'samples', values: d.values.map((x) => x * f) };
  }
}

function readBand(spec: SystemFile['band'], issues: Issue[], opts: ParseOptions): Band | undefined {
  try {
    if (typeof spec === 'object' && 'responseFile' in spec) {
      if (!opts.readText) {
        issues.push({ path: 'band.responseFile', message: 'response files are read by the CLI only; give the curve inline as {"response": [[nm, weight], ...]}' });
        return undefined;
      }
      const text = opts.readText('band.responseFile', spec.responseFile);
      return resolveBand({ response: parseResponseCsv(text, spec.responseFile), source: spec.responseFile }, 'band');
    }
    return resolveBand(spec as BandSpec, 'band');
  } catch (e) {
    if (e instanceof HesperError) issues.push(...e.issues);
    else throw e;
    return undefined;
  }
}

function requireOneOf(issues: Issue[], what: string, options: Array<[string, boolean]>, hint: string): void {
  if (!options.some(([, ok]) => ok)) issues.push({ path: what, message: `missing: give ${hint}` });
}

function checkAlternatives(s: SystemInput, issues: Issue[]): void {
  const { star, planet, measurements } = s;
  requireOneOf(issues, 'planet.radiusRatio', [
    ['radiusRatio', planet.radiusRatio !== undefined],
    ['radius', (planet.radiusRjup !== undefined || planet.radiusRearth !== undefined) && star.radiusRsun !== undefined],
  ], 'planet.radiusRatio, or planet.radiusRjup / planet.radiusRearth with star.radiusRsun');
  requireOneOf(issues, 'planet.scaledSemiMajorAxis', [
    ['aR', planet.scaledSemiMajorAxis !== undefined],
    ['au', planet.semiMajorAxisAu !== undefined && star.radiusRsun !== undefined],
    ['period', planet.periodDays !== undefined && star.massMsun !== undefined && star.radiusRsun !== undefined],
  ], 'planet.scaledSemiMajorAxis, or planet.semiMajorAxisAu with star.radiusRsun, or planet.periodDays with star.massMsun and star.radiusRsun');
  requireOneOf(issues, 'measurements', [
    ['depth', measurements.eclipseDepthPpm !== undefined],
    ['phase', measurements.phaseAmplitudePpm !== undefined],
  ], 'measurements.eclipseDepthPpm and/or measurements.phaseAmplitudePpm (or phaseSemiAmplitudePpm)');
  if (planet.radiusRjup !== undefined && planet.radiusRearth !== undefined) {
    issues.push({ path: 'planet.radiusRearth', message: 'give radiusRjup or radiusRearth, not both' });
  }
  if (planet.massMjup !== undefined && planet.massMearth !== undefined) {
    issues.push({ path: 'planet.massMearth', message: 'give massMjup or massMearth, not both' });
  }
}

/** Validates and converts a system-file object; throws one HesperError with every issue. */
export function parseSystem(json: unknown, opts: ParseOptions = {}): SystemInput {
  const parsed = systemFileSchema.safeParse(json);
  if (!parsed.success) {
    const issues = zodIssuesToIssues(parsed.error.issues, json);
    throw new HesperError('invalid-input', `system file: ${issues.length} problem${issues.length === 1 ? '' : 's'}`, issues);
  }
  const f = parsed.data;
  const issues: Issue[] = [];
  const notes: string[] = [];
  const band = readBand(f.band, issues, opts);
  const star = convertGroup('star', STAR_FIELDS, f.star, issues, opts);
  const planet = convertGroup('planet', PLANET_FIELDS, f.planet, issues, opts);
  const m = convertGroup('measurements', MEASUREMENT_FIELDS, f.measurements, issues, opts);
  const a = convertGroup('assumptions', ASSUMPTION_FIELDS, f.assumptions, issues, opts);
  const { phaseSemiAmplitudePpm, ...converted } = m;
  const measurements: SystemInput['measurements'] = converted;
  if (phaseSemiAmplitudePpm) {
    if (measurements.phaseAmplitudePpm) {
      issues.push({ path: 'measurements.phaseSemiAmplitudePpm', message: 'give phaseAmplitudePpm (peak-to-trough) or phaseSemiAmplitudePpm, not both' });
    } else {
      measurements.phaseAmplitudePpm = scale(phaseSemiAmplitudePpm, 2);
      notes.push('phaseSemiAmplitudePpm was doubled to a peak-to-trough phaseAmplitudePpm.');
    }
  }
  const rho = f.measurements.depthAmplitudeCorrelation;
  if (rho !== undefined) {
    if (measurements.eclipseDepthPpm?.kind !== 'normal' || measurements.phaseAmplitudePpm?.kind !== 'normal') {
      issues.push({ path: 'measurements.depthAmplitudeCorrelation', message: 'needs eclipseDepthPpm and phaseAmplitudePpm both given as {value, sigma}' });
    } else {
      measurements.depthAmplitudeCorrelation = rho;
    }
  }
  const spectrum = f.star.spectrum && band ? readStarSpectrum(f.star.spectrum, band, issues, opts.readText) : undefined;
  if (issues.length === 0 && band && star.teffK && a.redistribution && a.phaseIntegral) {
    const { limbDarkening: _u, gravityDarkening: _g, ...rest } = f.assumptions;
    const system: SystemInput = {
      name: f.name,
      band,
      star: { ...star, teffK: star.teffK, metallicityDex: f.star.metallicity, ...(spectrum ? { spectrum } : {}) },
      planet: f.planet.transitEpochBjd !== undefined ? { ...planet, transitEpochBjd: f.planet.transitEpochBjd } : planet,
      measurements,
      assumptions: {
        ...rest,
        redistribution: a.redistribution, phaseIntegral: a.phaseIntegral,
        ...(a.limbDarkening ? { limbDarkening: a.limbDarkening } : {}),
        ...(a.gravityDarkening ? { gravityDarkening: a.gravityDarkening } : {}),
      },
      notes,
    };
    checkAlternatives(system, issues);
    if (issues.length === 0) return system;
  }
  throw new HesperError('invalid-input', `system file: ${issues.length} problem${issues.length === 1 ? '' : 's'}`, issues);
}
