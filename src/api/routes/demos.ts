/**
 * GET /api/demos and GET /api/demos/:name: the invented demo systems of
 * demo-data/systems. The names are read once at start; a request's name is looked up in
 * that list and never used to build a path.
 */
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Hono } from 'hono';
import { HesperError } from '../../errors.ts';

const DEMO_DIR = fileURLToPath(new URL('../../../demo-data/systems/', import.meta.url));

export interface DemoSystem {
  name: string;
  title: string;
  note: string;
  system: Record<string, unknown>;
}

/** The demo systems, by name (file name without .json). */
export function loadDemoSystems(dir: string = DEMO_DIR): Map<string, DemoSystem> {
  const out = new Map<string, DemoSystem>();
  for (const file of readdirSync(dir).filter((f) => /^[a-z0-9-]+\.json$/.test(f)).sort()) {
    const json = JSON.parse(readFileSync(path.join(dir, file), 'utf8')) as Record<string, unknown>;
    const { $schema: _schema, ...system } = json;
    const name = file.replace(/\.json$/, '');
    out.set(name, { name, title: String(system.name ?? name), note: String(system.note ?? ''), system });
  }
  return out;
}

export function demoRoutes(app: Hono): void {
  const demos = loadDemoSystems();
  app.get('/api/demos', (c) => c.json([...demos.values()].map(({ name, title, note }) => ({ name, title, note }))));
  app.get('/api/demos/:name', (c) => {
    const name = c.req.param('name');
    const demo = demos.get(name);
    if (!demo) {
      const allowed = [...demos.keys()].join(', ');
      throw new HesperError('not-found', `no demo system is called "${name.slice(0, 80)}"`, [
        { path: 'name', message: `unknown demo system; the demos are ${allowed}`, value: name.slice(0, 80), allowed },
      ], 'not-found');
    }
    return c.json(demo.system);
  });
}
