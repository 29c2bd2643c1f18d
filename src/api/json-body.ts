/**
 * Reading a JSON request body: the content type must be JSON (else 415), the text must
 * parse (else 400 bad-json with the position), no object may repeat a key and nothing
 * may be nested deeper than MAX_JSON_DEPTH (else 400 naming the path). The size limit
 * (413) is applied before, by bodyLimit.
 */
import type { Context } from 'hono';
import { checkJsonText, keyPath } from './json-text.ts';
import { HttpInputError } from './http-errors.ts';

/** application/json, or a JSON-based type such as application/merge-patch+json. */
export function isJsonContentType(header: string | undefined): boolean {
  if (header === undefined) return false;
  const type = header.split(';')[0]!.trim().toLowerCase();
  return type === 'application/json' || /^application\/[a-z0-9.+-]+\+json$/.test(type);
}

export async function readJsonBody(c: Context): Promise<unknown> {
  const type = c.req.header('content-type');
  if (!isJsonContentType(type)) {
    throw new HttpInputError(415, 'unsupported-media-type', `${c.req.method} ${c.req.path} takes a JSON body`, [
      { path: 'Content-Type', message: `expected application/json, got ${type === undefined ? 'no Content-Type header' : JSON.stringify(type.slice(0, 100))}`, allowed: 'application/json' },
    ]);
  }
  const text = await c.req.text();
  if (text.trim() === '') {
    throw new HttpInputError(400, 'bad-json', 'the request body is empty', [{ path: 'body', message: 'the body is empty: send one JSON value' }]);
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (e) {
    const reason = e instanceof SyntaxError ? e.message : 'nested too deeply or too large to read';
    throw new HttpInputError(400, 'bad-json', `the request body is not valid JSON: ${reason}`, [{ path: 'body', message: `not valid JSON: ${reason}` }]);
  }
  const dup = checkJsonText(text);
  if (dup?.kind === 'too-deep') {
    throw new HttpInputError(400, 'bad-json', `the request body is nested deeper than ${dup.maxDepth} levels`, [
      { path: dup.path, message: `nested deeper than ${dup.maxDepth} objects or arrays; hesper's inputs need far fewer`, allowed: `at most ${dup.maxDepth} levels` },
    ]);
  }
  if (dup) {
    const path = keyPath(dup.objectPath, dup.key);
    throw new HttpInputError(400, 'bad-json', `the key "${dup.key}" appears twice in one object`, [
      { path, message: `the key "${dup.key}" appears twice in ${dup.objectPath === '' ? 'the top-level object' : dup.objectPath}; JSON objects must not repeat a key` },
    ]);
  }
  return value;
}
