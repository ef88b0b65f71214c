import type { PathState } from '../path/pathState';
import type { SampledPath } from '../path/sampledPath';
import { SPEED_OF_LIGHT } from './constants';

/** Result of a retarded-time solve; reused between calls. */
export interface RetardedSolution {
  /** Light travel time t - t_r, s (never negative). */
  delay: number;
  /** Retarded time t_r, s. */
  tRet: number;
  /** Piece of the path holding t_r: a hint for the next solve nearby. */
  piece: number;
  /** Newton or bisection steps taken. */
  iterations: number;
  /** c (t - t_r) - |r - r0(t_r)|, m: zero at the exact root. */
  residual: number;
}

export function retardedSolution(): RetardedSolution {
  return { delay: 0, tRet: 0, piece: -1, iterations: 0, residual: 0 };
}

const MAX_ITERATIONS = 200;
const TAYLOR_FRACTION = 1e-6;

/**
 * Duration of the path piece holding the state: the Taylor shortcut is kept to a tiny
 * fraction of it, where the neglected snap term is bounded by the piece's own polynomial.
 * Unbounded outside the samples, where the motion is straight.
 */
function pieceDuration(path: SampledPath, piece: number): number {
  if (piece < 0 || piece >= path.count - 1) return Number.POSITIVE_INFINITY;
  return path.t[piece + 1] - path.t[piece];
}

/**
 * Solves c (t - t_r) = |r - r0(t_r)| for the delay τ = t - t_r by Halley's method kept
 * inside a bracket [lo, hi] with g(lo) <= 0 <= g(hi), g(τ) = cτ - |r - r0(t - τ)|.
 * g is strictly increasing for a sub-luminal path (g' = c - n·v > 0), so the root is unique
 * and bisection is always a safe fallback. `guessDelay` (NaN for none) warm-starts the
 * solve and `hint` the path look-up; `state` receives the path state at t_r.
 */
export function solveRetardedTime(
  path: SampledPath,
  rx: number,
  ry: number,
  rz: number,
  t: number,
  state: PathState,
  out: RetardedSolution,
  guessDelay = Number.NaN,
  hint = -1,
): RetardedSolution {
  const c = SPEED_OF_LIGHT;
  // The speed check samples each piece at a few points, so widen vmax a little toward c.
  const slowest = c - (path.maxSpeed + 1e-3 * (c - path.maxSpeed));
  let piece = hint;
  let lo = 0;
  let hi = Number.POSITIVE_INFINITY;
  let tau = guessDelay;
  if (!(tau >= 0 && tau < Number.POSITIVE_INFINITY)) {
    // Cold start: with every speed below c - slowest the root lies in [D/(2c), D/slowest].
    piece = path.stateAt(t, state, piece);
    const dx = rx - state.px;
    const dy = ry - state.py;
    const dz = rz - state.pz;
    const distanceNow = Math.sqrt(dx * dx + dy * dy + dz * dz);
    if (distanceNow === 0) return finish(out, 0, t, piece, 1, 0);
    lo = distanceNow / (2 * c);
    hi = distanceNow / slowest;
    tau = distanceNow / c;
  }
  let iterations = 0;
  let residual = 0;
  while (iterations < MAX_ITERATIONS) {
    iterations++;
    piece = path.stateAt(t - tau, state, piece);
    const dx = rx - state.px;
    const dy = ry - state.py;
    const dz = rz - state.pz;
    const dist = Math.sqrt(dx * dx + dy * dy + dz * dz);
    residual = c * tau - dist;
    if (residual === 0) break;
    // g' = c - n·v lies in [slowest, 2c], which bounds the root from this one evaluation.
    if (residual < 0) {
      lo = tau;
      const bound = tau - residual / slowest;
      if (bound < hi) hi = bound;
    } else {
      hi = tau;
      const bound = tau - residual / slowest;
      if (bound > lo) lo = bound;
    }
    // Halley's step (cubic convergence) from g' = c - n·v and g'' = n·a - (v² - (n·v)²)/R.
    let step = residual / c;
    if (dist > 0) {
      const nv = (dx * state.vx + dy * state.vy + dz * state.vz) / dist;
      const na = (dx * state.ax + dy * state.ay + dz * state.az) / dist;
      const v2 = state.vx * state.vx + state.vy * state.vy + state.vz * state.vz;
      const slope = c - nv;
      const curvature = na - (v2 - nv * nv) / dist;
      step = residual / slope;
      const correction = 1 - (step * curvature) / (2 * slope);
      if (correction > 0.5 && correction < 2) step /= correction;
    }
    // Converged: the step is at the rounding level of τ, so this state is the answer.
    if (Math.abs(step) <= 2 * Number.EPSILON * tau) break;
    // Nearly converged: the step is tiny against the piece, so a third-order Taylor update of
    // the state is exact to rounding (the neglected snap term is (step/h)² ≤ 1e-12 of the
    // acceleration change across the piece) and saves one more path evaluation.
    if (Math.abs(step) <= TAYLOR_FRACTION * Math.min(tau, pieceDuration(path, piece))) {
      tau -= step;
      const dt = step;
      const half = 0.5 * dt;
      state.px += dt * (state.vx + half * (state.ax + (dt / 3) * state.jx));
      state.py += dt * (state.vy + half * (state.ay + (dt / 3) * state.jy));
      state.pz += dt * (state.vz + half * (state.az + (dt / 3) * state.jz));
      state.vx += dt * (state.ax + half * state.jx);
      state.vy += dt * (state.ay + half * state.jy);
      state.vz += dt * (state.az + half * state.jz);
      state.ax += dt * state.jx;
      state.ay += dt * state.jy;
      state.az += dt * state.jz;
      residual = c * tau - distance(rx - state.px, ry - state.py, rz - state.pz);
      break;
    }
    let next = tau - step;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (next === tau || hi - lo <= 2 * Number.EPSILON * hi) {
      tau = next;
      piece = path.stateAt(t - tau, state, piece);
      residual = c * tau - distance(rx - state.px, ry - state.py, rz - state.pz);
      break;
    }
    tau = next;
  }
  return finish(out, tau, t - tau, piece, iterations, residual);
}

function distance(dx: number, dy: number, dz: number): number {
  return Math.sqrt(dx * dx + dy * dy + dz * dz);
}

function finish(
  out: RetardedSolution,
  delay: number,
  tRet: number,
  piece: number,
  iterations: number,
  residual: number,
): RetardedSolution {
  out.delay = delay;
  out.tRet = tRet;
  out.piece = piece;
  out.iterations = iterations;
  out.residual = residual;
  return out;
}
