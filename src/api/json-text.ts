/**
 * JSON.parse keeps the last of two equal keys in an object, so a body such as
 * {"name": "a", "name": "b"} would be read silently as one of its meanings; and a body
 * nested thousands of levels deep would reach recursive code (validation, messages,
 * cloning) that can overflow the call stack. This scanner walks text that JSON.parse has
 * already accepted and reports the first repeated key, or the first value nested deeper
 * than the limit, with its path. It keeps its own stack (no recursion).
 */

interface ObjectFrame {
  kind: 'object';
  path: string;
  keys: Set<string>;
  key: string;
  expectKey: boolean;
}

interface ArrayFrame {
  kind: 'array';
  path: string;
  index: number;
}

type Frame = ObjectFrame | ArrayFrame;

/** `parent.key` for a plain name; `parent["key"]` for any other key ("", "a b", "a.b"), so no path is empty. */
export function keyPath(parent: string, key: string): string {
  if (/^[A-Za-z_$][\w$]*$/.test(key)) return parent === '' ? key : `${parent}.${key}`;
  return `${parent}[${JSON.stringify(key)}]`;
}

function childPath(top: Frame | undefined): string {
  if (top === undefined) return '';
  if (top.kind === 'array') return `${top.path}[${top.index}]`;
  return keyPath(top.path, top.key);
}

/** End index (inclusive) of the string literal starting at `start` (a double quote). */
function stringEnd(text: string, start: number): number {
  let j = start + 1;
  while (j < text.length && text[j] !== '"') j += text[j] === '\\' ? 2 : 1;
  return j;
}

export interface DuplicateKey {
  kind: 'duplicate';
  /** Path of the object holding the key twice ("" for the root object). */
  objectPath: string;
  key: string;
}

export interface TooDeep {
  kind: 'too-deep';
  /** Path of the first object or array past the limit. */
  path: string;
  maxDepth: number;
}

/** Deepest nesting of objects and arrays a request body may have (system files need about 5). */
export const MAX_JSON_DEPTH = 64;

/** The first repeated key or over-deep value in valid JSON text, or undefined. */
export function checkJsonText(text: string, maxDepth = MAX_JSON_DEPTH): DuplicateKey | TooDeep | undefined {
  const stack: Frame[] = [];
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    const top = stack[stack.length - 1];
    if (ch === '"') {
      const end = stringEnd(text, i);
      if (top?.kind === 'object' && top.expectKey) {
        const key = JSON.parse(text.slice(i, end + 1)) as string;
        if (top.keys.has(key)) return { kind: 'duplicate', objectPath: top.path, key };
        top.keys.add(key);
        top.key = key;
        top.expectKey = false;
      }
      i = end;
    } else if (ch === '{' || ch === '[') {
      const path = childPath(top);
      if (stack.length >= maxDepth) return { kind: 'too-deep', path: path === '' ? '(root)' : path, maxDepth };
      stack.push(ch === '{' ? { kind: 'object', path, keys: new Set(), key: '', expectKey: true } : { kind: 'array', path, index: 0 });
    } else if (ch === '}' || ch === ']') {
      stack.pop();
    } else if (ch === ',' && top !== undefined) {
      if (top.kind === 'object') top.expectKey = true;
      else top.index++;
    }
  }
  return undefined;
}
