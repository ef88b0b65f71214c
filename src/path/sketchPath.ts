import { SPEED_OF_LIGHT } from '../physics/constants';
import type { PathColumns } from './sampledPath';
import { splineKnotDerivatives } from './spline';

export type Point3 = readonly [number, number, number];

/** How fast a sketch is travelled: constant β, or β changing linearly in time from start to end. */
export type SketchSpeed =
  | { kind: 'constant'; beta: number }
  | { kind: 'ramp'; betaStart: number; betaEnd: number };

/** The input a SketchError concerns. */
export type SketchField = 'beta' | 'betaStart' | 'betaEnd' | 'controls' | 'samples' | 'startTime';

/** Most control points a sketch may have. */
export const MAX_SKETCH_CONTROLS = 200;
/** Most time samples a sketch may be cut into. */
export const MAX_SKETCH_SAMPLES = 1_000_000;
export const DEFAULT_SKETCH_SAMPLES = 600;
export const DEFAULT_STROKE_CONTROLS = 8;

/** A sketch that cannot be travelled; `index` is the 0-based control point when one is to blame. */
export class SketchError extends Error {
  constructor(
    readonly field: SketchField,
    reason: string,
    readonly index?: number,
  ) {
    super(reason);
    this.name = 'SketchError';
  }
}

/**
 * Reduces a raw pointer stroke (noisy, unevenly spaced, maybe with repeated points) to `count`
 * control points evenly spaced by arc length: the stroke is resampled evenly, lightly smoothed
 * (three [1 2 1]/4 passes, ends pinned) and resampled again. The first and last points are kept.
 */
export function strokeToControls(
  stroke: readonly Point3[],
  count = DEFAULT_STROKE_CONTROLS,
): Point3[] {
  if (!Number.isInteger(count) || count < 2 || count > MAX_SKETCH_CONTROLS) {
    throw new SketchError(
      'controls',
      `the number of control points must be a whole number from 2 to ${MAX_SKETCH_CONTROLS} (got ${count})`,
    );
  }
  const distinct: Point3[] = [];
  stroke.forEach((point, k) => {
    if (!point.every(Number.isFinite)) {
      throw new SketchError(
        'controls',
        `stroke point ${k + 1} (counting from 1) has a non-finite coordinate`,
      );
    }
    const previous = distinct[distinct.length - 1];
    if (previous === undefined || distance(previous, point) > 0) distinct.push(point);
  });
  if (distinct.length < 2) {
    throw new SketchError('controls', 'a stroke needs at least 2 distinct points');
  }
  const fine = resampleByLength(distinct, Math.max(64, 8 * count));
  for (let pass = 0; pass < 3; pass++) smoothInterior(fine);
  return resampleByLength(fine, count);
}

/**
 * Checks a sketch without travelling it; throws the SketchError sketchColumns would.
 * Returns the chord lengths between consecutive controls.
 */
export function checkSketch(
  controls: readonly Point3[],
  speed: SketchSpeed,
  startTime: number,
  samples = DEFAULT_SKETCH_SAMPLES,
): Float64Array {
  if (speed.kind === 'constant') {
    checkBeta('beta', speed.beta);
  } else {
    checkBeta('betaStart', speed.betaStart);
    checkBeta('betaEnd', speed.betaEnd);
  }
  if (!Number.isFinite(startTime)) {
    throw new SketchError('startTime', `must be a finite number (got ${startTime})`);
  }
  if (!Number.isInteger(samples) || samples < 2 || samples > MAX_SKETCH_SAMPLES) {
    throw new SketchError(
      'samples',
      `must be a whole number from 2 to ${MAX_SKETCH_SAMPLES} (got ${samples})`,
    );
  }
  if (controls.length < 2) {
    throw new SketchError('controls', `a sketch needs at least 2 points (got ${controls.length})`);
  }
  controls.forEach((point, k) => {
    if (point.length !== 3 || !point.every(Number.isFinite)) {
      throw new SketchError('controls', 'must be three finite coordinates [x, y, z] in m', k);
    }
  });
  const chords = new Float64Array(controls.length - 1);
  let total = 0;
  for (let i = 0; i < chords.length; i++) {
    chords[i] = distance(controls[i], controls[i + 1]);
    total += chords[i];
  }
  for (let i = 0; i < chords.length; i++) {
    // Below this the chord-length parameter has no resolution left.
    if (!(chords[i] > 1e-12 * total)) {
      throw new SketchError(
        'controls',
        `repeats point ${i + 1} (counting from 1); consecutive points must differ`,
        i + 1,
      );
    }
  }
  return chords;
}

