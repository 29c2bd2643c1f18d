/**
 * FITS header units (FITS Standard 4.0, IAU FITS Working Group 2018, sections 3-4):
 * 2880-byte blocks of 36 cards of 80 ASCII characters, ending with the END card. A
 * card is a keyword (columns 1-8), the value indicator "= " (columns 9-10) and a value
 * with an optional "/ comment". Values are logical (T/F), integer, floating-point
 * (E or D exponent), or a string in single quotes ('' is a quote inside it); complex
 * values are kept as text. CONTINUE cards (the long-string convention) are appended
 * to the string before them when it ends in '&', and otherwise ignored; COMMENT,
 * HISTORY and blank cards carry no value. Every problem names the file, the header and
 * the card.
 */
import { HesperError } from '../../errors.ts';

export const BLOCK_BYTES = 2880;
export const CARD_BYTES = 80;
export const CARDS_PER_BLOCK = BLOCK_BYTES / CARD_BYTES;
/** Largest header read, in blocks (36 000 cards; mission light-curve headers have a few hundred; our choice). */
export const MAX_HEADER_BLOCKS = 1000;
/** Longest string value kept after CONTINUE cards (characters; our choice). */
const MAX_STRING_CHARS = 8192;

export type FitsValue = boolean | number | string;

export interface FitsCard {
  keyword: string;
  value: FitsValue | undefined;
  /** 1-based card number within the header. */
  card: number;
}

export interface FitsHeader {
  cards: FitsCard[];
  /** Byte offset of the header in the file and its length in bytes (whole blocks). */
  offset: number;
  bytes: number;
  /** The first value of a keyword, or undefined. */
  get(keyword: string): FitsValue | undefined;
  has(keyword: string): boolean;
}

/** A malformed FITS file: code bad-fits, path = the file label. */
export function fitsError(label: string, message: string, value?: unknown): HesperError {
  const issue = value === undefined ? { path: label, message } : { path: label, message, value };
  return new HesperError('bad-fits', `${label}: ${message}`, [issue]);
}

const KEYWORD = /^[A-Z0-9_-]*$/;
const INTEGER = /^[+-]?\d+$/;
const REAL = /^[+-]?(\d+\.?\d*|\.\d+)([EeDd][+-]?\d+)?$/;

/** Parses the value field (columns 11-80) of a card: [value, rest of the card]. */
function parseValue(field: string, where: () => string, label: string): FitsValue | undefined {
  const text = field.trimStart();
  if (text === '' || text.startsWith('/')) return undefined; // undefined value (FITS Standard 4.0, 2018, section 4.2)
  if (text.startsWith("'")) {
    let out = '';
    let i = 1;
    for (;;) {
      const q = text.indexOf("'", i);
      if (q < 0) throw fitsError(label, `${where()}: string value has no closing quote`);
      out += text.slice(i, q);
      if (text[q + 1] === "'") {
        out += "'";
        i = q + 2;
        continue;
      }
      break;
    }
    // Trailing spaces of a string are not significant; leading ones are (FITS Standard 4.0, 2018, section 4.2.1).
    return out.replace(/ +$/, '');
  }
  const slash = text.indexOf('/');
  const token = (slash >= 0 ? text.slice(0, slash) : text).trim();
  if (token === 'T') return true;
  if (token === 'F') return false;
  if (INTEGER.test(token)) return Number(token);
  if (REAL.test(token)) return Number(token.replace(/[Dd]/, 'E'));
  if (token.startsWith('(')) return token; // complex: kept as text
  throw fitsError(label, `${where()}: value "${token}" is not a FITS logical, number or string`, token);
}

/**
 * Reads the header that starts at `offset`. `name` labels the header in messages
 * ("primary header", "extension 2 header").
 */
export function readHeader(bytes: Uint8Array, offset: number, label: string, name: string): FitsHeader {
  const cards: FitsCard[] = [];
  let pos = offset;
  let ended = false;
  for (let block = 0; block < MAX_HEADER_BLOCKS && !ended; block++) {
    if (pos + BLOCK_BYTES > bytes.length) {
      const have = bytes.length - pos;
      throw fitsError(label, `${name} is truncated: ${have > 0 ? `only ${have} bytes of a 2880-byte block remain` : 'the file ends'} before its END card (after ${cards.length} cards)`);
    }
    for (let c = 0; c < CARDS_PER_BLOCK; c++) {
      const start = pos + c * CARD_BYTES;
      const number = block * CARDS_PER_BLOCK + c + 1;
      let text = '';
      for (let k = 0; k < CARD_BYTES; k++) {
        const b = bytes[start + k]!;
        if (b < 0x20 || b > 0x7e) {
          throw fitsError(label, `${name}, card ${number}: byte ${b} at column ${k + 1} is not printable ASCII (a FITS header is 80-character ASCII cards; is this a FITS file?)`, b);
        }
        text += String.fromCharCode(b);
      }
      const keyword = text.slice(0, 8).trimEnd();
      const where = (): string => `${name}, card ${number} (${keyword || 'blank'})`;
      if (!KEYWORD.test(keyword)) throw fitsError(label, `${where()}: keyword "${keyword}" has characters other than A-Z, 0-9, - and _`, keyword);
      if (keyword === 'END') {
        ended = true;
        break;
      }
      if (keyword === 'CONTINUE') {
        const prev = cards[cards.length - 1];
        const more = parseValue(text.slice(8), where, label);
        if (prev && typeof prev.value === 'string' && prev.value.endsWith('&') && typeof more === 'string' && prev.value.length < MAX_STRING_CHARS) {
          prev.value = prev.value.slice(0, -1) + more;
        }
        continue;
      }
      const hasValue = text.slice(8, 10) === '= ' && keyword !== 'COMMENT' && keyword !== 'HISTORY' && keyword !== '';
      cards.push({ keyword, value: hasValue ? parseValue(text.slice(10), where, label) : undefined, card: number });
    }
    pos += BLOCK_BYTES;
  }
  if (!ended) throw fitsError(label, `${name} has no END card within ${MAX_HEADER_BLOCKS} blocks (${MAX_HEADER_BLOCKS * CARDS_PER_BLOCK} cards)`);
  const first = new Map<string, FitsValue | undefined>();
  for (const card of cards) if (card.value !== undefined && !first.has(card.keyword)) first.set(card.keyword, card.value);
  return {
    cards,
    offset,
    bytes: pos - offset,
    get: (k) => first.get(k),
    has: (k) => first.has(k),
  };
}

/** A mandatory non-negative integer keyword, bounded. */
export function requireInteger(h: FitsHeader, keyword: string, label: string, name: string, min: number, max: number): number {
  const v = h.get(keyword);
  if (v === undefined) throw fitsError(label, `${name} lacks the mandatory keyword ${keyword}`);
  if (typeof v !== 'number' || !Number.isInteger(v)) throw fitsError(label, `${name}: ${keyword} = ${String(v)} must be an integer`, v);
  if (v < min || v > max) throw fitsError(label, `${name}: ${keyword} = ${v} is outside [${min}, ${max}]`, v);
  return v;
}
