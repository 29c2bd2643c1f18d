/**
 * `hesper demo`: interprets the invented systems in demo-data/systems against the
 * catalog and prints each report, ending with the verdict, the candidates and the
 * composition paragraph.
 */
import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import path from 'node:path';
import type { Command } from 'commander';
import { interpretSystemDetailed } from '../../interpret/run.ts';
import { loadSystemFile } from '../../io/system-file.ts';
import { textReport } from '../../report/text-report.ts';
import type { CliIo } from '../io.ts';
import { loadCatalog, writeUp } from './interpret.ts';

export const DEMO_SYSTEMS_DIR = fileURLToPath(new URL('../../../demo-data/systems/', import.meta.url));

export function demoSystemFiles(): string[] {
  return readdirSync(DEMO_SYSTEMS_DIR).filter((f) => f.endsWith('.json')).sort().map((f) => path.join(DEMO_SYSTEMS_DIR, f));
}

interface DemoOptions {
  db?: string;
}

export function registerDemo(program: Command, io: CliIo): void {
  program
    .command('demo')
    .description('interpret the invented demo systems (demo-data/systems) and print the reports')
    .option('--db <path>', 'catalog database file (default: $HESPER_DB, else db/hesper.sqlite in the hesper folder)')
    .action(async (opts: DemoOptions) => {
      const files = demoSystemFiles();
      const catalog = await loadCatalog(io, opts.db);
      io.out(`hesper demo: ${files.length} invented systems from demo-data/systems (not real planets), ${catalog.data.entries.length} catalog entries\n`);
      for (const file of files) {
        const system = loadSystemFile(file, io.cwd);
        const d = interpretSystemDetailed(system, { catalog: catalog.data });
        const paragraph = writeUp(d, system, catalog.sources, 'md').text;
        io.out(`${'='.repeat(78)}\n${path.relative(io.cwd, file)}\n${textReport(d.interpretation, { paragraph })}\n`);
      }
    });
}
