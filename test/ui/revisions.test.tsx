import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup } from 'ink-testing-library';
import { ENTER, ctrl } from './render-app.js';
import { toLook, type App } from './walks.js';

afterEach(() => cleanup());

// Invented case: a new case with a posted limit of 45, as a user types it.

type Trail = {
  by: string;
  sha256?: string;
  changes: { field: string; from?: unknown; to?: unknown }[];
}[];

function caseFile(app: App): string {
  const name = fs.readdirSync(app.dir).find((n) => /^case-.*\.json$/.test(n))!;
  return path.join(app.dir, name);
}
const trailOf = (file: string) =>
  (JSON.parse(fs.readFileSync(file, 'utf8')) as { revisions: Trail }).revisions;

describe('the trail of revisions, from the interview', () => {
  it('an answer changed in the interview is in the file’s trail, from the old answer to the new', async () => {
    const app = await toLook({}, '45');
    const file = caseFile(app);
    expect(trailOf(file).at(-1)!.changes).toContainEqual({ field: 'postedLimit', to: 45 });
    await app.press(ctrl('p'), 'Which vehicle');
    await app.press(ctrl('p'), 'Posted speed limit');
    await app.press(ctrl('u'));
    await app.answer('50', 'What do the marks look like?');
    const last = trailOf(file).at(-1)!;
    expect(last.by).toBe('interview');
    expect(last.changes).toEqual([{ field: 'postedLimit', from: 45, to: 50 }]);
  });

  it('moving back and forth without changing an answer adds nothing', async () => {
    const app = await toLook({}, '45');
    const file = caseFile(app);
    const before = trailOf(file);
    await app.press(ctrl('p'), 'Which vehicle');
    await app.press(ENTER, 'What do the marks look like?');
    expect(trailOf(file)).toEqual(before);
  });

  it('a case closed and opened again unchanged resumes where it was, with no hand edit noticed', async () => {
    const app = await toLook({}, '45');
    const file = caseFile(app);
    const before = trailOf(file);
    await app.press(ctrl('l'), 'stopped at');
    const back = await app.press(ENTER, 'What do the marks look like?');
    expect(back).not.toContain('changed outside');
    await app.press(ctrl('p'), 'Which vehicle');
    await app.answer('Unit 4', 'What do the marks look like?');
    const trail = trailOf(file);
    expect(trail.slice(0, before.length)).toEqual(before.map(({ sha256: _s, ...r }) => r));
    expect(trail.slice(before.length).map((r) => r.by)).toEqual(['interview']);
  });

  it('a hand edit of the file, then the case opened and an answer changed: a "hand edit" entry from what skidcase wrote', async () => {
    const app = await toLook({}, '45');
    const file = caseFile(app);
    await app.press(ctrl('l'), 'stopped at');
    // Edited with a text editor while the case is closed: the posted limit 45 becomes 55.
    const json = JSON.parse(fs.readFileSync(file, 'utf8')) as Record<string, unknown>;
    json.postedLimit = 55;
    fs.writeFileSync(file, JSON.stringify(json, null, 2));
    await app.press(ENTER, 'changed outside');
    await app.press(ctrl('p'), 'Which vehicle');
    const f = await app.answer('Unit 9, green hatchback', 'What do the marks look like?');
    // the screen says the outside change went into the trail, and how to see it
    expect(f.replace(/\s+/g, ' ')).toContain(
      "The file had been changed outside skidcase (1 field): recorded as a hand edit in the case's trail (skidcase history",
    );
    const trail = trailOf(file);
    expect(trail.at(-2)).toEqual(
      expect.objectContaining({
        by: 'hand edit',
        changes: [{ field: 'postedLimit', from: 45, to: 55 }],
      }),
    );
    expect(trail.at(-1)!.by).toBe('interview');
    expect(trail.at(-1)!.changes).toContainEqual({
      field: 'vehicle.label',
      to: 'Unit 9, green hatchback',
    });
  });
});
