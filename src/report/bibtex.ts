/**
 * BibTeX from catalog source records. Text is stored as plain Unicode; here it is
 * escaped for (La)TeX: the special characters, accented letters as accent commands
 * ({\'e}, {\v{z}}, {\'\i}) so classic 8-bit BibTeX keeps them, a few symbols as math,
 * and words with capitals after the first letter of the title braced so bibliography
 * styles keep their case. url, adsurl, doi and eprint are verbatim fields.
 *
 * Safety, by BibTeX's own reading (Patashnik 1988, "BibTeXing", and the brace scanner
 * of bibtex.web; from memory): inside a braced field value BibTeX counts every { and },
 * a backslash does not protect a brace, and the field ends at the brace that returns
 * the depth to zero. So no escaped text here holds a brace of its own: a literal brace
 * is written {\textbraceleft} / {\textbraceright}, and every brace the writer emits
 * comes in a pair. An @ in text is written {\symbol{64}}, so no @ is left inside a
 * field (BibTeX starts an entry at an @ outside braces); verbatim
 * fields hold only the DOI, URL and arXiv character sets of source-fields.ts, anything
 * else percent-encoded. Every field is checked by BibTeX's brace count before it is
 * written, and the key against the source-key pattern.
 */
import type { SourceRecord } from '../catalog/index.ts';
import { ARXIV_CHAR, DOI_SUFFIX_CHAR, splitAuthorList, URL_CHAR } from '../catalog/source-fields.ts';
import { adsUrl, SOURCE_KEY_PATTERN, SOURCE_TYPES } from '../catalog/vocab.ts';
import { HesperError } from '../errors.ts';
import { versionLine, type WriterVersions } from './versions.ts';

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

/**
 * The characters TeX, LaTeX or BibTeX read as syntax. Braces become text commands
 * (BibTeX would count the brace of \{), < > | are not in the OT1 text fonts, ^ would
 * also start TeX's ^^ character notation, @ starts a BibTeX entry. A text command
 * sits in its own braces: to BibTeX's case changing that is one "special character"
 * (its letters are not case-changed), and a protected title word that starts with one
 * stays protected.
 */
const SPECIALS: Record<string, string> = {
  '\\': '{\\textbackslash}', '{': '{\\textbraceleft}', '}': '{\\textbraceright}', '&': '\\&', '%': '\\%', '$': '\\$', '#': '\\#',
  '_': '\\_', '~': '{\\textasciitilde}', '^': '{\\textasciicircum}', '<': '{\\textless}', '>': '{\\textgreater}', '|': '{\\textbar}',
  '@': '{\\symbol{64}}',
};

/** Line breaks and tabs become spaces (a blank line would end a TeX paragraph); control and bidirectional characters are dropped. */
const SPACE = /[\t\n\r\u2028\u2029\u0085]/;
const DROPPED = /[\u0000-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069]/;

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
    else if (SPACE.test(ch)) out += ' ';
    else if (DROPPED.test(ch)) continue;
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
      if (/^\s*$/.test(w)) return w === '' ? w : ' ';
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
  return splitAuthorList(authors).filter((n) => n !== '');
}

function escapeName(name: string): string {
  if (name === 'others') return name;
  if (/^\{[^{}]*\}$/.test(name)) return `{${escapeLatex(name.slice(1, -1))}}`;
  return escapeLatex(name);
}

/** The author field: each name escaped, corporate names kept in braces. */
export function formatAuthors(authors: string): string {
  return splitNames(authors).map(escapeName).join(' and ');
}

/** Percent-encodes (UTF-8) every character outside a verbatim field's set; a % stays only before two hex digits. */
export function percentEncodeOutside(value: string, allowed: RegExp, keepPercentEscapes = false): string {
  let out = '';
  const chars = [...value];
  chars.forEach((ch, k) => {
    if (allowed.test(ch)) out += ch;
    else if (keepPercentEscapes && ch === '%' && /^[0-9A-Fa-f]{2}$/.test((chars[k + 1] ?? '') + (chars[k + 2] ?? ''))) out += ch;
    else for (const b of new TextEncoder().encode(ch)) out += `%${b.toString(16).toUpperCase().padStart(2, '0')}`;
  });
  return out;
}

