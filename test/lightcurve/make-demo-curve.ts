/**
 * Writes the invented demo light curve demo-data/curves/tessaly-b-tess.csv (run with
 * `npx tsx test/lightcurve/make-demo-curve.ts`). Tessaly b is an invented planet
 * (demo-data/systems/tessaly-b.json); every number here is invented, chosen to be
 * consistent with that system file. Seeded, so the file is reproducible.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { cosinePlanet, syntheticTimeSeries, type SyntheticSpec } from './synthetic.ts';

const PPM = 1e-6;
/** Injected (invented) signals, also listed in demo-data/curves/README.md. */
export const DEMO_TRUTH = {
  periodDays: 1.27,
  epochBjd: 2460410.3172,
  radiusRatio: 0.0905,
  scaledSemiMajorAxis: 3.42,
  inclinationDeg: 84.1,
  eclipseDepthPpm: 430,
  phaseAmplitudePpm: 370,
  phaseOffsetDeg: 8,
  ellipsoidalAmplitudePpm: 55,
  beamingAmplitudePpm: 3.6,
  noisePpm: 250,
  points: 3888,
  spanDays: 27,
  seed: 20260,
} as const;

export function demoSpec(): SyntheticSpec {
  const t = DEMO_TRUTH;
  const semi = t.phaseAmplitudePpm / 2;
  // Fp = mean - semi cos(2 pi phi + delta); D = Fp(0.5) = mean + semi cos(delta).
  const mean = t.eclipseDepthPpm - semi * Math.cos((t.phaseOffsetDeg * Math.PI) / 180);
  return {
    points: t.points, periodDays: t.periodDays, epochDays: t.epochBjd, spanDays: t.spanDays,
    radiusRatio: t.radiusRatio, scaledSemiMajorAxis: t.scaledSemiMajorAxis, inclinationDeg: t.inclinationDeg,
    planetFlux: cosinePlanet(mean * PPM, semi * PPM, t.phaseOffsetDeg),
    ellipsoidal: t.ellipsoidalAmplitudePpm * PPM, beaming: t.beamingAmplitudePpm * PPM, noise: t.noisePpm * PPM, seed: t.seed,
  };
}

function main(): void {
  const curve = syntheticTimeSeries(demoSpec());
  const rows = [
    '# INVENTED light curve of the invented planet Tessaly b (demo-data/systems/tessaly-b.json), TESS-like band.',
    '# Not an observation: simulated by test/lightcurve/make-demo-curve.ts; see demo-data/curves/README.md.',
    '# time: BJD_TDB [days]; flux: normalised to the star; flux_err: 1 sigma.',
    'time,flux,flux_err',
  ];
  for (let i = 0; i < curve.x.length; i++) rows.push(`${curve.x[i]!.toFixed(6)},${curve.flux[i]!.toFixed(7)},${curve.fluxErr[i]!.toFixed(6)}`);
  const out = fileURLToPath(new URL('../../demo-data/curves/tessaly-b-tess.csv', import.meta.url));
  writeFileSync(out, `${rows.join('\n')}\n`);
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) main();
