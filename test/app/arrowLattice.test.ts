import { describe, expect, it } from 'vitest';
import { arrowSegments } from '../../app/field/arrowLattice';
import {
  allocateSliceFields,
  MASK_ON_CHARGE,
  planeOf,
  type SliceFields,
} from '../../src/engine/slicePlanes';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';

// Coordinates are float32 (relative 6e-8) of values of order 1 m: 1e-6 m covers their rounding.
const FLOAT32_METRES = 1e-6;

const square: SliceSpec = {
  center: [0, 0, 0],
  u: [1, 0, 0],
  v: [0, 1, 0],
  width: 1,
  height: 1,
  nx: 8,
  ny: 8,
  time: 0,
};

interface Arrow {
  tail: [number, number];
  tip: [number, number];
  heads: [number, number][];
}

function arrowsOf(segments: Float32Array): Arrow[] {
  const arrows: Arrow[] = [];
  for (let o = 0; o < segments.length; o += 18) {
    arrows.push({
      tail: [segments[o], segments[o + 1]],
      tip: [segments[o + 3], segments[o + 4]],
      heads: [
        [segments[o + 9], segments[o + 10]],
        [segments[o + 15], segments[o + 16]],
      ],
    });
  }
  return arrows;
}

const lengthOf = (a: Arrow) => Math.hypot(a.tip[0] - a.tail[0], a.tip[1] - a.tail[1]);
const middleOf = (a: Arrow): [number, number] => [
  (a.tip[0] + a.tail[0]) / 2,
  (a.tip[1] + a.tail[1]) / 2,
];

function uniformE(nx: number, ny: number, e: [number, number, number]): SliceFields {
  const fields = allocateSliceFields(nx, ny, 0);
  planeOf(fields, 'Ex').fill(e[0]);
  planeOf(fields, 'Ey').fill(e[1]);
  planeOf(fields, 'Ez').fill(e[2]);
  return fields;
}

