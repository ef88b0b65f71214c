import { describe, expect, it } from 'vitest';
import type { AnalyticMotion } from '../../src/path/analyticMotion';
import { pathState } from '../../src/path/pathState';
import {
  brakingToRest,
  circularOrbit,
  constantProperAcceleration,
  lineOscillation,
  transverseKick,
  undulatorWiggle,
  uniformMotion,
} from '../../src/path/presets';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';

const c = SPEED_OF_LIGHT;

// [name, motion, difference step (about 1e-4 of the motion's time scale), window start, end]
const cases: [string, AnalyticMotion, number, number, number][] = [
  ['uniform motion', uniformMotion(0.9), 1e-9, -1e-8, 1e-8],
  ['line oscillation', lineOscillation(0.01, 1e8), 1e-12, -2e-8, 2e-8],
  ['circular orbit', circularOrbit(0.05, 0.95), 1e-13, -1e-9, 1e-9],
  ['constant proper acceleration', constantProperAcceleration(1e17), 1e-13, -3e-9, 3e-9],
  // Braking's jerk jumps where braking starts and ends, so its differences need a finer step.
  ['braking to rest', brakingToRest(0.8, 2e-10), 1e-15, -1e-10, 4e-10],
  ['undulator wiggle', undulatorWiggle(20, 1.5, 0.02), 1e-15, 0, 2e-10],
  ['transverse kick', transverseKick(0.99, 0.05, 1e-10), 1e-14, -5e-11, 2e-10],
];

describe('the motion presets', () => {
  for (const [name, motion, h, from, to] of cases) {
    it(`${name}: velocity and acceleration are the derivatives of position and the speed stays below c`, () => {
      const s = pathState();
      const a = pathState();
      const b = pathState();
      // Errors are measured against the largest speed and acceleration in the window.
      let vScale = 0;
      let aScale = 0;
      for (let k = 0; k <= 40; k++) {
        motion(from + ((to - from) * k) / 40, s);
        vScale = Math.max(vScale, Math.hypot(s.vx, s.vy, s.vz));
        aScale = Math.max(aScale, Math.hypot(s.ax, s.ay, s.az), vScale / (to - from));
      }
      for (let k = 0; k <= 40; k++) {
        const t = from + ((to - from) * k) / 40;
        motion(t, s);
        motion(t + h, b);
        motion(t - h, a);
        const speed = Math.hypot(s.vx, s.vy, s.vz);
        expect(speed).toBeLessThan(c);
        // Central differences with step h: error ~ (h/T)² plus rounding ~ 1e-17 m / h.
        expect(Math.abs((b.px - a.px) / (2 * h) - s.vx) / vScale).toBeLessThan(1e-5);
        expect(Math.abs((b.py - a.py) / (2 * h) - s.vy) / vScale).toBeLessThan(1e-5);
        expect(Math.abs((b.pz - a.pz) / (2 * h) - s.vz) / vScale).toBeLessThan(1e-5);
        expect(Math.abs((b.vx - a.vx) / (2 * h) - s.ax) / aScale).toBeLessThan(1e-4);
        expect(Math.abs((b.vy - a.vy) / (2 * h) - s.ay) / aScale).toBeLessThan(1e-4);
      }
    });
  }

  it('the transverse kick turns the direction by the angle asked for, at constant speed', () => {
    const s = pathState();
    transverseKick(0.5, 0.1, 1e-10)(2e-10, s);
    expect(Math.atan2(s.vy, s.vx)).toBeCloseTo(0.1, 12);
    expect(Math.hypot(s.vx, s.vy) / c).toBeCloseTo(0.5, 12);
  });
});
