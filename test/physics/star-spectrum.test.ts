/**
 * A tabulated stellar spectrum in the band integrals: a tabulated blackbody reproduces
 * the blackbody star, and the ASTM E-490 solar spectrum (test/fixtures/solar) gives the
 * Sun's band-flux and beaming ratios against a 5772 K blackbody as computed
 * independently by make-solar-fixture.py.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { listBuiltinBands, resolveBand } from '../../src/physics/bandpass.ts';
import { planckLambda } from '../../src/physics/planck.ts';
import { parseSpectrumCsv, spectrumFromPairsNm, starBandFactors, validateSpectrumTable } from '../../src/physics/star-spectrum.ts';
import { caughtHesperError as caught } from '../helpers/errors.ts';

const SOLAR = fileURLToPath(new URL('../fixtures/solar/', import.meta.url));
/** IAU 2015 Resolution B3 nominal solar effective temperature [K]. */
const TEFF_SUN_K = 5772;

function tabulatedBlackbody(teffK: number, stepNm: number): ReturnType<typeof spectrumFromPairsNm> {
  const pairs: Array<[number, number]> = [];
  // Any unit: multiplied by an arbitrary 3.7 (only the shape matters).
  for (let nm = 100; nm <= 20000; nm += stepNm) pairs.push([nm, 3.7 * planckLambda(nm * 1e-9, teffK)]);
  return spectrumFromPairsNm(pairs, 'tabulated blackbody');
}

describe('a tabulated blackbody reproduces the blackbody star', () => {
  it('band flux and beaming factor within 1e-4 in every built-in band, both weightings, 3000-10000 K', () => {
    let worst = 0;
    for (const teffK of [3000, 5772, 10000]) {
      const table = tabulatedBlackbody(teffK, 2);
      for (const band of [...listBuiltinBands(), resolveBand({ response: [[1000, 0], [3000, 1], [5000, 0]] })]) {
        for (const w of ['photon', 'energy'] as const) {
          const f = starBandFactors(table, band, teffK, w);
          worst = Math.max(worst, Math.abs(f.fluxFactor - 1), Math.abs(f.beamingFactor - 1));
        }
      }
    }
    // Worst seen: 7e-6 (2-nm table, linear between points); the required agreement is 1e-4.
    expect(worst).toBeLessThan(1e-4);
  });

  it('a top-hat over the whole table has the blackbody energy by construction (energy weighting)', () => {
    const table = tabulatedBlackbody(TEFF_SUN_K, 2);
    const whole = resolveBand({ tophatNm: [table.minNm, table.maxNm] });
    expect(starBandFactors(table, whole, TEFF_SUN_K, 'energy').fluxFactor).toBeCloseTo(1, 9);
  });
});

