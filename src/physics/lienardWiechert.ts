import type { PathState } from '../path/pathState';
import { COULOMB_CONSTANT, SPEED_OF_LIGHT } from './constants';
import type { FieldSample } from './fieldSample';

/**
 * Largest field one charge may add, V/m: 1e150, so that E², |E||B| and the Poynting vector
 * E × B/μ0 (≤ |E|²/(μ0 c) ≈ 3e297 W/m²) of many superposed charges are finite doubles. It is
 * reached only within ~1e-80 m of an elementary charge (kq/R² with kq ≈ 1.4e-9 V m).
 */
const MAX_FIELD = 1e150;
const MAX_FIELD_SQUARED = MAX_FIELD * MAX_FIELD;

/**
 * Liénard–Wiechert fields of a point charge q (C) observed at r, from its state at the
 * retarded time (Jackson, Classical Electrodynamics 3rd ed., Eq. 14.14):
 *   E = kq [(n - β)(1 - β²) / (κ³R²)]  +  kq [n × ((n - β) × β̇) / (c κ³ R)],   κ = 1 - n·β
 *   B = n × E / c
 * The first bracket is the velocity (bound) field, the second the acceleration (radiation)
 * field. Adds into `out` (superposition) and returns false when r is on the charge, or so
 * near it that the field would exceed MAX_FIELD, where nothing is added.
 */
export function addLienardWiechert(
  q: number,
  rx: number,
  ry: number,
  rz: number,
  s: PathState,
  out: FieldSample,
): boolean {
  const c = SPEED_OF_LIGHT;
  const Rx = rx - s.px;
  const Ry = ry - s.py;
  const Rz = rz - s.pz;
  const R = Math.sqrt(Rx * Rx + Ry * Ry + Rz * Rz);
  if (!(R > 0)) return false;
  const nx = Rx / R;
  const ny = Ry / R;
  const nz = Rz / R;
  const dbx = s.ax / c;
  const dby = s.ay / c;
  const dbz = s.az / c;
  // n - β as (c n - v)/c: exact straight ahead of a charge moving along an axis, where n ≈ β.
  const ux = (nx * c - s.vx) / c;
  const uy = (ny * c - s.vy) / c;
  const uz = (nz * c - s.vz) / c;
  const oneMinusBeta2 = oneMinusBetaSquared(s);
  // κ = 1 - n·β = (|n - β|² + 1 - β²)/2, two non-negative terms: 1 - n·β cancels at high γ.
  const kappa = 0.5 * (ux * ux + uy * uy + uz * uz + oneMinusBeta2);
  const k3 = kappa * kappa * kappa;
  const velocityScale = (COULOMB_CONSTANT * q * oneMinusBeta2) / (k3 * R * R);
  const radiationScale = (COULOMB_CONSTANT * q) / (c * k3 * R);
  // w = (n - β) × β̇, then n × w
  const wx = uy * dbz - uz * dby;
  const wy = uz * dbx - ux * dbz;
  const wz = ux * dby - uy * dbx;
  const erx = radiationScale * (ny * wz - nz * wy);
  const ery = radiationScale * (nz * wx - nx * wz);
  const erz = radiationScale * (nx * wy - ny * wx);
  const ex = velocityScale * ux + erx;
  const ey = velocityScale * uy + ery;
  const ez = velocityScale * uz + erz;
  // Beyond MAX_FIELD (or NaN) the point counts as on the charge, so E × B stays finite.
  const e2 = ex * ex + ey * ey + ez * ez;
  const r2 = erx * erx + ery * ery + erz * erz;
  if (!(e2 <= MAX_FIELD_SQUARED && r2 <= MAX_FIELD_SQUARED)) return false;
  out.ex += ex;
  out.ey += ey;
  out.ez += ez;
  out.erx += erx;
  out.ery += ery;
  out.erz += erz;
  out.bx += (ny * ez - nz * ey) / c;
  out.by += (nz * ex - nx * ez) / c;
  out.bz += (nx * ey - ny * ex) / c;
  return true;
}

/** 1 - β² for the charge state s. */
function oneMinusBetaSquared(s: PathState): number {
  const c = SPEED_OF_LIGHT;
  const speed = Math.sqrt(s.vx * s.vx + s.vy * s.vy + s.vz * s.vz);
  // (c - v)(c + v)/c², with c - v exact (Sterbenz) near c, where 1 - β² itself would cancel.
  return ((c - speed) * (c + speed)) / (c * c);
}

/** Doppler factor κ = 1 - n·β for an observer at r and the charge state s. */
export function dopplerFactor(rx: number, ry: number, rz: number, s: PathState): number {
  const c = SPEED_OF_LIGHT;
  const Rx = rx - s.px;
  const Ry = ry - s.py;
  const Rz = rz - s.pz;
  const R = Math.sqrt(Rx * Rx + Ry * Ry + Rz * Rz);
  if (!(R > 0)) return 1;
  const ux = ((Rx / R) * c - s.vx) / c;
  const uy = ((Ry / R) * c - s.vy) / c;
  const uz = ((Rz / R) * c - s.vz) / c;
  // (|n - β|² + 1 - β²)/2 as in addLienardWiechert: 1 - n·β cancels at high γ.
  return 0.5 * (ux * ux + uy * uy + uz * uz + oneMinusBetaSquared(s));
}
