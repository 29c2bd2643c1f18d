import { parse } from '@retorquere/bibtex-parser';
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runCli } from '../helpers/run-cli.ts';
import { parseXml } from '../helpers/xml.ts';
import { cleanupTemp, tempDbPath, tempDir } from '../catalog/helpers.ts';

const demoDir = new URL('../../demo-data/', import.meta.url).pathname;
const db = tempDbPath();
afterAll(cleanupTemp);

describe('hesper interpret --report / --bib / --figure', () => {
  it('writes a LaTeX paragraph, a BibTeX file with every cited key, and an SVG figure', async () => {
    const out = tempDir('hesper-report-');
    const bib = path.join(out, 'refs.bib');
    const svg = path.join(out, 'ag.svg');
    const run = await runCli(['interpret', 'systems/aurelia-b.json', '--report', 'tex', '--bib', bib, '--figure', svg, '--db', db, '--samples', '1000'], { cwd: demoDir });
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/^% Composition paragraphs written by hesper for Aurelia b/);
    expect(run.stdout).toMatch(/Reflective clouds or ice are required/);
    expect(run.stderr).toMatch(/wrote \d+ BibTeX entries to/);
    const keys = [...run.stdout.matchAll(/\\cite(?:p|t|alt)\{([^}]*)\}/g)].flatMap((m) => m[1]!.split(','));
    const lib = parse(readFileSync(bib, 'utf8'));
    expect(lib.errors).toEqual([]);
    const inBib = new Set(lib.entries.map((e) => e.key));
    expect(keys.length).toBeGreaterThan(0);
    for (const k of keys) expect(inBib.has(k), k).toBe(true);
    expect(parseXml(readFileSync(svg, 'utf8')).name).toBe('svg');
  });

  it('prints the same numbers in --report md as in --json (same seed)', async () => {
    // Aurelia b (invented): an albedo the data measure (Corvina b's is prior-dominated and is not quoted as A_g = x +- y).
    const args = ['interpret', 'systems/aurelia-b.json', '--db', db, '--samples', '1000', '--seed', '5'];
    const json = JSON.parse((await runCli([...args, '--json'], { cwd: demoDir })).stdout);
    const md = (await runCli([...args, '--report', 'md'], { cwd: demoDir })).stdout;
    const m = /geometric albedo \$A_\\mathrm\{g\} = ([\d.]+)(?:\^\{\+([\d.]+)\}_\{-([\d.]+)\}| \\pm ([\d.]+))\$/.exec(md)!;
    const plus = m[2] ?? m[4]!;
    const minus = m[3] ?? m[4]!;
    expect(json.geometricAlbedo.constraint).toBe('measured');
    const ag = json.geometricAlbedo;
    const half = (t: string) => 0.5 * 10 ** -(t.split('.')[1]?.length ?? 0) + 1e-12;
    expect(Math.abs(Number(m[1]) - ag.median)).toBeLessThanOrEqual(half(m[1]!));
    expect(Math.abs(Number(plus) - (ag.upper68 - ag.median))).toBeLessThanOrEqual(half(plus));
    expect(Math.abs(Number(minus) - (ag.median - ag.lower68))).toBeLessThanOrEqual(half(minus));
    expect(md).toMatch(/Reflective clouds or ice are required/);
    expect(json.verdict.cloudsOrIceRequired).toBe('yes');
  });

  it('--json gains verdict, candidates, the required particle albedo and the phase offset, keeping the old fields', async () => {
    const run = await runCli(['interpret', 'systems/aurelia-b.json', '--json', '--db', db, '--samples', '800'], { cwd: demoDir });
    expect(run.code).toBe(0);
    const j = JSON.parse(run.stdout);
    for (const key of ['geometricAlbedo', 'bondAlbedo', 'daysideTemperatureK', 'thermalFraction', 'sensitivity', 'diagnostics', 'warnings', 'assumptions', 'detected']) expect(j).toHaveProperty(key);
    expect(Object.keys(j.verdict)).toEqual(expect.arrayContaining(['cloudsOrIceRequired', 'probability', 'reason']));
    expect(j.candidates.length).toBeGreaterThan(100);
    for (const c of j.candidates.slice(0, 5)) {
      expect(Object.keys(c)).toEqual(expect.arrayContaining(['id', 'name', 'category', 'status', 'reasons', 'geometricAlbedoRange', 'sources']));
      expect(c.geometricAlbedoRange).toHaveLength(2);
    }
    expect(j.requiredSingleScatteringAlbedo).toMatchObject({ lower68: expect.any(Number), median: expect.any(Number), upper68: expect.any(Number) });
    expect(j.phaseOffset).toMatchObject({ valueDeg: -9, sigmaDeg: 6, direction: 'west' });
    // the posterior's quantile grids stay out of the JSON
    expect(run.stdout).not.toMatch(/quantiles/);
  });

  it('the readable report ends with the verdict, the candidates and the paragraph', async () => {
    const run = await runCli(['interpret', 'fixtures/weak-detection.json', '--db', db, '--samples', '800'], { cwd: demoDir });
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/clouds or ice required: INCONCLUSIVE/);
    expect(run.stdout).toMatch(/catalog candidates \(\d+ entries/);
    expect(run.stdout).toMatch(/paragraph for the paper[^\n]*\n\nFor Fixture W \(invented\) we use/);
  });

  it('opens the catalog named by HESPER_DB when --db is absent', async () => {
    const other = tempDbPath();
    const run = await runCli(['interpret', 'systems/corvina-b.json', '--json', '--samples', '500'], { cwd: demoDir, env: { HESPER_DB: other } });
    expect(run.code).toBe(0);
    expect(existsSync(other)).toBe(true);
  });

  it('rejects --json with --report, an unknown format and an output over the input', async () => {
    const both = await runCli(['interpret', 'systems/corvina-b.json', '--json', '--report', 'md', '--db', db], { cwd: demoDir });
    expect(both.code).toBe(2);
    expect(both.stderr).toMatch(/--report: give --json or --report, not both/);
    const format = await runCli(['interpret', 'systems/corvina-b.json', '--report', 'docx', '--db', db], { cwd: demoDir });
    expect(format.code).toBe(2);
    expect(format.stderr).toMatch(/md, tex/);
    const over = await runCli(['interpret', 'systems/corvina-b.json', '--bib', 'systems/corvina-b.json', '--db', db, '--samples', '300'], { cwd: demoDir });
    expect(over.code).toBe(2);
    expect(over.stderr).toMatch(/--bib .* is the input file/);
  });
});

describe('hesper demo', () => {
  it('ends each invented planet with its verdict, candidates and a paragraph', async () => {
    const run = await runCli(['demo', '--db', db], { cwd: demoDir });
    expect(run.code).toBe(0);
    const sections = run.stdout.split(/^={78}$/m).slice(1);
    expect(sections).toHaveLength(3);
    for (const s of sections) {
      expect(s).toMatch(/clouds or ice required: (YES|NO|INCONCLUSIVE)/);
      expect(s).toMatch(/catalog candidates/);
      expect(s).toMatch(/paragraph for the paper/);
    }
    const section = (file: string) => sections.find((s) => s.includes(file))!;
    expect(section('aurelia-b.json')).toMatch(/clouds or ice required: YES/);
    expect(section('corvina-b.json')).toMatch(/clouds or ice required: NO/);
  });
});
