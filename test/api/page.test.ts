/**
 * GET / and its files: the page and the figure library come from this package (no CDN),
 * the page's policy allows scripts from its own origin only, and the listening defaults
 * are loopback.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_HOST, isLoopbackHost, loopbackHostHeaders } from '../../src/api/address.ts';
import { makeApi, type TestApi } from './helpers.ts';

let api: TestApi;
beforeAll(() => {
  api = makeApi();
});
afterAll(() => api.close());

describe('the page', () => {
  it('serves the page, whose scripts and styles all come from this server', async () => {
    const res = await api.app.request('/');
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/^text\/html/);
    const csp = res.headers.get('content-security-policy') ?? '';
    expect(csp).toMatch(/default-src 'self'/);
    expect(csp).toMatch(/script-src 'self' 'unsafe-eval'(;|$)/);
    const html = await res.text();
    const urls = [...html.matchAll(/(?:src|href)="([^"]+)"/g)].map((m) => m[1]!);
    expect(urls.length).toBeGreaterThan(3);
    for (const u of urls) expect(u, u).toMatch(/^(\/|#|data:)/);
    for (const u of urls.filter((x) => x.startsWith('/assets/') || x.startsWith('/vendor/'))) {
      expect((await api.app.request(u)).status, u).toBe(200);
    }
  });

  it('serves vega and vega-lite byte for byte from their packages', async () => {
    const require = createRequire(import.meta.url);
    for (const [pkg, file] of [['vega', 'vega.min.js'], ['vega-lite', 'vega-lite.min.js']] as const) {
      const expected = readFileSync(path.join(path.dirname(require.resolve(pkg)), file), 'utf8');
      const res = await api.app.request(`/vendor/${file}`);
      expect(res.headers.get('content-type')).toMatch(/^text\/javascript/);
      expect(await res.text()).toBe(expected);
    }
  });

  it('serves each page module, and every module it imports exists', async () => {
    const page = await (await api.app.request('/assets/page.js')).text();
    const seen = new Set<string>();
    const queue = ['page.js'];
    while (queue.length > 0) {
      const name = queue.pop()!;
      if (seen.has(name)) continue;
      seen.add(name);
      const res = await api.app.request(`/assets/${name}`);
      expect(res.status, name).toBe(200);
      const text = name === 'page.js' ? page : await res.text();
      for (const m of text.matchAll(/from '\.\/([a-z0-9-]+\.js)'/g)) queue.push(m[1]!);
    }
    expect(seen.size).toBeGreaterThan(4);
  });
});

describe('listening address', () => {
  it('defaults to loopback and knows which hosts are loopback', () => {
    expect(DEFAULT_HOST).toBe('127.0.0.1');
    for (const h of ['127.0.0.1', 'localhost', '::1', '[::1]', '127.1.2.3']) expect(isLoopbackHost(h), h).toBe(true);
    for (const h of ['0.0.0.0', '192.168.1.10', '::', 'example.org', '10.0.0.1']) expect(isLoopbackHost(h), h).toBe(false);
    expect(loopbackHostHeaders('127.0.0.1', 4173)).toEqual(['127.0.0.1:4173', 'localhost:4173']);
    expect(loopbackHostHeaders('::1', 80)).toEqual(['[::1]:80', '127.0.0.1:80', 'localhost:80']);
  });
});
