import { describe, expect, it } from 'vitest';
import { computeFieldMap } from '../../app/field/computeFieldMap';
import { summariseField } from '../../app/field/fieldMap';
import { logPosition, paintMagnitude } from '../../app/field/logColourScale';
import {
  allocateSliceFields,
  MASK_ON_CHARGE,
  planeOf,
  type SliceFields,
} from '../../src/engine/slicePlanes';
import { SlicePool } from '../../src/engine/slicePool';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import { sampleMotion } from '../../src/path/analyticMotion';
import { uniformMotion } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';

const spec: SliceSpec = {
  center: [0, 0, 0],
  u: [1, 0, 0],
  v: [0, 1, 0],
  width: 1,
  height: 1,
  nx: 2,
  ny: 2,
  time: 0,
};
const stats = { points: 4, iterations: 4, maxIterations: 1 };
const computed = (fields: SliceFields) => ({
  id: 1,
  spec,
  requested: [2, 2] as [number, number],
  charges: [],
  fields,
  elapsedMs: 1,
  stats,
  threads: 0,
  coarse: false,
});

describe('summariseField', () => {
  it('takes |E| per point and leaves masked points out of the ranges', () => {
    const fields = allocateSliceFields(2, 2, 0);
    planeOf(fields, 'Ex').set([3, 0, 1e-3, 1e9]);
    planeOf(fields, 'Ey').set([4, 2, 0, 0]);
    fields.mask[3] = MASK_ON_CHARGE;
    const map = summariseField(computed(fields));
    expect(Array.from(map.magnitude)).toEqual([5, 2, Math.fround(1e-3), 0]);
    expect(map.masked).toBe(1);
    expect(map.range).toEqual({ min: Math.fround(1e-3), max: 5 });
  });

  it('gives a uniform field a colour range of some width', () => {
    const fields = allocateSliceFields(2, 2, 0);
    planeOf(fields, 'Ez').fill(2);
    const map = summariseField(computed(fields));
    expect(map.colourRange).toEqual({ min: 0.2, max: 2 });
  });

  it('reports no range when every point is masked', () => {
    const fields = allocateSliceFields(2, 2, 0);
    fields.mask.fill(MASK_ON_CHARGE);
    expect(summariseField(computed(fields)).range).toBeNull();
  });
});

describe('log colour scale', () => {
  const range = { min: 1e-6, max: 1e-3 };

  it('places values by their logarithm and clamps the ends', () => {
    expect(logPosition(range, 1e-6)).toBeCloseTo(0, 12);
    expect(logPosition(range, Math.sqrt(1e-9))).toBeCloseTo(0.5, 12);
    expect(logPosition(range, 1)).toBe(1);
    expect(logPosition(range, 0)).toBe(0);
  });

  it('paints masked points grey and the rest from dark to light', () => {
    const rgba = paintMagnitude(
      new Float32Array([1e-9, 1e-3, 0]),
      new Uint8Array([0, 0, MASK_ON_CHARGE]),
      range,
    );
    const brightness = (p: number) => rgba[4 * p] + rgba[4 * p + 1] + rgba[4 * p + 2];
    expect(brightness(0)).toBeLessThan(40);
    expect(brightness(1)).toBeGreaterThan(600);
    expect(Array.from(rgba.subarray(8, 12))).toEqual([0x8c, 0x93, 0x9c, 255]);
  });
});

describe('computeFieldMap', () => {
  it('computes the grid asked for, a coarse pass first', async () => {
    const path = new SampledPath(sampleMotion(uniformMotion(0.5), -1e-9, 1e-9, 11));
    const pool = new SlicePool({ size: 0 });
    pool.setScene([{ charge: 1e-19, path }]);
    const coarse: number[] = [];
    const map = await computeFieldMap(
      pool,
      { ...spec, nx: 40, ny: 40 },
      [{ charge: 1e-19, path }],
      (m) => coarse.push(m.spec.nx),
    );
    expect(coarse).toEqual([10]);
    expect(map?.spec.nx).toBe(40);
    expect(map?.coarse).toBe(false);
    expect(map?.range).not.toBeNull();
  });
});
