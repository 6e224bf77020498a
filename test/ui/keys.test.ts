import { describe, expect, it } from 'vitest';
import type { Key } from 'ink';
import { NO_KEY } from '../../src/ui/split-keys.js';
import {
  KEY_TABLE,
  findBinding,
  keyLabel,
  keysFor,
  matches,
  type KeyContext,
} from '../../src/ui/keys.js';

const none = NO_KEY;
const key = (k: Partial<Key>): Key => ({ ...none, ...k });

// Contexts where the user is typing text: a plain letter there must type, never act.
const TYPING: KeyContext[] = ['question', 'jump', 'path'];

describe('key table', () => {
  it('gives every binding at least one key, a label and a description', () => {
    for (const b of KEY_TABLE) {
      expect(b.keys.length, b.command).toBeGreaterThan(0);
      expect(b.label.trim(), b.command).not.toBe('');
      expect(b.description.trim(), b.command).not.toBe('');
      expect(b.when.length, b.command).toBeGreaterThan(0);
    }
  });

  it('never binds the same key twice where both are live', () => {
    const contexts: KeyContext[] = ['home', 'question', 'choice', 'review', 'jump', 'help', 'path'];
    for (const ctx of contexts) {
      const live = KEY_TABLE.filter(
        (b) => b.when.includes(ctx) || (ctx === 'choice' && b.when.includes('question')),
      );
      const seen = new Map<string, string>();
      for (const b of live)
        for (const k of b.keys) {
          const id = `${k.ctrl ? 'C-' : ''}${k.name}`;
          expect(
            seen.get(id),
            `${ctx}: ${id} bound to ${seen.get(id)} and ${b.command}`,
          ).toBeUndefined();
          seen.set(id, b.command);
        }
    }
  });

  it('binds no plain printable key where text is typed', () => {
    for (const b of KEY_TABLE)
      for (const k of b.keys)
        if (!k.ctrl && k.name.length === 1)
          for (const ctx of TYPING) expect(b.when.includes(ctx), `${k.name} in ${ctx}`).toBe(false);
  });

  it('fires a Ctrl chord only with Ctrl held, and a letter only without modifiers', () => {
    const jump = KEY_TABLE.find((b) => b.command === 'jump')!;
    expect(matches(jump.keys[0]!, 'g', key({ ctrl: true }))).toBe(true);
    expect(matches(jump.keys[0]!, 'g', none)).toBe(false);
    expect(findBinding('home', 'n', none)?.command).toBe('new-case');
    expect(findBinding('home', 'n', key({ ctrl: true }))).toBeUndefined();
    expect(findBinding('home', 'n', key({ meta: true }))).toBeUndefined();
  });

  it('lets letters through to the text field while typing an answer', () => {
    for (const ch of 'abcdefghijklmnopqrstuvwxyz0123456789 .-@%')
      expect(findBinding('question', ch, none), ch).toBeUndefined();
  });

  it('writes keys the way the help shows them', () => {
    expect(keyLabel({ name: 'g', ctrl: true })).toBe('Ctrl+G');
    expect(keyLabel({ name: 'return' })).toBe('Enter');
    expect(keysFor('save-leave')).toBe('Ctrl+Q / Ctrl+C');
  });
});
