import { describe, expect, it } from 'vitest';
import { HesperError } from '../../src/errors.ts';
import { parseCurveCsv } from '../../src/io/curve-csv.ts';

function issuesOf(text: string): string[] {
  try {
    parseCurveCsv(text, 'c.csv');
  } catch (e) {
    expect(e).toBeInstanceOf(HesperError);
    expect((e as HesperError).code).toBe('bad-light-curve');
    return (e as HesperError).issues.map((i) => `${i.path}: ${i.message}`);
  }
  throw new Error('expected a bad-light-curve error');
}

describe('parseCurveCsv', () => {
  it('reads a time series with comments, CRLF, a BOM, reordered and extra columns', () => {
    const text = '\uFEFF# invented test curve\r\nflux_err,quality,time,flux\r\n0.0001,0,100.0,1.00002\r\n\r\n# gap\r\n0.0001,0,100.01,0.99998\r\n';
    const c = parseCurveCsv(text);
    expect(c.column).toBe('time');
    expect(Array.from(c.x)).toEqual([100, 100.01]);
    expect(Array.from(c.flux)).toEqual([1.00002, 0.99998]);
    expect(Array.from(c.fluxErr)).toEqual([0.0001, 0.0001]);
  });

  it('reads a folded curve; phases need not be sorted and may repeat', () => {
    const c = parseCurveCsv('Phase,Flux,Flux_Err\n0.5,1,1e-4\n-0.25,1,1e-4\n0.5,1.00001,1e-4\n');
    expect(c.column).toBe('phase');
    expect(Array.from(c.x)).toEqual([0.5, -0.25, 0.5]);
  });

  it('names the header line when a column is missing', () => {
    const [msg] = issuesOf('# c1\n# c2\ntime,flux\n1,1,1\n');
    expect(msg).toMatch(/^c\.csv line 3: header lacks column flux_err \(found: time, flux\)/);
    expect(issuesOf('x,flux,flux_err\n1,1,1\n')[0]).toMatch(/line 1: header lacks column time \(or phase\)/);
    expect(issuesOf('time,phase,flux,flux_err\n1,0,1,1\n')[0]).toMatch(/line 1: header has both time and phase/);
  });

  it('names the line and column of a non-numeric or empty cell', () => {
    const issues = issuesOf('time,flux,flux_err\n1,1,0.001\n2,abc,0.001\n3,1,\n4,NaN,0.001\n5,0x10,0.001\n');
    expect(issues).toEqual([
      'c.csv line 3, flux: "abc" is not a number',
      'c.csv line 4, flux_err: empty cell',
      'c.csv line 5, flux: "NaN" is not a number',
      'c.csv line 6, flux: "0x10" is not a number',
    ]);
  });

  it('names a row with the wrong number of cells', () => {
    expect(issuesOf('time,flux,flux_err\n1,1,0.001\n2,1\n')).toEqual(['c.csv line 3: 2 cells, but the header (line 1) has 3']);
  });

  it('rejects a non-positive flux_err', () => {
    expect(issuesOf('time,flux,flux_err\n1,1,0\n2,1,-0.1\n')).toEqual([
      'c.csv line 2, flux_err: flux_err = 0: must be > 0',
      'c.csv line 3, flux_err: flux_err = -0.1: must be > 0',
    ]);
  });

  it('rejects unsorted and duplicate times with both line numbers', () => {
    expect(issuesOf('time,flux,flux_err\n1,1,0.001\n3,1,0.001\n2,1,0.001\n')).toEqual([
      'c.csv line 4, time: time 2 is earlier than 3 on line 3: times must be sorted (strictly increasing)',
    ]);
    expect(issuesOf('time,flux,flux_err\n1,1,0.001\n# comment\n1,1,0.001\n')).toEqual([
      'c.csv line 4, time: time 1 duplicates line 2: times must be strictly increasing',
    ]);
  });

  it('rejects a phase outside [-1, 1]', () => {
    expect(issuesOf('phase,flux,flux_err\n0.2,1,0.001\n2459000.5,1,0.001\n')[0]).toMatch(/^c\.csv line 3, phase: phase = 2459000.5: must be in \[-1, 1\]/);
  });

  it('rejects a file without a header or without data', () => {
    expect(issuesOf('# only a comment\n')[0]).toMatch(/no header row/);
    expect(issuesOf('')[0]).toMatch(/line 1: no header row/);
    expect(issuesOf('time,flux,flux_err\n# nothing\n')).toEqual(['c.csv line 1: no data rows after the header']);
  });

  it('stops after 20 problems', () => {
    const rows = Array.from({ length: 40 }, (_, i) => `${i},x,1`).join('\n');
    expect(issuesOf(`time,flux,flux_err\n${rows}\n`)).toHaveLength(20);
  });
});
