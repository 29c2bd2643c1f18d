/**
 * BibTeX from catalog source records. Text is stored as plain Unicode; here it is
 * escaped for (La)TeX: the ten special characters, accented letters as accent
 * commands ({\'e}, {\v{z}}, {\'\i}) so classic 8-bit BibTeX keeps them, a few symbols
 * as math, and words with capitals after the first letter of the title braced so
 * bibliography styles keep their case. url, adsurl and doi are verbatim fields.
 */
import type { SourceRecord } from '../catalog/index.ts';
import { adsUrl } from '../catalog/vocab.ts';

/** Combining marks (after NFD) -> accent command; letter commands need a braced argument. */
const ACCENTS: Record<string, string> = {
  '\u0300': '`', '\u0301': "'", '\u0302': '^', '\u0303': '~', '\u0304': '=', '\u0306': 'u', '\u0307': '.',
  '\u0308': '"', '\u030A': 'r', '\u030B': 'H', '\u030C': 'v', '\u0323': 'd', '\u0327': 'c', '\u0328': 'k', '\u0331': 'b',
};

/** Letters and symbols that are not accent compositions. */
const SYMBOLS: Record<string, string> = {
  'ß': '{\\ss}', 'æ': '{\\ae}', 'Æ': '{\\AE}', 'œ': '{\\oe}', 'Œ': '{\\OE}', 'ø': '{\\o}', 'Ø': '{\\O}', 'ł': '{\\l}', 'Ł': '{\\L}',
  'ı': '{\\i}', 'ȷ': '{\\j}', 'đ': '{\\dj}', 'Đ': '{\\DJ}', 'þ': '{\\th}', 'Þ': '{\\TH}', 'ð': '{\\dh}', 'Ð': '{\\DH}',
  '–': '--', '—': '---', '‘': '`', '’': "'", '“': '``', '”': "''", '…': '{\\ldots}', '\u00A0': '~',
  '±': '{\\textpm}', '×': '{\\texttimes}', '°': '{\\textdegree}', 'µ': '{\\textmu}', 'μ': '{\\textmu}', '≈': '$\\approx$', '≤': '$\\leq$',
  '≥': '$\\geq$', '≲': '$\\lesssim$', '≳': '$\\gtrsim$', '⊕': '$\\oplus$', '☉': '$\\odot$', '→': '$\\rightarrow$',
  '−': '{\\textminus}', 'α': '$\\alpha$', 'β': '$\\beta$', 'λ': '$\\lambda$', 'ω': '$\\omega$', 'σ': '$\\sigma$', 'τ': '$\\tau$',
  'Å': '{\\AA}', 'å': '{\\aa}',
};

/** The TeX special characters. */
const SPECIALS: Record<string, string> = {
  '\\': '\\textbackslash{}', '{': '\\{', '}': '\\}', '&': '\\&', '%': '\\%', '$': '\\$', '#': '\\#', '_': '\\_',
  '~': '\\textasciitilde{}', '^': '\\textasciicircum{}',
};

function accented(ch: string): string | undefined {
  const [base, ...marks] = [...ch.normalize('NFD')];
  if (base === undefined || marks.length === 0 || !/^[A-Za-z]$/.test(base)) return undefined;
  // {\'i} rather than {\'\i}: LaTeX2e places the accent correctly and parsers map it to í.
  let out = base;
  for (const mark of marks) {
    const cmd = ACCENTS[mark];
    if (cmd === undefined) return undefined;
    out = /[a-zA-Z]/.test(cmd) ? `\\${cmd}{${out}}` : `\\${cmd}${out}`;
  }
  return `{${out}}`;
}

/** Plain Unicode text -> TeX-safe text. Characters with no known form stay as UTF-8. */
export function escapeLatex(text: string): string {
  let out = '';
  for (const ch of text) {
    if (SPECIALS[ch] !== undefined) out += SPECIALS[ch];
    else if (ch.charCodeAt(0) < 128) out += ch;
    else if (SYMBOLS[ch] !== undefined) out += SYMBOLS[ch];
    else out += accented(ch) ?? ch;
  }
  return out;
}

