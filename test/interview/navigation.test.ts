import { describe, expect, it } from 'vitest';
import {
  buildCase,
  currentQuestion,
  progress,
  questionStates,
  REVIEW,
  solveDraft,
} from '../../src/interview/index.js';
import { act, fill, fillUntil, start, type } from './drive.js';

// An invented single-surface slide: four marks, one drag factor, level road.
const SLIDE: Record<string, string> = {
  units: 'f',
  'vehicle.brakes': 'a',
  'a0.look': 'd',
  'a0.surfaces': 'o',
  'a0.count': '4',
  'a0.marks': '64 66 65 65',
  'a0.seg0.drag.source': 'e',
  'a0.seg0.drag.value': '0.70',
};

const speed = (s: ReturnType<typeof start>) => {
  const a = solveDraft(s).analyses[0];
  if (!a?.ok) throw new Error('not solved');
  return a.solution.speed.value;
};

describe('back, forward, jump and edits', () => {
  it('back never loses later answers, and forward walks over them', () => {
    let s = fillUntil(start(), SLIDE, 'a0.seg0.grade.dir');
    const before = s.answers;
    s = act(s, { type: 'back' }, { type: 'back' }, { type: 'back' });
    expect(s.cursor).toBe('a0.seg0.label');
    s = act(s, { type: 'forward' });
    expect(s.cursor).toBe('a0.seg0.drag.source');
    expect(s.answers).toEqual(before);
    s = act(s, { type: 'forward' });
    expect(s.cursor).toBe('a0.seg0.drag.value');
    expect(currentQuestion(s)!.id).toBe('a0.seg0.drag.value');
  });

  it('changing the drag factor after the review changes the speed as the formula says', () => {
    let s = fill(start(), SLIDE);
    expect(s.cursor).toBe(REVIEW);
    const first = speed(s);
    s = type(act(s, { type: 'jump', id: 'a0.seg0.drag.value' }), '0.56');
    // Nothing else is open, so the answer returns to the review.
    expect(s.cursor).toBe(REVIEW);
    // S = sqrt(30 d f n): the speed scales with sqrt(f) (slide to stop).
    expect(speed(s) / first).toBeCloseTo(Math.sqrt(0.56 / 0.7), 10);
  });

  it('an earlier answer that opens new questions sends the cursor to the first of them', () => {
    let s = fill(start(), SLIDE);
    s = type(act(s, { type: 'jump', id: 'vehicle.brakes' }), 'e');
    expect(s.cursor).toBe('vehicle.brakes.efficiency');
    // The analysis needs the brakes: while n is open it leaves the case, and comes back after.
    expect(buildCase(s, { id: 'x' }).analyses).toHaveLength(0);
    s = type(s, '0.9', 'inspection');
    expect(buildCase(s, { id: 'x' }).analyses).toHaveLength(1);
  });

  it('answers of a branch that no longer applies are kept and listed as unused, then used again', () => {
    let s = fillUntil(start(), { units: 'f', 'a0.look': 'd' }, 'vehicle.brakes');
    s = type(s, 'w', '0.6', 'w', 'w', 'n', 'n');
    s = type(act(s, { type: 'jump', id: 'vehicle.brakes' }), 'a');
    const unused = questionStates(s)
      .filter((q) => q.status === 'unused')
      .map((q) => q.id);
    expect(unused).toEqual([
      'vehicle.share',
      'vehicle.wheel.fl',
      'vehicle.wheel.fr',
      'vehicle.wheel.rl',
      'vehicle.wheel.rr',
    ]);
    expect(s.answers['vehicle.wheel.rl']).toEqual({ text: 'none', value: 'none' });
    expect(buildCase(s, { id: 'x' }).vehicle).toEqual({ brakes: { mode: 'all' } });
    s = type(act(s, { type: 'jump', id: 'vehicle.brakes' }), 'w');
    expect(buildCase(s, { id: 'x' }).vehicle.brakes).toEqual({
      mode: 'wheels',
      frontLeft: 1,
      frontRight: 1,
      rearLeft: 0,
      rearRight: 0,
    });
  });

  it('a jump to a question that does not apply is refused with a notice', () => {
    const s = fillUntil(start(), { units: 'f', 'a0.look': 'd' }, 'vehicle.brakes');
    const t = act(s, { type: 'jump', id: 'a0.chord' });
    expect(t.cursor).toBe('vehicle.brakes');
    expect(t.notice).toBe('That question does not apply with the answers given so far.');
  });

  it('undo restores the answers and the cursor before the last answer', () => {
    let s = fillUntil(start(), { units: 'f', 'a0.look': 'd' }, 'vehicle.brakes');
    const before = s;
    s = type(s, 'e');
    s = act(s, { type: 'undo' });
    expect(s.answers).toEqual(before.answers);
    expect(s.cursor).toBe('vehicle.brakes');
    expect(s.notice).toBe('Last answer undone.');
    expect(act(start(), { type: 'undo' }).notice).toBe('Nothing to undo.');
  });

  it('the review opens from anywhere; back from it goes to the last question', () => {
    let s = fillUntil(start(), { units: 'f' }, 'vehicle.label');
    s = act(s, { type: 'open-review' });
    expect(s.cursor).toBe(REVIEW);
    expect(currentQuestion(s)).toBeUndefined();
    s = act(s, { type: 'back' });
    // The distribution of speeds is asked once, at the end of the case.
    expect(s.cursor).toBe('sampling.shape');
  });

  it('progress counts valid answers among the questions that apply', () => {
    const s = fill(start(), SLIDE);
    const p = progress(s);
    expect(p.answered).toBe(p.applicable);
    const t = act(s, { type: 'jump', id: 'vehicle.brakes' });
    const u = type(t, 'e');
    expect(progress(u)).toEqual({ answered: p.applicable, applicable: p.applicable + 2 });
  });
});

