/**
 * `hesper decompose` on FITS light curves: two invented sectors of the invented planet
 * Tessaly b written by astropy (test/fixtures/fits/make-fits-fixtures.py), with
 * different normalisations and linear trends that the fit must absorb jointly with the
 * signals; files with the wrong columns and malformed files exit 2.
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import type { CliIo } from '../../src/cli/io.ts';
import { main } from '../../src/cli/main.ts';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const FIX = 'test/fixtures/fits/';
const SECTORS = [`${FIX}tessaly-b-s1.fits`, `${FIX}tessaly-b-s2.fits`];
const SYSTEM = ['--system', 'demo-data/systems/tessaly-b.json'];
const TRUTH = JSON.parse(readFileSync(path.join(ROOT, FIX, 'injected.json'), 'utf8'));

async function run(argv: string[], cwd = ROOT): Promise<{ code: number; out: string; err: string }> {
  const stdout: string[] = [];
  const stderr: string[] = [];
  const io: CliIo = { out: (t) => stdout.push(t), err: (t) => stderr.push(t), cwd, env: {} };
  const code = await main(argv, io);
  return { code, out: stdout.join('\n'), err: stderr.join('\n') };
}

type VS = { value: number; sigma: number };
const pull = (q: VS, truth: number): number => (q.value - truth) / q.sigma;

describe('hesper decompose: two FITS sectors with their own normalisations and trends', () => {
  it('recovers the injected signals within 3 sigma, with 4 segments and 4 trend terms', async () => {
    const r = await run(['decompose', ...SECTORS, ...SYSTEM, '--json']);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    // Injected (invented) values: injected.json, written by make-fits-fixtures.py.
    const pulls = {
      eclipseDepthPpm: pull(j.eclipseDepthPpm, TRUTH.eclipseDepthPpm),
      phaseAmplitudePpm: pull(j.phaseAmplitudePpm, TRUTH.phaseAmplitudePpm),
      ellipsoidalAmplitudePpm: pull(j.ellipsoidalAmplitudePpm, TRUTH.ellipsoidalAmplitudePpm),
      beamingAmplitudePpm: pull(j.beamingAmplitudePpm, TRUTH.beamingAmplitudePpm),
    };
    for (const [k, p] of Object.entries(pulls)) expect(Math.abs(p), k).toBeLessThan(3);
    // Each sector has a 1-day gap in its middle (injected.json gapInSectorDays), longer
    // than the 0.5-day default: 2 files x 2 segments, each with a linear trend.
    expect(j.segments).toHaveLength(4);
    expect(j.segments.map((s: { file: string }) => s.file)).toEqual([SECTORS[0], SECTORS[0], SECTORS[1], SECTORS[1]]);
    expect(j.segments.every((s: { trendOrder: number }) => s.trendOrder === 1)).toBe(true);
    expect(j.trendTerms).toBe(4);
    expect(j.linearFit.names.slice(0, 8)).toEqual([
      'segment1.constant', 'segment1.trend1', 'segment2.constant', 'segment2.trend1',
      'segment3.constant', 'segment3.trend1', 'segment4.constant', 'segment4.trend1',
    ]);
    expect(j.segments.reduce((n: number, s: { points: number }) => n + s.points, 0)).toBe(j.points);
    // The sectors start at BJD 2460410.5 and 2460438.5 (make-fits-fixtures.py).
    expect(j.segments[0].start).toBeGreaterThanOrEqual(2460410.5);
    expect(j.segments[2].start).toBeGreaterThanOrEqual(2460438.5);
    expect(j.files.map((f: { format: string }) => f.format)).toEqual(['fits', 'fits']);
    // derived: the residuals are the injected 200 ppm white noise, so chi-square/dof ~ 1
    // within a few sqrt(2/dof) = 0.025.
    expect(j.reducedChiSquare).toBeGreaterThan(0.9);
    expect(j.reducedChiSquare).toBeLessThan(1.1);
    // The depth-amplitude covariance comes from the same fit as the trends.
    expect(j.covariance.names).toContain('eclipseDepthPpm');
  });

  it('without the trends the fit fails its chi-square; unmasked quality flags bias it', async () => {
    const flat = JSON.parse((await run(['decompose', ...SECTORS, ...SYSTEM, '--trend-order', '0', '--json'])).out);
    expect(flat.trendTerms).toBe(0);
    // derived: the injected drifts of 0.15 % and 0.2 % per sector (injected.json) are
    // far larger than the 200 ppm noise, so a constant per segment cannot fit them.
    expect(flat.reducedChiSquare).toBeGreaterThan(1.5);
    expect(flat.warnings.join(' ')).toMatch(/reduced chi-square/);
    const unmasked = JSON.parse((await run(['decompose', ...SECTORS, ...SYSTEM, '--quality-mask', '0', '--json'])).out);
    // The flagged cadences carry +5000 ppm (make-fits-fixtures.py).
    expect(unmasked.reducedChiSquare).toBeGreaterThan(3);
    expect(unmasked.files[0].dropped.quality).toBe(0);
  });

  it('the readable report lists the files and the segments', async () => {
    const r = await run(['decompose', ...SECTORS, ...SYSTEM]);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/tessaly-b-s1.fits \(FITS extension 1 \(LIGHTCURVE\)\): 1814 of 1872 rows used; 37 masked by QUALITY flags; 21 with NaN dropped; TIME \+ 2457000 d \(TDB\)/);
    expect(r.out).toMatch(/TIME \+ 2456999.75 d/);
    expect(r.out).toMatch(/baseline: 4 segments, 4 trend terms \(gap 0.5 d, trend order 1\)/);
  });
});

describe('hesper decompose: bad FITS input exits 2 naming the file and the problem', () => {
  it('wrong column names: the missing column and the columns present', async () => {
    const r = await run(['decompose', `${FIX}wrong-columns.fits`, ...SYSTEM]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/error \[bad-light-curve\]/);
    expect(r.err).toMatch(/wrong-columns.fits, extension 1 \(RATES\): no flux column: none of PDCSAP_FLUX, SAP_FLUX, FLUX is present/);
    expect(r.err).toMatch(/columns present: TIME, RATE, RATE_ERROR, FLAGS/);
    expect(r.out).toBe('');
    const chosen = await run(['decompose', `${FIX}wrong-columns.fits`, ...SYSTEM, '--flux-column', 'RATE', '--flux-error-column', 'RATE_ERR']);
    expect(chosen.code).toBe(2);
    expect(chosen.err).toMatch(/no flux-error column RATE_ERR; columns present/);
  });

  it('truncated, corrupt header, absurd NAXIS2', async () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), 'hesper-badfits-'));
    const good = readFileSync(path.join(ROOT, SECTORS[0]!));
    writeFileSync(path.join(dir, 'truncated.fits'), good.subarray(0, 2880 * 3 + 100));
    const corrupt = Buffer.from(good);
    corrupt[2880 + 80 * 2 + 5] = 0;
    writeFileSync(path.join(dir, 'corrupt.fits'), corrupt);
    const absurd = Buffer.from(good);
    const text = absurd.toString('latin1', 2880, 2880 * 2);
    const at = 2880 + text.indexOf('NAXIS2  =');
    absurd.write(`NAXIS2  = ${'99999999999999'.padStart(20)}`, at, 'latin1');
    writeFileSync(path.join(dir, 'absurd.fits'), absurd);
    const cases: Array<[string, RegExp]> = [
      ['truncated.fits', /truncated.fits: extension 1 header: the data unit .* needs at least \d+ bytes but only \d+ bytes are left/],
      ['corrupt.fits', /corrupt.fits: extension 1 header, card 3: byte 0 at column 6 is not printable ASCII/],
      ['absurd.fits', /absurd.fits: extension 1 header: the data unit \(NAXIS1 = 36, NAXIS2 = 99999999999999\) needs at least/],
    ];
    for (const [file, pattern] of cases) {
      const r = await run(['decompose', file, '--period', '1.27', '--epoch', '2460410.3172', '--duration', '3'], dir);
      expect(r.code, file).toBe(2);
      expect(r.err, file).toMatch(/error \[bad-fits\]/);
      expect(r.err, file).toMatch(pattern);
    }
  });

  it('bad option values', async () => {
    const mask = await run(['decompose', ...SECTORS, ...SYSTEM, '--quality-mask', 'lots']);
    expect(mask.code).toBe(2);
    expect(mask.err).toMatch(/--quality-mask lots: give the bits as a whole number/);
    const order = await run(['decompose', ...SECTORS, ...SYSTEM, '--trend-order', '9']);
    expect(order.code).toBe(2);
    expect(order.err).toMatch(/--trend-order 9: must be an integer in \[0, 5\]/);
    const gap = await run(['decompose', ...SECTORS, ...SYSTEM, '--gap', '0']);
    expect(gap.code).toBe(2);
    expect(gap.err).toMatch(/--gap 0: must be > 0 days/);
  });
});
