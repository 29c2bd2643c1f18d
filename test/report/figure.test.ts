import { describe, expect, it } from 'vitest';
import { interpretSystemDetailed } from '../../src/interpret/run.ts';
import type { Interpretation } from '../../src/interpret/types.ts';
import { figureCandidates, figureRows, figureSpec, figureSvg } from '../../src/report/figure.ts';
import { allElements, parseXml, type XmlElement } from '../helpers/xml.ts';
import { loadDemo } from '../inference/helpers.ts';
import { seededCatalog } from '../interpret/helpers.ts';

const { data } = seededCatalog();
const d = interpretSystemDetailed(loadDemo('systems/aurelia-b.json'), { catalog: data, samples: 1500, seed: 3 });

/** The text of a text element, its lines (tspans) joined by a space. */
function textOf(e: XmlElement): string {
  return [e.text, ...e.children.filter((c) => c.name === 'tspan').map((c) => c.text)].filter((t) => t !== '').join(' ');
}

/** SVG text content, with the character entities decoded by the XML parser. */
function texts(svg: string): string[] {
  return allElements(parseXml(svg)).filter((e) => e.name === 'text').map(textOf);
}

/** The translate() of an element's transform attribute, [0, 0] when it has none. */
function translation(e: XmlElement): [number, number] {
  const m = /translate\(([-\d.]+)[ ,]+([-\d.]+)\)/.exec(e.attrs.transform ?? '');
  return m ? [Number(m[1]), Number(m[2])] : [0, 0];
}

/** Text elements whose text is `text`. */
function textElements(svg: string, text: string): XmlElement[] {
  return allElements(parseXml(svg)).filter((e) => e.name === 'text' && textOf(e) === text);
}

/** The interpretation with two candidates of one status renamed to names that differ only after a long shared prefix. */
function twinNames(): { i: Interpretation; ids: [string, string] } {
  const i: Interpretation = JSON.parse(JSON.stringify(d.interpretation));
  const shown = figureCandidates(i);
  const first = shown.find((c, k) => shown.some((o, m) => m !== k && o.status === c.status && o.id !== i.verdict.ceiling?.entryId) && c.id !== i.verdict.ceiling?.entryId)!;
  const second = shown.find((c) => c.id !== first.id && c.status === first.status && c.id !== i.verdict.ceiling?.entryId)!;
  const prefix = 'Rayleigh-scattering clear hydrogen-helium atmosphere above a deep cloud deck of invented test grains';
  i.candidates.find((c) => c.id === first.id)!.name = `${prefix}, variant one`;
  i.candidates.find((c) => c.id === second.id)!.name = `${prefix}, variant two`;
  return { i, ids: [first.id, second.id] };
}

