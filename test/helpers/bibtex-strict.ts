/**
 * A strict reader of .bib text that follows BibTeX's own scanner (bibtex.web, BibTeX
 * 0.99d; the rules from memory, checked against real bibtex by scripts/check-bibtex.sh),
 * not a forgiving parser:
 * - Between entries everything is skipped up to the next @ (a % line is not a comment to
 *   BibTeX: an @ on it starts an entry).
 * - @ is followed by an identifier. "comment" is no command at all: BibTeX skips just the
 *   word and goes on looking for @, so an @ inside "@comment{...}" still starts an entry.
 *   "preamble" and "string" are commands with a body; anything else is an entry type.
 * - An entry is delimited by { } or ( ); its key runs to the first comma, white space or
 *   closing delimiter; fields are name = value pairs separated by commas.
 * - A value is pieces joined by #: {...} with every { and } counted (a backslash does
 *   not protect a brace), "..." ending at a " outside braces (braces inside balanced),
 *   a number, or a macro name.
 * Throws on anything BibTeX would report as an error, with the offset.
 */

export interface StrictField {
  name: string;
  /** The pieces of the value as written, delimiters included ({...}, "...", 1999, jan). */
  pieces: string[];
}

export interface StrictEntry {
  type: string;
  key: string;
  fields: StrictField[];
}

export interface StrictBib {
  entries: StrictEntry[];
  /** @preamble and @string commands, by name. */
  commands: string[];
}

/** Characters that cannot be in an identifier (bibtex.web's id_class: " # % ' ( ) , = { } and white space). */
const NOT_ID = /[\s"#%'(),={}]/;

export function readBibStrict(src: string): StrictBib {
  let i = 0;
  const entries: StrictEntry[] = [];
  const commands: string[] = [];
  const fail = (msg: string): never => {
    throw new Error(`BibTeX: ${msg} at offset ${i}: ${JSON.stringify(src.slice(Math.max(0, i - 30), i + 30))}`);
  };
  const white = () => {
    while (i < src.length && /\s/.test(src[i]!)) i++;
  };
  const identifier = (what: string): string => {
    const start = i;
    while (i < src.length && !NOT_ID.test(src[i]!)) i++;
    if (i === start || /^\d/.test(src.slice(start, i))) fail(`expected ${what}`);
    return src.slice(start, i);
  };
  const braced = (): string => {
    const start = i;
    let depth = 0;
    do {
      if (i >= src.length) fail('unbalanced braces: the file ends inside a field');
      if (src[i] === '{') depth++;
      else if (src[i] === '}') depth--;
      i++;
    } while (depth > 0);
    return src.slice(start, i);
  };
  const quoted = (): string => {
    const start = i;
    i++;
    let depth = 0;
    for (;;) {
      if (i >= src.length) fail('the file ends inside a quoted field');
      const c = src[i]!;
      if (c === '{') depth++;
      else if (c === '}' && --depth < 0) fail('unbalanced } in a quoted field');
      else if (c === '"' && depth === 0) break;
      i++;
    }
    i++;
    return src.slice(start, i);
  };
  const value = (close: string): string[] => {
    const pieces: string[] = [];
    for (;;) {
      white();
      const c = src[i];
      if (c === '{') pieces.push(braced());
      else if (c === '"') pieces.push(quoted());
      else if (c !== undefined && /\d/.test(c)) {
        const start = i;
        while (/\d/.test(src[i] ?? '')) i++;
        pieces.push(src.slice(start, i));
      } else pieces.push(identifier('a field value'));
      white();
      if (src[i] !== '#') break;
      i++;
    }
    if (src[i] !== ',' && src[i] !== close) fail(`expected , or ${close} after a field value`);
    return pieces;
  };
  for (;;) {
    const at = src.indexOf('@', i);
    if (at < 0) break;
    i = at + 1;
    white();
    const type = identifier('an entry type').toLowerCase();
    if (type === 'comment') continue;
    white();
    const open = src[i];
    if (open !== '{' && open !== '(') fail(`expected { or ( after @${type}`);
    const close = open === '{' ? '}' : ')';
    i++;
    white();
    if (type === 'preamble') {
      value(close);
      if (src[i] !== close) fail('expected the end of @preamble');
      i++;
      commands.push('preamble');
      continue;
    }
    if (type === 'string') {
      identifier('a string name');
      white();
      if (src[i] !== '=') fail('expected = in @string');
      i++;
      value(close);
      if (src[i] !== close) fail('expected the end of @string');
      i++;
      commands.push('string');
      continue;
    }
    const keyStart = i;
    while (i < src.length && !/[\s,]/.test(src[i]!) && src[i] !== close) i++;
    const key = src.slice(keyStart, i);
    if (key === '') fail('empty key');
    const fields: StrictField[] = [];
    for (;;) {
      white();
      if (src[i] === close) {
        i++;
        break;
      }
      if (src[i] !== ',') fail(`expected , or ${close} in entry ${key}`);
      i++;
      white();
      if (src[i] === close) {
        i++;
        break;
      }
      const name = identifier('a field name').toLowerCase();
      white();
      if (src[i] !== '=') fail(`expected = after field ${name}`);
      i++;
      fields.push({ name, pieces: value(close) });
    }
    entries.push({ type, key, fields });
  }
  return { entries, commands };
}

/** The text commands the writer uses for special characters, back to their characters. */
const COMMANDS: Record<string, string> = {
  '{\\textbackslash}': '\\', '{\\textbraceleft}': '{', '{\\textbraceright}': '}', '{\\textasciitilde}': '~', '{\\textasciicircum}': '^',
  '{\\textless}': '<', '{\\textgreater}': '>', '{\\textbar}': '|', '{\\symbol{64}}': '@',
  '\\&': '&', '\\%': '%', '\\$': '$', '\\#': '#', '\\_': '_',
};

/**
 * Plain text of one braced value written by hesper's escaping of ASCII text: the outer
 * braces removed, the special-character commands decoded, the case-protecting braces
 * dropped. Fails on any other backslash, so a command that escaped the escaping shows.
 */
export function decodeHesperTex(piece: string): string {
  if (!piece.startsWith('{') || !piece.endsWith('}')) throw new Error(`not a braced value: ${piece}`);
  let inner = piece.slice(1, -1);
  const found: string[] = [];
  for (const [cmd, ch] of Object.entries(COMMANDS)) {
    inner = inner.split(cmd).join(`\u0000${found.length}\u0000`);
    found.push(ch);
  }
  if (inner.includes('\\')) throw new Error(`unexpected command in ${piece}`);
  return inner.replace(/[{}]/g, '').replace(/\u0000(\d+)\u0000/g, (_, k: string) => found[Number(k)]!);
}
