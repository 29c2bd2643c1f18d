/**
 * The main job's figures: in-process interpretation at the
 * defaults (4000 draws x 256 grid nodes), whole-process `hesper interpret FILE --json`,
 * and the peak memory of that process.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { inferAlbedo } from '../src/inference/infer.ts';
import { loadSystemFile } from '../src/io/system-file.ts';
import { type Figure, medianMs } from './figure.ts';

const root = fileURLToPath(new URL('..', import.meta.url));
const SYSTEMS = ['demo-data/systems/aurelia-b.json', 'demo-data/systems/corvina-b.json', 'demo-data/systems/tessaly-b.json'];

function wholeProcessMs(file: string, repeats: number): { ms: number; maxRssMb: number } {
  const times: number[] = [];
  let maxRss = 0;
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now();
    // The child reports its own peak resident memory after the interpretation.
    const r = spawnSync(process.execPath, ['bin/hesper.mjs', 'interpret', file, '--json'], { cwd: root, encoding: 'utf8' });
    times.push(performance.now() - t0);
    if (r.status !== 0) throw new Error(`hesper interpret failed: ${r.stderr}`);
    const probe = spawnSync(process.execPath, ['--import', 'tsx', '-e',
      `const { loadSystemFile } = await import('./src/io/system-file.ts'); const { interpretSystem } = await import('./src/interpret/run.ts');
       interpretSystem(loadSystemFile(${JSON.stringify(file)})); process.stdout.write(String(process.resourceUsage().maxRSS));`,
    ], { cwd: root, encoding: 'utf8' });
    maxRss = Math.max(maxRss, Number(probe.stdout) / 1024);
  }
  times.sort((a, b) => a - b);
  return { ms: times[Math.floor(times.length / 2)]!, maxRssMb: maxRss };
}

export async function run(): Promise<Figure[]> {
  const out: Figure[] = [];
  for (const file of SYSTEMS) {
    const system = loadSystemFile(file, root);
    const ms = await medianMs(() => inferAlbedo(system), 15, 3);
    out.push({ name: `in-process interpret ${file.split('/').pop()} (4000 x 256)`, value: ms, unit: 'ms', target: 40 });
  }
  const whole = wholeProcessMs(SYSTEMS[1]!, 7);
  out.push({ name: 'whole process: hesper interpret corvina-b.json --json', value: whole.ms, unit: 'ms', target: 1000 });
  out.push({ name: 'peak resident memory of one interpretation process', value: whole.maxRssMb, unit: 'MB', target: 200 });
  return out;
}
