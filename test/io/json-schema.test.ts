import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { systemJsonSchemaText } from '../../src/io/json-schema.ts';

describe('JSON Schema of the system file', () => {
  it('the committed schema equals the one generated from the zod schema (run `npm run schema`)', () => {
    const committed = readFileSync(new URL('../../src/io/system-file.schema.json', import.meta.url), 'utf8');
    expect(committed).toBe(systemJsonSchemaText());
  });

  it('describes the quantity forms and the measurement fields', () => {
    const schema = JSON.parse(systemJsonSchemaText());
    expect(Object.keys(schema.properties.measurements.properties)).toEqual(expect.arrayContaining([
      'eclipseDepthPpm', 'phaseAmplitudePpm', 'phaseSemiAmplitudePpm', 'nightsideFluxPpm', 'daysideTemperatureK',
      'phaseOffsetDeg', 'ellipsoidalAmplitudePpm', 'beamingAmplitudePpm',
    ]));
    expect(schema.required).toEqual(expect.arrayContaining(['name', 'band', 'star', 'planet', 'measurements']));
  });
});
