import { describe, expect, it } from 'vitest';
import type { ProbeSeries } from '../../src/analysis/probeSeries';
import {
  energySpectrum,
  SPECTRUM_WINDOWS,
  SpectrumLengthError,
  type SpectrumWindow,
} from '../../src/analysis/spectrum';
import { SPEED_OF_LIGHT, VACUUM_PERMITTIVITY } from '../../src/physics/constants';

const flux = VACUUM_PERMITTIVITY * SPEED_OF_LIGHT;

/** A synthetic series with E given per component; B and S left zero (unused by the spectrum). */
function syntheticSeries(
  n: number,
  step: number,
  field: (t: number) => [number, number, number],
): ProbeSeries {
  const column = () => new Float64Array(n);
  const s: ProbeSeries = {
    t: column(),
    ex: column(),
    ey: column(),
    ez: column(),
    bx: column(),
    by: column(),
    bz: column(),
    sx: column(),
    sy: column(),
    sz: column(),
  };
  for (let k = 0; k < n; k++) {
    s.t[k] = k * step;
    [s.ex[k], s.ey[k], s.ez[k]] = field(s.t[k]);
  }
  return s;
}

/** ε0 c Σ|E|² step: the energy per unit area of the series, J/m². */
function timeEnergy(s: ProbeSeries, step: number): number {
  let sum = 0;
  for (let k = 0; k < s.t.length; k++) sum += s.ex[k] ** 2 + s.ey[k] ** 2 + s.ez[k] ** 2;
  return flux * sum * step;
}

function spectralEnergy(esd: Float64Array, df: number, from = 0, to = esd.length - 1): number {
  let sum = 0;
  for (let k = Math.max(0, from); k <= Math.min(esd.length - 1, to); k++) sum += esd[k];
  return sum * df;
}

// σ = 10 ps Gaussian pulses, 16 samples per σ, centred in a 256 σ window.
const SIGMA = 1e-11;
const STEP = SIGMA / 16;
const N = 4096;
const T0 = (N / 2) * STEP;
const gauss = (t: number, sigma: number) => Math.exp(-((t - T0) ** 2) / (2 * sigma * sigma));

