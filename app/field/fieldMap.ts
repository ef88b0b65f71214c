import type { KernelStats } from '../../src/engine/sliceKernel';
import { MASK_CLEAR, type SliceFields } from '../../src/engine/slicePlanes';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import type { Charge } from '../../src/physics/charge';

/** Smallest and largest value of a quantity, in its SI unit. */
export interface ValueRange {
  min: number;
  max: number;
}

/** A computed slice with what the view needs to know about how it was made. */
export interface FieldMap {
  /** Increases with every new map, so the view can tell when it has drawn this one. */
  id: number;
  /** The slice actually computed (its grid may be coarser than the one asked for). */
  spec: SliceSpec;
  /** The grid the scenario asked for, nx × ny. */
  requested: [number, number];
  /** The charges the map was computed from, so paths drawn over it always match it. */
  charges: readonly Charge[];
  fields: SliceFields;
  /** Points on or next to a charge, left out of every range. */
  masked: number;
  /** Wall-clock time of the computation, ms. */
  elapsedMs: number;
  stats: KernelStats;
  /** Worker threads that computed it (0: the main thread). */
  threads: number;
  /** True for the quick coarse pass shown while the full map is computed. */
  coarse: boolean;
}

/** What a computation hands over before the masked points are counted. */
export type ComputedSlice = Omit<FieldMap, 'masked'>;

export function summariseField(computed: ComputedSlice): FieldMap {
  const { mask } = computed.fields;
  let masked = 0;
  for (let p = 0; p < mask.length; p++) if (mask[p] !== MASK_CLEAR) masked++;
  return { ...computed, masked };
}