describe('the Sun: ASTM E-490 against a 5772 K blackbody', () => {
  const text = readFileSync(`${SOLAR}e490-sun.csv`, 'utf8');
  const oracle = JSON.parse(readFileSync(`${SOLAR}e490-band-ratios.json`, 'utf8'));
  const pairs = parseSpectrumCsv(text, 'e490-sun.csv', 'star.spectrum.file');
  const sun = spectrumFromPairsNm(pairs, 'e490-sun.csv');

  it('the trimmed table is whole: 1591 rows from 200.5 to 10000 nm (make-solar-fixture.py)', () => {
    expect(pairs.length).toBe(oracle.rows);
    expect(pairs.length).toBe(1591);
    expect(pairs[0]).toEqual([200.5, 7.326]);
    expect(pairs[pairs.length - 1]![0]).toBe(10000);
  });

  it('band-flux and beaming ratios agree with the independent computation', () => {
    const worst = { flux: 0, beaming: 0 };
    for (const [id, o] of Object.entries(oracle.bands as Record<string, { points: number[][]; fluxRatio: number; beamingRatio: number }>)) {
      const band = resolveBand(id);
      // The oracle used the band's own response points.
      expect(Array.from(band.response.wavelengthM, (m, i) => [Math.round(m * 1e9 * 1e6) / 1e6, band.response.weight[i]])).toEqual(o.points);
      const f = starBandFactors(sun, band, TEFF_SUN_K, 'photon');
      worst.flux = Math.max(worst.flux, Math.abs(f.fluxFactor / o.fluxRatio - 1));
      worst.beaming = Math.max(worst.beaming, Math.abs(f.beamingFactor / o.beamingRatio - 1));
    }
    // Both integrate the same piecewise-linear spectrum: hesper exactly (Simpson on each
    // interval), the oracle by the midpoint rule on a 0.01 nm grid (relative error of order
    // (0.01 nm / 1 nm)^2 / 24 times the curvature of the blackbody, ~1e-10). The blackbody's
    // beaming factor in hesper comes from the band table's interpolated slope, good to about
    // 1e-7 (band-table.ts). Worst seen: 4e-11 (flux), 6e-8 (beaming).
    expect(worst.flux).toBeLessThan(1e-9);
    expect(worst.beaming).toBeLessThan(1e-6);
  });

  it('orders the bands as the independent computation does (V > Kepler > TESS > 1 > I)', () => {
    // Signs and sizes from the independent computation (e490-band-ratios.json).
    const ratio = (id: string): number => starBandFactors(sun, resolveBand(id), TEFF_SUN_K, 'photon').fluxFactor;
    expect(ratio('V')).toBeGreaterThan(ratio('kepler'));
    expect(ratio('kepler')).toBeGreaterThan(ratio('tess'));
    expect(ratio('I')).toBeLessThan(1);
  });
});

describe('bad spectra are refused naming the field', () => {
  const refuse = (fn: () => unknown, pattern: RegExp, path: RegExp): void => {
    const e = caught(fn);
    expect(e.code).toBe('bad-star-spectrum');
    expect(e.issues.map((i) => `${i.path}: ${i.message}`).join('\n')).toMatch(pattern);
    expect(e.issues[0]!.path).toMatch(path);
  };
  const p = 'star.spectrum.table';
  it('negative flux, too few points, non-increasing wavelengths, non-numbers', () => {
    refuse(() => validateSpectrumTable([[500, 1], [600, -2], [700, 1]], 'nm', p), /flux -2 is negative/, /^star\.spectrum\.table\[1\]$/);
    refuse(() => validateSpectrumTable([[500, 1], [600, 1]], 'nm', p), /2 point\(s\): a spectrum needs at least 3/, /^star\.spectrum\.table$/);
    refuse(() => validateSpectrumTable([[500, 1], [700, 1], [600, 1]], 'nm', p), /wavelength 600 nm is not greater than the previous 700 nm/, /table\[2\]/);
    refuse(() => validateSpectrumTable([[500, 0], [600, 0], [700, 0]], 'nm', p), /every flux is zero/, /table$/);
    refuse(() => parseSpectrumCsv('wavelength,flux\n1,2\n', 's.csv', 'star.spectrum.file'), /header "wavelength,flux" must be wavelength_nm,flux or wavelength_um,flux/, /star\.spectrum\.file \(s\.csv:1\)/);
    refuse(() => parseSpectrumCsv('wavelength_um,flux\n0.5,1\n0.6,x\n', 's.csv', 'star.spectrum.file'), /expected two numbers "wavelength,flux", got "0.6,x"/, /s\.csv:3/);
  });

  it('a spectrum that does not cover the band', () => {
    const short = spectrumFromPairsNm(validateSpectrumTable([[0.3, 1], [0.5, 2], [0.9, 1]], 'um', p), 'inline');
    refuse(() => starBandFactors(short, resolveBand('tess'), 5772, 'photon'), /covers 300-900 nm but band "tess" needs 600-1000 nm/, /^star\.spectrum$/);
  });
});
