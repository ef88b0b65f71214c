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

/**
 * Solves c (t - t_r) = |r - r0(t_r)| for the delay τ = t - t_r by Newton's method kept
 * inside a bracket [lo, hi] with g(lo) <= 0 <= g(hi), g(τ) = cτ - |r - r0(t - τ)|.
 * g is strictly increasing for a sub-luminal path (g' = c - n·v > 0), so the root is unique
 * and bisection is always a safe fallback. `guessDelay` (NaN for none) warm-starts the
 * solve; `state` receives the path state at t_r.
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
  let piece = path.stateAt(t, state, hint);
  const distanceNow = Math.hypot(rx - state.px, ry - state.py, rz - state.pz);
  let iterations = 0;
  if (distanceNow === 0) return finish(out, 0, t, piece, 0, 0);
  // With every speed at most vmax, the root lies in [D/(c + vmax), D/(c - vmax)].
  // The speed check samples each piece at a few points, so widen vmax a little toward c.
  const vmax = path.maxSpeed + 1e-3 * (c - path.maxSpeed);
  let lo = distanceNow / (c + vmax);
  let hi = distanceNow / (c - vmax);
  let tau = guessDelay >= lo && guessDelay <= hi ? guessDelay : distanceNow / c;
  let residual = 0;
  for (; iterations < MAX_ITERATIONS; iterations++) {
    piece = path.stateAt(t - tau, state, piece);
    const dx = rx - state.px;
    const dy = ry - state.py;
    const dz = rz - state.pz;
    const dist = Math.hypot(dx, dy, dz);
    residual = c * tau - dist;
    if (residual === 0) break;
    if (residual < 0) lo = tau;
    else hi = tau;
    const slope = dist > 0 ? c - (dx * state.vx + dy * state.vy + dz * state.vz) / dist : c;
    let next = tau - residual / slope;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    const step = Math.abs(next - tau);
    tau = next;
    // Stop once the step is at the rounding level of τ or the bracket has closed.
    if (step <= 2 * Number.EPSILON * tau || hi - lo <= 2 * Number.EPSILON * hi) {
      piece = path.stateAt(t - tau, state, piece);
      residual = c * tau - Math.hypot(rx - state.px, ry - state.py, rz - state.pz);
      iterations++;
      break;
    }
  }
  return finish(out, tau, t - tau, piece, iterations, residual);
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
