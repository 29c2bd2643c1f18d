/**
 * POST /api/interpret: a system file in the body, the interpretation out. The body is
 * data only: the parser is given no file readers, so {responseFile} and {samplesFile}
 * are refused with a 400 naming the field.
 */
import type { Context, Hono } from 'hono';
import { parseSystem } from '../../index.ts';
import type { ApiDeps } from '../deps.ts';
import { readJsonBody } from '../json-body.ts';
import { checkWork } from '../limits.ts';
import { conformsToSchema } from '../schemas/interpretation.ts';

/** Validates a system-file body (400 on any problem) and checks its cost. */
export async function readSystemBody(c: Context): Promise<unknown> {
  const json = await readJsonBody(c);
  checkWork(parseSystem(json));
  return json;
}

export function interpretRoutes(app: Hono, deps: ApiDeps): void {
  app.post('/api/interpret', async (c) => {
    const json = await readSystemBody(c);
    const snapshot = deps.snapshots.current();
    if (deps.interpreter.runJson) {
      // Serialised in the worker thread; the text is the same JSON c.json would write.
      const text = await deps.interpreter.runJson(json, snapshot);
      return c.body(text, 200, { 'Content-Type': 'application/json' });
    }
    const result = await deps.interpreter.run(json, snapshot);
    return c.json(conformsToSchema(result));
  });
}
