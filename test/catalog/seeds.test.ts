import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CATEGORIES, openCatalog, type Catalog, type CatalogEntry } from '../../src/catalog/index.ts';
import { SEEDS_DIR } from '../../src/catalog/paths.ts';
import { loadSeeds } from '../../src/catalog/seed-load.ts';
import { cleanupTemp, copySeeds, dumpDatabase, readJson, tempDbPath, writeJson } from './helpers.ts';

let catalog: Catalog;
let entries: CatalogEntry[];
beforeAll(() => {
  catalog = openCatalog({ path: tempDbPath() });
  entries = catalog.listEntries();
});
afterAll(() => {
  catalog.close();
  cleanupTemp();
});

const byId = (id: string) => catalog.getEntry(id);

describe('curated seed content', () => {
  it('has at least 100 entries over at least 10 categories and at least 40 sources', () => {
    expect(entries.length).toBeGreaterThanOrEqual(100);
    expect(new Set(entries.map((e) => e.category)).size).toBeGreaterThanOrEqual(10);
    expect(catalog.listSources().length).toBeGreaterThanOrEqual(40);
    expect(entries.every((e) => e.origin === 'curated')).toBe(true);
  });

  it('gives every entry a source, a known quantity and provenance, and an ordered range', () => {
    for (const e of entries) {
      expect(e.sources.length, e.id).toBeGreaterThan(0);
      expect(e.valueMin <= e.valueNominal && e.valueNominal <= e.valueMax, e.id).toBe(true);
      expect(e.bandMinNm < e.bandMaxNm, e.id).toBe(true);
      expect(['checked', 'secondary', 'computed', 'memory']).toContain(e.provenance);
    }
  });

  it('covers the groups the catalog promises', () => {
    const count = (pred: (e: CatalogEntry) => boolean) => entries.filter(pred).length;
    expect(count((e) => e.category === 'clear-atmosphere')).toBeGreaterThanOrEqual(5);
    expect(count((e) => e.category === 'model')).toBeGreaterThanOrEqual(5);
    expect(count((e) => e.category === 'lava')).toBeGreaterThanOrEqual(1);
    expect(count((e) => e.quantity === 'single-scattering' && e.condensate !== null)).toBeGreaterThanOrEqual(60);
    // Measured albedos of exoplanets live in the comparison set, not among the entries.
    expect(catalog.listComparisons().filter((c) => c.band.id === 'kepler').length).toBeGreaterThanOrEqual(5);
    for (const c of ['ocean', 'vegetation', 'soil', 'ice', 'cloud', 'haze', 'regolith']) {
      expect(CATEGORIES).toContain(c);
      expect(count((e) => e.category === c), c).toBeGreaterThan(0);
    }
  });

  it('records ocean, snow and vegetation albedos from field measurements, each with its liquid-water or ice window', () => {
    // Payne (1972), J. Atmos. Sci. 29, 959: 0.03 for high Sun, up to 0.45 below 10 degrees, 0.061 +- 0.005 under overcast.
    expect(byId('ocean-high-sun-payne1972')).toMatchObject({ valueNominal: 0.03, temperatureMinK: 273.16, temperatureMaxK: 372.8, appliesTo: ['rocky'] });
    expect(byId('ocean-low-sun-payne1972').valueNominal).toBe(0.45);
    expect(byId('ocean-overcast-payne1972')).toMatchObject({ valueMin: 0.056, valueNominal: 0.061, valueMax: 0.066 });
    // Betts & Ball (1997), JGR 102, 28901: summer grass 0.2, aspen 0.15, conifers 0.083; snow-covered grass 0.75 in winter.
    expect(byId('grass-summer-betts1997')).toMatchObject({ category: 'vegetation', valueNominal: 0.2 });
    expect(byId('conifer-forest-summer-betts1997').valueNominal).toBe(0.083);
    expect(byId('snow-covered-grass-winter-betts1997')).toMatchObject({ category: 'ice', valueNominal: 0.75, temperatureMaxK: 273.16 });
  });
});

