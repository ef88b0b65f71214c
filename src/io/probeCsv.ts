import type { ProbeSeries } from '../analysis/probeSeries';
import type { Spectrum } from '../analysis/spectrum';

/** Columns of a probe's time series, units in the names: s, V/m, T, W/m². */
export const PROBE_HEADER =
  't_s,Ex_V_per_m,Ey_V_per_m,Ez_V_per_m,Bx_T,By_T,Bz_T,Sx_W_per_m2,Sy_W_per_m2,Sz_W_per_m2';
/** Columns of a probe's spectrum, units in the names. */
export const SPECTRUM_HEADER = 'f_Hz,energy_spectral_density_J_per_m2_Hz';

/** Row k of a time series, every number in shortest round-trip form. */
export function probeRow(s: ProbeSeries, k: number): string {
  return `${s.t[k]},${s.ex[k]},${s.ey[k]},${s.ez[k]},${s.bx[k]},${s.by[k]},${s.bz[k]},${s.sx[k]},${s.sy[k]},${s.sz[k]}`;
}

/** Row k of a spectrum. */
export function spectrumRow(s: Spectrum, k: number): string {
  return `${s.f[k]},${s.energyDensity[k]}`;
}

/** A whole series as CSV text, header first, as `conecast probe` writes it. */
export function seriesToCsv(series: ProbeSeries): string {
  const lines = [PROBE_HEADER];
  for (let k = 0; k < series.t.length; k++) lines.push(probeRow(series, k));
  return `${lines.join('\n')}\n`;
}

/** A whole spectrum as CSV text, as `conecast probe --spectrum` writes it. */
export function spectrumToCsv(spectrum: Spectrum): string {
  const lines = [SPECTRUM_HEADER];
  for (let k = 0; k < spectrum.f.length; k++) lines.push(spectrumRow(spectrum, k));
  return `${lines.join('\n')}\n`;
}
