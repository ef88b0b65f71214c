import { SPEED_OF_LIGHT } from '../physics/constants';
import { type PathState, pathState } from './pathState';
import { splineKnotDerivatives } from './spline';

/** Raw columns of a path; velocities and accelerations are optional. */
export interface PathColumns {
  t: ArrayLike<number>;
  x: ArrayLike<number>;
  y: ArrayLike<number>;
  z: ArrayLike<number>;
  vx?: ArrayLike<number>;
  vy?: ArrayLike<number>;
  vz?: ArrayLike<number>;
  ax?: ArrayLike<number>;
  ay?: ArrayLike<number>;
  az?: ArrayLike<number>;
}

/** Every column a path has, in order: time, position, velocity, acceleration. */
export const PATH_COLUMNS = ['t', 'x', 'y', 'z', 'vx', 'vy', 'vz', 'ax', 'ay', 'az'] as const;

/** A path that cannot be used, with the sample (0-based) and column it concerns. */
export class PathError extends Error {
  constructor(
    message: string,
    readonly sample: number,
    readonly column: string,
  ) {
    super(message);
    this.name = 'PathError';
  }
}

type PathColumnsF64 = { [K in keyof PathColumns]: Float64Array };

const COLUMN_GROUPS = [
  ['vx', 'vy', 'vz'],
  ['ax', 'ay', 'az'],
] as const;

/**
 * A charge's path as time samples with position, velocity and acceleration at every knot,
 * joined by quintic Hermite pieces so position, velocity and acceleration are continuous.
 * Missing velocities or accelerations come from a not-a-knot cubic spline (of positions, or
 * of velocities where those are given). History rule: outside [t0, tN] the charge moves
 * in a straight line at its end velocity, with zero acceleration.
 */
export class SampledPath {
  readonly count: number;
  readonly t: Float64Array;
  readonly x: Float64Array;
  readonly y: Float64Array;
  readonly z: Float64Array;
  readonly vx: Float64Array;
  readonly vy: Float64Array;
  readonly vz: Float64Array;
  readonly ax: Float64Array;
  readonly ay: Float64Array;
  readonly az: Float64Array;
  /** Largest speed found anywhere on the path (knots and inside each piece), m/s. */
  readonly maxSpeed: number;

  constructor(columns: PathColumns) {
    const n = columns.t.length;
    if (n < 1) throw new PathError('a path needs at least one sample', 0, 't');
    this.count = n;
    this.t = copyColumn(columns.t, n, 't');
    this.x = copyColumn(columns.x, n, 'x');
    this.y = copyColumn(columns.y, n, 'y');
    this.z = copyColumn(columns.z, n, 'z');
    for (const group of COLUMN_GROUPS) {
      const given = group.filter((name) => columns[name] !== undefined);
      if (given.length !== 0 && given.length !== 3) {
        throw new PathError(
          `columns ${group.join(', ')} must be given together (got ${given.join(', ')})`,
          0,
          group.find((name) => columns[name] === undefined) ?? group[0],
        );
      }
    }
    const t = this.t;
    for (let i = 1; i < n; i++) {
      if (!(t[i] > t[i - 1])) {
        throw new PathError(
          `times must increase strictly: sample ${i + 1} (counting from 1) has t = ${t[i]} s after t = ${t[i - 1]} s`,
          i,
          't',
        );
      }
    }
    const hasV = columns.vx !== undefined;
    const hasA = columns.ax !== undefined;
    this.vx = hasV ? copyColumn(columns.vx!, n, 'vx') : new Float64Array(n);
    this.vy = hasV ? copyColumn(columns.vy!, n, 'vy') : new Float64Array(n);
    this.vz = hasV ? copyColumn(columns.vz!, n, 'vz') : new Float64Array(n);
    this.ax = hasA ? copyColumn(columns.ax!, n, 'ax') : new Float64Array(n);
    this.ay = hasA ? copyColumn(columns.ay!, n, 'ay') : new Float64Array(n);
    this.az = hasA ? copyColumn(columns.az!, n, 'az') : new Float64Array(n);
    if (!hasV || !hasA) {
      const scratch = new Float64Array(n);
      const pos = [this.x, this.y, this.z];
      const vel = [this.vx, this.vy, this.vz];
      const acc = [this.ax, this.ay, this.az];
      for (let d = 0; d < 3; d++) {
        if (!hasV) splineKnotDerivatives(t, pos[d], vel[d], hasA ? scratch : acc[d]);
        else splineKnotDerivatives(t, vel[d], acc[d], scratch);
      }
    }
    this.maxSpeed = this.checkSpeeds();
  }

