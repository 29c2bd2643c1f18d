/**
 * The FITS reader against files written by astropy's FITS writer
 * (test/fixtures/fits/make-fits-fixtures.py, astropy 5.2.1): every value the reader
 * returns must equal what astropy reads back (the -dump.csv files), bit for bit; and
 * malformed files are refused with a message naming the file and the problem.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { HesperError } from '../../src/errors.ts';
import { binaryTable, findColumn, readColumn } from '../../src/io/fits/bintable.ts';
import { parseFits } from '../../src/io/fits/file.ts';
import { caughtHesperError as caught } from '../helpers/errors.ts';

const DIR = fileURLToPath(new URL('../fixtures/fits/', import.meta.url));
const bytes = (name: string): Uint8Array => new Uint8Array(readFileSync(DIR + name));

/** The dump: header names and rows of numbers (nan for undefined), keyed by row number. */
function readDump(name: string): { names: string[]; rows: Map<number, number[]> } {
  const lines = readFileSync(DIR + name, 'utf8').trim().split('\n').filter((l) => !l.startsWith('#'));
  const names = lines[0]!.split(',').slice(1);
  const rows = new Map<number, number[]>();
  for (const l of lines.slice(1)) {
    const cells = l.split(',');
    rows.set(Number(cells[0]), cells.slice(1).map((c) => (c === 'nan' ? NaN : Number(c))));
  }
  return { names, rows };
}

/** Compares every dumped value with the reader's; returns how many were compared. */
function compareWithDump(file: string, dump: string, expectedRows: number): number {
  const fits = parseFits(bytes(file), file);
  const table = binaryTable(fits, fits.hdus[1]!);
  expect(table.rows).toBe(expectedRows);
  const d = readDump(dump);
  let compared = 0;
  d.names.forEach((label, j) => {
    const m = /^(.*?)(?:\[(\d+)\])?$/.exec(label)!;
    const column = findColumn(table, m[1]!);
    expect(column, label).toBeDefined();
    const values = readColumn(table, column!);
    const element = m[2] === undefined ? 0 : Number(m[2]);
    for (const [row, cells] of d.rows) {
      const want = cells[j]!;
      const got = values.values[row * values.perRow + element]!;
      if (Number.isNaN(want)) expect(got, `${label} row ${row}`).toBeNaN();
      else expect(got, `${label} row ${row}`).toBe(want);
      compared++;
    }
  });
  return compared;
}

describe('FITS reader: values as astropy reads them', () => {
  it('every numeric type and repeat count (L, X, B, I, J, K, E, D), TSCAL/TZERO, unsigned TZERO and TNULL', () => {
    // 40 rows x 27 numbers: the dump's row count (make-fits-fixtures.py, scaled_columns).
    expect(compareWithDump('scaled-columns.fits', 'scaled-columns-dump.csv', 40)).toBe(40 * 27);
    const fits = parseFits(bytes('scaled-columns.fits'), 'scaled-columns.fits');
    const table = binaryTable(fits, fits.hdus[1]!);
    const flux = readColumn(table, findColumn(table, 'FLUX')!).values;
    // TNULL rows 5, 17 and 33 (injected.json) are undefined, so NaN.
    const nan = Array.from(flux.keys()).filter((i) => Number.isNaN(flux[i]!));
    expect(nan).toEqual(JSON.parse(readFileSync(DIR + 'injected.json', 'utf8')).scaledColumns.nullRows);
    expect(() => readColumn(table, findColumn(table, 'LABEL')!)).toThrow(/LABEL has format 8A, which is not numeric/);
  });

  it('the two sector files: rows of the light-curve table, NaNs included; the APERTURE image is walked past', () => {
    const truth = JSON.parse(readFileSync(DIR + 'injected.json', 'utf8'));
    for (const [k, s] of (truth.sectors as Array<{ file: string; rows: number }>).entries()) {
      expect(compareWithDump(s.file, `tessaly-b-s${k + 1}-dump.csv`, s.rows)).toBeGreaterThan(8 * 20);
      const fits = parseFits(bytes(s.file), s.file);
      expect(fits.hdus.map((h) => [h.type, h.name])).toEqual([['PRIMARY', ''], ['BINTABLE', 'LIGHTCURVE'], ['IMAGE', 'APERTURE']]);
      const h = fits.hdus[1]!.header;
      // Long string written by astropy with CONTINUE cards (make-fits-fixtures.py).
      expect(h.get('PROCVER')).toBe('invented processing note long enough to need the CONTINUE convention of long strings in FITS headers');
      expect(h.get('BJDREFI')).toBe((truth.sectors[k] as { bjdrefi: number }).bjdrefi);
      expect(h.get('TIMESYS')).toBe('TDB');
    }
  });
});

