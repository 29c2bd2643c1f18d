/**
 * The curated seeds' quality rules: primary sources with full records, no team-note
 * references in the text, a planet class on every entry, checked or computed provenance.
 *
 * The cloud-free references (entries of category clear-atmosphere, rock or lava, in
 * cloud-free.json) have their own tests; records they alone cite whose journal details are
 * still to be confirmed are listed below by name. Each list checks that its items still
 * exist and still need the exception, so it fails, and must be shortened, once they are fixed.
 */
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { SEEDS_DIR } from '../../src/catalog/paths.ts';
import { loadSeeds } from '../../src/catalog/seed-load.ts';
import { CURATED_PROVENANCES, PLANET_CLASSES } from '../../src/catalog/vocab.ts';

const seeds = loadSeeds(SEEDS_DIR);
const files = readdirSync(SEEDS_DIR).filter((f) => f.endsWith('.json')).sort();
const raw = Object.fromEntries(files.map((f) => [f, JSON.parse(readFileSync(path.join(SEEDS_DIR, f), 'utf8'))])) as Record<string, Record<string, any>>;

/** The cloud-free catalog's categories and file (owned elsewhere). */
const CLOUD_FREE_CATEGORIES = new Set(['clear-atmosphere', 'rock', 'lava']);
const CLOUD_FREE_FILES = new Set(['cloud-free.json']);
const entryFile = new Map<string, string>();
for (const f of files) for (const e of (raw[f]!.entries ?? []) as { id: string }[]) entryFile.set(e.id, f);
const isCloudFree = (e: { id: string; category: string }) => CLOUD_FREE_CATEGORIES.has(e.category) || CLOUD_FREE_FILES.has(entryFile.get(e.id)!);

/** Sources kept only because cloud-free entries cite them; they break the record rules below. */
const CLOUD_FREE_SOURCE_EXCEPTIONS = [
  'Sudarsky2000', 'Marley1999', 'BurrowsIbguiHubeny2008', 'Blazek2022', 'Bell2017', 'Lothringer2018', 'Parmentier2018UltraHot',
];
/** Cloud-free entries whose provenance is still secondary or memory. */
const CLOUD_FREE_PROVENANCE_EXCEPTIONS: string[] = [];
/** Seed items (entry ids, or a file name for its description) whose text still refers to team notes or memory. */
const CLOUD_FREE_TEXT_EXCEPTIONS: string[] = [];

/** Hosts of encyclopedias, their mirrors, blogs, forums, document scrapers and web archives. */
const BANNED_HOSTS = [
  /(^|\.)wikipedia\.org$/, /(^|\.)wiki/, /pedia\./, /blogspot\./, /wordpress\./, /(^|\.)blog\./, /forum/, /unmannedspaceflight/,
  /liquisearch/, /krysstal/, /examboard/, /what-when-how/, /docslib/, /studylib/, /mafiadoc/, /scribd/, /slideshare/, /researcher\.life/,
  /landoffree/, /tomesphere/, /arxiv-vanity/, /bzpeer/, /groundai/, /arxivlens/, /boxedpaper/, /researchbunny/, /zhixidata/, /vdocument/,
  /pdffox/, /moam\.info/, /123dok/, /docplayer/, /sciencedocbox/, /coek\.info/, /arcarc\.nl/, /web\.archive\.org/, /gitea\./, /yabesh/,
  /go2journals/, /bohrium/, /cnoctave/, /questionai/, /grokipedia/, /slidelegend/, /mendeley\.com/, /wasp-planets/, /turbulenteddies/,
];
const hostOf = (url: string) => new URL(url).hostname.toLowerCase();
const bannedHost = (url: string | null | undefined) => (url ? BANNED_HOSTS.some((re) => re.test(hostOf(url))) : false);
/** Agency tables and graphics may be undated (they are updated in place). */
const AGENCY_HOSTS = [/(^|\.)nasa\.gov$/, /(^|\.)grida\.no$/];

