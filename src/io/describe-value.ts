/**
 * A short, bounded description of any value for an error message. Input may be a
 * 10 MB string, an array of a million items or an array nested 100 000 levels deep;
 * JSON.stringify of such a value overflows the call stack or yields a message as large
 * as the input. This writer looks at most MAX_LEVELS levels down and a few items per
 * level, and cuts the text at a character budget, so its cost and length are bounded.
 * Small values come out exactly as JSON.stringify writes them ("abc", {"value":1}).
 */

/** Levels of arrays and objects written out; deeper ones appear as [...] or {...}. */
const MAX_LEVELS = 3;
/** Items of an array, or keys of an object, written out per level. */
const MAX_ITEMS = 6;
/** Characters of a string shown before it is cut. */
const MAX_STRING = 60;
/** Longest description returned. */
export const MAX_DESCRIPTION = 200;

function cutString(s: string): string {
  if (s.length <= MAX_STRING) return JSON.stringify(s);
  return `${JSON.stringify(s.slice(0, MAX_STRING))}... (a string of ${s.length} characters)`;
}

function scalar(v: unknown): string | undefined {
  if (v === undefined) return 'nothing (missing)';
  if (v === null) return 'null';
  if (typeof v === 'number') return Object.is(v, -0) ? '-0' : String(v);
  if (typeof v === 'string') return cutString(v);
  if (typeof v === 'boolean') return String(v);
  if (typeof v === 'bigint') return `${v}n`;
  if (typeof v !== 'object') return `a ${typeof v}`;
  return undefined;
}

function write(v: unknown, level: number): string {
  const s = scalar(v);
  if (s !== undefined) return s;
  if (Array.isArray(v)) {
    if (v.length === 0) return '[]';
    if (level >= MAX_LEVELS) return `[... ${v.length} item${v.length === 1 ? '' : 's'}]`;
    const shown = v.slice(0, MAX_ITEMS).map((x) => write(x, level + 1));
    if (v.length > MAX_ITEMS) shown.push(`... (${v.length} items)`);
    return `[${shown.join(',')}]`;
  }
  const keys: string[] = [];
  for (const k in v as object) {
    if (!Object.prototype.hasOwnProperty.call(v, k)) continue;
    keys.push(k);
    if (keys.length > MAX_ITEMS) break;
  }
  if (keys.length === 0) return '{}';
  if (level >= MAX_LEVELS) return '{...}';
  const shown = keys.slice(0, MAX_ITEMS).map((k) => `${cutString(k)}:${write((v as Record<string, unknown>)[k], level + 1)}`);
  if (keys.length > MAX_ITEMS) shown.push('...');
  return `{${shown.join(',')}}`;
}

/** The value as a short text: JSON for small values, a cut preview for large or deep ones. */
export function describeValue(v: unknown): string {
  if (typeof v === 'number' && Number.isNaN(v)) return 'NaN';
  const text = write(v, 0);
  return text.length <= MAX_DESCRIPTION ? text : `${text.slice(0, MAX_DESCRIPTION)}...`;
}
