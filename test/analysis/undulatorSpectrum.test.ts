import { describe, expect, it } from 'vitest';
import { chooseSampling, probeSeries } from '../../src/analysis/probeSeries';
import { energySpectrum, type Spectrum } from '../../src/analysis/spectrum';
import type { Triple } from '../../src/engine/sliceSpec';
import { sampleMotion } from '../../src/path/analyticMotion';
import { undulatorWiggle } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';
import type { Charge } from '../../src/physics/charge';
import { ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../../src/physics/constants';

const c = SPEED_OF_LIGHT;
const q = ELEMENTARY_CHARGE;

interface Undulator {
  gamma: number;
  strength: number;
  periodLength: number;
  periods: number;
  /** Mean drift β̄ of the preset. */
  drift: number;
  spectrum: Spectrum;
  samples: number;
}

/**
 * The on-axis spectrum of `periods` undulator periods at a far probe on the axis (+x),
 * 100 undulator lengths away. The path starts and ends where the wiggle's acceleration is
 * zero (phase π/2), so the straight lines outside add no edge pulse of their own. The
 * observer window holds the wave train and 3.5 times its length of quiet either side,
 * which samples the spectrum 8 times finer than the train's own 1/duration.
 */
function onAxis(gamma: number, strength: number, periodLength: number, periods: number): Undulator {
  const beta = Math.sqrt(1 - 1 / (gamma * gamma));
  const drift = Math.sqrt(beta * beta - (strength * strength) / (2 * gamma * gamma));
  const omega = (2 * Math.PI * drift * c) / periodLength;
  const t0 = Math.PI / 2 / omega;
  const t1 = t0 + (periods * 2 * Math.PI) / omega;
  // 40 knots a period with exact derivatives.
  const path = new SampledPath(
    sampleMotion(undulatorWiggle(gamma, strength, periodLength), t0, t1, periods * 40 + 1),
  );
  const charges: Charge[] = [{ charge: -q, path }];
  const distance = 100 * periods * periodLength;
  const point: Triple = [distance, 0, 0];
  const last = path.count - 1;
  const arrive = t0 + Math.hypot(distance - path.x[0], path.y[0]) / c;
  const leave = t1 + Math.hypot(distance - path.x[last], path.y[last]) / c;
  const duration = leave - arrive;
  const sampling = chooseSampling(charges, point, arrive - 3.5 * duration, leave + 3.5 * duration);
  const series = probeSeries(charges, point, sampling);
  return {
    gamma,
    strength,
    periodLength,
    periods,
    drift,
    spectrum: energySpectrum(series, 'none'),
    samples: sampling.samples,
  };
}

const computed = new Map<string, Undulator>();
/** onAxis, computed once per parameter set. */
function onAxisOnce(
  gamma: number,
  strength: number,
  periodLength: number,
  periods: number,
): Undulator {
  const key = `${gamma},${strength},${periodLength},${periods}`;
  let u = computed.get(key);
  if (u === undefined) {
    u = onAxis(gamma, strength, periodLength, periods);
    computed.set(key, u);
  }
  return u;
}

/** Bessel J_n(x) for whole n ≥ 0 from its power series (A&S Eq. 9.1.10): x ≤ 1 here. */
function besselJ(n: number, x: number): number {
  let term = (x / 2) ** n;
  for (let k = 1; k <= n; k++) term /= k;
  let sum = term;
  for (let k = 1; k < 30; k++) {
    term *= -(x * x) / (4 * k * (n + k));
    sum += term;
  }
  return sum;
}

/** The on-axis strength of odd harmonic n, F_n(K) = n²K²/(1 + K²/2)² [J_(n−1)/2(nξ) − J_(n+1)/2(nξ)]², ξ = K²/(4(1 + K²/2)). */
function harmonicStrength(n: number, strength: number): number {
  const k2 = strength * strength;
  const xi = k2 / (4 * (1 + k2 / 2));
  const j = besselJ((n - 1) / 2, n * xi) - besselJ((n + 1) / 2, n * xi);
  return ((n * n * k2) / (1 + k2 / 2) ** 2) * j * j;
}

/** The largest bin in (lo, hi) Hz, refined by a parabola through it and its neighbours. */
function peakIn(s: Spectrum, lo: number, hi: number): { f: number; value: number } {
  let top = -1;
  for (let k = 1; k + 1 < s.f.length; k++) {
    if (s.f[k] <= lo || s.f[k] >= hi) continue;
    if (top < 0 || s.energyDensity[k] > s.energyDensity[top]) top = k;
  }
  const [y0, y1, y2] = [s.energyDensity[top - 1], s.energyDensity[top], s.energyDensity[top + 1]];
  const shift = (0.5 * (y0 - y2)) / (y0 - 2 * y1 + y2);
  // The parabola's top value, so the line's height does not depend on where the bins fall.
  return { f: (top + shift) * s.df, value: y1 - 0.25 * (y0 - y2) * shift };
}

describe('the on-axis spectrum of an undulator-like wiggle', () => {
  for (const [gamma, strength, periods] of [
    [10, 1, 16],
    [10, 0.5, 20],
  ]) {
    it(`peaks at λ1 = λu/(2γ²)(1 + K²/2) within the line width λ1/N, for γ = ${gamma}, K = ${strength}, N = ${periods} (Jackson 3rd ed. §14.7; X-ray Data Booklet §2.1, undulator equation, from memory)`, () => {
      const started = performance.now();
      const u = onAxisOnce(gamma, strength, 0.01, periods);
      const lambda1 = (u.periodLength / (2 * gamma * gamma)) * (1 + (strength * strength) / 2);
      const f1 = c / lambda1;
      const first = peakIn(u.spectrum, 0.5 * f1, 1.5 * f1);
      // The same condition without the small-angle expansion: the wave slips one period
      // λu(1 − β̄)/β̄ behind the charge per undulator period.
      const slip = (u.drift * c) / (u.periodLength * (1 - u.drift));
      console.log(
        `γ = ${gamma}, K = ${strength}, N = ${periods}: ${u.samples} samples in ${(performance.now() - started).toFixed(0)} ms; first harmonic at ${(first.f / f1).toFixed(5)} f1 (undulator equation), ${(first.f / slip).toFixed(6)} of β̄c/(λu(1 − β̄))`,
      );
      // Tolerance: the line width 1/N asked for; the undulator equation's own error,
      // 1 − β̄ against (1 + K²/2)/(2γ²), is O(1/γ²) ≈ 1%.
      expect(Math.abs(first.f / f1 - 1)).toBeLessThan(1 / periods);
      // Tolerance: against the exact slip condition only the line's asymmetry and the bin
      // spacing 1/(8N) (refined by the parabola) are left; 1/(20N).
      expect(Math.abs(first.f / slip - 1)).toBeLessThan(1 / (20 * periods));
    });
  }

  it('has no second harmonic on axis and a third one at 3 f1 with F_3(K)/F_1(K) of the first line (Jackson 3rd ed. §14.7; X-ray Data Booklet §2.1, K.-J. Kim, harmonic function F_n(K), from memory)', () => {
    const u = onAxisOnce(10, 1, 0.01, 16);
    const f1 = (u.drift * c) / (u.periodLength * (1 - u.drift));
    const first = peakIn(u.spectrum, 0.5 * f1, 1.5 * f1);
    const second = peakIn(u.spectrum, 1.8 * f1, 2.2 * f1);
    const third = peakIn(u.spectrum, 2.5 * f1, 3.5 * f1);
    console.log(
      `K = 1: second harmonic ${(second.value / first.value).toExponential(2)}, third ${(third.value / first.value).toFixed(3)} of the first, at ${(third.f / f1).toFixed(4)} f1`,
    );
    // Tolerance: the even harmonics vanish on axis by symmetry; the far side of the sinc²
    // lines and the finite distance leave ~1e-3; 1e-2.
    expect(second.value / first.value).toBeLessThan(1e-2);
    // Energy per unit frequency at a line's centre ∝ N² γ² F_n(K) (photons per relative
    // bandwidth), so the ratio of the line heights is F_3/F_1 ≈ 0.487 at K = 1.
    const expected = harmonicStrength(3, u.strength) / harmonicStrength(1, u.strength);
    console.log(
      `third/first ${(third.value / first.value).toFixed(4)}, F_3/F_1 = ${expected.toFixed(4)}`,
    );
    // Tolerance: O(1/γ²) ≈ 1% corrections to the small-angle forms, and the parabola's
    // estimate of the sinc² tops (bins 1/8 of the width apart), < 1%; 3%.
    expect(Math.abs(third.value / first.value / expected - 1)).toBeLessThan(0.03);
    // Tolerance: the third line's width, 1/(3N) of its frequency.
    expect(Math.abs(third.f / (3 * f1) - 1)).toBeLessThan(1 / (3 * u.periods));
  });
});
