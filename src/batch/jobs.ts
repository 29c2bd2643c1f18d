/**
 * The two jobs a worker thread (or the server's own thread) runs on a system-file JSON
 * value: the interpretation, and the write-up built on it (paragraphs in Markdown or
 * LaTeX, the BibTeX of every cited source, and the figure as a vega-lite specification
 * and as SVG). Catalog data come in as plain data; nothing here opens a file.
 */
import type { TopLevelSpec } from 'vega-lite';
import type { SourceRecord } from '../catalog/index.ts';
import { interpret, parseSystem, type Interpretation } from '../index.ts';
import { interpretSystemDetailed } from '../interpret/run.ts';
import type { CatalogData } from '../interpret/types.ts';
import { toBibtex } from '../report/bibtex.ts';
import { figureSpec, figureSvg } from '../report/figure.ts';
import { writeUpMarkdown } from '../report/paragraph-md.ts';
import { writeUpLatex } from '../report/paragraph-tex.ts';

export type ReportFormat = 'md' | 'tex';
export const REPORT_FORMATS: readonly ReportFormat[] = ['md', 'tex'];

/** Catalog data for the jobs: entries and curves to match, sources to cite. */
export interface JobCatalog {
  data: CatalogData;
  sources: readonly SourceRecord[];
}

export interface ReportResult {
  format: ReportFormat;
  /** The paragraphs, separated by blank lines. */
  text: string;
  paragraphs: string[];
  /** Catalog keys cited, in order of first use. */
  citedKeys: string[];
  /** BibTeX of the cited sources. */
  bibtex: string;
  figure: { vegaLite: TopLevelSpec; svg: string };
  interpretation: Interpretation;
}

export function interpretJob(system: unknown, catalog: JobCatalog | undefined): Interpretation {
  return interpret(system, catalog ? { catalog: catalog.data } : {});
}

export async function reportJob(system: unknown, catalog: JobCatalog | undefined, format: ReportFormat): Promise<ReportResult> {
  const parsed = parseSystem(system);
  const { interpretation, quantiles } = interpretSystemDetailed(parsed, catalog ? { catalog: catalog.data } : {});
  const sources = catalog?.sources ?? [];
  const writeUp = format === 'tex' ? writeUpLatex(interpretation, parsed, sources) : writeUpMarkdown(interpretation, parsed, sources);
  const vegaLite = figureSpec(interpretation, quantiles.geometricAlbedo);
  const svg = await figureSvg(interpretation, quantiles.geometricAlbedo);
  return {
    format,
    text: `${writeUp.paragraphs.join('\n\n')}\n`,
    paragraphs: writeUp.paragraphs,
    citedKeys: writeUp.citations.citedKeys(),
    bibtex: toBibtex(writeUp.citations.citedSources()),
    figure: { vegaLite, svg },
    interpretation,
  };
}
