/**
 * zod schema of a comparison row in seeds/*.json (`comparisons: [...]`): a measured
 * geometric albedo of one named exoplanet or of a planet population, with the band it
 * was measured in and the equilibrium temperature it belongs to.
 */
import { z } from 'zod';
import { BUILTIN_BAND_DEFS } from '../physics/bands-builtin.ts';
import { sourceKeySchema } from './entry-schema.ts';
import { COMPARISON_KINDS, CURATED_PROVENANCES, ENTRY_ID_PATTERN } from './vocab.ts';

const BAND_IDS = BUILTIN_BAND_DEFS.map((b) => b.id);
const finite = z.number();
const nonNegative = finite.min(0, 'must be >= 0');
const positive = finite.positive('must be > 0');

export const comparisonSeedSchema = z
  .object({
    id: z.string().regex(ENTRY_ID_PATTERN, 'an id is a slug: lower-case letters, digits and inner hyphens, at most 80 characters'),
    name: z.string().trim().min(1).max(200),
    kind: z.enum(COMPARISON_KINDS),
    bandId: z
      .string()
      .refine((id) => BAND_IDS.includes(id), `a built-in band id (${BAND_IDS.join(', ')}), or null for another band`)
      .nullable(),
    bandMinNm: positive,
    bandMaxNm: positive,
    geometricAlbedoMin: nonNegative,
    geometricAlbedoNominal: nonNegative,
    geometricAlbedoMax: nonNegative,
    /** Nominal equilibrium temperature; null only for a population whose source states none. */
    equilibriumTemperatureK: positive.nullable(),
    equilibriumTemperatureMinK: positive.nullable().default(null),
    equilibriumTemperatureMaxK: positive.nullable().default(null),
    provenance: z.enum(CURATED_PROVENANCES),
    sources: z.array(sourceKeySchema).min(1, 'at least one source is required'),
    description: z.string().max(4000).default(''),
  })
  .strict()
  .superRefine((c, ctx) => {
    const say = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
    if (c.bandMinNm >= c.bandMaxNm) say('bandMaxNm', `bandMaxNm = ${c.bandMaxNm} must be greater than bandMinNm = ${c.bandMinNm}`);
    const band = BUILTIN_BAND_DEFS.find((b) => b.id === c.bandId);
    if (band && (c.bandMaxNm <= band.halfMaxNm[0] || c.bandMinNm >= band.halfMaxNm[1])) {
      say('bandMinNm', `${c.bandMinNm}-${c.bandMaxNm} nm does not overlap the ${band.id} band (${band.halfMaxNm[0]}-${band.halfMaxNm[1]} nm)`);
    }
    if (c.geometricAlbedoMin > c.geometricAlbedoMax) {
      say('geometricAlbedoMin', `geometricAlbedoMin = ${c.geometricAlbedoMin} must not exceed geometricAlbedoMax = ${c.geometricAlbedoMax}`);
    } else if (c.geometricAlbedoNominal < c.geometricAlbedoMin || c.geometricAlbedoNominal > c.geometricAlbedoMax) {
      say('geometricAlbedoNominal', `geometricAlbedoNominal = ${c.geometricAlbedoNominal} must lie in [${c.geometricAlbedoMin}, ${c.geometricAlbedoMax}]`);
    }
    const lo = c.equilibriumTemperatureMinK;
    const hi = c.equilibriumTemperatureMaxK;
    const t = c.equilibriumTemperatureK;
    if (c.kind === 'planet' && t === null) say('equilibriumTemperatureK', 'a planet needs its equilibrium temperature (only a population may have none)');
    if (t === null && (lo !== null || hi !== null)) say('equilibriumTemperatureK', 'a temperature range needs a nominal equilibrium temperature inside it');
    if (c.kind === 'planet' && (lo !== null || hi !== null)) {
      say(lo !== null ? 'equilibriumTemperatureMinK' : 'equilibriumTemperatureMaxK', 'a temperature range is for a population; a planet has one equilibrium temperature');
    }
    if (c.kind === 'population' && (lo === null) !== (hi === null)) {
      say(lo === null ? 'equilibriumTemperatureMinK' : 'equilibriumTemperatureMaxK', 'give both ends of the temperature range, or neither');
    }
    if (t !== null && lo !== null && lo > t) say('equilibriumTemperatureMinK', `equilibriumTemperatureMinK = ${lo} must not exceed equilibriumTemperatureK = ${t}`);
    if (t !== null && hi !== null && hi < t) say('equilibriumTemperatureMaxK', `equilibriumTemperatureMaxK = ${hi} must not be below equilibriumTemperatureK = ${t}`);
    const keys = new Set<string>();
    c.sources.forEach((k, i) => {
      if (keys.has(k)) ctx.addIssue({ code: 'custom', path: ['sources', i], message: `source ${k} is cited twice` });
      keys.add(k);
    });
  });

export type ComparisonSeedParsed = z.output<typeof comparisonSeedSchema>;
