/** `hesper demo`: interprets the invented systems in demo-data/systems and prints the reports. */
import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import path from 'node:path';
import type { Command } from 'commander';
import { interpretSystem } from '../../interpret/run.ts';
import { loadSystemFile } from '../../io/system-file.ts';
import { textReport } from '../../report/text-report.ts';
import type { CliIo } from '../io.ts';

export const DEMO_SYSTEMS_DIR = fileURLToPath(new URL('../../../demo-data/systems/', import.meta.url));

export function demoSystemFiles(): string[] {
  return readdirSync(DEMO_SYSTEMS_DIR).filter((f) => f.endsWith('.json')).sort().map((f) => path.join(DEMO_SYSTEMS_DIR, f));
}

export function registerDemo(program: Command, io: CliIo): void {
  program
    .command('demo')
    .description('Interpret the invented demo systems (demo-data/systems) and print the reports')
    .action(() => {
      const files = demoSystemFiles();
      io.out(`hesper demo: ${files.length} invented systems from demo-data/systems (not real planets)\n`);
      for (const file of files) {
        const result = interpretSystem(loadSystemFile(file, io.cwd));
        io.out(`${'='.repeat(78)}\n${path.relative(io.cwd, file)}\n${textReport(result)}\n`);
      }
    });
}
