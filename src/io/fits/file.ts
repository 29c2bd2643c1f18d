/**
 * The structure of a FITS file (FITS Standard 4.0, IAU FITS Working Group 2018,
 * sections 3, 4.4 and 7): a primary HDU (SIMPLE = T first) then extensions
 * (XTENSION first), each a header and a data unit padded to 2880-byte blocks, with
 * data size |BITPIX| / 8 x GCOUNT x (PCOUNT + NAXIS1 x ... x NAXISn). Sizes from the
 * header are checked against the bytes the file holds before anything is read, so a
 * header cannot make the reader allocate or read past the file.
 */
import { BLOCK_BYTES, fitsError, readHeader, requireInteger, type FitsHeader } from './header.ts';

/** Most HDUs walked in one file (our choice; mission light-curve files have 2-3). */
export const MAX_HDUS = 1000;
const BITPIX = new Set([8, 16, 32, 64, -32, -64]);

export interface FitsHdu {
  /** 0 for the primary HDU, then 1, 2, ... */
  index: number;
  /** 'PRIMARY', or the XTENSION value ('BINTABLE', 'IMAGE', 'TABLE', ...). */
  type: string;
  /** EXTNAME, or '' when absent. */
  name: string;
  header: FitsHeader;
  /** Byte offset and length of the data unit (without its padding). */
  dataOffset: number;
  dataBytes: number;
}

export interface FitsFile {
  label: string;
  bytes: Uint8Array;
  hdus: FitsHdu[];
}

/** True when the bytes start like a FITS file (the card "SIMPLE  =" at byte 0). */
export function looksLikeFits(bytes: Uint8Array): boolean {
  const magic = 'SIMPLE  =';
  if (bytes.length < magic.length) return false;
  for (let i = 0; i < magic.length; i++) if (bytes[i] !== magic.charCodeAt(i)) return false;
  return true;
}

function hduName(index: number): string {
  return index === 0 ? 'primary header' : `extension ${index} header`;
}

function dataSize(h: FitsHeader, label: string, name: string, available: number, primary: boolean): number {
  const bitpix = requireInteger(h, 'BITPIX', label, name, -64, 64);
  if (!BITPIX.has(bitpix)) throw fitsError(label, `${name}: BITPIX = ${bitpix} must be one of 8, 16, 32, 64, -32, -64`, bitpix);
  const naxis = requireInteger(h, 'NAXIS', label, name, 0, 999);
  const pcount = primary ? 0 : requireInteger(h, 'PCOUNT', label, name, 0, Number.MAX_SAFE_INTEGER);
  const gcount = primary ? 1 : requireInteger(h, 'GCOUNT', label, name, 0, Number.MAX_SAFE_INTEGER);
  if (naxis === 0) return 0;
  const groups = primary && h.get('GROUPS') === true && h.get('NAXIS1') === 0;
  const bytesPer = Math.abs(bitpix) / 8;
  let elements = 1;
  for (let k = groups ? 2 : 1; k <= naxis; k++) {
    const n = requireInteger(h, `NAXIS${k}`, label, name, 0, Number.MAX_SAFE_INTEGER);
    elements *= n;
    // Checked as we go: the product can never exceed what the file holds.
    if (elements * bytesPer > available && pcount === 0) {
      throw fitsError(label, `${name}: the data unit (${naxisText(h, naxis)}) needs at least ${elements * bytesPer} bytes but only ${available} bytes are left in the file (truncated file or wrong axis lengths)`, n);
    }
  }
  const total = bytesPer * gcount * (pcount + elements);
  if (!(total <= available)) {
    throw fitsError(label, `${name}: the data unit (${naxisText(h, naxis)}, PCOUNT = ${pcount}, GCOUNT = ${gcount}) needs ${total} bytes but only ${available} bytes are left in the file (truncated file or wrong axis lengths)`, total);
  }
  return total;
}

function naxisText(h: FitsHeader, naxis: number): string {
  const parts: string[] = [];
  for (let k = 1; k <= Math.min(naxis, 4); k++) parts.push(`NAXIS${k} = ${String(h.get(`NAXIS${k}`))}`);
  return parts.join(', ');
}

/** Walks every HDU of a FITS file held in memory. */
export function parseFits(bytes: Uint8Array, label: string): FitsFile {
  if (!looksLikeFits(bytes)) throw fitsError(label, 'not a FITS file: it does not start with the card SIMPLE = T');
  const hdus: FitsHdu[] = [];
  let offset = 0;
  while (offset < bytes.length && hdus.length < MAX_HDUS) {
    const index = hdus.length;
    if (index > 0) {
      // What follows the last HDU: nothing, zero padding, or another extension.
      const start = String.fromCharCode(...bytes.subarray(offset, offset + 8));
      if (bytes.length - offset < BLOCK_BYTES) {
        if (start === 'XTENSION') throw fitsError(label, `${hduName(index)} is truncated: only ${bytes.length - offset} bytes of a 2880-byte block remain`);
        if (bytes.subarray(offset).every((b) => b === 0)) break;
        throw fitsError(label, `${bytes.length - offset} bytes after extension ${index - 1} are not a whole 2880-byte block (a truncated or corrupt file)`);
      }
      if (start !== 'XTENSION') {
        if (bytes.subarray(offset, offset + BLOCK_BYTES).every((b) => b === 0)) break;
        throw fitsError(label, `${hduName(index)} at byte ${offset} does not start with XTENSION (found ${JSON.stringify(start.trimEnd())}): the file is corrupt after extension ${index - 1}`);
      }
    }
    const name = hduName(index);
    const header = readHeader(bytes, offset, label, name);
    const first = header.cards[0];
    if (index === 0 && (first?.keyword !== 'SIMPLE' || first.value !== true)) {
      throw fitsError(label, 'primary header: the first card must be SIMPLE = T (a file that does not conform to the FITS standard)');
    }
    const type = index === 0 ? 'PRIMARY' : header.get('XTENSION');
    if (typeof type !== 'string') throw fitsError(label, `${name}: XTENSION must be a string such as 'BINTABLE'`, type);
    const dataOffset = offset + header.bytes;
    const dataBytes = dataSize(header, label, name, bytes.length - dataOffset, index === 0);
    const extname = header.get('EXTNAME');
    hdus.push({ index, type: type.trim(), name: typeof extname === 'string' ? extname.trim() : '', header, dataOffset, dataBytes });
    offset = dataOffset + Math.ceil(dataBytes / BLOCK_BYTES) * BLOCK_BYTES;
  }
  if (hdus.length >= MAX_HDUS && offset < bytes.length) throw fitsError(label, `more than ${MAX_HDUS} HDUs: not read`);
  return { label, bytes, hdus };
}
