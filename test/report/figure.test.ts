import { describe, expect, it } from 'vitest';
import { interpretSystemDetailed } from '../../src/interpret/run.ts';
import { figureCandidates, figureSpec, figureSvg, rowLabel } from '../../src/report/figure.ts';
import { allElements, parseXml } from '../helpers/xml.ts';
import { loadDemo } from '../inference/helpers.ts';
import { seededCatalog } from '../interpret/helpers.ts';

const { data } = seededCatalog();
const d = interpretSystemDetailed(loadDemo('systems/aurelia-b.json'), { catalog: data, samples: 1500, seed: 3 });

/** SVG text content, with the character entities decoded by the XML parser. */
function texts(svg: string): string[] {
  return allElements(parseXml(svg)).filter((e) => e.name === 'text').map((e) => e.text);
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
    for (const c of shown) expect(labels, c.id).toContain(rowLabel(c));
    expect(shown.map((c) => c.status)).toEqual(expect.arrayContaining(['consistent', 'excluded']));
    // the cloud-free ceiling entry is among them and marked on the axis
    expect(shown.some((c) => c.id === d.interpretation.verdict.ceiling!.entryId)).toBe(true);
    expect(labels.some((t) => /^cloud-free ceiling 0\.\d\d$/.test(t))).toBe(true);
  });

  it('labels its axes with units', async () => {
    const labels = texts(await figureSvg(d.interpretation, d.quantiles.geometricAlbedo));
    expect(labels).toContain('geometric albedo A_g (dimensionless; CHEOPS band, 400-1050 nm)');
    expect(labels).toContain('posterior density (per unit A_g)');
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
});
