import { describe, expect, it } from 'vitest';
import { pathState } from '../../src/path/pathState';
import { SampledPath } from '../../src/path/sampledPath';
import {
  type Point3,
  SketchError,
  type SketchSpeed,
  sketchColumns,
  strokeToControls,
} from '../../src/path/sketchPath';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';
import { mulberry32 } from '../support/random';

const c = SPEED_OF_LIGHT;

/** `count` points on a circle of radius R about the origin in the xy plane, angles 0 to `sweep`. */
function circlePoints(radius: number, sweep: number, count: number): Point3[] {
  return Array.from({ length: count }, (_, i) => {
    const angle = (sweep * i) / (count - 1);
    return [radius * Math.cos(angle), radius * Math.sin(angle), 0] as const;
  });
}

function norm(x: number, y: number, z: number): number {
  return Math.hypot(x, y, z);
}

function sketchErrorOf(run: () => unknown): SketchError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(SketchError);
    return error as SketchError;
  }
  throw new Error('expected a SketchError');
}

describe('sketchColumns on a circle', () => {
  const radius = 0.05;
  const beta = 0.9;
  // 25 points over three quarters of a turn: 11.25° between points.
  const columns = sketchColumns(
    circlePoints(radius, 1.5 * Math.PI, 25),
    { kind: 'constant', beta },
    0,
    2000,
  );
  const n = columns.t.length;
  const at = (name: 'vx' | 'vy' | 'vz' | 'ax' | 'ay' | 'az', j: number) => columns[name]![j];

  it('moves at βc at every sample', () => {
    for (let j = 0; j < n; j++) {
      // The tangent is normalised, so only rounding (a few ulp) separates |v| from βc.
      expect(Math.abs(norm(at('vx', j), at('vy', j), at('vz', j)) / (beta * c) - 1)).toBeLessThan(
        1e-14,
      );
    }
  });

  it('has |a| close to (βc)²/R, pointing at the centre', () => {
    // Uniform circular motion: a = v²/R towards the centre (any mechanics text, e.g. Goldstein,
    // Classical Mechanics, 3rd ed., §1.1; from memory). The spline only approximates the circle:
    // its curvature error measured here is 0.33% between the first and last sixth and 2.6% at
    // the not-a-knot ends, so the bounds are 0.5% inside and 3% overall.
    const expected = (beta * c) ** 2 / radius;
    for (let j = 0; j < n; j++) {
      const a = norm(at('ax', j), at('ay', j), at('az', j));
      const inside = j > n / 6 && j < (5 * n) / 6;
      expect(Math.abs(a / expected - 1)).toBeLessThan(inside ? 5e-3 : 3e-2);
      const r = norm(columns.x[j], columns.y[j], columns.z[j]);
      const inward = -(at('ax', j) * columns.x[j] + at('ay', j) * columns.y[j]) / (a * r);
      // cos of the angle to the centre: measured 1 - 9e-7 at worst.
      expect(inward).toBeGreaterThan(1 - 1e-5);
    }
  });

  it('stays on the circle and advances βcΔt of arc per step', () => {
    for (let j = 0; j < n; j++) {
      // Cubic interpolation of a circle with 11.25° steps: measured radius error 4e-5 of R.
      expect(Math.abs(norm(columns.x[j], columns.y[j], columns.z[j]) / radius - 1)).toBeLessThan(
        1e-4,
      );
    }
    for (let j = 1; j < n; j++) {
      const chord = norm(
        columns.x[j] - columns.x[j - 1],
        columns.y[j] - columns.y[j - 1],
        columns.z[j] - columns.z[j - 1],
      );
      // A chord is shorter than its arc by (κΔs)²/24 ≈ 2.3e-7 here (κ = 1/R, Δs = L/1999);
      // a larger gap would mean the arc-length inversion is off.
      expect(Math.abs(chord / (beta * c * (columns.t[j] - columns.t[j - 1])) - 1)).toBeLessThan(
        1e-6,
      );
    }
  });

  it('feeds SampledPath, whose interpolated speed stays βc', () => {
    const path = new SampledPath(columns);
    // Quintic Hermite pieces between samples 1.2e-4 m apart: measured overshoot 6e-12 of βc.
    expect(Math.abs(path.maxSpeed / (beta * c) - 1)).toBeLessThan(1e-9);
    const s = pathState();
    path.stateAt(0.5 * (columns.t[700] + columns.t[701]), s);
    expect(Math.abs(norm(s.vx, s.vy, s.vz) / (beta * c) - 1)).toBeLessThan(1e-9);
  });
});