describe('answers that an earlier change makes invalid', () => {
  it('are marked invalid, keep their text, leave the case, and are where the cursor goes next', () => {
    const YAW = {
      units: 'f',
      'vehicle.brakes': 'a',
      'a0.look': 'y',
      'a0.chord': '40',
      'a0.ordinate': '6',
      'a0.drag.source': 'e',
      'a0.drag.value': '0.7',
    };
    let s = fill(start(), YAW);
    expect(buildCase(s, { id: 'x' }).analyses).toHaveLength(1);
    // A shorter chord: 6 ft is no longer under half of it.
    s = type(act(s, { type: 'jump', id: 'a0.chord' }), '11');
    expect(questionStates(s).find((q) => q.id === 'a0.ordinate')!.status).toBe('invalid');
    expect(s.answers['a0.ordinate']!.text).toBe('6');
    expect(s.cursor).toBe('a0.ordinate');
    expect(buildCase(s, { id: 'x' }).analyses).toHaveLength(0);
    s = type(s, '1.5');
    expect(s.cursor).toBe(REVIEW);
    expect(buildCase(s, { id: 'x' }).analyses).toHaveLength(1);
  });
});

describe('modes and rejected answers', () => {
  it('guided opens explanations, brisk closes them; toggle flips', () => {
    expect(start('guided').explain).toBe(true);
    const s = act(start('guided'), { type: 'set-mode', mode: 'brisk' });
    expect(s).toMatchObject({ mode: 'brisk', explain: false });
    expect(act(s, { type: 'toggle-explain' }).explain).toBe(true);
  });

  it('a rejected answer keeps every answer and the cursor, and says why', () => {
    const s = fillUntil(start(), SLIDE, 'a0.marks');
    const t = act(s, { type: 'answer', text: '64 66 65' });
    expect(t.answers).toEqual(s.answers);
    expect(t.cursor).toBe('a0.marks');
    expect(t.error).toEqual({
      id: 'a0.marks',
      text: '64 66 65',
      message:
        '4 marks were counted, 3 lengths typed; give one length per mark, or change the number of marks',
    });
    expect(act(t, { type: 'clear-error' }).error).toBeUndefined();
    // The next good answer clears the error too.
    expect(type(t, '64 66 65 65').error).toBeUndefined();
  });

  it('Enter on a question without default says what is expected', () => {
    const s = fillUntil(start(), SLIDE, 'a0.look');
    expect(act(s, { type: 'accept-default' }).error?.message).toBe(
      'pick one of the choices: type its letter, or move to it and press Enter',
    );
    // A typed answer without default names an example of what to type.
    const m = fillUntil(start(), SLIDE, 'a0.marks');
    expect(act(m, { type: 'accept-default' }).error?.message).toBe(
      'an answer is needed here, e.g. 94 92 95 93',
    );
  });

  it('a choice outside the list is refused', () => {
    const s = fillUntil(start(), SLIDE, 'a0.look');
    expect(act(s, { type: 'choose', value: 'zz' }).error?.message).toBe(
      '"zz" is not one of the choices here: press d, a, s, g, y or j',
    );
    expect(act(s, { type: 'choose', value: 'yaw' }).answers['a0.look']?.value).toBe('yaw');
  });
});
