/**
 * The page (src/web) and the figure library (vega, vega-lite from node_modules), so the
 * page works offline. Files are read once per process into a fixed table; a request's
 * name is looked up in that table and never used to build a path.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Context, Hono } from 'hono';
import { HesperError } from '../../errors.ts';

const WEB_DIR = fileURLToPath(new URL('../../web/', import.meta.url));

const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.svg': 'image/svg+xml',
};

interface Asset {
  type: string;
  body: string;
}

function asset(file: string): Asset {
  return { type: TYPES[path.extname(file)] ?? 'application/octet-stream', body: readFileSync(file, 'utf8') };
}

/** The page's own files (src/web, one level), by file name. */
function webAssets(): Map<string, Asset> {
  const out = new Map<string, Asset>();
  for (const f of readdirSync(WEB_DIR)) {
    if (/^[a-z0-9-]+\.(css|js|svg)$/.test(f)) out.set(f, asset(path.join(WEB_DIR, f)));
  }
  return out;
}

/** The UMD builds of vega and vega-lite shipped in their packages. */
function vendorAssets(): Map<string, Asset> {
  const require = createRequire(import.meta.url);
  const buildDir = (pkg: string) => path.dirname(require.resolve(pkg));
  return new Map([
    ['vega.min.js', asset(path.join(buildDir('vega'), 'vega.min.js'))],
    ['vega-lite.min.js', asset(path.join(buildDir('vega-lite'), 'vega-lite.min.js'))],
  ]);
}

// vega compiles its expressions with the Function constructor, hence 'unsafe-eval';
// nothing is loaded from another origin.
const PAGE_CSP = [
  "default-src 'self'",
  "script-src 'self' 'unsafe-eval'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
  "frame-ancestors 'none'",
].join('; ');

function send(c: Context, a: Asset): Response {
  c.header('Content-Type', a.type);
  c.header('Cache-Control', 'no-cache');
  c.header('Content-Security-Policy', PAGE_CSP);
  return c.body(a.body);
}

function lookup(table: Map<string, Asset>, name: string, where: string): Asset {
  const a = table.get(name);
  if (!a) {
    throw new HesperError('unknown-route', `no file ${where}${name.slice(0, 80)}`, [{ path: 'path', message: `no such file: ${where}${name.slice(0, 80)}` }], 'not-found');
  }
  return a;
}

let tables: { page: Asset; assets: Map<string, Asset>; vendor: Map<string, Asset> } | undefined;

export function pageRoutes(app: Hono): void {
  tables ??= { page: asset(path.join(WEB_DIR, 'index.html')), assets: webAssets(), vendor: vendorAssets() };
  const { page, assets, vendor } = tables;
  app.get('/', (c) => send(c, page));
  app.get('/assets/:name', (c) => send(c, lookup(assets, c.req.param('name'), '/assets/')));
  app.get('/vendor/:name', (c) => send(c, lookup(vendor, c.req.param('name'), '/vendor/')));
}
