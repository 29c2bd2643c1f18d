/**
 * Finds where a JSON text first goes wrong (offset, line, column), for error messages:
 * Node 20's JSON.parse does not always say. A small recursive-descent scanner of the
 * JSON grammar (RFC 8259); it validates only, it builds nothing.
 */
export interface JsonErrorPlace {
  offset: number;
  line: number;
  column: number;
}

class Stop extends Error {
  constructor(readonly at: number) {
    super('json');
  }
}

export function locateJsonError(text: string): JsonErrorPlace | undefined {
  let i = 0;
  const ws = () => {
    while (i < text.length && ' \t\n\r'.includes(text[i]!)) i++;
  };
  const fail = (): never => {
    throw new Stop(i);
  };
  const literal = (word: string) => {
    if (text.startsWith(word, i)) i += word.length;
    else fail();
  };
  const string = () => {
    i++; // opening quote
    while (i < text.length) {
      const ch = text[i]!;
      if (ch === '"') {
        i++;
        return;
      }
      if (ch === '\\') {
        const next = text[i + 1];
        if (next === 'u') {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(i + 2, i + 6))) fail();
          i += 6;
        } else if (next !== undefined && '"\\/bfnrt'.includes(next)) i += 2;
        else fail();
      } else if (ch < ' ') fail();
      else i++;
    }
    fail();
  };
  const number = () => {
    const m = /^-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?/.exec(text.slice(i, i + 400));
    if (!m) fail();
    i += m![0].length;
  };
  const value = (depth: number): void => {
    if (depth > 10_000) fail();
    ws();
    const ch = text[i];
    if (ch === '{') {
      i++;
      ws();
      if (text[i] === '}') {
        i++;
        return;
      }
      for (;;) {
        ws();
        if (text[i] !== '"') fail();
        string();
        ws();
        if (text[i] !== ':') fail();
        i++;
        value(depth + 1);
        ws();
        if (text[i] === ',') i++;
        else if (text[i] === '}') {
          i++;
          return;
        } else fail();
      }
    } else if (ch === '[') {
      i++;
      ws();
      if (text[i] === ']') {
        i++;
        return;
      }
      for (;;) {
        value(depth + 1);
        ws();
        if (text[i] === ',') i++;
        else if (text[i] === ']') {
          i++;
          return;
        } else fail();
      }
    } else if (ch === '"') string();
    else if (ch === 't') literal('true');
    else if (ch === 'f') literal('false');
    else if (ch === 'n') literal('null');
    else number();
  };
  try {
    value(0);
    ws();
    if (i < text.length) fail();
    return undefined;
  } catch (e) {
    if (!(e instanceof Stop)) return undefined;
    const before = text.slice(0, e.at);
    const line = before.split('\n').length;
    return { offset: e.at, line, column: e.at - before.lastIndexOf('\n') };
  }
}
