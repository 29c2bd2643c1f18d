import { describe, expect, it } from 'vitest';
import { parseResponseCsv, validateResponsePairs } from '../../src/physics/response-curve.ts';
import { caughtHesperError } from '../helpers/errors.ts';


describe('parseResponseCsv', () => {
  it('reads nm and um headers, skipping comments and blank lines', () => {
    const nm = parseResponseCsv('# invented test curve\nwavelength_nm,weight\n500,0.1\n600,1\n\n700,0.2\n', 'a.csv');
    expect(nm).toEqual([[500, 0.1], [600, 1], [700, 0.2]]);
    const um = parseResponseCsv('wavelength_um, weight\r\n0.5,0.1\r\n0.6,1\r\n0.7,0.2\r\n', 'b.csv');
    um.forEach(([w], i) => expect(w).toBeCloseTo(nm[i]![0], 9)); // 1 um = 1000 nm
  });

  it('rejects a bad header with its line number', () => {
    const e = caughtHesperError(() => parseResponseCsv('\nlambda,transmission\n500,1\n600,1\n', 'f.csv'));
    expect(e.code).toBe('bad-response-curve');
    expect(e.issues[0]?.path).toBe('f.csv:2');
    expect(e.issues[0]?.message).toMatch(/line 2: header/);
  });

  it('rejects an empty file and a single point', () => {
    expect(caughtHesperError(() => parseResponseCsv('', 'e.csv')).issues[0]?.message).toMatch(/empty/);
    expect(caughtHesperError(() => parseResponseCsv('wavelength_nm,weight\n', 'e.csv')).issues[0]?.message).toMatch(/no data points/);
    expect(caughtHesperError(() => parseResponseCsv('wavelength_nm,weight\n500,1\n', 'e.csv')).issues[0]?.message).toMatch(/at least 2/);
  });

  it('rejects non-increasing wavelengths, negative and non-finite weights, each with its line', () => {
    const text = 'wavelength_nm,weight\n500,1\n600,1\n600,1\n550,1\n700,-0.1\n800,Infinity\n900,abc\n';
    const e = caughtHesperError(() => parseResponseCsv(text, 'g.csv'));
    expect(e.code).toBe('bad-response-curve');
    const byPath = new Map(e.issues.map((i) => [i.path, i.message]));
    expect(byPath.get('g.csv:4')).toMatch(/not greater than the previous 600 nm/);
    expect(byPath.get('g.csv:5')).toMatch(/550 nm is not greater/);
    expect(byPath.get('g.csv:6')).toMatch(/negative/);
    expect(byPath.get('g.csv:7')).toMatch(/not a finite number/);
    expect(byPath.get('g.csv:8')).toMatch(/not a pair of numbers/);
  });

  it('rejects rows with the wrong number of cells and all-zero curves', () => {
    expect(caughtHesperError(() => parseResponseCsv('wavelength_nm,weight\n500,1,2\n600,1\n', 'h.csv')).issues[0]?.path).toBe('h.csv:2');
    expect(caughtHesperError(() => parseResponseCsv('wavelength_nm,weight\n500,0\n600,0\n', 'h.csv')).issues[0]?.message).toMatch(/every weight is zero/);
  });

  it('flags wavelengths that look like a unit mistake', () => {
    // 0.5 "nm" is almost certainly micrometres given under the nm header.
    const e = caughtHesperError(() => parseResponseCsv('wavelength_nm,weight\n0.5,1\n0.6,1\n', 'u.csv'));
    expect(e.issues[0]?.message).toMatch(/check the unit/);
  });
});

describe('validateResponsePairs', () => {
  it('accepts nm and um and names bad points by index', () => {
    expect(validateResponsePairs([[0.5, 1], [0.6, 1]], 'um')[1]?.[0]).toBeCloseTo(600, 9);
    const e = caughtHesperError(() => validateResponsePairs([[500, 1], [400, 1]], 'nm', 'band.response'));
    expect(e.issues[0]?.path).toBe('band.response[1]');
    expect(caughtHesperError(() => validateResponsePairs([[500, 1], ['600', 1]])).issues[0]?.path).toBe('band.response[1]');
    expect(caughtHesperError(() => validateResponsePairs('500,1')).code).toBe('bad-response-curve');
    expect(caughtHesperError(() => validateResponsePairs([[500, 1], [600, 1]], 'mm' as 'nm')).issues[0]?.path).toBe('band.response.unit');
  });
});
