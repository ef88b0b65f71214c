import type { Triple } from '../../src/engine/sliceSpec';
import type { ScenarioPath } from '../../src/io/scenario';
import { SPEED_OF_LIGHT as c } from '../../src/physics/constants';
import type { ChartMark } from './LineChart';

/**
 * Frequencies worth marking on a probe's spectrum, from the path that made it: the critical
 * frequency of a circular orbit, f_c = ω_c/2π with ω_c = (3/2)γ³c/ρ, and the first harmonic of
 * an undulator-like wiggle seen at angle θ from its axis, λ1 = λu/(2γ²)(1 + K²/2 + γ²θ²).
 */
export function spectrumMarks(path: ScenarioPath, probe: Triple): ChartMark[] {
  if (path.kind !== 'preset') return [];
  if (path.preset === 'circularOrbit') {
    const { radius, beta } = path.params;
    const gamma = 1 / Math.sqrt((1 - beta) * (1 + beta));
    const omega = (1.5 * gamma ** 3 * c) / radius;
    return [{ x: omega / (2 * Math.PI), label: 'f_c = ω_c/2π' }];
  }
  if (path.preset === 'undulatorWiggle') {
    const { gamma, strength, period } = path.params;
    // The wiggle drifts along +x from the origin; θ is the probe's angle from that axis.
    const theta = Math.atan2(Math.hypot(probe[1], probe[2]), probe[0]);
    const wavelength =
      (period / (2 * gamma * gamma)) * (1 + (strength * strength) / 2 + (gamma * theta) ** 2);
    return [{ x: c / wavelength, label: `λ1 = ${formatWavelength(wavelength)}` }];
  }
  return [];
}

function formatWavelength(metres: number): string {
  const units: [number, string][] = [
    [1, 'm'],
    [1e-3, 'mm'],
    [1e-6, 'µm'],
    [1e-9, 'nm'],
    [1e-12, 'pm'],
  ];
  const [factor, symbol] = units.find(([f]) => metres >= f) ?? units[units.length - 1];
  return `${Number((metres / factor).toPrecision(4))} ${symbol}`;
}
