import { SPEED_OF_LIGHT } from '../physics/constants';
import type { AnalyticMotion } from './analyticMotion';

const c = SPEED_OF_LIGHT;

/** Uniform motion along +x at speed βc, passing the origin at t = 0. */
export function uniformMotion(beta: number): AnalyticMotion {
  return (t, o) => {
    o.px = beta * c * t;
    o.py = 0;
    o.pz = 0;
    o.vx = beta * c;
    o.vy = 0;
    o.vz = 0;
    o.ax = 0;
    o.ay = 0;
    o.az = 0;
  };
}

/** Harmonic oscillation along z: z = A sin(ωt), ω = 2π f. */
export function lineOscillation(amplitude: number, frequency: number): AnalyticMotion {
  const w = 2 * Math.PI * frequency;
  return (t, o) => {
    const s = Math.sin(w * t);
    const co = Math.cos(w * t);
    o.px = 0;
    o.py = 0;
    o.pz = amplitude * s;
    o.vx = 0;
    o.vy = 0;
    o.vz = amplitude * w * co;
    o.ax = 0;
    o.ay = 0;
    o.az = -amplitude * w * w * s;
  };
}

/** Circular orbit of radius ρ in the xy plane at speed βc, counter-clockwise, at (ρ,0,0) at t = 0. */
export function circularOrbit(radius: number, beta: number): AnalyticMotion {
  const w = (beta * c) / radius;
  return (t, o) => {
    const s = Math.sin(w * t);
    const co = Math.cos(w * t);
    o.px = radius * co;
    o.py = radius * s;
    o.pz = 0;
    o.vx = -radius * w * s;
    o.vy = radius * w * co;
    o.vz = 0;
    o.ax = -radius * w * w * co;
    o.ay = -radius * w * w * s;
    o.az = 0;
  };
}

/**
 * Hyperbolic motion along x with constant proper acceleration α (m/s²), at rest at the
 * origin at t = 0: x = (c²/α)(√(1 + (αt/c)²) - 1).
 */
export function constantProperAcceleration(alpha: number): AnalyticMotion {
  const L = (c * c) / alpha;
  return (t, o) => {
    const u = (alpha * t) / c;
    const root = Math.sqrt(1 + u * u);
    o.px = L * (root - 1);
    o.py = 0;
    o.pz = 0;
    o.vx = (c * u) / root;
    o.vy = 0;
    o.vz = 0;
    o.ax = alpha / (root * root * root);
    o.ay = 0;
    o.az = 0;
  };
}
