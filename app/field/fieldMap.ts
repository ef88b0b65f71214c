import type { KernelStats } from '../../src/engine/sliceKernel';
import { MASK_CLEAR, planeOf, type SliceFields } from '../../src/engine/slicePlanes';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import type { Charge } from '../../src/physics/charge';

/** Smallest and largest value of a quantity, in its SI unit. */
export interface ValueRange {
  min: number;
  max: number;
}

/**
 * Share of the unmasked cells the colour scale spans: the top is cut below the maximum so the
 * 1/R² peak next to a charge does not wash out the radiation.
 */
export const COLOUR_QUANTILES = { low: 0.01, high: 0.995 } as const;

/** A computed slice together with |E| per point and the ranges the view needs. */
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
  /** |E| per point, V/m; 0 where masked. */
  magnitude: Float32Array;
  /** Points on or next to a charge, left out of every range. */
  masked: number;
  /** Range of |E| over the unmasked points, V/m; null when none is above zero. */
  range: ValueRange | null;
  /** Range of |E| the colour scale spans, V/m (see COLOUR_QUANTILES). */
  colourRange: ValueRange | null;
  /** Wall-clock time of the computation, ms. */
  elapsedMs: number;
  stats: KernelStats;
  /** Worker threads that computed it (0: the main thread). */
  threads: number;
  /** True for the quick coarse pass shown while the full map is computed. */
  coarse: boolean;
}

/** What a computation hands over before |E| and the ranges are worked out. */
export type ComputedSlice = Omit<FieldMap, 'magnitude' | 'masked' | 'range' | 'colourRange'>;

/** |E| and its ranges for a computed slice. */
export function summariseField(computed: ComputedSlice): FieldMap {
  const { fields } = computed;
  const ex = planeOf(fields, 'Ex');
  const ey = planeOf(fields, 'Ey');
  const ez = planeOf(fields, 'Ez');
  const n = fields.nx * fields.ny;
  const magnitude = new Float32Array(n);
  const values: number[] = [];
  let masked = 0;
  for (let p = 0; p < n; p++) {
    if (fields.mask[p] !== MASK_CLEAR) {
      masked++;
      continue;
    }
    const value = Math.hypot(ex[p], ey[p], ez[p]);
    magnitude[p] = value;
    if (value > 0 && Number.isFinite(value)) values.push(value);
  }
  values.sort((a, b) => a - b);
  const range = values.length > 0 ? { min: values[0], max: values[values.length - 1] } : null;
  return {
    ...computed,
    magnitude,
    masked,
    range,
    colourRange: range === null ? null : colourRangeOf(values, range),
  };
}

function colourRangeOf(sorted: readonly number[], range: ValueRange): ValueRange {
  const at = (q: number) => sorted[Math.round(q * (sorted.length - 1))];
  let min = at(COLOUR_QUANTILES.low);
  let max = at(COLOUR_QUANTILES.high);
  if (!(max > min)) {
    min = range.min;
    max = range.max;
  }
  // A uniform field still needs a scale with some width.
  if (!(max > min)) min = max / 10;
  return { min, max };
}
