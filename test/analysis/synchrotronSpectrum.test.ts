import { describe, expect, it } from 'vitest';
import { besselK, synchrotronF } from '../../src/analysis/besselK';
import { chooseSampling, probeSeries } from '../../src/analysis/probeSeries';
import { energySpectrum, type Spectrum } from '../../src/analysis/spectrum';
import { criticalAngularFrequency, energyLossPerTurn } from '../../src/analysis/synchrotron';
import type { Triple } from '../../src/engine/sliceSpec';
import { sampleMotion } from '../../src/path/analyticMotion';
import { circularOrbit } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';
import type { Charge } from '../../src/physics/charge';
import {
  ELEMENTARY_CHARGE,
  SPEED_OF_LIGHT,
  VACUUM_PERMITTIVITY,
} from '../../src/physics/constants';
import { gaussLegendre } from '../support/quadrature';

const c = SPEED_OF_LIGHT;
const q = ELEMENTARY_CHARGE;
const RHO = 1; // m
/** Probe distance, m: far beyond γρ, where the pulse's wavefront is flat (Fresnel number γρ/D ≪ 1). */
const D = 1e4;

interface Orbit {
  gamma: number;
  beta: number;
  period: number;
  charges: Charge[];
  omegaC: number;
}

function orbit(gamma: number): Orbit {
  const beta = Math.sqrt(1 - 1 / (gamma * gamma));
  const period = (2 * Math.PI * RHO) / (beta * c);
  // 100 knots a turn with exact derivatives: the speed error between knots is ~1e-11.
  const path = new SampledPath(sampleMotion(circularOrbit(RHO, beta), -period, period, 201));
  return {
    gamma,
    beta,
    period,
    charges: [{ charge: -q, path }],
    omegaC: criticalAngularFrequency(gamma, RHO),
  };
}

/**
 * The spectrum of one pulse at a far probe at elevation ψ above the orbit plane, in the
 * direction the charge moves at t = 0 (from (ρ, 0, 0) along +y). The window is exactly one
 * turn of observer time, centred on the pulse, with the step from chooseSampling: the field
 * is periodic, so window 'none' leaks nothing and the bins fall on the harmonics of the orbit.
 */
function onePulse(o: Orbit, psi: number): { spectrum: Spectrum; samples: number } {
  const point: Triple = [RHO, D * Math.cos(psi), D * Math.sin(psi)];
  const from = D / c - o.period / 2;
  const { samples } = chooseSampling(o.charges, point, from, from + o.period);
  const series = probeSeries(o.charges, point, { from, step: o.period / samples, samples });
  return { spectrum: energySpectrum(series, 'none'), samples };
}

/** The in-plane pulse at γ = 10, computed once for the two tests that read it. */
let inPlane: { o: Orbit; spectrum: Spectrum; samples: number } | null = null;
function inPlanePulse(): { o: Orbit; spectrum: Spectrum; samples: number } {
  if (inPlane === null) {
    const o = orbit(10);
    inPlane = { o, ...onePulse(o, 0) };
  }
  return inPlane;
}

