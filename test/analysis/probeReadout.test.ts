import { describe, expect, it } from 'vitest';
import { probeReadout } from '../../src/analysis/probeReadout';
import type { Triple } from '../../src/engine/sliceSpec';
import { sampleMotion } from '../../src/path/analyticMotion';
import { pathState } from '../../src/path/pathState';
import { circularOrbit, lineOscillation, uniformMotion } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';
import type { Charge } from '../../src/physics/charge';
import { ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../../src/physics/constants';
import { fieldSample } from '../../src/physics/fieldSample';
import { evaluateFields, poyntingVector } from '../../src/physics/fields';
import { vec3 } from '../../src/physics/vec3';

const c = SPEED_OF_LIGHT;
const q = ELEMENTARY_CHARGE;

// β = 0.7 on a 1 cm orbit (period 0.30 ns), sampled with exact derivatives over [-3, 3] ns.
const ORBIT = new SampledPath(sampleMotion(circularOrbit(0.01, 0.7), -3e-9, 3e-9, 2001));
// 1 cm at 2 GHz along x: peak β = 0.42.
const WIGGLE = new SampledPath(sampleMotion(lineOscillation(0.01, 2e9), -3e-9, 3e-9, 2001));
const ELECTRON: Charge[] = [{ charge: -q, path: ORBIT }];
const PAIR: Charge[] = [
  { charge: -q, path: ORBIT },
  { charge: 2 * q, path: WIGGLE },
];
const TIME = 1e-9;
/** Near zone (a few radii), intermediate and radiation zone (up to 100 radii). */
const POINTS: Triple[] = [
  [0.03, 0.01, 0.005],
  [-0.05, 0.08, -0.02],
  [0.2, -0.1, 0.3],
  [-0.6, 0.4, 0.5],
  [0, 0, 1],
];

const norm = (a: readonly number[]) => Math.hypot(a[0], a[1], a[2]);
const dot = (a: readonly number[], b: readonly number[]) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a: readonly number[], b: readonly number[]): Triple => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];
const sum = (a: readonly number[], b: readonly number[]): Triple => [
  a[0] + b[0],
  a[1] + b[1],
  a[2] + b[2],
];
const relative = (a: readonly number[], ref: readonly number[]) =>
  norm([a[0] - ref[0], a[1] - ref[1], a[2] - ref[2]]) / norm(ref);

