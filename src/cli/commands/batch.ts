/**
 * `hesper batch FILE.csv --out RESULTS.csv [--workers N] [--db PATH]`: one planet per
 * row, interpreted on worker threads across the cores, a progress bar on stderr, and a
 * results row per input row. A row that fails gets its problems in the `error` column
 * and the batch goes on; a malformed header stops it before any row runs (exit 2).
 */
import { renameSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { Command } from 'commander';
import { batchColumnsHelp } from '../../batch/columns.ts';
import { defaultWorkerCount } from '../../batch/pool.ts';
import { inputError } from '../../errors.ts';
import { readInputText } from '../../io/files.ts';
import type { CliIo } from '../io.ts';
import { intOption } from '../options.ts';
import { startProgress } from '../progress.ts';

interface BatchOptions {
  out: string;
  workers?: number;
  db?: string;
  samples?: number;
}

/** Writes next to the target, then renames, so a crash never leaves half a results file. */
function writeAtomically(file: string, text: string): void {
  const tmp = `${file}.${process.pid}.tmp`;
  try {
    writeFileSync(tmp, text, 'utf8');
    renameSync(tmp, file);
  } catch (e) {
    rmSync(tmp, { force: true });
    throw inputError('file-unwritable', '--out', `cannot write ${file}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`, file);
  }
}

const RESULTS_HELP = `
Results CSV: line, name, band, status (ok|error), then for each of geometricAlbedo,
bondAlbedo, daysideTemperatureK, equilibriumTemperatureK, thermalDepthPpm,
reflectedDepthPpm, thermalFraction and allReflectedGeometricAlbedo the columns
_median, _lower68, _upper68, _lower95, _upper95, _upperLimit95; then detected,
clouds_or_ice_required, verdict_probability, consistent_candidates (best three ids),
effective_sample_size, samples, seed, warnings and error (each problem led by its column).
Example (invented numbers):
  name,band,teffK,teffK_err,radiusRatio,radiusRatio_err,scaledSemiMajorAxis,scaledSemiMajorAxis_err,eclipseDepthPpm,eclipseDepthPpm_err
  Example b,tess,5600,80,0.102,0.001,5.1,0.1,60,9
`;

export function registerBatch(program: Command, io: CliIo): void {
  program
    .command('batch')
    .description('interpret one planet per CSV row on worker threads; writes one results row per input row')
    .argument('<file>', 'input CSV (columns below)')
    .requiredOption('--out <file>', 'results CSV to write (replaced if it exists)')
    .option('--workers <n>', `worker threads (default: the cores, here ${defaultWorkerCount()})`, intOption('workers', 1, 64))
    .option('--samples <n>', 'draws per planet for rows without a samples cell (default 4000)', intOption('samples', 100, 100000))
    .option('--db <path>', 'catalog database file (default: $HESPER_DB, else db/hesper.sqlite in the hesper folder)')
    .addHelpText('after', `\n${batchColumnsHelp()}\n${RESULTS_HELP}`)
    .action(async (file: string, opts: BatchOptions) => {
      const [{ readBatchCsv }, { runBatch }, { resultsCsv }, { openCatalogReader }] = await Promise.all([
        import('../../batch/rows.ts'), import('../../batch/run-batch.ts'), import('../../batch/results.ts'), import('../../catalog/reader.ts'),
      ]);
      const input = path.resolve(io.cwd, file);
      const out = path.resolve(io.cwd, opts.out);
      if (input === out) throw inputError('file-unwritable', '--out', `--out ${opts.out} is the input file; give another file`, opts.out);
      const { rows } = readBatchCsv(readInputText('FILE', io.cwd, file));
      if (opts.samples !== undefined) {
        for (const r of rows) if (r.system) r.system.assumptions = { samples: opts.samples, ...(r.system.assumptions as object | undefined) };
      }
      const reader = await openCatalogReader({ path: opts.db, env: io.env, cwd: io.cwd });
      let catalog;
      try {
        catalog = { version: 'batch', data: { entries: reader.listEntries(), condensates: reader.listCondensates() }, sources: [] };
      } finally {
        reader.close();
      }
      const workers = Math.min(opts.workers ?? defaultWorkerCount(), rows.length);
      const t0 = performance.now();
      const progress = startProgress(io, rows.length, 'hesper batch');
      let outcomes;
      try {
        outcomes = await runBatch(rows, { workers, catalog, onProgress: (done) => progress.update(done) });
      } finally {
        progress.stop();
      }
      writeAtomically(out, resultsCsv(outcomes));
      const failed = outcomes.filter((o) => !o.ok).length;
      const seconds = ((performance.now() - t0) / 1000).toFixed(1);
      io.err(`hesper batch: ${rows.length} rows, ${rows.length - failed} ok, ${failed} failed${failed > 0 ? ' (see the error column)' : ''}, ${seconds} s on ${workers} worker${workers === 1 ? '' : 's'}; wrote ${path.relative(io.cwd, out) || out}`);
    });
}
