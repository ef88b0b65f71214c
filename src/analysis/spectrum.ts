import FFT from 'fft.js';
import { SPEED_OF_LIGHT, VACUUM_PERMITTIVITY } from '../physics/constants';
import type { ProbeSeries } from './probeSeries';

/** Window applied to the series before the transform. */
export type SpectrumWindow = 'hann' | 'none';
export const SPECTRUM_WINDOWS: readonly SpectrumWindow[] = ['hann', 'none'];

/**
 * One-sided energy spectral density per unit area at the probe, J/(m²·Hz), at
 * f_k = k/(N·step), k = 0 … N/2:
 *   ESD(f) = 2 ε0 c Σ_i |Ẽ_i(f)|²,  i = x, y, z,
 * with Ẽ the continuous-time Fourier transform ∫ E(t) e^{−2πift} dt approximated by step ×
 * DFT. The bins f = 0 and f = 1/(2·step) have no mirror image and take ε0 c Σ|Ẽ_i|², so
 * Σ_k ESD_k df = ε0 c Σ_n |E_n|² step exactly (Parseval) for window 'none': the energy per
 * unit area the plane-wave flux ε0 c |E|² carries past the probe over the window.
 * With 'hann' the series is multiplied by the periodic Hann window
 * w_n = sin²(πn/N) and the density divided by the window's mean square (3/8), which keeps
 * the total energy of a stationary signal; a single short pulse in the middle of the window
 * is then overstated by up to 8/3, one at its ends suppressed.
 */
export interface Spectrum {
  /** Frequencies, Hz: k·df for k = 0 … N/2. */
  f: Float64Array;
  /** Energy spectral density, J/(m²·Hz). */
  energyDensity: Float64Array;
  window: SpectrumWindow;
  /** Bin spacing 1/(N·step), Hz. */
  df: number;
}

/** Thrown when the series cannot be transformed: its length is not a power of two, or too short. */
export class SpectrumLengthError extends Error {
  constructor(readonly samples: number) {
    super(
      `a spectrum needs a power-of-two number of samples, at least 4, not ${samples} (e.g. ${2 ** Math.max(2, Math.round(Math.log2(Math.max(samples, 1))))})`,
    );
    this.name = 'SpectrumLengthError';
  }
}

/** The energy spectral density of E in the series (see Spectrum). */
export function energySpectrum(series: ProbeSeries, window: SpectrumWindow): Spectrum {
  const n = series.t.length;
  if (!(n >= 4 && (n & (n - 1)) === 0)) throw new SpectrumLengthError(n);
  if (!SPECTRUM_WINDOWS.includes(window)) {
    throw new RangeError(
      `unknown spectrum window "${window}"; use ${SPECTRUM_WINDOWS.join(' or ')}`,
    );
  }
  const step = (series.t[n - 1] - series.t[0]) / (n - 1);
  if (!(step > 0 && Number.isFinite(step))) {
    throw new RangeError(`the series times must increase, got a step of ${step} s`);
  }
  const half = n / 2;
  const df = 1 / (n * step);

  const weights = new Float64Array(n);
  let meanSquare = 1;
  if (window === 'hann') {
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const s = Math.sin((Math.PI * i) / n);
      weights[i] = s * s;
      sum += weights[i] * weights[i];
    }
    meanSquare = sum / n;
  } else {
    weights.fill(1);
  }

  const fft = new FFT(n);
  const input = new Float64Array(n);
  const output = new Float64Array(2 * n);
  const power = new Float64Array(half + 1);
  for (const component of [series.ex, series.ey, series.ez]) {
    for (let i = 0; i < n; i++) input[i] = component[i] * weights[i];
    fft.realTransform(output, input);
    for (let k = 0; k <= half; k++) {
      const re = output[2 * k];
      const im = output[2 * k + 1];
      power[k] += re * re + im * im;
    }
  }

  const f = new Float64Array(half + 1);
  const energyDensity = new Float64Array(half + 1);
  // step² turns |DFT|² into |Ẽ|²; the window's mean square undoes its loss of energy.
  const scale = (VACUUM_PERMITTIVITY * SPEED_OF_LIGHT * step * step) / meanSquare;
  for (let k = 0; k <= half; k++) {
    f[k] = k * df;
    const sides = k === 0 || k === half ? 1 : 2;
    energyDensity[k] = sides * scale * power[k];
  }
  return { f, energyDensity, window, df };
}
