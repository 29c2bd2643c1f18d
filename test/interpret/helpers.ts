/** Invented catalog entries, synthetic posteriors and the seeded catalog for the interpretation tests. */
import type { MatchContext } from '../../src/interpret/match.ts';
import type { PlanetClassReading } from '../../src/interpret/types.ts';
import { resolveBand } from '../../src/physics/bandpass.ts';
import type { CatalogEntry } from '../../src/catalog/index.ts';
import { openCatalog } from '../../src/catalog/index.ts';
import { curveMap, type FeasibilityContext } from '../../src/interpret/feasibility.ts';
import type { CatalogData } from '../../src/interpret/types.ts';
import type { Summary } from '../../src/inference/summary.ts';
import { cleanupTemp, tempDbPath } from '../catalog/helpers.ts';

/**
 * An invented catalog entry (test data only); fields as the catalog-entry JSON. The
 * default temperature window 300-3000 K lets the temperature test pass for the
 * invented planets here; give null limits for an entry that is untested.
 */
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
    temperatureMinK: 300,
    temperatureMaxK: 3000,
    condensate: null,
    description: 'invented for a test',
    provenance: 'memory',
    appliesTo: ['any'],
    sources: [],
    origin: 'curated',
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

/** A giant planet, by its radius (invented test value). */
export const GIANT: PlanetClassReading = { planetClass: 'giant', basis: 'radius', radiusRearth: 11, text: 'planet class giant (gas-rich)' };

/**
 * A matching context in the TESS band for a giant with A_g uniform on `ag`, T_day
 * uniform on 1400-1500 K and T_eq on 1200-1300 K (invented test values).
 */
export function matchContext(ag: [number, number], over: Partial<MatchContext> = {}): MatchContext {
  return {
    band: resolveBand('tess'),
    planetClass: GIANT,
    phaseIntegral: { kind: 'uniform', min: 1, max: 1.5 },
    geometricAlbedo: uniformSummary(...ag),
    quantiles: { geometricAlbedo: uniformGrid(...ag), daysideTemperatureK: uniformGrid(1400, 1500), equilibriumTemperatureK: uniformGrid(1200, 1300) },
    feasibility: temperatures([1400, 1500], [1200, 1300]),
    ...over,
  };
}
