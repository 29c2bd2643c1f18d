/**
 * Reading files named inside an input file (CLI only; the API never reads paths).
 * Relative paths resolve against the directory of the file that names them, and
 * anything that is not a regular file (a directory, a device, a FIFO) is refused.
 */
import { readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { inputError } from '../errors.ts';
import { locateJsonError } from './json-locate.ts';

/** Largest file hesper reads as an input (samples, response curves, light curves). */
export const MAX_INPUT_FILE_BYTES = 256 * 1024 * 1024;

export function resolveInputPath(baseDir: string, file: string): string {
  return path.isAbsolute(file) ? file : path.resolve(baseDir, file);
}

/** Reads a regular file as UTF-8 text, or throws file-unreadable naming `fieldPath`. */
export function readInputText(fieldPath: string, baseDir: string, file: string): string {
  return readInputFile(fieldPath, baseDir, file, 'utf8');
}

/** Reads a regular file as bytes (same checks and size limit as readInputText). */
export function readInputBytes(fieldPath: string, baseDir: string, file: string): Uint8Array {
  return readInputFile(fieldPath, baseDir, file, null);
}

function readInputFile(fieldPath: string, baseDir: string, file: string, encoding: 'utf8'): string;
function readInputFile(fieldPath: string, baseDir: string, file: string, encoding: null): Uint8Array;
function readInputFile(fieldPath: string, baseDir: string, file: string, encoding: 'utf8' | null): string | Uint8Array {
  const full = resolveInputPath(baseDir, file);
  let size: number;
  try {
    const st = statSync(full);
    if (!st.isFile()) throw inputError('file-unreadable', fieldPath, `"${file}" is not a regular file`, file);
    size = st.size;
  } catch (e) {
    if ((e as { code?: string }).code === 'file-unreadable') throw e;
    throw inputError('file-unreadable', fieldPath, `cannot read "${file}" (resolved to ${full}): ${(e as NodeJS.ErrnoException).code ?? 'error'}`, file);
  }
  if (size > MAX_INPUT_FILE_BYTES) {
    throw inputError('file-unreadable', fieldPath, `"${file}" is ${size} bytes, larger than the ${MAX_INPUT_FILE_BYTES}-byte limit`, file);
  }
  try {
    return encoding ? readFileSync(full, encoding) : readFileSync(full);
  } catch (e) {
    throw inputError('file-unreadable', fieldPath, `cannot read "${file}": ${(e as NodeJS.ErrnoException).code ?? 'error'}`, file);
  }
}

/** Parses JSON text, turning a syntax error into an issue with its line and column. */
export function parseJsonText(fieldPath: string, text: string, label: string): unknown {
  try {
    return JSON.parse(text);
  } catch (e) {
    if (!(e instanceof SyntaxError)) {
      // A parser may run out of stack on valid but absurdly deep text (RangeError).
      throw inputError('invalid-input', fieldPath, `${label} could not be read as JSON (${e instanceof Error ? e.name : 'error'}: nested too deeply or too large); hesper's input files need only a few levels of nesting`);
    }
    const place = locateJsonError(text);
    const where = place ? ` at line ${place.line}, column ${place.column}` : '';
    const near = place ? `: near ${JSON.stringify(text.slice(place.offset, place.offset + 20))}` : `: ${(e as Error).message}`;
    throw inputError('invalid-input', fieldPath, `${label} is not valid JSON${where}${near}`);
  }
}
