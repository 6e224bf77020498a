import fs from 'node:fs';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { openCase, releaseAllLocks, saveCase } from '../../src/store/index.js';
import { sampleCase, tempDir } from './helpers.js';

afterEach(() => releaseAllLocks());

describe('leftovers of killed saves', () => {
  it('are removed when the case is opened for writing, once a minute old; nothing else is', async () => {
    const dir = tempDir('leftovers');
    await saveCase(dir, sampleCase('swept'));
    await saveCase(dir, sampleCase('swept'));
    await saveCase(dir, sampleCase('neighbour'));
    await releaseAllLocks();
    const old = new Date(Date.now() - 120_000);
    const make = (name: string, aged = true) => {
      fs.writeFileSync(path.join(dir, name), 'x');
      if (aged) fs.utimesSync(path.join(dir, name), old, old);
    };
    make('swept.json.3141592653'); // write-file-atomic's temp name
    make('swept.json.bak.4242.tmp');
    make('swept.json.lock.new.4242.0a1b2c3d');
    make('swept.json.lock.stale.4242.deadbeef');
    make('swept.json.2718281828', false); // too young: may be a save in progress
    make('neighbour.json.1618033988'); // another case's: not this open's business
    make('swept.broken-20261120T093000Z.json'); // kept files stay
    const r = await openCase(dir, { id: 'swept' });
    expect(r.ok && r.readOnly).toBe(false);
    expect(fs.readdirSync(dir).sort()).toEqual(
      [
        'neighbour.json',
        'neighbour.json.1618033988',
        'swept.broken-20261120T093000Z.json',
        'swept.json',
        'swept.json.2718281828',
        'swept.json.bak',
        'swept.json.lock',
      ].sort(),
    );
  });
});
