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
  redistribution: z.number().describe('Heat-redistribution efficiency eps held fixed at this corner.'),
  phaseIntegral: z.number().describe('Phase integral q held fixed at this corner.'),
  geometricAlbedo: optionalSummarySchema,
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
  geometricAlbedo: summarySchema.describe('Geometric albedo A_g in the measured band, thermal emission removed.'),
  bondAlbedo: summarySchema.describe('Bond albedo A_B = q A_g.'),
  daysideTemperatureK: summarySchema,
  equilibriumTemperatureK: summarySchema,
  thermalDepthPpm: summarySchema.describe("The planet's thermal emission in the band at eclipse [ppm]."),
  reflectedDepthPpm: summarySchema.describe('Reflected light at eclipse [ppm].'),
  thermalFraction: summarySchema.describe('Thermal share of the eclipse signal.'),
  allReflectedGeometricAlbedo: summarySchema.describe('A_g if the whole signal were reflected light (an upper bound).'),
  detected: z.boolean().describe('The eclipse depth or phase amplitude is at least 3 sigma.'),
  sensitivity: z.array(sensitivityRowSchema).describe('A_g at the corners of the (eps, q) assumptions.'),
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
