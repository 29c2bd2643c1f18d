import { describe, expect, it } from 'vitest';
import { matchCatalog, matchEntry, type MatchContext } from '../../src/interpret/match.ts';
import { entry, GIANT, matchContext, temperatures, uniformGrid } from './helpers.ts';

const giant = GIANT;

/** A_g uniform on [0.2, 0.46]: derived 95 % interval 0.2065-0.4535, printed 0.21-0.45. */
function context(over: Partial<MatchContext> = {}): MatchContext {
  return matchContext([0.2, 0.46], over);
}

describe('matching catalog entries to the posterior', () => {
  it('excludes an entry darker than the 95 % interval, with a readable reason', () => {
    const m = matchEntry(entry({ id: 'dark', valueMin: 0.01, valueNominal: 0.03, valueMax: 0.05, bandMinNm: 600, bandMaxNm: 1000 }), context());
    expect(m.candidate.status).toBe('excluded');
    expect(m.candidate.reasons[0]).toBe('too dark: 0.01-0.05 lies below the 95 % interval 0.21-0.45');
    expect(m.candidate.probability).toBe(0);
  });

  it('marks a band that misses the measured band, with a readable reason', () => {
    const m = matchEntry(entry({ id: 'v-band', valueMin: 0.3, valueNominal: 0.33, valueMax: 0.36, bandMinNm: 507, bandMaxNm: 595 }), context());
    expect(m.candidate.status).toBe('marginal');
    expect(m.candidate.reasons).toContain('band: value is for Johnson V (507-595 nm), measurement is TESS 600-1000 nm');
  });

  it('excludes a condensate cloud that cannot form, with the temperature in the reason', () => {
    const hot = context({ feasibility: temperatures([2100, 2300], [1900, 2100]), quantiles: { ...context().quantiles, daysideTemperatureK: uniformGrid(2100, 2300), equilibriumTemperatureK: uniformGrid(1900, 2100) } });
    const m = matchEntry(entry({ id: 'mgsio3', condensate: 'MgSiO3', quantity: 'single-scattering', valueMin: 0.9, valueNominal: 0.93, valueMax: 0.95 }), hot);
    expect(m.candidate.status).toBe('excluded');
    expect(m.candidate.reasons.join('\n')).toMatch(/too hot: MgSiO3 does not condense above about 1600 K at 1 bar .* T_day here is 2200 \+- 68 K/);
  });

  it('is consistent when the interval meets the 68 % interval and all checks pass', () => {
    const m = matchEntry(entry({ id: 'fits', valueMin: 0.3, valueNominal: 0.33, valueMax: 0.36, bandMinNm: 600, bandMaxNm: 1000 }), context());
    expect(m.candidate.status).toBe('consistent');
    // derived: P(0.3 <= A_g <= 0.36) = 0.06 / 0.26 for A_g uniform on [0.2, 0.46]
    expect(m.candidate.probability).toBeCloseTo(0.06 / 0.26, 3);
    expect(m.candidate.geometricAlbedoRange).toEqual([0.3, 0.36]);
  });

  it('widens a point value to 0.01 for its probability', () => {
    // derived: 0.01 / 0.26 for A_g uniform on [0.2, 0.46]
    const m = matchEntry(entry({ id: 'point', valueMin: 0.3, valueNominal: 0.3, valueMax: 0.3, bandMinNm: 600, bandMaxNm: 1000 }), context());
    expect(m.candidate.probability).toBeCloseTo(0.01 / 0.26, 3);
  });

  it('excludes surfaces on a gas-rich planet', () => {
    const m = matchEntry(entry({ id: 'rock', category: 'rock', quantity: 'surface', valueMin: 0.45, valueNominal: 0.5, valueMax: 0.55, bandMinNm: 600, bandMaxNm: 1000 }), context());
    expect(m.candidate.status).toBe('excluded');
    expect(m.candidate.checks.surface).toBe('none-visible');
    const rocky = matchEntry(m.entry, context({ planetClass: { ...giant, planetClass: 'rocky', radiusRearth: 1.2 } }));
    expect(rocky.candidate.status).toBe('consistent');
  });

  it('ranks by status, then by the posterior probability inside the interval', () => {
    const list = matchCatalog([
      entry({ id: 'narrow', valueMin: 0.32, valueNominal: 0.33, valueMax: 0.34, bandMinNm: 600, bandMaxNm: 1000 }),
      entry({ id: 'excluded', valueMin: 0.01, valueNominal: 0.02, valueMax: 0.03, bandMinNm: 600, bandMaxNm: 1000 }),
      entry({ id: 'wide', valueMin: 0.25, valueNominal: 0.33, valueMax: 0.41, bandMinNm: 600, bandMaxNm: 1000 }),
      entry({ id: 'marginal-band', valueMin: 0.25, valueNominal: 0.33, valueMax: 0.41, bandMinNm: 400, bandMaxNm: 500 }),
    ], context());
    expect(list.map((m) => m.entry.id)).toEqual(['wide', 'narrow', 'marginal-band', 'excluded']);
  });
});
