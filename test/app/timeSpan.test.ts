import { describe, expect, it } from 'vitest';
import { observationSpan, PLAYBACK_RATES, suggestedRate } from '../../app/scenario/timeSpan';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import { SampledPath } from '../../src/path/sampledPath';
import type { Charge } from '../../src/physics/charge';
import { SPEED_OF_LIGHT as c } from '../../src/physics/constants';

/** A charge at rest at the origin, sampled from t0 to t1 (s). */
const resting = (t0: number, t1: number): Charge => ({
  charge: 1,
  path: new SampledPath({ t: [t0, t1], x: [0, 0], y: [0, 0], z: [0, 0] }),
});

const view: SliceSpec = {
  center: [0, 0, 0],
  u: [1, 0, 0],
  v: [0, 1, 0],
  width: 0.3,
  height: 0.4,
  nx: 30,
  ny: 40,
  time: 0,
};

describe('observation span', () => {
  it('runs from the first sample to the last plus the light time across the view diagonal', () => {
    const span = observationSpan([resting(-1e-9, 0), resting(0, 2e-9)], view);
    // Light-crossing time = distance / c (c exact by SI definition); the 0.3 × 0.4 m diagonal
    // is 0.5 m. Tolerance 1e-24 s: a few ulps of 2e-9 s.
    expect(span?.start).toBe(-1e-9);
    expect(Math.abs((span?.end ?? 0) - (2e-9 + 0.5 / c))).toBeLessThan(1e-24);
  });

  it('is null without charges', () => {
    expect(observationSpan([], view)).toBeNull();
  });
});

describe('playback rates', () => {
  it('step 1, 2, 5 × 10ⁿ upwards from 1e-18 s/s', () => {
    expect(PLAYBACK_RATES.slice(0, 4)).toEqual([1e-18, 2e-18, 5e-18, 1e-17]);
    for (const rate of [1e-12, 2e-10, 5e-9, 1e-3, 5e-1]) expect(PLAYBACK_RATES).toContain(rate);
    PLAYBACK_RATES.forEach((rate, k) => {
      if (k === 0) return;
      // Ratios of a 1-2-5 series are 2, 2.5, 2, ...; 1e-12 relative for decimal rounding.
      const ratio = rate / PLAYBACK_RATES[k - 1];
      expect(Math.abs(ratio - (k % 3 === 2 ? 2.5 : 2))).toBeLessThan(1e-12);
    });
  });
});

describe('suggested rate', () => {
  it('picks the largest offered rate at most an eighth of the span', () => {
    // 8e-9 / 8 is exactly the double 1e-9 (division by a power of two), itself a rate.
    expect(suggestedRate({ start: 0, end: 8e-9 })).toBe(1e-9);
    expect(suggestedRate({ start: 0, end: 7.9e-9 })).toBe(5e-10);
    expect(suggestedRate({ start: -1e-9, end: 1e-9 })).toBe(2e-10);
    for (const length of [3e-15, 1e-11, 4.2e-7, 0.1]) {
      const rate = suggestedRate({ start: 0, end: length });
      const next = PLAYBACK_RATES[PLAYBACK_RATES.indexOf(rate) + 1];
      expect(rate).toBeLessThanOrEqual(length / 8);
      expect(next).toBeGreaterThan(length / 8);
    }
  });

  it('falls back to the slowest rate for a span too short for any', () => {
    expect(suggestedRate({ start: 0, end: 1e-18 })).toBe(PLAYBACK_RATES[0]);
  });
});
