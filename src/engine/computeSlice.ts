import type { Charge } from '../physics/charge';
import { computeSliceRows, type KernelStats } from './sliceKernel';
import { allocateSliceFields, type SliceFields } from './slicePlanes';
import type { SliceSpec } from './sliceSpec';

export interface SliceOptions {
  /** Points closer than this to a charge (m) are masked; default a quarter of a cell. */
  nearRadius?: number;
}

/** Default mask radius: a quarter of the smaller cell side, so only the cell holding a charge is masked. */
export function defaultNearRadius(spec: SliceSpec): number {
  return 0.25 * Math.min(spec.width / spec.nx, spec.height / spec.ny);
}

/** The whole slice on the calling thread: the reference the worker pool must match, and its fallback. */
export function computeSlice(
  spec: SliceSpec,
  charges: readonly Charge[],
  options: SliceOptions = {},
): { fields: SliceFields; stats: KernelStats } {
  const fields = allocateSliceFields(spec.nx, spec.ny, spec.time);
  const stats: KernelStats = { points: 0, iterations: 0, maxIterations: 0 };
  const target = { planes: fields.planes, mask: fields.mask, points: spec.nx * spec.ny, row0: 0 };
  computeSliceRows(
    spec,
    charges,
    0,
    spec.ny,
    target,
    options.nearRadius ?? defaultNearRadius(spec),
    null,
    stats,
  );
  return { fields, stats };
}
