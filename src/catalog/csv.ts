/**
 * A small RFC 4180 CSV reader and writer: comma-separated, fields optionally in double
 * quotes ("" inside quotes is a quote), quoted fields may span lines, CRLF or LF line
 * ends, an optional UTF-8 byte-order mark. Each record remembers the line it starts on
 * so problems can be reported by line number.
 */

export interface CsvRecord {
  /** 1-based line number of the record's first character. */
  line: number;
  fields: string[];
}

export interface CsvParseResult {
  records: CsvRecord[];
  /** Structural problems (an unterminated quote, text after a closing quote). */
  errors: { line: number; message: string }[];
}

export function parseCsv(text: string): CsvParseResult {
  const src = text.startsWith('\uFEFF') ? text.slice(1) : text;
  const records: CsvRecord[] = [];
  const errors: { line: number; message: string }[] = [];
  let line = 1;
  let i = 0;
  while (i < src.length) {
    const startLine = line;
    const fields: string[] = [];
    let field = '';
    let endOfRecord = false;
    while (!endOfRecord) {
      if (src[i] === '"') {
        i++;
        let closed = false;
        while (i < src.length) {
          const ch = src[i]!;
          if (ch === '"') {
            if (src[i + 1] === '"') {
              field += '"';
              i += 2;
              continue;
            }
            i++;
            closed = true;
            break;
          }
          if (ch === '\n') line++;
          field += ch;
          i++;
        }
        if (!closed) {
          errors.push({ line: startLine, message: 'a quoted field is not closed before the end of the file' });
          return { records, errors };
        }
        if (i < src.length && src[i] !== ',' && src[i] !== '\n' && src[i] !== '\r') {
          errors.push({ line, message: 'unexpected text after a closing quote (quote the whole field, double any quote inside it)' });
          while (i < src.length && src[i] !== ',' && src[i] !== '\n') field += src[i++];
        }
      } else {
        while (i < src.length && src[i] !== ',' && src[i] !== '\n' && !(src[i] === '\r' && src[i + 1] === '\n')) field += src[i++];
      }
      if (i >= src.length) {
        fields.push(field);
        endOfRecord = true;
      } else if (src[i] === ',') {
        fields.push(field);
        field = '';
        i++;
      } else {
        // LF or CRLF (a lone CR inside an unquoted field was kept as text above)
        fields.push(field);
        i += src[i] === '\r' && src[i + 1] === '\n' ? 2 : 1;
        line++;
        endOfRecord = true;
      }
    }
    const blank = fields.length === 1 && fields[0]!.trim() === '';
    if (!blank) records.push({ line: startLine, fields });
  }
  return { records, errors };
}

/** One field, quoted when it holds a comma, quote, line break or edge spaces. */
export function csvField(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return '';
  const s = String(value);
  return /[",\r\n]|^\s|\s$/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function csvLine(values: readonly (string | number | null | undefined)[]): string {
  return values.map(csvField).join(',');
}
