import { MASK_CLEAR, planeOf, type SliceFields } from '../../src/engine/slicePlanes';
import type { FieldComponent, MapSettings } from '../../src/io/mapSettings';
import { VACUUM_PERMEABILITY } from '../../src/physics/constants';
import type { ValueRange } from './fieldMap';

/**
 * Share of the unmasked non-zero |v| an auto colour scale spans: the top is cut below the
 * maximum so the 1/R² peak next to a charge does not wash out the radiation.
 */
export const COLOUR_QUANTILES = { low: 0.01, high: 0.995 } as const;

export {
  FIELD_COMPONENTS,
  type FieldComponent,
  type MapQuantity,
  type ScaleKind,
} from '../../src/io/mapSettings';

/**
 * How the map is shown. For signed quantities a range means: the scale spans −max … max and
 * min is the smallest |value| a log scale resolves (its threshold). Ranges are typed in
 * display terms, i.e. with QuantityValues.offset added.
 */
export type MapDisplay = Pick<MapSettings, 'quantity' | 'component' | 'scale' | 'range'>;

/** One quantity per point of a slice, with what the colour scale needs to know about it. */
export interface QuantityValues {
  /** nx·ny values, row-major j·nx + i; 0 where masked. */
  values: Float32Array;
  /** True when values take both signs and want a diverging scale. */
  signed: boolean;
  /** SI unit: 'V/m', 'T', 'W/m²' or 's'. */
  unit: string;
  /** Short name, e.g. '|E|', 'E_y', '|E_rad|', 'S_x', 't_ret'. */
  label: string;
  /** Add to values for display, s; retarded time: values hold t_ret − t = −delay, offset = fields.time. */
  offset: number;
  /** Smallest and largest unmasked finite value (without offset); null when there is none. */
  dataRange: ValueRange | null;
  /**
   * Range a colour scale spans when set to auto (without offset). Magnitudes: the
   * COLOUR_QUANTILES of the positive values; signed: max = high quantile and min = low
   * quantile of the non-zero |v|; retarded time: min and max. Null when there is nothing to show.
   */
  autoRange: ValueRange | null;
}

const MAGNITUDES = {
  E: { planes: ['Ex', 'Ey', 'Ez'], unit: 'V/m', label: '|E|' },
  B: { planes: ['Bx', 'By', 'Bz'], unit: 'T', label: '|B|' },
  Erad: { planes: ['Ex_rad', 'Ey_rad', 'Ez_rad'], unit: 'V/m', label: '|E_rad|' },
} as const;

const COMPONENT_LABELS: Record<FieldComponent, string> = {
  Ex: 'E_x',
  Ey: 'E_y',
  Ez: 'E_z',
  Bx: 'B_x',
  By: 'B_y',
  Bz: 'B_z',
  Sx: 'S_x',
  Sy: 'S_y',
  Sz: 'S_z',
  Ex_rad: 'E_rad,x',
  Ey_rad: 'E_rad,y',
  Ez_rad: 'E_rad,z',
};

const POYNTING_UNIT = 'W/m²';

/** The values of the chosen quantity per point, with their ranges. */
export function quantityValues(
  fields: SliceFields,
  display: Pick<MapDisplay, 'quantity' | 'component'>,
): QuantityValues {
  const n = fields.nx * fields.ny;
  const values = new Float32Array(n);
  const { mask } = fields;
  switch (display.quantity) {
    case 'E':
    case 'B':
    case 'Erad': {
      const { planes, unit, label } = MAGNITUDES[display.quantity];
      const x = planeOf(fields, planes[0]);
      const y = planeOf(fields, planes[1]);
      const z = planeOf(fields, planes[2]);
      for (let p = 0; p < n; p++) {
        if (mask[p] === MASK_CLEAR) values[p] = Math.sqrt(x[p] * x[p] + y[p] * y[p] + z[p] * z[p]);
      }
      return magnitudeResult(values, mask, unit, label);
    }
    case 'S':
      poynting(fields, -1, values);
      return magnitudeResult(values, mask, POYNTING_UNIT, '|S|');
    case 'component': {
      const component = display.component;
      if (component === 'Sx' || component === 'Sy' || component === 'Sz') {
        poynting(fields, component === 'Sx' ? 0 : component === 'Sy' ? 1 : 2, values);
      } else {
        const plane = planeOf(fields, component);
        for (let p = 0; p < n; p++) if (mask[p] === MASK_CLEAR) values[p] = plane[p];
      }
      const unit = component.startsWith('S') ? POYNTING_UNIT : component[0] === 'B' ? 'T' : 'V/m';
      return {
        values,
        signed: true,
        unit,
        label: COMPONENT_LABELS[component],
        offset: 0,
        dataRange: dataRangeOf(values, mask),
        // Exact zeros (a component vanishing on a symmetry plane) stay out of both quantiles,
        // so they neither pull the extent down nor become the log threshold.
        autoRange: absQuantileRange(values, mask),
      };
    }
    case 'retardedTime': {
      const delay = planeOf(fields, 'delay');
      for (let p = 0; p < n; p++) if (mask[p] === MASK_CLEAR) values[p] = -delay[p];
      const dataRange = dataRangeOf(values, mask);
      return {
        values,
        signed: false,
        unit: 's',
        label: 't_ret',
        offset: fields.time,
        dataRange,
        autoRange: dataRange === null ? null : widened(dataRange),
      };
    }
  }
}

