/**
 * Binary-table extensions (FITS Standard 4.0, IAU FITS Working Group 2018, section
 * 7.3): NAXIS1 bytes per row, NAXIS2 rows, TFIELDS columns, each with TFORMn = rT
 * (repeat r, default 1, and a type letter), stored big-endian. Types and widths
 * (FITS Standard 4.0, 2018, table 18): L logical 1, X bit ceil(r/8) bytes, B unsigned byte 1,
 * I 16-bit 2, J 32-bit 4, K 64-bit 8, A character 1, E float 4, D double 8, C complex 8,
 * M double complex 16, P and Q array descriptors 8 and 16. Numeric values are returned
 * as physical values TZEROn + TSCALn x stored (FITS Standard 4.0, 2018, section 7.3.2); an integer equal to
 * TNULLn, and a logical that is neither T nor F, become NaN. Columns of types A, C, M,
 * P and Q are listed but not read as numbers.
 */
import { fitsError, requireInteger } from './header.ts';
import type { FitsFile, FitsHdu } from './file.ts';

const WIDTH: Record<string, number> = { L: 1, X: 0, B: 1, I: 2, J: 4, K: 8, A: 1, E: 4, D: 8, C: 8, M: 16, P: 8, Q: 16 };
const NUMERIC = new Set(['L', 'X', 'B', 'I', 'J', 'K', 'E', 'D']);
const TFORM = /^(\d*)([LXBIJKAEDCMPQ])(.*)$/;

export interface TableColumn {
  /** TTYPEn, or "column n" when absent. */
  name: string;
  /** 1-based column number n. */
  number: number;
  type: string;
  repeat: number;
  /** Byte offset of the column within a row, and its width in bytes. */
  offset: number;
  width: number;
  unit: string;
  scale: number;
  zero: number;
  /** TNULLn for integer columns, when given. */
  nullValue: number | undefined;
}

export interface BinaryTable {
  label: string;
  hdu: FitsHdu;
  rows: number;
  rowBytes: number;
  columns: TableColumn[];
  /** The data of the table (rows x rowBytes bytes). */
  data: DataView;
}

export interface ColumnValues {
  column: TableColumn;
  /** Values per row: rows x repeat, row-major (bits of an X column: one value per bit). */
  values: Float64Array;
  /** Numbers per row. */
  perRow: number;
}

function parseTform(tform: string, label: string, name: string, n: number): { type: string; repeat: number } {
  const m = TFORM.exec(tform.trim());
  if (!m) throw fitsError(label, `${name}: TFORM${n} = '${tform}' is not a binary-table format (rT with T one of L, X, B, I, J, K, A, E, D, C, M, P, Q)`, tform);
  const repeat = m[1] === '' ? 1 : Number(m[1]);
  if (!Number.isSafeInteger(repeat)) throw fitsError(label, `${name}: TFORM${n} = '${tform}' has an unusable repeat count`, tform);
  return { type: m[2]!, repeat };
}

