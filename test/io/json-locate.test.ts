import { describe, expect, it } from 'vitest';
import { locateJsonError } from '../../src/io/json-locate.ts';

describe('locating JSON syntax errors', () => {
  it('accepts what JSON.parse accepts', () => {
    for (const t of ['{}', '[]', '{"a": [1, -2.5e3, "x\\u00e9", true, false, null]}', ' 0 ']) {
      expect(() => JSON.parse(t)).not.toThrow();
      expect(locateJsonError(t)).toBeUndefined();
    }
  });

  it('points at the first bad character', () => {
    expect(locateJsonError('{"a": NaN}')).toEqual({ offset: 6, line: 1, column: 7 });
    expect(locateJsonError('{\n  "a": 1,\n}')).toEqual({ offset: 12, line: 3, column: 1 });
    expect(locateJsonError('{"a": 1} x')).toMatchObject({ line: 1, column: 10 });
    expect(locateJsonError('{"a": "unterminated')).toMatchObject({ line: 1 });
  });
});
