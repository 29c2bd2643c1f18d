import { parse } from '@retorquere/bibtex-parser';
import { describe, expect, it } from 'vitest';
import { interpretSystem } from '../../src/interpret/run.ts';
import type { Interpretation } from '../../src/interpret/types.ts';
import { toBibtex } from '../../src/report/bibtex.ts';
import { paragraphMarkdown, writeUpMarkdown } from '../../src/report/paragraph-md.ts';
import { paragraphLatex, writeUpLatex } from '../../src/report/paragraph-tex.ts';
import { loadDemo } from '../inference/helpers.ts';
import { seededCatalog } from '../interpret/helpers.ts';

const { data, sources } = seededCatalog();
const aureliaSystem = loadDemo('systems/aurelia-b.json');
const corvinaSystem = loadDemo('systems/corvina-b.json');
/** The JSON of the interpretation, as `interpret --json` prints it. */
const asJson = (i: Interpretation): Interpretation => JSON.parse(JSON.stringify(i));
const aurelia = asJson(interpretSystem(aureliaSystem, { catalog: data, samples: 1500, seed: 7 }));
const corvina = asJson(interpretSystem(corvinaSystem, { catalog: data, samples: 1500, seed: 7 }));

/** Half a unit of the last printed digit of a number as written. */
function halfUnit(text: string): number {
  const d = text.includes('.') ? text.split('.')[1]!.length : 0;
  return 0.5 * 10 ** -d + 1e-12;
}

function expectPrinted(text: string, value: number) {
  expect(Math.abs(Number(text) - value), `${text} vs ${value}`).toBeLessThanOrEqual(halfUnit(text));
}

/** The first "$SYMBOL = v^{+p}_{-m}$" or "$SYMBOL = v \pm e$" after `from`. */
function valueWithErrors(md: string, symbol: string, from = 0): { v: string; p: string; m: string } {
  const esc = symbol.replace(/[\\{}]/g, (c) => `\\${c}`);
  const re = new RegExp(`\\$${esc} = ([\\d.]+)(?:\\^\\{\\+([\\d.]+)\\}_\\{-([\\d.]+)\\}| \\\\pm ([\\d.]+))`, 'g');
  re.lastIndex = from;
  const m = re.exec(md);
  if (!m) throw new Error(`no ${symbol} in the paragraph`);
  return { v: m[1]!, p: m[2] ?? m[4]!, m: m[3] ?? m[4]! };
}

describe('the composition paragraph (Markdown)', () => {
  const md = paragraphMarkdown(aurelia, aureliaSystem, sources);

  it('prints the albedo, its intervals, the thermal share and the temperatures of the JSON', () => {
    const ag = aurelia.geometricAlbedo;
    const a = valueWithErrors(md, 'A_\\mathrm{g}');
    expectPrinted(a.v, ag.median);
    expectPrinted(a.p, ag.upper68 - ag.median);
    expectPrinted(a.m, ag.median - ag.lower68);
    const [lo95, hi95] = /95 %: ([\d.]+)–([\d.]+)\)/.exec(md)!.slice(1) as [string, string];
    expectPrinted(lo95, ag.lower95);
    expectPrinted(hi95, ag.upper95);
    const b = valueWithErrors(md, 'A_\\mathrm{B}');
    expectPrinted(b.v, aurelia.bondAlbedo.median);
    const share = /makes up ([\d.]+) % of the signal \(95 % upper limit ([\d.]+) %\)/.exec(md)!;
    expectPrinted(share[1]!, 100 * aurelia.thermalFraction.median);
    expectPrinted(share[2]!, 100 * aurelia.thermalFraction.upperLimit95);
    const all = valueWithErrors(md, 'A_\\mathrm{g}', md.indexOf('attributing all'));
    expectPrinted(all.v, aurelia.allReflectedGeometricAlbedo.median);
    const tDay = valueWithErrors(md, 'T_\\mathrm{day}');
    expect(Math.abs(Number(tDay.v) - aurelia.daysideTemperatureK.median)).toBeLessThanOrEqual(5); // rounded to 10 K (two figures of the error)
  });

  it('states the measurement as given in the system file', () => {
    // demo-data/systems/aurelia-b.json (invented): eclipse depth 62 +- 8 ppm, CHEOPS band.
    expect(md).toMatch(/secondary-eclipse depth of \$62 \\pm 8\$ ppm in the CHEOPS band/);
  });

  it('states the verdict with the probability and ceiling of the JSON', () => {
    const v = aurelia.verdict;
    expect(v.cloudsOrIceRequired).toBe('yes');
    const m = /exceeds ([\d.]+), the cloud-free reference for this planet's regime .*?, is \$P ([>=<]) ([\d.]+)\$/.exec(md)!;
    expectPrinted(m[1]!, v.ceiling!.geometricAlbedo);
    // The reference is named with its regime, as in the JSON.
    expect(md).toContain(v.reference!.regime);
    if (m[2] === '=') expectPrinted(m[3]!, v.probability!);
    else expect(v.probability!).toBeGreaterThan(Number(m[3]));
  });

  it('states the required particle albedo of the JSON', () => {
    const r = aurelia.requiredSingleScatteringAlbedo;
    const m = /\\varpi_0 = ([\d.]+)\\text\{--\}([\d.]+)\$ \(68 % interval\)/.exec(md)!;
    expectPrinted(m[1]!, r.lower68);
    expectPrinted(m[2]!, r.upper68);
  });

  it('every A_g range it names is a candidate range of the JSON', () => {
    const ranges = [...md.matchAll(/\$A_\\mathrm\{g\} = ([\d.]+)(?:\\text\{--\}([\d.]+))?\$\)/g)];
    expect(ranges.length).toBeGreaterThan(3);
    for (const r of ranges) {
      const lo = r[1]!;
      const hi = r[2] ?? r[1]!;
      const match = aurelia.candidates.some((c) => Math.abs(Number(lo) - c.geometricAlbedoRange[0]) <= halfUnit(lo) && Math.abs(Number(hi) - c.geometricAlbedoRange[1]) <= halfUnit(hi));
      expect(match, `${lo}-${hi}`).toBe(true);
    }
  });

  it('names leading and excluded candidates with the reason, the phase offset and the cautions', () => {
    expect(md).toMatch(/the leading consistent materials are /);
    expect(md).toMatch(/would match the albedo but (is|are) excluded by the temperature/);
    expect(md).toMatch(/are too dark: their values lie below the 95 % interval/);
    // demo-data: phase offset -9 +- 6 deg (invented)
    expect(md).toMatch(/offset westward by \$9\.0\^\\circ \\pm 6\.0\^\\circ\$ \(\$1\.5\\sigma\$\), not significant; if real, it points to reflective clouds on the cooler western dayside \(Demory et al\. 2013; Parmentier et al\. 2016/);
    for (const caution of ['blackbody', 'Lambert sphere', 'two-hemisphere model', 'band geometric albedo holds at all wavelengths', "metallicity taken equal to the star's"]) {
      expect(md).toContain(caution);
    }
  });

  it('uses author-year citations, no LaTeX commands', () => {
    expect(md).toMatch(/\(Chandrasekhar 1960\)/);
    expect(md).not.toMatch(/\\cite/);
  });

  it('writes "not required" for a dark planet, and too-bright candidates', () => {
    const text = paragraphMarkdown(corvina, corvinaSystem, sources);
    expect(corvina.verdict.cloudsOrIceRequired).toBe('no');
    expect(text).toMatch(/Clouds or ice are not required/);
    expect(text).toMatch(/too bright: their values lie above the 95 % interval/);
  });
});

