import { existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { writeFileAtomic } from '../../src/cli/atomicWrite';
import { scratchFolder } from './cliSupport';

describe('writeFileAtomic', () => {
  const scratch = scratchFolder();
  afterAll(() => scratch.remove());

  it('replaces a file whole and leaves nothing half-written beside it', () => {
    const target = scratch.file('slice.csv', 'old\n');
    writeFileAtomic(target, 'new content\n');
    expect(readFileSync(target, 'utf8')).toBe('new content\n');
    expect(readdirSync(scratch.dir).filter((name) => name.includes('partial'))).toEqual([]);
  });

  it('leaves the old output as it was when the new one cannot take its place', () => {
    // A folder where the file should go: the rename fails after the data was written aside.
    const target = join(scratch.dir, 'taken.npy');
    mkdirSync(target);
    writeFileSync(join(target, 'inside.txt'), 'kept');
    expect(() => writeFileAtomic(target, new Uint8Array(1024))).toThrow(
      /^cannot write .*taken\.npy: /,
    );
    expect(readFileSync(join(target, 'inside.txt'), 'utf8')).toBe('kept');
    expect(readdirSync(scratch.dir).filter((name) => name.includes('partial'))).toEqual([]);
  });

  it('names a missing folder in one line and creates nothing', () => {
    const target = join(scratch.dir, 'no-such-folder', 'out.json');
    expect(() => writeFileAtomic(target, '{}')).toThrow(`cannot write ${target}: no such folder`);
    expect(existsSync(join(scratch.dir, 'no-such-folder'))).toBe(false);
  });
});
