/**
 * Light-curve files: FITS tables as the missions lay them out (the invented fixtures of
 * test/fixtures/fits, written by astropy), CSV, and several files at once.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { joinCurves, parseLightCurveBytes, readLightCurveFile, readLightCurveFiles } from '../../src/io/curve-files.ts';
import { binaryTable, findColumn, readColumn } from '../../src/io/fits/bintable.ts';
import { parseFits } from '../../src/io/fits/file.ts';
import { caughtHesperError as caught } from '../helpers/errors.ts';

const DIR = fileURLToPath(new URL('../fixtures/fits/', import.meta.url));
const TRUTH = JSON.parse(readFileSync(DIR + 'injected.json', 'utf8'));

describe('FITS light curves: default columns of the mission files', () => {
  it('TIME + BJDREFI + BJDREFF, PDCSAP_FLUX and its error, QUALITY masked, NaN rows dropped and counted', () => {
    for (const [k, s] of (TRUTH.sectors as Array<{ file: string; rows: number; qualityFlagged: number; nanFlux: number; nanTime: number; bjdrefi: number; bjdreff: number }>).entries()) {
      const { curve, summary } = readLightCurveFile(DIR, s.file);
      // Counts from make-fits-fixtures.py (injected.json): every flagged row has a finite
      // flux, and the NaN-flux and NaN-time rows are distinct from them.
      expect(summary.rows).toBe(s.rows);
      expect(summary.dropped).toEqual({ quality: s.qualityFlagged, nonFinite: s.nanFlux + s.nanTime, nonPositiveError: 0 });
      expect(summary.points).toBe(s.rows - s.qualityFlagged - s.nanFlux - s.nanTime);
      expect(curve.x.length).toBe(summary.points);
      expect(summary.columns).toEqual({ time: 'TIME', flux: 'PDCSAP_FLUX', fluxErr: 'PDCSAP_FLUX_ERR', quality: 'QUALITY' });
      expect(summary.timeOffsetDays).toBe(s.bjdrefi + s.bjdreff);
      expect(summary.timeSystem).toBe('TDB');
      // Every usable row of astropy's dump appears as TIME + BJDREFI + BJDREFF, exactly.
      const times = new Set(curve.x);
      let checked = 0;
      for (const line of readFileSync(DIR + `tessaly-b-s${k + 1}-dump.csv`, 'utf8').trim().split('\n').slice(2)) {
        const c = line.split(',').map(Number);
        const [time, pdc, pdcErr, quality] = [c[1]!, c[6]!, c[7]!, c[8]!];
        if (quality !== 0 || !Number.isFinite(time) || !Number.isFinite(pdc) || !Number.isFinite(pdcErr)) continue;
        expect(times.has(time + s.bjdrefi + s.bjdreff), `row ${c[0]}`).toBe(true);
        checked++;
      }
      expect(checked).toBeGreaterThan(15);
      // The sectors start at BJD 2460410.5 and 2460438.5 (make-fits-fixtures.py, SECTORS).
      expect(curve.x[0]! - (k === 0 ? 2460410.5 : 2460438.5)).toBeGreaterThanOrEqual(0);
      expect(curve.x[0]! - (k === 0 ? 2460410.5 : 2460438.5)).toBeLessThan(0.1);
      // Divided by the median: the median of the normalised flux is 1.
      const sorted = Float64Array.from(curve.flux).sort();
      expect(Math.abs(sorted[sorted.length >> 1]! - 1)).toBeLessThan(1e-3);
      expect(summary.medianFlux! / (k === 0 ? 12000 : 15300)).toBeCloseTo(1, 2);
    }
  });

  it('the quality mask chooses the bits; 0 or no quality column masks nothing', () => {
    const file = 'tessaly-b-s1.fits';
    const fits = parseFits(new Uint8Array(readFileSync(DIR + file)), file);
    const table = binaryTable(fits, fits.hdus[1]!);
    const q = readColumn(table, findColumn(table, 'QUALITY')!).values;
    const withBit32 = q.filter((v) => (v & 32) !== 0).length;
    expect(withBit32).toBeGreaterThan(0);
    expect(readLightCurveFile(DIR, file, { qualityMask: 32 }).summary.dropped.quality).toBe(withBit32);
    const none = readLightCurveFile(DIR, file, { qualityMask: 0 });
    expect(none.summary.dropped.quality).toBe(0);
    expect(readLightCurveFile(DIR, file, { qualityColumn: null }).summary.points).toBe(none.summary.points);
  });

  it('other columns by name: SAP_FLUX (with the crowding note) and the extension by name or number', () => {
    const sap = readLightCurveFile(DIR, 'tessaly-b-s1.fits', { fluxColumn: 'sap_flux' });
    expect(sap.summary.columns!.flux).toBe('SAP_FLUX');
    expect(sap.summary.columns!.fluxErr).toBe('SAP_FLUX_ERR');
    expect(sap.summary.notes.join(' ')).toMatch(/SAP_FLUX is not corrected for the light of other stars/);
    expect(readLightCurveFile(DIR, 'tessaly-b-s1.fits', { extension: 'lightcurve' }).summary.points).toBe(readLightCurveFile(DIR, 'tessaly-b-s1.fits').summary.points);
    expect(readLightCurveFile(DIR, 'tessaly-b-s1.fits', { extension: 1 }).summary.extension).toBe('extension 1 (LIGHTCURVE)');
    const image = caught(() => readLightCurveFile(DIR, 'tessaly-b-s1.fits', { extension: 2 }));
    expect(image.code).toBe('bad-fits');
    expect(image.message).toMatch(/extension 2 \(APERTURE\) is a IMAGE extension, not a binary table/);
    const missing = caught(() => readLightCurveFile(DIR, 'tessaly-b-s1.fits', { extension: 'FLUXES' }));
    expect(missing.issues[0]!.message).toMatch(/no extension "FLUXES"; extensions present: 1 BINTABLE \(LIGHTCURVE\), 2 IMAGE \(APERTURE\)/);
  });

  it('scaled integer columns (TSCAL/TZERO) and TNULL rows; BJDREF alone', () => {
    const { curve, summary } = readLightCurveFile(DIR, 'scaled-columns.fits', { qualityMask: 0 });
    // 40 rows, 3 of them TNULL in FLUX (injected.json): dropped as undefined.
    expect(summary.rows).toBe(40);
    expect(summary.dropped.nonFinite).toBe(TRUTH.scaledColumns.nullRows.length);
    expect(summary.timeOffsetDays).toBe(2457000);
    // FLUX = 1 + 1e-6 x stored (about 1 +- 300 ppm), FLUX_ERR = 1e-6 x 300 (make-fits-fixtures.py).
    expect(Math.max(...curve.flux.map((f) => Math.abs(f - 1)))).toBeLessThan(0.002);
    expect(curve.fluxErr[0]! * summary.medianFlux!).toBeCloseTo(3e-4, 12);
  });
});

describe('FITS light curves: a missing column names it and lists those present', () => {
  const present = /columns present: TIME, RATE, RATE_ERROR, FLAGS/;
  it('default flux columns absent', () => {
    const e = caught(() => readLightCurveFile(DIR, 'wrong-columns.fits'));
    expect(e.code).toBe('bad-light-curve');
    expect(e.issues[0]!.path).toBe('wrong-columns.fits, extension 1 (RATES)');
    expect(e.issues[0]!.message).toMatch(/no flux column: none of PDCSAP_FLUX, SAP_FLUX, FLUX is present/);
    expect(e.issues[0]!.message).toMatch(present);
  });

  it('a chosen flux column without its default error column, a chosen quality column that is absent', () => {
    const e = caught(() => readLightCurveFile(DIR, 'wrong-columns.fits', { fluxColumn: 'RATE' }));
    expect(e.issues[0]!.message).toMatch(/no flux-error column RATE_ERR \(the default for RATE/);
    expect(e.issues[0]!.message).toMatch(present);
    const q = caught(() => readLightCurveFile(DIR, 'wrong-columns.fits', { fluxColumn: 'RATE', fluxErrColumn: 'RATE_ERROR', qualityColumn: 'DQ' }));
    expect(q.issues[0]!.message).toMatch(/no quality column DQ/);
    const ok = readLightCurveFile(DIR, 'wrong-columns.fits', { fluxColumn: 'RATE', fluxErrColumn: 'RATE_ERROR', qualityColumn: 'FLAGS' });
    expect(ok.summary.points).toBe(50);
    expect(ok.summary.notes.join(' ')).toMatch(/no BJDREFI\/BJDREFF or BJDREF keyword: TIME used as it is/);
  });
});

describe('several files', () => {
  it('are joined with their labels; CSV and FITS mix when both are time series', () => {
    const r = readLightCurveFiles(DIR, ['tessaly-b-s1.fits', 'tessaly-b-s2.fits']);
    expect(r.curve.files).toEqual(['tessaly-b-s1.fits', 'tessaly-b-s2.fits']);
    expect(r.curve.x.length).toBe(r.files[0]!.points + r.files[1]!.points);
    expect(r.curve.fileIndex![0]).toBe(0);
    expect(r.curve.fileIndex![r.curve.x.length - 1]).toBe(1);
    const csv = parseLightCurveBytes(new TextEncoder().encode('time,flux,flux_err\n2460500,1,0.001\n2460500.1,1,0.001\n'), 'extra.csv');
    expect(csv.summary.format).toBe('csv');
    expect(joinCurves([{ curve: r.curve, label: 'sectors' }, { curve: csv.curve, label: 'extra.csv' }]).files).toEqual(['sectors', 'extra.csv']);
  });

  it('a folded curve with a time series, and a file given twice, are refused', () => {
    const folded = parseLightCurveBytes(new TextEncoder().encode('phase,flux,flux_err\n0.1,1,0.001\n0.2,1,0.001\n'), 'folded.csv');
    const timed = readLightCurveFile(DIR, 'tessaly-b-s1.fits');
    expect(caught(() => joinCurves([{ curve: timed.curve, label: 's1' }, { curve: folded.curve, label: 'folded.csv' }])).message).toMatch(/folded.csv is a phase series but s1 is a time series/);
    expect(caught(() => readLightCurveFiles(DIR, ['tessaly-b-s1.fits', 'tessaly-b-s1.fits'])).message).toMatch(/given twice/);
  });
});