  /**
   * Rebuilds a path from columns that a validated path produced (every derivative filled in,
   * speeds checked), without copying or checking again: for worker threads.
   */
  static restore(columns: Required<PathColumnsF64> & { maxSpeed: number }): SampledPath {
    const path = Object.create(SampledPath.prototype) as SampledPath;
    Object.assign(path, { count: columns.t.length, ...columns });
    return path;
  }

  /** Index i of the piece with t[i] <= time < t[i+1]; -1 before the path, count-1 after. */
  locate(time: number, hint = -1): number {
    const t = this.t;
    const last = this.count - 1;
    if (time < t[0]) return -1;
    if (time >= t[last]) return last;
    if (hint >= 0 && hint < last) {
      if (time >= t[hint]) {
        if (time < t[hint + 1]) return hint;
        if (hint + 2 <= last && time < t[hint + 2]) return hint + 1;
      } else if (hint > 0 && time >= t[hint - 1]) {
        return hint - 1;
      }
    }
    let lo = 0;
    let hi = last;
    if (hint >= 0 && hint < last) {
      // Gallop out from the hint: O(log distance) when the answer is near, as it usually is.
      let stride = 2;
      if (time >= t[hint]) {
        lo = hint;
        while (lo + stride < last && t[lo + stride] <= time) {
          lo += stride;
          stride *= 2;
        }
        hi = Math.min(last, lo + stride);
      } else {
        hi = hint;
        while (hi - stride > 0 && t[hi - stride] > time) {
          hi -= stride;
          stride *= 2;
        }
        lo = Math.max(0, hi - stride);
      }
    }
    while (hi - lo > 1) {
      const mid = (lo + hi) >>> 1;
      if (t[mid] <= time) lo = mid;
      else hi = mid;
    }
    return lo;
  }

  /** Writes the state at `time` into `out`; returns the piece index, a hint for the next call. */
  stateAt(time: number, out: PathState, hint = -1): number {
    const i = this.locate(time, hint);
    const last = this.count - 1;
    if (i < 0 || i === last) {
      const k = i < 0 ? 0 : last;
      const dt = time - this.t[k];
      out.vx = this.vx[k];
      out.vy = this.vy[k];
      out.vz = this.vz[k];
      out.px = this.x[k] + out.vx * dt;
      out.py = this.y[k] + out.vy * dt;
      out.pz = this.z[k] + out.vz * dt;
      out.ax = 0;
      out.ay = 0;
      out.az = 0;
      out.jx = 0;
      out.jy = 0;
      out.jz = 0;
      return i;
    }
    const t0 = this.t[i];
    const h = this.t[i + 1] - t0;
    const s = (time - t0) / h;
    const s2 = s * s;
    const s3 = s2 * s;
    const s4 = s3 * s;
    const s5 = s4 * s;
    const ih = 1 / h;
    const ih2 = ih * ih;
    const ih3 = ih2 * ih;
    // Each axis: p(s) = c0 + c1 s + ... + c5 s^5 matching p, h v, h² a at both ends.
    const cx = hermite(this.x, this.vx, this.ax, i, h);
    out.px = cx.c0 + cx.c1 * s + cx.c2 * s2 + cx.c3 * s3 + cx.c4 * s4 + cx.c5 * s5;
    out.vx = (cx.c1 + 2 * cx.c2 * s + 3 * cx.c3 * s2 + 4 * cx.c4 * s3 + 5 * cx.c5 * s4) * ih;
    out.ax = (2 * cx.c2 + 6 * cx.c3 * s + 12 * cx.c4 * s2 + 20 * cx.c5 * s3) * ih2;
    out.jx = (6 * cx.c3 + 24 * cx.c4 * s + 60 * cx.c5 * s2) * ih3;
    const cy = hermite(this.y, this.vy, this.ay, i, h);
    out.py = cy.c0 + cy.c1 * s + cy.c2 * s2 + cy.c3 * s3 + cy.c4 * s4 + cy.c5 * s5;
    out.vy = (cy.c1 + 2 * cy.c2 * s + 3 * cy.c3 * s2 + 4 * cy.c4 * s3 + 5 * cy.c5 * s4) * ih;
    out.ay = (2 * cy.c2 + 6 * cy.c3 * s + 12 * cy.c4 * s2 + 20 * cy.c5 * s3) * ih2;
    out.jy = (6 * cy.c3 + 24 * cy.c4 * s + 60 * cy.c5 * s2) * ih3;
    const cz = hermite(this.z, this.vz, this.az, i, h);
    out.pz = cz.c0 + cz.c1 * s + cz.c2 * s2 + cz.c3 * s3 + cz.c4 * s4 + cz.c5 * s5;
    out.vz = (cz.c1 + 2 * cz.c2 * s + 3 * cz.c3 * s2 + 4 * cz.c4 * s3 + 5 * cz.c5 * s4) * ih;
    out.az = (2 * cz.c2 + 6 * cz.c3 * s + 12 * cz.c4 * s2 + 20 * cz.c5 * s3) * ih2;
    out.jz = (6 * cz.c3 + 24 * cz.c4 * s + 60 * cz.c5 * s2) * ih3;
    return i;
  }

