import type { PlaneName, Triple } from '../../src/engine/sliceSpec';
import type { PresetName, ScenarioPath } from '../../src/io/scenario';
import { SPEED_OF_LIGHT as c } from '../../src/physics/constants';

/** How a parameter is typed: its kind picks the units offered. */
export type ParamKind =
  | 'length'
  | 'time'
  | 'frequency'
  | 'acceleration'
  | 'speed'
  | 'gamma'
  | 'angle'
  | 'number';

export interface ParamForm {
  key: string;
  label: string;
  kind: ParamKind;
}

/** Where a preset's motion is best watched from, and when. */
export interface PresetScene {
  from: number;
  to: number;
  samples: number;
  view: { plane: PlaneName; center: Triple; size: [number, number]; time: number };
}

export interface PresetForm {
  title: string;
  /** One line on what the motion is and where it lies. */
  summary: string;
  params: ParamForm[];
  defaults: Record<string, number>;
  /** Sample span and a view sized to the motion's own length and time scales. */
  scene(params: Record<string, number>): PresetScene;
}

/** Time for light to cross half the diagonal of a square view of side `size`, s. */
const halfCrossing = (size: number) => (size * Math.SQRT1_2) / c;
const square = (size: number): [number, number] => [size, size];

export const PRESET_FORMS: Record<PresetName, PresetForm> = {
  circularOrbit: {
    title: 'Circular orbit',
    summary: 'Counter-clockwise in the xy plane about the origin, starting at (ρ, 0, 0).',
    params: [
      { key: 'radius', label: 'Radius ρ', kind: 'length' },
      { key: 'beta', label: 'Speed', kind: 'speed' },
    ],
    defaults: { radius: 0.01, beta: 0.7 },
    scene: ({ radius, beta }) => {
      const period = (2 * Math.PI * radius) / (beta * c);
      const size = 20 * radius;
      const time = 1.2 * halfCrossing(size);
      return {
        from: 0,
        to: Math.max(time * 1.5, 3 * period),
        samples: Math.min(20_000, Math.ceil((Math.max(time * 1.5, 3 * period) / period) * 120) + 1),
        view: { plane: 'xy', center: [0, 0, 0], size: square(size), time },
      };
    },
  },
  uniformMotion: {
    title: 'Uniform motion',
    summary: 'Along +x at constant speed, through the origin at t = 0: the bound field alone.',
    params: [{ key: 'beta', label: 'Speed', kind: 'speed' }],
    defaults: { beta: 0.9 },
    scene: ({ beta }) => {
      const size = 1;
      const span = size / (Math.abs(beta) * c);
      return {
        from: -span,
        to: span,
        samples: 201,
        view: { plane: 'xy', center: [0, 0, 0], size: square(size), time: 0 },
      };
    },
  },
  lineOscillation: {
    title: 'Oscillation along a line',
    summary: 'Along z about the origin, z = A sin(2πft): a small antenna. Seen in the xz plane.',
    params: [
      { key: 'amplitude', label: 'Amplitude A', kind: 'length' },
      { key: 'frequency', label: 'Frequency f', kind: 'frequency' },
    ],
    defaults: { amplitude: 0.01, frequency: 1e9 },
    scene: ({ frequency }) => {
      const wavelength = c / frequency;
      const size = 4 * wavelength;
      const time = 1.3 * halfCrossing(size);
      const periods = Math.ceil(time * frequency) + 2;
      return {
        from: 0,
        to: periods / frequency,
        samples: Math.min(50_000, periods * 48 + 1),
        view: { plane: 'xz', center: [0, 0, 0], size: square(size), time },
      };
    },
  },
  constantProperAcceleration: {
    title: 'Constant proper acceleration',
    summary: 'Along +x from rest at the origin at t = 0 (hyperbolic motion).',
    params: [{ key: 'alpha', label: 'Proper acceleration α', kind: 'acceleration' }],
    defaults: { alpha: 1e17 },
    scene: ({ alpha }) => {
      const length = (c * c) / alpha;
      const timeScale = c / alpha;
      const size = 4 * length;
      return {
        from: -3 * timeScale,
        to: 3 * timeScale,
        samples: 801,
        view: { plane: 'xy', center: [0, 0, 0], size: square(size), time: 1.5 * timeScale },
      };
    },
  },
  brakingToRest: {
    title: 'Braking to rest',
    summary: 'Along +x, slowing smoothly from βc to rest between t = 0 and the stopping time.',
    params: [
      { key: 'beta0', label: 'Initial speed', kind: 'speed' },
      { key: 'stopTime', label: 'Stopping time', kind: 'time' },
    ],
    defaults: { beta0: 0.9, stopTime: 2e-10 },
    scene: ({ beta0, stopTime }) => {
      const size = Math.max(0.2, 8 * beta0 * c * stopTime);
      const time = stopTime + 0.6 * halfCrossing(size);
      return {
        from: -stopTime,
        to: stopTime + 2 * halfCrossing(size),
        samples: 801,
        view: { plane: 'xy', center: [0, 0, 0], size: square(size), time },
      };
    },
  },
  undulatorWiggle: {
    title: 'Undulator-like wiggle',
    summary: 'Along +x with a planar wiggle in y, from the origin at t = 0.',
    params: [
      { key: 'gamma', label: 'Lorentz factor γ', kind: 'gamma' },
      { key: 'strength', label: 'Strength K', kind: 'number' },
      { key: 'period', label: 'Period λu', kind: 'length' },
    ],
    defaults: { gamma: 5, strength: 1, period: 0.02 },
    scene: ({ gamma, period }) => {
      const periods = 8;
      const beta = Math.sqrt(1 - 1 / (gamma * gamma));
      const duration = (periods * period) / (beta * c);
      const size = 1.25 * periods * period;
      return {
        from: 0,
        to: duration,
        samples: periods * 64 + 1,
        view: {
          plane: 'xy',
          center: [(periods * period) / 2, 0, 0],
          size: square(size),
          time: duration,
        },
      };
    },
  },
  transverseKick: {
    title: 'Short transverse kick',
    summary: 'Along +x, turned by the angle in the xy plane during the kick, starting at t = 0.',
    params: [
      { key: 'beta', label: 'Speed', kind: 'speed' },
      { key: 'angle', label: 'Kick angle', kind: 'angle' },
      { key: 'duration', label: 'Kick duration', kind: 'time' },
    ],
    defaults: { beta: 0.95, angle: 0.3, duration: 1e-10 },
    scene: ({ beta, duration }) => {
      const size = Math.max(0.2, 12 * beta * c * duration);
      const time = duration + 0.8 * halfCrossing(size);
      return {
        from: -halfCrossing(size),
        to: duration + 2 * halfCrossing(size),
        samples: 801,
        view: { plane: 'xy', center: [0, 0, 0], size: square(size), time },
      };
    },
  },
};

/** A preset path with the sample span its scene asks for. */
export function presetPath(preset: PresetName, params: Record<string, number>): ScenarioPath {
  const { from, to, samples } = PRESET_FORMS[preset].scene(params);
  return { kind: 'preset', preset, params, from, to, samples } as ScenarioPath;
}
