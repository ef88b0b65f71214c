import { describe, expect, it } from 'vitest';
import { axisFactor } from '../../app/analysis/axisFactor';

describe('the factor a chart axis is divided by', () => {
  it('brings the largest value into [1, 1000) by a power of 1000', () => {
    // A spectrum in J/(m²·Hz) of a single electron: far below uPlot's smallest tick step.
    expect(axisFactor([[2e-34, 7.5e-33, 0]])).toBeCloseTo(1e-33, 45);
    expect(axisFactor([[-4e5], [12]])).toBe(1e3);
    expect(axisFactor([[0.5]])).toBeCloseTo(1e-3, 18);
  });

  it('leaves empty, zero and non-finite data alone', () => {
    expect(axisFactor([[]])).toBe(1);
    expect(axisFactor([[0, 0]])).toBe(1);
    expect(axisFactor([[Number.NaN, Number.POSITIVE_INFINITY, 3]])).toBe(1);
  });
});
