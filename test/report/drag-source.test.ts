import { describe, expect, it } from 'vitest';
import { dragSourceLines } from '../../src/report/drag-source.js';

const table = (surface: string) =>
  dragSourceLines(
    { source: 'table', surface, value: 0.6, low: 0.5, high: 0.7 },
    'Drag factor',
  ).join(' ');

describe('where the drag factor comes from, in the report', () => {
  it('a table row seen in a reprint: its ranges by speed band, its publication, how well it is known', () => {
    // Northwestern University Traffic Institute table (Baker 1975, reprinted in Fricke
    // 1990), rows seen in a reprint: dry travelled asphalt 0.60-0.80 under 30 mph, 0.55-0.70 over.
    const t = table('asphalt-dry-travelled');
    expect(t).toContain('under 30 mph 0.60 to 0.80; over 30 mph 0.55 to 0.70');
    expect(t).toContain('J. S. Baker, Traffic Accident Investigation Manual, 1975');
    expect(t).toContain('L. B. Fricke, Traffic Accident Reconstruction, 1990');
    expect(t).toContain('How well it is known: seen in a reprint.');
    expect(t).toContain('A guide, not a measurement.');
  });

  it('a row known only from memory says so', () => {
    // Baker 1975 table: loose gravel 0.40-0.70 (from memory: verify before use).
    const t = table('gravel-loose');
    expect(t).toContain('0.40 to 0.70 at any speed');
    expect(t).toContain('from memory, to be verified against the publication before use');
  });

  it('a single value seen second-hand names its book', () => {
    // R. K. Noon, Engineering Analysis of Vehicular Accidents (CRC, 1994), seen second-hand: wet grass 0.20.
    const t = table('noon-grass-wet');
    expect(t).toContain('0.20 at any speed');
    expect(t).toContain('R. K. Noon, Engineering Analysis of Vehicular Accidents (CRC, 1994)');
    expect(t).toContain('a single value seen second-hand');
  });

  it("a free-text surface is the investigator's own choice, and still carries the table's caveat", () => {
    const t = table('chip seal, wet, worn');
    expect(t).toContain('"chip seal, wet, worn" is not a row of the built-in table');
    expect(t).toContain('A guide, not a measurement.');
  });

  it('measured sources say what was measured and carry their caution', () => {
    const skids = dragSourceLines(
      {
        source: 'test-skids',
        tests: [
          { speed: 30, distance: 41 },
          { speed: 30, distance: 43 },
        ],
      },
      'Segment 1',
    ).join(' ');
    expect(skids).toContain('Segment 1: 2 test skids at known speed on the scene');
    expect(skids).toContain(
      'lower speed than the crash tends to give a slightly higher drag factor (common practice)',
    );
    expect(dragSourceLines({ source: 'sled', weight: 50, pulls: [36, 37] }, 'f')[0]).toContain(
      'drag sled, 2 pulls',
    );
    expect(dragSourceLines({ source: 'decelerometer', readings: [0.7] }, 'f')[0]).toContain(
      'decelerometer, 1 reading in g',
    );
    expect(
      dragSourceLines({ source: 'entered', value: 0.7, note: 'agency standard' }, 'f')[0],
    ).toBe(
      "f: entered by the investigator (agency standard); the basis is the investigator's, not the tool's.",
    );
  });
});
