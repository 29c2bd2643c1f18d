/**
 * The cloud-free references of seeds/cloud-free.json: what the clouds-or-ice verdict
 * compares a measured geometric albedo with. Each expected number names its source.
 */
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openCatalog, type Catalog, type CatalogEntry } from '../../src/catalog/index.ts';
import { SEEDS_DIR } from '../../src/catalog/paths.ts';
import { loadSeeds } from '../../src/catalog/seed-load.ts';
import { bandOverlap, measuredRangeNm } from '../../src/interpret/band-overlap.ts';
import { toGeometricAlbedo } from '../../src/interpret/convert.ts';
import { CLOUD_FREE_CATEGORIES } from '../../src/interpret/verdict.ts';
import { listBuiltinBands } from '../../src/physics/bandpass.ts';
import { cleanupTemp, readJson, tempDbPath } from './helpers.ts';

let catalog: Catalog;
let references: CatalogEntry[];
const seeds = loadSeeds(SEEDS_DIR);
const cloudFreeFile = readJson<{ entries: { id: string }[] }>(path.join(SEEDS_DIR, 'cloud-free.json'));
const cloudFreeIds = new Set(cloudFreeFile.entries.map((e) => e.id));

beforeAll(() => {
  catalog = openCatalog({ path: tempDbPath() });
  const cloudFree = new Set(['clear-atmosphere', 'rock', 'lava']);
  references = catalog.listEntries().filter((e) => cloudFree.has(e.category));
});
afterAll(() => {
  catalog.close();
  cleanupTemp();
});

const giants = () => references.filter((e) => e.category === 'clear-atmosphere');
const band = (id: string) => listBuiltinBands().find((b) => b.id === id)!;
/** Every reference here is a geometric albedo, so the phase integral does not enter; the system file's default q prior stands in. */
const Q = { kind: 'uniform', min: 1, max: 1.5 } as const;
const ceilingOf = (e: CatalogEntry) => toGeometricAlbedo(e, Q).range[1];
/** Feasible at any temperature in [loK, hiK]: the entry's window overlaps it. */
const windowMeets = (e: CatalogEntry, loK: number, hiK: number) => (e.temperatureMinK ?? 0) <= hiK && (e.temperatureMaxK ?? Infinity) >= loK;

describe('the cloud-free references load', () => {
  it('come from seeds/cloud-free.json with checked or computed provenance and sources that exist', () => {
    expect(seeds.files).toContain('cloud-free.json');
    expect(giants().length).toBeGreaterThanOrEqual(5);
    expect(references.some((e) => e.category === 'lava')).toBe(true);
    for (const e of references) {
      expect(['checked', 'computed'], e.id).toContain(e.provenance);
      expect(e.sources.length, e.id).toBeGreaterThan(0);
      for (const key of e.sources) expect(catalog.findSource(key), `${e.id} cites ${key}`).toBeDefined();
    }
    for (const e of references) expect(cloudFreeIds.has(e.id), `${e.id} lives in cloud-free.json`).toBe(true);
  });

  it('hold no building materials: asphalt, concrete and brick are not planetary surfaces', () => {
    for (const e of references) expect(e.name, e.id).not.toMatch(/asphalt|concrete|brick/i);
  });

  it('give each source record defined there complete authors, venue and an identifier', () => {
    const own = seeds.sources.filter((s) => ['BurrowsIbguiHubeny2008', 'Blazek2022', 'Bell2017', 'Lothringer2018', 'Parmentier2018UltraHot'].includes(s.key));
    expect(own).toHaveLength(5);
    for (const s of own) {
      // BibTeX names "Last, F." joined by " and ": every named author has initials.
      for (const name of s.authors.split(' and ').filter((n) => n !== 'others')) expect(name, s.key).toMatch(/^[^,]+, (\p{Lu}[.-]\s?)+/u);
      expect([s.year, s.journal, s.volume, s.pages, s.doi, s.note].every((v) => v !== null && v !== undefined && v !== ''), s.key).toBe(true);
    }
  });
});

