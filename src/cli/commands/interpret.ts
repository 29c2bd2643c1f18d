/**
 * `hesper interpret FILE`: the albedo posterior of one system file matched to the
 * catalog, with the clouds-or-ice verdict, the candidates and the composition
 * paragraph. `--json` prints the interpretation as JSON, `--report md|tex` the paragraphs
 * alone; `--bib` and `--figure` write the BibTeX of every cited source and the SVG
 * figure. The catalog opens from --db, else HESPER_DB, else the default file.
 */
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { type Command, Option } from 'commander';
import type { SourceRecord } from '../../catalog/index.ts';
import { openCatalogReader } from '../../catalog/reader.ts';
import { inputError } from '../../errors.ts';
import { interpretSystemDetailed, type DetailedInterpretation } from '../../interpret/run.ts';
import type { CatalogData } from '../../interpret/types.ts';
import type { SystemInput } from '../../io/system.ts';
import { loadSystemFile } from '../../io/system-file.ts';
import { toBibtex } from '../../report/bibtex.ts';
import { figureSvg } from '../../report/figure.ts';
import { writeUpMarkdown } from '../../report/paragraph-md.ts';
import { paragraphLatex, writeUpLatex } from '../../report/paragraph-tex.ts';
import { textReport } from '../../report/text-report.ts';
import { addCurveOptions, type CurveOptions, systemFromCurve } from '../curve-route.ts';
import type { CliIo } from '../io.ts';
import { intOption } from '../options.ts';

export const REPORT_FORMATS = ['md', 'tex'] as const;
export type ReportFormat = (typeof REPORT_FORMATS)[number];

interface InterpretCliOptions extends CurveOptions {
  json?: boolean;
  report?: ReportFormat;
  bib?: string;
  figure?: string;
  db?: string;
  samples?: number;
  seed?: number;
}

/** What the write-up needs from the catalog besides the matching data. */
export interface LoadedCatalog {
  data: CatalogData;
  sources: SourceRecord[];
}

/** Reads entries, condensation curves and sources once, then closes the database. */
export async function loadCatalog(io: CliIo, db: string | undefined): Promise<LoadedCatalog> {
  const reader = await openCatalogReader({ path: db, env: io.env, cwd: io.cwd });
  try {
    return { data: { entries: reader.listEntries(), condensates: reader.listCondensates() }, sources: reader.listSources() };
  } finally {
    reader.close();
  }
}

/** Writes an output file named on the command line (relative to the working directory). */
export function writeOutput(io: CliIo, file: string, option: string, text: string, input?: string): string {
  const target = path.resolve(io.cwd, file);
  if (input !== undefined && target === path.resolve(io.cwd, input)) {
    throw inputError('file-unwritable', option, `${option} ${file}: is the input file; give another output file`, file);
  }
  try {
    writeFileSync(target, text);
  } catch (e) {
    throw inputError('file-unwritable', option, `cannot write "${file}": ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`, file);
  }
  return target;
}

/** The paragraphs in a format and the sources they cite. */
export function writeUp(d: DetailedInterpretation, system: SystemInput, sources: readonly SourceRecord[], format: ReportFormat) {
  const w = format === 'tex' ? writeUpLatex(d.interpretation, system, sources) : writeUpMarkdown(d.interpretation, system, sources);
  const text = format === 'tex' ? paragraphLatex(d.interpretation, system, sources) : `${w.paragraphs.join('\n\n')}\n`;
  return { text, cited: w.citations.citedSources() };
}

/** --bib and --figure: the files that go with the paragraph. */
export async function writeCompanions(io: CliIo, d: DetailedInterpretation, cited: SourceRecord[], opts: { bib?: string; figure?: string }, input: string): Promise<void> {
  if (opts.bib) {
    writeOutput(io, opts.bib, '--bib', toBibtex(cited), input);
    io.err(`wrote ${cited.length} BibTeX entr${cited.length === 1 ? 'y' : 'ies'} to ${opts.bib}`);
  }
  if (opts.figure) {
    writeOutput(io, opts.figure, '--figure', await figureSvg(d.interpretation, d.quantiles.geometricAlbedo), input);
    io.err(`wrote the figure to ${opts.figure}`);
  }
}

export function registerInterpret(program: Command, io: CliIo): void {
  const cmd = program
    .command('interpret')
    .description('geometric and Bond albedo, thermal share, catalog candidates and the clouds-or-ice verdict from a system file')
    .argument('<file>', 'system file (JSON); `hesper` validates it and names every bad field')
    .option('--json', 'print the interpretation as JSON instead of the readable report')
    .addOption(new Option('--report <format>', 'print the composition paragraphs alone, as Markdown or LaTeX').choices([...REPORT_FORMATS]))
    .option('--bib <file>', 'write the BibTeX of every source the paragraphs cite to FILE')
    .option('--figure <file.svg>', 'write the A_g posterior with the candidates\' intervals as an SVG figure')
    .option('--db <path>', 'catalog database file (default: $HESPER_DB, else db/hesper.sqlite in the hesper folder)')
    .option('--samples <n>', 'number of nuisance draws (default: the file, else 4000)', intOption('samples', 100, 100000))
    .option('--seed <s>', 'seed of the random generator (default: the file, else 1)', intOption('seed', 0, 2 ** 31 - 1));
  addCurveOptions(cmd).action(async (file: string, opts: InterpretCliOptions) => {
    if (opts.json && opts.report) throw inputError('invalid-input', '--report', 'give --json or --report, not both: both print to stdout');
    const system = systemFromCurve(loadSystemFile(file, io.cwd), opts, io);
    const catalog = await loadCatalog(io, opts.db);
    const d = interpretSystemDetailed(system, {
      catalog: catalog.data,
      ...(opts.samples !== undefined ? { samples: opts.samples } : {}),
      ...(opts.seed !== undefined ? { seed: opts.seed } : {}),
    });
    const report = writeUp(d, system, catalog.sources, opts.report ?? 'md');
    await writeCompanions(io, d, report.cited, opts, file);
    if (opts.json) io.out(JSON.stringify(d.interpretation, null, 2));
    else if (opts.report) io.out(report.text);
    else io.out(textReport(d.interpretation, { paragraph: report.text }));
  });
}
