// Key sequences several screen tests walk through to reach the question they are about. Each
// step waits for the next question, so a walk fails naming the first question that did not come.
// The cases are invented.
import { ENTER, renderApp } from './render-app.js';

export type App = ReturnType<typeof renderApp>;

/** A new case, through the case questions (imperial units, the posted limit given), to the look of the marks. */
export async function toLook(o: Parameters<typeof renderApp>[0] = {}, limit = '45'): Promise<App> {
  const app = renderApp({ rows: 40, ...o });
  await app.waitText('No cases here yet');
  await app.press('n', 'Case or report reference');
  for (let i = 0; i < 5; i++) await app.press(ENTER);
  await app.waitText('Which units');
  await app.press('f', 'Posted speed limit');
  await app.answer(limit, 'Which vehicle');
  await app.press(ENTER, 'What do the marks look like?');
  return app;
}

/**
 * From the look of the marks, a one-surface slide of four marks (`look`: the key of the marks'
 * look, `d` dark locked-wheel or `a` anti-lock; `lengths`: the marks as typed) with every brake
 * working, on to the first segment's drag factor source. Returns the frame at the brakes question.
 */
export async function toDragSource(
  app: App,
  { look = 'd', lengths = '4 x 60' }: { look?: 'd' | 'a'; lengths?: string } = {},
): Promise<string> {
  const brakes = await app.press(look, 'Were all four brakes working?');
  await app.press('a', 'A short label');
  await app.press(ENTER, 'Did the vehicle slide over one surface');
  await app.press('o', 'How many tire marks');
  await app.answer('4', 'Length of each mark');
  await app.answer(lengths, 'Which slide distance');
  await app.press(ENTER, 'A name for the surface');
  await app.press(ENTER, 'Where does the drag factor');
  return brakes;
}

/** The question column of a frame as one line of text (the chain panel beside it cut off). */
export const said = (f: string): string =>
  f
    .split('\n')
    .map((l) => l.split(/[│┌└]/)[0]!.trim())
    .join(' ')
    .replace(/\s+/g, ' ');
