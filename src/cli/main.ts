import { CommanderError } from 'commander';
import { HesperError } from '../errors.ts';
import { type CliIo, processIo } from './io.ts';
import { buildProgram } from './program.ts';

/** Exit codes: 0 success, 2 bad input, 1 anything else. */
export const EXIT_OK = 0;
export const EXIT_FAILURE = 1;
export const EXIT_BAD_INPUT = 2;

/** Prints a HesperError readably: one line per issue with its field path. */
export function formatError(e: HesperError): string {
  if (e.issues.length === 0) return `error [${e.code}]: ${e.message}`;
  const lines = [`error [${e.code}]: ${e.issues.length} problem${e.issues.length === 1 ? '' : 's'}`];
  for (const i of e.issues) {
    const allowed = i.allowed !== undefined ? ` (allowed: ${i.allowed})` : '';
    lines.push(`  ${i.path}: ${i.message}${allowed}`);
  }
  return lines.join('\n');
}

/** Runs the CLI on argv (without "node" and the script) and returns the exit code. */
export async function main(argv: string[], io: CliIo = processIo()): Promise<number> {
  const program = await buildProgram(io, argv);
  try {
    await program.parseAsync(argv, { from: 'user' });
    return EXIT_OK;
  } catch (e) {
    if (e instanceof CommanderError) {
      if (e.code === 'commander.helpDisplayed' || e.code === 'commander.version' || e.exitCode === 0) return EXIT_OK;
      // commander already wrote its message through io.err (configureOutput).
      return EXIT_BAD_INPUT;
    }
    if (e instanceof HesperError) {
      io.err(formatError(e));
      return e.kind === 'input' || e.kind === 'not-found' || e.kind === 'forbidden' || e.kind === 'conflict'
        ? EXIT_BAD_INPUT
        : EXIT_FAILURE;
    }
    io.err(`error [internal]: ${e instanceof Error ? e.message : String(e)}`);
    return EXIT_FAILURE;
  }
}
