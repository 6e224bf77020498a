import { oneRow, visiblePart } from '../../src/ui/text-field.js';
import { describe, expect, it } from 'vitest';
import type { Key } from 'ink';
import { NO_KEY } from '../../src/ui/split-keys.js';
import { EMPTY_LINE, editLine, lineCommand, lineOf, pasteText } from '../../src/ui/line-edit.js';

const none = NO_KEY;
const k = (x: Partial<Key>) => ({ ...none, ...x });

describe('editLine', () => {
  it('types at the cursor and moves it', () => {
    let l = EMPTY_LINE;
    for (const ch of '8.5') l = editLine(l, ch, none);
    expect(l).toEqual({ value: '8.5', cursor: 3 });
    l = editLine(l, '', k({ leftArrow: true }));
    l = editLine(l, '0', none);
    expect(l.value).toBe('8.05');
  });

  it('erases left of the cursor with Backspace (sent as delete by terminals)', () => {
    expect(editLine(lineOf('80'), '', k({ delete: true })).value).toBe('8');
    expect(editLine(lineOf('80'), '', k({ backspace: true })).value).toBe('8');
    expect(editLine({ value: '80', cursor: 0 }, '', k({ delete: true })).value).toBe('80');
  });

  it('takes a paste whole but drops control characters from it', () => {
    expect(editLine(EMPTY_LINE, '94 92\n95', none).value).toBe('94 9295');
  });

  it('ignores Enter, Esc and Ctrl chords (they are bindings)', () => {
    const l = lineOf('12');
    expect(editLine(l, '', k({ return: true }))).toBe(l);
    expect(editLine(l, 'g', k({ ctrl: true }))).toBe(l);
    expect(editLine(l, '', k({ escape: true, meta: true }))).toBe(l);
  });

  it("the key table's editing commands: clear, to the start, to the end", () => {
    expect(lineCommand(lineOf('abc'), 'line-clear')).toEqual(EMPTY_LINE);
    expect(lineCommand(lineOf('abc'), 'line-start')).toEqual({ value: 'abc', cursor: 0 });
    expect(lineCommand({ value: 'abc', cursor: 1 }, 'line-end')).toEqual({
      value: 'abc',
      cursor: 3,
    });
  });

  it('leaves Ctrl+U, Home and End to the key table (they reach editLine only unbound)', () => {
    const l = { value: 'abc', cursor: 1 };
    expect(editLine(l, 'u', k({ ctrl: true }))).toBe(l);
    expect(editLine(l, '', k({ home: true }))).toBe(l);
    expect(editLine(l, '', k({ end: true }))).toBe(l);
  });
});

describe('a long line scrolls within its row', () => {
  it('keeps the cursor in view and marks what is cut', () => {
    expect(visiblePart({ value: 'abcdefghij', cursor: 10 }, 6)).toEqual({
      value: '…hij',
      cursor: 4,
    });
    expect(visiblePart({ value: 'abcdefghij', cursor: 0 }, 6)).toEqual({
      value: 'abcd…',
      cursor: 0,
    });
    expect(visiblePart({ value: 'abc', cursor: 3 }, 6)).toEqual({ value: 'abc', cursor: 3 });
  });
});

describe('a pasted block', () => {
  it('keeps its line breaks on a question that takes lines, without blank ends; elsewhere they become spaces', () => {
    expect(pasteText(EMPTY_LINE, '\r0 0\r\n8 0.2\r16 0.81\r', true)).toEqual({
      value: '0 0\n8 0.2\n16 0.81',
      cursor: 17,
    });
    expect(pasteText(lineOf('12 '), '34\r56\r', false)).toEqual({ value: '12 34 56 ', cursor: 9 });
    expect(pasteText(lineOf('ab'), '\u0007', true)).toEqual(lineOf('ab'));
    // A block after points already there starts its own line; a single word goes where it is put.
    expect(pasteText(lineOf('0 0'), '8 0.2\r16 1', true).value).toBe('0 0\n8 0.2\n16 1');
    expect(pasteText(lineOf('0 0; '), '8 0.2\r16 1', true).value).toBe('0 0; 8 0.2\n16 1');
    expect(pasteText(lineOf('12.'), '5', true).value).toBe('12.5');
  });

  it('is drawn on one row with ; between its lines, the cursor moved with them', () => {
    expect(oneRow({ value: '0 0\n8 0.2\n16 1', cursor: 9 })).toEqual({
      value: '0 0; 8 0.2; 16 1',
      cursor: 10,
    });
    expect(oneRow(lineOf('0 0; 8 0.2'))).toEqual(lineOf('0 0; 8 0.2'));
  });
});
