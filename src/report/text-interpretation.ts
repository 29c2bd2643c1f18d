/**
 * The interpretation sections of the readable terminal report: the verdict, the
 * particle albedo a thick cloud would need, the phase offset, and a table of the
 * leading, marginal and excluded candidates (the full ranked list is in --json).
 */
import type { Candidate, Interpretation } from '../interpret/types.ts';
import { fmtAlbedo, fmtRange } from '../interpret/match.ts';
import { renderTable } from './table.ts';

/** Rows of the candidates table per status (our choice: one screen). */
export const TABLE_ROWS = { consistent: 10, marginal: 5, untested: 5, excluded: 5 } as const;

/** The conversion to A_g in a few words. */
const CONVERSION: Record<string, string> = {
  geometric: 'A_g as given',
  bond: 'Bond albedo / q',
  spherical: 'spherical albedo / q',
  surface: 'Lambert sphere, A_g = 2r/3',
  'single-scattering': 'A_g(w), isotropic H-function',
};

/** The reason that decided an entry's status (the first one that is not a plain pass). */
function mainReason(c: Candidate): string {
  const failing = c.reasons.filter((r) => !/^(albedo:|converted:|temperature:)/.test(r));
  if (c.status === 'untested') return c.reasons.find((r) => r.startsWith('temperature untested')) ?? failing[0] ?? '';
  return failing[0] ?? c.reasons[0] ?? '';
}

function clip(text: string, n: number): string {
  return text.length > n ? `${text.slice(0, n - 3)}...` : text;
}

export function candidatesTable(i: Interpretation): string {
  const rows: string[][] = [];
  for (const status of ['consistent', 'marginal', 'untested', 'excluded'] as const) {
    const list = i.candidates.filter((c) => c.status === status);
    for (const c of list.slice(0, TABLE_ROWS[status])) {
      rows.push([status, fmtRange(c.geometricAlbedoRange[0], c.geometricAlbedoRange[1]), c.probability.toFixed(3), clip(c.name, 52), clip(status === 'consistent' ? CONVERSION[c.quantity] ?? c.conversion : mainReason(c), 100)]);
    }
    if (list.length > TABLE_ROWS[status]) rows.push([status, '', '', `... ${list.length - TABLE_ROWS[status]} more`, '']);
  }
  return renderTable(['status', 'A_g range', 'P(inside)', 'candidate', 'why'], rows, ['left', 'right', 'right', 'left', 'left']);
}

export function verdictLines(i: Interpretation): string[] {
  const v = i.verdict;
  const p = v.probability === null ? 'n/a' : v.probability.toFixed(3);
  const ref = v.reference
    ? `  reference: ${v.reference.name} [${v.reference.regime}], A_g up to ${fmtAlbedo(v.reference.geometricAlbedoCeiling)}${v.reference.sources.length > 0 ? ` (${v.reference.sources.join(', ')})` : ''}`
    : '  reference: none for this planet\'s regime';
  return [`clouds or ice required: ${v.cloudsOrIceRequired.toUpperCase()} (P(A_g > ceiling) = ${p})`, ref, `  ${v.reason}`];
}

export function particleLines(i: Interpretation): string[] {
  const r = i.requiredSingleScatteringAlbedo;
  const reach = r.reachedBy.filter((p) => p.withinRange).map((p) => `${p.name} [${p.status}]`);
  return [
    `single-scattering albedo a thick isotropic cloud needs: ${r.median.toFixed(4)} (68 %: ${r.lower68.toFixed(4)} - ${r.upper68.toFixed(4)})`,
    `  ${r.note}`,
    `  catalog particles inside that range: ${reach.length === 0 ? 'none' : reach.slice(0, 8).join('; ')}${reach.length > 8 ? `; ... ${reach.length - 8} more` : ''}`,
  ];
}

export function phaseOffsetLines(i: Interpretation): string[] {
  return i.phaseOffset ? [`phase offset: ${i.phaseOffset.interpretation}`] : [];
}

/** The interpretation block of the text report. */
export function interpretationSections(i: Interpretation): string[] {
  const parts = ['', ...verdictLines(i), '', ...particleLines(i)];
  const phase = phaseOffsetLines(i);
  if (phase.length > 0) parts.push('', ...phase);
  if (i.candidates.length > 0) {
    parts.push('', `catalog candidates (${i.candidates.length} entries, A_g ranges in this band; ceiling ${i.verdict.ceiling ? fmtAlbedo(i.verdict.ceiling.geometricAlbedo) : 'n/a'}):`, candidatesTable(i));
  }
  return parts;
}