describe('probeReadout', () => {
  it('gives E, B and S equal to evaluateFields and poyntingVector to the last bit', () => {
    const f = fieldSample();
    const s = vec3();
    for (const charges of [ELECTRON, PAIR]) {
      for (const point of POINTS) {
        evaluateFields(charges, point[0], point[1], point[2], TIME, f);
        poyntingVector(s, f);
        const readout = probeReadout(charges, point, TIME);
        // The same functions on the same doubles: identical, which the app-versus-CLI check needs.
        expect(readout.e).toEqual([f.ex, f.ey, f.ez]);
        expect(readout.b).toEqual([f.bx, f.by, f.bz]);
        expect(readout.s).toEqual([s.x, s.y, s.z]);
        expect(readout.eRadiation).toEqual([f.erx, f.ery, f.erz]);
        expect(readout.charges[0].tRet).toBe(f.tRet);
        expect(readout.charges[0].doppler).toBe(f.doppler);
        expect(readout.charges[0].distance).toBe(f.distance);
        expect(readout.onCharge).toBe(false);
      }
    }
  });

  it('splits E and B into velocity and radiation parts that add up to the total to 1e-12', () => {
    for (const charges of [ELECTRON, PAIR]) {
      for (const point of POINTS) {
        const r = probeReadout(charges, point, TIME);
        // Tolerance: one subtraction and one addition, each rounding to 1e-16 of the larger
        // part; parts never exceed the total by more than 1e3 at these points.
        expect(relative(sum(r.eVelocity, r.eRadiation), r.e)).toBeLessThan(1e-12);
        expect(relative(sum(r.bVelocity, r.bRadiation), r.b)).toBeLessThan(1e-12);
        expect(norm(r.eRadiation)).toBeGreaterThan(0);
      }
    }
  });

  it('shows no radiation part for a charge in uniform motion', () => {
    // Jackson, Classical Electrodynamics 3rd ed., Eq. 14.14: the radiation term is
    // proportional to the acceleration β̇, which is exactly zero here.
    const path = new SampledPath(sampleMotion(uniformMotion(0.9), -1e-9, 1e-9, 5));
    for (const point of POINTS) {
      const r = probeReadout([{ charge: q, path }], point, 0);
      expect(r.eRadiation).toEqual([0, 0, 0]);
      expect(r.bRadiation).toEqual([0, 0, 0]);
      expect(r.eVelocity).toEqual(r.e);
      expect(r.bVelocity).toEqual(r.b);
    }
  });

  it('has B = n × E / c for one charge: B ⟂ E, |B| ≤ |E|/c, and |B_rad| = |E_rad|/c', () => {
    // Jackson, Classical Electrodynamics 3rd ed., Eq. 14.13 (B = n × E, Gaussian; ÷ c in SI),
    // n the unit vector from the retarded position. |B| = |E|/c holds where E ⟂ n, which the
    // radiation part always is (Eq. 14.14: n × (...)); the velocity part lies along n − β.
    for (const point of POINTS) {
      const r = probeReadout(ELECTRON, point, TIME);
      const at = r.charges[0].position;
      const n = [point[0] - at[0], point[1] - at[1], point[2] - at[2]];
      const unit = n.map((x) => x / norm(n));
      const nxE = cross(unit, r.e).map((x) => x / c);
      // Tolerance: a handful of roundings in the cross products, 1e-16 each.
      expect(relative(r.b, nxE)).toBeLessThan(1e-12);
      expect(Math.abs(dot(r.b, r.e)) / (norm(r.b) * norm(r.e))).toBeLessThan(1e-12);
      expect(norm(r.b) * c).toBeLessThanOrEqual(norm(r.e) * (1 + 1e-12));
      expect(Math.abs(norm(r.bRadiation) * c - norm(r.eRadiation))).toBeLessThan(
        1e-12 * norm(r.eRadiation),
      );
      expect(Math.abs(dot(unit, r.eRadiation))).toBeLessThan(1e-12 * norm(r.eRadiation));
    }
  });

  it("agrees with Feynman's formula to 1e-6 relative on an orbit", () => {
    // Feynman Lectures Vol. I Eq. 28.3 / Vol. II Eq. 21.1 and Jackson Eq. 14.14 are the same
    // field written two ways, so they differ by rounding only (about 1e-13 here); 1e-6 is the
    // agreement the probe promises to show.
    for (const point of POINTS) {
      const r = probeReadout(ELECTRON, point, TIME);
      expect(r.relativeDifference.e).toBeLessThan(1e-6);
      expect(r.relativeDifference.b).toBeLessThan(1e-6);
      expect(r.relativeDifference.e).toBe(relative(r.feynmanE, r.e));
      expect(r.relativeDifference.b).toBe(relative(r.feynmanB, r.b));
    }
  });

  it('reports each charge’s Doppler factor as 1 − n·β at its retarded time', () => {
    // Jackson, Classical Electrodynamics 3rd ed., Eq. 14.14: κ = 1 − n·β, all at t_r.
    const state = pathState();
    for (const point of POINTS) {
      const r = probeReadout(PAIR, point, TIME);
      PAIR.forEach(({ path }, k) => {
        const seen = r.charges[k];
        path.stateAt(seen.tRet, state);
        const n = [point[0] - state.px, point[1] - state.py, point[2] - state.pz];
        const R = norm(n);
        const expected = 1 - dot(n, [state.vx, state.vy, state.vz]) / (R * c);
        // Tolerance: κ ≥ 0.3 here, and both sides round a dot product of unit size.
        expect(Math.abs(seen.doppler - expected)).toBeLessThan(1e-14);
        // The solver may finish with a Taylor step of the state rather than a fresh look-up,
        // so the position agrees to rounding of the 1 cm path size, not to the bit.
        const off = [
          seen.position[0] - state.px,
          seen.position[1] - state.py,
          seen.position[2] - state.pz,
        ];
        expect(norm(off)).toBeLessThan(1e-12 * 0.01);
        expect(Math.abs(seen.distance - R)).toBeLessThan(1e-15 * R);
        // The light cone: c (t − t_r) = |r − r0(t_r)|, to the solver's rounding level.
        expect(Math.abs(c * seen.delay - R)).toBeLessThan(1e-12 * R);
        expect(Math.abs(TIME - seen.delay - seen.tRet)).toBeLessThan(1e-15 * TIME);
      });
    }
  });

  it('superposes two charges: the pair reads the sum of each alone', () => {
    for (const point of POINTS) {
      const both = probeReadout(PAIR, point, TIME);
      const first = probeReadout([PAIR[0]], point, TIME);
      const second = probeReadout([PAIR[1]], point, TIME);
      // Both sums start from zero in the same order, so they agree to the bit for E and B;
      // B_rad is summed the same way per charge.
      expect(both.e).toEqual(sum(first.e, second.e));
      expect(both.b).toEqual(sum(first.b, second.b));
      expect(both.eRadiation).toEqual(sum(first.eRadiation, second.eRadiation));
      expect(both.bRadiation).toEqual(sum(first.bRadiation, second.bRadiation));
      expect(both.charges).toEqual([first.charges[0], second.charges[0]]);
    }
  });

  it('reads all zeros with onCharge set on a charge, never NaN', () => {
    const rest = new SampledPath(sampleMotion(uniformMotion(0), -1e-9, 1e-9, 3));
    const charges: Charge[] = [{ charge: q, path: rest }, ...ELECTRON];
    const cases: [Triple, number][] = [
      [[0, 0, 0], 0], // exactly on the resting charge
      [[1e-4, 0, 0], 1e-3], // inside the near radius
    ];
    for (const [point, nearRadius] of cases) {
      const r = probeReadout(charges, point, TIME, nearRadius);
      expect(r.onCharge).toBe(true);
      expect(r.charges.map((k) => k.onCharge)).toEqual([true, false]);
      for (const v of [r.e, r.b, r.s, r.eVelocity, r.eRadiation, r.bVelocity, r.bRadiation]) {
        expect(v).toEqual([0, 0, 0]);
      }
      expect(r.feynmanE).toEqual([0, 0, 0]);
      expect(r.feynmanB).toEqual([0, 0, 0]);
      expect(r.relativeDifference).toEqual({ e: 0, b: 0 });
      const numbers = r.charges.flatMap((k) => [
        k.tRet,
        k.delay,
        k.doppler,
        k.distance,
        ...k.position,
      ]);
      expect(numbers.every(Number.isFinite)).toBe(true);
    }
  });
});
