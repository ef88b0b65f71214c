import { describe, expect, it } from 'vitest';
import { sampleMotion } from '../../src/path/analyticMotion';
import { uniformMotion } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';
import { COULOMB_CONSTANT, ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../../src/physics/constants';
import { fieldSample } from '../../src/physics/fieldSample';
import { evaluateFields } from '../../src/physics/fields';

const c = SPEED_OF_LIGHT;
const q = ELEMENTARY_CHARGE;

/**
 * Heaviside's field of a charge in uniform motion, from its present position
 * (Griffiths, Introduction to Electrodynamics 4th ed., Eq. 10.75; Jackson 3rd ed. §11.10):
 *   E = kq (1 - β²) / (1 - β² sin²ψ)^{3/2} · R̂/R²,  B = (v × E)/c²
 */
function heaviside(beta: number, t: number, r: [number, number, number]) {
  const Rx = r[0] - beta * c * t;
  const Ry = r[1];
  const Rz = r[2];
  const R = Math.hypot(Rx, Ry, Rz);
  const sin2 = (Ry * Ry + Rz * Rz) / (R * R);
  const scale =
    (COULOMB_CONSTANT * q * (1 - beta * beta)) / ((1 - beta * beta * sin2) ** 1.5 * R * R * R);
  const E = [scale * Rx, scale * Ry, scale * Rz];
  const v = beta * c;
  const B = [0, (-v * E[2]) / (c * c), (v * E[1]) / (c * c)];
  return { E, B };
}

function relativeError(a: number[], b: number[]): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]) / Math.hypot(b[0], b[1], b[2]);
}

describe('a charge in uniform motion', () => {
  const points: [number, number, number][] = [
    [0.3, 0.4, 0],
    [-2, 0.1, 0.5],
    [5, 0, 0.01],
    [0, 0, 1],
    [1e-3, 2e-3, -1e-3],
  ];
  for (const beta of [0.01, 0.1, 0.5, 0.9, 0.99, 0.999]) {
    it(`has the Heaviside field at β = ${beta} to 1e-12 relative`, () => {
      // Samples only cover t ∈ [-1 ns, 1 ns]; the history rule carries the motion beyond.
      const path = new SampledPath(sampleMotion(uniformMotion(beta), -1e-9, 1e-9, 5));
      const out = fieldSample();
      let worst = 0;
      for (const r of points) {
        for (const t of [-3e-9, 0, 2e-10, 4e-8]) {
          evaluateFields([{ charge: q, path }], r[0], r[1], r[2], t, out);
          const ref = heaviside(beta, t, r);
          worst = Math.max(worst, relativeError([out.ex, out.ey, out.ez], ref.E));
          worst = Math.max(worst, relativeError([out.bx, out.by, out.bz], ref.B));
          // A charge in uniform motion does not radiate.
          expect(Math.hypot(out.erx, out.ery, out.erz)).toBe(0);
        }
      }
      // Tolerance: double rounding in about a hundred operations, amplified by 1/(1-β) ≤ 1e3.
      expect(worst).toBeLessThan(1e-12);
    });
  }
});
