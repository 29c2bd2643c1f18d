/**
 * Verdicts on published planets (inputs and their sources in each file's note under
 * demo-data/published/), against the curated cloud-free references of seeds/cloud-free.json.
 */
import { describe, expect, it } from 'vitest';
import { interpretSystem } from '../../src/interpret/run.ts';
import type { SystemInput } from '../../src/io/system.ts';
import { resolveBand } from '../../src/physics/bandpass.ts';
import { brightnessTemperatureK } from '../../src/physics/thermal.ts';
import { paragraphMarkdown } from '../../src/report/paragraph-md.ts';
import { loadDemo } from '../inference/helpers.ts';
import { seededCatalog } from './helpers.ts';

const { data, sources } = seededCatalog();
const run = (s: SystemInput) => JSON.parse(JSON.stringify(interpretSystem(s, { catalog: data }))) as ReturnType<typeof interpretSystem>;
const bareClaim = /\$A_\\mathrm\{g\} = [\d.]+(\^\{\+[\d.]+\}_\{-[\d.]+\}| \\pm [\d.]+)\$/;

describe('the cloudy Kepler hot Jupiter: Kepler-7b', () => {
  const r = run(loadDemo('published/kepler-7b.json'));

  it('measures the albedo of Demory et al. and requires clouds', () => {
    // Demory et al. 2011, ApJL 735, L12: A_g = 0.32 +- 0.03 from 44 +- 5 ppm; Demory et al. 2013, ApJL 776, L25:
    // 0.35 +- 0.02. Our geometry comes from the discovery abstract (Latham et al. 2010), so allow 2 of their sigmas.
    expect(r.geometricAlbedo.constraint).toBe('measured');
    expect(r.reflectedLightDetected).toBe(true);
    expect(Math.abs(r.geometricAlbedo.median - 0.32)).toBeLessThan(0.06);
    // Clear hot giants are dark in the optical (Sudarsky et al. 2000, ApJ 538, 885): the reference of its
    // regime (900-1500 K or 1400-2500 K; T_eq about 1350-1550 K here) is far below 0.32.
    expect(r.verdict.cloudsOrIceRequired).toBe('yes');
    expect(r.verdict.reference!.id).toMatch(/^clear-giant-/);
    expect(r.verdict.reference!.geometricAlbedoCeiling).toBeLessThan(0.2);
    expect(r.verdict.reference!.regime).toMatch(/^giant, clear atmosphere, \d+-\d+ K, /);
  });
});

describe('a very dark hot Jupiter: TrES-2b', () => {
  const r = run(loadDemo('published/tres-2b.json'));

  it('gives an albedo of a few per cent at most and no clouds required', () => {
    // Barclay et al. 2012, ApJ 761, 53: A_g = 0.0136 +0.0022 -0.0033; Kipping & Spiegel 2011, MNRAS 417, L88:
    // all-reflected 0.0253 +- 0.0072, true albedo below 1 %.
    expect(r.geometricAlbedo.upperLimit95).toBeLessThan(0.05);
    expect(Math.abs(r.allReflectedGeometricAlbedo.median - 0.0253)).toBeLessThan(2 * 0.0072);
    expect(r.verdict.cloudsOrIceRequired).toBe('no');
  });
});

describe('a TESS-only ultra-hot giant: WASP-18b', () => {
  const tessOnly = loadDemo('published/wasp-18b-tess.json');

  it('is prior-dominated from the TESS depth alone: never "yes", no bare A_g claim in the paragraph', () => {
    const r = run(tessOnly);
    // Shporer et al. 2019, AJ 157, 178: the 341 ppm TESS eclipse is dominated by thermal emission. Without an
    // infrared constraint the albedo follows the assumed redistribution (eps = 0: almost all thermal; eps = 1: A_g ~ 0.4).
    expect(r.geometricAlbedo.constraint).toBe('prior-dominated');
    expect(r.reflectedLightDetected).toBe(false);
    expect(r.detected).toBe(true);
    expect(r.verdict.cloudsOrIceRequired).not.toBe('yes');
    const md = paragraphMarkdown(r, tessOnly, sources);
    expect(md).not.toMatch(bareClaim);
    expect(md).toMatch(/infrared eclipse\) or of its dayside temperature would break this degeneracy/);
  });

  it('with the infrared dayside temperature becomes a tight upper limit', () => {
    // Deline et al. 2025, A&A 699, A150, Table 3: Spitzer 3.6 um dayside flux 3106 +112 -111 ppm, Rp/R* = 0.09757.
    // Its blackbody brightness temperature in the IRAC 3.6 um channel (half-power 3.18-3.94 um, Fazio et al. 2004,
    // ApJS 154, 10; from memory) against a 6400 K star is derived here with the same band integrals.
    const irac1 = resolveBand({ tophatNm: [3180, 3940] });
    const tb = (ppm: number) => brightnessTemperatureK(0.09757, ppm * 1e-6, 6400, irac1, 'photon');
    const tDay = tb(3106);
    expect(tDay).toBeGreaterThan(2900);
    expect(tDay).toBeLessThan(3300);
    const withDayside: SystemInput = {
      ...tessOnly,
      measurements: { ...tessOnly.measurements, daysideTemperatureK: { kind: 'normal', mean: tDay, sigma: (tb(3218) - tb(2995)) / 2 } },
    };
    const r = run(withDayside);
    expect(r.modelFit.reproducesData).toBe(true);
    expect(r.geometricAlbedo.constraint).toBe('upper-limit');
    // Shporer et al. 2019: A_g < 0.048 (2 sigma). Ours, with the Spitzer temperature, stays below 0.1 at 95 %.
    expect(r.geometricAlbedo.upperLimit95).toBeLessThan(0.1);
    expect(r.verdict.cloudsOrIceRequired).toBe('no');
  });
});
