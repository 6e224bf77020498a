import { visiblePart } from '../../src/ui/text-field.js';
import { describe, expect, it } from 'vitest';
import type { Key } from 'ink';
import { NO_KEY } from '../../src/ui/split-keys.js';
import { EMPTY_LINE, editLine, lineCommand, lineOf } from '../../src/ui/line-edit.js';

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
