import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { uniformInt } from 'pure-rand/distribution/uniformInt';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { loadCaseText } from '../../src/case/load.js';
import { buildStoreBundle, fixture } from './bundle.js';
import { tempDir } from './helpers.js';
import { soakCount } from '../soak.js';

/**
 * The crash test: a child saves a growing case in a loop and is killed with SIGKILL at random
 * moments. After every kill the case file must parse, pass the schema, and hold every mark whose
 * save had returned (the child prints the count only after a save returned). Kills run in a few
 * lanes at once, each on its own case; every new child resumes the same case, so it also clears
 * the stale lock its killed predecessor left behind.
 *
 * `npm test` runs 30 kills, `npm run soak` 300 (SKIDCASE_CRASH_KILLS sets another count). Every
 * random choice comes from one seeded generator per lane; the seed is printed, and
 * SKIDCASE_CRASH_SEED replays a run's choices (the moments themselves still move with the machine).
 */
const KILLS = soakCount('SKIDCASE_CRASH_KILLS', 30, 300);
const LANES = 3;
const SEED = Number(process.env.SKIDCASE_CRASH_SEED ?? Date.now() % 2 ** 31);
console.log(`crash test seed ${SEED} (SKIDCASE_CRASH_SEED=${SEED} replays it)`);

/** A seeded source of numbers in [0, 1), one per lane. */
type Random = () => number;
const seeded = (seed: number): Random => {
  const rng = xoroshiro128plus(seed);
  return () => uniformInt(rng, 0, 2 ** 30 - 1) / 2 ** 30;
};
const markValue = (i: number) => 40 + (i % 50) / 4; // the same rule as fixtures/save-loop.mjs

let bundle: string;
beforeAll(async () => {
  bundle = await buildStoreBundle('crash');
});
afterAll(() => fs.rmSync(bundle, { force: true }));

interface Round {
  lastSaved: number;
  /** Saves that returned in this round: above 0 means the kill fell inside the save loop. */
  savesThisRound: number;
  killed: boolean;
  output: string;
}

/** Runs one child and kills it at a random moment: mostly mid-loop, sometimes during start-up. */
function round(dir: string, id: string, random: Random): Promise<Round> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, [fixture('save-loop.mjs'), bundle, dir, id], {
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    let lastSaved = 0;
    let savesThisRound = 0;
    let scheduled = false;
    const kill = () => child.kill('SIGKILL');
    // 15%: at any moment of start-up (open, stale lock clearing, first save). Otherwise after
    // 0 to 3 returned saves, a few milliseconds later: inside the next save.
    if (random() < 0.15) {
      scheduled = true;
      setTimeout(kill, random() * 150);
    }
    const afterSaves = Math.floor(random() * 4);
    child.stdout.setEncoding('utf8');
    child.stdout.on('data', (d: string) => {
      output += d;
      for (const m of d.matchAll(/SAVED (\d+)/g)) {
        lastSaved = Math.max(lastSaved, Number(m[1]));
        savesThisRound++;
      }
      if (!scheduled && output.includes('READY') && savesThisRound >= afterSaves) {
        scheduled = true;
        setTimeout(kill, random() * 8);
      }
    });
    child.stderr.on('data', (d) => (output += String(d)));
    child.on('error', reject);
    child.on('close', (_code, signal) =>
      resolve({ lastSaved, savesThisRound, killed: signal === 'SIGKILL', output }),
    );
  });
}

/** Checks the case file after a kill; returns the number of marks it holds, or throws with why. */
function check(dir: string, id: string, mustHold: number): number {
  const file = path.join(dir, `${id}.json`);
  if (!fs.existsSync(file)) {
    if (mustHold > 0) throw new Error(`${file} is gone although ${mustHold} marks were saved`);
    return 0;
  }
  const loaded = loadCaseText(fs.readFileSync(file, 'utf8'));
  if (!loaded.ok)
    throw new Error(`${file} is broken after a kill: ${JSON.stringify(loaded.issues)}`);
  const a = loaded.case.analyses[0];
  const marks = a && a.kind === 'skid' ? (a.marks ?? []) : [];
  if (marks.length < mustHold)
    throw new Error(`${file} holds ${marks.length} marks, but ${mustHold} saves had returned`);
  marks.forEach((m, i) => {
    if (m !== markValue(i))
      throw new Error(`${file}: mark ${i} is ${JSON.stringify(m)}, expected ${markValue(i)}`);
  });
  // The backup is the previous good version: it must load too, one save behind at most.
  const bak = `${file}.bak`;
  if (fs.existsSync(bak)) {
    const b = loadCaseText(fs.readFileSync(bak, 'utf8'));
    if (!b.ok) throw new Error(`${bak} is broken after a kill: ${JSON.stringify(b.issues)}`);
  }
  return marks.length;
}

async function lane(n: number, kills: number) {
  const random = seeded(SEED + n);
  const dir = tempDir(`crash${n}`);
  const id = `crash-lane-${n}`;
  let done = 0;
  let broken = 0;
  let held = 0;
  let midLoop = 0;
  const problems: string[] = [];
  while (done < kills) {
    const r = await round(dir, id, random);
    if (!r.killed) {
      problems.push(`child ended by itself: ${r.output.slice(-300)}`);
      break;
    }
    done++;
    if (r.savesThisRound > 0) midLoop++;
    try {
      held = check(dir, id, Math.max(held, r.lastSaved));
    } catch (e) {
      broken++;
      problems.push(String(e));
      break;
    }
  }
  return { dir, done, broken, held, midLoop, problems };
}

describe('crash test', () => {
  it(
    `survives ${KILLS} SIGKILLs during saves with no broken file and no lost save`,
    { timeout: 240_000 },
    async () => {
      const per = Array.from(
        { length: LANES },
        (_, i) => Math.floor(KILLS / LANES) + (i < KILLS % LANES ? 1 : 0),
      );
      const lanes = await Promise.all(per.map((k, i) => lane(i, k)));
      const kills = lanes.reduce((s, l) => s + l.done, 0);
      const broken = lanes.reduce((s, l) => s + l.broken, 0);
      const saved = lanes.reduce((s, l) => s + l.held, 0);
      const midLoop = lanes.reduce((s, l) => s + l.midLoop, 0);
      console.log(
        `crash test (seed ${SEED}): ${kills} kills (${midLoop} inside the save loop), ${broken} broken files, ${saved} marks kept across ${LANES} cases`,
      );
      expect(
        lanes.flatMap((l) => l.problems),
        `seed ${SEED}`,
      ).toEqual([]);
      expect(kills).toBe(KILLS);
      expect(broken, `seed ${SEED}`).toBe(0);
      // Most kills must land while saves are going on, or the test would prove little.
      expect(midLoop).toBeGreaterThan(kills / 3);
      for (const l of lanes) fs.rmSync(l.dir, { recursive: true, force: true });
    },
  );
});
