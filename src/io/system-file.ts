/** Reading a system file from disk (CLI): JSON, then parseSystem with file access. */
import path from 'node:path';
import { parseJsonText, readInputText } from './files.ts';
import { parseSamplesCsv } from './samples-csv.ts';
import { parseSystem, type SystemInput } from './system.ts';

export function loadSystemFile(file: string, cwd = process.cwd()): SystemInput {
  const full = path.resolve(cwd, file);
  const text = readInputText('system file', cwd, file);
  const json = parseJsonText('system file', text, file);
  const baseDir = path.dirname(full);
  return parseSystem(json, {
    readText: (fieldPath, name) => readInputText(fieldPath, baseDir, name),
    readSamples: (fieldPath, name, column) => parseSamplesCsv(fieldPath, readInputText(fieldPath, baseDir, name), column),
  });
}