describe('the A_g figure (vega-lite rendered to SVG without a browser)', () => {
  it('parses as XML with an svg root', async () => {
    const svg = await figureSvg(d.interpretation, d.quantiles.geometricAlbedo);
    const root = parseXml(svg);
    expect(root.name).toBe('svg');
    expect(root.attrs.xmlns).toBe('http://www.w3.org/2000/svg');
  });

  it('names every candidate it shows, with its status', async () => {
    const svg = await figureSvg(d.interpretation, d.quantiles.geometricAlbedo);
    const shown = figureCandidates(d.interpretation);
    expect(shown.length).toBeGreaterThanOrEqual(5);
    const labels = texts(svg);
    const rows = figureRows(shown);
    expect(rows.map((r) => r.id)).toEqual(shown.map((c) => c.id));
    for (const r of rows) expect(labels, r.id).toContain(r.label);
    expect(shown.map((c) => c.status)).toEqual(expect.arrayContaining(['consistent', 'excluded']));
    // the cloud-free ceiling entry is among them and marked on the axis
    expect(shown.some((c) => c.id === d.interpretation.verdict.ceiling!.entryId)).toBe(true);
    expect(labels.some((t) => /^cloud-free ceiling 0\.\d\d$/.test(t))).toBe(true);
  });

  it('labels its axes with units', async () => {
    const labels = texts(await figureSvg(d.interpretation, d.quantiles.geometricAlbedo));
    expect(labels).toContain('geometric albedo A_g (dimensionless; CHEOPS band, 400-1050 nm)');
    expect(labels).toContain('posterior density (per unit A_g)');
    expect(labels).toContain('status');
  });

  it('is readable in black and white: every colour is a grey, status told by shape and dash', async () => {
    const svg = await figureSvg(d.interpretation, d.quantiles.geometricAlbedo);
    const colours = new Set(allElements(parseXml(svg)).flatMap((e) => [e.attrs.fill, e.attrs.stroke]).filter((c): c is string => c !== undefined && c !== 'none'));
    const grey = (c: string) => {
      if (c === 'white' || c === 'black') return true;
      const m = /^#([0-9a-f]{3}|[0-9a-f]{6})$/i.exec(c);
      if (!m) return false;
      const h = m[1]!.length === 3 ? [...m[1]!].map((x) => x + x) : [m[1]!.slice(0, 2), m[1]!.slice(2, 4), m[1]!.slice(4, 6)];
      return h[0] === h[1] && h[1] === h[2];
    };
    for (const c of colours) expect(grey(c), c).toBe(true);
    const spec = JSON.stringify(figureSpec(d.interpretation, d.quantiles.geometricAlbedo));
    expect(spec).toMatch(/"shape":\{"field":"status"/);
    expect(spec).toMatch(/"strokeDash":\{"field":"status"/);
  });

  it('draws the posterior histogram with unit area', () => {
    const spec = figureSpec(d.interpretation, d.quantiles.geometricAlbedo) as unknown as { vconcat: Array<{ layer: Array<{ data: { values: Array<{ lo: number; hi: number; density: number }> } }> }> };
    const bins = spec.vconcat[0]!.layer[0]!.data.values;
    const area = bins.reduce((s, b) => s + b.density * (b.hi - b.lo), 0);
    // derived: the bins cover [0, x_max] and the posterior lies inside, so the area is 1 (to the grid's 0.001 resolution)
    expect(Math.abs(area - 1)).toBeLessThan(0.002);
  });

  it('gives two candidates whose names share a long prefix two rows with two labels', async () => {
    const { i, ids } = twinNames();
    const shown = figureCandidates(i);
    expect(shown.map((c) => c.id)).toEqual(expect.arrayContaining(ids));
    const rows = figureRows(shown);
    const twins = rows.filter((r) => ids.includes(r.id));
    expect(twins).toHaveLength(2);
    expect(twins[0]!.label).not.toBe(twins[1]!.label);
    expect(twins.map((r) => r.label)).toEqual([expect.stringMatching(/… #1 \[\w+\]$/), expect.stringMatching(/… #2 \[\w+\]$/)]);
    expect(new Set(rows.map((r) => r.label)).size).toBe(rows.length);
    expect(new Set(rows.map((r) => r.row)).size).toBe(rows.length);
    const svg = await figureSvg(i, d.quantiles.geometricAlbedo);
    const [a, b] = twins.map((r) => textElements(svg, r.label));
    expect(a).toHaveLength(1);
    expect(b).toHaveLength(1);
    expect(translation(a![0]!)[1]).not.toBe(translation(b![0]!)[1]);
    // one interval line per candidate shown
    const ruleGroup = allElements(parseXml(svg)).find((e) => /\bconcat_1_layer_0_marks\b/.test(e.attrs.class ?? ''))!;
    expect(ruleGroup.children.filter((c) => c.name === 'line' || c.name === 'path')).toHaveLength(shown.length);
  });

  it('has a tight left margin: the plots start within 70 px of the left edge', async () => {
    const svg = await figureSvg(d.interpretation, d.quantiles.geometricAlbedo);
    const root = parseXml(svg);
    const frame = allElements(root).find((e) => e.name === 'g' && e.attrs.transform !== undefined)!;
    // our choice: the density axis (tick labels and a two-line title) needs about 50 px
    expect(translation(frame)[0]).toBeLessThanOrEqual(70);
    // and nothing widens the figure much beyond the 520 px plots
    expect(Number(root.attrs.width)).toBeLessThanOrEqual(520 + 120);
  });

  it('has a legend of the status shapes', async () => {
    const svg = await figureSvg(d.interpretation, d.quantiles.geometricAlbedo);
    const legend = allElements(parseXml(svg)).find((e) => /\brole-legend\b/.test(e.attrs.class ?? ''))!;
    expect(legend).toBeDefined();
    const inLegend = allElements(legend);
    expect(inLegend.filter((e) => e.name === 'text').map(textOf)).toEqual(expect.arrayContaining(['status', 'consistent', 'marginal', 'excluded']));
    const symbols = inLegend.filter((e) => /\brole-legend-symbol\b/.test(e.attrs.class ?? ''));
    expect(symbols.length).toBeGreaterThanOrEqual(1);
    expect(symbols.flatMap((g) => g.children.filter((c) => c.name === 'path'))).toHaveLength(3);
  });

  it('keeps hostile names as text: the SVG parses and holds no script, handler or link', async () => {
    const i: Interpretation = JSON.parse(JSON.stringify(d.interpretation));
    const hostile = '</text><script>alert(1)</script><a href="javascript:alert(2)">x</a> & "q" \'s\' <![CDATA[ ]]>';
    i.name = hostile;
    for (const c of i.candidates) c.name = `${hostile} ${c.id}`;
    const svg = await figureSvg(i, d.quantiles.geometricAlbedo);
    const all = allElements(parseXml(svg));
    expect(all.filter((e) => ['script', 'a', 'foreignObject', 'use', 'image'].includes(e.name))).toEqual([]);
    expect(all.flatMap((e) => Object.keys(e.attrs)).filter((a) => /^on/i.test(a) || a === 'href' || a === 'xlink:href')).toEqual([]);
    const rows = figureRows(figureCandidates(i));
    for (const r of rows) expect(texts(svg), r.id).toContain(r.label);
  });
});
