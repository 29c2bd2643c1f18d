/**
 * Interpretation figures: matching the whole curated catalog to one posterior (target 5 ms
 * for a few hundred entries), the H-function
 * solve and inversion, the write-up and the SVG figure.
 */
import { openCatalog } from '../src/catalog/index.ts';
import { inferAlbedoDetailed } from '../src/inference/infer.ts';
import { interpretPosterior } from '../src/interpret/run.ts';
import { loadSystemFile } from '../src/io/system-file.ts';
import { isotropicGeometricAlbedo, singleScatteringAlbedoFor, solveHFunction } from '../src/physics/h-function.ts';
import { figureSvg } from '../src/report/figure.ts';
import { writeUpLatex } from '../src/report/paragraph-tex.ts';
import { type Figure, medianMs } from './figure.ts';

export async function run(): Promise<Figure[]> {
  const catalog = openCatalog({ path: ':memory:' });
  const data = { entries: catalog.listEntries(), condensates: catalog.listCondensates() };
  const sources = catalog.listSources();
  catalog.close();
  const demo = new URL('../demo-data/', import.meta.url).pathname;
  const system = loadSystemFile('systems/aurelia-b.json', demo);
  const { posterior, quantiles } = inferAlbedoDetailed(system);
  const matchMs = await medianMs(() => interpretPosterior(system, posterior, quantiles, data), 21, 3);
  let w = 0.5;
  const solveMs = await medianMs(() => solveHFunction((w = w === 0.5 ? 0.51 : 0.5)), 51, 5);
  let a = 0.3;
  const invertMs = await medianMs(() => singleScatteringAlbedoFor((a += 1e-4)), 51, 5);
  const detail = interpretPosterior(system, posterior, quantiles, data);
  const writeMs = await medianMs(() => writeUpLatex(detail.interpretation, system, sources), 21, 3);
  const figMs = await medianMs(() => figureSvg(detail.interpretation, quantiles.geometricAlbedo), 9, 2);
  if (!(isotropicGeometricAlbedo(1) > 0.68)) throw new Error('H-function benchmark gave a wrong albedo');
  return [
    { name: `match ${data.entries.length} catalog entries to one posterior (ms)`, value: matchMs, unit: 'ms', target: 5, digits: 2 },
    { name: 'solve one H-function, 24 nodes (ms)', value: solveMs, unit: 'ms', digits: 3 },
    { name: 'invert A_g(w) once (ms)', value: invertMs, unit: 'ms', digits: 3 },
    { name: 'write the LaTeX paragraphs (ms)', value: writeMs, unit: 'ms', digits: 2 },
    { name: 'render the SVG figure headless (ms)', value: figMs, unit: 'ms', digits: 1 },
  ];
}
