import { describe, expect, it } from 'vitest';
import { matchCatalog } from '../../src/interpret/match.ts';
import { requiredSingleScatteringAlbedo } from '../../src/interpret/particle-albedo.ts';
import { readPhaseOffset } from '../../src/interpret/phase-offset.ts';
import { resolveBand } from '../../src/physics/bandpass.ts';
import { isotropicGeometricAlbedo } from '../../src/physics/h-function.ts';
import { entry, temperatures, uniformGrid, uniformSummary } from './helpers.ts';

describe('required single-scattering albedo', () => {
  const ag = uniformSummary(0.25, 0.35);
  const ctx = {
    band: resolveBand('kepler'),
    planetClass: { planetClass: 'giant' as const, basis: 'radius' as const, radiusRearth: 12, text: '' },
    phaseIntegral: { kind: 'uniform' as const, min: 1, max: 1.5 },
    geometricAlbedo: ag,
    quantiles: { geometricAlbedo: uniformGrid(0.25, 0.35), daysideTemperatureK: uniformGrid(1400, 1500), equilibriumTemperatureK: uniformGrid(1200, 1300) },
    feasibility: temperatures([1400, 1500], [1200, 1300]),
  };
  const particles = [
    entry({ id: 'bright-grains', category: 'cloud', quantity: 'single-scattering', condensate: 'SiO2', valueMin: 0.999, valueNominal: 0.9995, valueMax: 1 }),
    entry({ id: 'matching-grains', category: 'cloud', quantity: 'single-scattering', condensate: 'Fe2SiO4', valueMin: 0.85, valueNominal: 0.87, valueMax: 0.9 }),
    entry({ id: 'dark-grains', category: 'haze', quantity: 'single-scattering', condensate: 'C', valueMin: 0.38, valueNominal: 0.41, valueMax: 0.44 }),
    entry({ id: 'regolith-w', category: 'regolith', quantity: 'single-scattering', valueMin: 0.9, valueNominal: 0.9, valueMax: 0.9 }),
  ];

  it('inverts A_g(w) at the 68 % bounds and lists the particles that reach it', () => {
    const r = requiredSingleScatteringAlbedo(ag, matchCatalog(particles, ctx));
    // round trip through the H-function relation (derived): A_g(w_lower68) = A_g lower68
    expect(isotropicGeometricAlbedo(r.lower68)).toBeCloseTo(ag.lower68, 3);
    expect(isotropicGeometricAlbedo(r.upper68)).toBeCloseTo(ag.upper68, 3);
    expect(r.reachedBy.map((p) => p.id)).toEqual(['matching-grains', 'bright-grains']);
    expect(r.reachedBy[0]!.withinRange).toBe(true);
    expect(r.reachedBy[1]!.withinRange).toBe(false);
    expect(r.notReached.map((p) => p.id)).toEqual(['dark-grains']);
    expect(r.aboveConservativeLimit).toBe(false);
  });

  it('flags albedos that no isotropic cloud gives', () => {
    const r = requiredSingleScatteringAlbedo(uniformSummary(0.6, 0.9), []);
    expect(r.aboveConservativeLimit).toBe(true);
    expect(r.upper68).toBe(1);
  });
});

describe('phase offset reading', () => {
  const kepler = resolveBand('kepler');
  it('reads a significant westward optical offset as reflective western clouds', () => {
    const r = readPhaseOffset({ kind: 'normal', mean: -41, sigma: 12 }, kepler, 0.05);
    expect(r).toMatchObject({ direction: 'west', significant: true, opticalBand: true });
    expect(r.significanceSigma).toBeCloseTo(41 / 12, 2);
    expect(r.interpretation).toMatch(/reflective clouds on the cooler western dayside \(Demory et al\. 2013; Parmentier et al\. 2016\)/);
  });

  it('reads an eastward offset as a shifted thermal hotspot', () => {
    const r = readPhaseOffset({ kind: 'normal', mean: 20, sigma: 5 }, kepler, 0.6);
    expect(r).toMatchObject({ direction: 'east', significant: true });
    expect(r.interpretation).toMatch(/thermal hotspot shifted east/);
  });

  it('sets the size against the error and hedges below 3 sigma', () => {
    const r = readPhaseOffset({ kind: 'normal', mean: -9, sigma: 6 }, kepler, 0.01);
    expect(r.significant).toBe(false);
    expect(r.interpretation).toMatch(/^westward offset of 9 \+- 6 deg \(1\.5 sigma\), not significant; if real/);
    // split errors: the side toward zero counts
    expect(readPhaseOffset({ kind: 'split-normal', mode: -10, plus: 4, minus: 8 }, kepler, 0).sigmaDeg).toBe(4);
  });
});
