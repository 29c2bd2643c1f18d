/** GET /api/health, GET /api/bands and GET /api/openapi.json. */
import type { Hono } from 'hono';
import { describeBand, listBuiltinBands } from '../../index.ts';
import type { ApiDeps } from '../deps.ts';
import { openApiDocument } from '../openapi.ts';
import { HESPER_VERSION } from '../version.ts';

export function metaRoutes(app: Hono, deps: ApiDeps): void {
  app.get('/api/health', (c) => {
    const s = deps.catalog.stats();
    return c.json({
      status: 'ok' as const,
      version: HESPER_VERSION,
      catalog: { entries: s.entries, userEntries: s.userEntries, sources: s.sources },
    });
  });

  app.get('/api/bands', (c) => c.json(listBuiltinBands().map(describeBand)));

  let doc: Record<string, unknown> | undefined;
  app.get('/api/openapi.json', (c) => c.json((doc ??= openApiDocument())));
}
