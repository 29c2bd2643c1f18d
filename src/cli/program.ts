import { Command } from 'commander';
import type { CliIo } from './io.ts';
// One file per command; each exports a register function taking (program, io).
// Add a command: create src/cli/commands/NAME.ts and add its two lines here.
// [command imports]
import { registerBands } from './commands/bands.ts';
import { registerDecompose } from './commands/decompose.ts';
import { registerDemo } from './commands/demo.ts';
import { registerInterpret } from './commands/interpret.ts';

export function buildProgram(io: CliIo): Command {
  const program = new Command('hesper')
    .description('From a measured optical eclipse depth or phase amplitude to sourced albedo statements.')
    .version('0.1.0')
    .exitOverride()
    .showHelpAfterError()
    .configureOutput({ writeOut: (s) => io.out(s), writeErr: (s) => io.err(s) });
  // [command registrations]
  registerBands(program, io);
  registerDecompose(program, io);
  registerDemo(program, io);
  registerInterpret(program, io);
  return program;
}
