import type { PathState } from '../path/pathState';
import { SPEED_OF_LIGHT, VACUUM_PERMITTIVITY } from '../physics/constants';

/**
 * Power radiated by a point charge, SI units, from its state at one (retarded) instant.
 * References: Jackson, Classical Electrodynamics 3rd ed., §14.2 (Eqs. 14.22, 14.24) and
 * §14.3 (Eqs. 14.37, 14.38), rewritten from Gaussian to SI by e² → q²/(4π ε0).
 * Velocities are m/s and accelerations m/s²: β = v/c and β̇ = a/c (1/s).
 */

const c = SPEED_OF_LIGHT;

/** Lorentz factor γ = 1/√(1 - β²) of the state's velocity. */
export function lorentzFactor(s: PathState): number {
  const b2 = (s.vx * s.vx + s.vy * s.vy + s.vz * s.vz) / (c * c);
  return 1 / Math.sqrt(1 - b2);
}

/**
 * Larmor power of a slowly moving charge (Jackson Eq. 14.22), W:
 *   P = q² a² / (6π ε0 c³)
 */
export function larmorPower(q: number, ax: number, ay: number, az: number): number {
  const a2 = ax * ax + ay * ay + az * az;
  return (q * q * a2) / (6 * Math.PI * VACUUM_PERMITTIVITY * c * c * c);
}

/**
 * Liénard's relativistic generalisation (Jackson Eq. 14.24), W, per unit source (retarded)
 * time t':
 *   P = (2/3) q² γ⁶ [β̇² - (β × β̇)²] / (4π ε0 c) = q² γ⁶ [β̇² - (β × β̇)²] / (6π ε0 c)
 */
export function lienardPower(q: number, s: PathState): number {
  const bx = s.vx / c;
  const by = s.vy / c;
  const bz = s.vz / c;
  const dx = s.ax / c;
  const dy = s.ay / c;
  const dz = s.az / c;
  const b2 = bx * bx + by * by + bz * bz;
  const g2 = 1 / (1 - b2);
  const cx = by * dz - bz * dy;
  const cy = bz * dx - bx * dz;
  const cz = bx * dy - by * dx;
  const bracket = dx * dx + dy * dy + dz * dz - (cx * cx + cy * cy + cz * cz);
  return (q * q * g2 * g2 * g2 * bracket) / (6 * Math.PI * VACUUM_PERMITTIVITY * c);
}

/**
 * Angular distribution of the radiated power per unit source time t' (Jackson Eq. 14.38), W/sr:
 *   dP(t')/dΩ = q² |n × ((n - β) × β̇)|² / (16π² ε0 c (1 - n·β)⁵)
 * n is the direction from the retarded position to the observer (normalised here).
 * Integrated over all directions this gives lienardPower.
 */
export function powerPerSolidAngleSourceTime(
  q: number,
  s: PathState,
  nx: number,
  ny: number,
  nz: number,
): number {
  return powerPerSolidAngle(q, s, nx, ny, nz, 5);
}

/**
 * The same per unit observer time t, i.e. R² S·n at the observer (Jackson Eq. 14.37 with
 * the radiation field of Eq. 14.14), W/sr: one more factor 1/(1 - n·β), since dt = (1 - n·β) dt'.
 */
export function powerPerSolidAngleObserverTime(
  q: number,
  s: PathState,
  nx: number,
  ny: number,
  nz: number,
): number {
  return powerPerSolidAngle(q, s, nx, ny, nz, 6);
}

/** q² |n × ((n - β) × β̇)|² / (16π² ε0 c κ^power): the two angular distributions differ only in the power of κ. */
function powerPerSolidAngle(
  q: number,
  s: PathState,
  nx: number,
  ny: number,
  nz: number,
  power: 5 | 6,
): number {
  const kappa = dopplerAndNumerator(s, nx, ny, nz);
  return (
    (q * q * scratch.numerator) /
    (16 * Math.PI * Math.PI * VACUUM_PERMITTIVITY * c * kappa ** power)
  );
}

const scratch = { numerator: 0 };

/** Returns κ = 1 - n·β and leaves |n × ((n - β) × β̇)|² in scratch.numerator. */
function dopplerAndNumerator(s: PathState, nx0: number, ny0: number, nz0: number): number {
  const len = Math.hypot(nx0, ny0, nz0);
  const nx = nx0 / len;
  const ny = ny0 / len;
  const nz = nz0 / len;
  const bx = s.vx / c;
  const by = s.vy / c;
  const bz = s.vz / c;
  const dx = s.ax / c;
  const dy = s.ay / c;
  const dz = s.az / c;
  const ux = nx - bx;
  const uy = ny - by;
  const uz = nz - bz;
  const wx = uy * dz - uz * dy;
  const wy = uz * dx - ux * dz;
  const wz = ux * dy - uy * dx;
  const px = ny * wz - nz * wy;
  const py = nz * wx - nx * wz;
  const pz = nx * wy - ny * wx;
  scratch.numerator = px * px + py * py + pz * pz;
  return 1 - (nx * bx + ny * by + nz * bz);
}
