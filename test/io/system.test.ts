import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseSystem } from '../../src/io/system.ts';
import { loadSystemFile } from '../../src/io/system-file.ts';
import { caughtHesperError } from '../helpers/errors.ts';

const demo = (name: string) => JSON.parse(readFileSync(new URL(`../../demo-data/systems/${name}`, import.meta.url), 'utf8'));
const fixturesDir = new URL('../../demo-data/fixtures/', import.meta.url).pathname;

function issuesOf(fn: () => unknown): Array<{ path: string; message: string }> {
  return caughtHesperError(fn).issues;
}

describe('system file: quantity forms and units', () => {
  it('reads every demo system', () => {
    for (const f of ['aurelia-b.json', 'corvina-b.json', 'tessaly-b.json']) {
      const s = parseSystem(demo(f));
      expect(s.star.teffK.kind).toBe('normal');
      expect(s.band.id.length).toBeGreaterThan(0);
    }
  });

  it('converts units once, at the edge', () => {
    const base = demo('corvina-b.json');
    base.planet.radiusRatio = undefined;
    base.planet.radiusRjup = { value: 1.0, sigma: 0.05 };
    base.star.teffK = { value: 5636.85, sigma: 70, unit: 'degC' };
    const s = parseSystem(base);
    // 5636.85 degC = 5910 K exactly (SI definition of the Celsius scale); the width is unchanged.
    expect(s.star.teffK).toEqual({ kind: 'normal', mean: expect.closeTo(5910, 9), sigma: expect.closeTo(70, 9) });
    expect(s.planet.radiusRjup).toEqual({ kind: 'normal', mean: 1, sigma: expect.closeTo(0.05, 12) });
  });

  it('accepts 1 au given as 149597870.7 km (IAU 2012 Resolution B2: the au is exact)', () => {
    const base = demo('corvina-b.json');
    delete base.planet.scaledSemiMajorAxis;
    base.planet.semiMajorAxisAu = { value: 149597870.7, sigma: 1e5, unit: 'km' };
    const s = parseSystem(base);
    expect(s.planet.semiMajorAxisAu?.kind).toBe('normal');
    if (s.planet.semiMajorAxisAu?.kind === 'normal') expect(s.planet.semiMajorAxisAu.mean).toBeCloseTo(1, 12);
  });

  it('doubles a semi-amplitude and says so', () => {
    const base = demo('corvina-b.json');
    delete base.measurements.phaseAmplitudePpm;
    base.measurements.phaseSemiAmplitudePpm = { value: 8, sigma: 2.5 };
    const s = parseSystem(base);
    expect(s.measurements.phaseAmplitudePpm).toEqual({ kind: 'normal', mean: 16, sigma: 5 });
    expect(s.notes.join(' ')).toMatch(/doubled/);
  });

  it('applies the documented default assumptions', () => {
    const s = parseSystem(demo('aurelia-b.json'));
    expect(s.assumptions.redistribution).toEqual({ kind: 'uniform', min: 0, max: 1 });
    // The default q prior reaches q of semi-infinite isotropic scatterers with w = 0.5
    // (1.608 from the H-function, rounded up to 1.61; test/inference/phase-integral-prior.test.ts).
    expect(s.assumptions.phaseIntegral).toEqual({ kind: 'uniform', min: 1, max: 1.61 });
    expect(s.assumptions.samples).toBe(4000);
    expect(s.assumptions.gridNodes).toBe(256);
    expect(s.assumptions.weighting).toBe('photon');
  });

  it('reads samples files and response files relative to the system file', () => {
    const s = loadSystemFile('samples-depth.json', fixturesDir);
    expect(s.measurements.eclipseDepthPpm?.kind).toBe('samples');
    const r = loadSystemFile('response-curve.json', fixturesDir);
    expect(r.band.kind).toBe('curve');
  });
});

