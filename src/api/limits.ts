/**
 * What one request may ask of the server. The body limit keeps memory bounded; the work
 * limit keeps one interpretation near a second, so a single request cannot hold a core
 * for minutes (the CLI has no such limit).
 */
import { HesperError } from '../errors.ts';
import type { SystemInput } from '../index.ts';

/** Largest request body: 1 MiB. */
export const MAX_BODY_BYTES = 1024 * 1024;

/** Default draws x grid nodes of a system file (4000 x 256, src/io/system-schema.ts). */
const DEFAULT_WORK = 4000 * 256;

/** Largest samples x gridNodes the API computes: 8 times the default. */
export const MAX_WORK = 8 * DEFAULT_WORK;

/** Refuses a system whose samples x gridNodes exceeds MAX_WORK, naming both fields. */
export function checkWork(system: SystemInput): void {
  const { samples, gridNodes } = system.assumptions;
  const work = samples * gridNodes;
  if (work <= MAX_WORK) return;
  const message = `samples x gridNodes = ${samples} x ${gridNodes} = ${work} exceeds the API limit of ${MAX_WORK}; lower them or run \`hesper interpret\``;
  throw new HesperError('out-of-range', message, [
    { path: 'assumptions.samples', message, value: samples, allowed: `samples x gridNodes <= ${MAX_WORK}` },
    { path: 'assumptions.gridNodes', message, value: gridNodes, allowed: `samples x gridNodes <= ${MAX_WORK}` },
  ]);
}
