/**
 * Synthetic light curves for the tests, the benchmark and the invented demo curve.
 * The physics is written out here rather than through the design matrix: the star's
 * flux is 1 minus the fraction of its (uniform) disk the planet covers in transit,
 * plus beaming B sin(2 pi phi) and ellipsoidal -E cos(4 pi phi); the planet adds its
 * phase-dependent flux Fp(phi) times the visible fraction of its disk, so during the
 * eclipse the hidden flux follows Fp(phi) (the fitted model holds it at Fp(0.5)).
 * Noise: seeded Gaussian (pure-rand xoroshiro128+, Box-Muller).
 */
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import type { RandomGenerator } from 'pure-rand/types/RandomGenerator';
import { planetHiddenFraction, starCoveredFraction } from '../../src/lightcurve/disk-overlap.ts';
import type { LightCurve } from '../../src/lightcurve/types.ts';

export function seededRng(seed: number): RandomGenerator {
  return xoroshiro128plus(seed);
}

/** Standard normal deviate by the Box-Muller transform (Box & Muller 1958, Ann. Math. Stat. 29, 610). */
export function gaussian(rng: RandomGenerator): number {
  let u = 0;
  while (u === 0) u = uniformFloat64(rng);
  const v = uniformFloat64(rng);
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
}

export interface SyntheticSpec {
  points: number;
  periodDays: number;
  epochDays: number;
  /** Time span covered by the evenly spaced points [days]. */
  spanDays: number;
  radiusRatio: number;
  scaledSemiMajorAxis: number;
  inclinationDeg: number;
  /** Planet flux (fraction of the star) as a function of phase. */
  planetFlux: (phase: number) => number;
  ellipsoidal: number;
  beaming: number;
  noise: number;
  seed: number;
}

/** Cosine planet with a phase offset: Fp = mean - semi cos(2 pi phi + offset). */
export function cosinePlanet(mean: number, semiAmplitude: number, offsetDeg: number): (phase: number) => number {
  const d = (offsetDeg * Math.PI) / 180;
  return (phase) => mean - semiAmplitude * Math.cos(2 * Math.PI * phase + d);
}

export function noiselessFlux(spec: SyntheticSpec, phase: number): number {
  const i = (spec.inclinationDeg * Math.PI) / 180;
  const covered = starCoveredFraction(phase, spec.radiusRatio, spec.scaledSemiMajorAxis, i);
  const hidden = planetHiddenFraction(phase, spec.radiusRatio, spec.scaledSemiMajorAxis, i);
  const theta = 2 * Math.PI * phase;
  return 1 - covered + spec.beaming * Math.sin(theta) - spec.ellipsoidal * Math.cos(2 * theta) + spec.planetFlux(phase) * (1 - hidden);
}

/** Evenly spaced time series (days) with seeded Gaussian noise of constant sigma. */
export function syntheticTimeSeries(spec: SyntheticSpec): LightCurve {
  const rng = seededRng(spec.seed);
  const x = new Float64Array(spec.points);
  const flux = new Float64Array(spec.points);
  const fluxErr = new Float64Array(spec.points).fill(spec.noise);
  const dt = spec.spanDays / spec.points;
  for (let k = 0; k < spec.points; k++) {
    const t = spec.epochDays - 0.3 * spec.periodDays + k * dt;
    const c = (t - spec.epochDays) / spec.periodDays;
    const phase = c - Math.floor(c);
    x[k] = t;
    flux[k] = noiselessFlux(spec, phase) + spec.noise * gaussian(rng);
  }
  return { column: 'time', x, flux, fluxErr };
}