describe('spot checks of seeded values against their sources', () => {
  it('Jupiter Bond albedo 0.503 +- 0.012 (Li et al. 2018, Nat. Commun. 9, 3709)', () => {
    expect(byId('jupiter-bond-li2018')).toMatchObject({ quantity: 'bond', valueNominal: 0.503, valueMin: 0.491, valueMax: 0.515, provenance: 'checked' });
    expect(byId('jupiter-bond-li2018').sources).toContain('Li2018Jupiter');
  });

  it('Jupiter Bond albedo 0.343 +- 0.032 and q = 1.25 (Hanel et al. 1980, NASA TM-80723)', () => {
    expect(byId('jupiter-bond-hanel1981')).toMatchObject({ valueNominal: 0.343, valueMin: 0.311, valueMax: 0.375 });
    expect(byId('jupiter-bond-hanel1981').sources).toContain('Hanel1980Jupiter');
    // 124.7 K: (1 - 0.503) * 1360.8 / (4 * 5.203^2) + 7.485 W m-2 of internal heat (Li et al. 2018), as a blackbody.
    expect(byId('jupiter-bond-li2018')).toMatchObject({ temperatureMinK: 124.7, temperatureMaxK: 124.7, appliesTo: ['giant'] });
  });

  it('Mars geometric albedo 0.170 and Bond albedo 0.250 (NASA NSSDC Mars fact sheet)', () => {
    expect(byId('mars-geometric-v-nssdc')).toMatchObject({ quantity: 'geometric', valueNominal: 0.17, provenance: 'checked' });
    expect(byId('mars-bond-nssdc')).toMatchObject({ quantity: 'bond', valueNominal: 0.25 });
  });

  it('Earth Bond 0.294 and geometric 0.434 (NSSDC fact sheet, Earth column of the Mars sheet)', () => {
    expect(byId('earth-bond-nssdc').valueNominal).toBe(0.294);
    expect(byId('earth-geometric-v-nssdc').valueNominal).toBe(0.434);
  });

  it('Enceladus equigonal albedo 0.89 +- 0.03 at 0.55 um (Filacchione et al. 2022, Icarus 375, 114803)', () => {
    expect(byId('enceladus-equigonal-550-filacchione2022')).toMatchObject({ valueMin: 0.86, valueNominal: 0.89, valueMax: 0.92, provenance: 'checked' });
    // Subsolar temperature of a black surface at Saturn, 9.537 AU, with 1360.8 W m-2 (Kopp & Lean 2011): 127.4 K.
    expect(byId('enceladus-equigonal-550-filacchione2022').temperatureMaxK).toBe(127.4);
  });

  it('Tethys 1.23 and Dione 1.00 at true opposition (Verbiscer et al. 2007, Science 315, 815)', () => {
    expect(byId('tethys-geometric-opposition-verbiscer2007').valueNominal).toBe(1.23);
    expect(byId('dione-geometric-opposition-verbiscer2007').valueNominal).toBe(1.0);
  });

  it('Uranus Bond albedo 0.338 +- 0.011 (Irwin et al. 2025, arXiv:2502.18971)', () => {
    expect(byId('uranus-bond-irwin2025')).toMatchObject({ valueNominal: 0.338, valueMin: 0.327, valueMax: 0.349 });
  });

  it('Neptune Bond albedo 0.290 +- 0.067 (Pearl & Conrath 1991, JGR 96, 18921)', () => {
    expect(byId('neptune-bond-pearl1991')).toMatchObject({ valueNominal: 0.29, valueMin: 0.223, valueMax: 0.357 });
  });

  it('Ceres geometric albedo 0.087 +- 0.003 at 535 nm (Li et al. 2006, Icarus 182, 143)', () => {
    expect(byId('ceres-geometric-535nm-li2006')).toMatchObject({ valueNominal: 0.087, bandMinNm: 495, bandMaxNm: 575 });
  });

  it('Kepler-7 b A_g 0.35 +- 0.02 (Demory et al. 2013, ApJL 776, L25) and HD 209458 b 0.038 (Rowe et al. 2008)', () => {
    const cmp = (id: string) => catalog.listComparisons().find((c) => c.id === id);
    expect(cmp('kepler7b-demory2013')).toMatchObject({ kind: 'planet', geometricAlbedoNominal: 0.35, geometricAlbedoRange: [0.33, 0.37] });
    expect(cmp('hd209458b-most-rowe2008')).toMatchObject({ geometricAlbedoNominal: 0.038, band: { minNm: 400, maxNm: 700 } });
  });

  it('lava or glass dayside A_g <= 0.1 (Essack, Seager & Pajusalu 2020, ApJ 898, 160)', () => {
    expect(byId('lava-and-glass-dayside-essack2020')).toMatchObject({ category: 'lava', valueMax: 0.1 });
  });

  it('conservative Rayleigh A_g 0.796 and w = 0.90 -> 0.398 (Schmid, Joos & Tschan 2006, A&A 452, 657, Table 3)', () => {
    expect(byId('rayleigh-conservative-semi-infinite')).toMatchObject({ category: 'model', valueNominal: 0.796 });
    expect(byId('rayleigh-w090-semi-infinite').valueNominal).toBe(0.398);
  });

  it('isotropic scatterers A_g 0.69 / 0.53 / 0.31 at w = 1 / 0.99 / 0.90 (computed with Chandrasekhar\'s H-function)', () => {
    expect(byId('isotropic-w100-semi-infinite')).toMatchObject({ valueNominal: 0.69, provenance: 'computed' });
    expect(byId('isotropic-w099-semi-infinite').valueNominal).toBe(0.53);
    expect(byId('isotropic-w090-semi-infinite').valueNominal).toBe(0.31);
  });

  it('Mie w0 of MgSiO3 glass 0.9999 / 0.9997 at 550 / 800 nm for r_eff 0.1 um (computed from the Kitzmann & Heng 2018 refractive index)', () => {
    const e = byId('mie-mgsio3-glass-r0p1um');
    expect(e).toMatchObject({ quantity: 'single-scattering', condensate: 'MgSiO3', provenance: 'computed', category: 'cloud' });
    expect(e.spectrum).toEqual([{ wavelengthNm: 550, value: 0.9999 }, { wavelengthNm: 800, value: 0.9997 }]);
    expect(byId('mie-fes-r0p1um').spectrum).toEqual([{ wavelengthNm: 550, value: 0.36 }, { wavelengthNm: 800, value: 0.34 }]);
  });
});

