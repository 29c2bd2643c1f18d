/**
 * The LaTeX and Markdown paragraphs with hostile text in every place a user's text
 * reaches them: the planet name, the band label, candidate and particle names, and the
 * author lists citation labels are made from. The text must stay text: in LaTeX no
 * command but the writer's own, no math, comment, parameter or ^^ notation; in Markdown
 * no link, HTML, code, emphasis, heading or table syntax.
 */
import { describe, expect, it } from 'vitest';
import { interpretSystem } from '../../src/interpret/run.ts';
import type { Interpretation } from '../../src/interpret/types.ts';
import type { SourceRecord } from '../../src/catalog/index.ts';
import { escapeLatex } from '../../src/report/bibtex.ts';
import { escapeMarkdown, paragraphMarkdown } from '../../src/report/paragraph-md.ts';
import { LATEX_PACKAGES, paragraphLatex } from '../../src/report/paragraph-tex.ts';
import { loadDemo } from '../inference/helpers.ts';
import { seededCatalog } from '../interpret/helpers.ts';

const { data, sources } = seededCatalog();
const system = loadDemo('systems/aurelia-b.json');
const base: Interpretation = JSON.parse(JSON.stringify(interpretSystem(system, { catalog: data, samples: 1500, seed: 7 })));

const HOSTILE = [
  '[click](javascript:alert(1))',
  '<script>alert(1)</script>',
  '![img](https://example.org/x.png) `code` **bold** _it_ ~~gone~~',
  '| a | b |',
  'line\n\n# heading',
  '&lt;b&gt; &#x5b;x&#x5d;',
  '\\input{/etc/hostname}\\relax',
  '^^5cinput^^7b/etc/hostname^^7d',
  '$\\input{x}$ % comment # param & tab',
  '}{\\end{document}',
].join(' ');

/** A corporate author as the input rules allow it: one line, no inner braces. */
const CORPORATE = HOSTILE.replace(/[{}]/g, '').replace(/\s+/g, ' ');

/** The interpretation with hostile text in every name the paragraphs print, and sources with hostile author lists. */
function hostile(): { i: Interpretation; sources: SourceRecord[] } {
  const i: Interpretation = JSON.parse(JSON.stringify(base));
  i.name = `Planet ${HOSTILE}`;
  i.band.label = `Band ${HOSTILE}`;
  for (const c of i.candidates) c.name = `${HOSTILE} ${c.name}`;
  for (const p of [...i.requiredSingleScatteringAlbedo.reachedBy, ...i.requiredSingleScatteringAlbedo.notReached]) p.name = `${HOSTILE} ${p.name}`;
  const evil = sources.map((s) => ({ ...s, authors: `{${CORPORATE}}` }));
  return { i, sources: evil };
}

/** The $...$ math segments of a text (after the writer's escapes, a \$ is text). */
function mathSegments(text: string): string[] {
  const out: string[] = [];
  let current: string | null = null;
  for (let k = 0; k < text.length; k++) {
    const c = text[k]!;
    if (c === '\\') {
      if (current !== null) current += text.slice(k, k + 2);
      k++;
    } else if (c === '$') {
      if (current === null) current = '';
      else {
        out.push(current);
        current = null;
      }
    } else if (current !== null) current += c;
  }
  expect(current, 'a math segment left open').toBeNull();
  return out;
}

