/** The readable terminal report of an interpretation (`hesper interpret FILE`). */
import type { AlbedoPosterior } from '../inference/types.ts';
import type { Summary } from '../inference/summary.ts';
import type { Interpretation } from '../interpret/types.ts';
import { fmtSig, renderTable } from './table.ts';
import { interpretationSections } from './text-interpretation.ts';

export interface TextReportOptions {
  /** The composition paragraph(s) to print at the end (Markdown text). */
  paragraph?: string;
}

function isInterpretation(r: AlbedoPosterior): r is Interpretation {
  return 'verdict' in r && 'candidates' in r;
}

const ROWS: Array<[keyof AlbedoPosterior, string, number]> = [
  ['geometricAlbedo', 'geometric albedo A_g', 3],
  ['bondAlbedo', 'Bond albedo A_B', 3],
  ['daysideTemperatureK', 'dayside temperature [K]', 4],
  ['equilibriumTemperatureK', 'equilibrium temperature [K]', 4],
  ['thermalDepthPpm', 'thermal depth [ppm]', 3],
  ['reflectedDepthPpm', 'reflected depth [ppm]', 3],
  ['thermalFraction', 'thermal share of depth', 2],
  ['allReflectedGeometricAlbedo', 'A_g if all light were reflected', 3],
];

function summaryRow(label: string, s: Summary, digits: number): string[] {
  const f = (x: number) => fmtSig(x, digits);
  return [label, f(s.median), `${f(s.lower68)} - ${f(s.upper68)}`, `${f(s.lower95)} - ${f(s.upper95)}`, f(s.upperLimit95)];
}

export function posteriorTable(r: AlbedoPosterior): string {
  const rows = ROWS.map(([key, label, digits]) => summaryRow(label, r[key] as Summary, digits));
  return renderTable(['quantity', 'median', '68 % interval', '95 % interval', '95 % upper'], rows, ['left', 'right', 'right', 'right', 'right']);
}

export function sensitivityTable(r: AlbedoPosterior): string {
  const rows = r.sensitivity.map((c) => [
    String(c.redistribution), String(c.phaseIntegral), fmtSig(c.geometricAlbedo.median), `${fmtSig(c.geometricAlbedo.lower68)} - ${fmtSig(c.geometricAlbedo.upper68)}`, fmtSig(c.geometricAlbedo.upperLimit95),
    c.deltaChiSquare === null ? 'no fit' : fmtSig(c.deltaChiSquare, 3), c.ruledOut ? 'ruled out' : 'allowed',
  ]);
  return renderTable(['eps', 'q', 'A_g median', '68 % interval', '95 % upper', 'Delta chi^2', 'data'], rows, ['right', 'right', 'right', 'right', 'right', 'right', 'left']);
}

const MAP_WORDS = { uniform: 'a uniform dayside', 'local-equilibrium': 'a dayside in local equilibrium' } as const;

/** How much the dayside map moves A_g (same draws, both maps). */
export function dayMapLines(r: AlbedoPosterior): string[] {
  const t = r.thermalMapSensitivity;
  if (!t || !Number.isFinite(t.geometricAlbedoUsed.median) || !Number.isFinite(t.geometricAlbedoAlternative.median)) return [];
  return [`  dayside map: median A_g ${fmtSig(t.geometricAlbedoUsed.median, 3)} with ${MAP_WORDS[t.used]} (used), ${fmtSig(t.geometricAlbedoAlternative.median, 3)} with ${MAP_WORDS[t.alternative]} (shift ${t.medianShift >= 0 ? '+' : ''}${fmtSig(t.medianShift, 2)}, same draws)`];
}