/** S = E × B / μ0 per unmasked point: component 0, 1 or 2, or its magnitude for −1. */
function poynting(fields: SliceFields, component: -1 | 0 | 1 | 2, out: Float32Array): void {
  const ex = planeOf(fields, 'Ex');
  const ey = planeOf(fields, 'Ey');
  const ez = planeOf(fields, 'Ez');
  const bx = planeOf(fields, 'Bx');
  const by = planeOf(fields, 'By');
  const bz = planeOf(fields, 'Bz');
  const { mask } = fields;
  const m = 1 / VACUUM_PERMEABILITY;
  for (let p = 0; p < out.length; p++) {
    if (mask[p] !== MASK_CLEAR) continue;
    const sx = (ey[p] * bz[p] - ez[p] * by[p]) * m;
    const sy = (ez[p] * bx[p] - ex[p] * bz[p]) * m;
    const sz = (ex[p] * by[p] - ey[p] * bx[p]) * m;
    out[p] =
      component === 0
        ? sx
        : component === 1
          ? sy
          : component === 2
            ? sz
            : Math.sqrt(sx * sx + sy * sy + sz * sz);
  }
}

function magnitudeResult(
  values: Float32Array,
  mask: Uint8Array,
  unit: string,
  label: string,
): QuantityValues {
  return {
    values,
    signed: false,
    unit,
    label,
    offset: 0,
    dataRange: dataRangeOf(values, mask),
    autoRange: absQuantileRange(values, mask),
  };
}

function dataRangeOf(values: Float32Array, mask: Uint8Array): ValueRange | null {
  let min = Number.POSITIVE_INFINITY;
  let max = Number.NEGATIVE_INFINITY;
  for (let p = 0; p < values.length; p++) {
    const value = values[p];
    if (mask[p] !== MASK_CLEAR || !Number.isFinite(value)) continue;
    if (value < min) min = value;
    if (value > max) max = value;
  }
  return min <= max ? { min, max } : null;
}

/** Sorted |v| of the unmasked finite non-zero values. */
function sortedNonZeroAbs(values: Float32Array, mask: Uint8Array): Float32Array {
  const scratch = new Float32Array(values.length);
  let count = 0;
  for (let p = 0; p < values.length; p++) {
    const value = Math.abs(values[p]);
    if (mask[p] === MASK_CLEAR && value > 0 && value < Number.POSITIVE_INFINITY) {
      scratch[count++] = value;
    }
  }
  // Typed-array sort is numeric, unlike Array#sort's default.
  return scratch.subarray(0, count).sort();
}

function quantile(sorted: Float32Array, q: number): number {
  return sorted[Math.round(q * (sorted.length - 1))];
}

/** COLOUR_QUANTILES of the non-zero |v|, widened when they coincide. */
function absQuantileRange(values: Float32Array, mask: Uint8Array): ValueRange | null {
  const sorted = sortedNonZeroAbs(values, mask);
  if (sorted.length === 0) return null;
  let min = quantile(sorted, COLOUR_QUANTILES.low);
  let max = quantile(sorted, COLOUR_QUANTILES.high);
  if (!(max > min)) {
    min = sorted[0];
    max = sorted[sorted.length - 1];
  }
  // A uniform field still needs a scale with some width.
  if (!(max > min)) min = max / 10;
  return { min, max };
}

/** A uniform retarded time still needs a scale with some width. */
function widened(range: ValueRange): ValueRange {
  if (range.max > range.min) return range;
  const half = range.max !== 0 ? 0.05 * Math.abs(range.max) : 1e-12;
  return { min: range.min - half, max: range.max + half };
}
