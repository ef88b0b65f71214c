import { describe, expect, it } from 'vitest';
import { type AppStore, createAppStore } from '../../app/store/appStore';
import { NORMAL_AXIS, SIZE_LIMITS } from '../../app/store/viewSlice';
import { planeNormal } from '../../app/view/viewGeometry';
import { NAMED_PLANES, type PlaneName, type Triple } from '../../src/engine/sliceSpec';

const PLANES: PlaneName[] = ['xy', 'xz', 'yz'];

function viewing(plane: PlaneName, center: Triple, size: [number, number]): AppStore {
  const store = createAppStore();
  store.getState().showView({ plane, center, size, resolution: [64, 64] });
  return store;
}

/** Where a world point lies in the slice plane, m from the centre along u and v. */
function inPlane(store: AppStore, point: Triple): [number, number] {
  const { plane, center } = store.getState();
  const { u, v } = NAMED_PLANES[plane];
  const d = point.map((p, k) => p - center[k]);
  const along = (axis: Triple) => d[0] * axis[0] + d[1] * axis[1] + d[2] * axis[2];
  return [along(u), along(v)];
}

/** The same, as fractions of the slice's width and height. */
function fractionInSlice(store: AppStore, point: Triple): [number, number] {
  const [a, b] = inPlane(store, point);
  const [width, height] = store.getState().size;
  return [a / width, b / height];
}

describe('zooming the slice', () => {
  it.each(PLANES)('keeps the point under the cursor where it is in the %s slice', (plane) => {
    const store = viewing(plane, [0.1, -0.2, 0.3], [0.2, 0.1]);
    const [a, b] = [0.07, -0.03]; // cursor, m from the centre along u and v
    const { u, v } = NAMED_PLANES[plane];
    const center = store.getState().center;
    const cursor = center.map((c, k) => c + a * u[k] + b * v[k]) as Triple;
    const before = fractionInSlice(store, cursor);
    for (const factor of [0.5, 3]) {
      store.getState().zoomAbout(factor, ...inPlane(store, cursor));
      const after = fractionInSlice(store, cursor);
      // Fractions of order 0.3 from sums of 0.1 m values: 1e-12 is far above double rounding.
      expect(Math.abs(after[0] - before[0])).toBeLessThan(1e-12);
      expect(Math.abs(after[1] - before[1])).toBeLessThan(1e-12);
    }
    // Binary factor 0.5 then 3 on 0.2 × 0.1 m: 1e-15 m allows the rounding of 0.2·0.5·3.
    expect(Math.abs(store.getState().size[0] - 0.3)).toBeLessThan(1e-15);
    expect(Math.abs(store.getState().size[1] - 0.15)).toBeLessThan(1e-15);
  });

  it('refuses widths outside SIZE_LIMITS and factors that are not positive', () => {
    const small = viewing('xy', [0, 0, 0], [2 * SIZE_LIMITS.min, 2 * SIZE_LIMITS.min]);
    small.getState().zoomAbout(0.25, 1e-11, 0);
    expect(small.getState().size).toEqual([2 * SIZE_LIMITS.min, 2 * SIZE_LIMITS.min]);
    expect(small.getState().center).toEqual([0, 0, 0]);
    small.getState().zoomAbout(0.5, 0, 0); // exactly the smallest width: allowed
    expect(small.getState().size[0]).toBe(SIZE_LIMITS.min);

    const large = viewing('xy', [0, 0, 0], [SIZE_LIMITS.max / 2, SIZE_LIMITS.max / 2]);
    large.getState().zoomAbout(4, 0, 0);
    expect(large.getState().size[0]).toBe(SIZE_LIMITS.max / 2);
    for (const factor of [0, -1, Number.NaN]) large.getState().zoomAbout(factor, 0, 0);
    expect(large.getState().size[0]).toBe(SIZE_LIMITS.max / 2);
  });
});

describe('panning and moving the slice', () => {
  // Binary fractions throughout, so sums are exact and compared exactly.
  it.each([
    ['xy', [1.25, 2.5, 3]],
    ['xz', [1.25, 2, 3.5]],
    ['yz', [1, 2.25, 3.5]],
  ] as const)('pans the %s slice along its u and v', (plane, expected) => {
    const store = viewing(plane, [1, 2, 3], [1, 1]);
    store.getState().panBy(0.25, 0.5);
    expect(store.getState().center).toEqual(expected);
    store.getState().panBy(Number.NaN, 0);
    expect(store.getState().center).toEqual(expected);
  });

  it.each(PLANES)('moves the %s slice along its normal only', (plane) => {
    const store = viewing(plane, [1, 2, 3], [1, 1]);
    store.getState().setOffset(-7);
    const expected: Triple = [1, 2, 3];
    expected[NORMAL_AXIS[plane]] = -7;
    expect(store.getState().center).toEqual(expected);
    // NORMAL_AXIS names the axis of u × v (see viewGeometry.planeNormal).
    const { u, v } = NAMED_PLANES[plane];
    const normal = planeNormal({
      center: [0, 0, 0],
      u,
      v,
      width: 1,
      height: 1,
      nx: 1,
      ny: 1,
      time: 0,
    });
    expect(Math.abs(normal[NORMAL_AXIS[plane]])).toBe(1);
    store.getState().setOffset(Number.POSITIVE_INFINITY);
    expect(store.getState().center).toEqual(expected);
  });
});

describe('resolution', () => {
  it.each([
    [[0.3, 0.1], 300, [300, 100]],
    [[0.1, 0.4], 200, [50, 200]],
    [[0.2, 0.2], 128, [128, 128]],
    [[1, 1e-4], 100, [100, 1]], // the short side keeps at least one point
  ] as const)('for a %j slice at %i points gives %j', (size, longSide, expected) => {
    const store = viewing('xy', [0, 0, 0], [...size]);
    store.getState().setResolution(longSide);
    expect(store.getState().resolution).toEqual(expected);
  });
});

describe('the time slice', () => {
  it('ignores non-finite times', () => {
    const store = createAppStore();
    store.getState().setTime(2e-9);
    for (const bad of [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) {
      store.getState().setTime(bad);
    }
    expect(store.getState().time).toBe(2e-9);
  });

  it('ignores rates that are not positive and finite', () => {
    const store = createAppStore();
    store.getState().setRate(5e-11);
    for (const bad of [0, -1e-10, Number.NaN, Number.POSITIVE_INFINITY]) {
      store.getState().setRate(bad);
    }
    expect(store.getState().rate).toBe(5e-11);
  });
});
