import { describe, expect, it } from 'vitest';
import { interpretSystem } from '../../src/interpret/run.ts';
import { matchCatalog, type MatchContext } from '../../src/interpret/match.ts';
import { planetClassOf } from '../../src/interpret/planet-class.ts';
import { decideVerdict } from '../../src/interpret/verdict.ts';
import { demoJson, loadDemo, parseJson } from '../inference/helpers.ts';
import { entry, GIANT, matchContext, seededCatalog } from './helpers.ts';

const giant = GIANT;

function ctx(ag: [number, number]): MatchContext {
  return matchContext(ag);
}

/**
 * Invented cloud-free references by regime (test data only): a giant at 900-2000 K with
 * A_g up to 0.2 in a broad band, a cold one (below 300 K) at 0.6, an idealised law with
 * no temperature range at 0.8, and a 1400-1600 K TESS-band one at 0.12.
 */
const references = [
  entry({ id: 'clear-tested', category: 'clear-atmosphere', valueMin: 0.05, valueNominal: 0.1, valueMax: 0.2, temperatureMinK: 900, temperatureMaxK: 2000, bandMinNm: 200, bandMaxNm: 5000 }),
  entry({ id: 'clear-cold', category: 'clear-atmosphere', valueMin: 0.5, valueNominal: 0.55, valueMax: 0.6, temperatureMinK: null, temperatureMaxK: 300, bandMinNm: 200, bandMaxNm: 5000 }),
  entry({ id: 'clear-ideal', category: 'clear-atmosphere', valueMin: 0.8, valueNominal: 0.8, valueMax: 0.8, temperatureMinK: null, temperatureMaxK: null, bandMinNm: 200, bandMaxNm: 5000 }),
];

function verdictFor(ag: [number, number], list = references, over: Partial<MatchContext> = {}, context = {}) {
  const c = matchContext(ag, over);
  return decideVerdict(matchCatalog(list, c), c.quantiles.geometricAlbedo, giant, context);
}

