/** The answer of POST /api/report. */
import { z } from 'zod';
import { REPORT_FORMATS, type ReportResult } from '../../batch/jobs.ts';
import { apiRegistry } from './common.ts';
import { interpretationSchema } from './interpretation.ts';

export const reportSchema = z.object({
  format: z.enum(['md', 'tex']),
  text: z.string().describe('The composition paragraphs, separated by blank lines.'),
  paragraphs: z.array(z.string()),
  citedKeys: z.array(z.string()).describe('Catalog source keys cited, in order of first use.'),
  bibtex: z.string().describe('BibTeX of every cited source.'),
  figure: z.object({
    vegaLite: z.record(z.string(), z.unknown()).describe('The figure as a vega-lite specification (A_g posterior and candidate intervals).'),
    svg: z.string().describe('The same figure rendered to SVG.'),
  }),
  interpretation: interpretationSchema,
});
apiRegistry.add(reportSchema, { id: 'Report', description: 'The write-up of one system and the interpretation it was written from.' });

/** Compile-time check that the report job's result fits the published schema. */
export function reportConforms(r: ReportResult): z.input<typeof reportSchema> {
  return { ...r, figure: { vegaLite: r.figure.vegaLite as unknown as Record<string, unknown>, svg: r.figure.svg } };
}

/** Query of POST /api/report. */
export const reportQuerySchema = z
  .object({
    format: z.enum(REPORT_FORMATS, { error: `one of ${REPORT_FORMATS.join(', ')}` }).default('md').describe('md: Markdown with author-year citations; tex: LaTeX with \\citep keys.'),
  })
  .strict();
