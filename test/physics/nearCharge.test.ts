import { describe, expect, it } from 'vitest';
import { sampleMotion } from '../../src/path/analyticMotion';
import { pathState } from '../../src/path/pathState';
import { uniformMotion } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';
import type { Charge } from '../../src/physics/charge';
import { COULOMB_CONSTANT, ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../../src/physics/constants';
import { type FieldSample, fieldSample } from '../../src/physics/fieldSample';
import { evaluateFields, poyntingVector } from '../../src/physics/fields';
import { vec3 } from '../../src/physics/vec3';
import { NEAR_MOTIONS, OFFSETS } from '../support/nearCharge';
import { mulberry32, uniform, unitVector } from '../support/random';

const c = SPEED_OF_LIGHT;
const q = ELEMENTARY_CHARGE;

function values(f: FieldSample): number[] {
  const { ex, ey, ez, bx, by, bz, erx, ery, erz } = f;
  return [ex, ey, ez, bx, by, bz, erx, ery, erz, f.tRet, f.delay, f.doppler, f.distance];
}

describe('observation points on and just beside the charge', () => {
  for (const { name, path } of NEAR_MOTIONS) {
    it(`give finite fields or a flagged zero, never NaN or Infinity, for ${name}`, () => {
      const random = mulberry32(0x0c4a29e + path.count);
      const s = pathState();
      const f = fieldSample();
      const S = vec3();
      const flagged: number[] = [];
      let nearestFinite = Number.POSITIVE_INFINITY;
      for (const d of OFFSETS) {
        for (let k = 0; k < 8; k++) {
          // At t = 0 (charge at the origin) and at seeded times nearby, for nearRadius 0 and
          // one of twice the offset.
          const t = k < 4 ? 0 : uniform(random, -2e-12, 2e-12);
          path.stateAt(t, s);
          const [ux, uy, uz] = unitVector(random);
          const r = [s.px + d * ux, s.py + d * uy, s.pz + d * uz];
          for (const nearRadius of [0, 2 * d]) {
            evaluateFields([{ charge: q, path }], r[0], r[1], r[2], t, f, nearRadius);
            for (const v of values(f)) expect(Number.isFinite(v)).toBe(true);
            // S = E × B/μ0 (Griffiths 4th ed. Eq. 8.10), finite too: one charge adds at most
            // 1e150 V/m (lienardWiechert.ts), so |S| <= |E|²/(μ0 c) stays a double.
            poyntingVector(S, f);
            for (const v of [S.x, S.y, S.z]) expect(Number.isFinite(v)).toBe(true);
            if (f.onCharge) {
              // fields.ts contract: on the charge everything is zero, not infinite.
              for (const v of values(f).slice(0, 9)) expect(v).toBe(0);
              if (nearRadius === 0) flagged.push(d);
            } else {
              // nearRadius bounds the distance from the retarded position (fields.ts).
              expect(f.distance).toBeGreaterThan(nearRadius);
              nearestFinite = Math.min(nearestFinite, f.distance);
            }
          }
          // Exactly on the charge is always flagged (fields.ts contract).
          if (d === 0) {
            evaluateFields([{ charge: q, path }], s.px, s.py, s.pz, t, f);
            expect(f.onCharge).toBe(true);
          }
        }
      }
      console.log(
        `${name}: flagged as on the charge at offsets ${[...new Set(flagged)].join(', ')} m; ` +
          `nearest unflagged retarded distance ${nearestFinite.toExponential(2)} m`,
      );
    });
  }

  it('has the Heaviside field from 1e-15 to 1e-6 m of a uniformly moving charge at the origin (Griffiths 4th ed. Eq. 10.75)', () => {
    // On the history line the motion is exactly uniform and the charge exactly at the origin
    // at t = 0, so the offset is exact and nothing limits the relative accuracy but rounding.
    const path = new SampledPath(sampleMotion(uniformMotion(0.9), 0, 1e-9, 3));
    const beta = path.vx[0] / c;
    const random = mulberry32(15);
    const f = fieldSample();
    let worst = 0;
    for (const d of [1e-15, 1e-12, 1e-9, 1e-6]) {
      for (let k = 0; k < 20; k++) {
        const [ux, uy, uz] = unitVector(random);
        evaluateFields([{ charge: q, path }], d * ux, d * uy, d * uz, 0, f);
        expect(f.onCharge).toBe(false);
        const sin2 = uy * uy + uz * uz;
        const expected =
          (COULOMB_CONSTANT * q * (1 - beta * beta)) / ((1 - beta * beta * sin2) ** 1.5 * d * d);
        worst = Math.max(worst, Math.abs(Math.hypot(f.ex, f.ey, f.ez) / expected - 1));
      }
    }
    // Tolerance: double rounding in a few dozen operations (β = 0.9 amplifies by ≤ 1/(1-β)).
    expect(worst).toBeLessThan(1e-13);
  });

  it('keeps two charges at the same point finite beside them and flags the point on them', () => {
    const [line, , oscillation] = NEAR_MOTIONS;
    const charges: Charge[] = [
      { charge: q, path: line.path },
      { charge: -q, path: oscillation.path },
    ];
    const f = fieldSample();
    for (const d of OFFSETS) {
      // Both charges are at the origin at t = 0: a point d from it is d from both.
      evaluateFields(charges, d, 0, 0, 0, f);
      for (const v of values(f)) expect(Number.isFinite(v)).toBe(true);
      // fields.ts contract: the superposition is zeroed when the point is on any charge.
      if (d === 0) expect(f.onCharge).toBe(true);
    }
  });
});
