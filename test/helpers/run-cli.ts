/** Runs the CLI in-process with captured output. */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { main } from '../../src/cli/main.ts';
import type { CliIo } from '../../src/cli/io.ts';

export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
}

/** One catalog file per test process, so tests never touch the default db/hesper.sqlite. */
let defaultDb: string | undefined;
function testDatabase(): string {
  defaultDb ??= path.join(mkdtempSync(path.join(tmpdir(), 'hesper-cli-')), 'catalog.sqlite');
  return defaultDb;
}

export async function runCli(argv: string[], options: { cwd?: string; env?: Record<string, string | undefined> } = {}): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  const io: CliIo = {
    out: (t) => { stdout += t.endsWith('\n') ? t : `${t}\n`; },
    err: (t) => { stderr += t.endsWith('\n') ? t : `${t}\n`; },
    cwd: options.cwd ?? process.cwd(),
    env: options.env ?? { HESPER_DB: testDatabase() },
  };
  const code = await main(argv, io);
  return { code, stdout, stderr };
}