describe('system file: bad input names the field', () => {
  const mutate = (f: (j: any) => void) => {
    const j = demo('corvina-b.json');
    f(j);
    return j;
  };

  it('missing field', () => {
    const issues = issuesOf(() => parseSystem(mutate((j) => delete j.star.teffK)));
    expect(issues[0]!.path).toBe('star.teffK');
    expect(issues[0]!.message).toMatch(/missing/);
  });

  it('NaN and strings where numbers belong', () => {
    expect(issuesOf(() => parseSystem(mutate((j) => (j.planet.radiusRatio = { value: NaN, sigma: 0.001 }))))[0]!.path).toBe('planet.radiusRatio.value');
    expect(issuesOf(() => parseSystem(mutate((j) => (j.planet.radiusRatio = { value: 'NaN', sigma: 0.001 }))))[0]!.path).toBe('planet.radiusRatio.value');
  });

  it('negative radius', () => {
    const issues = issuesOf(() => parseSystem(mutate((j) => (j.star.radiusRsun = -1))));
    expect(issues[0]!.path).toBe('star.radiusRsun');
    expect(issues[0]!.message).toMatch(/must be in \(0, inf\)/);
  });

  it('a/R* < 1 and Rp/R* >= 1', () => {
    const a = issuesOf(() => parseSystem(mutate((j) => (j.planet.scaledSemiMajorAxis = { value: 0.8, sigma: 0.1 }))));
    expect(a[0]!.path).toBe('planet.scaledSemiMajorAxis.value');
    const k = issuesOf(() => parseSystem(mutate((j) => (j.planet.radiusRatio = 1.2))));
    expect(k[0]!.path).toBe('planet.radiusRatio');
    expect(k[0]!.message).toMatch(/\(0, 1\)/);
  });

  it('unknown band lists the known ones', () => {
    const issues = issuesOf(() => parseSystem(mutate((j) => (j.band = 'keppler'))));
    expect(issues[0]!.path).toBe('band');
    expect(issues[0]!.message).toMatch(/kepler/);
  });

  it('unknown keys, wrong quantity forms, and all problems together', () => {
    const issues = issuesOf(() => parseSystem(mutate((j) => {
      j.planet.radiusRatio = { value: 0.1, sigm: 0.01 };
      j.star.colour = 'yellow';
      j.measurements.eclipseDepthPpm = 14;
    })));
    const paths = issues.map((i) => i.path);
    expect(issues.find((i) => i.path === 'planet.radiusRatio')!.message).toMatch(/"sigm"/);
    expect(paths).toContain('star');
    expect(paths).toContain('measurements.eclipseDepthPpm');
    expect(issues.find((i) => i.path === 'measurements.eclipseDepthPpm')!.message).toMatch(/uncertainty/);
  });

  it('alternatives must be complete', () => {
    const issues = issuesOf(() => parseSystem(mutate((j) => {
      delete j.planet.scaledSemiMajorAxis;
      delete j.star.radiusRsun;
    })));
    expect(issues.map((i) => i.path)).toContain('planet.scaledSemiMajorAxis');
  });

  it('bad units', () => {
    const issues = issuesOf(() => parseSystem(mutate((j) => (j.star.teffK = { value: 5900, sigma: 70, unit: 'Rjup' }))));
    expect(issues[0]!.path).toBe('star.teffK.unit');
    // Every unit error lists the units the field accepts.
    expect(issues[0]!.message).toMatch(/star\.teffK accepts "K", "degC"/);
    const depth = issuesOf(() => parseSystem(mutate((j) => (j.measurements.eclipseDepthPpm = { value: 1.4, sigma: 0.1, unit: 'mmag' }))));
    expect(depth[0]!.path).toBe('measurements.eclipseDepthPpm.unit');
    expect(depth[0]!.message).toMatch(/accepts "ppm", "ppt", "%"/);
  });

  it('reads depths and amplitudes in percent and ppt', () => {
    // derived: 1 % = 1e4 ppm, 1 ppt = 1e3 ppm.
    const pct = parseSystem(mutate((j) => (j.measurements.eclipseDepthPpm = { value: 0.0145, sigma: 0.0012, unit: '%' })));
    expect(pct.measurements.eclipseDepthPpm).toMatchObject({ kind: 'normal' });
    const d = pct.measurements.eclipseDepthPpm as { mean: number; sigma: number };
    expect(d.mean).toBeCloseTo(145, 9);
    expect(d.sigma).toBeCloseTo(12, 9);
    const ppt = parseSystem(mutate((j) => (j.measurements.eclipseDepthPpm = { value: 0.145, sigma: 0.012, unit: 'ppt' })));
    expect((ppt.measurements.eclipseDepthPpm as { mean: number }).mean).toBeCloseTo(145, 9);
  });

  it('samples files are refused without file access (the API)', () => {
    const j = JSON.parse(readFileSync(`${fixturesDir}samples-depth.json`, 'utf8'));
    const issues = issuesOf(() => parseSystem(j));
    expect(issues[0]!.path).toBe('measurements.eclipseDepthPpm.samplesFile');
  });
});
