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

/**
 * Braking to rest along x: from speed β0c the speed falls as ½(1 + cos(πt/T)) over the
 * stopping time T, so the deceleration starts and ends smoothly; at rest afterwards.
 */
export function brakingToRest(beta0: number, stopTime: number): AnalyticMotion {
  const v0 = beta0 * c;
  const w = Math.PI / stopTime;
  return (t, o) => {
    const s = Math.min(Math.max(t, 0), stopTime);
    const before = Math.min(t, 0);
    o.px = v0 * before + 0.5 * v0 * (s + Math.sin(w * s) / w);
    o.vx = t < 0 ? v0 : t > stopTime ? 0 : 0.5 * v0 * (1 + Math.cos(w * s));
    o.ax = t < 0 || t > stopTime ? 0 : -0.5 * v0 * w * Math.sin(w * s);
    o.py = 0;
    o.pz = 0;
    o.vy = 0;
    o.vz = 0;
    o.ay = 0;
    o.az = 0;
  };
}

/**
 * A planar undulator-like wiggle along x with strength parameter K and period λu, at
 * Lorentz factor γ: vy = (K c/γ) sin(ωu t), and vx keeps the speed constant to O(K⁴/γ⁴)
 * with mean drift β̄ = √(β² - K²/(2γ²)) (the usual small-angle undulator motion).
 */
export function undulatorWiggle(gamma: number, strength: number, period: number): AnalyticMotion {
  const beta = Math.sqrt(1 - 1 / (gamma * gamma));
  const drift = Math.sqrt(beta * beta - (strength * strength) / (2 * gamma * gamma));
  const w = (2 * Math.PI * drift * c) / period;
  const ky = (strength * c) / gamma;
  const kx = (strength * strength * c) / (4 * gamma * gamma);
  return (t, o) => {
    const phase = w * t;
    o.px = drift * c * t + (kx / (2 * w)) * Math.sin(2 * phase);
    o.py = -(ky / w) * Math.cos(phase);
    o.pz = 0;
    o.vx = drift * c + kx * Math.cos(2 * phase);
    o.vy = ky * Math.sin(phase);
    o.vz = 0;
    o.ax = -2 * w * kx * Math.sin(2 * phase);
    o.ay = w * ky * Math.cos(phase);
    o.az = 0;
  };
}

// 16-point Gauss–Legendre nodes and weights on [-1, 1] (Abramowitz & Stegun, Table 25.4).
const GL_X = [
  0.0950125098376374, 0.2816035507792589, 0.4580167776572274, 0.6178762444026438, 0.755404408355003,
  0.8656312023878318, 0.9445750230732326, 0.9894009349916499,
];
const GL_W = [
  0.1894506104550685, 0.1826034150449236, 0.1691565193950025, 0.1495959888165767,
  0.1246289712555339, 0.0951585116824928, 0.0622535239386479, 0.0271524594117541,
];

/**
 * A short transverse kick: moving along x at βc, the direction turns by `angle` (rad) in the
 * xy plane during `duration`, with angular rate ∝ 1 - cos(2πt/T) so the acceleration starts
 * and ends at zero. The speed stays βc throughout.
 */
export function transverseKick(beta: number, angle: number, duration: number): AnalyticMotion {
  const v = beta * c;
  const heading = (t: number) => {
    const s = Math.min(Math.max(t, 0), duration) / duration;
    return angle * (s - Math.sin(2 * Math.PI * s) / (2 * Math.PI));
  };
  const rate = (t: number) =>
    t < 0 || t > duration ? 0 : (angle / duration) * (1 - Math.cos((2 * Math.PI * t) / duration));
  // Position during the kick: ∫ v (cos θ, sin θ) dt by Gauss–Legendre on [0, t].
  const integrate = (t: number): [number, number] => {
    const half = 0.5 * t;
    let sx = 0;
    let sy = 0;
    for (let k = 0; k < GL_X.length; k++) {
      for (const sign of [-1, 1]) {
        const th = heading(half * (1 + sign * GL_X[k]));
        sx += GL_W[k] * Math.cos(th);
        sy += GL_W[k] * Math.sin(th);
      }
    }
    return [v * half * sx, v * half * sy];
  };
  const [endX, endY] = integrate(duration);
  return (t, o) => {
    const th = heading(t);
    const cos = Math.cos(th);
    const sin = Math.sin(th);
    if (t <= 0) {
      o.px = v * t;
      o.py = 0;
    } else if (t >= duration) {
      o.px = endX + v * cos * (t - duration);
      o.py = endY + v * sin * (t - duration);
    } else {
      [o.px, o.py] = integrate(t);
    }
    o.pz = 0;
    o.vx = v * cos;
    o.vy = v * sin;
    o.vz = 0;
    const w = rate(t);
    o.ax = -v * w * sin;
    o.ay = v * w * cos;
    o.az = 0;
  };
}
