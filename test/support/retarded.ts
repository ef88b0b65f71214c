import { pathState } from '../../src/path/pathState';
import type { SampledPath } from '../../src/path/sampledPath';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';

const c = SPEED_OF_LIGHT;
const probe = pathState();

/**
 * An independent retarded-time solve: plain bisection on g(τ) = cτ - |r - r0(t - τ)|, which
 * increases strictly for a sub-luminal path (g' = c - n·v > 0), so its root τ = t - t_r is
 * unique. The bracket [0, hi] starts at hi = D/c and doubles until g(hi) >= 0; bisection then
 * runs until the midpoint no longer differs from an end (full double precision).
 * Returns the delay τ.
 */
export function bisectDelay(path: SampledPath, r: readonly number[], t: number): number {
  const g = (tau: number) => {
    path.stateAt(t - tau, probe);
    return c * tau - Math.hypot(r[0] - probe.px, r[1] - probe.py, r[2] - probe.pz);
  };
  path.stateAt(t, probe);
  const d = Math.hypot(r[0] - probe.px, r[1] - probe.py, r[2] - probe.pz);
  if (d === 0) return 0;
  let lo = 0;
  let hi = d / c;
  while (g(hi) < 0) {
    lo = hi;
    hi *= 2;
  }
  for (let k = 0; k < 2000; k++) {
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi) break;
    if (g(mid) < 0) lo = mid;
    else hi = mid;
  }
  // Return whichever end has the smaller |g|.
  return Math.abs(g(lo)) <= Math.abs(g(hi)) ? lo : hi;
}

/**
 * An independent retarded-time solve arranged for finite differences far from the path: the
 * observer time is t = base + offset with base = fl(|r|/c) and `offset` small, so the large
 * light-travel part cancels analytically. With Δ(t_r) = |r| - |r - r0(t_r)| written as
 * (2 r·r0 - |r0|²)/(|r| + |r - r0|), the condition c (t - t_r) = |r - r0(t_r)| becomes
 *   h(t_r) = (c·base - |r|) + c (offset - t_r) + Δ(t_r) = 0,
 * whose first term is the same for every offset, so rounding that varies from one offset to
 * the next stays at the level of the small terms. h decreases strictly in t_r (h' = n·v - c).
 * Plain bisection to full precision; returns t_r.
 */
export function bisectRetardedTime(
  path: SampledPath,
  r: readonly number[],
  base: number,
  offset: number,
): number {
  const rNorm = Math.hypot(r[0], r[1], r[2]);
  const constant = c * base - rNorm;
  const h = (tr: number) => {
    path.stateAt(tr, probe);
    const dx = r[0] - probe.px;
    const dy = r[1] - probe.py;
    const dz = r[2] - probe.pz;
    const dist = Math.hypot(dx, dy, dz);
    const p2 = probe.px * probe.px + probe.py * probe.py + probe.pz * probe.pz;
    const rp = r[0] * probe.px + r[1] * probe.py + r[2] * probe.pz;
    const delta = (2 * rp - p2) / (rNorm + dist);
    return constant + c * (offset - tr) + delta;
  };
  let width = 1e-12;
  while (!(h(offset - width) > 0 && h(offset + width) < 0)) width *= 2;
  let lo = offset - width;
  let hi = offset + width;
  for (let k = 0; k < 2000; k++) {
    const mid = 0.5 * (lo + hi);
    if (mid <= lo || mid >= hi) break;
    if (h(mid) > 0) lo = mid;
    else hi = mid;
  }
  return Math.abs(h(lo)) <= Math.abs(h(hi)) ? lo : hi;
}
