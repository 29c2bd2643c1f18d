/** Two-sided consistency checks with invented systems (demo-data/fixtures and systems, all invented). */
import { describe, expect, it } from 'vitest';
import { chiSquareSurvival } from '../../src/inference/chi-square.ts';
import { inferAlbedo } from '../../src/inference/infer.ts';
import { demoJson, parseJson } from './helpers.ts';

const text = (r: { warnings: string[] }) => r.warnings.join('\n');

describe('chi-square survival function', () => {
  it('matches printed table values', () => {
    // Chi-square tables (e.g. Abramowitz & Stegun 1964, table 26.8): P(chi2_1 > 3.841) = 0.05,
    // P(chi2_2 > 5.991) = 0.05, P(chi2_3 > 11.345) = 0.01, P(chi2_1 > 9) = 0.0027 (3 sigma); 3 to 4 digits printed.
    expect(chiSquareSurvival(3.841, 1)).toBeCloseTo(0.05, 4);
    expect(chiSquareSurvival(5.991, 2)).toBeCloseTo(0.05, 4);
    expect(chiSquareSurvival(11.345, 3)).toBeCloseTo(0.01, 4);
    expect(chiSquareSurvival(9, 1)).toBeCloseTo(0.0027, 4);
    // derived: for 2 degrees of freedom P = exp(-x/2) exactly.
    expect(chiSquareSurvival(20, 2)).toBeCloseTo(Math.exp(-10), 12);
  });
});

describe('consistency warnings', () => {
  it('a depth typed in percent as ppm asks "is this in percent?" and the model does not reproduce it', () => {
    const j = demoJson('systems/corvina-b.json');
    j.measurements = { eclipseDepthPpm: { value: 0.0145, sigma: 0.0012 } }; // 145 ppm written as percent
    j.assumptions = { samples: 1000 };
    const r = inferAlbedo(parseJson(j));
    expect(text(r)).toMatch(/is this in percent\? \(as percent it would be 145 ppm, as ppt 14\.5 ppm\)/);
    expect(r.modelFit.reproducesData).toBe(false);
    expect(r.reflectedLightDetected).toBe(false);
  });

  it('a phase amplitude above the eclipse depth warns of a negative nightside, with the numbers', () => {
    const j = demoJson('systems/corvina-b.json');
    j.measurements.phaseAmplitudePpm = { value: 40, sigma: 5 }; // (40 - 14) / sqrt(4^2 + 5^2) = 4.1 sigma
    j.assumptions = { samples: 1000 };
    const r = inferAlbedo(parseJson(j));
    expect(text(r)).toMatch(/phase amplitude \(40\.0 \+- 5\.0 ppm\) exceeds the eclipse depth \(14\.0 \+- 4\.0 ppm\) by 4\.1 sigma: that implies a negative nightside flux/);
    expect(r.modelFit.reproducesData).toBe(false);
  });

  it('a depth below the thermal floor anywhere in the prior says so with the floor', () => {
    // Fixture T (invented) gives 567 ppm at A_g = 0 and eps = 0; with eps free the thermal
    // depth stays above ~100 ppm; a 10 +- 5 ppm depth lies far below anything the model gives.
    const j = demoJson('fixtures/thermal-only.json');
    j.measurements.eclipseDepthPpm = { value: 10, sigma: 5 };
    j.assumptions = { redistribution: { min: 0, max: 1 }, samples: 1000 };
    const r = inferAlbedo(parseJson(j));
    expect(text(r)).toMatch(/eclipse depth \(10\.0 \+- 5\.0 ppm\) is smaller than the smallest signal the model gives anywhere in the prior \(\d+(\.\d)? ppm/);
    expect(r.modelFit.reproducesData).toBe(false);
    expect(r.modelFit.chiSquareMin).toBeGreaterThan(9);
    // The heat redistribution is pushed to the edge of its prior (full redistribution keeps the planet coolest).
    expect(text(r)).toMatch(/heat-redistribution posterior piles up at the upper edge of its prior/);
  });

  it('names the sensitivity corners the data rule out, with their Delta chi^2', () => {
    // Tessaly b (invented) has a measured dayside temperature that only eps near 0 reaches.
    const r = inferAlbedo(parseJson(demoJson('systems/tessaly-b.json')));
    const out = r.sensitivity.filter((c) => c.ruledOut);
    expect(out.map((c) => c.redistribution)).toEqual([1, 1]);
    for (const c of out) expect(c.deltaChiSquare!).toBeGreaterThan(5.99);
    expect(text(r)).toMatch(/eps = 1, q = 1: Delta chi\^2 = \d+\.\d, likelihood ratio/);
  });

  it('a consistent system passes with its best-fit chi-square', () => {
    const r = inferAlbedo(parseJson(demoJson('fixtures/pure-reflection.json')));
    expect(r.modelFit).toMatchObject({ reproducesData: true, degreesOfFreedom: 1, problems: [] });
    // derived: the model reaches 40 ppm exactly, so the best chi-square is near 0.
    expect(r.modelFit.chiSquareMin!).toBeLessThan(0.1);
  });
});
