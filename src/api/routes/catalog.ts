/**
 * The catalog routes: entries (list with filters, one, add, change, remove: user rows
 * only, curated rows answer 403), sources, and BibTeX of the sources.
 */
import type { Hono } from 'hono';
import { toBibtex } from '../../report/bibtex.ts';
import type { ApiDeps } from '../deps.ts';
import { readJsonBody } from '../json-body.ts';
import { readQuery } from '../query.ts';
import { bibtexQuerySchema, entryConforms, entryQuerySchema, sourceConforms } from '../schemas/catalog.ts';

export function catalogRoutes(app: Hono, deps: ApiDeps): void {
  const { catalog } = deps;

  app.get('/api/catalog/entries', (c) => {
    const q = readQuery(c, entryQuerySchema);
    const filter = {
      ...(q.category !== undefined ? { category: q.category } : {}),
      ...(q.origin !== undefined ? { origin: q.origin } : {}),
      ...(q.search ? { search: q.search } : {}),
    };
    return c.json(catalog.listEntries(filter).map(entryConforms));
  });

  app.post('/api/catalog/entries', async (c) => {
    const entry = catalog.addUserEntry(await readJsonBody(c));
    deps.snapshots.changed();
    c.header('Location', `/api/catalog/entries/${encodeURIComponent(entry.id)}`);
    return c.json(entryConforms(entry), 201);
  });

  app.get('/api/catalog/entries/:id', (c) => c.json(entryConforms(catalog.getEntry(c.req.param('id')))));

  app.patch('/api/catalog/entries/:id', async (c) => {
    const patch = await readJsonBody(c);
    const entry = catalog.updateUserEntry(c.req.param('id'), patch);
    deps.snapshots.changed();
    return c.json(entryConforms(entry));
  });

  app.delete('/api/catalog/entries/:id', (c) => {
    const entry = catalog.removeUserEntry(c.req.param('id'));
    deps.snapshots.changed();
    return c.json(entryConforms(entry));
  });

  app.get('/api/catalog/sources', (c) => c.json(catalog.listSources().map(sourceConforms)));

  app.get('/api/catalog/bibtex', (c) => {
    const q = readQuery(c, bibtexQuerySchema);
    const keys = q.keys?.split(',').map((k) => k.trim()).filter((k) => k !== '');
    const sources = keys && keys.length > 0 ? catalog.getSources(keys) : catalog.listSources();
    c.header('Content-Type', 'application/x-bibtex; charset=utf-8');
    c.header('Content-Disposition', 'attachment; filename="hesper-sources.bib"');
    return c.body(toBibtex(sources));
  });
}
