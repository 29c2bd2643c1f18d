/**
 * The parts the interpretation adds to the albedo posterior: the
 * catalog candidates, the clouds-or-ice verdict, the single-scattering albedo a thick
 * cloud would need, and the reading of a measured phase offset.
 */
import { z } from 'zod';
import { apiRegistry } from './common.ts';

const status = z.enum(['consistent', 'marginal', 'untested', 'excluded']);

export const candidateSchema = z.object({
  id: z.string(),
  name: z.string(),
  category: z.string(),
  status: status.describe('consistent: albedo, temperature and band all fit; marginal: one test is borderline; untested: the entry has no temperature window or condensation curve, so it cannot be shown to exist at this temperature; excluded: a test fails.'),
  reasons: z.array(z.string()).describe('Why, in words.'),
  geometricAlbedoRange: z.tuple([z.number(), z.number()]).describe("The entry's value as a geometric-albedo interval in the measured band."),
  geometricAlbedoNominal: z.number(),
  probability: z.number().describe('Posterior probability of A_g inside the interval.'),
  quantity: z.string(),
  conversion: z.string().describe('How the value was converted to a geometric albedo.'),
  bandOverlapFraction: z.number(),
  checks: z.object({
    albedo: status,
    temperature: z.object({
      grade: z.enum(['ok', 'marginal', 'excluded', 'untested']),
      kind: z.enum(['window', 'condensation', 'none']),
      rangeK: z.tuple([z.number().nullable(), z.number().nullable()]),
    }),
    band: z.enum(['none', 'barely', 'good']),
    surface: z.enum(['ok', 'none-visible']),
  }),
  provenance: z.string(),
  sources: z.array(z.string()),
});
apiRegistry.add(candidateSchema, { id: 'Candidate', description: 'One catalog entry matched against the albedo posterior.' });

export const verdictSchema = z.object({
  cloudsOrIceRequired: z.enum(['yes', 'no', 'inconclusive']),
  probability: z.number().nullable().describe('P(A_g > cloud-free ceiling); null when there is no ceiling.'),
  reason: z.string(),
  ceiling: z
    .object({
      geometricAlbedo: z.number(),
      entryId: z.string(),
      entryName: z.string(),
      category: z.string(),
      categories: z.array(z.string()),
      entriesConsidered: z.number().int(),
      temperatureTested: z.boolean(),
    })
    .nullable()
    .describe('The cloud-free ceiling the verdict compares with.'),
  reference: z
    .object({
      id: z.string(),
      name: z.string(),
      regime: z.string().describe('The regime of the reference: planet class, temperature window and band.'),
      geometricAlbedoCeiling: z.number().describe('The largest geometric albedo of the reference in the measured band.'),
      sources: z.array(z.string()),
    })
    .nullable()
    .describe('The cloud-free reference used, chosen by planet class, temperature posterior and band.'),
  planetClass: z.object({
    planetClass: z.enum(['giant', 'rocky', 'either']),
    basis: z.enum(['assumption', 'radius']),
    radiusRearth: z.number().nullable(),
    text: z.string(),
  }),
});
apiRegistry.add(verdictSchema, { id: 'Verdict', description: 'Whether the albedo requires clouds or ice, with the probability and the reason.' });

const particleReachSchema = z.object({
  id: z.string(),
  name: z.string(),
  condensate: z.string().nullable(),
  singleScatteringAlbedoMin: z.number(),
  singleScatteringAlbedoMax: z.number(),
  withinRange: z.boolean(),
  status,
});

export const requiredAlbedoSchema = z.object({
  lower68: z.number(),
  median: z.number(),
  upper68: z.number(),
  aboveConservativeLimit: z.boolean(),
  conservativeGeometricAlbedo: z.number(),
  reachedBy: z.array(particleReachSchema),
  notReached: z.array(particleReachSchema),
  note: z.string(),
});
apiRegistry.add(requiredAlbedoSchema, { id: 'RequiredSingleScatteringAlbedo', description: 'The single-scattering albedo a semi-infinite isotropic cloud needs for the measured A_g.' });

export const phaseOffsetSchema = z.object({
  valueDeg: z.number(),
  sigmaDeg: z.number().nullable(),
  significanceSigma: z.number().nullable(),
  direction: z.enum(['east', 'west', 'none']),
  significant: z.boolean(),
  opticalBand: z.boolean(),
  interpretation: z.string(),
});
apiRegistry.add(phaseOffsetSchema, { id: 'PhaseOffsetReading', description: 'What a measured phase-curve offset points to.' });
