import { MASK_CLEAR, planeOf, type SliceFields } from '../../src/engine/slicePlanes';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import type { ArrowQuantity } from '../../src/io/mapSettings';
import { VACUUM_PERMEABILITY } from '../../src/physics/constants';

export type { ArrowQuantity } from '../../src/io/mapSettings';

/** Quantiles of the lattice's |v| that the arrow lengths span, on a log scale. */
export const ARROW_QUANTILES = { low: 0.05, high: 0.99 } as const;
/** Arrow length as a share of the cell: shortest, and what the longest adds to it. */
const SHORTEST = 0.2;
const LENGTH_SPAN = 0.7;
/** Vectors whose in-plane part is below this share of their magnitude point out of the plane. */
const OUT_OF_PLANE = 1e-3;
/** Head strokes: length as a share of the arrow, and their angle to the shaft. */
const HEAD_SHARE = 0.3;
const HEAD_COS = Math.cos(Math.PI / 7);
const HEAD_SIN = Math.sin(Math.PI / 7);
/** Floats per arrow: three segments of two xyz points. */
const FLOATS_PER_ARROW = 18;

/**
 * Line segments (shaft + two head strokes per arrow) in slice coordinates: a, b in metres
 * from the slice centre along spec.u and spec.v, z = 0, as xyz pairs for a LineSegments.
 * A lattice of `across` arrows along the longer side (square cells), each at a cell centre and
 * sampled from the nearest grid point, pointing along the in-plane projection of the vector;
 * length = cell × (0.2 + 0.7·log-scale position of |v| between the lattice's 5% and 99%
 * quantiles). Masked, zero, non-finite and nearly out-of-plane vectors get no arrow.
 */
export function arrowSegments(
  fields: SliceFields,
  spec: SliceSpec,
  quantity: ArrowQuantity,
  across: number,
): Float32Array {
  const { nx, ny, mask } = fields;
  const longer = Math.max(spec.width, spec.height);
  if (!(across >= 1) || !(longer > 0) || nx < 1 || ny < 1) return new Float32Array(0);
  const cell = longer / Math.floor(across);
  const cu = Math.max(1, Math.round(spec.width / cell));
  const cv = Math.max(1, Math.round(spec.height / cell));
  const [x, y, z] = vectorPlanes(fields, quantity);
  const m = quantity === 'S' ? 1 / VACUUM_PERMEABILITY : 0;
  const b =
    quantity === 'S' ? [planeOf(fields, 'Bx'), planeOf(fields, 'By'), planeOf(fields, 'Bz')] : null;
  const { u, v } = spec;

  // First pass: in-plane parts and magnitudes of the arrows to draw.
  const cells = cu * cv;
  const alongU = new Float64Array(cells);
  const alongV = new Float64Array(cells);
  const magnitude = new Float64Array(cells);
  const centreA = new Float64Array(cells);
  const centreB = new Float64Array(cells);
  let count = 0;
  for (let jc = 0; jc < cv; jc++) {
    const cb = (jc + 0.5 - cv / 2) * cell;
    const j = nearestIndex(cb, spec.height, ny);
    for (let ic = 0; ic < cu; ic++) {
      const ca = (ic + 0.5 - cu / 2) * cell;
      const i = nearestIndex(ca, spec.width, nx);
      const p = j * nx + i;
      if (mask[p] !== MASK_CLEAR) continue;
      let vx = x[p];
      let vy = y[p];
      let vz = z[p];
      if (b !== null) {
        const sx = (vy * b[2][p] - vz * b[1][p]) * m;
        const sy = (vz * b[0][p] - vx * b[2][p]) * m;
        const sz = (vx * b[1][p] - vy * b[0][p]) * m;
        vx = sx;
        vy = sy;
        vz = sz;
      }
      const size = Math.sqrt(vx * vx + vy * vy + vz * vz);
      if (!(size > 0) || !Number.isFinite(size)) continue;
      const pa = vx * u[0] + vy * u[1] + vz * u[2];
      const pb = vx * v[0] + vy * v[1] + vz * v[2];
      const inPlane = Math.sqrt(pa * pa + pb * pb);
      if (!(inPlane >= OUT_OF_PLANE * size)) continue;
      alongU[count] = pa / inPlane;
      alongV[count] = pb / inPlane;
      magnitude[count] = size;
      centreA[count] = ca;
      centreB[count] = cb;
      count++;
    }
  }

  const sorted = magnitude.slice(0, count).sort();
  const low = count > 0 ? sorted[Math.round(ARROW_QUANTILES.low * (count - 1))] : 0;
  const high = count > 0 ? sorted[Math.round(ARROW_QUANTILES.high * (count - 1))] : 0;
  const logLow = Math.log(low);
  // A uniform lattice gets arrows of full length.
  const logGain = high > low ? 1 / (Math.log(high) - logLow) : 0;

  // Second pass: shaft centred on the cell, head strokes swept back from the tip.
  const out = new Float32Array(FLOATS_PER_ARROW * count);
  for (let k = 0; k < count; k++) {
    const raw = logGain > 0 ? (Math.log(magnitude[k]) - logLow) * logGain : 1;
    const t = Math.min(1, Math.max(0, raw));
    const length = cell * (SHORTEST + LENGTH_SPAN * t);
    const da = alongU[k];
    const db = alongV[k];
    const tipA = centreA[k] + 0.5 * length * da;
    const tipB = centreB[k] + 0.5 * length * db;
    const head = HEAD_SHARE * length;
    const o = FLOATS_PER_ARROW * k;
    out[o] = centreA[k] - 0.5 * length * da;
    out[o + 1] = centreB[k] - 0.5 * length * db;
    out[o + 3] = tipA;
    out[o + 4] = tipB;
    out[o + 6] = tipA;
    out[o + 7] = tipB;
    out[o + 9] = tipA - head * (da * HEAD_COS - db * HEAD_SIN);
    out[o + 10] = tipB - head * (db * HEAD_COS + da * HEAD_SIN);
    out[o + 12] = tipA;
    out[o + 13] = tipB;
    out[o + 15] = tipA - head * (da * HEAD_COS + db * HEAD_SIN);
    out[o + 16] = tipB - head * (db * HEAD_COS - da * HEAD_SIN);
  }
  return out;
}

/** E or E_rad planes; for S the E planes, crossed with B in the loop. */
function vectorPlanes(fields: SliceFields, quantity: ArrowQuantity): Float32Array[] {
  return quantity === 'Erad'
    ? [planeOf(fields, 'Ex_rad'), planeOf(fields, 'Ey_rad'), planeOf(fields, 'Ez_rad')]
    : [planeOf(fields, 'Ex'), planeOf(fields, 'Ey'), planeOf(fields, 'Ez')];
}

/** Grid index of the cell centre nearest to in-plane offset `offset` along a side of `extent`. */
function nearestIndex(offset: number, extent: number, n: number): number {
  if (!(extent > 0)) return n >> 1;
  const index = Math.round((offset / extent + 0.5) * n - 0.5);
  return index < 0 ? 0 : index >= n ? n - 1 : index;
}