describe('arrowSegments', () => {
  it('points every arrow along the in-plane field, full length in a uniform field', () => {
    const fields = uniformE(8, 8, [3, 4, 12]);
    const arrows = arrowsOf(arrowSegments(fields, square, 'E', 4));
    expect(arrows).toHaveLength(16);
    const cell = 0.25;
    for (const arrow of arrows) {
      const length = lengthOf(arrow);
      expect(Math.abs(length - 0.9 * cell)).toBeLessThan(FLOAT32_METRES);
      // In-plane part (3, 4, 0)/5; the z part of the field does not tilt the arrow.
      expect((arrow.tip[0] - arrow.tail[0]) / length).toBeCloseTo(0.6, 6);
      expect((arrow.tip[1] - arrow.tail[1]) / length).toBeCloseTo(0.8, 6);
      // Head strokes sweep back from the tip, one to each side of the shaft.
      const d = [0.6, 0.8];
      const sides = arrow.heads.map(
        (h) => d[0] * (h[1] - arrow.tip[1]) - d[1] * (h[0] - arrow.tip[0]),
      );
      expect(sides[0] * sides[1]).toBeLessThan(0);
      for (const h of arrow.heads) {
        expect(d[0] * (h[0] - arrow.tip[0]) + d[1] * (h[1] - arrow.tip[1])).toBeLessThan(0);
      }
    }
    const middles = arrows.map(middleOf);
    for (const [a, b] of middles) {
      // Cell centres at ±0.125, ±0.375 m.
      expect([0.125, 0.375]).toContainEqual(Number(Math.abs(a).toFixed(6)));
      expect([0.125, 0.375]).toContainEqual(Number(Math.abs(b).toFixed(6)));
    }
    const z = arrowSegments(fields, square, 'E', 4).filter((_, k) => k % 3 === 2);
    expect(z.every((value) => value === 0)).toBe(true);
  });

  it('draws no arrow on masked cells', () => {
    const fields = uniformE(8, 8, [1, 0, 0]);
    // Mask the quarter with i, j >= 4: a > 0 and b > 0.
    for (let j = 4; j < 8; j++) for (let i = 4; i < 8; i++) fields.mask[j * 8 + i] = MASK_ON_CHARGE;
    const arrows = arrowsOf(arrowSegments(fields, square, 'E', 4));
    expect(arrows).toHaveLength(12);
    for (const [a, b] of arrows.map(middleOf)) expect(a > 0 && b > 0).toBe(false);
  });

  it('skips zero, non-finite and nearly out-of-plane vectors', () => {
    const fields = uniformE(2, 2, [0, 0, 0]);
    planeOf(fields, 'Ex').set([0, Number.NaN, 1e-4, 1]);
    planeOf(fields, 'Ez').set([0, 0, 1, 0]);
    const arrows = arrowsOf(arrowSegments(fields, { ...square, nx: 2, ny: 2 }, 'E', 2));
    expect(arrows).toHaveLength(1);
    expect(middleOf(arrows[0])[0]).toBeCloseTo(0.25, 6);
    expect(middleOf(arrows[0])[1]).toBeCloseTo(0.25, 6);
  });

  it('keeps cells square on an oblong slice and projects onto its own axes', () => {
    const spec: SliceSpec = {
      ...square,
      u: [0, 1, 0],
      v: [0, 0, 1],
      width: 2,
      height: 1,
      nx: 20,
      ny: 10,
    };
    const fields = uniformE(20, 10, [5, 0, -2]);
    const arrows = arrowsOf(arrowSegments(fields, spec, 'E', 4));
    // Cell 0.5 m: 4 along the 2 m side, 2 along the 1 m side.
    expect(arrows).toHaveLength(8);
    for (const arrow of arrows) {
      // E·u = 0, E·v = −2: straight down along v.
      expect(Math.abs(arrow.tip[0] - arrow.tail[0])).toBeLessThan(FLOAT32_METRES);
      expect(arrow.tip[1] - arrow.tail[1]).toBeCloseTo(-0.45, 6);
    }
  });

  it('grows arrows with the log of |v|, from 0.2 to 0.9 of a cell', () => {
    const fields = allocateSliceFields(10, 10, 0);
    const ex = planeOf(fields, 'Ex');
    // |E| over eight decades, so a linear length would squash all but the largest.
    for (let p = 0; p < 100; p++) ex[p] = 10 ** (p / 12);
    const spec = { ...square, nx: 10, ny: 10 };
    const arrows = arrowsOf(arrowSegments(fields, spec, 'E', 10));
    expect(arrows).toHaveLength(100);
    const lengths = arrows.map(lengthOf);
    for (let k = 1; k < lengths.length; k++) {
      expect(lengths[k]).toBeGreaterThanOrEqual(lengths[k - 1] - FLOAT32_METRES);
    }
    expect(lengths[0]).toBeCloseTo(0.2 * 0.1, 6);
    expect(lengths[99]).toBeCloseTo(0.9 * 0.1, 6);
    // Between the 5% and 99% quantiles (|E| = 10^(5/12) and 10^(98/12)) the length is linear in log |E|.
    const middle = 0.2 + (0.7 * (50 - 5)) / (98 - 5);
    expect(lengths[50]).toBeCloseTo(middle * 0.1, 6);
  });

  it('points S arrows along E × B', () => {
    const fields = allocateSliceFields(4, 4, 0);
    planeOf(fields, 'Ey').fill(100);
    planeOf(fields, 'Bz').fill(100 / SPEED_OF_LIGHT);
    const spec = { ...square, nx: 4, ny: 4 };
    const arrows = arrowsOf(arrowSegments(fields, spec, 'S', 2));
    expect(arrows).toHaveLength(4);
    for (const arrow of arrows) {
      expect(arrow.tip[0] - arrow.tail[0]).toBeCloseTo(0.45, 6);
      expect(Math.abs(arrow.tip[1] - arrow.tail[1])).toBeLessThan(FLOAT32_METRES);
    }
    // E alone lies along v, so E arrows stand at right angles to the S ones.
    const e = arrowsOf(arrowSegments(fields, spec, 'E', 2));
    expect(e[0].tip[1] - e[0].tail[1]).toBeCloseTo(0.45, 6);
    expect(arrowSegments(fields, spec, 'Erad', 2)).toHaveLength(0);
  });
});