describe('the spectrum of a charge on a circular orbit', () => {
  it('has, in the orbit plane, the shape (ω/ω_c)² K_2/3²(ω/2ω_c) (Jackson 3rd ed. Eq. 14.79 at θ = 0, ω_c = (3/2)γ³c/ρ of §14.6), γ = 10', () => {
    const { o, spectrum, samples } = inPlanePulse();
    const { f, energyDensity } = spectrum;
    const n = f.length;
    const shape = new Float64Array(n);
    let peak = 0;
    for (let k = 1; k < n; k++) {
      const x = (2 * Math.PI * f[k]) / o.omegaC;
      shape[k] = x * x * besselK(2 / 3, x / 2) ** 2;
      peak = Math.max(peak, shape[k]);
    }
    // The band where the expected spectrum is above 5% of its peak; both shapes normalised over it.
    let lo = -1;
    let hi = -1;
    let sumMeasured = 0;
    let sumExpected = 0;
    for (let k = 1; k < n; k++) {
      if (shape[k] < 0.05 * peak) continue;
      if (lo < 0) lo = k;
      hi = k;
      sumMeasured += energyDensity[k];
      sumExpected += shape[k];
    }
    const g2 = o.gamma * o.gamma;
    let worst = 0;
    let worstX = 0;
    let measuredPeak = lo;
    for (let k = lo; k <= hi; k++) {
      const x = (2 * Math.PI * f[k]) / o.omegaC;
      const deviation = Math.abs(energyDensity[k] / sumMeasured / (shape[k] / sumExpected) - 1);
      // Tolerance, O(1/γ²) with the x-dependence of the two leading corrections to the
      // β → 1, small-angle forms: (i) keeping β in the phase ω(t − n·r/c) raises the argument
      // ξ = ω/2ω_c by (2/(β(1+β)))^(3/2) ≈ 1 + 9/(8γ²), lowering K² by ≈ (9/8) x/γ²; (ii) at
      // low x the pulse forms over an arc (1/γ)(2/x)^(1/3), where sin(vt/ρ) ≈ vt/ρ − (vt/ρ)³/6
      // errs by a share ~ x^(−2/3)/γ²; plus 2/γ² for the normalisation.
      const tolerance = (1.5 * x + 0.5 * x ** (-2 / 3) + 2) / g2;
      if (deviation / tolerance > worst) {
        worst = deviation / tolerance;
        worstX = x;
      }
      if (energyDensity[k] > energyDensity[measuredPeak]) measuredPeak = k;
    }
    const band = [lo, hi].map((k) => ((2 * Math.PI * f[k]) / o.omegaC).toPrecision(3));
    const peakX = (2 * Math.PI * f[measuredPeak]) / o.omegaC;
    console.log(
      `γ = 10 in plane: ${samples} samples; band x = ${band.join('…')}; worst deviation ${worst.toFixed(2)} of its tolerance at x = ${worstX.toPrecision(3)}; peak at ω = ${peakX.toFixed(3)} ω_c`,
    );
    expect(worst).toBeLessThan(1);
    // x² K_2/3²(x/2) peaks at x ≈ 0.83; the finite-γ shift is < 2% here.
    expect(Math.abs(peakX - 0.834)).toBeLessThan(0.02);
  });

  it('has, in the orbit plane, the level of Jackson Eq. 14.79 in SI: D² d²W/dA df = 2π (q²/4πε0)(1/3π²c)(ωρ/c)² γ⁻⁴ K_2/3²(ξ), γ = 10', () => {
    const { o, spectrum } = inPlanePulse();
    let worst = 0;
    for (let k = 1; k < spectrum.f.length; k++) {
      const omega = 2 * Math.PI * spectrum.f[k];
      const x = omega / o.omegaC;
      if (x < 0.2 || x > 2) continue;
      // Per unit ω per steradian (Gaussian e² → q²/4πε0), times 2π for per hertz, over D².
      const perOmega =
        ((q * q) / (4 * Math.PI * VACUUM_PERMITTIVITY)) *
        (1 / (3 * Math.PI * Math.PI * c)) *
        ((omega * RHO) / c) ** 2 *
        o.gamma ** -4 *
        besselK(2 / 3, x / 2) ** 2;
      const expected = (2 * Math.PI * perOmega) / (D * D);
      worst = Math.max(worst, Math.abs(spectrum.energyDensity[k] / expected - 1));
    }
    console.log(
      `γ = 10 in plane: level within ${worst.toExponential(2)} of Eq. 14.79 for 0.2 < x < 2`,
    );
    // Tolerance: the amplitude factor (2/(β(1+β)))² ≈ 1 + 3/(2γ²) and the ξ correction
    // (9/8) x/γ² of the previous test, at x ≤ 2: 4/γ².
    expect(worst).toBeLessThan(4 / (o.gamma * o.gamma));
  });

  it('summed over all directions follows F(x) = x ∫ₓ^∞ K_5/3, peaking near 0.29 ω_c (Jackson 3rd ed. §14.6, Eq. 14.91), γ = 6', () => {
    // γ = 6 rather than 10 keeps the 20 probes below a few seconds.
    const o = orbit(6);
    // Elevations 0 … 10/γ by Gauss–Legendre on pieces (the pulse's angular width is
    // (1/γ)(2/x)^(1/3), under 4/γ for x > 0.03); ψ → −ψ is a mirror image, and every
    // azimuth sees the same pulse once a turn, so dW/dω = 2π · 2 ∫₀ cos ψ D² d²W/dA dω dψ.
    const pieces: [number, number, number][] = [
      [0, 1.5 / o.gamma, 8],
      [1.5 / o.gamma, 4 / o.gamma, 6],
      [4 / o.gamma, 10 / o.gamma, 6],
    ];
    let total = new Float64Array(0);
    let df = 0;
    let samples = 0;
    for (const [a, b, count] of pieces) {
      const rule = gaussLegendre(count, a, b);
      for (let i = 0; i < count; i++) {
        const psi = rule.x[i];
        const pulse = onePulse(o, psi);
        samples += pulse.samples;
        const { energyDensity } = pulse.spectrum;
        df = pulse.spectrum.df;
        if (energyDensity.length > total.length) {
          const longer = new Float64Array(energyDensity.length);
          longer.set(total);
          total = longer;
        }
        // Above a probe's Nyquist frequency its pulse has no energy to speak of (that is what
        // chooseSampling chose for), so shorter spectra simply end.
        const weight = 4 * Math.PI * Math.cos(psi) * rule.w[i] * D * D;
        for (let k = 0; k < energyDensity.length; k++) total[k] += weight * energyDensity[k];
      }
    }
    // Peak position, refined by a parabola through the largest bin and its neighbours.
    let top = 1;
    for (let k = 1; k < total.length; k++) if (total[k] > total[top]) top = k;
    const [y0, y1, y2] = [total[top - 1], total[top], total[top + 1]];
    const refined = top + (0.5 * (y0 - y2)) / (y0 - 2 * y1 + y2);
    const peakX = (2 * Math.PI * refined * df) / o.omegaC;

    // Energy per turn: ∫ dW/df df against U0 = q²β³γ⁴/(3ε0ρ) (Liénard, Jackson Eq. 14.24).
    let energy = 0;
    for (let k = 0; k < total.length; k++) energy += total[k] * df;
    const u0 = energyLossPerTurn(o.gamma, RHO);

    // Shape: dW/df against 2π √3 (q²/4πε0 c) γ F(ω/ω_c) (Eq. 14.91 in SI, per hertz).
    const level =
      (2 * Math.PI * Math.sqrt(3) * q * q * o.gamma) / (4 * Math.PI * VACUUM_PERMITTIVITY * c);
    let worst = 0;
    const ratios: string[] = [];
    for (const x of [0.05, 0.1, 0.29, 0.5, 1, 2, 3]) {
      const k = Math.round((x * o.omegaC) / (2 * Math.PI * df));
      const ratio = total[k] / (level * synchrotronF((2 * Math.PI * k * df) / o.omegaC));
      ratios.push(`${x}: ${ratio.toFixed(3)}`);
      worst = Math.max(worst, Math.abs(ratio - 1));
    }
    console.log(
      `γ = 6 over 20 elevations (${samples} samples): peak at ${peakX.toFixed(4)} ω_c; energy ${(energy / u0).toFixed(5)} U0; ratio to Eq. 14.91 ${ratios.join(', ')}`,
    );
    // Tolerance: 10% on the peak, as asked; the finite-γ shift is ~ 9/(8γ²) ≈ 3%.
    expect(Math.abs(peakX / 0.2858 - 1)).toBeLessThan(0.1);
    // Tolerance, coarse: the corrections of the in-plane test, (1.5x + 0.5x^(−2/3) + 2)/γ²,
    // reach 0.19 at x = 3 for γ = 6; 0.2 throughout.
    expect(worst).toBeLessThan(0.2);
    // Tolerance: U0 is Liénard's power with the exact β, so what is left is the quadrature:
    // 20 Gauss–Legendre elevations over a distribution of width ~1/γ, the elevations past
    // 10/γ (the energy per elevation falls as (γψ)⁻⁵ there: ~4e-5 of it) and the
    // frequencies past each probe's Nyquist limit; 1e-3.
    expect(Math.abs(energy / u0 - 1)).toBeLessThan(1e-3);
  });
});