/** Braces around words that carry capitals a style must not lower-case. */
export function protectTitle(title: string): string {
  const words = title.split(/(\s+)/);
  let first = true;
  return words
    .map((w) => {
      if (/^\s*$/.test(w)) return w;
      const letters = [...w].filter((c) => c.toLowerCase() !== c.toUpperCase());
      const capitalAfterFirst = letters.slice(1).some((c) => c === c.toUpperCase());
      const capitalInitial = letters[0] !== undefined && letters[0] === letters[0].toUpperCase();
      const protect = capitalAfterFirst || (!first && capitalInitial);
      first = false;
      const escaped = escapeLatex(w);
      return protect ? `{${escaped}}` : escaped;
    })
    .join('');
}

/** Splits a BibTeX name list at top-level " and ". */
export function splitNames(authors: string): string[] {
  const names: string[] = [];
  let depth = 0;
  let current = '';
  const tokens = authors.split(/(\s+and\s+|[{}])/);
  for (const t of tokens) {
    if (t === '{') depth++;
    else if (t === '}') depth--;
    if (depth === 0 && /^\s+and\s+$/.test(t)) {
      names.push(current.trim());
      current = '';
    } else current += t;
  }
  if (current.trim() !== '') names.push(current.trim());
  return names;
}

function escapeName(name: string): string {
  if (name === 'others') return name;
  if (name.startsWith('{') && name.endsWith('}')) return `{${escapeLatex(name.slice(1, -1))}}`;
  return escapeLatex(name);
}

/** The author field: each name escaped, corporate names kept in braces. */
export function formatAuthors(authors: string): string {
  return splitNames(authors).map(escapeName).join(' and ');
}

/** Verbatim fields may not hold unbalanced braces; percent-encode them. */
function verbatim(value: string): string {
  return value.replace(/\{/g, '%7B').replace(/\}/g, '%7D');
}

function fieldsOf(s: SourceRecord): [string, string][] {
  const f: [string, string][] = [];
  const add = (name: string, value: string | null | undefined, raw = false) => {
    if (value !== null && value !== undefined && value !== '') f.push([name, raw ? verbatim(value) : escapeLatex(value)]);
  };
  f.push(['author', formatAuthors(s.authors)]);
  f.push(['title', protectTitle(s.title)]);
  if (s.type === 'article') add('journal', s.journal);
  else if (s.type === 'inproceedings') add('booktitle', s.journal);
  else if (s.type === 'techreport') add('institution', s.publisher ?? s.journal);
  else if (s.type === 'misc') add('howpublished', s.journal);
  if (s.type === 'book' || s.type === 'misc' || s.type === 'inproceedings' || s.type === 'article') add('publisher', s.publisher);
  if (s.year !== null) f.push(['year', String(s.year)]);
  add('volume', s.volume);
  add('pages', s.pages?.replace(/(\d)\s*[-–]\s*(\d)/, '$1--$2'));
  add('doi', s.doi, true);
  if (s.arxiv) {
    f.push(['eprint', verbatim(s.arxiv)]);
    f.push(['archiveprefix', 'arXiv']);
  }
  if (s.bibcode) add('adsurl', adsUrl(s.bibcode), true);
  add('url', s.url, true);
  add('note', s.note);
  return f;
}

/** One BibTeX entry. */
export function bibtexEntry(s: SourceRecord): string {
  const fields = fieldsOf(s);
  const width = Math.max(...fields.map(([n]) => n.length));
  const body = fields.map(([n, v]) => `  ${n.padEnd(width)} = {${v}}`).join(',\n');
  return `@${s.type}{${s.key},\n${body}\n}\n`;
}

/** A .bib file of the given sources, in the order given. */
export function toBibtex(sources: readonly SourceRecord[]): string {
  return sources.map(bibtexEntry).join('\n');
}
