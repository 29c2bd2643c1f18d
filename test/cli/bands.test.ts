import { describe, expect, it } from 'vitest';
import { describeBand, listBuiltinBands } from '../../src/physics/bandpass.ts';
import { runCli } from '../helpers/run-cli.ts';

describe('hesper bands', () => {
  it('prints an aligned table of every built-in band with coverage, source and the approximate flag', async () => {
    const { code, stdout, stderr } = await runCli(['bands']);
    expect(code).toBe(0);
    expect(stderr).toBe('');
    const lines = stdout.split('\n');
    const header = lines[0]!;
    expect(header).toMatch(/^id\s+band\s+coverage \(nm\)\s+half max \(nm\)\s+shape\s+approximate\s+source$/);
    const rows = lines.slice(2, 2 + listBuiltinBands().length);
    // Every column starts at the same offset in every row (alignment).
    const columnStarts = ['coverage', 'shape', 'approximate', 'source'].map((c) => header.indexOf(c));
    for (const band of listBuiltinBands()) {
      const row = rows.find((r) => r.startsWith(`${band.id} `));
      expect(row, band.id).toBeDefined();
      expect(row!.slice(columnStarts[0]).startsWith(`${band.minNm}-${band.maxNm} `)).toBe(true);
      expect(row!.slice(columnStarts[1]).startsWith(band.shape)).toBe(true);
      expect(row!.slice(columnStarts[2]).startsWith(band.approximate ? 'yes' : 'no')).toBe(true);
      expect(row!.slice(columnStarts[3])).toBe(band.source);
    }
    expect(stdout).toMatch(/kepler\s+Kepler\s+420-900\s+430-840\s+trapezoid\s+yes/);
    expect(stdout).toMatch(/wavelength_nm,weight/); // the legend says how to give a real response curve
  });

  it('prints the same data as JSON with --json', async () => {
    const { code, stdout } = await runCli(['bands', '--json']);
    expect(code).toBe(0);
    const parsed = JSON.parse(stdout) as unknown[];
    expect(parsed).toEqual(listBuiltinBands().map(describeBand));
    expect(parsed).toHaveLength(8);
    expect(parsed[0]).toMatchObject({ id: 'kepler', minNm: 420, maxNm: 900, approximate: true, source: expect.stringMatching(/Kepler Instrument Handbook/) });
  });

  it('rejects an unknown option with exit code 2', async () => {
    const { code, stderr } = await runCli(['bands', '--csv']);
    expect(code).toBe(2);
    expect(stderr).toMatch(/unknown option/);
  });
});
