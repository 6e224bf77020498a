import { describe, expect, it } from 'vitest';
import type { Key } from 'ink';
import { splitKeys } from '../../src/ui/split-keys.js';

const plain = { return: false, ctrl: false } as Key;
const flags = (pairs: [string, Key][]) =>
  pairs.map(
    ([input, k]) =>
      `${input}${k.return ? '<enter>' : ''}${k.tab ? '<tab>' : ''}${k.delete ? '<del>' : ''}${k.backspace ? '<bs>' : ''}${k.ctrl ? '<ctrl>' : ''}`,
  );

describe('splitKeys: several keys in one read are handled one by one', () => {
  it('typing ahead through three questions keeps every Enter', () => {
    expect(flags(splitKeys('REF1\r\rLOC\r', plain))).toEqual([
      'REF1',
      '<enter>',
      '<enter>',
      'LOC',
      '<enter>',
    ]);
  });
  it('a pasted list with a newline submits it', () => {
    expect(flags(splitKeys('94 92 95 93\n', plain))).toEqual(['94 92 95 93', '<enter>']);
  });
  it('erasing and control letters inside a chunk keep their meaning', () => {
    expect(flags(splitKeys('81\u007f0\u0008\t\u0011', plain))).toEqual([
      '81',
      '<del>',
      '0',
      '<bs>',
      '<tab>',
      'q<ctrl>',
    ]);
  });
  it('a single key or plain text passes through with the Key Ink gave it', () => {
    const enter = { ...plain, return: true } as Key;
    expect(splitKeys('\r', enter)).toEqual([['\r', enter]]);
    expect(splitKeys('80.5 ft', plain)).toEqual([['80.5 ft', plain]]);
  });
});
