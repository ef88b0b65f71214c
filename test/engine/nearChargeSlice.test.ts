import { describe, expect, it } from 'vitest';
import { computeSlice, defaultNearRadius } from '../../src/engine/computeSlice';
import { computeSliceRows, type KernelStats } from '../../src/engine/sliceKernel';
import {
  allocateSliceFields,
  MASK_CLEAR,
  MASK_ON_CHARGE,
  PLANE_COUNT,
  type SliceFields,
} from '../../src/engine/slicePlanes';
import { type SliceSpec, slicePoint, type Triple } from '../../src/engine/sliceSpec';
import { pathState } from '../../src/path/pathState';
import type { Charge } from '../../src/physics/charge';
import { ELEMENTARY_CHARGE, VACUUM_PERMEABILITY } from '../../src/physics/constants';
import { fieldSample } from '../../src/physics/fieldSample';
import { evaluateFields } from '../../src/physics/fields';
import { NEAR_MOTIONS } from '../support/nearCharge';

const q = ELEMENTARY_CHARGE;
const FLOAT32_MAX = 3.4028234663852886e38;

/** Cell sizes of the slices, m: grid points sit 1 and 2 cells from the charge, and on it. */
const CELLS = [1e-30, 1e-27, 1e-24, 1e-21, 1e-18, 1e-15, 1e-12, 1e-9, 1e-6];

/**
 * A 5 × 5 slice centred on the charge's present position at t: its middle point (i = j = 2)
 * is exactly the centre, since ((2 + ½)/5 - ½)·width is exactly 0.
 */
function sliceOn(center: Triple, cell: number, tilted: boolean, time: number): SliceSpec {
  return {
    center,
    u: tilted ? [0.6, 0.8, 0] : [1, 0, 0],
    v: tilted ? [0, 0, 1] : [0, 1, 0],
    width: 5 * cell,
    height: 5 * cell,
    nx: 5,
    ny: 5,
    time,
  };
}

/** Every stored value finite, masked points all zero, and S = E × B/μ0 within float32. */
function checkStorage(fields: SliceFields): void {
  const n = fields.nx * fields.ny;
  for (const v of fields.planes) expect(Number.isFinite(v)).toBe(true);
  for (let p = 0; p < n; p++) {
    expect([MASK_CLEAR, MASK_ON_CHARGE]).toContain(fields.mask[p]);
    const at = (k: number) => fields.planes[k * n + p];
    // slicePlanes.ts contract: a flagged point's fields (all planes but the delay) are zero.
    if (fields.mask[p] === MASK_ON_CHARGE) {
      for (let k = 0; k < PLANE_COUNT - 1; k++) expect(at(k)).toBe(0);
    }
    // The Poynting vector E × B/μ0 (Griffiths 4th ed. Eq. 8.10) as the writers form it from
    // the stored float32 E and B (sliceQuantities.ts) must fit float32 too (IEEE 754 binary32
    // ends at (2 - 2⁻²³)·2¹²⁷ ≈ 3.4028e38).
    const m = 1 / VACUUM_PERMEABILITY;
    const s = [
      (at(1) * at(5) - at(2) * at(4)) * m,
      (at(2) * at(3) - at(0) * at(5)) * m,
      (at(0) * at(4) - at(1) * at(3)) * m,
    ];
    for (const x of s) expect(Math.abs(x)).toBeLessThanOrEqual(FLOAT32_MAX);
  }
}

