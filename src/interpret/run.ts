/**
 * The main job as one call: a parsed system in, the interpretation out. The CLI, the
 * API, batch runs and the tests all come through here (DESIGN section 2).
 */
import type { SystemInput } from '../io/system.ts';
import { type InferOptions, inferAlbedo } from '../inference/infer.ts';
import type { AlbedoPosterior } from '../inference/types.ts';

export type Interpretation = AlbedoPosterior;

export interface InterpretOptions extends InferOptions {}

export function interpretSystem(system: SystemInput, options: InterpretOptions = {}): Interpretation {
  return inferAlbedo(system, options);
}
