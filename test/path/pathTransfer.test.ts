import { describe, expect, it } from 'vitest';
import { sampleMotion } from '../../src/path/analyticMotion';
import { pathState } from '../../src/path/pathState';
import {
  pathFromTransfer,
  pathToSharedTransfer,
  pathToTransfer,
} from '../../src/path/pathTransfer';
import { circularOrbit } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';

const path = new SampledPath(sampleMotion(circularOrbit(0.02, 0.7), 0, 1e-9, 257, false));

describe('a path sent to the field workers', () => {
  it('in shared memory holds the same columns, all in one shared block', () => {
    const shared = pathToSharedTransfer(path);
    const names = ['t', 'x', 'y', 'z', 'vx', 'vy', 'vz', 'ax', 'ay', 'az'] as const;
    for (const name of names) {
      expect(shared[name].buffer).toBeInstanceOf(SharedArrayBuffer);
      expect(shared[name].buffer).toBe(shared.t.buffer);
      expect(Array.from(shared[name])).toEqual(Array.from(path[name]));
    }
    expect(shared.maxSpeed).toBe(path.maxSpeed);
  });

  it('restores to a path that moves exactly like the original, shared or copied', () => {
    const a = pathState();
    const b = pathState();
    const c = pathState();
    const fromShared = pathFromTransfer(pathToSharedTransfer(path));
    const fromCopy = pathFromTransfer(pathToTransfer(path));
    for (const t of [-1e-10, 0, 3.3e-10, 7.77e-10, 1e-9, 2e-9]) {
      path.stateAt(t, a);
      fromShared.stateAt(t, b);
      fromCopy.stateAt(t, c);
      expect(b).toEqual(a);
      expect(c).toEqual(a);
    }
  });
});
