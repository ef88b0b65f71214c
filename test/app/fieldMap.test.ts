import { describe, expect, it } from 'vitest';
import { computeFieldMap } from '../../app/field/computeFieldMap';
import { summariseField } from '../../app/field/fieldMap';
import {
  allocateSliceFields,
  MASK_ON_CHARGE,
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
  it('counts the points masked as lying on a charge', () => {
    const fields = allocateSliceFields(2, 2, 0);
    fields.mask[3] = MASK_ON_CHARGE;
    fields.mask[0] = MASK_ON_CHARGE;
    expect(summariseField(computed(fields)).masked).toBe(2);
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
    expect(map?.masked).toBe(0);
  });
});
