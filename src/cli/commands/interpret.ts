/** `hesper interpret FILE`: the albedo posterior of one system file. */
import type { Command } from 'commander';
import { interpretSystem } from '../../interpret/run.ts';
import { loadSystemFile } from '../../io/system-file.ts';
import { textReport } from '../../report/text-report.ts';
import type { CliIo } from '../io.ts';
import { intOption } from '../options.ts';

interface InterpretOptions {
  json?: boolean;
  samples?: number;
  seed?: number;
}

export function registerInterpret(program: Command, io: CliIo): void {
  program
    .command('interpret')
    .description('Geometric and Bond albedo, dayside temperature and thermal share from a system file')
    .argument('<file>', 'system file (JSON); `hesper` validates it and names every bad field')
    .option('--json', 'print the contract JSON instead of the readable report')
    .option('--samples <n>', 'number of nuisance draws (default: the file, else 4000)', intOption('samples', 100, 100000))
    .option('--seed <s>', 'seed of the random generator (default: the file, else 1)', intOption('seed', 0, 2 ** 31 - 1))
    .action((file: string, opts: InterpretOptions) => {
      const system = loadSystemFile(file, io.cwd);
      const result = interpretSystem(system, {
        ...(opts.samples !== undefined ? { samples: opts.samples } : {}),
        ...(opts.seed !== undefined ? { seed: opts.seed } : {}),
      });
      io.out(opts.json ? JSON.stringify(result, null, 2) : textReport(result));
    });
}
