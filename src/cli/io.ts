/** Where a command writes: injected so tests can run the CLI in-process. */
export interface CliIo {
  /** Results only (what a script reads). */
  out(text: string): void;
  /** Progress, warnings and error messages. */
  err(text: string): void;
  /** Working directory that relative paths on the command line resolve against. */
  cwd: string;
  /** Environment (HESPER_DB and friends). */
  env: Record<string, string | undefined>;
  /** The stream behind err, when there is one (a progress bar redraws in place on a terminal). */
  errStream?: NodeJS.WriteStream;
}

export function processIo(): CliIo {
  return {
    out: (t) => process.stdout.write(t.endsWith('\n') ? t : `${t}\n`),
    err: (t) => process.stderr.write(t.endsWith('\n') ? t : `${t}\n`),
    cwd: process.cwd(),
    env: process.env,
    errStream: process.stderr,
  };
}
