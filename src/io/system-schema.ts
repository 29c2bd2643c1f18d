/**
 * zod schema of the system file. The JSON Schema shipped for
 * editors (src/io/system-file.schema.json) is generated from this schema.
 */
import { z } from 'zod';
import { measurementQuantity, parameterQuantity } from './quantity-schema.ts';
import { DEFAULT_PHASE_INTEGRAL } from './system-fields.ts';

const opt = <T extends z.ZodType>(s: T, d: string) => s.optional().describe(d);

export const bandSchema = z.union(
  [
    z.string().min(1).max(64).describe('A built-in band name; `hesper bands` lists them.'),
    z.object({ tophatNm: z.tuple([z.number(), z.number()]) }).strict().describe('A top-hat band [min, max] in nm.'),
    z.object({ responseFile: z.string().min(1).max(1024) }).strict().describe('A CSV response curve (wavelength_nm,weight or wavelength_um,weight), relative to the system file (CLI only).'),
    z
      .object({ response: z.array(z.tuple([z.number(), z.number()])).min(2).max(20_000), unit: z.enum(['nm', 'um']).default('nm') })
      .strict()
      .describe('An inline response curve: [[wavelength, weight], ...].'),
  ],
  { error: 'must be a band name, {tophatNm: [min, max]}, {responseFile} or {response: [[nm, weight], ...]}' },
);

export const starSpectrumSchema = z.union(
  [
    z.object({ file: z.string().min(1).max(1024) }).strict()
      .describe('A CSV stellar spectrum (wavelength_nm,flux or wavelength_um,flux; any flux-density unit, only the shape matters), relative to the system file (CLI only).'),
    z.object({ table: z.array(z.tuple([z.number(), z.number()])).min(1).max(200_000), unit: z.enum(['nm', 'um']).default('nm') }).strict()
      .describe('An inline stellar spectrum: [[wavelength, flux], ...] (any flux-density unit).'),
  ],
  { error: 'must be {file: "spectrum.csv"} or {table: [[nm, flux], ...]}' },
);

export const starSchema = z
  .object({
    teffK: parameterQuantity.describe('Stellar effective temperature [K].'),
    radiusRsun: opt(parameterQuantity, 'Stellar radius [Rsun]; needed with radiusRjup/radiusRearth or semiMajorAxisAu.'),
    massMsun: opt(parameterQuantity, 'Stellar mass [Msun]; needed with periodDays and for mass effects.'),
    metallicity: z.number().min(-2).max(2).default(0).describe('[M/H] in dex, for condensation curves.'),
    spectrum: starSpectrumSchema.optional()
      .describe("The star's spectrum in place of a blackbody in the band integrals (the thermal depth's star flux and the beaming factor)."),
  })
  .strict();

export const planetSchema = z
  .object({
    radiusRatio: opt(parameterQuantity, 'Rp/R*.'),
    radiusRjup: opt(parameterQuantity, 'Planet radius [Rjup], with star.radiusRsun.'),
    radiusRearth: opt(parameterQuantity, 'Planet radius [Rearth], with star.radiusRsun.'),
    scaledSemiMajorAxis: opt(parameterQuantity, 'a/R*.'),
    semiMajorAxisAu: opt(parameterQuantity, 'Semi-major axis [au], with star.radiusRsun.'),
    periodDays: opt(parameterQuantity, 'Orbital period [days].'),
    inclinationDeg: opt(parameterQuantity, 'Orbital inclination [deg]; 90 if not given.'),
    massMjup: opt(parameterQuantity, 'Planet mass [Mjup] (true mass, or M sin i if inclination is unknown).'),
    massMearth: opt(parameterQuantity, 'Planet mass [Mearth].'),
    transitEpochBjd: z.number().min(0).max(1e7).optional()
      .describe('Mid-transit time [days, BJD or the time system of your light curves]; used with a light curve.'),
  })
  .strict();

