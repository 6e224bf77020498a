import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { loadCaseText } from '../../src/case/load.js';
import { reportCommand } from '../../src/commands/report.js';
import { toDragSource, toLook } from './walks.js';

afterEach(() => cleanup());

// Invented scenario: four anti-lock marks of 100 ft, the drag factor typed as "0.70 (0.65-0.80)".
// A JSON number cannot keep the trailing zero; the saved case records the decimals typed, and
// the report's measurements as entered show the figure as it was typed.

async function typedCase(drag: string) {
  const app = await toLook({}, '');
  await toDragSource(app, { look: 'a', lengths: '4 x 100' });
  await app.press('e', 'Drag factor');
  await app.answer(drag, 'Grade, the slide');
  await app.press('l', 'How did the slide end?');
  await app.press('r', 'Another analysis?');
  const file = fs.readdirSync(app.dir).find((n) => n.endsWith('.json') && !n.startsWith('demo'))!;
  return path.join(app.dir, file);
}

async function measurementsRow(file: string): Promise<string> {
  let out = '';
  const code = await reportCommand(
    file,
    { format: 'txt', force: false, sessionsDir: path.dirname(file) },
    { out: (s) => void (out += s), err: () => {} },
  );
  expect(code).toBe(0);
  return out.split('\n').find((l) => l.includes('Drag factor (entered)'))!;
}

describe('a figure is recorded as it was typed', () => {
  it('0.70 (0.65-0.80): saved with its decimals, shown so in the report, the same figures', async () => {
    const file = await typedCase('0.70 (0.65-0.80)');
    const raw = JSON.parse(fs.readFileSync(file, 'utf8'));
    const drag = raw.analyses[0].segments[0].drag;
    expect(drag).toMatchObject({
      source: 'entered',
      value: 0.7,
      low: 0.65,
      high: 0.8,
      decimals: 2,
    });
    const row = await measurementsRow(file);
    expect(row).toMatch(/0\.70\s.*0\.65 to 0\.80/);
    // The figures do not depend on it: S = sqrt(30 × 100 × 0.70) = 45.8 mph (slide to stop).
    const loaded = loadCaseText(fs.readFileSync(file, 'utf8'));
    expect(loaded.ok).toBe(true);
  });

  it('0.7 typed as 0.7: nothing extra is recorded, and the report shows 0.7', async () => {
    const file = await typedCase('0.7');
    const drag = JSON.parse(fs.readFileSync(file, 'utf8')).analyses[0].segments[0].drag;
    expect(drag.decimals).toBeUndefined();
    expect(await measurementsRow(file)).toMatch(/\b0\.7\s/);
  });
});
