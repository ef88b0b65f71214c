import { describe, expect, it } from 'vitest';
import { sampleMotion } from '../../src/path/analyticMotion';
import { pathState } from '../../src/path/pathState';
import { circularOrbit } from '../../src/path/presets';
import { PathError, SampledPath } from '../../src/path/sampledPath';
import type { Charge } from '../../src/physics/charge';
import { ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../../src/physics/constants';
import { fieldSample } from '../../src/physics/fieldSample';
import { evaluateFields } from '../../src/physics/fields';
import { mulberry32, pointInBall, uniform } from '../support/random';

const c = SPEED_OF_LIGHT;
const q = ELEMENTARY_CHARGE;

/** A polynomial Σ a_k (t - t0)^k with its first two derivatives and the size of its terms. */
function polynomial(coefficients: number[], t0: number) {
  return (t: number) => {
    const x = t - t0;
    let p = 0;
    let v = 0;
    let a = 0;
    let scale = 0;
    for (let k = 0; k < coefficients.length; k++) {
      const ck = coefficients[k];
      p += ck * x ** k;
      if (k >= 1) v += k * ck * x ** (k - 1);
      if (k >= 2) a += k * (k - 1) * ck * x ** (k - 2);
      scale += Math.abs(ck) * Math.abs(x) ** k;
    }
    return { p, v, a, scale };
  };
}

/** Strictly increasing random knots: n of them with spacings in [0.3, 1.7] × h. */
function knots(random: () => number, n: number, h: number): number[] {
  const t = [0];
  for (let i = 1; i < n; i++) t.push(t[i - 1] + h * uniform(random, 0.3, 1.7));
  return t;
}

/**
 * Worst error of the path against three polynomials (one per axis) at random times inside
 * the samples, in position, velocity × h and acceleration × h² (h the piece's length),
 * each relative to the size of the polynomial's terms on that piece.
 */
function worstError(
  path: SampledPath,
  axes: ReturnType<typeof polynomial>[],
  random: () => number,
): number {
  const [t0, t1] = path.timeSpan;
  const s = pathState();
  let worst = 0;
  for (let k = 0; k < 300; k++) {
    const t = uniform(random, t0, t1);
    const piece = path.stateAt(t, s);
    // Derivatives are measured in units of the piece's own length, where rounding lives.
    const h = path.t[piece + 1] - path.t[piece];
    const got = [
      [s.px, s.vx, s.ax],
      [s.py, s.vy, s.ay],
      [s.pz, s.vz, s.az],
    ];
    for (let d = 0; d < 3; d++) {
      const ref = axes[d](t);
      // Rounding follows the data the piece is built from: take the terms' size at its ends.
      const scale = Math.max(
        ref.scale,
        axes[d](path.t[piece]).scale,
        axes[d](path.t[piece + 1]).scale,
      );
      worst = Math.max(
        worst,
        Math.abs(got[d][0] - ref.p) / scale,
        (Math.abs(got[d][1] - ref.v) * h) / scale,
        (Math.abs(got[d][2] - ref.a) * h * h) / scale,
      );
    }
  }
  return worst;
}

function columnsOf(
  t: number[],
  axes: ReturnType<typeof polynomial>[],
  which: { v: boolean; a: boolean },
) {
  const values = axes.map((f) => t.map((ti) => f(ti)));
  return {
    t,
    x: values[0].map((e) => e.p),
    y: values[1].map((e) => e.p),
    z: values[2].map((e) => e.p),
    ...(which.v
      ? {
          vx: values[0].map((e) => e.v),
          vy: values[1].map((e) => e.v),
          vz: values[2].map((e) => e.v),
        }
      : {}),
    ...(which.a
      ? {
          ax: values[0].map((e) => e.a),
          ay: values[1].map((e) => e.a),
          az: values[2].map((e) => e.a),
        }
      : {}),
  };
}

/**
 * A random polynomial of the given degree about the middle knot, each term at most L over the
 * knots, L = 0.01 c × (half span): speeds stay below 0.01 c · Σ k ≤ 0.21 c.
 */
function randomPolynomial(random: () => number, degree: number, t: number[]) {
  const mid = t[Math.floor(t.length / 2)];
  const half = Math.max(mid - t[0], t[t.length - 1] - mid);
  const size = 0.01 * c * half;
  const coefficients = Array.from(
    { length: degree + 1 },
    (_, k) => (uniform(random, -1, 1) * size) / half ** k,
  );
  return polynomial(coefficients, mid);
}

describe('the quintic Hermite pieces', () => {
  it('reproduce polynomials up to degree 5 exactly from exact p, v, a (Hermite interpolation: de Boor, A Practical Guide to Splines, ch. I, from memory)', () => {
    const random = mulberry32(5);
    let worst = 0;
    for (let trial = 0; trial < 20; trial++) {
      const h = 10 ** uniform(random, -12, 0); // from picoseconds to seconds
      const t = knots(random, 2 + Math.floor(10 * random()), h);
      const degrees = [5, trial % 6, (trial + 3) % 6];
      const axes = [0, 1, 2].map((d) => randomPolynomial(random, degrees[d], t));
      const path = new SampledPath(columnsOf(t, axes, { v: true, a: true }));
      worst = Math.max(worst, worstError(path, axes, random));
    }
    console.log(`quintic Hermite on degree ≤ 5: worst ${worst.toExponential(2)}`);
    // Tolerance: the Hermite coefficients are differences of the data times up to 15, and
    // the acceleration takes 20 × c5: a few hundred ε (~1e-13) of the terms' size.
    expect(worst).toBeLessThan(1e-12);
  });

  it('do not reproduce a degree-6 polynomial (so the check above can fail)', () => {
    const random = mulberry32(6);
    const h = 1e-9;
    const t = knots(random, 6, h);
    const axes = [0, 1, 2].map(() => randomPolynomial(random, 6, t));
    const path = new SampledPath(columnsOf(t, axes, { v: true, a: true }));
    // The remainder a_6 h⁶ s³(1-s)³/720·6! is ~(h/half span)⁶/64 ≈ 6e-5 of the terms.
    expect(worstError(path, axes, random)).toBeGreaterThan(1e-6);
  });
});

describe('the not-a-knot spline', () => {
  it('reproduces cubics exactly from positions alone (de Boor, A Practical Guide to Splines, ch. IV)', () => {
    const random = mulberry32(4);
    let worst = 0;
    for (const n of [4, 5, 6, 10, 40]) {
      for (let trial = 0; trial < 4; trial++) {
        const h = 10 ** uniform(random, -12, 0);
        const t = knots(random, n, h);
        const degrees = [3, trial % 4, (trial + 2) % 4];
        const axes = [0, 1, 2].map((d) => randomPolynomial(random, degrees[d], t));
        const path = new SampledPath(columnsOf(t, axes, { v: false, a: false }));
        worst = Math.max(worst, worstError(path, axes, random));
      }
    }
    console.log(`not-a-knot spline on cubics: worst ${worst.toExponential(2)}`);
    // Tolerance: a diagonally dominant tridiagonal solve (spacings varying 6-fold) adds
    // little to the Hermite rounding above; 1e-12.
    expect(worst).toBeLessThan(1e-12);
  });

  it('reproduces a parabola from three samples, the single not-a-knot parabola through them', () => {
    const random = mulberry32(3);
    const h = 1e-6;
    const t = knots(random, 3, h);
    const axes = [0, 1, 2].map(() => randomPolynomial(random, 2, t));
    const path = new SampledPath(columnsOf(t, axes, { v: false, a: false }));
    // Tolerance: rounding, as above.
    expect(worstError(path, axes, random)).toBeLessThan(1e-12);
  });

  it('reproduces quartic positions when the velocities are given (a spline of the cubic velocity)', () => {
    const random = mulberry32(44);
    let worst = 0;
    for (const n of [4, 7, 30]) {
      const h = 1e-9;
      const t = knots(random, n, h);
      const axes = [0, 1, 2].map(() => randomPolynomial(random, 4, t));
      const path = new SampledPath(columnsOf(t, axes, { v: true, a: false }));
      worst = Math.max(worst, worstError(path, axes, random));
    }
    // Tolerance: rounding, as above.
    expect(worst).toBeLessThan(1e-10);
  });

  it('does not reproduce a quartic from positions alone (so the checks above can fail)', () => {
    const random = mulberry32(45);
    const h = 1e-9;
    const t = knots(random, 8, h);
    const axes = [0, 1, 2].map(() => randomPolynomial(random, 4, t));
    const path = new SampledPath(columnsOf(t, axes, { v: false, a: false }));
    expect(worstError(path, axes, random)).toBeGreaterThan(1e-6);
  });
});

describe('a positions-only path', () => {
  // Circular orbit, ρ = 1 m, β = 0.5, N samples per turn over three turns; observers see
  // retarded times in the middle turn, away from the spline's end conditions.
  // Prediction: in the interior the spline's knot second derivatives of sin ωt solve
  // M_{i-1} + 4 M_i + M_{i+1} = 6 (y_{i+1} - 2 y_i + y_{i-1}) / h², giving
  // M = -ω² · 12 (1 - cos θ) / (θ² (2 + cos θ)) = -ω² (1 + θ²/12 + ...), θ = ωh = 2π/N
  // (derived here). The far field is linear in a, so its relative error is θ²/12, below
  // 1e-6 from N = 2048 (7.8e-7); N = 1024 gives 3.1e-6.
  const beta = 0.5;
  const rho = 1;
  const period = (2 * Math.PI * rho) / (beta * c);

  function worstFieldError(perTurn: number): number {
    const turns = 3;
    const n = turns * perTurn + 1;
    const exact = new SampledPath(sampleMotion(circularOrbit(rho, beta), 0, turns * period, n));
    const positions = new SampledPath(
      sampleMotion(circularOrbit(rho, beta), 0, turns * period, n, false),
    );
    expect(positions.vx).not.toEqual(exact.vx); // derivatives really were rebuilt
    const a: Charge[] = [{ charge: q, path: exact }];
    const b: Charge[] = [{ charge: q, path: positions }];
    const fa = fieldSample();
    const fb = fieldSample();
    const random = mulberry32(2048);
    let worst = 0;
    for (let k = 0; k < 300; k++) {
      const r = pointInBall(random, 10 ** uniform(random, -1, 4));
      const t = Math.hypot(r[0], r[1], r[2]) / c + uniform(random, period, 2 * period);
      evaluateFields(a, r[0], r[1], r[2], t, fa);
      evaluateFields(b, r[0], r[1], r[2], t, fb);
      const e = Math.hypot(fa.ex, fa.ey, fa.ez);
      worst = Math.max(
        worst,
        Math.hypot(fa.ex - fb.ex, fa.ey - fb.ey, fa.ez - fb.ez) / e,
        (c * Math.hypot(fa.bx - fb.bx, fa.by - fb.by, fa.bz - fb.bz)) / e,
      );
    }
    return worst;
  }

  it('reproduces the fields of exact derivatives to 1e-6 relative with 2048 samples per turn of a β = 0.5 orbit', () => {
    const coarse = worstFieldError(1024);
    const fine = worstFieldError(2048);
    const theta = (2 * Math.PI) / 2048;
    console.log(
      `positions only, circular β = 0.5: 1024/turn ${coarse.toExponential(2)}, ` +
        `2048/turn ${fine.toExponential(2)} (θ²/12 = ${((theta * theta) / 12).toExponential(2)})`,
    );
    // Tolerance: the target, 1e-6.
    expect(fine).toBeLessThan(1e-6);
    // 2048 is the fewest (in powers of two): 1024 misses it.
    expect(coarse).toBeGreaterThan(1e-6);
    // Second order: halving h divides the error by 4 (±10% for the higher orders).
    expect(coarse / fine).toBeGreaterThan(3.6);
    expect(coarse / fine).toBeLessThan(4.4);
    // And the size is the predicted θ²/12 (±10%: the θ⁴ terms and near-zone points).
    expect(Math.abs(fine / ((theta * theta) / 12) - 1)).toBeLessThan(0.1);
  });
});

describe('path validation', () => {
  it('names the sample whose time does not increase', () => {
    const cases: [number[], number][] = [
      [[0, 1, 2, 2, 3], 3],
      [[0, 1e-9, 0.5e-9, 3e-9], 2],
      [[5, 4], 1],
    ];
    for (const [t, sample] of cases) {
      const zeros = t.map(() => 0);
      let error: unknown;
      try {
        new SampledPath({ t, x: zeros, y: zeros, z: zeros });
      } catch (e) {
        error = e;
      }
      expect(error).toBeInstanceOf(PathError);
      const pathError = error as PathError;
      expect(pathError.sample).toBe(sample);
      expect(pathError.column).toBe('t');
      // Messages count samples from 1 and say so; the property counts from 0.
      expect(pathError.message).toContain(`sample ${sample + 1} (counting from 1`);
    }
  });

  /** The fraction of c quoted in a message such as "speed reaches 1.20000 c at sample 3". */
  function quotedFraction(message: string): number {
    const match = /([0-9.]+(?:e[-+]?\d+)?) c\b/.exec(message);
    return match ? Number(match[1]) : Number.NaN;
  }

  it('names the first sample at or above the speed of light, with its fraction of c', () => {
    // Uniform motion at 0.9 c (consistent positions), with given velocities of 1.2 c at
    // sample 3 and 1.5 c at sample 5. Between samples 2 and 3 the Hermite speed stays below
    // c (at most 0.9 c + 0.32 · 0.3 c at s = 0.75), so the first offence is the knot.
    const n = 8;
    const h = 1e-9;
    const t = Array.from({ length: n }, (_, i) => i * h);
    const vx = t.map(() => 0.9 * c);
    vx[3] = 1.2 * c;
    vx[5] = 1.5 * c;
    const zeros = t.map(() => 0);
    let error: unknown;
    try {
      new SampledPath({
        t,
        x: t.map((ti) => 0.9 * c * ti),
        y: zeros,
        z: zeros,
        vx,
        vy: zeros,
        vz: zeros,
      });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(PathError);
    const pathError = error as PathError;
    expect(pathError.sample).toBe(3);
    expect(pathError.message).toContain('at sample 4 (counting from 1');
    // Tolerance: the message quotes six significant digits.
    expect(Math.abs(quotedFraction(pathError.message) - 1.2)).toBeLessThan(1e-5);
  });

  it('rejects a speed of exactly c and quotes 1 c', () => {
    const t = [0, 1e-9, 2e-9];
    const zeros = [0, 0, 0];
    let error: unknown;
    try {
      new SampledPath({
        t,
        x: [0, c * 1e-9, c * 2e-9],
        y: zeros,
        z: zeros,
        vx: [c, c, c],
        vy: zeros,
        vz: zeros,
      });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(PathError);
    expect((error as PathError).sample).toBe(0);
    expect(Math.abs(quotedFraction((error as PathError).message) - 1)).toBeLessThan(1e-5);
  });

  it('rejects positions-only samples that move faster than light, naming the first sample', () => {
    const t = [0, 1e-9, 2e-9, 3e-9];
    const zeros = [0, 0, 0, 0];
    let error: unknown;
    try {
      new SampledPath({ t, x: t.map((ti) => 1.1 * c * ti), y: zeros, z: zeros });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(PathError);
    expect((error as PathError).sample).toBe(0);
    // The spline of straight-line samples has the exact slope 1.1 c.
    expect(Math.abs(quotedFraction((error as PathError).message) - 1.1)).toBeLessThan(1e-5);
  });
});

describe('the history rule', () => {
  it('moves the charge in a straight line at its end velocity, unaccelerated, outside the samples', () => {
    const beta = 0.5;
    const rho = 1;
    const period = (2 * Math.PI * rho) / (beta * c);
    const path = new SampledPath(sampleMotion(circularOrbit(rho, beta), 0, period / 3, 201));
    const first = pathState();
    const last = pathState();
    circularOrbit(rho, beta)(0, first);
    circularOrbit(rho, beta)(period / 3, last);
    const s = pathState();
    const f = fieldSample();
    for (const [dt, end, t0] of [
      [-5e-9, first, 0],
      [-1e-6, first, 0],
      [4e-9, last, period / 3],
      [1e-3, last, period / 3],
    ] as const) {
      path.stateAt(t0 + dt, s);
      const scale = rho + Math.abs(dt) * beta * c;
      // Tolerance: rounding of x + v Δt.
      expect(Math.abs(s.px - (end.px + end.vx * dt))).toBeLessThan(1e-14 * scale);
      expect(Math.abs(s.py - (end.py + end.vy * dt))).toBeLessThan(1e-14 * scale);
      expect(s.pz).toBe(0);
      expect(Math.abs(s.vx - end.vx) + Math.abs(s.vy - end.vy)).toBeLessThan(1e-14 * c);
      expect([s.ax, s.ay, s.az]).toEqual([0, 0, 0]);
      // An observer whose retarded time falls there sees no radiation field.
      const r = [s.px + 2, s.py - 1, 0.5];
      evaluateFields(
        [{ charge: q, path }],
        r[0],
        r[1],
        r[2],
        t0 + dt + Math.hypot(2, 1, 0.5) / c,
        f,
      );
      // Tolerance: rounding of t_r near t0 + dt.
      expect(Math.abs(f.tRet - (t0 + dt))).toBeLessThan(1e-15 * (1 + Math.abs(t0 + dt)));
      expect(Math.hypot(f.erx, f.ery, f.erz)).toBe(0);
    }
  });
});
