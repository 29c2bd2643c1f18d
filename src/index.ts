/**
 * hesper's library API: what the CLI, the HTTP API and the tests call. Each group is
 * one concern; the layers behind it are described in DEVELOPERS.md.
 */
import { parseSystem, type ParseOptions, type SystemInput } from './io/system.ts';
import { interpretSystem, type Interpretation, type InterpretOptions } from './interpret/run.ts';

/** Interpret a system file given as a JSON value: validate, convert units, infer the albedo posterior. */
export function interpret(json: unknown, options: InterpretOptions & { parse?: ParseOptions } = {}): Interpretation {
  const { parse, ...rest } = options;
  return interpretSystem(parseSystem(json, parse), rest);
}

/** System files: validation and canonical form. */
export { parseSystem, type ParseOptions, type SystemInput } from './io/system.ts';
export { loadSystemFile } from './io/system-file.ts';
export { systemFileSchema, type SystemFileInput } from './io/system-schema.ts';
export { systemJsonSchema } from './io/json-schema.ts';

/** The interpretation and its parts. */
export { interpretSystem, type Interpretation, type InterpretOptions } from './interpret/run.ts';
export { inferAlbedo, SENSITIVITY_CORNERS } from './inference/infer.ts';
export type { AlbedoPosterior, Diagnostics, MassEffects, SensitivityRow } from './inference/types.ts';
export type { Summary } from './inference/summary.ts';
export { createRng, type Rng } from './inference/random.ts';

/** Bands. */
export { describeBand, listBuiltinBands, resolveBand, type Band, type BandDescription, type BandSpec } from './physics/bandpass.ts';

/** Light curves. */
export { decompose, type DecomposeOptions, type Decomposition } from './lightcurve/decompose.ts';
export { parseCurveCsv } from './io/curve-csv.ts';

/** Reports. */
export { textReport } from './report/text-report.ts';

/** Errors: every code with its meaning and fix. */
export { ERROR_CODES, HesperError, type ErrorCode, type Issue } from './errors.ts';