describe('condensation curves 1e4/T = a - b log10 P - c [M/H] + d (log10 P)^2', () => {
  // Coefficients as stored; "secondary" where they equal the public condensation-curve code of
  // C. V. Morley (virga package, condensables.py), "memory" where no copy of the equation was read.
  const expected: [string, number, number, number, number, string, string][] = [
    ['Fe', 5.44, 0.48, 0.48, 0, 'Visscher2010', 'secondary'],
    ['Mg2SiO4', 5.89, 0.37, 0.73, 0, 'Visscher2010', 'secondary'],
    ['MgSiO3', 6.26, 0.35, 0.7, 0, 'Visscher2010', 'secondary'],
    ['Al2O3', 5.0139, 0.21794, 0.58, 2.2636e-3, 'Wakeford2017', 'memory'],
    ['CaTiO3', 5.125, 0.277, 0.554, 0, 'Wakeford2017', 'memory'],
    ['Cr', 6.576, 0.486, 0.486, 0, 'Morley2012', 'memory'],
    ['MnS', 7.45, 0.42, 0.84, 0, 'Visscher2006', 'secondary'],
    ['Na2S', 10.05, 0.72, 1.08, 0, 'Visscher2006', 'secondary'],
    ['ZnS', 12.52, 0.63, 1.26, 0, 'Visscher2006', 'secondary'],
    ['KCl', 12.479, 0.879, 0.879, 0, 'Morley2012', 'secondary'],
  ];

  it('stores the ten curves with their coefficients, sources and how each was checked', () => {
    const curves = catalog.listCondensates();
    expect(curves.length).toBe(10);
    for (const [species, a, b, c, d, key, provenance] of expected) {
      const curve = curves.find((x) => x.species === species)!;
      expect(curve, species).toMatchObject({ a, b, c, d, sourceKey: key, provenance, validPressureBar: [1e-4, 100] });
      if (provenance === 'secondary') expect(curve.note, species).toContain('virga');
    }
    expect(curves.find((x) => x.species === 'Cr')!.note).toContain('6.528');
  });

  it('reproduce the temperatures their notes state', () => {
    const tCond = (species: string, pBar: number, mh = 0) => {
      const k = catalog.listCondensates().find((x) => x.species === species)!;
      const lp = Math.log10(pBar);
      return 1e4 / (k.a - k.b * lp - k.c * mh + k.d * lp * lp);
    };
    // solar metallicity, 1 bar
    expect(tCond('Cr', 1)).toBeCloseTo(1521, 0);
    expect(tCond('MnS', 1)).toBeCloseTo(1342, 0);
    expect(tCond('Na2S', 1)).toBeCloseTo(995, 0);
    expect(tCond('ZnS', 1)).toBeCloseTo(799, 0);
    expect(tCond('KCl', 1)).toBeCloseTo(801, 0);
    // 1e-3 bar
    expect(Math.round(tCond('Fe', 1e-3))).toBe(1453);
    expect(Math.round(tCond('Al2O3', 1e-3))).toBe(1758);
    expect(Math.round(tCond('CaTiO3', 1e-3))).toBe(1679);
    expect(Math.round(tCond('Mg2SiO4', 1e-3))).toBe(1429);
    expect(Math.round(tCond('MgSiO3', 1e-4))).toBe(1305);
  });
});

