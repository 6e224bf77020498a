// A hand-written airborne analysis opened in the interview: its answers are asked (not kept
// verbatim), and built back it is the same analysis with the same figure.
import fs from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildCase, questionsFor, stateFromCase } from '../../src/interview/index.js';
import { loadCaseText } from '../../src/case/load.js';
import { solveCase } from '../../src/engine/index.js';
import { keptAnalyses } from '../../src/interview/kept-analyses.js';

const load = (text: string) => {
  const r = loadCaseText(text);
  if (!r.ok) throw new Error(r.issues[0]?.message);
  return r.case;
};

describe('an airborne analysis from a file', () => {
  it('is asked, not kept, and builds back to the same analysis and figure', () => {
    const body = JSON.parse(
      fs.readFileSync('test/fixtures/cases/chain-slide-yaw-fall.json', 'utf8'),
    );
    delete body.interview;
    const c = load(JSON.stringify(body));
    const s = stateFromCase(c);
    expect(keptAnalyses(s.answers).map((k) => k.analysis.id)).not.toContain('fall-1');
    const ids = questionsFor(s.answers).map((q) => q.id);
    // The slide and the surveyed yaw it runs into are asked too: the fall is the third analysis.
    expect(keptAnalyses(s.answers)).toEqual([]);
    expect(ids).toEqual(expect.arrayContaining(['a2.air.distance', 'a2.air.drop', 'a2.air.grade']));
    const built = load(JSON.stringify(buildCase(s, { id: c.id })));
    expect(built.analyses.find((a) => a.id === 'fall-1')).toEqual(
      c.analyses.find((a) => a.id === 'fall-1'),
    );
    const speed = (x: typeof c) =>
      solveCase(x).analyses.map((a) => (a.ok ? a.solution.speed : a.reason));
    expect(speed(built)).toEqual(speed(c));
  });
});