describe('giant-planet regimes', () => {
  it('each has a temperature window and an optical band, and none claims a clear atmosphere below 400 K', () => {
    // Giants cooler than about 400 K condense water and then ammonia clouds (Marley et al. 1999,
    // ApJ 513, 879; Sudarsky et al. 2000, ApJ 538, 885): no clear-atmosphere reference there.
    for (const e of giants()) {
      expect(e.temperatureMinK, e.id).not.toBeNull();
      expect(e.temperatureMinK!, e.id).toBeGreaterThanOrEqual(400);
      expect(e.quantity, e.id).toBe('geometric');
      // Optical: inside 250-1100 nm (common practice for "optical" eclipse photometry bands).
      expect(e.bandMinNm, e.id).toBeGreaterThanOrEqual(250);
      expect(e.bandMaxNm, e.id).toBeLessThanOrEqual(1100);
    }
  });

  it('cover every temperature from 400 K up, at the regime limits the papers give', () => {
    // 400 K (Marley et al. 1999), 900 and 1500 K (Sudarsky et al. 2000), 2500 K (Lothringer et al. 2018, ApJ 866, 27).
    for (let t = 400; t <= 4000; t += 50) expect(giants().some((e) => windowMeets(e, t, t)), `${t} K`).toBe(true);
    const edges = new Set(giants().flatMap((e) => [e.temperatureMinK, e.temperatureMaxK]));
    for (const k of [400, 900, 1500, 2500]) expect(edges.has(k), `${k} K`).toBe(true);
  });

  it('above 900 K, no reference exceeds the value its source gives', () => {
    const expected: Record<string, [number, string]> = {
      // Rowe et al. 2008, ApJ 689, 1345: HD 209458b in the MOST band (400-700 nm), 3-sigma limit.
      'clear-giant-900-1500k-400-700nm': [0.17, 'Rowe2008'],
      // Brandeker et al. 2022, A&A 659, L4: 0.096 +- 0.016 (CHEOPS), 2-sigma upper end.
      'clear-giant-900-1500k-cheops': [0.096 + 2 * 0.016, 'Brandeker2022'],
      // Blazek et al. 2022, MNRAS (doi:10.1093/mnras/stac992): WASP-43b and WASP-18b, A_g < 0.16 (TESS).
      'clear-giant-1400-2500k-tess': [0.16, 'Blazek2022'],
      // Bell et al. 2017, ApJL 847, L2: WASP-12b, A_g < 0.064 at 97.5 % over 290-570 nm.
      'clear-giant-above-2500k-290-570nm': [0.064, 'Bell2017'],
    };
    const hot = giants().filter((e) => (e.temperatureMinK ?? 0) >= 900);
    expect(hot.map((e) => e.id).sort()).toEqual(Object.keys(expected).sort());
    for (const e of hot) {
      const [limit, source] = expected[e.id]!;
      expect(e.sources, e.id).toContain(source);
      expect(e.valueMax, e.id).toBeCloseTo(limit, 6);
      expect(ceilingOf(e), e.id).toBeLessThanOrEqual(limit + 1e-9);
    }
  });
});

describe('the ceilings a Kepler hot Jupiter near 1500 K meets', () => {
  // References feasible for a planet at 1300-1800 K that share wavelengths with the Kepler band.
  const keplerRange = () => measuredRangeNm(band('kepler'));
  const nearby = () => giants().filter((e) => windowMeets(e, 1300, 1800) && bandOverlap(e.bandMinNm, e.bandMaxNm, keplerRange()).grade !== 'none');

  it('lie well below the cloudy Kepler-7b (A_g = 0.35 +- 0.02, Demory et al. 2013, ApJL 776, L25)', () => {
    expect(nearby().length).toBeGreaterThanOrEqual(2);
    // "Well below": more than 3 sigma under the measured albedo.
    for (const e of nearby()) expect(ceilingOf(e), e.id).toBeLessThan(0.35 - 3 * 0.02);
  });

  it('lie well above the dark TrES-2b (A_g = 0.0253 +- 0.0072, Kipping & Spiegel 2011, MNRAS 417, L88)', () => {
    for (const e of nearby()) expect(ceilingOf(e), e.id).toBeGreaterThan(0.0253 + 3 * 0.0072);
  });

  it('come from references the verdict may use: the idealised Rayleigh laws are models, not ceilings', () => {
    expect(CLOUD_FREE_CATEGORIES.giant).toEqual(['clear-atmosphere']);
    // Conservative Rayleigh A_g = 0.796 (Schmid, Joos & Tschan 2006, A&A 452, 657).
    const rayleigh = catalog.getEntry('rayleigh-conservative-semi-infinite');
    expect(rayleigh).toMatchObject({ category: 'model', valueNominal: 0.796 });
    expect(Object.values(CLOUD_FREE_CATEGORIES).flat()).not.toContain('model');
  });
});

describe('rocky planets', () => {
  it('a lava or quenched-glass dayside reflects A_g <= 0.1 in the Kepler band (Essack, Seager & Pajusalu 2020, ApJ 898, 160)', () => {
    const lava = catalog.getEntry('lava-and-glass-dayside-essack2020');
    expect(lava).toMatchObject({ category: 'lava', quantity: 'geometric', bandMinNm: 420, bandMaxNm: 900, valueMax: 0.1 });
    expect(lava.temperatureMinK).not.toBeNull();
  });
});
