/** Runs the CLI in-process with captured output (STYLE.md habit 17). */
import { main } from '../../src/cli/main.ts';
import type { CliIo } from '../../src/cli/io.ts';

export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
}

export async function runCli(argv: string[], options: { cwd?: string; env?: Record<string, string | undefined> } = {}): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  const io: CliIo = {
    out: (t) => { stdout += t.endsWith('\n') ? t : `${t}\n`; },
    err: (t) => { stderr += t.endsWith('\n') ? t : `${t}\n`; },
    cwd: options.cwd ?? process.cwd(),
    env: options.env ?? {},
  };
  const code = await main(argv, io);
  return { code, stdout, stderr };
}
