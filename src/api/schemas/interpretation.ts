/**
 * The interpretation JSON as a zod schema, for the
 * OpenAPI document and for tests that check every answer against it. `conformsToSchema`
 * makes the type checker confirm that the library's Interpretation type fits.
 */
import { z } from 'zod';
import type { Interpretation } from '../../index.ts';
import { apiRegistry, optionalSummarySchema, summarySchema } from './common.ts';
import { candidateSchema, phaseOffsetSchema, requiredAlbedoSchema, verdictSchema } from './matching.ts';

const sensitivityRowSchema = z.object({
  redistribution: z.number().describe('Heat-redistribution efficiency eps held fixed at this corner (an edge of its prior).'),
  phaseIntegral: z.number().describe('Phase integral q held fixed at this corner (an edge of its prior).'),
  geometricAlbedo: optionalSummarySchema,
  deltaChiSquare: z.number().nullable().describe('2 (ln L_best - ln L_corner) of the best fits; null when no draw fits at this corner.'),
  ruledOut: z.boolean().describe('The data rule this corner out (Delta chi^2 above 5.99, the 95 % point for two parameters).'),
});

const albedoSummarySchema = summarySchema.extend({
  constraint: z.enum(['measured', 'upper-limit', 'prior-dominated']).describe(
    'measured: bounded away from 0 at 95 % and the sensitivity corners agree within the 68 % width; upper-limit: consistent with 0 at 95 %; prior-dominated: the corners the data allow disagree by more than the 68 % width, so the value follows the assumed eps and q.',
  ),
});

const modelFitSchema = z.object({
  reproducesData: z.boolean().describe('False when the model cannot reproduce the measurements (see problems); the posteriors are then not meaningful.'),
  chiSquareMin: z.number().nullable().describe('-2 ln L of the best fit anywhere in the prior (chi-square for Gaussian errors); null for sample or uniform measurements.'),
  degreesOfFreedom: z.number().int(),
  pValue: z.number().nullable(),
  problems: z.array(z.string()),
});

const massEffectsSchema = z.object({
  ellipsoidalPpm: summarySchema,
  beamingPpm: summarySchema,
  rvSemiAmplitudeMs: summarySchema,
});

export const interpretationSchema = z.strictObject({
  name: z.string(),
  band: z.object({
    id: z.string(),
    label: z.string(),
    minNm: z.number(),
    maxNm: z.number(),
    approximate: z.boolean(),
    weighting: z.enum(['photon', 'energy']),
  }),
  geometricAlbedo: albedoSummarySchema.describe('Geometric albedo A_g in the measured band, thermal emission removed, with how the data constrain it.'),
  bondAlbedo: summarySchema.describe('Bond albedo A_B = q A_g.'),
  daysideTemperatureK: summarySchema,
  equilibriumTemperatureK: summarySchema,
  thermalDepthPpm: summarySchema.describe("The planet's thermal emission in the band at eclipse [ppm]."),
  reflectedDepthPpm: summarySchema.describe('Reflected light at eclipse [ppm].'),
  thermalFraction: summarySchema.describe('Thermal share of the eclipse signal.'),
  allReflectedGeometricAlbedo: summarySchema.describe('A_g if the whole signal were reflected light (an upper bound).'),
  detected: z.boolean().describe('The eclipse depth or phase amplitude is at least 3 sigma (the signal, not the albedo).'),
  reflectedLightDetected: z.boolean().describe('Reflected light is detected: geometricAlbedo.constraint is "measured" and the model reproduces the data.'),
  sensitivity: z.array(sensitivityRowSchema).describe('A_g at the corners of the (eps, q) priors.'),
  thermalMapSensitivity: z.object({
    used: z.enum(['uniform', 'local-equilibrium']),
    alternative: z.enum(['uniform', 'local-equilibrium']),
    geometricAlbedoUsed: optionalSummarySchema,
    geometricAlbedoAlternative: optionalSummarySchema,
    medianShift: z.number().nullable().describe('Median A_g under the alternative dayside map minus that under the map used.'),
  }).optional().describe('How much the dayside brightness map (uniform or local equilibrium) moves A_g; absent without thermal emission.'),
  modelFit: modelFitSchema.describe('Whether the model reproduces the data.'),
  nuisancePosterior: z.object({
    redistribution: z.object({ prior: summarySchema, posterior: summarySchema }),
    phaseIntegral: z.object({ prior: summarySchema, posterior: summarySchema }),
  }).describe('Prior and posterior of the heat redistribution eps and the phase integral q.'),
  phaseIntegralPreference: z.string().describe('Which phase integral the data prefer, if any, in words.'),
  massEffects: massEffectsSchema.optional().describe("The star's ellipsoidal and beaming signals and RV semi-amplitude, when masses are known."),
  assumptions: z.array(z.string()).describe('The assumptions that drove the result, in words.'),
  verdict: verdictSchema,
  candidates: z.array(candidateSchema).describe('Every catalog entry, ranked by the posterior probability inside its interval.'),
  requiredSingleScatteringAlbedo: requiredAlbedoSchema,
  phaseOffset: phaseOffsetSchema.optional().describe('Present when a phase offset was measured.'),
  diagnostics: z.object({
    effectiveSampleSize: z.number(),
    samples: z.number().int(),
    gridNodes: z.number().int(),
    seed: z.number().int(),
    computeMs: z.number(),
  }),
  warnings: z.array(z.string()),
});
apiRegistry.add(interpretationSchema, { id: 'Interpretation', description: 'The interpretation of one system.' });

/** Compile-time check: the library's result is an instance of the published schema. */
export function conformsToSchema(result: Interpretation): z.input<typeof interpretationSchema> {
  return result;
}