describe('sketchColumns on straight and simple curves', () => {
  it('a straight sketch has zero acceleration and stays on its line', () => {
    // Collinear, unevenly spaced, in 3-D: with chord-length parameters the spline is exactly linear.
    const direction = [2, -1, 2].map((value) => value / 3);
    const controls = [0, 0.1, 0.15, 0.4, 1].map(
      (s) => [1 + s * direction[0], -2 + s * direction[1], 0.5 + s * direction[2]] as const,
    );
    const beta = 0.7;
    const columns = sketchColumns(controls, { kind: 'constant', beta }, -1e-9, 300);
    // Acceleration scale (βc)²/L; rounding in the spline's second differences leaves ~1e-15 of it.
    const scale = (beta * c) ** 2 / 1;
    for (let j = 0; j < columns.t.length; j++) {
      expect(norm(columns.ax![j], columns.ay![j], columns.az![j]) / scale).toBeLessThan(1e-9);
      const s = (columns.x[j] - 1) / direction[0];
      expect(Math.abs(columns.y[j] - (-2 + s * direction[1]))).toBeLessThan(1e-14);
      expect(Math.abs(columns.z[j] - (0.5 + s * direction[2]))).toBeLessThan(1e-14);
      expect(columns.vx![j] / (beta * c)).toBeCloseTo(direction[0], 14);
    }
    expect(columns.t[0]).toBe(-1e-9);
  });

  it('a ramp reaches betaEnd and takes T = 2L/(c(β0 + β1)), as uniform acceleration does', () => {
    // Uniformly accelerated motion: s = v0 τ + (v1 - v0) τ²/(2T), average speed (v0 + v1)/2
    // (any kinematics text, e.g. Halliday, Resnick & Walker, Fundamentals of Physics, ch. 2;
    // from memory). The sketch is straight with L = 3 m so L is exact.
    const [beta0, beta1] = [0.2, 0.95];
    const controls: Point3[] = [
      [0, 0, 0],
      [1, 0, 0],
      [3, 0, 0],
    ];
    const samples = 401;
    const columns = sketchColumns(
      controls,
      { kind: 'ramp', betaStart: beta0, betaEnd: beta1 },
      0,
      samples,
    );
    const duration = (2 * 3) / (c * (beta0 + beta1));
    const last = samples - 1;
    // Times and speeds come from closed forms in double precision: 1e-12 relative is rounding.
    expect(Math.abs(columns.t[last] / duration - 1)).toBeLessThan(1e-12);
    expect(Math.abs(columns.vx![0] / (beta0 * c) - 1)).toBeLessThan(1e-12);
    expect(Math.abs(columns.vx![last] / (beta1 * c) - 1)).toBeLessThan(1e-12);
    expect(columns.x[last]).toBeCloseTo(3, 12);
    const acceleration = ((beta1 - beta0) * c) / duration;
    for (const j of [0, 100, 200, 300, last]) {
      const tau = columns.t[j];
      expect(Math.abs(columns.ax![j] / acceleration - 1)).toBeLessThan(1e-12);
      expect(columns.x[j]).toBeCloseTo(
        c * (beta0 * tau + ((beta1 - beta0) * tau * tau) / (2 * duration)),
        12,
      );
    }
    expect(() => new SampledPath(columns)).not.toThrow();
  });

  it('tabulates arc length accurately: three points make the parabola y = x², of known length', () => {
    // With three points the not-a-knot spline is one parabola; here x(u) is linear, so the curve is
    // y = x² on [-1, 1], of length √5 + asinh(2)/2 (∫√(1 + 4x²) dx, any table of integrals, e.g.
    // Gradshteyn & Ryzhik 2.271; from memory). Gauss–Legendre on 16 steps per segment leaves ~1e-16.
    const beta = 0.5;
    const columns = sketchColumns(
      [
        [-1, 1, 0],
        [0, 0, 0],
        [1, 1, 0],
      ],
      { kind: 'constant', beta },
      0,
      101,
    );
    const length = beta * c * columns.t[100];
    expect(Math.abs(length / (Math.sqrt(5) + Math.asinh(2) / 2) - 1)).toBeLessThan(1e-12);
    // By symmetry the vertex is reached at half time; 1e-12 m checks the inversion of s(u).
    expect(Math.abs(columns.x[50])).toBeLessThan(1e-12);
    expect(Math.abs(columns.y[50])).toBeLessThan(1e-12);
  });
});