export const measurementsSchema = z
  .object({
    eclipseDepthPpm: opt(measurementQuantity, 'Secondary-eclipse depth [ppm] in the band.'),
    phaseAmplitudePpm: opt(measurementQuantity, "Peak-to-trough amplitude of the planet's phase variation [ppm]."),
    phaseSemiAmplitudePpm: opt(measurementQuantity, 'Semi-amplitude of the phase variation [ppm]; doubled on reading.'),
    nightsideFluxPpm: opt(measurementQuantity, 'Planet flux at transit phase (nightside) [ppm].'),
    daysideTemperatureK: opt(measurementQuantity, 'Dayside brightness temperature measured in another band [K].'),
    phaseOffsetDeg: opt(measurementQuantity, 'Phase-curve peak offset [deg]; positive = eastward, peak before eclipse.'),
    ellipsoidalAmplitudePpm: opt(measurementQuantity, 'Ellipsoidal semi-amplitude [ppm].'),
    beamingAmplitudePpm: opt(measurementQuantity, 'Doppler-beaming semi-amplitude [ppm].'),
    depthAmplitudeCorrelation: z.number().gt(-1).lt(1).optional()
      .describe('Correlation coefficient of eclipseDepthPpm and phaseAmplitudePpm when both come from one fit (both {value, sigma}).'),
  })
  .strict();

export const assumptionsSchema = z
  .object({
    thermal: z.enum(['self-consistent', 'local-equilibrium', 'none']).default('self-consistent')
      .describe('Thermal emission: self-consistent (default; uniform dayside at the Cowan & Agol 2011 temperature), local-equilibrium (dayside T proportional to cos^(1/4) of the angle from the substellar point at eps = 0, blending to uniform as eps rises), or none (pure reflection).'),
    weighting: z.enum(['photon', 'energy']).default('photon').describe('Band integrals per photon (default) or per energy.'),
    redistribution: parameterQuantity.default({ min: 0, max: 1 }).describe('Heat-redistribution efficiency eps in [0, 1].'),
    phaseIntegral: parameterQuantity.default({ ...DEFAULT_PHASE_INTEGRAL })
      .describe(`Phase integral q; A_B = q A_g. Default uniform on [${DEFAULT_PHASE_INTEGRAL.min}, ${DEFAULT_PHASE_INTEGRAL.max}]: from below conservative Rayleigh scattering (1.25) past the Lambert sphere (1.5) to semi-infinite isotropic scatterers with single-scattering albedo 0.5 (1.61).`),
    limbDarkening: parameterQuantity.optional().describe("Linear limb-darkening coefficient u of the star in the band; default: from the stellar Teff in the band (gray Eddington atmosphere), with the ellipsoidal prediction's model uncertainty."),
    gravityDarkening: parameterQuantity.optional().describe("Gravity-darkening coefficient g of the star in the band; default: from the stellar Teff in the band (von Zeipel 1924 for radiative, Lucy 1967 for convective envelopes)."),
    planetClass: z.enum(['auto', 'giant', 'rocky']).default('auto').describe('Planet class for the cloud-free ceiling; auto decides from the radius.'),
    userEntryTemperature: z.enum(['window', 'condensation']).default('window')
      .describe("For your own catalog entries that give both a temperature window and a condensing species: test the planet's temperature against the entry's window (default) or against the species' condensation curve."),
    samples: z.number().int().min(100).max(100_000).default(4000).describe('Number of nuisance draws.'),
    gridNodes: z.number().int().min(16).max(4096).default(256).describe('Geometric-albedo grid nodes per draw.'),
    seed: z.number().int().min(0).max(2 ** 31 - 1).default(1).describe('Seed of the random generator.'),
  })
  .strict();

export const systemFileSchema = z
  .object({
    $schema: z.string().optional().describe('Path or URL of this JSON Schema, for editors.'),
    name: z.string().min(1).max(200).describe('Name of the planet.'),
    note: z.string().max(2000).optional().describe('Free text kept with the file (e.g. where the numbers come from).'),
    band: bandSchema,
    star: starSchema,
    planet: planetSchema,
    measurements: measurementsSchema,
    assumptions: assumptionsSchema.default(assumptionsSchema.parse({})),
  })
  .strict();

export type SystemFileInput = z.input<typeof systemFileSchema>;
export type SystemFile = z.output<typeof systemFileSchema>;
