/**
 * The figure of the write-up: the A_g posterior (top) and the geometric-albedo
 * intervals of the candidates shown (bottom) on one albedo axis, with the cloud-free
 * ceiling as a dashed line. A vega-lite specification compiled to vega and rendered
 * to SVG headless (View.toSVG with renderer "none": no browser, no canvas). Readable in
 * black and white: status is told by the point shape and the line dash, and each row
 * names its candidate and status.
 */
import type { TopLevelSpec } from 'vega-lite';
import { cdfAt, quantileOf } from '../interpret/posterior-grid.ts';
import type { Candidate, Interpretation } from '../interpret/types.ts';
import { proseName } from './wording-candidates.ts';

/** Candidates drawn (our choice: a figure stays readable with about a dozen rows). */
export const FIGURE_ROWS = { consistent: 5, marginal: 3, excluded: 4 } as const;
const HISTOGRAM_BINS = 40;
const NOT_MATERIALS = new Set(['model', 'body']);

/** The candidates a figure shows: leading consistent, marginal and excluded materials, plus the ceiling entry. */
export function figureCandidates(i: Interpretation): Candidate[] {
  const materials = i.candidates.filter((c) => !NOT_MATERIALS.has(c.category) && c.checks.surface === 'ok');
  const pick = (status: Candidate['status'], n: number) => {
    const out: Candidate[] = [];
    const seen = new Set<string>();
    for (const c of materials.filter((x) => x.status === status)) {
      const k = proseName(c).replace(/\s*\(Mie.*$/, '').toLowerCase();
      if (seen.has(k)) continue;
      seen.add(k);
      out.push(c);
      if (out.length >= n) break;
    }
    return out;
  };
  const shown = [...pick('consistent', FIGURE_ROWS.consistent), ...pick('marginal', FIGURE_ROWS.marginal), ...pick('excluded', FIGURE_ROWS.excluded)];
  const ceiling = i.verdict.ceiling && i.candidates.find((c) => c.id === i.verdict.ceiling!.entryId);
  if (ceiling && !shown.some((c) => c.id === ceiling.id)) shown.unshift(ceiling);
  return shown;
}

/** Longest candidate name in a row label (our choice: about the width of the plot at 10 px type). */
const LABEL_CHARS = 72;
const ROW_STEP_PX = 30;
const PLOT_WIDTH_PX = 520;

/** A candidate's name for a row: Mie grains shortened to "MnS, 0.1 µm grains". */
function rowName(c: Candidate): string {
  const mie = /^(.*?),\s*r_eff\s+([\d.]+)\s*um\s*\(Mie\)$/.exec(c.name);
  return mie ? `${mie[1]}, ${mie[2]} µm grains` : proseName(c);
}

/** Row label: the candidate's name (shortened) and status. */
export function rowLabel(c: Candidate): string {
  const name = rowName(c);
  const short = name.length > LABEL_CHARS ? `${name.slice(0, LABEL_CHARS - 1)}…` : name;
  return `${short} [${c.status}]`;
}

export interface FigureRow {
  /** Unique key of the row (its position), so equal labels never share a row. */
  row: string;
  id: string;
  label: string;
  status: Candidate['status'];
  lo: number;
  hi: number;
  nominal: number;
}

/**
 * One row per candidate shown, each with a label of its own: labels that come out
 * equal (names cut at the same length, or repeated names) get an index, "#1", "#2".
 */
export function figureRows(shown: readonly Candidate[]): FigureRow[] {
  const labels = shown.map(rowLabel);
  const count = new Map<string, number>();
  for (const l of labels) count.set(l, (count.get(l) ?? 0) + 1);
  const seen = new Map<string, number>();
  return shown.map((c, k) => {
    const base = labels[k]!;
    let label = base;
    if (count.get(base)! > 1) {
      const n = (seen.get(base) ?? 0) + 1;
      seen.set(base, n);
      label = base.replace(/ \[(consistent|marginal|excluded)\]$/, ` #${n} [$1]`);
    }
    return { row: String(k).padStart(3, '0'), id: c.id, label, status: c.status, lo: c.geometricAlbedoRange[0], hi: c.geometricAlbedoRange[1], nominal: c.geometricAlbedoNominal };
  });
}

export function figureSpec(i: Interpretation, geometricAlbedoGrid: Float64Array): TopLevelSpec {
  const shown = figureCandidates(i);
  const hiData = Math.max(quantileOf(geometricAlbedoGrid, 0.999), ...shown.map((c) => c.geometricAlbedoRange[1]), i.verdict.ceiling?.geometricAlbedo ?? 0);
  const xMax = Math.min(1.5, Math.max(0.1, Math.ceil(hiData * 20 + 0.5) / 20));
  const width = xMax / HISTOGRAM_BINS;
  const bins = Array.from({ length: HISTOGRAM_BINS }, (_, k) => {
    const a = k * width;
    const b = a + width;
    return { lo: a, hi: b, density: (cdfAt(geometricAlbedoGrid, b) - cdfAt(geometricAlbedoGrid, a)) / width };
  });
  const rows = figureRows(shown);
  const x = { scale: { domain: [0, xMax], nice: false, zero: true } };
  const band = `${i.band.label} band, ${Math.round(i.band.minNm)}-${Math.round(i.band.maxNm)} nm`;
  const ceiling = i.verdict.ceiling
    ? [{ ag: i.verdict.ceiling.geometricAlbedo, text: `cloud-free ceiling ${i.verdict.ceiling.geometricAlbedo.toFixed(2)}` }]
    : [];
  const ceilingOnRight = (i.verdict.ceiling?.geometricAlbedo ?? 0) > xMax / 2;
  const ceilingLayers = ceiling.length === 0 ? [] : [
    { data: { values: ceiling }, mark: { type: 'rule' as const, strokeDash: [6, 4], color: 'black' }, encoding: { x: { field: 'ag', type: 'quantitative' as const } } },
  ];
  const rowY = { field: 'row', type: 'nominal' as const, sort: null, title: null, axis: null, scale: { paddingInner: 0, paddingOuter: 0.2 } };
  const statusScale = { domain: ['consistent', 'marginal', 'excluded'], range: ['circle', 'square', 'cross'] };
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    description: `Geometric albedo of ${i.name} and the catalog candidates shown`,
    title: {
      text: `${i.name}: geometric albedo and catalog candidates`,
      // Short lines: the layout measures text by an estimate, and one long line would widen the figure.
      subtitle: [`clouds or ice required: ${i.verdict.cloudsOrIceRequired}`, 'rows: catalog candidates [status]', 'intervals converted to A_g in this band'],
      anchor: 'start',
    },
    config: { font: 'Helvetica, Arial, sans-serif', axis: { labelColor: 'black', titleColor: 'black', gridColor: '#dddddd' }, view: { stroke: 'black' } },
    resolve: { scale: { x: 'shared' } },
    vconcat: [
      {
        width: PLOT_WIDTH_PX,
        height: 160,
        layer: [
          {
            data: { values: bins },
            mark: { type: 'rect', fill: '#bbbbbb', stroke: 'black', strokeWidth: 0.5 },
            encoding: {
              x: { field: 'lo', type: 'quantitative', ...x, title: null, axis: { labels: false, ticks: true } },
              x2: { field: 'hi' },
              y: { field: 'density', type: 'quantitative', title: ['posterior density', '(per unit A_g)'] },
            },
          },
          ...ceilingLayers,
          ...(ceiling.length === 0 ? [] : [{
            data: { values: ceiling },
            // beside the line, on the side with room, so the text stays inside the plot
            mark: { type: 'text' as const, align: ceilingOnRight ? 'right' as const : 'left' as const, dx: ceilingOnRight ? -4 : 4, dy: -4, baseline: 'bottom' as const, fontSize: 11, color: 'black' },
            encoding: { x: { field: 'ag', type: 'quantitative' as const }, y: { value: 12 }, text: { field: 'text', type: 'nominal' as const } },
          }]),
        ],
      },
      {
        // Labels are drawn inside the plot above each interval, so the left margin is
        // only the width of the histogram's density axis.
        width: PLOT_WIDTH_PX,
        height: { step: ROW_STEP_PX },
        layer: [
          {
            data: { values: rows },
            mark: { type: 'rule', strokeWidth: 2, color: 'black', yOffset: 4 },
            encoding: {
              y: rowY,
              x: { field: 'lo', type: 'quantitative', ...x, title: `geometric albedo A_g (dimensionless; ${band})` },
              x2: { field: 'hi' },
              strokeDash: { field: 'status', type: 'nominal', scale: { domain: statusScale.domain, range: [[1, 0], [6, 3], [2, 2]] }, legend: { title: 'status', orient: 'bottom' } },
            },
          },
          {
            data: { values: rows },
            mark: { type: 'point', filled: false, size: 50, color: 'black', strokeWidth: 1.5, yOffset: 4 },
            encoding: {
              y: rowY,
              x: { field: 'nominal', type: 'quantitative' },
              shape: { field: 'status', type: 'nominal', scale: statusScale, legend: { title: 'status', orient: 'bottom' } },
            },
          },
          {
            data: { values: rows },
            // clip: the layout estimates text widths generously (0.8 em a character), so
            // unclipped labels would widen the figure; at 10 px they fit the plot.
            mark: { type: 'text', align: 'left', baseline: 'bottom', dx: 3, yOffset: -3, fontSize: 10, color: 'black', clip: true },
            encoding: { y: rowY, x: { value: 0 }, text: { field: 'label', type: 'nominal' } },
          },
          ...ceilingLayers,
        ],
      },
    ],
  } as TopLevelSpec;
}

/** Collects compiler messages instead of printing them (stdout carries results only). */
function quietLogger(messages: string[]) {
  const keep = (...args: unknown[]) => {
    messages.push(args.map(String).join(' '));
    return logger;
  };
  const logger = { level: () => logger, error: keep, warn: keep, info: keep, debug: keep };
  return logger;
}

/** The figure as SVG text, rendered without a browser. */
export async function figureSvg(i: Interpretation, geometricAlbedoGrid: Float64Array): Promise<string> {
  // vega takes about half a second to load: only runs that draw a figure pay for it.
  const [vega, vl] = await Promise.all([import('vega'), import('vega-lite')]);
  const messages: string[] = [];
  const compiled = vl.compile(figureSpec(i, geometricAlbedoGrid), { logger: quietLogger(messages) as never }).spec;
  const view = new vega.View(vega.parse(compiled), { renderer: 'none', logLevel: vega.None });
  try {
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}