/**
 * The curve through the controls, travelled from startTime at the given speed. The curve is
 * the not-a-knot cubic spline (C2) in the chord-length parameter, so collinear controls give a
 * straight line and smooth shapes keep third-order accuracy up to the ends. Velocity is βc along
 * the tangent; acceleration is dβ/dt·c along the tangent plus (βc)²·curvature along the normal,
 * both from the spline's own derivatives. A 'ramp' changes β linearly in time over the whole
 * curve, so it takes T = 2L/(c(β0 + β1)).
 */
export function sketchColumns(
  controls: readonly Point3[],
  speed: SketchSpeed,
  startTime: number,
  samples = DEFAULT_SKETCH_SAMPLES,
): PathColumns {
  const chords = checkSketch(controls, speed, startTime, samples);
  const curve = new ChordSpline(controls, chords);
  const arc = new ArcLengthTable(curve);
  const c = SPEED_OF_LIGHT;
  const beta0 = speed.kind === 'constant' ? speed.beta : speed.betaStart;
  const beta1 = speed.kind === 'constant' ? speed.beta : speed.betaEnd;
  const duration = (2 * arc.total) / (c * (beta0 + beta1));
  const betaRate = (beta1 - beta0) / duration;
  const columns = {
    t: new Float64Array(samples),
    x: new Float64Array(samples),
    y: new Float64Array(samples),
    z: new Float64Array(samples),
    vx: new Float64Array(samples),
    vy: new Float64Array(samples),
    vz: new Float64Array(samples),
    ax: new Float64Array(samples),
    ay: new Float64Array(samples),
    az: new Float64Array(samples),
  };
  const at = { segment: 0, s: 0 };
  const p = new Float64Array(3);
  const d1 = new Float64Array(3);
  const d2 = new Float64Array(3);
  for (let j = 0; j < samples; j++) {
    const tau = j === samples - 1 ? duration : (duration * j) / (samples - 1);
    const beta = beta0 + betaRate * tau;
    const travelled = Math.min(arc.total, c * tau * (beta0 + 0.5 * betaRate * tau));
    arc.locate(travelled, at);
    curve.evaluate(at.segment, at.s, p, d1, d2);
    const rate = Math.hypot(d1[0], d1[1], d1[2]);
    // Chord-length splines have |dS/du| near 1; a collapse means the curve folds back on itself.
    if (!(rate > 1e-6)) {
      throw new SketchError(
        'controls',
        `the curve folds back on itself near point ${at.segment + 1} (counting from 1); spread the points out`,
        at.segment,
      );
    }
    const v = beta * c;
    let along = 0;
    for (let k = 0; k < 3; k++) along += d2[k] * (d1[k] / rate);
    columns.t[j] = startTime + tau;
    columns.x[j] = p[0];
    columns.y[j] = p[1];
    columns.z[j] = p[2];
    const vel = [columns.vx, columns.vy, columns.vz];
    const acc = [columns.ax, columns.ay, columns.az];
    for (let k = 0; k < 3; k++) {
      const tangent = d1[k] / rate;
      // Curvature vector dT/ds = (S'' - (S''·T)T)/|S'|²: the part of S'' across the tangent.
      const bend = (d2[k] - along * tangent) / (rate * rate);
      vel[k][j] = v * tangent;
      acc[k][j] = betaRate * c * tangent + v * v * bend;
    }
  }
  return columns;
}