/** The albedo line: how the data constrain A_g, in words a referee would accept. */
export function albedoLines(r: AlbedoPosterior): string[] {
  const g = r.geometricAlbedo;
  const f = (x: number) => fmtSig(x, 2);
  const eclipse = `eclipse signal detected at >= 3 sigma: ${r.detected ? 'yes' : 'no'}; reflected light detected: ${r.reflectedLightDetected ? 'yes' : 'no'}`;
  if (!r.modelFit.reproducesData) return [eclipse, 'albedo constraint: none (the model cannot reproduce the data; see the problems above)'];
  if (g.constraint === 'measured') return [eclipse, `albedo constraint: measured, A_g = ${fmtSig(g.median, 3)} (68 %: ${fmtSig(g.lower68, 3)} - ${fmtSig(g.upper68, 3)}), bounded away from 0 at 95 % and the same at every allowed eps, q corner`];
  if (g.constraint === 'upper-limit') return [eclipse, `albedo constraint: upper limit, A_g < ${f(g.upperLimit95)} (95 %); consistent with 0 at 95 %`];
  const allowed = r.sensitivity.filter((c) => !c.ruledOut && Number.isFinite(c.geometricAlbedo.median));
  const lo = allowed.reduce((a, b) => (b.geometricAlbedo.median < a.geometricAlbedo.median ? b : a));
  const hi = allowed.reduce((a, b) => (b.geometricAlbedo.median > a.geometricAlbedo.median ? b : a));
  return [
    eclipse,
    `albedo constraint: prior-dominated: A_g runs from ${f(lo.geometricAlbedo.median)} (eps = ${lo.redistribution}, q = ${lo.phaseIntegral}) to ${f(hi.geometricAlbedo.median)} (eps = ${hi.redistribution}, q = ${hi.phaseIntegral}) with the assumptions (95 % upper limit ${f(g.upperLimit95)} over the priors);`,
    '  the value follows the assumed heat redistribution and phase integral, not the data: an infrared eclipse or a measured dayside temperature would break the degeneracy',
  ];
}

export function massEffectsTable(r: AlbedoPosterior): string | undefined {
  const m = r.massEffects;
  if (!m) return undefined;
  return renderTable(['predicted stellar signal', 'median', '68 % interval'], [
    summaryRow('ellipsoidal semi-amplitude [ppm]', m.ellipsoidalPpm, 3).slice(0, 3),
    summaryRow('beaming semi-amplitude [ppm]', m.beamingPpm, 3).slice(0, 3),
    summaryRow('RV semi-amplitude [m/s]', m.rvSemiAmplitudeMs, 3).slice(0, 3),
  ], ['left', 'right', 'right']);
}

export function bulletList(title: string, items: string[]): string {
  if (items.length === 0) return `${title}: none`;
  return [`${title}:`, ...items.map((i) => `  - ${i}`)].join('\n');
}

export function textReport(r: AlbedoPosterior | Interpretation, options: TextReportOptions = {}): string {
  const parts = [`${r.name}: band ${r.band.id} (${r.band.minNm}-${r.band.maxNm} nm${r.band.approximate ? ', approximate' : ''}), ${r.band.weighting}-weighted`];
  if (!r.modelFit.reproducesData) {
    parts.push('', bulletList('THE MODEL CANNOT REPRODUCE THE DATA (the posteriors below are not meaningful)', r.modelFit.problems));
  }
  parts.push(
    '',
    posteriorTable(r),
    '',
    ...albedoLines(r),
    '',
    'sensitivity of A_g to the redistribution eps and phase integral q (corners at the edges of their priors; Delta chi^2 against the best fit):',
    sensitivityTable(r),
    `  ${r.phaseIntegralPreference}`,
    ...dayMapLines(r),
  );
  const mass = massEffectsTable(r);
  if (mass) parts.push('', mass);
  if (isInterpretation(r)) parts.push(...interpretationSections(r));
  parts.push('', bulletList('assumptions that drove the result', r.assumptions), '', bulletList('warnings', r.warnings));
  const d = r.diagnostics;
  parts.push('', `diagnostics: ${d.samples} draws x ${d.gridNodes} grid nodes, effective sample size ${fmtSig(d.effectiveSampleSize, 4)}, seed ${d.seed}, ${fmtSig(d.computeMs, 3)} ms`);
  if (options.paragraph) parts.push('', 'paragraph for the paper (Markdown; `--report tex` for LaTeX):', '', options.paragraph.trimEnd());
  return parts.join('\n');
}
