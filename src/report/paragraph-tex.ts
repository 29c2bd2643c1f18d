/**
 * The composition paragraphs in LaTeX: natbib citations (\citep{} for catalog keys,
 * written-out references for method papers the catalog lacks), text escaped with the
 * BibTeX writer's escaping, math as $...$.
 */
import type { SourceRecord } from '../catalog/index.ts';
import type { SystemInput } from '../io/system.ts';
import type { Interpretation } from '../interpret/types.ts';
import { escapeLatex } from './bibtex.ts';
import type { Ref } from './cite.ts';
import { composeWriteUp, type Markup, type WriteUp } from './wording.ts';

const latexMarkup: Markup = {
  text: escapeLatex,
  math: (tex) => `$${tex}$`,
  citep: (refs: readonly Ref[]) => {
    const keys = refs.flatMap((r) => ('key' in r ? [r.key] : []));
    const texts = refs.flatMap((r) => ('text' in r ? [escapeLatex(r.text)] : []));
    if (texts.length === 0) return `\\citep{${keys.join(',')}}`;
    return `(${[...(keys.length > 0 ? [`\\citealt{${keys.join(',')}}`] : []), ...texts].join('; ')})`;
  },
  citet: (r: Ref) => ('key' in r ? `\\citet{${r.key}}` : escapeLatex(r.text)),
  dash: '--',
  percent: '\\%',
};

export function writeUpLatex(i: Interpretation, s: SystemInput, sources: readonly SourceRecord[]): WriteUp {
  return composeWriteUp(i, s, sources, latexMarkup);
}

/** The paragraphs as LaTeX source (blank line between paragraphs; needs natbib). */
export function paragraphLatex(i: Interpretation, s: SystemInput, sources: readonly SourceRecord[]): string {
  const head = `% Composition paragraphs written by hesper for ${i.name.replace(/[\r\n]/g, ' ')}; cite keys are in the BibTeX file (natbib).`;
  return `${head}\n${writeUpLatex(i, s, sources).paragraphs.join('\n\n')}\n`;
}
