import { describe, expect, it } from 'vitest';
import { SampledPath } from '../../src/path/sampledPath';
import { mulberry32 } from '../support/random';

describe('the path look-up', () => {
  it('finds the same piece as a linear scan, from any hint', () => {
    const random = mulberry32(7);
    const n = 500;
    const t = new Float64Array(n);
    for (let i = 1; i < n; i++) t[i] = t[i - 1] + 0.01 + random();
    const path = new SampledPath({
      t,
      x: new Float64Array(n),
      y: new Float64Array(n),
      z: new Float64Array(n),
    });
    for (let trial = 0; trial < 5000; trial++) {
      const time = -5 + random() * (t[n - 1] + 10);
      const hint = Math.floor(random() * (n + 2)) - 1;
      let expected = -1;
      for (let i = 0; i < n; i++) if (t[i] <= time) expected = i;
      expect(path.locate(time, hint)).toBe(expected);
    }
  });
});
