import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  fitScale,
  heightAbovePlane,
  pixelToSlice,
  planeNormal,
  scaleBarLength,
  sliceToPixel,
  sliceToWorld,
} from '../../app/view/viewGeometry';
import {
  NAMED_PLANES,
  type PlaneName,
  type SliceSpec,
  type Triple,
} from '../../src/engine/sliceSpec';

function specOf(u: Triple, v: Triple, width = 0.2, height = 0.1): SliceSpec {
  return { center: [0.3, -0.1, 0.05], u, v, width, height, nx: 64, ny: 32, time: 0 };
}

const plane = (name: PlaneName) => specOf([...NAMED_PLANES[name].u], [...NAMED_PLANES[name].v]);
const dot = (p: Triple, q: Triple) => p[0] * q[0] + p[1] * q[1] + p[2] * q[2];
const lengths = fc.double({ min: 1e-9, max: 1e4, noNaN: true });
const unit = fc.double({ min: -1, max: 1, noNaN: true });
const pixels = fc.double({ min: 1, max: 4000, noNaN: true });

describe('pixels and slice coordinates', () => {
  it('pixelToSlice undoes sliceToPixel for any slice and box', () => {
    fc.assert(
      fc.property(lengths, lengths, pixels, pixels, unit, unit, (w, h, bw, bh, fa, fb) => {
        const spec = specOf([1, 0, 0], [0, 1, 0], w, h);
        const [a, b] = [fa * w, fb * h];
        const [px, py] = sliceToPixel(spec, a, b, bw, bh);
        const [a2, b2] = pixelToSlice(spec, px, py, bw, bh);
        // Rounding happens at the box's pixel coordinates: 1e-12 of the box's extent in metres
        // is far above the few ulps of one multiply, one divide and two sums.
        const tolerance = (1e-12 * (bw + bh)) / fitScale(spec, bw, bh);
        expect(Math.abs(a2 - a)).toBeLessThanOrEqual(tolerance);
        expect(Math.abs(b2 - b)).toBeLessThanOrEqual(tolerance);
      }),
    );
  });

  it('puts the slice centre at the box centre and +v upwards', () => {
    const spec = plane('xy');
    expect(sliceToPixel(spec, 0, 0, 800, 400)).toEqual([400, 200]);
    // Box 800 × 400 px fits 0.2 × 0.1 m at 4000 px/m both ways; binary-exact to 1e-9 px.
    const [px, py] = sliceToPixel(spec, 0.05, 0.025, 800, 400);
    expect(Math.abs(px - 600)).toBeLessThan(1e-9);
    expect(Math.abs(py - 100)).toBeLessThan(1e-9);
  });
});

describe('slice and world coordinates', () => {
  it.each(['xy', 'xz', 'yz'] as const)('round-trip through the %s plane', (name) => {
    const spec = plane(name);
    fc.assert(
      fc.property(unit, unit, unit, (a, b, n) => {
        const world = sliceToWorld(spec, a, b, n);
        const offset = world.map((p, k) => p - spec.center[k]) as Triple;
        // Sums of values below 2 m: 1e-15 m is a few ulps.
        expect(Math.abs(heightAbovePlane(spec, world) - n)).toBeLessThan(1e-15);
        expect(Math.abs(dot(offset, spec.u) - a)).toBeLessThan(1e-15);
        expect(Math.abs(dot(offset, spec.v) - b)).toBeLessThan(1e-15);
      }),
    );
  });

  it('takes the normal as u × v by the right-hand rule', () => {
    // x̂ × ŷ = ẑ, x̂ × ẑ = −ŷ, ŷ × ẑ = x̂.
    expect(planeNormal(plane('xy'))).toEqual([0, 0, 1]);
    expect(planeNormal(plane('xz'))).toEqual([0, -1, 0]);
    expect(planeNormal(plane('yz'))).toEqual([1, 0, 0]);
    // A turned plane: u = (cos θ, sin θ, 0), v = ẑ gives u × v = (sin θ, −cos θ, 0).
    const theta = 0.7;
    const normal = planeNormal(specOf([Math.cos(theta), Math.sin(theta), 0], [0, 0, 1]));
    // One product per component: exact up to the rounding of cos and sin (1e-15).
    expect(Math.abs(normal[0] - Math.sin(theta))).toBeLessThan(1e-15);
    expect(Math.abs(normal[1] + Math.cos(theta))).toBeLessThan(1e-15);
    expect(normal[2]).toBe(0);
  });
});

describe('scale bar', () => {
  it('gives 1, 2 or 5 × 10ⁿ, at most a fifth of the width and more than a twelfth', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-10, max: 1e5, noNaN: true }), (width) => {
        const bar = scaleBarLength(width);
        const mantissa = bar / 10 ** Math.floor(Math.log10(bar) + 1e-9);
        // The mantissa carries the rounding of 10ⁿ and a product: 1e-9 relative.
        expect([1, 2, 5].some((m) => Math.abs(mantissa / m - 1) < 1e-9)).toBe(true);
        // Just below 5 × 10ⁿ, log10 may round up a decade: allow 1e-15 relative over width/5.
        expect(bar).toBeLessThanOrEqual((width / 5) * (1 + 1e-15));
        // Steps 1 → 2 → 5 → 10 are at most 2.5× apart, so the bar exceeds width/5/2.5.
        expect(bar).toBeGreaterThan(width / 12.5);
      }),
    );
  });

  it('picks the expected bars for a few widths', () => {
    // width/5 = 0.04 → 0.02, 0.2 → 0.2, 0.6 → 0.5, 1.8e-9 → 1e-9; each to 1e-12 relative.
    for (const [width, bar] of [
      [0.2, 0.02],
      [1, 0.2],
      [3, 0.5],
      [9e-9, 1e-9],
    ]) {
      expect(Math.abs(scaleBarLength(width) / bar - 1)).toBeLessThan(1e-12);
    }
  });
});
