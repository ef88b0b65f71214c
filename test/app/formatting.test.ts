import { describe, expect, it } from 'vitest';
import { linearTicks, logTicks } from '../../app/format/axisTicks';
import { formatLength, lengthUnitFor } from '../../app/format/lengthUnit';
import { formatSI } from '../../app/format/siFormat';

describe('formatSI', () => {
  it.each([
    [1e-9, 's', 4, '1.000 ns'],
    [3.3356e-12, 's', 3, '3.34 ps'],
    [1.55e-7, 'V/m', 3, '155 nV/m'],
    [4.449e-3, 'V/m', 3, '4.45 mV/m'],
    [1e-5, 'V/m', 1, '10 µV/m'],
    [999.96e-9, 's', 4, '1.000 µs'],
    [-2.5e-6, 'm', 2, '-2.5 µm'],
    [0, 's', 3, '0 s'],
    [3.2e-31, 'J/(m²·Hz)', 3, '3.20e-31 J/(m²·Hz)'],
    [4e28, 'W', 2, '4.0e+28 W'],
    [12, 'V/m', 3, '12.0 V/m'],
  ])('%d %s to %d digits', (value, unit, digits, expected) => {
    expect(formatSI(value, unit, digits)).toBe(expected);
  });
});

describe('ticks', () => {
  it('puts round linear ticks inside the range', () => {
    expect(linearTicks(-10, 10, 4)).toEqual([-10, -5, 0, 5, 10]);
    expect(linearTicks(0.1, 0.35, 5)).toEqual([0.1, 0.15, 0.2, 0.25, 0.3, 0.35]);
  });

  it('uses 1-2-5 log ticks over a few decades and decades over many', () => {
    expect(logTicks(2.1e-7, 2.6e-5)).toEqual([5e-7, 1e-6, 2e-6, 5e-6, 1e-5, 2e-5]);
    expect(logTicks(3e-9, 2e-3)).toEqual([1e-8, 1e-7, 1e-6, 1e-5, 1e-4, 1e-3]);
  });
});

describe('lengths', () => {
  it('picks a unit that keeps numbers short', () => {
    expect(lengthUnitFor(0.2).symbol).toBe('cm');
    expect(lengthUnitFor(3).symbol).toBe('m');
    expect(formatLength(0.2)).toBe('20 cm');
    expect(formatLength(0.00125)).toBe('1.25 mm');
  });
});