function checkBeta(field: SketchField, beta: number): void {
  if (!Number.isFinite(beta)) throw new SketchError(field, `must be a finite number (got ${beta})`);
  if (beta >= 1) {
    throw new SketchError(field, 'must be below 1: no charge reaches the speed of light');
  }
  if (beta <= 0) throw new SketchError(field, 'must be above 0');
}

function distance(a: Point3, b: Point3): number {
  return Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2]);
}

/** `count` points evenly spaced by length along the polyline, with its exact first and last points. */
function resampleByLength(points: readonly Point3[], count: number): [number, number, number][] {
  const along = new Float64Array(points.length);
  for (let i = 1; i < points.length; i++) {
    along[i] = along[i - 1] + distance(points[i - 1], points[i]);
  }
  const total = along[points.length - 1];
  const out: [number, number, number][] = [];
  let i = 0;
  for (let j = 0; j < count; j++) {
    if (j === 0 || j === count - 1) {
      const end = points[j === 0 ? 0 : points.length - 1];
      out.push([end[0], end[1], end[2]]);
      continue;
    }
    const target = (total * j) / (count - 1);
    while (i < points.length - 2 && along[i + 1] < target) i++;
    const span = along[i + 1] - along[i];
    const f = span > 0 ? (target - along[i]) / span : 0;
    const a = points[i];
    const b = points[i + 1];
    out.push([a[0] + f * (b[0] - a[0]), a[1] + f * (b[1] - a[1]), a[2] + f * (b[2] - a[2])]);
  }
  return out;
}

/** One [1 2 1]/4 pass over the interior points, in place; the ends stay where they are. */
function smoothInterior(points: [number, number, number][]): void {
  let before: readonly number[] = points[0].slice();
  for (let i = 1; i < points.length - 1; i++) {
    const here = points[i].slice();
    const after = points[i + 1];
    for (let k = 0; k < 3; k++) points[i][k] = 0.25 * (before[k] + 2 * here[k] + after[k]);
    before = here;
  }
}

/** Per segment and axis, S(s) = a + b s + c s² + d s³ with s = u - u_i and u the chord length. */
class ChordSpline {
  readonly segments: number;
  readonly chords: Float64Array;
  private readonly coefficients: Float64Array;

  constructor(controls: readonly Point3[], chords: Float64Array) {
    const n = controls.length;
    this.segments = n - 1;
    this.chords = chords;
    this.coefficients = new Float64Array(12 * this.segments);
    const u = new Float64Array(n);
    for (let i = 1; i < n; i++) u[i] = u[i - 1] + chords[i - 1];
    const values = new Float64Array(n);
    const slope = new Float64Array(n);
    const second = new Float64Array(n);
    for (let k = 0; k < 3; k++) {
      for (let i = 0; i < n; i++) values[i] = controls[i][k];
      splineKnotDerivatives(u, values, slope, second);
      for (let i = 0; i < this.segments; i++) {
        const o = 12 * i + 4 * k;
        this.coefficients[o] = values[i];
        this.coefficients[o + 1] = slope[i];
        this.coefficients[o + 2] = 0.5 * second[i];
        this.coefficients[o + 3] = (second[i + 1] - second[i]) / (6 * chords[i]);
      }
    }
  }

  /** Position and first and second derivatives in u at local parameter s of a segment. */
  evaluate(segment: number, s: number, p: Float64Array, d1: Float64Array, d2: Float64Array): void {
    const q = this.coefficients;
    for (let k = 0; k < 3; k++) {
      const o = 12 * segment + 4 * k;
      p[k] = q[o] + s * (q[o + 1] + s * (q[o + 2] + s * q[o + 3]));
      d1[k] = q[o + 1] + s * (2 * q[o + 2] + 3 * s * q[o + 3]);
      d2[k] = 2 * q[o + 2] + 6 * s * q[o + 3];
    }
  }

