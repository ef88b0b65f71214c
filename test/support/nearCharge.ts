import { sampleMotion } from '../../src/path/analyticMotion';
import {
  circularOrbit,
  constantProperAcceleration,
  lineOscillation,
  uniformMotion,
} from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';

const c = SPEED_OF_LIGHT;

/** Motions used near the charge, each with its charge at the origin at t = 0 unless said. */
export const NEAR_MOTIONS: { name: string; path: SampledPath }[] = [
  {
    // Knot at t = 0 (x = 0), so the charge sits exactly at the origin then.
    name: 'uniform motion at β = 0.9',
    path: new SampledPath(sampleMotion(uniformMotion(0.9), -1e-9, 1e-9, 5)),
  },
  {
    // Retarded times near t = 0 fall before the first sample: exact straight-line history.
    name: 'uniform motion at β = 1 - 5e-9 on its history line',
    path: new SampledPath(sampleMotion(uniformMotion(1 - 5e-9), 0, 1e-9, 3)),
  },
  {
    // A = 1 mm at 40 GHz: peak β = 0.84, passing the origin at full speed at t = 0.
    name: 'a line oscillation',
    path: new SampledPath(sampleMotion(lineOscillation(1e-3, 4e10), -50e-12, 50e-12, 401)),
  },
  {
    // c²/α = 1 m; at rest at the origin at t = 0, accelerating at c²/(1 m).
    name: 'hyperbolic motion',
    path: new SampledPath(sampleMotion(constantProperAcceleration(c * c), -5e-9, 5e-9, 1001)),
  },
  {
    // ρ = 1 m at β = 0.99: the charge is 1 m from the origin, so offsets below ~1e-16 m
    // round away and the point lands exactly on the charge.
    name: 'a circular orbit at β = 0.99 (charge 1 m from the origin)',
    path: new SampledPath(sampleMotion(circularOrbit(1, 0.99), -30e-9, 30e-9, 2001)),
  },
];

/** Offsets from the charge, m: exactly on it, the brief's 1e-30 … 1e-6, and down to the smallest double. */
export const OFFSETS = [
  0, 5e-324, 1e-310, 1e-300, 1e-200, 1e-160, 1e-155, 1e-100, 1e-80, 1e-50, 1e-30, 1e-27, 1e-24,
  1e-21, 1e-18, 1e-15, 1e-12, 1e-9, 1e-6,
];