/** The binary table of an HDU, its columns checked against NAXIS1. */
export function binaryTable(file: FitsFile, hdu: FitsHdu): BinaryTable {
  const { label } = file;
  const name = `extension ${hdu.index}${hdu.name ? ` (${hdu.name})` : ''}`;
  const h = hdu.header;
  if (hdu.type !== 'BINTABLE') throw fitsError(label, `${name} is a ${hdu.type} extension, not a binary table (BINTABLE)`);
  if (h.get('BITPIX') !== 8 || h.get('NAXIS') !== 2) throw fitsError(label, `${name}: a binary table needs BITPIX = 8 and NAXIS = 2 (found ${String(h.get('BITPIX'))} and ${String(h.get('NAXIS'))})`);
  const rowBytes = requireInteger(h, 'NAXIS1', label, name, 0, Number.MAX_SAFE_INTEGER);
  const rows = requireInteger(h, 'NAXIS2', label, name, 0, Number.MAX_SAFE_INTEGER);
  const fields = requireInteger(h, 'TFIELDS', label, name, 0, 999);
  const columns: TableColumn[] = [];
  let offset = 0;
  for (let n = 1; n <= fields; n++) {
    const tform = h.get(`TFORM${n}`);
    if (typeof tform !== 'string') throw fitsError(label, `${name} lacks TFORM${n} (a string such as '1D') for column ${n} of ${fields}`);
    const { type, repeat } = parseTform(tform, label, name, n);
    const width = type === 'X' ? Math.ceil(repeat / 8) : repeat * WIDTH[type]!;
    const ttype = h.get(`TTYPE${n}`);
    const tunit = h.get(`TUNIT${n}`);
    const scale = h.get(`TSCAL${n}`) ?? 1;
    const zero = h.get(`TZERO${n}`) ?? 0;
    const tnull = h.get(`TNULL${n}`);
    if (typeof scale !== 'number' || typeof zero !== 'number') throw fitsError(label, `${name}: TSCAL${n} and TZERO${n} must be numbers`);
    if (tnull !== undefined && typeof tnull !== 'number') throw fitsError(label, `${name}: TNULL${n} = ${String(tnull)} must be an integer`, tnull);
    columns.push({
      name: typeof ttype === 'string' && ttype.trim() !== '' ? ttype.trim() : `column ${n}`,
      number: n, type, repeat, offset, width,
      unit: typeof tunit === 'string' ? tunit.trim() : '',
      scale, zero,
      nullValue: typeof tnull === 'number' && 'BIJK'.includes(type) ? tnull : undefined,
    });
    offset += width;
  }
  if (offset !== rowBytes) {
    throw fitsError(label, `${name}: the columns' formats add up to ${offset} bytes per row, but NAXIS1 = ${rowBytes}`, rowBytes);
  }
  if (rows * rowBytes > hdu.dataBytes) throw fitsError(label, `${name}: ${rows} rows of ${rowBytes} bytes do not fit in its data unit`);
  const data = new DataView(file.bytes.buffer, file.bytes.byteOffset + hdu.dataOffset, rows * rowBytes);
  return { label, hdu, rows, rowBytes, columns, data };
}

/** Case-insensitive column look-up (TTYPE values are compared without case, as mission files vary). */
export function findColumn(table: BinaryTable, name: string): TableColumn | undefined {
  const want = name.trim().toUpperCase();
  return table.columns.find((c) => c.name.toUpperCase() === want);
}

/** Physical values of a numeric column (every element of every row). */
export function readColumn(table: BinaryTable, column: TableColumn): ColumnValues {
  if (!NUMERIC.has(column.type)) {
    throw fitsError(table.label, `column ${column.name} has format ${column.repeat}${column.type}, which is not numeric (L, X, B, I, J, K, E or D)`, column.name);
  }
  const { data, rows, rowBytes } = table;
  const perRow = column.repeat;
  const values = new Float64Array(rows * perRow);
  const { type, scale, zero, nullValue } = column;
  const scaled = scale !== 1 || zero !== 0;
  for (let r = 0; r < rows; r++) {
    const base = r * rowBytes + column.offset;
    for (let e = 0; e < perRow; e++) {
      let v: number;
      switch (type) {
        case 'L': {
          const b = data.getUint8(base + e);
          v = b === 0x54 ? 1 : b === 0x46 ? 0 : NaN; // 'T', 'F'; 0 means undefined
          values[r * perRow + e] = v;
          continue;
        }
        case 'X':
          values[r * perRow + e] = (data.getUint8(base + (e >> 3)) >> (7 - (e & 7))) & 1;
          continue;
        case 'B': v = data.getUint8(base + e); break;
        case 'I': v = data.getInt16(base + 2 * e, false); break;
        case 'J': v = data.getInt32(base + 4 * e, false); break;
        case 'K': {
          const big = data.getBigInt64(base + 8 * e, false);
          if (nullValue !== undefined && big === BigInt(nullValue)) {
            values[r * perRow + e] = NaN;
            continue;
          }
          v = Number(big);
          values[r * perRow + e] = scaled ? zero + scale * v : v;
          continue;
        }
        case 'E': v = data.getFloat32(base + 4 * e, false); break;
        default: v = data.getFloat64(base + 8 * e, false); break; // 'D'
      }
      if (nullValue !== undefined && v === nullValue) v = NaN;
      else if (scaled) v = zero + scale * v;
      values[r * perRow + e] = v;
    }
  }
  return { column, values, perRow };
}
