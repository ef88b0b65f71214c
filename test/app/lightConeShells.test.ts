import { describe, expect, it } from 'vitest';
import { lightConeShells, shellSpacing } from '../../app/field/lightConeShells';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import { sampleMotion } from '../../src/path/analyticMotion';
import { uniformMotion } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';

const c = SPEED_OF_LIGHT;
// Radii are c·(t − k·spacing) in doubles, about 0.1 m: 1e-12 m is far above their rounding.
const METRES = 1e-12;

const xy: SliceSpec = {
  center: [0, 0, 0],
  u: [1, 0, 0],
  v: [0, 1, 0],
  width: 0.2,
  height: 0.2,
  nx: 10,
  ny: 10,
  time: 0,
};

/** A charge at rest at `position` for all time (the history rule extends the samples). */
function atRest(position: [number, number, number]): SampledPath {
  return new SampledPath({
    t: [0, 1e-9],
    x: [position[0], position[0]],
    y: [position[1], position[1]],
    z: [position[2], position[2]],
  });
}

describe('shellSpacing', () => {
  it('picks a 1, 2 or 5 × 10^n s interval so about eight shells span the half-diagonal', () => {
    for (const width of [1e-3, 0.2, 3, 70, 1e4]) {
      const spec = { ...xy, width, height: width / 2 };
      const spacing = shellSpacing(spec);
      const exponent = Math.floor(Math.log10(spacing) + 1e-9);
      expect([1, 2, 5]).toContainEqual(Number((spacing / 10 ** exponent).toPrecision(12)));
      const shells = (0.5 * Math.hypot(width, width / 2)) / (c * spacing);
      // Rounding to the nearest of 1, 2, 5, 10 moves the interval by at most a factor √(5/2).
      expect(shells).toBeGreaterThan(8 / Math.sqrt(2.5));
      expect(shells).toBeLessThan(8 * Math.sqrt(2.5));
    }
  });

  it('takes the number of shells asked for', () => {
    // Half-diagonal 0.5·√2·0.2 m over 4 shells of light is 1.18e-10 s, which rounds to 1e-10 s;
    // over 16 shells 2.9e-11 s, which rounds to 2e-11 s.
    expect(shellSpacing(xy, 4)).toBe(1e-10);
    expect(shellSpacing(xy, 16)).toBe(2e-11);
  });
});

describe('lightConeShells', () => {
  it('emits on the absolute grid strictly before the time, newest first, radius c(t − emitted)', () => {
    const time = 1.07e-10;
    const shells = lightConeShells(atRest([0, 0, 0]), xy, time, 2e-11, 4);
    // The latest grid instant before 1.07e-10 s is 5 × 2e-11 s.
    expect(shells.map((s) => s.emitted)).toEqual([5, 4, 3, 2].map((k) => k * 2e-11));
    for (const shell of shells) {
      expect(Math.abs(shell.radius - c * (time - shell.emitted))).toBeLessThan(METRES);
    }
  });

  it('leaves out an emission at the observation time, also when k·spacing rounds just below it', () => {
    // 3e-10 / 1e-10 rounds below 3, and 10 × 2e-11 = 1.9999999999999998e-10 < 2e-10.
    const [a] = lightConeShells(atRest([0, 0, 0]), xy, 3e-10, 1e-10, 1);
    expect(a.emitted).toBe(2 * 1e-10);
    const [b] = lightConeShells(atRest([0, 0, 0]), xy, 2e-10, 2e-11, 1);
    expect(b.emitted).toBe(9 * 2e-11);
    expect(b.radius).toBeGreaterThan(0.9 * c * 2e-11);
  });

  it('grows the shells as time advances and adds a new one', () => {
    const path = atRest([0, 0, 0]);
    const spacing = 5e-11;
    const before = lightConeShells(path, xy, 1.2e-10, spacing, 3);
    const after = lightConeShells(path, xy, 1.2e-10 + spacing, spacing, 3);
    expect(after[0].emitted).toBeGreaterThan(before[0].emitted);
    expect(after[1].emitted).toBeCloseTo(before[0].emitted, 22);
    expect(Math.abs(after[1].radius - before[0].radius - c * spacing)).toBeLessThan(METRES);
  });

  it('centres each shell on the charge where it was at emission', () => {
    const path = new SampledPath(sampleMotion(uniformMotion(0.5), -1e-9, 1e-9, 41));
    const shells = lightConeShells(path, xy, 2e-10, 5e-11, 5);
    for (const shell of shells) {
      // The quintic Hermite pieces reproduce straight-line motion to rounding (~1e-16 m here).
      expect(Math.abs(shell.center[0] - 0.5 * c * shell.emitted)).toBeLessThan(1e-12);
      expect(shell.center[1]).toBe(0);
      expect(shell.center[2]).toBe(0);
      expect(shell.cut!.a).toBeCloseTo(shell.center[0], 12);
      expect(shell.cut!.b).toBe(0);
      // The charge moves in the plane, so the cut is a great circle.
      expect(Math.abs(shell.cut!.radius - shell.radius)).toBeLessThan(METRES);
    }
  });

  it('cuts the plane in a circle of radius √(R² − d²) at distance d, none when it misses', () => {
    const d = 0.03;
    const path = atRest([0.01, -0.02, d]);
    const shells = lightConeShells(path, xy, 2e-10, 2e-11, 10);
    let missed = 0;
    for (const shell of shells) {
      if (shell.radius <= d) {
        expect(shell.cut).toBeNull();
        missed++;
        continue;
      }
      const cut = shell.cut!;
      expect(Math.abs(cut.radius - Math.sqrt(shell.radius ** 2 - d * d))).toBeLessThan(METRES);
      expect(cut.a).toBeCloseTo(0.01, 15);
      expect(cut.b).toBeCloseTo(-0.02, 15);
    }
    // Radii run from c·2e-11 ≈ 6 mm up in 6 mm steps: the five smallest stay short of 3 cm.
    expect(missed).toBe(5);
  });

  it('measures the distance along the normal of a tilted plane', () => {
    const s = Math.SQRT1_2;
    const tilted: SliceSpec = { ...xy, center: [0, 0, 0], u: [s, s, 0], v: [0, 0, 1] };
    // Normal u × v = (s, −s, 0); the charge sits 0.02 m along it.
    const path = atRest([0.02 * s, -0.02 * s, 0.01]);
    const [shell] = lightConeShells(path, tilted, 1e-9, 1e-10, 1);
    const expected = Math.sqrt(shell.radius ** 2 - 0.02 ** 2);
    expect(Math.abs(shell.cut!.radius - expected)).toBeLessThan(METRES);
    expect(shell.cut!.a).toBeCloseTo(0, 15);
    expect(shell.cut!.b).toBeCloseTo(0.01, 15);
  });

  it('gives nothing for a spacing or count that cannot be used', () => {
    const path = atRest([0, 0, 0]);
    expect(lightConeShells(path, xy, 1e-9, 0, 4)).toEqual([]);
    expect(lightConeShells(path, xy, 1e-9, 1e-10, 0)).toEqual([]);
  });
});
