import type { SliceSpec } from '../../src/engine/sliceSpec';

/** In-plane coordinates (m) of a world point, measured from the slice centre along u and v. */
export function toSlice(spec: SliceSpec, x: number, y: number, z: number): [number, number] {
  const dx = x - spec.center[0];
  const dy = y - spec.center[1];
  const dz = z - spec.center[2];
  return [
    dx * spec.u[0] + dy * spec.u[1] + dz * spec.u[2],
    dx * spec.v[0] + dy * spec.v[1] + dz * spec.v[2],
  ];
}

const AXIS_NAMES = ['x', 'y', 'z'] as const;

/** Name of a coordinate axis ('x', 'y' or 'z') for an axis-aligned unit vector, else 'u'. */
export function axisName(axis: readonly [number, number, number]): string {
  const k = axis.findIndex((component) => Math.abs(component) === 1);
  return k < 0 ? 'u' : AXIS_NAMES[k];
}

/** World coordinate along an axis-aligned in-plane axis at in-plane offset `offset` (m). */
export function axisCoordinate(
  spec: SliceSpec,
  axis: readonly [number, number, number],
  offset: number,
): number {
  return spec.center[0] * axis[0] + spec.center[1] * axis[1] + spec.center[2] * axis[2] + offset;
}