describe('a slice through the charge and just beside it', () => {
  for (const { name, path } of NEAR_MOTIONS) {
    it(`stores only finite values and flags the points on and too near the charge, for ${name}`, () => {
      const charges: Charge[] = [{ charge: q, path }];
      const s = pathState();
      const out = fieldSample();
      const point: Triple = [0, 0, 0];
      const flaggedBeside = new Set<number>();
      let worstAgreement = 0;
      for (const time of [0, 1.3e-12]) {
        path.stateAt(time, s);
        const center: Triple = [s.px, s.py, s.pz];
        for (const cell of CELLS) {
          for (const tilted of [false, true]) {
            const spec = sliceOn(center, cell, tilted, time);
            for (const nearRadius of [undefined, 0]) {
              const { fields } = computeSlice(spec, charges, { nearRadius });
              checkStorage(fields);
              // The point exactly on the charge is always flagged, whatever the near radius.
              expect(fields.mask[2 * 5 + 2]).toBe(MASK_ON_CHARGE);
              if (nearRadius === undefined) {
                // A quarter cell masks the middle point only (computeSlice.ts).
                expect(defaultNearRadius(spec)).toBe(0.25 * cell);
                continue;
              }
              for (let p = 0; p < 25; p++) {
                if (p !== 12 && fields.mask[p] === MASK_ON_CHARGE) flaggedBeside.add(cell);
              }
              if (cell < 1e-6) continue;
              // Well above the rounding of the charge's position (ε·1 m at most), unflagged
              // points agree with the double-precision evaluation to float32 storage.
              for (let p = 0; p < 25; p++) {
                if (fields.mask[p] !== MASK_CLEAR) continue;
                slicePoint(spec, p % 5, Math.floor(p / 5), point);
                evaluateFields(charges, point[0], point[1], point[2], time, out);
                const e = [0, 1, 2].map((k) => fields.planes[k * 25 + p]);
                const ref = [out.ex, out.ey, out.ez];
                const err =
                  Math.hypot(e[0] - ref[0], e[1] - ref[1], e[2] - ref[2]) / Math.hypot(...ref);
                worstAgreement = Math.max(worstAgreement, err);
              }
            }
          }
        }
      }
      console.log(
        `${name}: with near radius 0, points beside the charge flagged at cells of ` +
          `${[...flaggedBeside].join(', ') || 'no size'} m; unflagged points at 1 µm match ` +
          `evaluateFields to ${worstAgreement.toExponential(2)}`,
      );
      // Tolerance: float32 storage, relative rounding 6e-8; 1e-6 is the engine's contract.
      expect(worstAgreement).toBeLessThan(1e-6);
    });
  }

  it('stays finite and flagged when the kernel warm-starts from the previous frame', () => {
    const [, , oscillation] = NEAR_MOTIONS;
    const charges: Charge[] = [{ charge: q, path: oscillation.path }];
    const s = pathState();
    for (const cell of CELLS) {
      oscillation.path.stateAt(0, s);
      const spec = sliceOn([s.px, s.py, s.pz], cell, false, 0);
      const fields = allocateSliceFields(5, 5, 0);
      const target = { planes: fields.planes, mask: fields.mask, points: 25, row0: 0 };
      const warm = new Float64Array(25).fill(Number.NaN);
      const stats: KernelStats = { points: 0, iterations: 0, maxIterations: 0 };
      // Frames at t = 0, then 1e-30 s and 1 as later, each starting from the last's delays
      // (a delay that is NaN or negative would fail toBeGreaterThanOrEqual).
      for (const time of [0, 1e-30, 1e-18]) {
        computeSliceRows({ ...spec, time }, charges, 0, 5, target, 0, warm, stats);
        checkStorage(fields);
        for (const v of warm) expect(v).toBeGreaterThanOrEqual(0);
        // At t = 0 the middle point is exactly on the charge: delay 0, flagged.
        if (time === 0) {
          expect(warm[12]).toBe(0);
          expect(fields.mask[12]).toBe(MASK_ON_CHARGE);
        }
      }
    }
  });

  it('superposes two charges beside each other without overflow or NaN', () => {
    const [line, , oscillation] = NEAR_MOTIONS;
    // Opposite charges, both at the origin at t = 0: their fields nearly cancel beside it.
    const charges: Charge[] = [
      { charge: q, path: line.path },
      { charge: -q, path: oscillation.path },
    ];
    for (const cell of CELLS) {
      const { fields } = computeSlice(sliceOn([0, 0, 0], cell, true, 0), charges, {
        nearRadius: 0,
      });
      checkStorage(fields);
      expect(fields.mask[12]).toBe(MASK_ON_CHARGE);
    }
  });
});
