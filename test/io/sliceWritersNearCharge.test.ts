import { describe, expect, it } from 'vitest';
import { computeSlice, defaultNearRadius } from '../../src/engine/computeSlice';
import { MASK_ON_CHARGE, type SliceFields } from '../../src/engine/slicePlanes';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import { decodeNpyFloat32 } from '../../src/io/npy';
import { QUANTITIES, type Quantity } from '../../src/io/sliceQuantities';
import { sliceToCsv, sliceToJson, sliceToNpy } from '../../src/io/sliceWriters';
import { pathState } from '../../src/path/pathState';
import type { Charge } from '../../src/physics/charge';
import { ELEMENTARY_CHARGE } from '../../src/physics/constants';
import { NEAR_MOTIONS } from '../support/nearCharge';

const q = ELEMENTARY_CHARGE;
const quantities = Object.keys(QUANTITIES) as Quantity[];

/** Writes a slice every way there is and returns, per format, the values of each component. */
function everyOutput(
  fields: SliceFields,
  spec: SliceSpec,
  quantity: Quantity,
  nearRadius: number,
): Record<string, Record<string, number[]>> {
  const components = [...QUANTITIES[quantity]] as string[];
  const n = spec.nx * spec.ny;
  const byFormat: Record<string, Record<string, number[]>> = {};

  const { npy, sidecar } = sliceToNpy(fields, spec, quantity, nearRadius);
  const array = decodeNpyFloat32(npy);
  expect(array.shape).toEqual([spec.ny, spec.nx, components.length]);
  expect(JSON.parse(sidecar).nearRadius).toBe(nearRadius);
  byFormat.npy = Object.fromEntries(
    components.map((c, k) => [
      c,
      Array.from({ length: n }, (_, p) => array.data[p * components.length + k]),
    ]),
  );

  const csv = sliceToCsv(fields, spec, quantity, nearRadius);
  // Text that no number parser should meet in a data file.
  expect(csv).not.toMatch(/Infinity|NaN|null/);
  const rows = csv
    .trimEnd()
    .split('\n')
    .filter((l) => !l.startsWith('#'));
  expect(rows[0]).toBe(['x', 'y', 'z', ...components].join(','));
  const cells = rows.slice(1).map((r) => r.split(',').map(Number));
  expect(cells).toHaveLength(n);
  byFormat.csv = Object.fromEntries(components.map((c, k) => [c, cells.map((r) => r[3 + k])]));
  for (const r of cells) for (const x of r.slice(0, 3)) expect(Number.isFinite(x)).toBe(true);

  const json = sliceToJson(fields, spec, quantity, nearRadius);
  // JSON.stringify writes NaN and ±Infinity as null.
  expect(json).not.toMatch(/null|Infinity|NaN/);
  byFormat.json = JSON.parse(json).data;
  return byFormat;
}

describe('slice files through and beside the charge', () => {
  it('hold no NaN or Infinity in any format or quantity, and on_charge = 1 with zero fields where masked', () => {
    let files = 0;
    let flagged = 0;
    for (const { path } of NEAR_MOTIONS) {
      const charges: Charge[] = [{ charge: q, path }];
      const s = pathState();
      path.stateAt(0, s);
      // Cells from 1e-30 m (fields far beyond float32) to 1e-6 m; the middle point is on the
      // charge, the others 1 and 2 cells away.
      for (const cell of [1e-30, 1e-24, 1e-18, 1e-15, 1e-12, 1e-6]) {
        const spec: SliceSpec = {
          center: [s.px, s.py, s.pz],
          u: [0.6, 0.8, 0],
          v: [0, 0, 1],
          width: 5 * cell,
          height: 5 * cell,
          nx: 5,
          ny: 5,
          time: 0,
        };
        for (const nearRadius of [defaultNearRadius(spec), 0]) {
          const { fields } = computeSlice(spec, charges, { nearRadius });
          for (const quantity of quantities) {
            const outputs = everyOutput(fields, spec, quantity, nearRadius);
            for (const [format, data] of Object.entries(outputs)) {
              files++;
              for (const [component, values] of Object.entries(data)) {
                expect(values.length, `${format} ${component}`).toBe(25);
                for (const v of values) {
                  expect(Number.isFinite(v), `${format} ${quantity} ${component}`).toBe(true);
                }
              }
              for (let p = 0; p < 25; p++) {
                if (fields.mask[p] !== MASK_ON_CHARGE) continue;
                flagged++;
                for (const [component, values] of Object.entries(data)) {
                  if (component === 'on_charge') expect(values[p]).toBe(1);
                  else if (component !== 'delay') expect(values[p]).toBe(0);
                }
              }
              // The point on the charge is flagged in every file.
              if ('on_charge' in data) expect(data.on_charge[12]).toBe(1);
            }
          }
        }
      }
    }
    console.log(`${files} files checked, ${flagged} flagged points among them`);
  });
});
