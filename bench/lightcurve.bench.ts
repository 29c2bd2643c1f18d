/** Light-curve decomposition: a 100 000-point time series, target under 1 s. */
import { decompose, type DecomposeOptions } from '../src/lightcurve/decompose.ts';
import { cosinePlanet, syntheticTimeSeries, type SyntheticSpec } from '../test/lightcurve/synthetic.ts';
import { type Figure, medianMs } from './figure.ts';

const PPM = 1e-6;

export async function run(): Promise<Figure[]> {
  // Invented signals; only the size of the curve matters here.
  const spec: SyntheticSpec = {
    points: 100_000, periodDays: 1.27, epochDays: 2460410.3172, spanDays: 27,
    radiusRatio: 0.0905, scaledSemiMajorAxis: 3.42, inclinationDeg: 84.1,
    planetFlux: cosinePlanet(250 * PPM, 185 * PPM, 8), ellipsoidal: 55 * PPM, beaming: 3.6 * PPM, noise: 250 * PPM, seed: 3,
  };
  const curve = syntheticTimeSeries(spec);
  const base: DecomposeOptions = {
    periodDays: spec.periodDays, epochDays: spec.epochDays,
    geometry: { kind: 'disks', radiusRatio: spec.radiusRatio, scaledSemiMajorAxis: spec.scaledSemiMajorAxis, inclinationDeg: spec.inclinationDeg },
  };
  const cosine = await medianMs(() => decompose(curve, { ...base, fitOffset: true, predicted: { beamingPpm: { value: 3.6, sigma: 0.5 } } }), 9, 2);
  const lambert = await medianMs(() => decompose(curve, { ...base, phaseModel: 'lambert' }), 9, 2);
  const binned = await medianMs(() => decompose(curve, { ...base, bins: 500 }), 9, 2);
  return [
    { name: 'decompose 100 000 points, cosine + offset', value: cosine, unit: 'ms', target: 1000 },
    { name: 'decompose 100 000 points, Lambert phase term', value: lambert, unit: 'ms', target: 1000 },
    { name: 'decompose 100 000 points, 500 phase bins', value: binned, unit: 'ms', target: 1000 },
  ];
}