/** DOI: prefix digits and periods kept, the suffix through the DOI character set. */
function verbatimDoi(doi: string): string {
  const slash = doi.indexOf('/');
  const prefix = slash < 0 ? '' : doi.slice(0, slash);
  if (!/^10\.[\d.]+$/.test(prefix)) return percentEncodeOutside(doi, DOI_SUFFIX_CHAR);
  return `${prefix}/${percentEncodeOutside(doi.slice(slash + 1), DOI_SUFFIX_CHAR)}`;
}

/** URL: RFC 3986 characters and %XX escapes kept, everything else (and @) percent-encoded. */
function verbatimUrl(url: string): string {
  return percentEncodeOutside(url, URL_CHAR, true);
}

/**
 * Brace depth by BibTeX's rule (every { and } counts, backslash or not): the problem
 * with a field value, or undefined when it is balanced and holds no @.
 */
export function bibtexFieldProblem(value: string): string | undefined {
  let depth = 0;
  for (const ch of value) {
    if (ch === '{') depth++;
    else if (ch === '}' && --depth < 0) return 'a closing brace ends the field early';
    else if (ch === '@') return 'holds an @';
  }
  return depth === 0 ? undefined : 'braces left open';
}

/** The key as written after @type{, or a failure naming it (keys are checked at input; a bad one means a damaged database). */
export function citationKey(key: string): string {
  if (!SOURCE_KEY_PATTERN.test(key)) {
    throw new HesperError('internal', `source key ${JSON.stringify(key.slice(0, 100))} is not a safe BibTeX key`, [{ path: 'key', message: 'a source key starts with a letter and has only letters, digits and _ : . + -', value: key.slice(0, 100) }], 'internal');
  }
  return key;
}

function fieldsOf(s: SourceRecord): [string, string][] {
  const f: [string, string][] = [];
  const add = (name: string, value: string | null | undefined) => {
    if (value !== null && value !== undefined && value !== '') f.push([name, escapeLatex(value)]);
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
  if (s.doi) f.push(['doi', verbatimDoi(s.doi)]);
  if (s.arxiv) {
    f.push(['eprint', percentEncodeOutside(s.arxiv, ARXIV_CHAR)]);
    f.push(['archiveprefix', 'arXiv']);
  }
  if (s.bibcode) f.push(['adsurl', verbatimUrl(adsUrl(s.bibcode))]);
  if (s.url) f.push(['url', verbatimUrl(s.url)]);
  add('note', s.note);
  return f;
}

/** One BibTeX entry. */
export function bibtexEntry(s: SourceRecord): string {
  const key = citationKey(s.key);
  const type = (SOURCE_TYPES as readonly string[]).includes(s.type) ? s.type : 'misc';
  const fields = fieldsOf(s);
  for (const [name, value] of fields) {
    const problem = bibtexFieldProblem(value);
    if (problem !== undefined) {
      throw new HesperError('internal', `the BibTeX ${name} of ${key} could not be written safely: ${problem}`, [{ path: `${key}.${name}`, message: problem }], 'internal');
    }
  }
  const width = Math.max(...fields.map(([n]) => n.length));
  const body = fields.map(([n, v]) => `  ${n.padEnd(width)} = {${v}}`).join(',\n');
  return `@${type}{${key},\n${body}\n}\n`;
}

/**
 * A .bib file of the given sources, in the order given. With versions, a header of
 * comment lines (text outside entries, which BibTeX skips; it holds no @) names the
 * hesper and catalog versions.
 */
export function toBibtex(sources: readonly SourceRecord[], versions?: WriterVersions): string {
  const entries = sources.map(bibtexEntry).join('\n');
  if (versions === undefined) return entries;
  const head = [`% ${versionLine(versions)}`, '% DOIs and URLs are verbatim fields: load the url (or hyperref) package so a style typesets them with \\url.'];
  return `${head.join('\n')}\n\n${entries}`;
}
