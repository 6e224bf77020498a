/**
 * The chain of phases drawn: a slide that runs into a yaw gets a picture with one box a phase, in
 * order of travel, an arrow between them, and under each box the speed where that phase begins,
 * the same figures `solve --json` gives for its phases. Invented case:
 * test/fixtures/cases/chain-slide-yaw-fall.json.
 */
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, runReport, runSolve } from './helpers.js';

const FILE = path.join(ROOT, 'test/fixtures/cases/chain-slide-yaw-fall.json');
const oneDecimal = (n: number) => n.toFixed(1);

describe('the phases picture', () => {
  it('draws each phase of the chain, in order, with the speed where it begins as solve --json', async () => {
    const solved = JSON.parse((await runSolve(FILE, true)).out);
    const phases = solved.analyses[0].phases as {
      id: string;
      speed: { value: number; low: number; high: number };
    }[];
    expect(phases.map((p) => p.id)).toEqual(['skid-1', 'yaw-1']);
    const doc = JSON.parse((await runReport(FILE, { format: 'json' })).out);
    const figures: { name: string; svg: string }[] = [];
    const walk = (v: unknown): void => {
      if (Array.isArray(v)) v.forEach(walk);
      else if (v && typeof v === 'object') {
        const o = v as Record<string, unknown>;
        if (o.kind === 'figure') figures.push(o as unknown as { name: string; svg: string });
        Object.values(o).forEach(walk);
      }
    };
    walk(doc);
    const fig = figures.find((f) => f.name === 'skid-1-phases');
    expect(fig, 'a figure named skid-1-phases').toBeDefined();
    const svg = fig!.svg;
    // the background, then one box a phase
    expect(svg.match(/<rect /g)).toHaveLength(1 + phases.length);
    // one arrow head between the two boxes
    expect(svg.match(/<polyline /g)).toHaveLength(phases.length - 1);
    const texts = [...svg.matchAll(/<text [^>]*>([^<]*)<\/text>/g)].map((m) => m[1]!);
    expect(texts).toContain('skid-1, slide');
    expect(texts).toContain('yaw-1, critical speed');
    for (const p of phases)
      expect(texts).toContain(
        `begins ${oneDecimal(p.speed.value)} mph (${oneDecimal(p.speed.low)} to ${oneDecimal(p.speed.high)})`,
      );
    // in order of travel: the slide's box left of the yaw's
    const xOf = (label: string) =>
      Number(new RegExp(`<text x="([\\d.]+)"[^>]*>${label}<`).exec(svg)![1]);
    expect(xOf('skid-1, slide')).toBeLessThan(xOf('yaw-1, critical speed'));
  });
});
