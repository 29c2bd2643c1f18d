/**
 * Deep and huge input: a system file nested 100 000 levels, or holding a
 * 10 MB string, a 10 MB key or a million-item array, is bad input: `hesper interpret`
 * exits 2 with a short message naming the field, never 1, never a stack overflow. A
 * JSON parser that runs out of stack on such text (RangeError) is bad input too, for
 * the CLI and for the API.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { errorOf, makeApi, postJson, type TestApi } from '../api/helpers.ts';
import { runCli } from '../helpers/run-cli.ts';

const demo = JSON.parse(readFileSync(new URL('../../demo-data/systems/corvina-b.json', import.meta.url), 'utf8')) as Record<string, any>;
const LEVELS = 100_000;
const TEN_MB = 10 * 1024 * 1024;

let dir: string;
let api: TestApi;
beforeAll(() => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'hesper-deep-'));
  api = makeApi();
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
  api.close();
});

/** The demo system file as text, with `raw` (JSON text) at the marked place. */
function withRaw(place: (s: Record<string, any>, mark: string) => void, raw: string): string {
  const s = structuredClone(demo);
  place(s, '@@MARK@@');
  return JSON.stringify(s).replace('"@@MARK@@"', raw);
}

const deepArray = '['.repeat(LEVELS) + ']'.repeat(LEVELS);
const deepObject = '{"a":'.repeat(LEVELS) + '1' + '}'.repeat(LEVELS);
const tenMbString = JSON.stringify('x'.repeat(TEN_MB));

const cases: Array<[string, () => string, string]> = [
  ['the whole file nested 100 000 levels', () => deepArray, '(root)'],
  ['star.teffK nested 100 000 levels (arrays)', () => withRaw((s, m) => { s.star.teffK = m; }, deepArray), 'star.teffK'],
  ['star.teffK nested 100 000 levels (objects)', () => withRaw((s, m) => { s.star.teffK = m; }, deepObject), 'star.teffK'],
  ['band nested 100 000 levels', () => withRaw((s, m) => { s.band = m; }, deepArray), 'band'],
  ['assumptions.thermal nested 100 000 levels', () => withRaw((s, m) => { s.assumptions = { thermal: m }; }, deepArray), 'assumptions.thermal'],
  ['a 10 MB string in star.teffK', () => withRaw((s, m) => { s.star.teffK = m; }, tenMbString), 'star.teffK'],
  ['a 10 MB string in assumptions.thermal', () => withRaw((s, m) => { s.assumptions = { thermal: m }; }, tenMbString), 'assumptions.thermal'],
  ['a 10 MB string as the name', () => withRaw((s, m) => { s.name = m; }, tenMbString), 'name'],
  ['a 10 MB key in star', () => withRaw((s, m) => { s.star.extra = m; }, '1').replace('"extra"', tenMbString), 'star'],
  ['a million-item array in planet.radiusRatio', () => withRaw((s, m) => { s.planet.radiusRatio = m; }, `[${'1,'.repeat(999_999)}1]`), 'planet.radiusRatio'],
  ['200 000 unknown fields in star', () => withRaw((s, m) => { s.star = m; }, `{${Array.from({ length: 200_000 }, (_, i) => `"k${i}":${i}`).join(',')}}`), 'star'],
];

describe('hesper interpret on deep and huge system files', () => {
  for (const [name, text, field] of cases) {
    it(`${name}: exit 2, a short message naming ${field}`, async () => {
      const file = path.join(dir, 'system.json');
      writeFileSync(file, text());
      const r = await runCli(['interpret', file, '--samples', '100']);
      expect(r.code, r.stderr.slice(0, 500)).toBe(2);
      expect(r.stdout).toBe('');
      expect(r.stderr).toMatch(/^error \[invalid-input\]/);
      expect(r.stderr.split('\n').some((l) => l.startsWith(`  ${field}: `)), r.stderr.slice(0, 500)).toBe(true);
      // Short whatever the input held: at most a few issues of a few hundred characters.
      expect(r.stderr.length).toBeLessThan(2000);
      expect(r.stderr).not.toMatch(/call stack|RangeError/);
    });
  }

  it('a JSON parser that runs out of stack (RangeError) is bad input: exit 2 naming the system file', async () => {
    const file = path.join(dir, 'parser-overflow.json');
    const text = withRaw((s, m) => { s.star.teffK = m; }, deepArray);
    writeFileSync(file, text);
    const parse = JSON.parse;
    const spy = vi.spyOn(JSON, 'parse').mockImplementation((t: string, reviver?: Parameters<typeof JSON.parse>[1]) => {
      if (t === text) throw new RangeError('Maximum call stack size exceeded');
      return parse(t, reviver);
    });
    try {
      const r = await runCli(['interpret', file, '--samples', '100']);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(/^ {2}system file: .*could not be read as JSON \(RangeError: nested too deeply or too large\)/m);
    } finally {
      spy.mockRestore();
    }
  });
});

describe('the API on a parser that runs out of stack', () => {
  it('answers 400 bad-json naming the body', async () => {
    const text = withRaw((s, m) => { s.star.teffK = m; }, '[[[1]]]');
    const parse = JSON.parse;
    const spy = vi.spyOn(JSON, 'parse').mockImplementation((t: string, reviver?: Parameters<typeof JSON.parse>[1]) => {
      if (t === text) throw new RangeError('Maximum call stack size exceeded');
      return parse(t, reviver);
    });
    try {
      const res = await postJson(api.app, '/api/interpret', text);
      expect(res.status).toBe(400);
      const e = await errorOf(res);
      expect(e.code).toBe('bad-json');
      expect(e.issues[0]!.path).toBe('body');
      expect(e.issues[0]!.message).toMatch(/nested too deeply or too large/);
      expect(api.logged).toEqual([]);
    } finally {
      spy.mockRestore();
    }
  });
});