  /** |dS/du|, the arc length per unit parameter. */
  rate(segment: number, s: number): number {
    const q = this.coefficients;
    const o = 12 * segment;
    const x = q[o + 1] + s * (2 * q[o + 2] + 3 * s * q[o + 3]);
    const y = q[o + 5] + s * (2 * q[o + 6] + 3 * s * q[o + 7]);
    const z = q[o + 9] + s * (2 * q[o + 10] + 3 * s * q[o + 11]);
    return Math.hypot(x, y, z);
  }

  /** Arc length between local parameters s0 and s1 of one segment (5-point Gauss–Legendre). */
  length(segment: number, s0: number, s1: number): number {
    const half = 0.5 * (s1 - s0);
    const mid = 0.5 * (s0 + s1);
    let sum = 0;
    for (let k = 0; k < GAUSS_NODES.length; k++) {
      sum += GAUSS_WEIGHTS[k] * this.rate(segment, mid + half * GAUSS_NODES[k]);
    }
    return half * sum;
  }
}

// 5-point Gauss–Legendre on [-1, 1], exact to degree 9 (Abramowitz & Stegun, Table 25.4).
const GAUSS_NODES = [
  -0.906179845938664, -0.5384693101056831, 0, 0.5384693101056831, 0.906179845938664,
];
const GAUSS_WEIGHTS = [
  0.2369268850561891, 0.4786286704993665, 0.5688888888888889, 0.4786286704993665,
  0.2369268850561891,
];
// Each segment's length is tabulated over this many equal parameter steps.
const STEPS_PER_SEGMENT = 16;

/** Cumulative arc length at equal parameter steps, and its inverse by safeguarded Newton. */
class ArcLengthTable {
  readonly total: number;
  private readonly cumulative: Float64Array;

  constructor(private readonly curve: ChordSpline) {
    const steps = curve.segments * STEPS_PER_SEGMENT;
    this.cumulative = new Float64Array(steps + 1);
    for (let k = 0; k < steps; k++) {
      const [segment, s0, s1] = this.step(k);
      this.cumulative[k + 1] = this.cumulative[k] + curve.length(segment, s0, s1);
    }
    this.total = this.cumulative[steps];
  }

  /** Writes the segment and local parameter where the arc length from the start is `target`. */
  locate(target: number, out: { segment: number; s: number }): void {
    const table = this.cumulative;
    let lo = 0;
    let hi = table.length - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >>> 1;
      if (table[mid] <= target) lo = mid;
      else hi = mid;
    }
    const [segment, s0, s1] = this.step(lo);
    const span = table[lo + 1] - table[lo];
    let left = s0;
    let right = s1;
    let s = s0 + (s1 - s0) * Math.min(1, Math.max(0, (target - table[lo]) / span));
    for (let iteration = 0; iteration < 60; iteration++) {
      const miss = table[lo] + this.curve.length(segment, s0, s) - target;
      if (miss > 0) right = s;
      else left = s;
      let next = s - miss / this.curve.rate(segment, s);
      // Newton converges quadratically here; bisection catches the rare step out of the bracket.
      if (!(next >= left && next <= right)) next = 0.5 * (left + right);
      const done = Math.abs(next - s) <= 1e-15 * this.curve.chords[segment];
      s = next;
      if (done) break;
    }
    out.segment = segment;
    out.s = s;
  }

  private step(k: number): [number, number, number] {
    const segment = Math.floor(k / STEPS_PER_SEGMENT);
    const h = this.curve.chords[segment];
    const j = k - segment * STEPS_PER_SEGMENT;
    return [segment, (h * j) / STEPS_PER_SEGMENT, (h * (j + 1)) / STEPS_PER_SEGMENT];
  }
}