describe('the clouds-or-ice verdict rule', () => {
  it('uses the reference of the planet\'s regime and names it', () => {
    const v = verdictFor([0.3, 0.5]);
    expect(v.ceiling).toMatchObject({ entryId: 'clear-tested', geometricAlbedo: 0.2, temperatureTested: true });
    expect(v.reference).toEqual({
      id: 'clear-tested', name: 'Invented entry clear-tested', regime: 'giant, clear atmosphere, 900-2000 K, 200-5000 nm', geometricAlbedoCeiling: 0.2, sources: [],
    });
    expect(v.reason).toMatch(/1 cloud-free entry without a temperature range were not used/);
  });

  it('says yes when P(A_g > ceiling) >= 0.95, no when <= 0.05, else inconclusive', () => {
    // derived for A_g uniform: P(A_g > 0.2) = 1 on [0.3, 0.5]; 0 on [0.05, 0.19]; 0.5 on [0.1, 0.3].
    expect(verdictFor([0.3, 0.5])).toMatchObject({ cloudsOrIceRequired: 'yes', probability: 1 });
    expect(verdictFor([0.05, 0.19])).toMatchObject({ cloudsOrIceRequired: 'no', probability: 0 });
    const mid = verdictFor([0.1, 0.3]);
    expect(mid.cloudsOrIceRequired).toBe('inconclusive');
    expect(mid.probability).toBeCloseTo(0.5, 3);
    // derived: P(A_g > 0.2) = 0.96 for A_g uniform on [0.196, 0.296]: just above the threshold.
    expect(verdictFor([0.196, 0.296]).cloudsOrIceRequired).toBe('yes');
    // derived: P(A_g > 0.2) = 0.0045 / 0.0945 = 0.048 on [0.11, 0.2045] (no), 0.006 / 0.1 = 0.06 on [0.106, 0.206] (inconclusive).
    expect(verdictFor([0.11, 0.2045]).cloudsOrIceRequired).toBe('no');
    expect(verdictFor([0.106, 0.206]).cloudsOrIceRequired).toBe('inconclusive');
  });

  it('never says yes on a prior-dominated albedo, nor decides when the model cannot reproduce the data', () => {
    const prior = verdictFor([0.3, 0.5], references, {}, { constraint: 'prior-dominated' });
    expect(prior.cloudsOrIceRequired).toBe('inconclusive');
    expect(prior.reason).toMatch(/prior-dominated: it follows the assumed heat redistribution and phase integral/);
    // A prior-dominated albedo below the ceiling may still say no: every assumption gives a dark planet.
    expect(verdictFor([0.05, 0.19], references, {}, { constraint: 'prior-dominated' }).cloudsOrIceRequired).toBe('no');
    const bad = verdictFor([0.3, 0.5], references, {}, { reproducesData: false });
    expect(bad.cloudsOrIceRequired).toBe('inconclusive');
    expect(bad.reason).toMatch(/^the model cannot reproduce the measurements/);
  });

  it('never uses a reference without a temperature range', () => {
    const v = verdictFor([0.3, 0.5], [references[1]!, references[2]!]);
    expect(v).toMatchObject({ cloudsOrIceRequired: 'inconclusive', probability: null, ceiling: null, reference: null });
    expect(v.reason).toMatch(/covers this planet's temperature regime/);
  });

  it('prefers a reference in the measured band, and the brightest regime the planet may be in', () => {
    // The invented planet has T_day 1400-1500 K and T_eq 1200-1300 K (helpers.ts).
    const tess = entry({ id: 'clear-tess-1400', category: 'clear-atmosphere', valueMin: 0, valueNominal: 0.1, valueMax: 0.12, temperatureMinK: 1400, temperatureMaxK: 1600, bandMinNm: 600, bandMaxNm: 1000 });
    const blue = entry({ id: 'clear-blue-900', category: 'clear-atmosphere', valueMin: 0, valueNominal: 0.2, valueMax: 0.3, temperatureMinK: 900, temperatureMaxK: 1500, bandMinNm: 290, bandMaxNm: 570 });
    const hot = entry({ id: 'clear-tess-2500', category: 'clear-atmosphere', valueMin: 0, valueNominal: 0.05, valueMax: 0.4, temperatureMinK: 2500, temperatureMaxK: null, bandMinNm: 600, bandMaxNm: 1000 });
    // blue has no wavelengths in TESS; hot excludes the planet by temperature: tess is the reference.
    const v = verdictFor([0.3, 0.5], [tess, blue, hot]);
    expect(v.reference).toMatchObject({ id: 'clear-tess-1400', geometricAlbedoCeiling: 0.12, regime: 'giant, clear atmosphere, 1400-1600 K, TESS (600-1000 nm)' });
    // Only a reference of another band: used, and the reason says so.
    const other = verdictFor([0.3, 0.5], [blue]);
    expect(other.reference?.id).toBe('clear-blue-900');
    expect(other.reason).toMatch(/no cloud-free reference of this regime shares wavelengths with the measured band/);
  });
});

describe('planet class from the radius (Fulton et al. 2017 radius valley, 1.5-2.0 R_earth)', () => {
  const base = () => demoJson('systems/corvina-b.json');
  it('reads giants, rocky planets and the valley from the radius', () => {
    const j = base();
    delete j.planet.radiusRatio;
    j.planet.radiusRearth = 1.2;
    expect(planetClassOf(parseJson(j)).planetClass).toBe('rocky');
    j.planet.radiusRearth = 1.8;
    expect(planetClassOf(parseJson(j)).planetClass).toBe('either');
    j.planet.radiusRearth = 2.5;
    expect(planetClassOf(parseJson(j)).planetClass).toBe('giant');
  });

  it('follows assumptions.planetClass when given', () => {
    const j = base();
    j.assumptions = { planetClass: 'rocky' };
    expect(planetClassOf(parseJson(j))).toMatchObject({ planetClass: 'rocky', basis: 'assumption' });
  });

  it('states its fallback when the stellar radius is unknown', () => {
    // Fixture W gives Rp/R* = 0.1 and no stellar radius: with R* = 1 R_sun the radius is
    // 0.1 * 6.957e8 / 6.3781e6 = 10.9 R_earth (IAU 2015 nominal radii; derived), rocky only if R* < 1.5 / 10.9 = 0.138 R_sun.
    const c = planetClassOf(loadDemo('fixtures/weak-detection.json'));
    expect(c.planetClass).toBe('giant');
    expect(c.radiusRearth).toBeCloseTo(10.91, 2);
    expect(c.text).toMatch(/stellar radius is not given.*R\* = 1 R_sun.*rocky only if R\* < 0\.138 R_sun/);
  });
});

describe('verdicts on the invented demo planets with the curated catalog', () => {
  const catalog = seededCatalog().data;
  it('a bright hot Neptune (Aurelia b, invented) needs clouds or ice', () => {
    const r = interpretSystem(loadDemo('systems/aurelia-b.json'), { catalog });
    expect(r.verdict.cloudsOrIceRequired).toBe('yes');
    expect(r.verdict.probability).toBeGreaterThanOrEqual(0.95);
    expect(r.verdict.reason).toContain(r.verdict.ceiling!.entryName);
  });

  it('a dark hot Jupiter (Corvina b, invented) does not', () => {
    const r = interpretSystem(loadDemo('systems/corvina-b.json'), { catalog });
    expect(r.verdict.cloudsOrIceRequired).toBe('no');
    expect(r.verdict.probability).toBeLessThanOrEqual(0.05);
  });

  it('a weak detection (fixture W, invented) is inconclusive', () => {
    const r = interpretSystem(loadDemo('fixtures/weak-detection.json'), { catalog });
    expect(r.verdict.cloudsOrIceRequired).toBe('inconclusive');
    expect(r.verdict.probability).toBeGreaterThan(0.05);
    expect(r.verdict.probability).toBeLessThan(0.95);
  });
});