  /** Start and end time of the samples, s. */
  get timeSpan(): [number, number] {
    return [this.t[0], this.t[this.count - 1]];
  }

  private checkSpeeds(): number {
    const c = SPEED_OF_LIGHT;
    const probe = pathState();
    let maxSpeed = 0;
    for (let i = 0; i < this.count; i++) {
      const speed = Math.hypot(this.vx[i], this.vy[i], this.vz[i]);
      if (!(speed < c)) {
        throw new PathError(
          `${speedReached(speed)} at sample ${i + 1} (counting from 1; t = ${this.t[i]} s); a charge must move slower than light`,
          i,
          'v',
        );
      }
      if (speed > maxSpeed) maxSpeed = speed;
      if (i + 1 < this.count) {
        // The interpolant can overshoot between knots, so look inside each piece too.
        const t0 = this.t[i];
        const h = this.t[i + 1] - t0;
        for (const s of INTERIOR_CHECKS) {
          this.stateAt(t0 + s * h, probe, i);
          const inner = Math.hypot(probe.vx, probe.vy, probe.vz);
          if (!(inner < c)) {
            throw new PathError(
              `${speedReached(inner)} between samples ${i + 1} and ${i + 2} (counting from 1; t = ${t0 + s * h} s); a charge must move slower than light`,
              i,
              'v',
            );
          }
          if (inner > maxSpeed) maxSpeed = inner;
        }
      }
    }
    return maxSpeed;
  }
}

const INTERIOR_CHECKS = [0.25, 0.5, 0.75];

interface HermiteCoefficients {
  c0: number;
  c1: number;
  c2: number;
  c3: number;
  c4: number;
  c5: number;
}

const coefficients: HermiteCoefficients = { c0: 0, c1: 0, c2: 0, c3: 0, c4: 0, c5: 0 };

/** Quintic Hermite coefficients on piece i in s = (t - t_i)/h, into a shared scratch object. */
function hermite(
  p: Float64Array,
  v: Float64Array,
  a: Float64Array,
  i: number,
  h: number,
): HermiteCoefficients {
  const c0 = p[i];
  const c1 = h * v[i];
  const c2 = 0.5 * h * h * a[i];
  const dp = p[i + 1] - c0 - c1 - c2;
  const dv = h * v[i + 1] - c1 - 2 * c2;
  const da = h * h * a[i + 1] - 2 * c2;
  coefficients.c0 = c0;
  coefficients.c1 = c1;
  coefficients.c2 = c2;
  coefficients.c3 = 10 * dp - 4 * dv + 0.5 * da;
  coefficients.c4 = -15 * dp + 7 * dv - da;
  coefficients.c5 = 6 * dp - 3 * dv + 0.5 * da;
  return coefficients;
}

/** "speed reaches 1.00006 c", or why no speed could be had (numbers too large to differentiate). */
function speedReached(speed: number): string {
  if (Number.isFinite(speed)) return `speed reaches ${(speed / SPEED_OF_LIGHT).toPrecision(6)} c`;
  return `the velocity cannot be computed (${speed}: positions or times too large for a finite derivative)`;
}

function copyColumn(values: ArrayLike<number>, n: number, name: string): Float64Array {
  if (values.length !== n) {
    throw new PathError(`column ${name} has ${values.length} values, expected ${n}`, 0, name);
  }
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const value = values[i];
    if (!Number.isFinite(value)) {
      throw new PathError(
        `sample ${i + 1} (counting from 1) has a non-finite ${name} (${value})`,
        i,
        name,
      );
    }
    out[i] = value;
  }
  return out;
}
