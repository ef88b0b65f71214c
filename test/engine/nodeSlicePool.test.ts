import { describe, expect, it } from 'vitest';
import { createNodeSlicePool } from '../../src/engine/node/nodeSlicePool';
import { planeOf } from '../../src/engine/slicePlanes';
import { type SliceSpec, slicePoint, type Triple } from '../../src/engine/sliceSpec';
import { sampleMotion } from '../../src/path/analyticMotion';
import { circularOrbit } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';
import { ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../../src/physics/constants';
import { fieldSample } from '../../src/physics/fieldSample';
import { evaluateFields } from '../../src/physics/fields';
import { mulberry32 } from '../support/random';

const radius = 0.02;
const beta = 0.9;
const period = (2 * Math.PI * radius) / (beta * SPEED_OF_LIGHT);
const charges = [
  {
    charge: -ELEMENTARY_CHARGE,
    path: new SampledPath(sampleMotion(circularOrbit(radius, beta), -3 * period, period, 2000)),
  },
];
const spec: SliceSpec = {
  center: [0, 0, 0.01],
  u: [0.6, 0.8, 0],
  v: [-0.8, 0.6, 0],
  width: 0.3,
  height: 0.2,
  nx: 96,
  ny: 64,
  time: 0.3 * period,
};

describe('the slice engine in Node worker threads', () => {
  it('matches the point-by-point field evaluation at random grid points to 1e-6', async () => {
    const pool = createNodeSlicePool(2);
    try {
      pool.setScene(charges);
      const result = await pool.request(spec);
      expect(result).not.toBeNull();
      const fields = result!.fields;
      const random = mulberry32(20261201);
      const out = fieldSample();
      const point: Triple = [0, 0, 0];
      const names = ['Ex', 'Ey', 'Ez', 'Bx', 'By', 'Bz', 'Ex_rad', 'Ey_rad', 'Ez_rad'] as const;
      let worst = 0;
      for (let trial = 0; trial < 200; trial++) {
        const i = Math.floor(random() * spec.nx);
        const j = Math.floor(random() * spec.ny);
        const p = j * spec.nx + i;
        if (fields.mask[p] !== 0) continue;
        slicePoint(spec, i, j, point);
        evaluateFields(charges, point[0], point[1], point[2], spec.time, out);
        const reference = [
          out.ex,
          out.ey,
          out.ez,
          out.bx,
          out.by,
          out.bz,
          out.erx,
          out.ery,
          out.erz,
        ];
        for (let g = 0; g < 3; g++) {
          const ref = reference.slice(3 * g, 3 * g + 3);
          const got = names.slice(3 * g, 3 * g + 3).map((n) => planeOf(fields, n)[p]);
          const err =
            Math.hypot(got[0] - ref[0], got[1] - ref[1], got[2] - ref[2]) / Math.hypot(...ref);
          worst = Math.max(worst, err);
        }
        const delay = planeOf(fields, 'delay')[p];
        worst = Math.max(
          worst,
          Math.abs(spec.time - delay - out.tRet) / Math.abs(spec.time - out.tRet),
        );
      }
      // The engine stores float32 (relative rounding 6e-8); 1e-6 is the contract.
      expect(worst).toBeLessThan(1e-6);
      expect(result!.stats.threads).toBe(2);
      expect(result!.stats.faults).toBe(0);
    } finally {
      pool.dispose();
    }
  });
});
