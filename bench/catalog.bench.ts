/**
 * Catalog timings: first use of a new database file (create + migrate + seed)
 * in-process, opening an up-to-date file, and the whole `hesper catalog list --json`
 * process. Medians; printed by `npm run bench`, never asserted.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { openCatalog } from '../src/catalog/index.ts';
import { medianMs, type Figure } from './figure.ts';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

export async function run(): Promise<Figure[]> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'hesper-bench-catalog-'));
  try {
    let n = 0;
    const firstUse = await medianMs(() => {
      openCatalog({ path: path.join(dir, `fresh-${n++}.sqlite`) }).close();
    }, 9, 1);

    const ready = path.join(dir, 'ready.sqlite');
    openCatalog({ path: ready }).close();
    const reopen = await medianMs(() => openCatalog({ path: ready }).close(), 25, 3);

    const bin = path.join(root, 'bin', 'hesper.mjs');
    const listProcess = await medianMs(() => {
      execFileSync(process.execPath, [bin, 'catalog', 'list', '--json', '--db', ready], { cwd: os.tmpdir(), stdio: ['ignore', 'ignore', 'inherit'] });
    }, 7, 1);

    // The same command with only the catalog command registered: separates this
    // command's own start-up cost from the import cost of the other commands.
    const tsxLoader = pathToFileURL(path.join(root, 'node_modules', 'tsx', 'dist', 'loader.mjs')).href;
    const only = `const { Command } = await import('commander');
      const { registerCatalog } = await import(${JSON.stringify(pathToFileURL(path.join(root, 'src/cli/commands/catalog.ts')).href)});
      const { processIo } = await import(${JSON.stringify(pathToFileURL(path.join(root, 'src/cli/io.ts')).href)});
      const program = new Command('hesper').exitOverride();
      registerCatalog(program, processIo());
      await program.parseAsync(['catalog', 'list', '--json', '--db', ${JSON.stringify(ready)}], { from: 'user' });`;
    const listAlone = await medianMs(() => {
      // cwd = repository root so the inline module resolves 'commander'
      execFileSync(process.execPath, ['--import', tsxLoader, '--input-type=module', '-e', only], { cwd: root, stdio: ['ignore', 'ignore', 'inherit'] });
    }, 7, 1);

    return [
      { name: 'catalog first use: create + migrate + seed (median)', value: firstUse, unit: 'ms', target: 1000 },
      { name: 'catalog open, database up to date (median)', value: reopen, unit: 'ms' },
      { name: 'node bin/hesper.mjs catalog list --json, whole process (median)', value: listProcess, unit: 'ms', target: 500 },
      { name: 'same, only the catalog command registered (median)', value: listAlone, unit: 'ms' },
    ];
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
