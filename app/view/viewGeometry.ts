import type { SliceSpec, Triple } from '../../src/engine/sliceSpec';

/** Pixels per metre when the slice is fitted into a box of `width` × `height` pixels. */
export function fitScale(spec: SliceSpec, width: number, height: number): number {
  return Math.min(width / spec.width, height / spec.height);
}

/** In-plane point (a, b), m from the slice centre, under pixel (px, py) of a box showing the slice. */
export function pixelToSlice(
  spec: SliceSpec,
  px: number,
  py: number,
  width: number,
  height: number,
): [number, number] {
  const scale = fitScale(spec, width, height);
  return [(px - width / 2) / scale, (height / 2 - py) / scale];
}

/** Pixel of in-plane point (a, b) in a box of `width` × `height` showing the slice. */
export function sliceToPixel(
  spec: SliceSpec,
  a: number,
  b: number,
  width: number,
  height: number,
): [number, number] {
  const scale = fitScale(spec, width, height);
  return [width / 2 + a * scale, height / 2 - b * scale];
}

/** World point (m) of in-plane point (a, b) lifted by `n` along the plane's normal. */
export function sliceToWorld(spec: SliceSpec, a: number, b: number, n = 0): Triple {
  const normal = planeNormal(spec);
  return [0, 1, 2].map(
    (k) => spec.center[k] + a * spec.u[k] + b * spec.v[k] + n * normal[k],
  ) as Triple;
}

/** Unit normal u × v of the slice. */
export function planeNormal(spec: SliceSpec): Triple {
  const { u, v } = spec;
  return [u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]];
}

/** Distance of a world point from the slice plane along its normal, m. */
export function heightAbovePlane(spec: SliceSpec, point: Triple): number {
  const normal = planeNormal(spec);
  return (
    (point[0] - spec.center[0]) * normal[0] +
    (point[1] - spec.center[1]) * normal[1] +
    (point[2] - spec.center[2]) * normal[2]
  );
}

/** A round length (1, 2 or 5 × 10ⁿ m) near a fifth of the slice width, for the scale bar. */
export function scaleBarLength(width: number): number {
  const target = width / 5;
  const decade = 10 ** Math.floor(Math.log10(target));
  const steps = [1, 2, 5, 10];
  let best = decade;
  for (const step of steps) if (step * decade <= target) best = step * decade;
  return best;
}