describe('seed validation', () => {
  function brokenSeeds(edit: (entry: Record<string, unknown>) => void): string {
    const dir = copySeeds();
    const file = path.join(dir, 'terrestrial.json');
    const json = readJson(file);
    edit(json.entries[2]);
    writeJson(file, json);
    return dir;
  }

  function failure(dir: string) {
    try {
      loadSeeds(dir);
    } catch (e) {
      return e as { code: string; issues: { path: string; message: string }[] };
    }
    throw new Error('expected the seeds to be rejected');
  }

  it('loads the shipped seeds without a problem', () => {
    const seeds = loadSeeds(SEEDS_DIR);
    expect(seeds.entries.length).toBe(entries.length);
  });

  it('rejects a row without a source, naming the file, the row id and the field', () => {
    const err = failure(brokenSeeds((e) => (e.sources = [])));
    expect(err.code).toBe('bad-seed');
    expect(err.issues[0]!.path).toBe('terrestrial.json entries[2] (ocean-overcast-payne1972).sources');
    expect(err.issues[0]!.message).toContain('at least one source');
  });

  it('rejects value_min > value_max, naming the row', () => {
    const err = failure(brokenSeeds((e) => {
      e.valueMin = 0.9;
      e.valueMax = 0.1;
    }));
    expect(err.issues.map((i) => i.path)).toContain('terrestrial.json entries[2] (ocean-overcast-payne1972).valueMin');
  });

  it('rejects an unknown quantity, naming the row', () => {
    const err = failure(brokenSeeds((e) => (e.quantity = 'normal-albedo')));
    expect(err.issues[0]!.path).toBe('terrestrial.json entries[2] (ocean-overcast-payne1972).quantity');
  });

  it('rejects a source key that no seed file defines', () => {
    const err = failure(brokenSeeds((e) => (e.sources = ['NoSuchPaper1999'])));
    expect(err.issues[0]!.path).toBe('terrestrial.json entries[2] (ocean-overcast-payne1972).sources[0]');
    expect(err.issues[0]!.message).toContain('NoSuchPaper1999');
  });

  it('rejects a duplicated entry id across files', () => {
    const dir = copySeeds();
    const file = path.join(dir, 'cloud-free.json');
    const json = readJson(file);
    json.entries[0].id = 'ocean-overcast-payne1972';
    writeJson(file, json);
    const err = failure(dir);
    expect(err.issues[0]!.path).toBe('terrestrial.json entries[2] (ocean-overcast-payne1972).id');
    expect(err.issues[0]!.message).toContain('cloud-free.json');
  });

  it('refuses to open a new database with bad seeds, writing no curated rows', () => {
    const dir = brokenSeeds((e) => (e.quantity = 'normal-albedo'));
    const file = tempDbPath();
    expect(() => openCatalog({ path: file, seedsDir: dir })).toThrow(expect.objectContaining({ code: 'bad-seed' }));
    const dump = dumpDatabase(file);
    expect([dump.entries!.length, dump.sources!.length, dump.catalog_meta!.length]).toEqual([0, 0, 0]);
  });
});
