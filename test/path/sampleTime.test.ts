import { describe, expect, it } from 'vitest';
import { sampleMotion } from '../../src/path/analyticMotion';
import { uniformMotion } from '../../src/path/presets';
import { PathError, SampledPath } from '../../src/path/sampledPath';
import { sampleTime } from '../../src/path/sampleTime';

describe('sampleTime', () => {
  it('spaces samples evenly and ends exactly on both ends', () => {
    expect([0, 1, 2, 3, 4].map((i) => sampleTime(-1, 1, i, 5))).toEqual([-1, -0.5, 0, 0.5, 1]);
    expect(sampleTime(2, 3, 0, 1)).toBe(2);
  });

  it('stays finite and ordered on a range near the largest double', () => {
    const times = Array.from({ length: 9 }, (_, i) => sampleTime(-1e308, 1e308, i, 9));
    expect(times.every(Number.isFinite)).toBe(true);
    expect(times.every((t, i) => i === 0 || t > times[i - 1])).toBe(true);
    expect(times[4]).toBe(0);
  });
});

describe('a path with numbers too large to differentiate', () => {
  it('says the velocity cannot be computed rather than quoting a speed of NaN', () => {
    // Invented: a preset sampled over the whole range of doubles.
    const columns = sampleMotion(uniformMotion(0.5), -1e308, 1e308, 5, false);
    let message = '';
    try {
      new SampledPath({ ...columns, x: [-1e308, -1e308, 1e308, 1e308, -1e308] });
    } catch (error) {
      expect(error).toBeInstanceOf(PathError);
      message = (error as Error).message;
    }
    expect(message).toMatch(
      /^the velocity cannot be computed \((NaN|-?Infinity): positions or times too large/,
    );
  });
});