function edited(name: string, edit: (text: string) => string): Uint8Array {
  const b = bytes(name);
  const header = Buffer.from(b.subarray(0, 2880 * 4)).toString('latin1');
  const out = new Uint8Array(b);
  const changed = edit(header);
  expect(changed.length).toBe(header.length);
  out.set(Buffer.from(changed, 'latin1'), 0);
  return out;
}

function card(keyword: string, value: string): string {
  return `${keyword.padEnd(8)}= ${value.padStart(20)}`;
}

describe('FITS reader: malformed files are refused with the file and the problem', () => {
  const file = 'tessaly-b-s1.fits';
  const refuse = (data: Uint8Array, pattern: RegExp): void => {
    const e = caught(() => parseFits(data, 'bad.fits'));
    expect(e).toBeInstanceOf(HesperError);
    expect(e.code).toBe('bad-fits');
    expect(e.issues[0]!.path).toBe('bad.fits');
    expect(e.message).toMatch(/^bad\.fits: /);
    expect(e.message).toMatch(pattern);
  };

  it('not FITS at all', () => {
    refuse(new TextEncoder().encode('time,flux,flux_err\n1,1,0.001\n'), /not a FITS file/);
  });

  it('truncated inside a header, and inside a data unit', () => {
    const b = bytes(file);
    refuse(b.subarray(0, 1000), /primary header is truncated/);
    // The light-curve table starts after the primary HDU (one header block, no data).
    refuse(b.subarray(0, 2880 + 2000), /extension 1 header is truncated/);
    refuse(b.subarray(0, b.length - 2880 * 3), /extension 1 header: the data unit \(NAXIS1 = 36, NAXIS2 = \d+\) needs at least \d+ bytes but only \d+ bytes are left/);
  });

  it('a header card that is not printable ASCII, a bad keyword, a bad value, no END', () => {
    const b = bytes(file);
    const nonAscii = new Uint8Array(b);
    nonAscii[2880 + 80 * 3 + 15] = 0xe9;
    refuse(nonAscii, /extension 1 header, card 4: byte 233 at column 16 is not printable ASCII/);
    refuse(edited(file, (h) => h.replace('BITPIX  =', 'bit pix =')), /keyword "bit pix" has characters other than/);
    refuse(edited(file, (h) => h.replace(card('NAXIS', '0'), card('NAXIS', 'zero'))), /value "zero" is not a FITS logical, number or string/);
    const noEnd = new Uint8Array(b.subarray(0, 2880));
    noEnd.set(new TextEncoder().encode('COMMENT '), noEnd.length - 2880 + 80 * (Buffer.from(noEnd).toString('latin1').indexOf('END     ') / 80));
    refuse(noEnd, /primary header is truncated: the file ends before its END card/);
  });

  it('an absurd NAXIS2 is compared with the file size before anything is allocated', () => {
    const lc = Buffer.from(bytes(file).subarray(2880, 2880 * 2)).toString('latin1');
    const naxis2 = /NAXIS2  = +(\d+)/.exec(lc)![1]!;
    refuse(edited(file, (h) => h.replace(card('NAXIS2', naxis2), card('NAXIS2', '999999999999'))), /NAXIS2 = 999999999999\) needs at least \d+ bytes but only \d+ bytes are left in the file/);
    refuse(edited(file, (h) => h.replace(card('NAXIS2', naxis2), card('NAXIS2', '-5'))), /NAXIS2 = -5 is outside \[0, /);
  });

  it('columns whose formats do not add up to NAXIS1, and a bad TFORM', () => {
    const fitsWith = (data: Uint8Array) => {
      const f = parseFits(data, 'bad.fits');
      return caught(() => binaryTable(f, f.hdus[1]!));
    };
    const e = fitsWith(edited(file, (h) => h.replace("TFORM1  = 'D       '", "TFORM1  = 'E       '")));
    expect(e.code).toBe('bad-fits');
    expect(e.message).toMatch(/formats add up to \d+ bytes per row, but NAXIS1 = \d+/);
    expect(fitsWith(edited(file, (h) => h.replace("TFORM1  = 'D       '", "TFORM1  = 'Z       '"))).message).toMatch(/TFORM1 = 'Z' is not a binary-table format/);
  });
});
