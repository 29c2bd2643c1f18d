/** Invented catalog entries, synthetic posteriors and the seeded catalog for the interpretation tests. */
import type { CatalogEntry } from '../../src/catalog/index.ts';
import { openCatalog } from '../../src/catalog/index.ts';
import { curveMap, type FeasibilityContext } from '../../src/interpret/feasibility.ts';
import type { CatalogData } from '../../src/interpret/types.ts';
import type { Summary } from '../../src/inference/summary.ts';
import { cleanupTemp, tempDbPath } from '../catalog/helpers.ts';

/** An invented catalog entry (test data only); fields as DESIGN section 7. */
export function entry(over: Partial<CatalogEntry> & { id: string }): CatalogEntry {
  return {
    name: `Invented entry ${over.id}`,
    category: 'cloud',
    quantity: 'geometric',
    bandMinNm: 400,
    bandMaxNm: 1000,
    valueMin: 0.1,
    valueNominal: 0.15,
    valueMax: 0.2,
    temperatureMinK: null,
    temperatureMaxK: null,
    condensate: null,
    description: 'invented for a test',
    provenance: 'memory',
    sources: [],
    origin: 'user',
    ...over,
  };
}

/** Quantile grid (1001 points) of a uniform distribution on [lo, hi]: its CDF is exactly linear. */
export function uniformGrid(lo: number, hi: number, n = 1001): Float64Array {
  return Float64Array.from({ length: n }, (_, k) => lo + ((hi - lo) * k) / (n - 1));
}

/** Summary of a uniform distribution on [lo, hi] (derived: quantile p is lo + p (hi - lo)). */
export function uniformSummary(lo: number, hi: number): Summary {
  const q = (p: number) => lo + p * (hi - lo);
  return { median: q(0.5), lower68: q(0.15865525393145707), upper68: q(0.8413447460685429), lower95: q(0.025), upper95: q(0.975), upperLimit95: q(0.95) };
}

/** A feasibility context with uniform T_day and T_eq posteriors. */
export function temperatures(day: [number, number], eq: [number, number] = day, metallicityDex = 0): FeasibilityContext {
  return { curves: curveMap([]), metallicityDex, daysideK: uniformGrid(...day), equilibriumK: uniformGrid(...eq) };
}

let seeded: { data: CatalogData; sources: ReturnType<ReturnType<typeof openCatalog>['listSources']> } | undefined;

/** The curated catalog, created and seeded in a fresh temporary database (once per test file). */
export function seededCatalog() {
  if (!seeded) {
    const catalog = openCatalog({ path: tempDbPath() });
    seeded = { data: { entries: catalog.listEntries(), condensates: catalog.listCondensates() }, sources: catalog.listSources() };
    catalog.close();
    cleanupTemp();
  }
  return seeded;
}
