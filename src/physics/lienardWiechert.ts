import type { PathState } from '../path/pathState';
import { COULOMB_CONSTANT, SPEED_OF_LIGHT } from './constants';
import type { FieldSample } from './fieldSample';

/**
 * Liénard–Wiechert fields of a point charge q (C) observed at r, from its state at the
 * retarded time (Jackson, Classical Electrodynamics 3rd ed., Eq. 14.14):
 *   E = kq [(n - β)(1 - β²) / (κ³R²)]  +  kq [n × ((n - β) × β̇) / (c κ³ R)],   κ = 1 - n·β
 *   B = n × E / c
 * The first bracket is the velocity (bound) field, the second the acceleration (radiation)
 * field. Adds into `out` (superposition) and returns false when r is on the charge, where
 * nothing is added.
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
  const bx = s.vx / c;
  const by = s.vy / c;
  const bz = s.vz / c;
  const dbx = s.ax / c;
  const dby = s.ay / c;
  const dbz = s.az / c;
  const kappa = 1 - (nx * bx + ny * by + nz * bz);
  const oneMinusBeta2 = 1 - (bx * bx + by * by + bz * bz);
  const k3 = kappa * kappa * kappa;
  const velocityScale = (COULOMB_CONSTANT * q * oneMinusBeta2) / (k3 * R * R);
  const radiationScale = (COULOMB_CONSTANT * q) / (c * k3 * R);
  const ux = nx - bx;
  const uy = ny - by;
  const uz = nz - bz;
  // w = (n - β) × β̇, then n × w
  const wx = uy * dbz - uz * dby;
  const wy = uz * dbx - ux * dbz;
  const wz = ux * dby - uy * dbx;
  const erx = radiationScale * (ny * wz - nz * wy);
  const ery = radiationScale * (nz * wx - nx * wz);
  const erz = radiationScale * (nx * wy - ny * wx);
  if (!Number.isFinite(velocityScale) || !Number.isFinite(radiationScale)) return false;
  const ex = velocityScale * ux + erx;
  const ey = velocityScale * uy + ery;
  const ez = velocityScale * uz + erz;
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

/** Doppler factor κ = 1 - n·β for an observer at r and the charge state s. */
export function dopplerFactor(rx: number, ry: number, rz: number, s: PathState): number {
  const Rx = rx - s.px;
  const Ry = ry - s.py;
  const Rz = rz - s.pz;
  const R = Math.sqrt(Rx * Rx + Ry * Ry + Rz * Rz);
  if (!(R > 0)) return 1;
  return 1 - (Rx * s.vx + Ry * s.vy + Rz * s.vz) / (R * SPEED_OF_LIGHT);
}
