/**
 * Mass check: the star's ellipsoidal and beaming amplitudes fitted from a light curve
 * against those predicted from the masses. Pure: it takes the predictions as numbers
 * (value, sigma), however they were made. A difference above `thresholdSigma`
 * (default 3, common practice for a discrepancy) becomes a warning that names the
 * likely causes, ordered by the pattern of the two checks:
 * - both off in the same direction: the mass (both signals scale with Mp);
 * - only the ellipsoidal one: limb or gravity darkening (alpha_ellip grows with both),
 *   or a/R* (the signal scales as (a/R*)^-3);
 * - only the beaming one: the planet's phase offset shares the sin(2 pi phi) term, or
 *   the beaming factor (Teff, band);
 * and in every case a blended companion (its own signals at the period, or its light
 * diluting all relative amplitudes).
 */
import { requireFinite, requireNonNegative } from '../errors.ts';
import type { ValueSigma } from './types.ts';

export type MassSignal = 'ellipsoidal' | 'beaming';

export interface MassCheckInput {
  fitted: { ellipsoidalPpm?: ValueSigma | null; beamingPpm?: ValueSigma | null };
  predicted: { ellipsoidalPpm?: ValueSigma | null; beamingPpm?: ValueSigma | null };
  /** Whether the planet's phase offset was fitted separately (else it may hide in the beaming term). */
  offsetFitted?: boolean;
  thresholdSigma?: number;
}

export interface MassCheck {
  signal: MassSignal;
  fittedPpm: ValueSigma;
  predictedPpm: ValueSigma;
  /** (fitted - predicted) / sqrt(sigma_f^2 + sigma_p^2). */
  differenceSigma: number;
  status: 'consistent' | 'higher' | 'lower';
  /** Likely causes, most likely first (empty when consistent). */
  causes: string[];
}

export interface MassCheckResult {
  checks: MassCheck[];
  warnings: string[];
}

const CAUSE = {
  massHigh: 'a planet mass larger than assumed (both signals scale with Mp / M*)',
  massLow: 'a planet mass smaller than assumed (both signals scale with Mp / M*)',
  darkeningHigh: 'limb or gravity darkening coefficients larger than assumed (alpha_ellip grows with u and g)',
  darkeningLow: 'limb or gravity darkening coefficients smaller than assumed (alpha_ellip grows with u and g)',
  aRSmall: 'a smaller a/R* than assumed (the ellipsoidal signal scales as (R*/a)^3)',
  aRLarge: 'a larger a/R* than assumed (the ellipsoidal signal scales as (R*/a)^3)',
  offsetEast: "an eastward phase offset of the planet, which adds to the same sin(2 pi phi) term (fit it with --offset and a fixed beaming)",
  offsetWest: "a westward phase offset of the planet, which subtracts from the same sin(2 pi phi) term (fit it with --offset and a fixed beaming)",
  beamingFactor: 'the beaming factor used in the prediction (stellar Teff or the band)',
  blendSignal: 'a blended companion (e.g. a background eclipsing binary) adding its own variation at this period, or stellar variability',
  blendDilution: "a blended companion whose light dilutes every relative amplitude",
} as const;

function one(signal: MassSignal, fitted: ValueSigma, predicted: ValueSigma, threshold: number): MassCheck {
  requireFinite(`fitted.${signal}Ppm.value`, fitted.value);
  requireNonNegative(`fitted.${signal}Ppm.sigma`, fitted.sigma);
  requireFinite(`predicted.${signal}Ppm.value`, predicted.value);
  requireNonNegative(`predicted.${signal}Ppm.sigma`, predicted.sigma);
  const sigma = Math.hypot(fitted.sigma, predicted.sigma);
  const diff = fitted.value - predicted.value;
  const differenceSigma = sigma > 0 ? diff / sigma : diff === 0 ? 0 : Math.sign(diff) * Number.POSITIVE_INFINITY;
  const status = Math.abs(differenceSigma) <= threshold ? 'consistent' : differenceSigma > 0 ? 'higher' : 'lower';
  return { signal, fittedPpm: fitted, predictedPpm: predicted, differenceSigma, status, causes: [] };
}

export function checkMassEffects(input: MassCheckInput): MassCheckResult {
  const threshold = input.thresholdSigma ?? 3;
  const checks: MassCheck[] = [];
  const fe = input.fitted.ellipsoidalPpm;
  const pe = input.predicted.ellipsoidalPpm;
  const fb = input.fitted.beamingPpm;
  const pb = input.predicted.beamingPpm;
  const ell = fe && pe ? one('ellipsoidal', fe, pe, threshold) : undefined;
  const beam = fb && pb ? one('beaming', fb, pb, threshold) : undefined;
  const sameDirection = ell && beam && ell.status !== 'consistent' && ell.status === beam.status;
  if (ell && ell.status !== 'consistent') {
    const high = ell.status === 'higher';
    const mass = high ? CAUSE.massHigh : CAUSE.massLow;
    const rest = high
      ? [CAUSE.darkeningHigh, CAUSE.aRSmall, CAUSE.blendSignal]
      : [CAUSE.darkeningLow, CAUSE.aRLarge, CAUSE.blendDilution];
    ell.causes = sameDirection ? [mass, ...rest] : [...rest.slice(0, 2), mass, rest[2]!];
  }
  if (beam && beam.status !== 'consistent') {
    const high = beam.status === 'higher';
    const mass = high ? CAUSE.massHigh : CAUSE.massLow;
    const offset = input.offsetFitted ? [] : [high ? CAUSE.offsetEast : CAUSE.offsetWest];
    const blend = high ? CAUSE.blendSignal : CAUSE.blendDilution;
    beam.causes = sameDirection ? [mass, ...offset, CAUSE.beamingFactor, blend] : [...offset, mass, CAUSE.beamingFactor, blend];
  }
  if (ell) checks.push(ell);
  if (beam) checks.push(beam);
  const warnings = checks
    .filter((c) => c.status !== 'consistent')
    .map((c) => `${c.signal} amplitude ${c.fittedPpm.value.toFixed(1)} +- ${c.fittedPpm.sigma.toFixed(1)} ppm is ${c.status} than the ${c.predictedPpm.value.toFixed(1)} +- ${c.predictedPpm.sigma.toFixed(1)} ppm predicted from the masses (${Math.abs(c.differenceSigma).toFixed(1)} sigma); likely causes: ${c.causes.join('; ')}`);
  return { checks, warnings };
}