describe('the composition paragraph (LaTeX) and its BibTeX', () => {
  const tex = paragraphLatex(aurelia, aureliaSystem, sources);
  const w = writeUpLatex(aurelia, aureliaSystem, sources);
  const bib = toBibtex(w.citations.citedSources());

  it('cites with natbib keys, every one of them in the BibTeX, which parses', () => {
    const keys = [...tex.matchAll(/\\cite(?:p|t|alt)\{([^}]*)\}/g)].flatMap((m) => m[1]!.split(','));
    expect(keys.length).toBeGreaterThan(5);
    const lib = parse(bib);
    expect(lib.errors).toEqual([]);
    const inBib = new Set(lib.entries.map((e) => e.key));
    for (const k of keys) expect(inBib.has(k), k).toBe(true);
    // and nothing uncited: the file holds exactly the cited keys
    expect([...inBib].sort()).toEqual([...new Set(keys)].sort());
  });

  it('writes method papers the catalog lacks as text, never as an unknown key', () => {
    const known = new Set(sources.map((s) => s.key));
    expect(w.citations.citedKeys().every((k) => known.has(k))).toBe(true);
    // Fulton et al. 2017 is not a catalog source (seeds/sources.json): written out.
    if (!sources.some((s) => /^Fulton/.test(s.authors) && s.year === 2017)) expect(tex).toContain('Fulton et al. 2017, AJ 154, 109');
  });

  it('escapes text and percent signs and keeps the same numbers as Markdown', () => {
    expect(tex).toMatch(/68 \\% interval/);
    expect(tex).not.toMatch(/[^\\]% interval/);
    const md = writeUpMarkdown(aurelia, aureliaSystem, sources);
    const num = (s: string) => /A_\\mathrm\{g\} = [\d.]+\^\{\+[\d.]+\}_\{-[\d.]+\}/.exec(s)![0];
    expect(num(w.paragraphs[0]!)).toBe(num(md.paragraphs[0]!));
  });
});

describe('the paragraph follows the albedo constraint', () => {
  const bareClaim = /\$A_\\mathrm\{g\} = [\d.]+(\^\{\+[\d.]+\}_\{-[\d.]+\}| \\pm [\d.]+)\$/;

  it('writes a prior-dominated albedo as the range the assumptions span and names the measurement that would decide', () => {
    // Corvina b (invented): the corners eps = 0 and eps = 1 disagree by more than the 68 % width.
    expect(corvina.geometricAlbedo.constraint).toBe('prior-dominated');
    const md = paragraphMarkdown(corvina, corvinaSystem, sources);
    expect(md).toMatch(/does not constrain the geometric albedo beyond the assumptions: depending on the assumed heat redistribution and phase integral, \$A_\\mathrm\{g\}\$ lies between [\d.]+ \(\$\\varepsilon = 0/);
    expect(md).toMatch(/an infrared eclipse\) or of its dayside temperature would break this degeneracy/);
    expect(md).not.toMatch(bareClaim);
  });

  it('states first that the model cannot reproduce the data, and quotes no posterior', () => {
    const s = loadDemo('systems/corvina-b.json');
    s.measurements = { eclipseDepthPpm: { kind: 'normal', mean: 0.0145, sigma: 0.0012 } }; // a percent value typed as ppm
    const r = asJson(interpretSystem(s, { catalog: data, samples: 800, seed: 3 }));
    expect(r.modelFit.reproducesData).toBe(false);
    expect(r.verdict.cloudsOrIceRequired).toBe('inconclusive');
    const [p1] = writeUpMarkdown(r, s, sources).paragraphs;
    expect(p1!).toMatch(/^For Corvina b we use a secondary-eclipse depth of .*?\. The model cannot reproduce these measurements: .*is this in percent\?/);
    expect(p1!).not.toMatch(/geometric albedo \$A_/);
    expect(p1!).toMatch(/We therefore quote no albedo or temperature from them/);
  });
});
