/**
 * Security of the HTTP API: loopback by default; no route reads or writes a
 * path the client names; failures answer a generic 500 with no stack trace, file name
 * or SQL (the details go to the log); JSON routes take JSON only (415 otherwise); the
 * page and its scripts carry their right content types and X-Content-Type-Options.
 */
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { networkInterfaces } from 'node:os';
import os from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_HOST } from '../../src/api/address.ts';
import type { Interpreter } from '../../src/api/interpreter.ts';
import { startServer } from '../../src/api/server.ts';
import { buildProgram } from '../../src/cli/program.ts';
import { HesperError } from '../../src/errors.ts';
import { errorOf, makeApi, postJson, quickSystem, type TestApi } from '../api/helpers.ts';
import { userEntry } from '../catalog/helpers.ts';

let api: TestApi;
let dir: string;
beforeAll(() => {
  api = makeApi();
  dir = mkdtempSync(path.join(os.tmpdir(), 'hesper-security-'));
});
afterAll(() => {
  api.close();
  rmSync(dir, { recursive: true, force: true });
});

const system = quickSystem('corvina-b', 200);

describe('listening address', () => {
  it('the default host is 127.0.0.1, for startServer and for `hesper serve`', async () => {
    expect(DEFAULT_HOST).toBe('127.0.0.1');
    const program = await buildProgram({ out: () => undefined, err: () => undefined, cwd: process.cwd(), env: {} }, ['serve']);
    const host = program.commands.find((c) => c.name() === 'serve')!.options.find((o) => o.long === '--host')!;
    expect(host.defaultValue).toBe('127.0.0.1');
  });

  it('a server started without a host listens on 127.0.0.1 only', async () => {
    const server = await startServer(api.app, { port: 0 });
    try {
      expect(server.host).toBe('127.0.0.1');
      expect(server.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
      expect((await fetch(`${server.url}/api/health`)).status).toBe(200);
      // Another address of this machine (if it has one) must not answer on that port.
      const other = Object.values(networkInterfaces()).flat().find((i) => i && i.family === 'IPv4' && !i.internal);
      if (other) {
        const reached = await fetch(`http://${other.address}:${server.port}/api/health`).then(() => true, () => false);
        expect(reached).toBe(false);
      }
    } finally {
      await server.close();
    }
  });
});

describe('no route reads or writes a path named by the client', () => {
  it('responseFile and samplesFile in a system body answer 400 naming the field, and the file is not read', async () => {
    const secret = path.join(dir, 'secret.csv');
    writeFileSync(secret, 'wavelength_nm,weight\n400,1\n900,1\n');
    const samples = path.join(dir, 'samples.csv');
    writeFileSync(samples, 'teff\n5900\n5910\n');
    const cases: Array<[Record<string, unknown>, string]> = [
      [{ ...system, band: { responseFile: secret } }, 'band.responseFile'],
      [{ ...system, band: { responseFile: '../../../../etc/passwd' } }, 'band.responseFile'],
      [{ ...system, star: { ...system.star, teffK: { samplesFile: samples, column: 'teff' } } }, 'star.teffK.samplesFile'],
      [{ ...system, planet: { ...system.planet, radiusRatio: { samplesFile: '/etc/passwd', column: 'root' } } }, 'planet.radiusRatio.samplesFile'],
    ];
    for (const url of ['/api/interpret', '/api/report']) {
      for (const [body, field] of cases) {
        const res = await postJson(api.app, url, body);
        expect(res.status, `${url} ${field}`).toBe(400);
        const e = await errorOf(res);
        expect(e.issues.map((i) => i.path)).toContain(field);
        expect(JSON.stringify(e)).not.toContain('5910');
      }
    }
  });

  it('output paths in a body or query are refused and nothing is written', async () => {
    const target = path.join(dir, 'written.svg');
    const withField = await postJson(api.app, '/api/interpret', { ...system, figure: target, bib: target });
    expect(withField.status).toBe(400);
    expect((await errorOf(withField)).issues[0]!.path).toBe('(root)');
    for (const q of [`figure=${encodeURIComponent(target)}`, `bib=${encodeURIComponent(target)}`, `out=${encodeURIComponent(target)}`]) {
      const res = await postJson(api.app, `/api/report?${q}`, system);
      expect(res.status).toBe(400);
      expect((await errorOf(res)).issues[0]!.path).toMatch(/^query/);
    }
    expect(existsSync(target)).toBe(false);
  });

  it('a demo name or asset name that looks like a path answers 404', async () => {
    for (const url of [
      '/api/demos/..%2F..%2Fetc%2Fpasswd', '/api/demos/..%2F..%2Fpackage.json', '/api/demos/%2Fetc%2Fpasswd', '/api/demos/corvina-b.json',
      '/api/demos/..%5C..%5Cpackage.json', '/assets/..%2F..%2F..%2Fpackage.json', '/assets/..%2Findex.html', '/assets/%2Fetc%2Fpasswd',
      '/vendor/..%2F..%2Fpackage.json', '/vendor/vega.min.js%00.png', '/api/catalog/entries/..%2F..%2Fetc%2Fpasswd',
    ]) {
      const res = await api.app.request(url);
      expect(res.status, url).toBe(404);
      const text = await res.text();
      expect(text, url).not.toMatch(/root:|"name": *"hesper"|"dependencies"/);
    }
    // The unencoded form is resolved by the URL parser before any route sees it.
    expect((await api.app.request('http://127.0.0.1/api/demos/../../etc/passwd')).status).toBe(404);
  });
});

/** Text that must never reach a client: stack frames, source file names, SQL, the server's folders. */
function expectNoInternals(text: string, generic = true): void {
  // A 4xx may say "at position 6" of the body; a stack frame looks like "at fn (file:1:2)".
  const words = [generic ? 'at ' : '\n    at ', '.ts:', '.js:', 'SELECT', 'sqlite', 'SQLITE', 'Sqlite', 'stack', process.cwd(), os.tmpdir()];
  for (const s of words) expect(text, `answer contains ${JSON.stringify(s)}`).not.toContain(s);
  expect(text).not.toMatch(/\bat [\w.<>]+ \(|\bat (file|node):/);
}

/** An interpreter that fails as a bug in the server would, with internals in its message. */
function failingInterpreter(fail: () => never): Interpreter {
  return { run: async () => fail(), report: async () => fail(), close: async () => undefined };
}

describe('failures answer a generic 500 with no internals', () => {
  const failures: Array<[string, () => never]> = [
    ['an Error with SQL and a stack', () => { throw new Error('SqliteError: no such column: x in SELECT * FROM entries at /work/main/src/catalog/read.ts:12:3'); }],
    ['a TypeError', () => { throw new TypeError("Cannot read properties of undefined (reading 'median')"); }],
    ['an internal HesperError', () => { throw new HesperError('internal', 'SELECT failed in sqlite at x.ts:1', [{ path: 'db', message: 'SELECT * FROM spectra' }], 'internal'); }],
    ['a thrown string', () => { throw 'SELECT * FROM entries'; }],
  ];
  for (const [name, fail] of failures) {
    it(`an injected failing interpreter (${name}): 500, generic body, logged`, async () => {
      const broken = makeApi({ interpreter: failingInterpreter(fail) });
      try {
        for (const url of ['/api/interpret', '/api/report?format=tex']) {
          const res = await postJson(broken.app, url, system);
          expect(res.status, url).toBe(500);
          expect(res.headers.get('content-type')).toMatch(/^application\/json/);
          const text = await res.text();
          expectNoInternals(text);
          const body = JSON.parse(text);
          expect(body.error.code).toBe('internal');
          expect(body.error.issues).toEqual([]);
        }
        expect(broken.logged.length).toBe(2);
        expect(broken.logged[0]).toMatch(/500 POST \/api\/interpret/);
      } finally {
        broken.close();
      }
    });
  }

  it('a database that lost a table, or was closed, answers 500 without its SQL', async () => {
    const broken = makeApi();
    try {
      broken.catalog.addUserEntry(userEntry('security-basalt'));
      const db = new Database(broken.dbPath);
      db.pragma('foreign_keys = OFF');
      db.exec('DROP TABLE spectra');
      db.close();
      for (const [method, url, body] of [
        ['GET', '/api/catalog/entries', undefined], ['GET', '/api/catalog/entries/security-basalt', undefined],
        ['POST', '/api/interpret', system], ['PATCH', '/api/catalog/entries/security-basalt', { valueMax: 0.3 }],
      ] as const) {
        const res = body === undefined ? await broken.app.request(url, { method }) : await postJson(broken.app, url, body, method);
        expect(res.status, `${method} ${url}`).toBe(500);
        expectNoInternals(await res.text());
      }
      expect(broken.logged.join('\n')).toMatch(/spectra/);
      broken.catalog.close();
      const closed = await broken.app.request('/api/catalog/sources');
      expect(closed.status).toBe(500);
      expectNoInternals(await closed.text());
    } finally {
      rmSync(path.dirname(broken.dbPath), { recursive: true, force: true });
    }
  });

  it('4xx answers carry no internals either', async () => {
    for (const res of [
      await postJson(api.app, '/api/interpret', '{"name": '),
      await postJson(api.app, '/api/interpret', { ...system, star: 'not an object' }),
      await postJson(api.app, '/api/catalog/entries', { id: 'x' }),
      await api.app.request('/api/catalog/entries/nope'),
      await api.app.request('/api/catalog/entries?category=%ZZ'),
      await api.app.request('/nope'),
    ]) {
      expect(res.status).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
      expectNoInternals(await res.text(), false);
    }
  });
});

describe('JSON routes take JSON only', () => {
  const routes: Array<[string, string]> = [
    ['POST', '/api/interpret'], ['POST', '/api/report'], ['POST', '/api/catalog/entries'], ['PATCH', '/api/catalog/entries/any-id'],
  ];
  const types: Array<string | null> = [null, 'text/plain', 'text/plain;charset=UTF-8', 'application/x-www-form-urlencoded', 'multipart/form-data; boundary=x', 'text/json', 'application/xml'];
  it('answers 415 naming Content-Type for any other type, and for none', async () => {
    for (const [method, url] of routes) {
      for (const type of types) {
        const body = new TextEncoder().encode(JSON.stringify(system));
        const res = await api.app.request(url, { method, body, headers: type === null ? {} : { 'content-type': type } });
        expect(res.status, `${method} ${url} ${type}`).toBe(415);
        const e = await errorOf(res);
        expect(e.code).toBe('unsupported-media-type');
        expect(e.issues[0]!.path).toBe('Content-Type');
      }
    }
  });
});

describe('content types and headers of what is served', () => {
  it('the page, its modules and styles, and the figure library have their types, nosniff and a policy', async () => {
    const expected: Array<[string, RegExp]> = [
      ['/', /^text\/html; charset=utf-8$/], ['/assets/page.js', /^text\/javascript; charset=utf-8$/],
      ['/assets/page.css', /^text\/css; charset=utf-8$/], ['/vendor/vega.min.js', /^text\/javascript; charset=utf-8$/],
      ['/vendor/vega-lite.min.js', /^text\/javascript; charset=utf-8$/],
    ];
    for (const [url, type] of expected) {
      const res = await api.app.request(url);
      expect(res.status, url).toBe(200);
      expect(res.headers.get('content-type'), url).toMatch(type);
      expect(res.headers.get('x-content-type-options'), url).toBe('nosniff');
      expect(res.headers.get('content-security-policy'), url).toMatch(/default-src 'self'/);
    }
  });

  it('every API answer, including errors, is JSON with nosniff and no-store', async () => {
    const broken = makeApi({ interpreter: failingInterpreter(() => { throw new Error('boom'); }) });
    const thrower = makeApi({ interpreter: failingInterpreter(() => { throw 'not an Error'; }) });
    try {
      const answers = [
        await api.app.request('/api/health'),
        await api.app.request('/api/catalog/entries/nope'),
        await postJson(api.app, '/api/interpret', '{'),
        await api.app.request('/api/interpret', { method: 'POST', body: 'x', headers: { 'content-type': 'text/plain' } }),
        await postJson(api.app, '/api/interpret', `"${'x'.repeat(1024 * 1024 + 10)}"`),
        await postJson(broken.app, '/api/interpret', system),
        await postJson(thrower.app, '/api/interpret', system),
        await api.app.request('/api/nope'),
      ];
      expect(answers.map((r) => r.status)).toEqual([200, 404, 400, 415, 413, 500, 500, 404]);
      for (const res of answers) {
        expect(res.headers.get('content-type')).toMatch(/^application\/json/);
        expect(res.headers.get('x-content-type-options')).toBe('nosniff');
        expect(res.headers.get('cache-control')).toBe('no-store');
      }
      const bib = await api.app.request('/api/catalog/bibtex');
      expect(bib.headers.get('content-type')).toBe('application/x-bibtex; charset=utf-8');
      expect(bib.headers.get('x-content-type-options')).toBe('nosniff');
    } finally {
      broken.close();
      thrower.close();
    }
  });

  it('a foreign Host header is refused when the app is told its own names (DNS rebinding)', async () => {
    const guarded = makeApi({ allowedHosts: ['127.0.0.1:4173', 'localhost:4173'] });
    try {
      expect((await guarded.app.request('http://127.0.0.1:4173/api/health')).status).toBe(200);
      const res = await guarded.app.request('http://attacker.example:4173/api/health');
      expect(res.status).toBe(403);
      expect((await errorOf(res)).code).toBe('bad-host');
      const post = await guarded.app.request('http://attacker.example:4173/api/catalog/entries', { method: 'POST', body: JSON.stringify(userEntry('rebound')), headers: { 'content-type': 'application/json' } });
      expect(post.status).toBe(403);
      expect(() => guarded.catalog.getEntry('rebound')).toThrow(/no catalog entry/);
    } finally {
      guarded.close();
    }
  });
});
