/** A fresh app on a temporary catalog for each API test file, driven in-process with app.request(). */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Hono } from 'hono';
import { createApp, type AppOptions } from '../../src/api/app.ts';
import { type Catalog, openCatalog } from '../../src/catalog/index.ts';

export interface TestApi {
  app: Hono;
  catalog: Catalog;
  dbPath: string;
  /** Lines the app logged (unexpected failures). */
  logged: string[];
  close(): void;
}

export function makeApi(options: Partial<AppOptions> = {}): TestApi {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'hesper-api-'));
  const dbPath = path.join(dir, 'catalog.sqlite');
  const catalog = openCatalog({ path: dbPath, env: {} });
  const logged: string[] = [];
  const app = createApp({ catalog, log: (l) => logged.push(l), ...options });
  return {
    app, catalog, dbPath, logged,
    close: () => {
      catalog.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

export function postJson(app: Hono, url: string, body: unknown, method = 'POST'): Promise<Response> {
  return Promise.resolve(app.request(url, { method, body: typeof body === 'string' ? body : JSON.stringify(body), headers: { 'content-type': 'application/json' } }));
}

/** A demo system file (invented) as an object, without its $schema. */
export function demoSystem(name = 'aurelia-b'): Record<string, any> {
  const json = JSON.parse(readFileSync(new URL(`../../demo-data/systems/${name}.json`, import.meta.url), 'utf8')) as Record<string, any>;
  delete json.$schema;
  return json;
}

/** The demo system with fewer draws, so a test interpretation takes a fraction of a second. */
export function quickSystem(name = 'aurelia-b', samples = 600): Record<string, any> {
  const s = demoSystem(name);
  return { ...s, assumptions: { ...(s.assumptions ?? {}), samples, gridNodes: 128 } };
}

/** The documented error body, asserted and returned. */
export async function errorOf(res: Response): Promise<{ code: string; message: string; issues: Array<{ path: string; message: string }> }> {
  const body = (await res.json()) as { error: { code: string; message: string; issues: Array<{ path: string; message: string }> } };
  return body.error;
}