/** Characters outside math that CommonMark / GFM would read as markup, unless backslash-escaped. */
function markdownMarkup(text: string): string[] {
  const found: string[] = [];
  let inMath = false;
  for (let k = 0; k < text.length; k++) {
    const c = text[k]!;
    if (c === '\\' && /[!-/:-@[-`{-~]/.test(text[k + 1] ?? '')) k++;
    else if (c === '$') inMath = !inMath;
    else if (!inMath && /[[\]<>`*_|~&#]/.test(c)) found.push(`${c} at ${k}: ${JSON.stringify(text.slice(Math.max(0, k - 20), k + 20))}`);
  }
  return found;
}

/**
 * Control sequences the paragraphs may use, with the package that defines each
 * (kernel: LaTeX2e itself). From memory of the LaTeX2e, natbib, amsmath, amssymb,
 * textcomp and T1 font-encoding documentation; scripts/check-latex.sh compiles a
 * report with exactly the preamble of the header.
 */
const COMMANDS: Record<string, string> = {
  citep: 'natbib', citet: 'natbib', citealt: 'natbib', text: 'amsmath',
  mathrm: 'kernel', pm: 'kernel', circ: 'kernel', sigma: 'kernel', varpi: 'kernel', varepsilon: 'kernel', in: 'kernel', oplus: 'kernel',
  odot: 'kernel', star: 'kernel', approx: 'kernel', leq: 'kernel', geq: 'kernel', rightarrow: 'kernel', alpha: 'kernel', beta: 'kernel',
  lambda: 'kernel', omega: 'kernel', tau: 'kernel', ldots: 'kernel', symbol: 'kernel', ss: 'kernel', ae: 'kernel', AE: 'kernel',
  oe: 'kernel', OE: 'kernel', o: 'kernel', O: 'kernel', l: 'kernel', L: 'kernel', i: 'kernel', j: 'kernel', AA: 'kernel', aa: 'kernel',
  textbackslash: 'kernel', textbraceleft: 'kernel', textbraceright: 'kernel', textasciitilde: 'kernel', textasciicircum: 'kernel',
  textless: 'kernel', textgreater: 'kernel', textbar: 'kernel',
  textpm: 'textcomp', texttimes: 'textcomp', textdegree: 'textcomp', textmu: 'textcomp', textminus: 'textcomp',
  dj: 'fontenc', DJ: 'fontenc', th: 'fontenc', TH: 'fontenc', dh: 'fontenc', DH: 'fontenc',
  lesssim: 'amssymb', gtrsim: 'amssymb',
  // control symbols: thin space, escaped specials, accents
  ',': 'kernel', '{': 'kernel', '}': 'kernel', '%': 'kernel', '&': 'kernel', $: 'kernel', '#': 'kernel', _: 'kernel',
  "'": 'kernel', '`': 'kernel', '^': 'kernel', '~': 'kernel', '"': 'kernel', '=': 'kernel', '.': 'kernel',
  u: 'kernel', v: 'kernel', H: 'kernel', r: 'kernel', d: 'kernel', c: 'kernel', k: 'kernel', b: 'kernel',
};

/** TeX's reading of the body: control sequences used, and the first problem (unbalanced brace, bare %, #, &, ^^), if any. */
function texTokens(body: string): { commands: Set<string>; problems: string[] } {
  const commands = new Set<string>();
  const problems: string[] = [];
  let depth = 0;
  for (let k = 0; k < body.length; k++) {
    const c = body[k]!;
    if (c === '\\') {
      const word = /^[A-Za-z]+/.exec(body.slice(k + 1))?.[0];
      const name = word ?? body[k + 1] ?? '';
      commands.add(name);
      k += name.length;
    } else if (c === '{') depth++;
    else if (c === '}' && --depth < 0) problems.push(`} closes a group never opened at ${k}`);
    else if (c === '%' || c === '#' || c === '&') problems.push(`bare ${c} at ${k}`);
    else if (c === '^' && body[k + 1] === '^') problems.push(`^^ notation at ${k}`);
  }
  if (depth !== 0) problems.push(`${depth} group(s) left open`);
  return { commands, problems };
}

describe('the LaTeX paragraphs with hostile text', () => {
  const plain = paragraphLatex(base, system, sources);
  const h = hostile();
  const tex = paragraphLatex(h.i, system, h.sources);
  const bodyOf = (t: string) => t.split('\n').filter((l) => !l.startsWith('%')).join('\n');

  it('use only the writer\'s own commands, every one from a package the header lists', () => {
    for (const t of [plain, tex]) {
      const { commands, problems } = texTokens(bodyOf(t));
      expect(problems).toEqual([]);
      const unknown = [...commands].filter((cs) => COMMANDS[cs] === undefined);
      expect(unknown).toEqual([]);
      const preamble = t.split('\n').find((l) => l.startsWith('% Preamble: '))!;
      for (const cs of commands) {
        const pkg = COMMANDS[cs]!;
        if (pkg === 'fontenc') expect(preamble).toContain('\\usepackage[T1]{fontenc}');
        else if (pkg !== 'kernel') expect(preamble, cs).toContain(`\\usepackage{${pkg}}`);
      }
    }
    expect(LATEX_PACKAGES.map((p) => p.line)).toEqual(expect.arrayContaining(['\\usepackage{natbib}', '\\usepackage{amsmath}', '\\usepackage{url}']));
  });

  it('keeps the same math as with ordinary names (text cannot open or close math)', () => {
    expect(mathSegments(bodyOf(tex))).toEqual(mathSegments(bodyOf(plain)));
  });

  it('prints the hostile names as escaped text, and never \\input, \\relax, ^^ or \\end', () => {
    expect(tex).toContain(escapeLatex(HOSTILE));
    expect(bodyOf(tex)).not.toMatch(/\\(input|relax|end|catcode|def)\b|\^\^/);
    expect(escapeLatex('^^5c')).toBe('{\\textasciicircum}{\\textasciicircum}5c');
  });

  it('keeps the header on its own comment lines and names the versions when given', () => {
    const withVersions = paragraphLatex(h.i, system, h.sources, { hesperVersion: '0.2.0', catalogVersion: '0123456789abcdef0123' });
    const lines = withVersions.split('\n');
    expect(lines[0]).toMatch(/^% Composition paragraphs written by hesper for Planet /);
    expect(lines[1]).toBe('% written by hesper 0.2.0, catalog 0123456789ab');
    expect(lines[2]).toBe(`% Preamble: ${LATEX_PACKAGES.map((p) => p.line).join(' ')}`);
    expect(lines[3]).toMatch(/^For Planet /);
    expect(plain.split('\n')[1]).toMatch(/^% Preamble: /);
  });
});

describe('the Markdown paragraphs with hostile text', () => {
  const plain = paragraphMarkdown(base, system, sources);
  const h = hostile();
  const md = paragraphMarkdown(h.i, system, h.sources);

  it('holds no unescaped link, HTML, code, emphasis, table or heading character outside math', () => {
    expect(markdownMarkup(plain)).toEqual([]);
    expect(markdownMarkup(md)).toEqual([]);
    // every paragraph starts with a word, never with # or a list marker
    for (const p of md.trim().split('\n\n')) expect(p, p.slice(0, 40)).toMatch(/^[A-Z]/);
    expect(md.trim().split('\n\n')).toHaveLength(plain.trim().split('\n\n').length);
  });

  it('prints names and citation labels as escaped text, and the same math', () => {
    expect(md).toContain(escapeMarkdown(HOSTILE));
    expect(escapeMarkdown('[click](javascript:x) <b>')).toBe('\\[click\\](javascript:x) \\<b\\>');
    // the citation labels come from the author lists: corporate names, escaped
    expect(md).toContain(`(${escapeMarkdown(CORPORATE)} 2018`);
    expect(mathSegments(md)).toEqual(mathSegments(plain));
  });

  it('names the versions in an HTML comment that hostile version strings cannot close', () => {
    const withVersions = paragraphMarkdown(base, system, sources, { hesperVersion: '0.2.0 --> <script>', catalogVersion: 'abc-->def' });
    expect(withVersions.split('\n')[0]).toBe('<!-- written by hesper 0.2.0--script, catalog abcdef -->');
    expect(withVersions.split('\n')[1]).toBe('');
    expect(plain).toMatch(/^For /);
  });
});
