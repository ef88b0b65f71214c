import { describe, expect, it } from 'vitest';
import { sampleMotion } from '../../src/path/analyticMotion';
import { pathState } from '../../src/path/pathState';
import { circularOrbit, uniformMotion } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';
import type { Charge } from '../../src/physics/charge';
import { COULOMB_CONSTANT, ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../../src/physics/constants';
import { evaluateFeynman, feynmanFields } from '../../src/physics/feynman';
import { type FieldSample, fieldSample } from '../../src/physics/fieldSample';
import { evaluateFields } from '../../src/physics/fields';
import { mulberry32, uniform, unitVector } from '../support/random';

const c = SPEED_OF_LIGHT;
const q = ELEMENTARY_CHARGE;

function values(f: FieldSample): number[] {
  return [f.ex, f.ey, f.ez, f.bx, f.by, f.bz, f.erx, f.ery, f.erz];
}

const orbit = new SampledPath(sampleMotion(circularOrbit(1, 0.9), -20e-9, 20e-9, 801));
const line = new SampledPath(sampleMotion(uniformMotion(0.6), -1e-9, 1e-9, 5));

describe('an observation point on the charge', () => {
  it('gives onCharge = true and all-zero fields, for LW and Feynman alike (fields.ts contract)', () => {
    const random = mulberry32(808);
    const s = pathState();
    const f = fieldSample();
    const fy = feynmanFields();
    for (const path of [orbit, line]) {
      for (let k = 0; k < 50; k++) {
        const t = uniform(random, -15e-9, 15e-9);
        path.stateAt(t, s);
        evaluateFields([{ charge: q, path }], s.px, s.py, s.pz, t, f);
        expect(f.onCharge).toBe(true);
        for (const v of values(f)) expect(v).toBe(0);
        evaluateFeynman([{ charge: q, path }], s.px, s.py, s.pz, t, fy);
        expect(fy.onCharge).toBe(true);
        expect([fy.e.x, fy.e.y, fy.e.z, fy.b.x, fy.b.y, fy.b.z]).toEqual([0, 0, 0, 0, 0, 0]);
      }
    }
  });

  it('zeroes the whole superposition when the point sits on any one of the charges', () => {
    const s = pathState();
    const f = fieldSample();
    const t = 3e-9;
    line.stateAt(t, s);
    const charges: Charge[] = [
      { charge: q, path: orbit },
      { charge: -q, path: line },
    ];
    evaluateFields(charges, s.px, s.py, s.pz, t, f);
    expect(f.onCharge).toBe(true);
    for (const v of values(f)) expect(v).toBe(0);
  });

  it('treats points within nearRadius of the retarded position as on the charge', () => {
    const s = pathState();
    const f = fieldSample();
    const t = 0;
    orbit.stateAt(t, s);
    evaluateFields([{ charge: q, path: orbit }], s.px, s.py + 1e-4, s.pz, t, f, 1e-3);
    expect(f.onCharge).toBe(true);
    for (const v of values(f)) expect(v).toBe(0);
    evaluateFields([{ charge: q, path: orbit }], s.px, s.py + 1e-2, s.pz, t, f, 1e-3);
    expect(f.onCharge).toBe(false);
  });
});

describe('an observation point 1e-12 m from the charge', () => {
  it('has finite fields, with the Heaviside value for uniform motion (Griffiths 4th ed. Eq. 10.75)', () => {
    const random = mulberry32(1e12);
    const s = pathState();
    const f = fieldSample();
    const beta = 0.6;
    let worst = 0;
    for (let k = 0; k < 50; k++) {
      const t = uniform(random, -5e-9, 5e-9);
      line.stateAt(t, s);
      const [ux, uy, uz] = unitVector(random);
      const d = 1e-12;
      evaluateFields(
        [{ charge: q, path: line }],
        s.px + d * ux,
        s.py + d * uy,
        s.pz + d * uz,
        t,
        f,
      );
      expect(f.onCharge).toBe(false);
      for (const v of values(f)) expect(Number.isFinite(v)).toBe(true);
      // Heaviside: |E| = kq (1 - β²) / ((1 - β² sin²ψ)^{3/2} d²), ψ from the velocity (x).
      const sin2 = uy * uy + uz * uz;
      const heaviside =
        (COULOMB_CONSTANT * q * (1 - beta * beta)) / ((1 - beta * beta * sin2) ** 1.5 * d * d);
      worst = Math.max(worst, Math.abs(Math.hypot(f.ex, f.ey, f.ez) / heaviside - 1));
    }
    console.log(
      `1e-12 m from a uniformly moving charge: |E| off Heaviside by ${worst.toExponential(2)}`,
    );
    // Tolerance: the charge's position carries ~ε·|r0| ≈ 1e-16 m of rounding (|r0| ≤ 1 m),
    // 1e-4 of the 1e-12 m offset, which the 1/d² law doubles: 1e-3.
    expect(worst).toBeLessThan(1e-3);
  });

  it('has finite fields near an accelerated charge, bounded by the velocity field (Jackson 3rd ed. Eq. 14.14)', () => {
    const random = mulberry32(2e12);
    const s = pathState();
    const f = fieldSample();
    const beta = 0.9;
    for (let k = 0; k < 50; k++) {
      const t = uniform(random, -15e-9, 15e-9);
      orbit.stateAt(t, s);
      const [ux, uy, uz] = unitVector(random);
      const d = 1e-12;
      evaluateFields(
        [{ charge: q, path: orbit }],
        s.px + d * ux,
        s.py + d * uy,
        s.pz + d * uz,
        t,
        f,
      );
      expect(f.onCharge).toBe(false);
      for (const v of values(f)) expect(Number.isFinite(v)).toBe(true);
      // At 1e-12 m the velocity field dominates (radiation/velocity ~ a d/c² ≈ 1e-12) and its
      // size lies between the Heaviside extremes kq(1-β²)/d² and kq γ/d² (Griffiths 4th ed.
      // Eq. 10.75 at ψ = 0 and π/2).
      const e = Math.hypot(f.ex, f.ey, f.ez) * d * d;
      const kq = COULOMB_CONSTANT * q;
      // Tolerance: 1e-3 of slack on each side for the offset's rounding (see above).
      expect(e).toBeGreaterThan(kq * (1 - beta * beta) * (1 - 1e-3));
      expect(e).toBeLessThan((kq / Math.sqrt(1 - beta * beta)) * (1 + 1e-3));
      expect(Math.hypot(f.erx, f.ery, f.erz) * d * d).toBeLessThan(1e-9 * e);
      // B = v × E / c² for the velocity field, so c|B| ≤ β|E| (Griffiths 4th ed. §10.3.2, from memory).
      expect(c * Math.hypot(f.bx, f.by, f.bz) * d * d).toBeLessThan(beta * e * (1 + 1e-3));
    }
  });
});
