/**
 * The composition paragraphs in Markdown: author-year citations, math as $...$ (TeX
 * inside, as GitHub, pandoc and Jupyter render it). Every piece of text from the
 * catalog or the system file (names, labels, citation labels) is escaped, so it stays
 * text: no link, image, HTML, code span, emphasis, heading or table cell can come of it.
 */
import type { SourceRecord } from '../catalog/index.ts';
import type { SystemInput } from '../io/system.ts';
import type { Interpretation } from '../interpret/types.ts';
import { authorLabel, authorYear, Citations, type Ref } from './cite.ts';
import { versionLine, type WriterVersions } from './versions.ts';
import { composeWriteUp, type Markup, type WriteUp } from './wording.ts';

/**
 * ASCII punctuation CommonMark and GitHub-flavoured Markdown read as markup in running
 * text: \ ` * _ (code, emphasis), [ ] (links and images), < > (HTML, autolinks), & (entities),
 * # (headings), | (table cells), ~ (strikethrough), $ (math). CommonMark allows a
 * backslash before any ASCII punctuation (CommonMark spec 0.31.2, 2024, "Backslash
 * escapes"). Line breaks and control characters become spaces, so no text starts a
 * line of its own.
 */
export function escapeMarkdown(s: string): string {
  return s
    .replace(/[\u0000-\u001F\u007F-\u009F\u2028\u2029\u202A-\u202E\u2066-\u2069]+/g, ' ')
    .replace(/([\\`*_[\]<>&#|~$])/g, '\\$1');
}

function markdownMarkup(sources: readonly SourceRecord[]): Markup {
  const lookup = new Citations(sources);
  const label = (r: Ref) => escapeMarkdown('key' in r ? authorYear(lookup.source(r.key)!) : r.text);
  return {
    text: escapeMarkdown,
    math: (tex) => `$${tex}$`,
    citep: (refs) => `(${refs.map(label).join('; ')})`,
    citet: (r) => {
      if (!('key' in r)) return escapeMarkdown(r.text);
      const s = lookup.source(r.key)!;
      return `${escapeMarkdown(authorLabel(s.authors))} (${s.year ?? 'n.d.'})`;
    },
    dash: '–',
    percent: '%',
  };
}

export function writeUpMarkdown(i: Interpretation, s: SystemInput, sources: readonly SourceRecord[]): WriteUp {
  return composeWriteUp(i, s, sources, markdownMarkup(sources));
}

/** The paragraphs as Markdown text (blank line between paragraphs), after an HTML comment naming the versions when given. */
export function paragraphMarkdown(i: Interpretation, s: SystemInput, sources: readonly SourceRecord[], versions?: WriterVersions): string {
  const head = versions === undefined ? '' : `<!-- ${versionLine(versions)} -->\n\n`;
  return `${head}${writeUpMarkdown(i, s, sources).paragraphs.join('\n\n')}\n`;
}