type Source = (typeof seeds.sources)[number];
function recordProblems(s: Source): string[] {
  const problems: string[] = [];
  if (bannedHost(s.url)) problems.push(`url host ${hostOf(s.url!)}`);
  if (!s.authors || s.authors.trim() === '') problems.push('no authors');
  const undatedAgency = s.type === 'misc' && !!s.url && AGENCY_HOSTS.some((re) => re.test(hostOf(s.url!)));
  if ((s.year === null || s.year === undefined) && !undatedAgency) problems.push('no year');
  if (!s.journal && !s.publisher) problems.push('no journal or publisher');
  if (/from memory|not verified/i.test(s.note ?? '')) problems.push('note says it rests on memory');
  if (/wikipedia|blog|forum/i.test(`${s.authors} ${s.journal ?? ''} ${s.publisher ?? ''}`)) problems.push('not a primary source');
  return problems;
}

/** Words that point at the team's own notes rather than at the literature. */
const TEAM_NOTE_PATTERNS = [/\bDESIGN\b/, /reference\//i, /reflectivity\.md/i, /physics\.md/i, /README\.md/i, /\btable 4[a-z]\b/i, /\b[SXRC]\d{1,2}\b/];
const MEMORY_PATTERNS = [/from memory/i, /not verified/i];
const textProblems = (text: string) => [...TEAM_NOTE_PATTERNS, ...MEMORY_PATTERNS].filter((re) => re.test(text)).map(String);

describe('curated sources', () => {
  const cited = new Map<string, string[]>();
  for (const e of seeds.entries) for (const k of e.sources) cited.set(k, [...(cited.get(k) ?? []), e.id]);
  for (const c of seeds.comparisons) for (const k of c.sources) cited.set(k, [...(cited.get(k) ?? []), c.id]);
  for (const c of seeds.condensates) cited.set(c.sourceKey, [...(cited.get(c.sourceKey) ?? []), `curve ${c.species}`]);
  const byId = new Map(seeds.entries.map((e) => [e.id, e]));

  it('are at least 40, and every one is a primary source with authors, year and journal or publisher', () => {
    expect(seeds.sources.length).toBeGreaterThanOrEqual(40);
    for (const s of seeds.sources) {
      if (CLOUD_FREE_SOURCE_EXCEPTIONS.includes(s.key)) continue;
      expect(recordProblems(s), s.key).toEqual([]);
    }
  });

  it('keep no encyclopedia, mirror, blog, forum or scraper address', () => {
    for (const s of seeds.sources) if (!CLOUD_FREE_SOURCE_EXCEPTIONS.includes(s.key)) expect(bannedHost(s.url), `${s.key} ${s.url}`).toBe(false);
    // The host list itself: a few addresses that must be caught, and primary ones that must not.
    expect(bannedHost('https://en.wikipedia.org/wiki/Albedo')).toBe(true);
    expect(bannedHost('http://what-when-how.com/Tutorial/x.html')).toBe(true);
    expect(bannedHost('https://docslib.org/doc/1/x')).toBe(true);
    expect(bannedHost('https://www.arxiv-vanity.com/papers/1710.04946/')).toBe(true);
    for (const ok of ['https://arxiv.org/abs/1710.04946', 'https://nssdc.gsfc.nasa.gov/planetary/factsheet/marsfact.html', 'https://www.aanda.org/articles/x', 'https://tc.copernicus.org/articles/9/255/2015/']) {
      expect(bannedHost(ok), ok).toBe(false);
    }
  });

  it('are each cited by an entry, a comparison or a curve, or are method papers of the report', () => {
    const methodPapers = new Set(['Cowan2011Albedos', 'Fulton2017RadiusGap', 'Parmentier2016Transitions']);
    for (const s of seeds.sources) expect(cited.has(s.key) || methodPapers.has(s.key), s.key).toBe(true);
  });

  it('list as exceptions only records that cloud-free entries alone cite and that still break a rule', () => {
    for (const key of CLOUD_FREE_SOURCE_EXCEPTIONS) {
      const s = seeds.sources.find((x) => x.key === key);
      expect(s, `${key} is gone: remove it from CLOUD_FREE_SOURCE_EXCEPTIONS`).toBeDefined();
      expect(recordProblems(s!).length + textProblems(s!.note ?? '').length, `${key} now follows the rules: remove the exception`).toBeGreaterThan(0);
      const users = cited.get(key) ?? [];
      expect(users.length, `${key} is no longer cited: remove the record and the exception`).toBeGreaterThan(0);
      for (const id of users) expect(byId.has(id) && isCloudFree(byId.get(id)!), `${key} is cited by ${id}, which is not a cloud-free entry`).toBe(true);
    }
  });
});

describe('curated entries', () => {
  it('are at least 100, each with a non-empty list of planet classes, and surfaces apply to rocky planets only', () => {
    expect(seeds.entries.length).toBeGreaterThanOrEqual(100);
    const surfaces = new Set(['rock', 'regolith', 'soil', 'vegetation', 'ocean']);
    for (const e of seeds.entries) {
      expect(e.appliesTo.length, e.id).toBeGreaterThan(0);
      for (const c of e.appliesTo) expect(PLANET_CLASSES, e.id).toContain(c);
      if (surfaces.has(e.category)) expect(e.appliesTo, e.id).toEqual(['rocky']);
    }
  });

  it('are checked or computed, apart from the listed cloud-free entries', () => {
    for (const e of seeds.entries) {
      if (CLOUD_FREE_PROVENANCE_EXCEPTIONS.includes(e.id)) continue;
      expect(['checked', 'computed'], `${e.id} is ${e.provenance}`).toContain(e.provenance);
    }
    for (const id of CLOUD_FREE_PROVENANCE_EXCEPTIONS) {
      const e = seeds.entries.find((x) => x.id === id);
      expect(e, `${id} is gone: remove it from CLOUD_FREE_PROVENANCE_EXCEPTIONS`).toBeDefined();
      expect(isCloudFree(e!), id).toBe(true);
      expect(['checked', 'computed'], `${id} is now ${e!.provenance}: remove the exception`).not.toContain(e!.provenance);
    }
    expect(CURATED_PROVENANCES).toEqual(expect.arrayContaining(['checked', 'computed']));
  });

  it('give liquid-water surfaces and water clouds a window where water can be liquid or condense', () => {
    for (const e of seeds.entries) {
      if (e.category === 'ocean') expect([e.temperatureMinK, e.temperatureMaxK], e.id).toEqual([273.16, 372.8]);
      if (e.category === 'ice' && e.sources.includes('WagnerPruss2002')) expect(e.temperatureMaxK, e.id).toBe(273.16);
      if (e.category === 'cloud' && e.condensate === 'H2O') expect(e.temperatureMaxK, e.id).toBeLessThanOrEqual(647.1);
    }
  });
});

describe('seed text', () => {
  type Item = { name: string; text: string };
  const items: Item[] = [];
  for (const f of files) {
    const j = raw[f]!;
    items.push({ name: f, text: String(j.description ?? '') });
    for (const e of [...(j.entries ?? []), ...(j.comparisons ?? [])] as { id: string }[]) items.push({ name: e.id, text: JSON.stringify(e) });
    for (const s of (j.sources ?? []) as { key: string }[]) items.push({ name: s.key, text: JSON.stringify(s) });
    for (const c of (j.condensates ?? []) as { species: string }[]) items.push({ name: `curve ${c.species}`, text: JSON.stringify(c) });
  }
  const exempt = new Set([...CLOUD_FREE_TEXT_EXCEPTIONS, ...CLOUD_FREE_SOURCE_EXCEPTIONS]);

  it('never refers to the team notes (DESIGN, reference/, reflectivity.md, physics.md, table 4a, row codes) or to memory', () => {
    for (const item of items) if (!exempt.has(item.name)) expect(textProblems(item.text), item.name).toEqual([]);
  });

  it('catches each kind of reference the rule is about', () => {
    for (const bad of ['see DESIGN section 7', 'reference/reflectivity.md', 'as in physics.md', 'table 4a of the notes', 'row S28', 'X10 computed', 'value from memory']) {
      expect(textProblems(bad).length, bad).toBeGreaterThan(0);
    }
    for (const ok of ['Table 5.1 of the book', 'Schmid et al. 2006, Table 3', 'Kepler-10b', 'CaTiO3 and Na2S', 'IRAC channel 1']) expect(textProblems(ok), ok).toEqual([]);
  });

  it('lists as exceptions only items that exist and still need them', () => {
    for (const name of CLOUD_FREE_TEXT_EXCEPTIONS) {
      const item = items.find((i) => i.name === name);
      expect(item, `${name} is gone: remove it from CLOUD_FREE_TEXT_EXCEPTIONS`).toBeDefined();
      expect(textProblems(item!.text).length, `${name} is clean now: remove the exception`).toBeGreaterThan(0);
    }
  });
});
