import { describe, expect, it } from 'vitest';
import { type AnalyticMotion, sampleMotion } from '../../src/path/analyticMotion';
import { pathState } from '../../src/path/pathState';
import { circularOrbit, lineOscillation } from '../../src/path/presets';
import { type PathColumns, SampledPath } from '../../src/path/sampledPath';
import { ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../../src/physics/constants';
import { fieldSample } from '../../src/physics/fieldSample';
import { evaluateFields } from '../../src/physics/fields';
import { retardedSolution, solveRetardedTime } from '../../src/physics/retardedTime';
import { mulberry32, pointInBall, uniform, unitVector } from '../support/random';
import { bisectDelay } from '../support/retarded';

const c = SPEED_OF_LIGHT;
const q = ELEMENTARY_CHARGE;
const EPS = Number.EPSILON;

/** Scale factors λ: from nanometres and attoseconds (λ = 1e-9 of a metre-sized motion) to km. */
const SCALES = [1e-9, 3.7e-8, 1e-6, 1e-4, 1e-2, 1, 10, 1e3];

interface Base {
  name: string;
  motion: AnalyticMotion;
  /** Size of the motion (m), its period (s) and its peak speed (m/s). */
  size: number;
  period: number;
  speed: number;
}

const bases: Base[] = [
  {
    // ρ = 1 m, period 2πρ/(βc) ≈ 42 ns; at λ = 1e-9: 1 nm and 42 as.
    name: 'a circular orbit at β = 0.5',
    motion: circularOrbit(1, 0.5),
    size: 1,
    period: (2 * Math.PI) / (0.5 * c),
    speed: 0.5 * c,
  },
  {
    // ρ = 1 m, period ≈ 2.1 ms; at λ = 1e3: 1 km and 2.1 s.
    name: 'a slow circular orbit at β = 1e-5',
    motion: circularOrbit(1, 1e-5),
    size: 1,
    period: (2 * Math.PI) / (1e-5 * c),
    speed: 1e-5 * c,
  },
  {
    // A = 0.1 m at 300 MHz: peak β = 2π A f/c = 0.63, period 3.3 ns.
    name: 'a line oscillation at peak β = 0.63',
    motion: lineOscillation(0.1, 3e8),
    size: 0.1,
    period: 1 / 3e8,
    speed: 2 * Math.PI * 0.1 * 3e8,
  },
];

/**
 * The base path: 40 samples per period over ±10 periods. Finer sampling makes the quintic
 * pieces' acceleration more sensitive to the rounding of the sampled positions, as 1/(ωh)²
 * (measured: 100 per period doubles the worst error below, 200 per period reaches 1e-11).
 */
function basePath({ motion, period }: Base): PathColumns {
  return sampleMotion(motion, -10 * period, 10 * period, 801);
}

/**
 * The path scaled by λ in space and time, r_s'(t) = λ r_s(t/λ): times and positions times λ,
 * velocities unchanged, accelerations over λ. Each product is rounded, as a file at that scale
 * would be.
 */
function scaled(columns: PathColumns, lambda: number): SampledPath {
  const map = (values: ArrayLike<number> | undefined, f: number) =>
    Float64Array.from(values as ArrayLike<number>, (x) => x * f);
  return new SampledPath({
    t: map(columns.t, lambda),
    x: map(columns.x, lambda),
    y: map(columns.y, lambda),
    z: map(columns.z, lambda),
    vx: map(columns.vx, 1),
    vy: map(columns.vy, 1),
    vz: map(columns.vz, 1),
    ax: map(columns.ax, 1 / lambda),
    ay: map(columns.ay, 1 / lambda),
    az: map(columns.az, 1 / lambda),
  });
}

/**
 * Observers (position, time) of the base motion: half at 0.05 to 100 motion sizes from its
 * centre, half just beside the path (0.03 to 0.3 sizes from the charge at a random time), at
 * times whose retarded times fall within ±1 period of t = 0, inside the samples.
 */
function observers(base: Base, count: number, seed: number): { r: number[]; t: number }[] {
  const random = mulberry32(seed);
  const s = pathState();
  const out: { r: number[]; t: number }[] = [];
  for (let k = 0; k < count; k++) {
    const t0 = uniform(random, -1, 1) * base.period;
    let r: number[];
    if (k % 2 === 0) {
      r = pointInBall(random, base.size * 10 ** uniform(random, Math.log10(0.05), 2));
    } else {
      base.motion(t0, s);
      const u = unitVector(random);
      const d = base.size * 10 ** uniform(random, Math.log10(0.03), Math.log10(0.3));
      r = [s.px + d * u[0], s.py + d * u[1], s.pz + d * u[2]];
    }
    // Observing at t0 + |r - r_s(t0)|/c puts the retarded time near t0.
    base.motion(t0, s);
    const t = t0 + Math.hypot(r[0] - s.px, r[1] - s.py, r[2] - s.pz) / c;
    out.push({ r, t });
  }
  return out;
}

function relative(a: readonly number[], b: readonly number[]): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]) / Math.hypot(b[0], b[1], b[2]);
}

