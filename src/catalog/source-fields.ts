/**
 * What a bibliographic field of a source record may hold so that the BibTeX, LaTeX and
 * Markdown writers can always write it safely. Used by the record schema (refusal at
 * input, naming the field and the problem) and by the BibTeX writer (which writes
 * verbatim fields through the same character sets, percent-encoding anything else, so
 * even a record stored by an older version cannot break out of its field).
 *
 * - DOI: "10." + registrant code (digits, optionally subdivided by periods) + "/" +
 *   suffix (DOI Handbook, "General characteristics of the DOI syntax", ISO 26324). The
 *   handbook allows any printable Unicode in the suffix; hesper accepts the printable
 *   ASCII that DOIs are registered with in practice (letters, digits and
 *   - . _ ; ( ) / : < > [ ] + * ' ! = , & ~ $, which covers old SICI-style DOIs such as
 *   10.1175/1520-0469(1972)029<0959:AOTSS>2.0.CO;2) and refuses the characters that TeX
 *   or a URL would read as syntax: backslash, braces, ^ (TeX reads ^^5c as a
 *   backslash), %, #, ", ?, `, |, @ and white space.
 * - URL: http or https, then only the characters RFC 3986 (2005), section 2, allows
 *   (unreserved A-Z a-z 0-9 - . _ ~, reserved : / ? # [ ] @ ! $ & ' ( ) * + , ; =, and
 *   % followed by two hex digits). That excludes white space, backslash, braces, ^, |,
 *   < > " and `. hesper also refuses @ (user information in the authority is
 *   deprecated by RFC 3986, section 3.2.1; write @ in a path as %40), so no field of the
 *   BibTeX output holds an @.
 * - Text (authors, title, journal, publisher, volume, pages, note): any printable
 *   Unicode; control characters and the bidirectional embedding, override and isolate
 *   controls (U+202A-U+202E, U+2066-U+2069), which can make text display in another
 *   order than it is read, are refused. The writers escape everything else.
 * - Authors: one line in BibTeX name-list syntax; braces only around a whole corporate name (BibTeX
 *   counts every brace, so an inner one would change where the name or the field
 *   ends), no empty name, at most two commas per name ("Last, Jr., First").
 */

/** One character of a DOI suffix (see above). */
export const DOI_SUFFIX_CHAR = /[A-Za-z0-9\-._;()/:<>[\]+*'!=,&~$]/;
/** A whole DOI. */
export const DOI_PATTERN = /^10\.\d{4,9}(?:\.\d+)*\/[A-Za-z0-9\-._;()/:<>[\]+*'!=,&~$]+$/;

/** One character of a URL (RFC 3986, section 2) other than %, less @. */
export const URL_CHAR = /[A-Za-z0-9\-._~:/?#[\]!$&'()*+,;=]/;
/** A whole URL: http(s), a host, then RFC 3986 characters or %XX escapes; no @. */
export const URL_PATTERN = /^https?:\/\/[A-Za-z0-9\-._~]+(?::\d{1,5})?(?:[/?#](?:[A-Za-z0-9\-._~:/?#[\]!$&'()*+,;=]|%[0-9A-Fa-f]{2})*)?$/;

/** One character of an arXiv identifier. */
export const ARXIV_CHAR = /[A-Za-z0-9./-]/;

/** Control characters (C0 but tab, LF and CR; DEL; C1) and bidirectional controls. */
const UNSAFE_TEXT = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069]/u;

/** Why a text field cannot be written safely, or undefined when it can. */
export function textProblem(text: string): string | undefined {
  const m = UNSAFE_TEXT.exec(text);
  if (m) {
    const code = `U+${m[0].codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`;
    return `holds the control character ${code} at position ${m.index + 1}; remove it (bidirectional and other control characters are not allowed in bibliographic text)`;
  }
  if (/[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/.test(text)) return 'holds an unpaired surrogate (not valid Unicode text)';
  return undefined;
}

/** Why a DOI cannot be written safely, or undefined when it can. */
export function doiProblem(doi: string): string | undefined {
  if (DOI_PATTERN.test(doi)) return undefined;
  if (/^https?:|^doi:/i.test(doi)) return 'give the DOI without https://doi.org/ or doi: (it looks like 10.1234/abc)';
  if (!/^10\.\d{4,9}(?:\.\d+)*\//.test(doi)) return 'a DOI starts with 10., a registrant code of digits and a slash, like 10.1234/abc';
  const bad = [...doi.slice(doi.indexOf('/') + 1)].find((c) => !DOI_SUFFIX_CHAR.test(c));
  return bad === undefined
    ? 'the part after the slash is empty'
    : `${describeChar(bad)} is not allowed in a DOI here (allowed after the slash: letters, digits and - . _ ; ( ) / : < > [ ] + * ' ! = , & ~ $)`;
}

/** Why a URL cannot be written safely, or undefined when it can. */
export function urlProblem(url: string): string | undefined {
  if (URL_PATTERN.test(url)) return undefined;
  if (!/^https?:\/\//.test(url)) return 'a URL starts with http:// or https://';
  const rest = url.replace(/^https?:\/\//, '');
  if (rest.includes('@')) return 'a URL here may not contain @ (no user information; write @ in a path as %40)';
  const bad = [...rest].find((c) => c !== '%' && !URL_CHAR.test(c));
  if (bad !== undefined) return `${describeChar(bad)} is not allowed in a URL (RFC 3986 characters only: percent-encode it)`;
  if (/%(?![0-9A-Fa-f]{2})/.test(rest)) return 'a % in a URL must start a percent-escape such as %20';
  return 'the host is missing or malformed (http://host/path)';
}

/** Splits a name list at top-level " and " (BibTeX counts braces; "and" in braces is text). */
export function splitAuthorList(authors: string): string[] {
  const names: string[] = [];
  let depth = 0;
  let current = '';
  for (const t of authors.split(/(\s+and(?=\s)|[{}])/)) {
    if (t === '{') depth++;
    else if (t === '}') depth--;
    if (depth === 0 && /^\s+and$/.test(t)) {
      names.push(current.trim());
      current = '';
    } else current += t;
  }
  names.push(current.trim());
  return names;
}

/** Why an author list cannot be written as BibTeX names, or undefined when it can. */
export function authorsProblem(authors: string): string | undefined {
  const text = textProblem(authors);
  if (text !== undefined) return text;
  if (/[\t\n\r]/.test(authors)) return 'holds a line break or tab; write the author list on one line';
  let depth = 0;
  for (const ch of authors) {
    if (ch === '{') depth++;
    else if (ch === '}' && --depth < 0) return 'braces in authors must be balanced (use them only around a corporate name)';
  }
  if (depth !== 0) return 'braces in authors must be balanced (use them only around a corporate name)';
  const names = splitAuthorList(authors);
  for (const [i, name] of names.entries()) {
    const which = `name ${i + 1} ("${name.slice(0, 40)}")`;
    if (name === '') return `name ${i + 1} is empty (two "and" in a row, or "and" at the start or end)`;
    const corporate = /^\{[^{}]*\}$/.test(name);
    if (!corporate && /[{}]/.test(name)) return `${which}: braces may only enclose a whole corporate name, like {NASA Space Science Data Coordinated Archive}`;
    if (!corporate && (name.match(/,/g) ?? []).length > 2) return `${which} has more than two commas; BibTeX reads "Last, First" or "Last, Jr., First"`;
  }
  return undefined;
}

function describeChar(c: string): string {
  if (/\s/.test(c)) return 'white space';
  return `the character "${c}"`;
}
