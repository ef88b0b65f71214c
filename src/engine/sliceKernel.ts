import { pathState } from '../path/pathState';
import type { Charge } from '../physics/charge';
import { VACUUM_PERMEABILITY } from '../physics/constants';
import { clearFields, fieldSample } from '../physics/fieldSample';
import { addLienardWiechert } from '../physics/lienardWiechert';
import { retardedSolution, solveRetardedTime } from '../physics/retardedTime';
import { MASK_CLEAR, MASK_ON_CHARGE } from './slicePlanes';
import type { SliceSpec } from './sliceSpec';

/** Where a run of rows writes: planes of `points` values each, starting at row `row0`. */
export interface RowTarget {
  planes: Float32Array;
  mask: Uint8Array;
  /** Points per plane in the target buffer. */
  points: number;
  /** Slice row stored at the target's first row. */
  row0: number;
}

export interface KernelStats {
  points: number;
  iterations: number;
  maxIterations: number;
}

/**
 * Largest |E| (V/m) and |S| (W/m²) a slice stores: float32 ends at 3.4e38, and S = E × B/μ0
 * is formed later from the stored, rounded E and B, so keep a margin (|S| <= |E||B|/μ0).
 */
const FLOAT32_SAFE = 1e38;
const SAFE_E2 = FLOAT32_SAFE * FLOAT32_SAFE;
const SAFE_EB2 = (FLOAT32_SAFE * VACUUM_PERMEABILITY) ** 2;

const state = pathState();
const solution = retardedSolution();
const sample = fieldSample();

/**
 * Fields on slice rows [j0, j1) into `target`. Each retarded-time solve starts from the
 * previous frame's delay at the same point when `warm` holds one (one plane of delays per
 * charge, laid out like the target), else from the left neighbour, else the point below;
 * the solver itself is bracketed, so a poor guess costs steps, never correctness.
 * `warm` is updated in place with the new delays.
 */
export function computeSliceRows(
  spec: SliceSpec,
  charges: readonly Charge[],
  j0: number,
  j1: number,
  target: RowTarget,
  nearRadius: number,
  warm: Float64Array | null,
  stats: KernelStats,
): void {
  const { nx, ny, width, height, time } = spec;
  const [cx, cy, cz] = spec.center;
  const [ux, uy, uz] = spec.u;
  const [vx, vy, vz] = spec.v;
  const { planes, mask, points, row0 } = target;
  const oEx = 0;
  const oEy = points;
  const oEz = 2 * points;
  const oBx = 3 * points;
  const oBy = 4 * points;
  const oBz = 5 * points;
  const oRx = 6 * points;
  const oRy = 7 * points;
  const oRz = 8 * points;
  const oDelay = 9 * points;
  const chargeCount = charges.length;
  // Per-charge warm start along the row: the left neighbour's delay and path piece.
  const guesses = new Float64Array(chargeCount);
  const previousGuesses = new Float64Array(chargeCount);
  const firstOfRow = new Float64Array(chargeCount);
  const hints = new Int32Array(chargeCount).fill(-1);
  const near2 = nearRadius * nearRadius;
  // Each charge's position at the slice time, where a grid point would be exactly on it.
  const present = new Float64Array(3 * chargeCount);
  for (let k = 0; k < chargeCount; k++) {
    charges[k].path.stateAt(time, state);
    present[3 * k] = state.px;
    present[3 * k + 1] = state.py;
    present[3 * k + 2] = state.pz;
  }
  let iterations = 0;
  let maxIterations = 0;
  for (let j = j0; j < j1; j++) {
    const b = ((j + 0.5) / ny - 0.5) * height;
    // A row starts from the point below it when that was computed, else cold.
    for (let k = 0; k < chargeCount; k++) guesses[k] = j > j0 ? firstOfRow[k] : Number.NaN;
    for (let i = 0; i < nx; i++) {
      const a = ((i + 0.5) / nx - 0.5) * width;
      const rx = cx + a * ux + b * vx;
      const ry = cy + a * uy + b * vy;
      const rz = cz + a * uz + b * vz;
      const p = (j - row0) * nx + i;
      clearFields(sample);
      let onCharge = false;
      for (let k = 0; k < chargeCount; k++) {
        const { charge, path } = charges[k];
        // Linear extrapolation from the two left neighbours; at a row's start, where there is
        // none, the previous frame's delay here (measured better than the point below).
        let guess = i >= 2 ? 2 * guesses[k] - previousGuesses[k] : guesses[k];
        if (i < 2 && warm !== null) {
          const previous = warm[k * points + p];
          if (!Number.isNaN(previous)) guess = previous;
        }
        // Exactly at the charge's present position the delay is 0, a root that a warm start
        // approaches only by halving (or misses, by the rounding of the path's position).
        const exactlyOn =
          rx === present[3 * k] && ry === present[3 * k + 1] && rz === present[3 * k + 2];
        let delay = 0;
        if (!exactlyOn) {
          solveRetardedTime(path, rx, ry, rz, time, state, solution, guess, hints[k]);
          hints[k] = solution.piece;
          delay = solution.delay;
          iterations += solution.iterations;
          if (solution.iterations > maxIterations) maxIterations = solution.iterations;
        }
        previousGuesses[k] = guesses[k];
        guesses[k] = delay;
        if (warm !== null) warm[k * points + p] = delay;
        if (k === 0) planes[oDelay + p] = delay;
        if (i === 0) firstOfRow[k] = delay;
        if (onCharge) continue;
        if (exactlyOn) {
          onCharge = true;
          continue;
        }
        const dx = rx - state.px;
        const dy = ry - state.py;
        const dz = rz - state.pz;
        if (!(dx * dx + dy * dy + dz * dz > near2)) onCharge = true;
        else if (!addLienardWiechert(charge, rx, ry, rz, state, sample)) onCharge = true;
      }
      if (!onCharge) {
        // A point so near a charge that E, E_rad, B or S would overflow float32 is flagged too.
        const e2 = sample.ex * sample.ex + sample.ey * sample.ey + sample.ez * sample.ez;
        const r2 = sample.erx * sample.erx + sample.ery * sample.ery + sample.erz * sample.erz;
        const b2 = sample.bx * sample.bx + sample.by * sample.by + sample.bz * sample.bz;
        onCharge = !(e2 <= SAFE_E2 && r2 <= SAFE_E2 && b2 <= SAFE_E2 && e2 * b2 <= SAFE_EB2);
      }
      if (onCharge) {
        mask[p] = MASK_ON_CHARGE;
        clearFields(sample);
      } else {
        mask[p] = MASK_CLEAR;
      }
      // Superposed in double precision above, rounded to float32 once here.
      planes[oEx + p] = sample.ex;
      planes[oEy + p] = sample.ey;
      planes[oEz + p] = sample.ez;
      planes[oBx + p] = sample.bx;
      planes[oBy + p] = sample.by;
      planes[oBz + p] = sample.bz;
      planes[oRx + p] = sample.erx;
      planes[oRy + p] = sample.ery;
      planes[oRz + p] = sample.erz;
    }
  }
  stats.points += (j1 - j0) * nx;
  stats.iterations += iterations;
  if (maxIterations > stats.maxIterations) stats.maxIterations = maxIterations;
}