describe('energySpectrum', () => {
  it('lists f_k = k/(N·step) for k = 0 … N/2 with df = 1/(N·step)', () => {
    const spectrum = energySpectrum(
      syntheticSeries(N, STEP, (t) => [gauss(t, SIGMA), 0, 0]),
      'none',
    );
    expect(spectrum.f).toHaveLength(N / 2 + 1);
    // Tolerance: the step is recovered from t as (t_N−1 − t_0)/(N − 1), a few roundings.
    expect(Math.abs(spectrum.df * N * STEP - 1)).toBeLessThan(1e-12);
    for (const k of [1, 7, N / 2]) expect(spectrum.f[k]).toBe(k * spectrum.df);
    expect(spectrum.window).toBe('none');
  });

  it("keeps the pulse's energy (Parseval): Σ ESD df = ε0 c Σ|E|² step to 1e-9 for window 'none'", () => {
    const series = syntheticSeries(N, STEP, (t) => [
      3e3 * gauss(t, SIGMA),
      -1e3 * gauss(t - 5 * SIGMA, 2 * SIGMA),
      5e2 * gauss(t + 3 * SIGMA, 0.5 * SIGMA) * Math.cos(t / SIGMA),
    ]);
    const spectrum = energySpectrum(series, 'none');
    const inTime = timeEnergy(series, STEP);
    const inFrequency = spectralEnergy(spectrum.energyDensity, spectrum.df);
    console.log(
      `Parseval: relative difference ${Math.abs(inFrequency / inTime - 1).toExponential(2)}`,
    );
    // Tolerance: the discrete Parseval identity is exact; what is left is the rounding of a
    // 4096-point FFT (~1e-15 · log N) and of the step recovered from t.
    expect(Math.abs(inFrequency / inTime - 1)).toBeLessThan(1e-9);
  });

  it('gives a Gaussian pulse the density 2 ε0 c |E0 σ √(2π) e^(−2π²σ²f²)|² of its continuous Fourier transform (standard transform pair, e.g. Bracewell, The Fourier Transform and Its Applications, from memory)', () => {
    const e0 = 2e3;
    const spectrum = energySpectrum(
      syntheticSeries(N, STEP, (t) => [0, e0 * gauss(t, SIGMA), 0]),
      'none',
    );
    let worst = 0;
    for (let k = 1; k < spectrum.f.length; k++) {
      const amplitude =
        e0 * SIGMA * Math.sqrt(2 * Math.PI) * Math.exp(-2 * (Math.PI * SIGMA * spectrum.f[k]) ** 2);
      const exact = 2 * flux * amplitude * amplitude;
      if (exact < 1e-6 * 2 * flux * (e0 * SIGMA) ** 2 * 2 * Math.PI) break;
      worst = Math.max(worst, Math.abs(spectrum.energyDensity[k] / exact - 1));
    }
    // Tolerance: truncation at ±128 σ (e^−8192) and aliasing from 16 samples per σ
    // (e^(−2π²·256) ≈ 0) are nil; rounding of the FFT at densities down to 1e-6 of the
    // peak amplifies 1e-16 to ~1e-12.
    expect(worst).toBeLessThan(1e-9);
  });

  it('puts a pure sine in its own bin with window none, and in that bin and its two neighbours (1/4 : 1 : 1/4) with Hann, keeping its energy (Harris, Proc. IEEE 66, 51, 1978)', () => {
    const n = 1024;
    const step = 1e-12;
    const k0 = 100;
    const f0 = k0 / (n * step);
    const series = syntheticSeries(n, step, (t) => [
      0,
      0,
      40 * Math.sin(2 * Math.PI * f0 * t + 0.3),
    ]);
    const total = timeEnergy(series, step);
    const none = energySpectrum(series, 'none');
    const hann = energySpectrum(series, 'hann');
    // Tolerance: an exact whole number of cycles, so only FFT rounding (~1e-13) leaks.
    expect(Math.abs((none.energyDensity[k0] * none.df) / total - 1)).toBeLessThan(1e-12);
    expect(
      Math.abs(spectralEnergy(hann.energyDensity, hann.df, k0 - 1, k0 + 1) / total - 1),
    ).toBeLessThan(1e-12);
    // Hann on a bin: DFT weights −1/4, 1/2, −1/4 in amplitude, so 1/6, 2/3, 1/6 of the energy.
    expect(Math.abs((hann.energyDensity[k0] * hann.df) / total - 2 / 3)).toBeLessThan(1e-12);
    expect(Math.abs((hann.energyDensity[k0 + 1] * hann.df) / total - 1 / 6)).toBeLessThan(1e-12);
    // Dividing by the window's mean square (3/8) keeps the total for a stationary signal.
    expect(Math.abs(spectralEnergy(hann.energyDensity, hann.df) / total - 1)).toBeLessThan(1e-12);
  });

  it('puts a sine between bins at its frequency with either window: the nearest bin peaks and the energy stays close', () => {
    const n = 1024;
    const step = 1e-12;
    const f0 = 100.37 / (n * step);
    const series = syntheticSeries(n, step, (t) => [10 * Math.cos(2 * Math.PI * f0 * t), 0, 0]);
    const total = timeEnergy(series, step);
    const near: Record<SpectrumWindow, number> = { none: 0, hann: 0 };
    for (const window of SPECTRUM_WINDOWS) {
      const s = energySpectrum(series, window);
      let peak = 0;
      for (let k = 1; k < s.f.length; k++) if (s.energyDensity[k] > s.energyDensity[peak]) peak = k;
      expect(peak).toBe(100);
      near[window] = spectralEnergy(s.energyDensity, s.df, 97, 103) / total;
    }
    console.log(`share within ±3 bins: none ${near.none.toFixed(4)}, hann ${near.hann.toFixed(6)}`);
    // Tolerance: with a rectangular window a share ≈ sin²(πδ)/(π² Δk²) sits Δk bins away
    // (δ = 0.37 off the bin), ≈ 5% beyond ±3 bins, so > 0.9; Hann's leakage falls as 1/Δk⁶,
    // leaving < 1e-3, and its 3/8 scaling is exact only on a bin (Harris 1978, from memory).
    expect(near.none).toBeGreaterThan(0.9);
    expect(near.hann).toBeGreaterThan(0.999);
    expect(near.hann).toBeLessThan(1.001);
  });

  it('refuses a series whose length is not a power of two (at least 4), and an unknown window', () => {
    const odd = syntheticSeries(1000, STEP, () => [1, 0, 0]);
    expect(() => energySpectrum(odd, 'none')).toThrow(SpectrumLengthError);
    expect(() => energySpectrum(odd, 'none')).toThrow(/power-of-two number of samples/);
    expect(() =>
      energySpectrum(
        syntheticSeries(2, STEP, () => [1, 0, 0]),
        'hann',
      ),
    ).toThrow(SpectrumLengthError);
    expect(() =>
      energySpectrum(
        syntheticSeries(8, STEP, () => [1, 0, 0]),
        'boxcar' as SpectrumWindow,
      ),
    ).toThrow(RangeError);
  });
});
