/**
 * `npm run bench`: performance figures, printed, never asserted (targets live here,
 * not in tests). Each bench/*.bench.ts module exports `run(): Promise<Figure[]>`.
 */
import os from 'node:os';
import { readdirSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import path from 'node:path';
import type { Figure } from './figure.ts';

const here = path.dirname(fileURLToPath(import.meta.url));
const only = process.argv.slice(2);
const modules = readdirSync(here)
  .filter((f) => f.endsWith('.bench.ts'))
  .filter((f) => only.length === 0 || only.some((o) => f.includes(o)))
  .sort();

const cpu = os.cpus()[0]?.model ?? 'unknown cpu';
console.log(`hesper bench on ${os.cpus().length} x ${cpu}, ${(os.totalmem() / 2 ** 30).toFixed(1)} GiB, Node ${process.version}, ${os.platform()} ${os.release()}`);
let misses = 0;
for (const file of modules) {
  const mod = (await import(pathToFileURL(path.join(here, file)).href)) as { run: () => Promise<Figure[]> };
  console.log(`\n== ${file.replace('.bench.ts', '')}`);
  for (const f of await mod.run()) {
    const meets = f.target === undefined ? '' : (f.lowerIsBetter ?? true) ? f.value <= f.target : f.value >= f.target;
    if (meets === false) misses++;
    const target = f.target === undefined ? '' : `  target ${(f.lowerIsBetter ?? true) ? '<=' : '>='} ${f.target} ${f.unit}  ${meets ? 'met' : 'MISSED'}`;
    console.log(`  ${f.name.padEnd(58)} ${f.value.toFixed(f.digits ?? 1).padStart(10)} ${f.unit}${target}`);
  }
}
console.log(`\n${misses === 0 ? 'all targets met' : `${misses} target(s) missed`}`);
