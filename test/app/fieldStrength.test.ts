import { describe, expect, it } from 'vitest';
import {
  bendingField,
  orbitRadius,
  undulatorField,
  undulatorStrength,
} from '../../app/scenario/fieldStrength';
import { ELECTRON_MASS, ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../../src/physics/constants';

const q = -ELEMENTARY_CHARGE;
const m = ELECTRON_MASS;

describe('field strengths of the presets', () => {
  it('gives the textbook bending radius of a 3 GeV electron in a 1 T field', () => {
    // ρ[m] = 3.3356 p[GeV/c] / B[T] (X-ray Data Booklet §2.1, from memory); 1e-4 for the rounded 3.3356.
    const restEnergy = (m * SPEED_OF_LIGHT ** 2) / ELEMENTARY_CHARGE / 1e9; // GeV
    const gamma = 3 / restEnergy;
    const beta = Math.sqrt(1 - 1 / gamma ** 2);
    const momentum = gamma * beta * restEnergy; // GeV/c
    const radius = orbitRadius(1, beta, m, q);
    expect(Math.abs(radius / (3.3356 * momentum) - 1)).toBeLessThan(1e-4);
    // The two conversions undo each other to rounding (a few ulps).
    expect(bendingField(radius, beta, m, q)).toBeCloseTo(1, 12);
  });

  it('gives the usual undulator strength K = 0.934 λu[cm] B0[T] for an electron', () => {
    // K = 0.934 λu[cm] B0[T] (X-ray Data Booklet §2.1, from memory); 1e-3 for the rounded 0.934.
    const strength = undulatorStrength(1.2, 0.03, m, q);
    expect(Math.abs(strength / (0.934 * 3 * 1.2) - 1)).toBeLessThan(1e-3);
    expect(undulatorField(strength, 0.03, m, q)).toBeCloseTo(1.2, 12);
  });
});
