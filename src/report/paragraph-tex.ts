/**
 * The composition paragraphs in LaTeX: natbib citations (\citep{} for catalog keys,
 * written-out references for method papers the catalog lacks), text escaped with the
 * BibTeX writer's escaping (every special character, braces and backslashes as text
 * commands, so no catalog or system text can become a command), math as $...$.
 */
import type { SourceRecord } from '../catalog/index.ts';
import type { SystemInput } from '../io/system.ts';
import type { Interpretation } from '../interpret/types.ts';
import { citationKey, escapeLatex } from './bibtex.ts';
import type { Ref } from './cite.ts';
import { versionLine, type WriterVersions } from './versions.ts';
import { composeWriteUp, type Markup, type WriteUp } from './wording.ts';

/** The preamble the paragraphs and their bibliography need, with what each package is for. */
export const LATEX_PACKAGES: readonly { line: string; for: string }[] = [
  { line: '\\usepackage[T1]{fontenc}', for: 'the glyphs of \\textless, \\textgreater, \\textbar and of letters such as \\dh, \\th, \\dj' },
  { line: '\\usepackage[utf8]{inputenc}', for: 'UTF-8 text (the LaTeX default since 2018)' },
  { line: '\\usepackage{textcomp}', for: '\\textmu, \\textdegree, \\textpm, \\texttimes, \\textminus' },
  { line: '\\usepackage{amsmath}', for: '\\text inside math' },
  { line: '\\usepackage{amssymb}', for: '\\lesssim and \\gtrsim' },
  { line: '\\usepackage{natbib}', for: '\\citep, \\citet and \\citealt' },
  { line: '\\usepackage{url}', for: 'the DOIs and URLs the bibliography prints (hyperref also defines \\url)' },
];

const latexMarkup: Markup = {
  text: escapeLatex,
  math: (tex) => `$${tex}$`,
  citep: (refs: readonly Ref[]) => {
    const keys = refs.flatMap((r) => ('key' in r ? [citationKey(r.key)] : []));
    const texts = refs.flatMap((r) => ('text' in r ? [escapeLatex(r.text)] : []));
    if (texts.length === 0) return `\\citep{${keys.join(',')}}`;
    return `(${[...(keys.length > 0 ? [`\\citealt{${keys.join(',')}}`] : []), ...texts].join('; ')})`;
  },
  citet: (r: Ref) => ('key' in r ? `\\citet{${citationKey(r.key)}}` : escapeLatex(r.text)),
  dash: '--',
  percent: '\\%',
};

export function writeUpLatex(i: Interpretation, s: SystemInput, sources: readonly SourceRecord[]): WriteUp {
  return composeWriteUp(i, s, sources, latexMarkup);
}

/** Text for a TeX comment line: one line, no control characters. */
function commentText(text: string): string {
  return text.replace(/[\u0000-\u001F\u007F-\u009F\u2028\u2029\u202A-\u202E\u2066-\u2069]+/g, ' ');
}

/**
 * The paragraphs as LaTeX source (blank line between paragraphs), after comment lines
 * naming the planet, the versions (when given) and the preamble the text needs.
 */
export function paragraphLatex(i: Interpretation, s: SystemInput, sources: readonly SourceRecord[], versions?: WriterVersions): string {
  const head = [
    `% Composition paragraphs written by hesper for ${commentText(i.name)}; cite keys are in the BibTeX file (natbib).`,
    ...(versions === undefined ? [] : [`% ${versionLine(versions)}`]),
    `% Preamble: ${LATEX_PACKAGES.map((p) => p.line).join(' ')}`,
  ];
  return `${head.join('\n')}\n${writeUpLatex(i, s, sources).paragraphs.join('\n\n')}\n`;
}
