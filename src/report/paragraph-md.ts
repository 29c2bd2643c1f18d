/**
 * The composition paragraphs in Markdown: author-year citations, math as $...$ (TeX
 * inside, as GitHub, pandoc and Jupyter render it).
 */
import type { SourceRecord } from '../catalog/index.ts';
import type { SystemInput } from '../io/system.ts';
import type { Interpretation } from '../interpret/types.ts';
import { authorLabel, authorYear, Citations, type Ref } from './cite.ts';
import { composeWriteUp, type Markup, type WriteUp } from './wording.ts';

/** Characters Markdown would read as markup in running text. */
function escapeMarkdown(s: string): string {
  return s.replace(/([\\`*_<>$])/g, '\\$1');
}

function markdownMarkup(sources: readonly SourceRecord[]): Markup {
  const lookup = new Citations(sources);
  const label = (r: Ref) => ('key' in r ? authorYear(lookup.source(r.key)!) : r.text);
  return {
    text: escapeMarkdown,
    math: (tex) => `$${tex}$`,
    citep: (refs) => `(${refs.map(label).join('; ')})`,
    citet: (r) => {
      if (!('key' in r)) return r.text;
      const s = lookup.source(r.key)!;
      return `${authorLabel(s.authors)} (${s.year ?? 'n.d.'})`;
    },
    dash: '–',
    percent: '%',
  };
}

export function writeUpMarkdown(i: Interpretation, s: SystemInput, sources: readonly SourceRecord[]): WriteUp {
  return composeWriteUp(i, s, sources, markdownMarkup(sources));
}

/** The paragraphs as Markdown text (blank line between paragraphs). */
export function paragraphMarkdown(i: Interpretation, s: SystemInput, sources: readonly SourceRecord[]): string {
  return `${writeUpMarkdown(i, s, sources).paragraphs.join('\n\n')}\n`;
}
