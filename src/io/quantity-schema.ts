/**
 * The quantity forms of the system file: a number, value+sigma,
 * value+plus+minus, min+max (uniform), upperLimit+confidence (measurements only),
 * samplesFile+column (CLI only) or inline samples (API). Any may add "unit".
 * NaN and Infinity cannot pass: z.number() rejects them.
 */
import { z } from 'zod';

const unit = z.string().min(1).max(40).optional().describe('Unit of the numbers, e.g. "au", "Rjup", "K", "ppm" (mathjs syntax).');
const finite = z.number();

export const fixedForm = finite.describe('A fixed value, in the canonical unit of the field.');
export const fixedWithUnitForm = z.object({ value: finite, unit }).strict().describe('A fixed value with a unit.');
export const normalForm = z.object({ value: finite, sigma: finite, unit }).strict().describe('Gaussian: value +- sigma.');
export const splitNormalForm = z
  .object({ value: finite, plus: finite, minus: finite, unit })
  .strict()
  .describe('Asymmetric errors: value +plus -minus (split normal). Give minus as a positive number.');
export const uniformForm = z.object({ min: finite, max: finite, unit }).strict().describe('Uniform between min and max.');
export const upperLimitForm = z
  .object({ upperLimit: finite, confidence: z.number().gt(0).lt(1).default(0.95), unit })
  .strict()
  .describe('Upper limit at the given confidence (measurements only).');
export const samplesFileForm = z
  .object({ samplesFile: z.string().min(1).max(1024), column: z.union([z.string().min(1), z.number().int().nonnegative()]), unit })
  .strict()
  .describe('Posterior samples in a CSV file, relative to the system file (CLI only).');
export const samplesInlineForm = z
  .object({ samples: z.array(finite).min(20).max(200_000), unit })
  .strict()
  .describe('Posterior samples given inline (at least 20).');

const forms = 'a number, {value}, {value, sigma}, {value, plus, minus}, {min, max}, {samplesFile, column} or {samples}';

/** Nuisance parameters: everything but upper limits. */
export const parameterQuantity = z.union(
  [fixedForm, fixedWithUnitForm, normalForm, splitNormalForm, uniformForm, samplesFileForm, samplesInlineForm],
  { error: `must be ${forms}` },
);

/** Measurements: need an uncertainty, may be an upper limit. */
export const measurementQuantity = z.union(
  [normalForm, splitNormalForm, uniformForm, upperLimitForm, samplesFileForm, samplesInlineForm],
  { error: 'must be {value, sigma}, {value, plus, minus}, {min, max}, {upperLimit, confidence}, {samplesFile, column} or {samples}: a measurement needs an uncertainty' },
);

export type ParameterQuantityInput = z.input<typeof parameterQuantity>;
export type MeasurementQuantityInput = z.input<typeof measurementQuantity>;
export type QuantityInput = ParameterQuantityInput | MeasurementQuantityInput;
