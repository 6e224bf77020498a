import fs from 'node:fs';

/**
 * The file calls of the save path, in one object so that tests can put faults between skidcase
 * and the disk (a disk that fills up half-way through a write, a write that reports success but
 * keeps fewer bytes, a folder that turns read-only). Production code never changes it.
 */
export const disk = {
  openSync: fs.openSync,
  writeSync: fs.writeSync as (fd: number, buf: Uint8Array, off: number, len: number) => number,
  fsyncSync: fs.fsyncSync,
  closeSync: fs.closeSync,
  readFileSync: fs.readFileSync as (file: string) => Buffer,
  renameSync: fs.renameSync,
  unlinkSync: fs.unlinkSync,
  lstatSync: fs.lstatSync,
  mkdirSync: fs.mkdirSync,
};

/** The real calls again (tests, after a fault). */
export const realDisk = { ...disk };
