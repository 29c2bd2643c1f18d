/**
 * Physics figures: the cost of one band-flux table lookup (the inference calls it
 * millions of times), of building one band table, and of one direct band integral.
 * Printed only; no targets were set for these.
 */
import { buildBandTable } from '../src/physics/band-table.ts';
import { bandFlux, bandFluxDirect, getBandTable, resolveBand } from '../src/physics/bandpass.ts';
import { type Figure, medianMs } from './figure.ts';

export async function run(): Promise<Figure[]> {
  const tess = resolveBand('tess');
  getBandTable(tess, 'photon');
  const calls = 1_000_000;
  // Temperatures spread over the table so the lookup cannot be answered from one cached interval.
  const temps = new Float64Array(4096);
  for (let i = 0; i < temps.length; i++) temps[i] = 300 + ((i * 2654435761) % 4096) * 0.9;
  let sink = 0;
  const lookupMs = await medianMs(() => {
    let s = 0;
    for (let i = 0; i < calls; i++) s += bandFlux(tess, temps[i & 4095]!);
    sink += s;
  }, 9, 2);

  const kepler = resolveBand('kepler');
  const buildPhotonMs = await medianMs(() => buildBandTable(kepler.response, 'photon'), 9, 1);
  const curve = resolveBand({ response: Array.from({ length: 500 }, (_, i) => [400 + i, 1 + Math.sin(i / 40)] as [number, number]) });
  const buildCurveMs = await medianMs(() => buildBandTable(curve.response, 'photon'), 5, 1);
  const directCalls = 2000;
  const directMs = await medianMs(() => {
    let s = 0;
    for (let i = 0; i < directCalls; i++) s += bandFluxDirect(tess, temps[i]!);
    sink += s;
  }, 5, 1);
  if (!(sink > 0)) throw new Error('benchmark produced no flux');

  return [
    { name: 'band-table lookup, bandFlux(tess, T) (ns per call)', value: (lookupMs * 1e6) / calls, unit: 'ns', digits: 1 },
    { name: 'build one band table, kepler trapezoid, 400 nodes (ms)', value: buildPhotonMs, unit: 'ms', digits: 2 },
    { name: 'build one band table, 500-point user curve (ms)', value: buildCurveMs, unit: 'ms', digits: 2 },
    { name: 'direct band integral, bandFluxDirect(tess, T) (us per call)', value: (directMs * 1e3) / directCalls, unit: 'us', digits: 2 },
  ];
}
