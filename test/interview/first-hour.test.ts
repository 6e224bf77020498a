/**
 * What a new investigator sees on the way through: the drag factor a measured source gives,
 * examples in the case's own units, what an empty answer asks for, and a default for the count
 * of segments. Invented scenarios and numbers throughout.
 */
import { describe, expect, it } from 'vitest';
import { currentQuestion, questionsFor } from '../../src/interview/index.js';
import { act, fillUntil, start, type } from './drive.js';

const IMPERIAL = {
  units: 'f',
  'a0.look': 'd',
  'vehicle.brakes': 'a',
  'a0.surfaces': 'o',
  'a0.count': '2',
  'a0.marks': '80 84',
};
const METRIC_YAW = { units: 'm', 'a0.look': 'y' };

describe('a measured drag factor is shown as soon as its figures are in', () => {
  it('sled pulls: the mean of f = pull / weight, and the smallest to the largest', () => {
    const s = fillUntil(
      start(),
      { ...METRIC_YAW, 'a0.method': 'c', 'a0.chord': '14', 'a0.ordinate': '1.1' },
      'a0.drag.source',
    );
    const after = type(s, 's', '34', '24 25 23.5');
    // 24/34 = 0.706, 25/34 = 0.735, 23.5/34 = 0.691; mean 2.132/3 = 0.711 (worked by hand)
    expect(after.notice).toBe(
      'f = 0.71 (0.69 to 0.74): the mean of 3 sled pulls, the range from the smallest to the largest.',
    );
  });

  it('test skids: f = S² / (30 d) for each, in feet and mph', () => {
    const s = fillUntil(start(), IMPERIAL, 'a0.seg0.drag.source');
    // 40²/(30 × 80) = 0.667 and 42²/(30 × 84) = 0.700; mean 0.683 (worked by hand)
    const after = type(s, 'k', '40/80, 42/84');
    expect(after.notice).toBe(
      'Read as 2 test skids (speed, distance). f = 0.68 (0.67 to 0.70): the mean of 2 test skids, the range from the smallest to the largest.',
    );
  });

  it('tests that agree to two decimals show no range of equal ends', () => {
    const s = fillUntil(start(), IMPERIAL, 'a0.seg0.drag.source');
    // 32²/(30 × 48) = 0.711 and 31²/(30 × 45) = 0.712 (worked by hand)
    expect(type(s, 'k', '32/48, 31/45').notice).toBe(
      'Read as 2 test skids (speed, distance). f = 0.71: the mean of 2 test skids, which agree to two decimals.',
    );
  });

  it('one decelerometer reading is the factor itself, with no range to speak of', () => {
    const s = fillUntil(start(), IMPERIAL, 'a0.seg0.drag.source');
    expect(type(s, 'd', '0.74').notice).toBe('f = 0.74: from 1 reading.');
  });
});

describe('examples follow the case units', () => {
  const example = (units: 'f' | 'm', id: string) => {
    const s = fillUntil(start(), { units, 'a0.look': 'y', 'a0.method': 'c' }, 'a0.chord');
    return questionsFor(s.answers).find((q) => q.id === id)?.example;
  };

  it('a metric chord is offered as metres a chord could be, not the feet figure', () => {
    // Chords of about 10-15 m are usual (the question's own how-to).
    expect(Number(example('m', 'a0.chord'))).toBeGreaterThanOrEqual(10);
    expect(Number(example('m', 'a0.chord'))).toBeLessThanOrEqual(15);
    expect(Number(example('f', 'a0.chord'))).toBeGreaterThanOrEqual(30);
  });

  it('the middle ordinate example is less than half the chord example in both systems', () => {
    expect(Number(example('m', 'a0.ordinate'))).toBeLessThan(Number(example('m', 'a0.chord')) / 2);
    const s = fillUntil(
      start(),
      { units: 'f', 'a0.look': 'y', 'a0.method': 'c', 'a0.chord': example('f', 'a0.chord')! },
      'a0.ordinate',
    );
    // The imperial example is typed as feet and inches; the reducer must accept it.
    const q = currentQuestion(s)!;
    expect(act(s, { type: 'answer', text: q.example! }).error).toBeUndefined();
  });
});

describe('an empty answer says what is expected', () => {
  it('a length without default names an example', () => {
    const s = fillUntil(
      start(),
      { ...IMPERIAL, 'a0.surfaces': 's', 'a0.count': '', 'a0.segcount': '2' },
      'a0.seg0.length',
    );
    expect(act(s, { type: 'accept-default' }).error?.message).toBe(
      'an answer is needed here, e.g. 48',
    );
  });

  it('the number of segments has no default, and says what to type', () => {
    const s = fillUntil(
      start(),
      { ...IMPERIAL, 'a0.surfaces': 's', 'a0.count': '' },
      'a0.segcount',
    );
    expect(act(s, { type: 'accept-default' }).error?.message).toBe(
      'an answer is needed here, e.g. 2',
    );
  });
});

describe('wheel by wheel brakes come to a braking efficiency on screen', () => {
  it('one rear wheel at half, share 0.55-0.65: n = 0.75 + 0.25 × share', () => {
    const s = fillUntil(start(), { units: 'f', 'a0.look': 'd' }, 'vehicle.brakes');
    // Front wheels full, rear 0.5 and 1: n = share/2 × 2 + (1 − share)/2 × 1.5 = 0.75 + 0.25 share,
    // so 0.8875 at 0.55, 0.9 at 0.6 and 0.9125 at 0.65 (worked by hand from the static-share formula).
    const partway = type(s, 'w', '0.55-0.65', 'w', 'w', 'p', '0.5');
    expect(partway.notice).toBeUndefined();
    const done = type(partway, 'w');
    expect(done.notice).toBe(
      'Braking efficiency n = 0.90 (0.89 to 0.91), from the four wheels and the front axle share.',
    );
  });
});

describe('section names', () => {
  it('a slide over two surfaces is not called a slide in parts (that is a gap skid)', () => {
    const s = fillUntil(
      start(),
      { ...IMPERIAL, 'a0.surfaces': 's', 'a0.count': '' },
      'a0.segcount',
    );
    expect(currentQuestion(s)?.section).toBe('Analysis 1 - slide, several surfaces');
    const gap = fillUntil(
      start(),
      { units: 'f', 'a0.look': 'g', 'vehicle.brakes': 'a' },
      'a0.label',
    );
    expect(currentQuestion(gap)?.section).toBe('Analysis 1 - slide in parts');
  });
});
