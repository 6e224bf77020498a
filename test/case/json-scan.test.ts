import { describe, expect, it } from 'vitest';
import { scanJson } from '../../src/case/json-scan.js';

describe('scanJson', () => {
  it('finds keys given twice with their paths, in objects inside lists, and escaped spellings', () => {
    const text =
      '{"a":1,"b":{"c":[{"d":1,"d":2},{"e":"x,\\"y","e":3}]},"\\u0061":4,"s":"{[not structure"}';
    expect(scanJson(text, 64)).toEqual({
      tooDeep: false,
      duplicateKeys: ['b.c[0].d', 'b.c[1].e', 'a'],
    });
  });
  it('counts depth exactly: 3 levels pass a limit of 3, 4 do not', () => {
    expect(scanJson('{"a":[{"b":1}]}', 3).tooDeep).toBe(false);
    expect(scanJson('{"a":[{"b":[]}]}', 3).tooDeep).toBe(true);
  });
});
