import { describe, expect, it } from 'vitest';
import { chooseSampling, type ProbeSeries, probeSeries } from '../../src/analysis/probeSeries';
import type { Triple } from '../../src/engine/sliceSpec';
import { sampleMotion } from '../../src/path/analyticMotion';
import { circularOrbit, transverseKick } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';
import type { Charge } from '../../src/physics/charge';
import { ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../../src/physics/constants';
import { fieldSample } from '../../src/physics/fieldSample';
import { evaluateFields, poyntingVector } from '../../src/physics/fields';
import { vec3 } from '../../src/physics/vec3';

const c = SPEED_OF_LIGHT;
const q = ELEMENTARY_CHARGE;

// γ ≈ 10 (β = 0.995), turned through 50 mrad in 1 ns; knots every 100 ps over [−1, 2] ns.
const BETA = 0.995;
const KICK = new SampledPath(sampleMotion(transverseKick(BETA, 0.05, 1e-9), -1e-9, 2e-9, 31));
const KICKED: Charge[] = [{ charge: -q, path: KICK }];
const AHEAD: Triple = [30, 0.5, 0];
const BEHIND: Triple = [-30, 0.5, 0];
/** Observer windows of equal length (4 ns) holding each probe's pulse. */
const WINDOW_AHEAD: [number, number] = [30 / c - 1e-9, 30 / c + 3e-9];
const WINDOW_BEHIND: [number, number] = [30 / c - 1e-9, 30 / c + 3e-9];

// β = 0.7 on a 1 cm orbit, as in the probe readout tests.
const ORBIT = new SampledPath(sampleMotion(circularOrbit(0.01, 0.7), -3e-9, 3e-9, 2001));

const isPowerOfTwo = (n: number) => Number.isInteger(Math.log2(n));

/** Largest |E − cubic midpoint interpolation of the series| over the interior, relative to max |E|. */
function midpointMiss(charges: readonly Charge[], point: Triple, series: ProbeSeries): number {
  const n = series.t.length;
  const step = series.t[1] - series.t[0];
  const mid = probeSeries(charges, point, { from: series.t[0] + step / 2, step, samples: n });
  let miss = 0;
  let peak = 0;
  for (const [e, m] of [
    [series.ex, mid.ex],
    [series.ey, mid.ey],
    [series.ez, mid.ez],
  ]) {
    for (let k = 0; k < n; k++) peak = Math.max(peak, Math.abs(e[k]));
    for (let k = 1; k + 2 < n; k++) {
      // Four-point Lagrange interpolation at the midpoint of [t_k, t_k+1].
      const guess = (-e[k - 1] + 9 * e[k] + 9 * e[k + 1] - e[k + 2]) / 16;
      miss = Math.max(miss, Math.abs(m[k] - guess));
    }
  }
  return miss / peak;
}

describe('probeSeries', () => {
  it('gives t, E, B and S equal to evaluateFields and poyntingVector to the last bit', () => {
    const point: Triple = [0.05, 0.02, 0.01];
    const sampling = { from: 5e-10, step: 1.25e-11, samples: 40 };
    const series = probeSeries([{ charge: -q, path: ORBIT }], point, sampling);
    const f = fieldSample();
    const s = vec3();
    for (let k = 0; k < sampling.samples; k++) {
      const t = sampling.from + k * sampling.step;
      evaluateFields([{ charge: -q, path: ORBIT }], point[0], point[1], point[2], t, f);
      poyntingVector(s, f);
      // The same functions on the same doubles, which is what makes it equal `conecast fields`.
      expect(series.t[k]).toBe(t);
      expect([series.ex[k], series.ey[k], series.ez[k]]).toEqual([f.ex, f.ey, f.ez]);
      expect([series.bx[k], series.by[k], series.bz[k]]).toEqual([f.bx, f.by, f.bz]);
      expect([series.sx[k], series.sy[k], series.sz[k]]).toEqual([s.x, s.y, s.z]);
    }
  });

  it('refuses a sample count that is not a positive whole number', () => {
    expect(() => probeSeries(KICKED, AHEAD, { from: 0, step: 1e-12, samples: 0 })).toThrow(
      RangeError,
    );
    expect(() => probeSeries(KICKED, AHEAD, { from: 0, step: 1e-12, samples: 2.5 })).toThrow(
      RangeError,
    );
  });
});

describe('chooseSampling', () => {
  it('gives a probe ahead of a relativistic charge a finer step than one behind it, by about the ratio of κ = 1 − n·β (Jackson 3rd ed. §14.3, dt = κ dt_r)', () => {
    const ahead = chooseSampling(KICKED, AHEAD, ...WINDOW_AHEAD);
    const behind = chooseSampling(KICKED, BEHIND, ...WINDOW_BEHIND);
    console.log(`ahead: ${ahead.samples} samples; ${ahead.reason}`);
    console.log(`behind: ${behind.samples} samples; ${behind.reason}`);
    // κ ahead is 1 − β = 5e-3, behind 1 + β ≈ 2: 400 times; the power-of-two rounding
    // makes either step up to 2 times finer, so the ratio lies in (200, 800).
    const ratio = behind.step / ahead.step;
    expect(ratio).toBeGreaterThan(200);
    expect(ratio).toBeLessThan(800);
    for (const s of [ahead, behind]) {
      expect(isPowerOfTwo(s.samples)).toBe(true);
      // Both ends of the window are sampled (to rounding of the step).
      expect(Math.abs(s.from + (s.samples - 1) * s.step - s.to)).toBeLessThan(1e-15 * s.to);
      expect(s.reason).toContain('κ = 1 − n·β');
      expect(s.reason).toMatch(/^step \d[\d.]* [fpnµm]?s: /);
    }
    expect(ahead.reason).toMatch(/κ = 1 − n·β = 0\.00500 /);
  });

  it('resolves the pulse it samples: cubic interpolation between samples misses the field by < 1e-4 of its peak', () => {
    for (const [point, window] of [
      [AHEAD, WINDOW_AHEAD],
      [BEHIND, WINDOW_BEHIND],
    ] as const) {
      const sampling = chooseSampling(KICKED, point, ...window);
      const series = probeSeries(KICKED, point, sampling);
      const miss = midpointMiss(KICKED, point, series);
      // A coarser sampling, 1/64 of the samples, as a control: it should miss visibly.
      const coarse = probeSeries(KICKED, point, {
        from: sampling.from,
        step: sampling.step * 64,
        samples: sampling.samples / 64,
      });
      const coarseMiss = midpointMiss(KICKED, point, coarse);
      console.log(
        `at x = ${point[0]} m: midpoint miss ${miss.toExponential(2)} of the peak; with 64 times the step ${coarseMiss.toExponential(2)}`,
      );
      // Tolerance: 16 points per feature leave a four-point interpolation error of order
      // (π/16)⁴ · 3/128 ≈ 3.5e-5 of a sinusoid's amplitude; 1e-4. The control misses by > 1e-2.
      expect(miss).toBeLessThan(1e-4);
      expect(coarseMiss).toBeGreaterThan(1e-2);
    }
  });

  it('caps the sample count at maxSamples and says so', () => {
    const s = chooseSampling(KICKED, AHEAD, ...WINDOW_AHEAD, { maxSamples: 1024 });
    expect(s.samples).toBe(1024);
    expect(s.reason).toMatch(/capped at 1024 samples/);
  });

  it('takes the fewest samples for a charge at rest, and says the fields do not change', () => {
    const zero = [0];
    const still = new SampledPath({
      t: zero,
      x: zero,
      y: zero,
      z: zero,
      vx: zero,
      vy: zero,
      vz: zero,
      ax: zero,
      ay: zero,
      az: zero,
    });
    const s = chooseSampling([{ charge: q, path: still }], [1, 0, 0], 0, 1e-9);
    expect(s.samples).toBe(256);
    expect(s.reason).toMatch(/do not change/);
  });

  it('refuses an empty window and sample bounds that are not powers of two', () => {
    expect(() => chooseSampling(KICKED, AHEAD, 1e-9, 1e-9)).toThrow(RangeError);
    expect(() => chooseSampling(KICKED, AHEAD, 0, 1e-9, { maxSamples: 1000 })).toThrow(RangeError);
    expect(() =>
      chooseSampling(KICKED, AHEAD, 0, 1e-9, { minSamples: 512, maxSamples: 256 }),
    ).toThrow(RangeError);
  });
});
