/** The comparison set: measured albedos of named exoplanets and planet populations, kept apart from the entries. */
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { openCatalog } from '../../src/catalog/index.ts';
import { SEEDS_DIR } from '../../src/catalog/paths.ts';
import { loadSeeds } from '../../src/catalog/seed-load.ts';
import { runCli } from '../helpers/run-cli.ts';
import { cleanupTemp, copySeeds, readJson, tempDbPath, writeJson } from './helpers.ts';

afterEach(cleanupTemp);

interface SeedComparison {
  id: string;
  name: string;
  kind: string;
  bandId: string | null;
  bandMinNm: number;
  bandMaxNm: number;
  geometricAlbedoMin: number;
  geometricAlbedoNominal: number;
  geometricAlbedoMax: number;
  equilibriumTemperatureK: number | null;
  equilibriumTemperatureMinK?: number | null;
  equilibriumTemperatureMaxK?: number | null;
  provenance: string;
  sources: string[];
  description: string;
}

const seedRows = (): SeedComparison[] => readJson(path.join(SEEDS_DIR, 'comparison.json')).comparisons;

describe('comparison set', () => {
  it('loads from seeds/comparison.json and reads back field for field', () => {
    const catalog = openCatalog({ path: tempDbPath() });
    const rows = seedRows();
    const listed = catalog.listComparisons();
    expect(listed.length).toBe(rows.length);
    expect(catalog.stats().comparisons).toBe(rows.length);
    for (const r of rows) {
      const c = listed.find((x) => x.id === r.id);
      const lo = r.equilibriumTemperatureMinK ?? null;
      const hi = r.equilibriumTemperatureMaxK ?? null;
      expect(c, r.id).toEqual({
        id: r.id,
        name: r.name,
        kind: r.kind,
        band: { id: r.bandId, minNm: r.bandMinNm, maxNm: r.bandMaxNm },
        geometricAlbedoRange: [r.geometricAlbedoMin, r.geometricAlbedoMax],
        geometricAlbedoNominal: r.geometricAlbedoNominal,
        equilibriumTemperatureK: r.equilibriumTemperatureK,
        equilibriumTemperatureRangeK: lo !== null && hi !== null ? [lo, hi] : null,
        sources: r.sources,
        provenance: r.provenance,
        description: r.description,
      });
    }
    catalog.close();
  });

  it('holds both named planets and populations, none of them among the entries', () => {
    const catalog = openCatalog({ path: tempDbPath() });
    const listed = catalog.listComparisons();
    expect(listed.some((c) => c.kind === 'planet')).toBe(true);
    expect(listed.some((c) => c.kind === 'population')).toBe(true);
    const entryIds = new Set(catalog.listEntries().map((e) => e.id));
    expect(listed.filter((c) => entryIds.has(c.id))).toEqual([]);
    // Planets first, each group by equilibrium temperature.
    const kinds = listed.map((c) => c.kind);
    expect(kinds).toEqual([...kinds].sort());
    catalog.close();
  });

  it('a bad comparison row is refused naming the file, the row and the field', () => {
    const cases: [(r: Record<string, unknown>) => void, string, string][] = [
      [(r) => (r.kind = 'moon'), 'kind', ''],
      [(r) => (r.bandId = 'no-such-band'), 'bandId', 'built-in band'],
      [(r) => ((r.geometricAlbedoMin = 0.9), (r.geometricAlbedoMax = 0.1)), 'geometricAlbedoMin', 'must not exceed'],
      [(r) => ((r.kind = 'planet'), (r.equilibriumTemperatureK = null)), 'equilibriumTemperatureK', 'a planet needs'],
      [(r) => ((r.kind = 'planet'), (r.equilibriumTemperatureMinK = 100), (r.equilibriumTemperatureMaxK = 5000)), 'equilibriumTemperatureMinK', 'for a population'],
      [(r) => (r.sources = ['NoSuchPaper1999']), 'sources[0]', 'not defined'],
      [(r) => (r.extra = 1), '', 'extra'],
    ];
    for (const [edit, field, text] of cases) {
      const dir = copySeeds();
      const file = path.join(dir, 'comparison.json');
      const json = readJson(file);
      const row = json.comparisons[0];
      if (row.equilibriumTemperatureK === null) row.equilibriumTemperatureK = 1000;
      edit(row);
      writeJson(file, json);
      let issues: { path: string; message: string }[] = [];
      try {
        loadSeeds(dir);
      } catch (e) {
        issues = (e as { issues: typeof issues }).issues;
      }
      const label = `comparison.json comparisons[0] (${row.id})`;
      const issue = issues.find((i) => i.path.startsWith(label));
      expect(issue, field).toBeDefined();
      if (field) expect(issue!.path, field).toBe(`${label}.${field}`);
      if (text) expect(issue!.message, field).toContain(text);
    }
  });

  it('re-seeding replaces the rows and keeps a source that only a comparison cites', () => {
    const seeds = copySeeds();
    const file = tempDbPath();
    openCatalog({ path: file, seedsDir: seeds }).close();
    const cmpFile = path.join(seeds, 'comparison.json');
    const json = readJson(cmpFile);
    const removed = json.comparisons.pop() as SeedComparison;
    json.comparisons[0].geometricAlbedoNominal = json.comparisons[0].geometricAlbedoMin;
    writeJson(cmpFile, json);
    const reopened = openCatalog({ path: file, seedsDir: seeds });
    const listed = reopened.listComparisons();
    expect(listed.map((c) => c.id)).not.toContain(removed.id);
    expect(listed.find((c) => c.id === json.comparisons[0].id)!.geometricAlbedoNominal).toBe(json.comparisons[0].geometricAlbedoMin);
    for (const key of json.comparisons.flatMap((c: SeedComparison) => c.sources)) expect(reopened.findSource(key), key).toBeDefined();
    reopened.close();
  });

  it('hesper catalog comparisons lists them as a table and as JSON', async () => {
    const db = tempDbPath();
    const table = await runCli(['catalog', 'comparisons', '--db', db]);
    expect(table.code).toBe(0);
    expect(table.stdout.split('\n')[0]).toMatch(/^ID\s+KIND\s+BAND nm\s+A_g NOMINAL\s+A_g RANGE\s+T_eq K\s+PROVENANCE\s+SOURCES$/);
    expect(table.stderr).toContain(`${seedRows().length} comparison rows`);
    const json = await runCli(['catalog', 'comparisons', '--json', '--db', db]);
    const list = JSON.parse(json.stdout) as { id: string }[];
    expect(list.map((c) => c.id).sort()).toEqual(seedRows().map((r) => r.id).sort());
  });
});

it('the shipped seeds define the comparison set only in comparison.json', () => {
  const seeds = loadSeeds(SEEDS_DIR);
  expect(seeds.comparisons.length).toBe(seedRows().length);
});
