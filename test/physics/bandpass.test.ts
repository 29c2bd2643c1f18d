import { describe, expect, it } from 'vitest';
import {
  bandFlux, bandFluxDirect, bandFluxRatio, builtinBandIds, describeBand, getBandTable, listBuiltinBands, logBandFlux,
  resolveBand,
} from '../../src/physics/bandpass.ts';
import { caughtHesperError } from '../helpers/errors.ts';


describe('built-in bands', () => {
  it('lists at least kepler, tess, cheops, most, corot, V, R, I with coverage, source and the approximate flag', () => {
    const bands = listBuiltinBands();
    expect(bands.map((b) => b.id)).toEqual(expect.arrayContaining(['kepler', 'tess', 'cheops', 'most', 'corot', 'V', 'R', 'I']));
    for (const b of bands) {
      expect(b.minNm).toBeLessThan(b.maxNm);
      expect(b.source.length).toBeGreaterThan(5);
      // None is a tabulated response: all are top-hats or coverage-only shapes.
      expect(b.approximate).toBe(true);
      expect(['top-hat', 'trapezoid']).toContain(b.shape);
    }
  });

  it('uses the published coverage of each band', () => {
    const k = resolveBand('kepler');
    // Kepler Instrument Handbook (Van Cleve & Caldwell 2016): half maximum 430-840 nm (checked), total ~420-900 nm (memory).
    expect(k.halfMaxNm).toEqual([430, 840]);
    expect([k.minNm, k.maxNm]).toEqual([420, 900]);
    // TESS 600-1000 nm (Ricker et al. 2015, JATIS 1, 014003).
    expect([resolveBand('tess').minNm, resolveBand('tess').maxNm]).toEqual([600, 1000]);
    // CHEOPS 0.4-1.05 um (ESA).
    expect([resolveBand('cheops').minNm, resolveBand('cheops').maxNm]).toEqual([400, 1050]);
    // Johnson V centre ~551 nm, FWHM ~88 nm (Bessell 1979 / textbook tables): top-hat 507-595 nm.
    expect(resolveBand('V').halfMaxNm).toEqual([507, 595]);
  });

  it('resolves names case-insensitively to shared objects', () => {
    expect(resolveBand('TESS')).toBe(resolveBand('tess'));
    expect(resolveBand(' v ')).toBe(resolveBand('V'));
    expect(builtinBandIds()).toContain('kepler');
  });

  it('describes a band as plain JSON', () => {
    const d = describeBand(resolveBand('kepler'));
    expect(JSON.parse(JSON.stringify(d))).toEqual(d);
    expect(d).toMatchObject({ id: 'kepler', approximate: true, shape: 'trapezoid', minNm: 420, maxNm: 900 });
  });
});

describe('resolveBand errors', () => {
  it('lists the known names for an unknown band', () => {
    const e = caughtHesperError(() => resolveBand('spitzer', 'system.band'));
    expect(e.code).toBe('unknown-band');
    expect(e.issues[0]?.path).toBe('system.band');
    expect(e.issues[0]?.message).toMatch(/kepler, tess, cheops, most, corot, V, R, I/);
  });

  it('rejects bad top-hats and curves', () => {
    expect(caughtHesperError(() => resolveBand({ tophatNm: [800, 600] })).code).toBe('out-of-range');
    expect(caughtHesperError(() => resolveBand({ tophatNm: [Number.NaN, 600] })).issues[0]?.path).toBe('band.tophatNm[0]');
    expect(caughtHesperError(() => resolveBand({ response: [[500, 1]] })).code).toBe('bad-response-curve');
    expect(caughtHesperError(() => resolveBand({ response: [[500, 1], [450, 1]] }, 'x')).issues[0]?.path).toBe('x.response[1]');
    expect(caughtHesperError(() => resolveBand({ foo: 1 } as never)).code).toBe('invalid-input');
  });
});

describe('band flux API', () => {
  const tess = resolveBand('tess');

  it('builds each table once and shares it between resolutions of the same curve', () => {
    const curve: Array<[number, number]> = [[500, 0], [600, 1], [700, 0.5], [800, 0]];
    const a = resolveBand({ response: curve });
    const b = resolveBand({ response: curve.map(([w, r]) => [w, r] as [number, number]) });
    expect(b).toBe(a);
    expect(getBandTable(a, 'photon')).toBe(getBandTable(b, 'photon'));
    expect(getBandTable(a, 'energy')).not.toBe(getBandTable(a, 'photon'));
    // The same curve read from a named file keeps its own source but reuses the table.
    const c = resolveBand({ response: curve, source: 'invented-curve.csv' });
    expect(c.source).toBe('invented-curve.csv');
    expect(getBandTable(c, 'photon')).toBe(getBandTable(a, 'photon'));
    expect(resolveBand({ response: [[500, 0], [600, 1], [700, 0.5], [800, 0.1]] }).id).not.toBe(a.id);
  });

  it('is zero at 0 K, finite in log space where the flux underflows, and direct outside the table', () => {
    expect(bandFlux(tess, 0)).toBe(0);
    expect(bandFluxRatio(tess, 0, 5800)).toBe(0);
    // At 5 K the TESS flux underflows a double (x ~ 2900 at 1000 nm), but its logarithm is finite.
    expect(bandFlux(tess, 5)).toBe(0);
    expect(Number.isFinite(logBandFlux(tess, 5))).toBe(true);
    // Above the table (20000 K) the value comes from direct integration.
    expect(bandFlux(tess, 30000)).toBe(bandFluxDirect(tess, 30000));
  });

  it('rejects bad temperatures and weightings', () => {
    expect(caughtHesperError(() => bandFlux(tess, -1)).issues[0]).toMatchObject({ path: 'temperatureK', value: -1 });
    expect(caughtHesperError(() => bandFlux(tess, Number.NaN)).code).toBe('not-finite');
    expect(caughtHesperError(() => bandFlux(tess, Infinity)).code).toBe('not-finite');
    expect(caughtHesperError(() => bandFluxRatio(tess, 1500, 0)).issues[0]?.path).toBe('starTempK');
    expect(caughtHesperError(() => bandFlux(tess, 1500, 'bolometric' as 'photon')).issues[0]?.path).toBe('weighting');
    expect(caughtHesperError(() => bandFluxDirect(tess, 30000, 'bolometric' as 'photon')).issues[0]?.path).toBe('weighting');
  });
});
