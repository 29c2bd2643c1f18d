import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { openCatalog } from '../../src/catalog/index.ts';
import { cleanupTemp, copySeeds, dumpDatabase, readJson, tempDbPath, userEntry, writeJson } from './helpers.ts';

afterEach(cleanupTemp);

const USER_ROWS = {
  sources: "origin = 'user'",
  entries: "origin = 'user'",
  entry_sources: "entry_id IN (SELECT id FROM entries WHERE origin = 'user')",
  spectra: "entry_id IN (SELECT id FROM entries WHERE origin = 'user')",
};

describe('seeding and re-seeding', () => {
  it('seeds a new file once; reopening an up-to-date file does not seed again', () => {
    const file = tempDbPath();
    const first = openCatalog({ path: file });
    expect(first.seededOnOpen?.entries).toBe(first.listEntries().length);
    first.close();
    const before = dumpDatabase(file);
    const second = openCatalog({ path: file });
    expect(second.seededOnOpen).toBeUndefined();
    second.close();
    expect(dumpDatabase(file)).toEqual(before);
  });

  it('after a seed change upserts curated rows, retires removed ones, and keeps user rows byte for byte', () => {
    const seeds = copySeeds();
    const file = tempDbPath();
    const catalog = openCatalog({ path: file, seedsDir: seeds });
    catalog.addUserEntry(userEntry('invented-user-a', { spectrum: [{ wavelengthNm: 600, value: 0.14 }] }));
    catalog.addUserEntry(userEntry('invented-user-b', { sources: [{ key: 'InventedUser2026', authors: 'Nobody, A.', title: 'Invented', type: 'misc' }, 'Bell2017'] }));
    // A user entry whose id a later seed version also uses: the user row must win.
    catalog.addUserEntry(userEntry('invented-collision'));
    catalog.close();
    const userBefore = dumpDatabase(file, USER_ROWS);

    const terrestrial = path.join(seeds, 'terrestrial.json');
    const json = readJson(terrestrial);
    const removed = json.entries.pop().id as string;
    json.entries[0].valueNominal = 0.031;
    json.entries[0].valueMax = 0.031;
    json.entries.push({ ...json.entries[1], id: 'invented-collision' });
    json.entries.push({ ...json.entries[1], id: 'invented-new-curated-row' });
    writeJson(terrestrial, json);

    const reopened = openCatalog({ path: file, seedsDir: seeds });
    const report = reopened.seededOnOpen!;
    expect(report.removedEntries).toBe(1);
    expect(report.changedEntries).toBe(2);
    expect(report.skippedForUserRows).toEqual(['entry invented-collision']);
    expect(reopened.getEntry(json.entries[0].id).valueNominal).toBe(0.031);
    expect(reopened.getEntry('invented-new-curated-row').origin).toBe('curated');
    expect(reopened.getEntry('invented-collision').origin).toBe('user');
    expect(() => reopened.getEntry(removed)).toThrow(expect.objectContaining({ code: 'not-found' }));
    // catalog seed: re-applying unchanged seeds changes nothing
    const again = reopened.reseed();
    expect([again.changedEntries, again.changedSources, again.removedEntries]).toEqual([0, 0, 0]);
    reopened.close();
    expect(dumpDatabase(file, USER_ROWS)).toEqual(userBefore);
  });

  it('keeps a retired curated source while a user entry still cites it', () => {
    const seeds = copySeeds();
    const file = tempDbPath();
    const catalog = openCatalog({ path: file, seedsDir: seeds });
    catalog.addUserEntry(userEntry('invented-cites-charnay', { sources: ['Charnay2015'] }));
    catalog.close();
    const exo = path.join(seeds, 'exoplanets.json');
    const ejson = readJson(exo);
    ejson.entries = ejson.entries.filter((e: { sources: string[] }) => !e.sources.includes('Charnay2015'));
    writeJson(exo, ejson);
    const src = path.join(seeds, 'sources.json');
    const sjson = readJson(src);
    sjson.sources = sjson.sources.filter((s: { key: string }) => s.key !== 'Charnay2015');
    writeJson(src, sjson);
    const reopened = openCatalog({ path: file, seedsDir: seeds });
    expect(reopened.findSource('Charnay2015')?.origin).toBe('curated');
    expect(reopened.getEntry('invented-cites-charnay').sources).toEqual(['Charnay2015']);
    reopened.close();
  });
});
