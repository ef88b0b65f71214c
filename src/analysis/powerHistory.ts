import type { Triple } from '../engine/sliceSpec';
import { type PathState, pathState } from '../path/pathState';
import type { SampledPath } from '../path/sampledPath';
import type { Charge } from '../physics/charge';
import { SPEED_OF_LIGHT, VACUUM_PERMEABILITY } from '../physics/constants';
import { clearFields, fieldSample } from '../physics/fieldSample';
import { addLienardWiechert } from '../physics/lienardWiechert';
import { retardedSolution, solveRetardedTime } from '../physics/retardedTime';
import { lienardPower } from './radiatedPower';

/** Liénard power of one charge against source time, and the energy it radiates. */
export interface PowerHistory {
  /** Source (retarded) times, s, evenly spaced over the span, both ends included. */
  tSource: Float64Array;
  /** Liénard power per unit source time at each of those times, W. */
  power: Float64Array;
  /** Energy radiated over the span, J: ∫ P dt′ by the trapezoid rule. */
  energy: number;
}

const historyState = pathState();

/**
 * Liénard power (Jackson, Classical Electrodynamics 3rd ed., Eq. 14.24) at `samples` evenly
 * spaced source times over `span` (default: the path's sampled span), and the energy
 * radiated over it; a span ending on the last sample takes the state there from inside the
 * samples. The energy uses the trapezoid rule, which is accurate enough because
 * P(t′) has a kink at every path knot (the quintic pieces share position, velocity and
 * acceleration but not jerk), so no fixed higher-order rule would converge faster than h²;
 * its error, span·h²·|P″|/12, falls below 1e-4 of the energy once the grid has ten or more
 * points per time scale of the motion, and for periodic motion over whole periods the rule
 * is spectrally accurate (exact for a steady circular orbit, where P is constant).
 */
export function lienardPowerHistory(
  charge: Charge,
  samples: number,
  span?: [number, number],
): PowerHistory {
  if (!Number.isInteger(samples) || samples < 2) {
    throw new RangeError(`a power history needs a whole number of samples from 2, not ${samples}`);
  }
  const { path } = charge;
  const [t0, t1] = span ?? path.timeSpan;
  const tSource = new Float64Array(samples);
  const power = new Float64Array(samples);
  const step = (t1 - t0) / (samples - 1);
  let piece = -1;
  let inner = 0;
  for (let k = 0; k < samples; k++) {
    // The last time is set to t1 itself so that rounding of k·step cannot leave the span.
    const t = k === samples - 1 ? t1 : t0 + k * step;
    piece = path.stateAt(t, historyState, piece);
    if (t === path.t[path.count - 1]) knotState(path, path.count - 1, historyState);
    tSource[k] = t;
    power[k] = lienardPower(charge.charge, historyState);
    if (k > 0 && k < samples - 1) inner += power[k];
  }
  const energy = step * (inner + 0.5 * (power[0] + power[samples - 1]));
  return { tSource, power, energy };
}

/**
 * The stored state at knot i. At the last knot this is the limit from inside the samples:
 * stateAt switches to the straight-line continuation there and would report a = 0, so a
 * history ending on the last sample would end on a spurious zero.
 */
function knotState(path: SampledPath, i: number, out: PathState): void {
  out.px = path.x[i];
  out.py = path.y[i];
  out.pz = path.z[i];
  out.vx = path.vx[i];
  out.vy = path.vy[i];
  out.vz = path.vz[i];
  out.ax = path.ax[i];
  out.ay = path.ay[i];
  out.az = path.az[i];
}

/** Radiated power through a sphere at one observer time, all charges together and alone. */
export interface SphereFlux {
  /** ∮ S·n R² dΩ of the superposed radiation fields, W (per unit observer time). */
  total: number;
  /** The same for each charge alone, W, in the order given. */
  perCharge: number[];
  /** Σ perCharge, W: total differs from it by the interference of the charges' fields. */
  sumOfSingles: number;
}

const fluxState = pathState();
const fluxSolution = retardedSolution();
const single = fieldSample();
const gaussCache = new Map<number, { x: Float64Array; w: Float64Array }>();

/**
 * Power crossing a sphere of radius `radius` (m) about `center` at observer time
 * `observerTime` (s), per unit observer time: ∮ S·n R² dΩ with S = E_rad × B_rad / μ0 built
 * from the radiation (acceleration) parts of the Liénard–Wiechert fields (Jackson,
 * Classical Electrodynamics 3rd ed., Eq. 14.14), superposed as E_rad = Σ E_rad,k and
 * B_rad = Σ n_k × E_rad,k / c with n_k the unit vector from charge k's retarded position.
 * Each charge alone gives perCharge[k]; total ≠ sumOfSingles shows interference: two equal
 * charges at one place give 4× one of them, opposite charges on one path give 0. Every
 * point of the sphere has its own retarded times. Quadrature: Gauss–Legendre in cos θ
 * (θ from +z) × uniform φ, spectrally accurate once the flux's angular structure is
 * resolved: ~1/γ wide on a sphere about the charge's retarded position (one retarded time
 * for all directions), but down to the pulse width ~1/γ³ where the charge sweeps its beam
 * across the sphere (a γ = 3 orbit about its centre needs about 128 × 2048). The defaults,
 * 64 × 128, suit β ≲ 0.5 or a sphere about the charge at γ ≲ 10.
 */
