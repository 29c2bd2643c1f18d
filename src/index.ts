/**
 * hesper's library API: what the CLI, the HTTP API and the tests call. Each group is
 * one concern; the layers behind it are described in DEVELOPERS.md.
 */
import { parseSystem, type ParseOptions } from './io/system.ts';
import { interpretSystem, type Interpretation, type InterpretOptions } from './interpret/run.ts';

/**
 * Interpret a system file given as a JSON value: validate, convert units, infer the
 * albedo posterior and, when `catalog` data are given, match them (verdict, candidates).
 */
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
export {
  interpretPosterior, interpretSystem, interpretSystemDetailed, type DetailedInterpretation, type Interpretation, type InterpretOptions,
} from './interpret/run.ts';
export type { CatalogData, Candidate } from './interpret/types.ts';
export { inferAlbedo } from './inference/infer.ts';
export { sensitivityCorners } from './inference/corners.ts';
export type { AlbedoPosterior, AlbedoSummary, Diagnostics, MassEffects, ModelFit, SensitivityRow } from './inference/types.ts';
export type { AlbedoConstraint } from './inference/constraint.ts';
export type { Summary } from './inference/summary.ts';
export { createRng, type Rng } from './inference/random.ts';

/** The reference catalog (SQLite). */
export { openCatalog, openCatalogReader, type Catalog, type CatalogEntry, type SourceRecord } from './catalog/index.ts';

/** Physics most users reach for. */
export { describeBand, listBuiltinBands, resolveBand, type Band, type BandDescription, type BandSpec } from './physics/bandpass.ts';
export { isotropicGeometricAlbedo, singleScatteringAlbedoFor, solveHFunction } from './physics/h-function.ts';
export { condensationTemperatureK, condensationSpecies } from './physics/condensation.ts';

/** Light curves. */
export { decompose, type DecomposeOptions, type Decomposition } from './lightcurve/decompose.ts';
export { parseCurveCsv } from './io/curve-csv.ts';
export {
  joinCurves, parseLightCurveBytes, readLightCurveFile, readLightCurveFiles, type CurveColumnOptions, type CurveFileSummary, type ReadCurves,
} from './io/curve-files.ts';
export { DEFAULT_GAP_DAYS, DEFAULT_TREND_ORDER } from './lightcurve/segments.ts';

/** Reports: terminal text, paragraphs for papers, BibTeX, figures. */
export { textReport } from './report/text-report.ts';
export { paragraphMarkdown, writeUpMarkdown } from './report/paragraph-md.ts';
export { paragraphLatex, writeUpLatex } from './report/paragraph-tex.ts';
export { toBibtex } from './report/bibtex.ts';
export { figureSpec, figureSvg } from './report/figure.ts';

/** Errors: every code with its meaning and fix. */
export { ERROR_CODES, HesperError, type ErrorCode, type Issue } from './errors.ts';
