import type { Triple } from '../engine/sliceSpec';
import { pathState } from '../path/pathState';
import type { Charge } from '../physics/charge';
import { SPEED_OF_LIGHT } from '../physics/constants';
import { evaluateFeynman, feynmanFields } from '../physics/feynman';
import { clearFields, fieldSample } from '../physics/fieldSample';
import { evaluateFields, poyntingVector } from '../physics/fields';
import { addLienardWiechert, dopplerFactor } from '../physics/lienardWiechert';
import { retardedSolution, solveRetardedTime } from '../physics/retardedTime';
import { vec3 } from '../physics/vec3';

/** What one charge contributes to a probe reading, seen from the probe at (r, t). */
export interface ChargeAtRetardedTime {
  /** Retarded time t_r, s. */
  tRet: number;
  /** Light travel time t − t_r, s. */
  delay: number;
  /** Doppler factor κ = 1 − n·β at the retarded time. */
  doppler: number;
  /** |r − r0(t_r)|, m. */
  distance: number;
  /** Retarded position r0(t_r), m. */
  position: Triple;
  /** True when the probe sits on this charge (within the near radius of its retarded position). */
  onCharge: boolean;
}

/** Everything a probe shows at one point and time, SI units, superposed over the charges. */
export interface ProbeReadout {
  /** Electric field, V/m: exactly what evaluateFields gives. */
  e: Triple;
  /** Magnetic flux density, T: exactly what evaluateFields gives. */
  b: Triple;
  /** Poynting vector E × B / μ0, W/m²: exactly what poyntingVector gives. */
  s: Triple;
  /** Velocity (bound) part of E, V/m: E − eRadiation. */
  eVelocity: Triple;
  /** Acceleration (radiation) part of E, V/m: the sum of each charge's radiation term. */
  eRadiation: Triple;
  /** Velocity part of B, T: B − bRadiation. */
  bVelocity: Triple;
  /** Radiation part of B, T: Σ n_k × E_rad,k / c over the charges. */
  bRadiation: Triple;
  /** E from Feynman's formula, V/m (an independent evaluation of the same field). */
  feynmanE: Triple;
  /** B from Feynman's formula, T. */
  feynmanB: Triple;
  /** |F − LW| / |LW| for E and B; 0 where both are zero. */
  relativeDifference: { e: number; b: number };
  /** One entry per charge, in the order given. */
  charges: ChargeAtRetardedTime[];
  /** True when the probe sits on any charge: every field above is then zero. */
  onCharge: boolean;
}

const sample = fieldSample();
const own = fieldSample();
const poynting = vec3();
const feynman = feynmanFields();
const state = pathState();
const solution = retardedSolution();

/**
 * The probe reading at `point` (m) and `time` (s). E, B and S come from evaluateFields and
 * poyntingVector on the same inputs, so they equal `conecast fields` to the bit. The split
 * into velocity and radiation parts follows Jackson, Classical Electrodynamics 3rd ed.,
 * Eqs. 14.13–14.14 (B = n × E / c, E = velocity term + acceleration term), per charge:
 * eRadiation = Σ E_rad,k, bRadiation = Σ n_k × E_rad,k / c, and the velocity parts are the
 * totals minus these, so velocity + radiation gives the total to rounding. Within
 * `nearRadius` (m) of any charge's retarded position every field is zero and `onCharge` is
 * set, never NaN.
 */
export function probeReadout(
  charges: readonly Charge[],
  point: Triple,
  time: number,
  nearRadius = 0,
): ProbeReadout {
  const [rx, ry, rz] = point;
  const c = SPEED_OF_LIGHT;
  evaluateFields(charges, rx, ry, rz, time, sample, nearRadius);
  poyntingVector(poynting, sample);
  evaluateFeynman(charges, rx, ry, rz, time, feynman);

  let brx = 0;
  let bry = 0;
  let brz = 0;
  const perCharge: ChargeAtRetardedTime[] = [];
  for (const { charge, path } of charges) {
    solveRetardedTime(path, rx, ry, rz, time, state, solution);
    // The same test as evaluateFields, so the per-charge flags agree with its total.
    const distance = Math.hypot(rx - state.px, ry - state.py, rz - state.pz);
    clearFields(own);
    const onCharge =
      !(distance > nearRadius) || !addLienardWiechert(charge, rx, ry, rz, state, own);
    if (!onCharge) {
      const nx = (rx - state.px) / distance;
      const ny = (ry - state.py) / distance;
      const nz = (rz - state.pz) / distance;
      brx += (ny * own.erz - nz * own.ery) / c;
      bry += (nz * own.erx - nx * own.erz) / c;
      brz += (nx * own.ery - ny * own.erx) / c;
    }
    perCharge.push({
      tRet: solution.tRet,
      delay: solution.delay,
      doppler: dopplerFactor(rx, ry, rz, state),
      distance,
      position: [state.px, state.py, state.pz],
      onCharge,
    });
  }

  if (sample.onCharge) return zeroReadout(perCharge);
  const e: Triple = [sample.ex, sample.ey, sample.ez];
  const b: Triple = [sample.bx, sample.by, sample.bz];
  const eRadiation: Triple = [sample.erx, sample.ery, sample.erz];
  const bRadiation: Triple = [brx, bry, brz];
  // Feynman's evaluation has no near radius, so it can only fail where LW failed too, but for
  // overflow at a point a hair from a charge: its zeros then show as a difference of 1.
  const feynmanE: Triple = [feynman.e.x, feynman.e.y, feynman.e.z];
  const feynmanB: Triple = [feynman.b.x, feynman.b.y, feynman.b.z];
  return {
    e,
    b,
    s: [poynting.x, poynting.y, poynting.z],
    eVelocity: minus(e, eRadiation),
    eRadiation,
    bVelocity: minus(b, bRadiation),
    bRadiation,
    feynmanE,
    feynmanB,
    relativeDifference: { e: relativeDistance(feynmanE, e), b: relativeDistance(feynmanB, b) },
    charges: perCharge,
    onCharge: false,
  };
}

function zeroReadout(charges: ChargeAtRetardedTime[]): ProbeReadout {
  const zero = (): Triple => [0, 0, 0];
  return {
    e: zero(),
    b: zero(),
    s: zero(),
    eVelocity: zero(),
    eRadiation: zero(),
    bVelocity: zero(),
    bRadiation: zero(),
    feynmanE: zero(),
    feynmanB: zero(),
    relativeDifference: { e: 0, b: 0 },
    charges,
    onCharge: true,
  };
}

function minus(a: Triple, b: Triple): Triple {
  return [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
}

/** |a − ref| / |ref|, with 0/0 taken as 0. */
function relativeDistance(a: Triple, ref: Triple): number {
  const diff = Math.hypot(a[0] - ref[0], a[1] - ref[1], a[2] - ref[2]);
  if (diff === 0) return 0;
  return diff / Math.hypot(ref[0], ref[1], ref[2]);
}