describe('a path scaled by λ in space and time', () => {
  for (const base of bases) {
    it(`has E and B scaled by 1/λ² and the delay by λ, to 1e-12, for λ from 1e-9 to 1e3: ${base.name}`, () => {
      const columns = basePath(base);
      const reference = new SampledPath(columns);
      const points = observers(base, 200, 0x5ca1e + Math.round(base.size * 10));
      const f = fieldSample();
      const g = fieldSample();
      const lines: string[] = [];
      let worst = 0;
      let worstCondition = 0;
      for (const lambda of SCALES) {
        const path = scaled(columns, lambda);
        let worstE = 0;
        let worstB = 0;
        let worstDelay = 0;
        for (const { r, t } of points) {
          evaluateFields([{ charge: q, path: reference }], r[0], r[1], r[2], t, f);
          evaluateFields(
            [{ charge: q, path }],
            lambda * r[0],
            lambda * r[1],
            lambda * r[2],
            lambda * t,
            g,
          );
          const l2 = lambda * lambda;
          const e = [f.ex, f.ey, f.ez];
          // E'(λr, λt) = E(r, t)/λ², likewise B: every term of the Liénard–Wiechert field
          // (Jackson 3rd ed. Eq. 14.14) is kq/R² or kq a/(c² R), and R → λR, a → a/λ.
          worstE = Math.max(worstE, relative([g.ex * l2, g.ey * l2, g.ez * l2], e));
          // B against its natural scale |E|/c: for slow charges B ≈ β|E|/c is the small
          // remainder of n × E and carries rounding of |E|/c.
          const dB = Math.hypot(g.bx * l2 - f.bx, g.by * l2 - f.by, g.bz * l2 - f.bz);
          worstB = Math.max(worstB, (c * dB) / Math.hypot(e[0], e[1], e[2]));
          // t - t_r = |r - r_s(t_r)|/c scales with λ (Jackson 3rd ed. Eq. 14.2).
          worstDelay = Math.max(worstDelay, Math.abs(g.delay / lambda - f.delay) / f.delay);
          // Condition of the comparison: the charge's position rounding ε(|r| + |r_s|), and
          // the time rounding ε|t|, which moves it by |v|ε|t| and turns its acceleration by
          // ωε|t|, all read against the distance R.
          worstCondition = Math.max(
            worstCondition,
            (Math.hypot(r[0], r[1], r[2]) + base.size + base.speed * Math.abs(t)) / f.distance +
              (2 * Math.PI * Math.abs(t)) / base.period,
          );
        }
        worst = Math.max(worst, worstE, worstB, worstDelay);
        lines.push(
          `λ = ${lambda}: E ${worstE.toExponential(1)}, B ${worstB.toExponential(1)} of |E|/c, delay ${worstDelay.toExponential(1)}`,
        );
      }
      console.log(
        `${base.name}, scaled against λ = 1 (worst relative; condition <= ${worstCondition.toFixed(0)}):\n  ${lines.join('\n  ')}`,
      );
      // Tolerance: scaling rounds every input once more (ε/2 relative), which the comparison
      // amplifies by its condition number: the charge's position rounding ε(|r| + |r_s|) and
      // the time rounding ε|t| (moving the charge by |v|ε|t|, turning its acceleration by
      // ωε|t|), read against R ≥ 0.03 sizes: at most ~240 here (logged); and the pieces'
      // acceleration, which takes the positions' rounding times ~1/(ωh)² ≈ 40 at 40 samples
      // per period. Together ~1e3 ε ≈ 2e-13 (measured 4.5e-13); 1e-12 leaves a factor 2.
      expect(worst).toBeLessThan(1e-12);
    });
  }

  it('keeps the retarded delay to rounding at every scale, from nm and as to km and s (against bisection)', () => {
    const state = pathState();
    const solution = retardedSolution();
    const lines: string[] = [];
    let worstAll = 0;
    for (const base of bases) {
      const columns = basePath(base);
      const points = observers(base, 40, 0xde1a7 + Math.round(base.size * 10));
      for (const lambda of [1e-9, 1e-3, 1e3]) {
        const path = scaled(columns, lambda);
        let worst = 0;
        let worstRelative = 0;
        for (const { r: r0, t: t0 } of points) {
          const r = r0.map((x) => lambda * x);
          const t = lambda * t0;
          solveRetardedTime(path, r[0], r[1], r[2], t, state, solution);
          const tau = bisectDelay(path, r, t);
          const dist = Math.hypot(r[0] - state.px, r[1] - state.py, r[2] - state.pz);
          const speed = Math.hypot(state.vx, state.vy, state.vz);
          // The rounding scale σ of g(τ) = cτ - |r - r_s(t - τ)| (as in retardedTime.test.ts):
          // an ulp of each of cτ, |r|, |r_s| and of t_r, which moves r_s by |v| ulp(t_r).
          const sigma =
            EPS *
            (c * solution.delay +
              Math.hypot(r[0], r[1], r[2]) +
              Math.hypot(state.px, state.py, state.pz) +
              speed * Math.abs(solution.tRet));
          const nv =
            ((r[0] - state.px) * state.vx +
              (r[1] - state.py) * state.vy +
              (r[2] - state.pz) * state.vz) /
            dist;
          // Two roots of the rounded g differ by their residuals over its slope g' = c - n·v.
          worst = Math.max(worst, (Math.abs(solution.delay - tau) * (c - nv)) / sigma);
          worstRelative = Math.max(worstRelative, Math.abs(solution.delay - tau) / tau);
        }
        worstAll = Math.max(worstAll, worst);
        lines.push(
          `${base.name}, λ = ${lambda}: |Δτ|·g' <= ${worst.toFixed(2)} σ, relative ${worstRelative.toExponential(1)}`,
        );
      }
    }
    console.log(`retarded delay against bisection:\n  ${lines.join('\n  ')}`);
    // Tolerance: 16 σ, both solves' rounding bands added (as in retardedTime.test.ts); σ is
    // relative to the scale, so the same bound holds at every λ.
    expect(worstAll).toBeLessThan(16);
  });
  it('reports the delay itself, to rounding, 1 m to 1 km from a 1 km orbit observed 1 to 2 s on', () => {
    // The slow orbit at λ = 1e3: ρ = 1 km, β = 1e-5, period 2.1 s. The delay (3 ns to 3 µs)
    // is tiny against t, so t - t_r formed from the reported t_r keeps only ~ε t/τ of it.
    const base = bases[1];
    const path = scaled(basePath(base), 1e3);
    const random = mulberry32(0x6f1);
    const state = pathState();
    const f = fieldSample();
    let worst = 0;
    let worstDelay = 0;
    let worstDifference = 0;
    for (let k = 0; k < 200; k++) {
      const t = uniform(random, 1, 2);
      path.stateAt(t, state);
      const u = unitVector(random);
      const d = 10 ** uniform(random, 0, 3);
      const r = [state.px + d * u[0], state.py + d * u[1], state.pz + d * u[2]];
      evaluateFields([{ charge: q, path }], r[0], r[1], r[2], t, f);
      const tau = bisectDelay(path, r, t);
      // σ as in the test above, for the state at the returned delay.
      path.stateAt(t - f.delay, state);
      const sigma =
        EPS *
        (c * f.delay +
          Math.hypot(r[0], r[1], r[2]) +
          Math.hypot(state.px, state.py, state.pz) +
          Math.hypot(state.vx, state.vy, state.vz) * Math.abs(t - f.delay));
      // g' = c - n·v >= c(1 - β) ≈ c here.
      worst = Math.max(worst, (Math.abs(f.delay - tau) * c * (1 - 1e-5)) / sigma);
      worstDelay = Math.max(worstDelay, Math.abs(f.delay - tau) / tau);
      worstDifference = Math.max(worstDifference, Math.abs(t - f.tRet - tau) / tau);
    }
    console.log(
      `1 km orbit at t = 1…2 s, 1 m to 1 km away: delay <= ${worst.toFixed(2)} σ from bisection ` +
        `(relative ${worstDelay.toExponential(1)}); t - t_r formed afterwards: ${worstDifference.toExponential(1)}`,
    );
    // Tolerance: 16 σ, both solves' rounding bands added, as above.
    expect(worst).toBeLessThan(16);
  });
});
