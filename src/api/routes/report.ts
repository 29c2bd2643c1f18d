/**
 * POST /api/report?format=md|tex: a system file in the body; the composition paragraphs
 * (Markdown with author-year citations, or LaTeX with \citep keys), the BibTeX of every
 * cited source, the figure (vega-lite specification and SVG) and the interpretation
 * they were written from.
 */
import type { Hono } from 'hono';
import type { ApiDeps } from '../deps.ts';
import { readQuery } from '../query.ts';
import { reportConforms, reportQuerySchema } from '../schemas/report.ts';
import { readSystemBody } from './interpret.ts';

export function reportRoutes(app: Hono, deps: ApiDeps): void {
  app.post('/api/report', async (c) => {
    const { format } = readQuery(c, reportQuerySchema);
    const json = await readSystemBody(c);
    const report = await deps.interpreter.report(json, deps.snapshots.current(), format);
    return c.json(reportConforms(report));
  });
}
