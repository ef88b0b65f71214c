import type { SliceSpec, Triple } from '../../src/engine/sliceSpec';
import { pathState } from '../../src/path/pathState';
import type { SampledPath } from '../../src/path/sampledPath';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';
import { toSlice } from '../view/sliceCoordinates';

/** The sphere light emitted by a charge at one instant has reached at the observation time. */
export interface Shell {
  /** Emission time, s. */
  emitted: number;
  /** c(t − emitted), m. */
  radius: number;
  /** World position of the charge at `emitted`, m. */
  center: Triple;
  /** Circle where the sphere meets the slice plane, in slice coordinates (m); null if it misses. */
  cut: { a: number; b: number; radius: number } | null;
}

/** A round emission interval (1, 2 or 5 × 10^n s) so about `count` shells span the half-diagonal. */
export function shellSpacing(spec: SliceSpec, count = 8): number {
  const halfDiagonal = 0.5 * Math.hypot(spec.width, spec.height);
  const raw = halfDiagonal / (SPEED_OF_LIGHT * Math.max(1, count));
  if (!(raw > 0) || !Number.isFinite(raw)) return 1;
  const exponent = Math.floor(Math.log10(raw));
  const fraction = raw / 10 ** exponent;
  // Nearest of 1, 2, 5, 10 in log terms: the cuts are the geometric means.
  const mantissa =
    fraction < Math.SQRT2 ? 1 : fraction < Math.sqrt(10) ? 2 : fraction < Math.sqrt(50) ? 5 : 10;
  return exponent >= 0 ? mantissa * 10 ** exponent : mantissa / 10 ** -exponent;
}

/**
 * Shells emitted on the absolute grid k·spacing (k integer) strictly before `time`, the
 * latest `count` of them, newest first: as time advances they grow and new ones appear.
 */
export function lightConeShells(
  path: SampledPath,
  spec: SliceSpec,
  time: number,
  spacing: number,
  count: number,
): Shell[] {
  if (!(spacing > 0) || !Number.isFinite(time) || !(count >= 1)) return [];
  // Latest k with k·spacing < time; within 1e-9 spacing counts as at time (10 × 2e-11 < 2e-10).
  const newest = Math.ceil(time / spacing - 1e-9) - 1;
  const normal = cross(spec.u, spec.v);
  const state = pathState();
  const shells: Shell[] = [];
  let hint = -1;
  for (let n = 0; n < Math.floor(count); n++) {
    const emitted = (newest - n) * spacing;
    hint = path.stateAt(emitted, state, hint);
    const radius = SPEED_OF_LIGHT * (time - emitted);
    const center: Triple = [state.px, state.py, state.pz];
    const distance =
      (center[0] - spec.center[0]) * normal[0] +
      (center[1] - spec.center[1]) * normal[1] +
      (center[2] - spec.center[2]) * normal[2];
    let cut: Shell['cut'] = null;
    if (Math.abs(distance) < radius) {
      const [a, b] = toSlice(spec, center[0], center[1], center[2]);
      cut = { a, b, radius: Math.sqrt(radius * radius - distance * distance) };
    }
    shells.push({ emitted, radius, center, cut });
  }
  return shells;
}

/** Unit normal of the slice plane, u × v (u and v are orthonormal). */
function cross(u: Triple, v: Triple): Triple {
  return [u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]];
}