describe('sketchColumns refuses what cannot be travelled', () => {
  const line: Point3[] = [
    [0, 0, 0],
    [1, 0, 0],
  ];

  it.each([
    [
      { kind: 'constant', beta: 1 },
      'beta',
      'must be below 1: no charge reaches the speed of light',
    ],
    [
      { kind: 'constant', beta: 1.5 },
      'beta',
      'must be below 1: no charge reaches the speed of light',
    ],
    [{ kind: 'constant', beta: 0 }, 'beta', 'must be above 0'],
    [{ kind: 'constant', beta: -0.5 }, 'beta', 'must be above 0'],
    [{ kind: 'constant', beta: Number.NaN }, 'beta', 'must be a finite number (got NaN)'],
    [
      { kind: 'ramp', betaStart: 0.5, betaEnd: 1 },
      'betaEnd',
      'must be below 1: no charge reaches the speed of light',
    ],
    [{ kind: 'ramp', betaStart: 0, betaEnd: 0.5 }, 'betaStart', 'must be above 0'],
  ] as [SketchSpeed, string, string][])('speed %j, naming %s', (speed, field, reason) => {
    const error = sketchErrorOf(() => sketchColumns(line, speed, 0));
    expect(error.field).toBe(field);
    expect(error.message).toBe(reason);
  });

  it('fewer than two controls', () => {
    const error = sketchErrorOf(() =>
      sketchColumns([[0, 0, 0]], { kind: 'constant', beta: 0.5 }, 0),
    );
    expect([error.field, error.message]).toEqual([
      'controls',
      'a sketch needs at least 2 points (got 1)',
    ]);
  });

  it('a control repeated twice in a row, naming the repeat', () => {
    const controls: Point3[] = [
      [0, 0, 0],
      [1, 0, 0],
      [1, 0, 0],
      [2, 1, 0],
    ];
    const error = sketchErrorOf(() => sketchColumns(controls, { kind: 'constant', beta: 0.5 }, 0));
    expect([error.field, error.index, error.message]).toEqual([
      'controls',
      2,
      'repeats point 2 (counting from 1); consecutive points must differ',
    ]);
  });

  it('a non-finite control, a non-finite start time and a bad sample count', () => {
    const speed: SketchSpeed = { kind: 'constant', beta: 0.5 };
    const bad = sketchErrorOf(() =>
      sketchColumns(
        [
          [0, 0, 0],
          [Number.POSITIVE_INFINITY, 0, 0],
        ],
        speed,
        0,
      ),
    );
    expect([bad.field, bad.index]).toEqual(['controls', 1]);
    expect(sketchErrorOf(() => sketchColumns(line, speed, Number.NaN)).field).toBe('startTime');
    expect(sketchErrorOf(() => sketchColumns(line, speed, 0, 1)).field).toBe('samples');
    expect(sketchErrorOf(() => sketchColumns(line, speed, 0, 2.5)).field).toBe('samples');
  });
});

describe('strokeToControls', () => {
  /** A quarter circle of radius 1 drawn by hand: uneven steps, ±1 mm jitter, some repeated points. */
  function noisyStroke(seed: number): Point3[] {
    const random = mulberry32(seed);
    const stroke: Point3[] = [];
    for (let angle = 0; angle < Math.PI / 2; angle += 0.02 * random()) {
      stroke.push([
        Math.cos(angle) + 0.002 * (random() - 0.5),
        Math.sin(angle) + 0.002 * (random() - 0.5),
        0,
      ]);
      if (random() < 0.1) stroke.push(stroke[stroke.length - 1]);
    }
    stroke.push([0, 1, 0]);
    return stroke;
  }

  it('keeps the endpoints and returns points evenly spaced along the stroke, near the drawn curve', () => {
    const stroke = noisyStroke(42);
    const controls = strokeToControls(stroke);
    expect(controls).toHaveLength(8);
    expect(controls[0]).toEqual(stroke[0]);
    expect(controls[7]).toEqual(stroke[stroke.length - 1]);
    const chords = controls
      .slice(1)
      .map((point, i) =>
        norm(point[0] - controls[i][0], point[1] - controls[i][1], point[2] - controls[i][2]),
      );
    const mean = chords.reduce((sum, chord) => sum + chord) / chords.length;
    for (const chord of chords) {
      // Equal arcs of a circle have equal chords; what is left is jitter that smoothing did not
      // remove (measured 3e-4), so 1e-2 still catches uneven spacing.
      expect(Math.abs(chord / mean - 1)).toBeLessThan(1e-2);
    }
    for (const point of controls) {
      // Within a few jitter amplitudes (1 mm) of the unit circle.
      expect(Math.abs(norm(point[0], point[1], point[2]) - 1)).toBeLessThan(5e-3);
    }
    expect(() => sketchColumns(controls, { kind: 'constant', beta: 0.5 }, 0)).not.toThrow();
  });

  it('returns the count asked for', () => {
    expect(strokeToControls(noisyStroke(7), 2)).toHaveLength(2);
    expect(strokeToControls(noisyStroke(7), 30)).toHaveLength(30);
  });

  it('refuses a stroke with fewer than two distinct points', () => {
    const dot = sketchErrorOf(() =>
      strokeToControls([
        [1, 2, 0],
        [1, 2, 0],
        [1, 2, 0],
      ]),
    );
    expect([dot.field, dot.message]).toEqual([
      'controls',
      'a stroke needs at least 2 distinct points',
    ]);
    expect(sketchErrorOf(() => strokeToControls([])).field).toBe('controls');
    expect(sketchErrorOf(() => strokeToControls(noisyStroke(1), 1)).field).toBe('controls');
  });
});