export function sphereFlux(
  charges: readonly Charge[],
  center: Triple,
  radius: number,
  observerTime: number,
  options: { nTheta?: number; nPhi?: number } = {},
): SphereFlux {
  const nTheta = options.nTheta ?? 64;
  const nPhi = options.nPhi ?? 128;
  if (!Number.isInteger(nTheta) || nTheta < 1 || !Number.isInteger(nPhi) || nPhi < 1) {
    throw new RangeError(`sphere resolution must be whole numbers from 1, not ${nTheta} × ${nPhi}`);
  }
  if (!(radius > 0)) throw new RangeError(`sphere radius must be positive, not ${radius}`);
  const c = SPEED_OF_LIGHT;
  const count = charges.length;
  const { x: cosTheta, w: weightTheta } = gaussLegendre(nTheta);
  const cosPhi = new Float64Array(nPhi);
  const sinPhi = new Float64Array(nPhi);
  for (let i = 0; i < nPhi; i++) {
    cosPhi[i] = Math.cos((2 * Math.PI * i) / nPhi);
    sinPhi[i] = Math.sin((2 * Math.PI * i) / nPhi);
  }
  // Warm starts per charge: neighbouring directions have nearly the same delay and piece.
  const delay = new Float64Array(count).fill(Number.NaN);
  const piece = new Int32Array(count).fill(-1);
  const perCharge = new Float64Array(count);
  // Per-charge ring sums, accumulated in the same order as the total's, so that one charge
  // alone gives perCharge[0] === total to the bit.
  const ringPer = new Float64Array(count);
  let total = 0;
  const [cx, cy, cz] = center;
  // R² dΩ = R² dcos θ dφ, and S·n̂ carries the 1/μ0.
  const scale = (radius * radius * 2 * Math.PI) / (nPhi * VACUUM_PERMEABILITY);
  for (let j = 0; j < nTheta; j++) {
    const z = cosTheta[j];
    const sinTheta = Math.sqrt(Math.max(0, 1 - z * z));
    let ring = 0;
    ringPer.fill(0);
    for (let i = 0; i < nPhi; i++) {
      const ox = sinTheta * cosPhi[i];
      const oy = sinTheta * sinPhi[i];
      const rx = cx + radius * ox;
      const ry = cy + radius * oy;
      const rz = cz + radius * z;
      let ex = 0;
      let ey = 0;
      let ez = 0;
      let bx = 0;
      let by = 0;
      let bz = 0;
      for (let k = 0; k < count; k++) {
        const { charge, path } = charges[k];
        solveRetardedTime(
          path,
          rx,
          ry,
          rz,
          observerTime,
          fluxState,
          fluxSolution,
          delay[k],
          piece[k],
        );
        delay[k] = fluxSolution.delay;
        piece[k] = fluxSolution.piece;
        clearFields(single);
        // A sphere through a charge's retarded position gets nothing from it there.
        if (!addLienardWiechert(charge, rx, ry, rz, fluxState, single)) continue;
        const dx = rx - fluxState.px;
        const dy = ry - fluxState.py;
        const dz = rz - fluxState.pz;
        const inv = 1 / Math.sqrt(dx * dx + dy * dy + dz * dz);
        const nx = dx * inv;
        const ny = dy * inv;
        const nz = dz * inv;
        const erx = single.erx;
        const ery = single.ery;
        const erz = single.erz;
        const brx = (ny * erz - nz * ery) / c;
        const bry = (nz * erx - nx * erz) / c;
        const brz = (nx * ery - ny * erx) / c;
        ringPer[k] += outwardFlux(erx, ery, erz, brx, bry, brz, ox, oy, z);
        ex += erx;
        ey += ery;
        ez += erz;
        bx += brx;
        by += bry;
        bz += brz;
      }
      ring += outwardFlux(ex, ey, ez, bx, by, bz, ox, oy, z);
    }
    total += weightTheta[j] * ring;
    for (let k = 0; k < count; k++) perCharge[k] += weightTheta[j] * ringPer[k];
  }
  const singles: number[] = new Array(count);
  let sumOfSingles = 0;
  for (let k = 0; k < count; k++) {
    singles[k] = scale * perCharge[k];
    sumOfSingles += singles[k];
  }
  return { total: scale * total, perCharge: singles, sumOfSingles };
}

/** (E × B)·o for the outward unit normal o; the caller supplies 1/μ0. */
function outwardFlux(
  ex: number,
  ey: number,
  ez: number,
  bx: number,
  by: number,
  bz: number,
  ox: number,
  oy: number,
  oz: number,
): number {
  return (ey * bz - ez * by) * ox + (ez * bx - ex * bz) * oy + (ex * by - ey * bx) * oz;
}

/**
 * Gauss–Legendre nodes and weights on [-1, 1], cached by order: Newton's method on P_n from
 * the guess cos(π(i + 3/4)/(n + 1/2)), P_n and P_n′ by the three-term recurrence, and
 * w_i = 2/((1 - x²) P_n′(x)²) (Abramowitz & Stegun, Handbook of Mathematical Functions,
 * 25.4.29). Exact for polynomials of degree up to 2n - 1.
 */
function gaussLegendre(n: number): { x: Float64Array; w: Float64Array } {
  const cached = gaussCache.get(n);
  if (cached !== undefined) return cached;
  const x = new Float64Array(n);
  const w = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let z = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 1;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = z;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * z * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      // For n = 1 the loop does not run: P_1 = z and P_0 = 1 are already in p1, p0.
      dp = (n * (z * p1 - p0)) / (z * z - 1);
      const dz = p1 / dp;
      z -= dz;
      if (Math.abs(dz) < 1e-15) break;
    }
    x[i] = -z;
    w[i] = 2 / ((1 - z * z) * dp * dp);
  }
  const rule = { x, w };
  // Few distinct orders are ever asked for; keep the table small all the same.
  if (gaussCache.size > 16) gaussCache.clear();
  gaussCache.set(n, rule);
  return rule;
}
