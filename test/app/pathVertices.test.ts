import { describe, expect, it } from 'vitest';
import { drawnSamples, MAX_DRAWN_VERTICES } from '../../app/view/pathVertices';

describe('the samples a path is drawn through', () => {
  it('are all of them for a path of up to the limit', () => {
    expect(Array.from(drawnSamples(5, 10))).toEqual([0, 1, 2, 3, 4]);
    expect(drawnSamples(MAX_DRAWN_VERTICES)).toHaveLength(MAX_DRAWN_VERTICES);
    expect(Array.from(drawnSamples(1, 10))).toEqual([0]);
  });

  it('are thinned evenly for a longer one, always keeping the first and the last', () => {
    expect(Array.from(drawnSamples(11, 5))).toEqual([0, 3, 6, 9, 10]);
    expect(Array.from(drawnSamples(10, 5))).toEqual([0, 2, 4, 6, 8, 9]);
    expect(Array.from(drawnSamples(9, 5))).toEqual([0, 2, 4, 6, 8]);
    const million = drawnSamples(1_000_000);
    expect(million.length).toBeLessThanOrEqual(MAX_DRAWN_VERTICES + 1);
    expect(million[0]).toBe(0);
    expect(million[million.length - 1]).toBe(999_999);
  });
});
