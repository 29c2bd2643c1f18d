import { Command } from 'commander';
import type { CliIo } from './io.ts';

type Register = (program: Command, io: CliIo) => void;

/**
 * One file per command; each exports a register function taking (program, io).
 * Add a command: create src/cli/commands/NAME.ts and add one line to COMMANDS.
 * Only the module of the command being run is loaded (all of them for `--help`), so
 * `hesper catalog list` does not pay for loading the inference, the API or the page.
 */
const COMMANDS: Record<string, () => Promise<Register>> = {
  bands: () => import('./commands/bands.ts').then((m) => m.registerBands),
  batch: () => import('./commands/batch.ts').then((m) => m.registerBatch),
  catalog: () => import('./commands/catalog.ts').then((m) => m.registerCatalog),
  decompose: () => import('./commands/decompose.ts').then((m) => m.registerDecompose),
  demo: () => import('./commands/demo.ts').then((m) => m.registerDemo),
  interpret: () => import('./commands/interpret.ts').then((m) => m.registerInterpret),
  serve: () => import('./commands/serve.ts').then((m) => m.registerServe),
};

/** The command named on the command line, if it is one of ours. */
function requestedCommand(argv: string[]): string | undefined {
  const first = argv.find((a) => !a.startsWith('-'));
  return first !== undefined && Object.hasOwn(COMMANDS, first) ? first : undefined;
}

export async function buildProgram(io: CliIo, argv: string[] = []): Promise<Command> {
  const program = new Command('hesper')
    .description('From a measured optical eclipse depth or phase amplitude to sourced albedo statements.')
    .version('0.1.0')
    .exitOverride()
    .showHelpAfterError()
    .configureOutput({ writeOut: (s) => io.out(s), writeErr: (s) => io.err(s) });
  const wanted = requestedCommand(argv);
  const names = wanted !== undefined ? [wanted] : Object.keys(COMMANDS);
  for (const name of names) (await COMMANDS[name]!())(program, io);
  return program;
}
