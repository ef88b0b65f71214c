import { interpolateMagma, interpolateRdBu, interpolateViridis } from 'd3-scale-chromatic';
import { MASK_CLEAR } from '../../src/engine/slicePlanes';
import type { MapDisplay, QuantityValues, ScaleKind } from './mapQuantity';

/** Colour of points on a charge, where no field is computed: a grey no scheme here uses. */
export const MASKED_COLOUR = '#8c939c';
const MASKED_RGB = [0x8c, 0x93, 0x9c] as const;

/**
 * magma for magnitudes, a reversed RdBu (blue negative, red positive, near-white at zero) for
 * signed components, viridis for the retarded time (cividis was passed over: its mid-tones are
 * neutral greys that read as MASKED_COLOUR).
 */
export type ColourScheme = 'magma' | 'viridis' | 'bluered';

/**
 * How values map to colours. Sequential: min … max. Diverging: −max … max with 0 in the
 * middle; on a log scale min is the threshold below which |v| fades toward the middle.
 * min and max are in the frame of QuantityValues.values (without its offset).
 */
export interface ColourScale {
  kind: 'sequential' | 'diverging';
  scale: ScaleKind;
  min: number;
  max: number;
  scheme: ColourScheme;
}

const LUT_SIZE = 256;

const LUTS: Record<ColourScheme, Uint8Array> = {
  magma: buildLut(interpolateMagma),
  viridis: buildLut(interpolateViridis),
  bluered: buildLut((t) => interpolateRdBu(1 - t)),
};

/** The colour scale for a quantity; a usable manual range wins over auto; null when no range. */
export function colourScaleFor(q: QuantityValues, display: MapDisplay): ColourScale | null {
  const retarded = display.quantity === 'retardedTime';
  // A log scale of t_ret − t, which is negative everywhere, would mean nothing.
  const scale: ScaleKind = retarded ? 'linear' : display.scale;
  const kind = q.signed ? 'diverging' : 'sequential';
  const scheme: ColourScheme = q.signed ? 'bluered' : retarded ? 'viridis' : 'magma';
  if (display.range !== 'auto') {
    const min = display.range.min - q.offset;
    const max = display.range.max - q.offset;
    if (rangeProblem(min, max, scale, q.signed) === null) return { kind, scale, min, max, scheme };
  }
  const auto = q.autoRange;
  if (auto === null) return null;
  // On a linear scale a magnitude starts at zero; the low quantile only serves as a log floor.
  const min = scale === 'linear' && !q.signed && !retarded ? 0 : auto.min;
  return { kind, scale, min, max: auto.max, scheme };
}

/** Where a value sits on the scale, 0 … 1, clamped; NaN stays NaN. */
export function scalePosition(scale: ColourScale, value: number): number {
  const { min, max } = scale;
  let t: number;
  // The same operations as paintValues, so both land in the same colour bin.
  if (scale.kind === 'diverging') {
    const magnitude = Math.abs(value);
    const side =
      scale.scale === 'log'
        ? // Symmetric log: ≈ linear below the threshold min, logarithmic well above it.
          Math.log1p(magnitude / min) / Math.log1p(max / min)
        : magnitude / max;
    t = value < 0 ? 0.5 - 0.5 * side : 0.5 + 0.5 * side;
  } else if (scale.scale === 'log') {
    t = value > 0 ? (Math.log(value) - Math.log(min)) / (Math.log(max) - Math.log(min)) : 0;
    if (Number.isNaN(value)) t = value;
  } else {
    t = (value - min) / (max - min);
  }
  return Math.min(1, Math.max(0, t));
}

/** RGBA bytes per value on the scale; masked and NaN points get MASKED_COLOUR. */
export function paintValues(
  values: Float32Array,
  mask: Uint8Array,
  scale: ColourScale,
  out: Uint8Array = new Uint8Array(4 * values.length),
): Uint8Array {
  const lut = LUTS[scale.scheme];
  const { min, max } = scale;
  const diverging = scale.kind === 'diverging';
  const log = scale.scale === 'log';
  // Per-mode constants, so the loop does one log at most per point.
  const logMin = Math.log(min);
  const logSpan = Math.log(max) - logMin;
  const symlogSpan = Math.log1p(max / min);
  const linearSpan = max - min;
  for (let p = 0; p < values.length; p++) {
    const o = 4 * p;
    out[o + 3] = 255;
    const value = values[p];
    if (mask[p] !== MASK_CLEAR || Number.isNaN(value)) {
      out[o] = MASKED_RGB[0];
      out[o + 1] = MASKED_RGB[1];
      out[o + 2] = MASKED_RGB[2];
      continue;
    }
    let t: number;
    if (diverging) {
      const magnitude = value < 0 ? -value : value;
      const side = log ? Math.log1p(magnitude / min) / symlogSpan : magnitude / max;
      t = value < 0 ? 0.5 - 0.5 * side : 0.5 + 0.5 * side;
    } else if (log) {
      t = value > 0 ? (Math.log(value) - logMin) / logSpan : 0;
    } else {
      t = (value - min) / linearSpan;
    }
    const c = 3 * lutIndex(t);
    out[o] = lut[c];
    out[o + 1] = lut[c + 1];
    out[o + 2] = lut[c + 2];
  }
  return out;
}

/** CSS colour at position t in [0, 1] of a scheme. */
export function colourAtPosition(scheme: ColourScheme, t: number): string {
  const lut = LUTS[scheme];
  const k = 3 * lutIndex(t);
  return `rgb(${lut[k]}, ${lut[k + 1]}, ${lut[k + 2]})`;
}

/** The scale's colours as a CSS gradient running toward `direction` (e.g. 'to top'). */
export function scaleGradient(scale: ColourScale, direction: string, stops = 24): string {
  const parts: string[] = [];
  for (let s = 0; s < stops; s++) {
    const t = s / (stops - 1);
    parts.push(`${colourAtPosition(scale.scheme, t)} ${(100 * t).toFixed(1)}%`);
  }
  return `linear-gradient(${direction}, ${parts.join(', ')})`;
}

/**
 * Round values on the scale with their positions: 1, 2, 5 × 10^n steps on a linear scale,
 * decades on a log scale, 0 and ± decades on a diverging log scale; about `count` of them.
 */
export function scaleTicks(scale: ColourScale, count = 5): { value: number; position: number }[] {
  const { min, max } = scale;
  let values: number[];
  if (scale.kind === 'diverging') {
    if (scale.scale === 'log') {
      const side = logTickValues(min, max, Math.max(1, Math.ceil(count / 2)));
      values = [...side.map((v) => -v).reverse(), 0, ...side];
    } else {
      values = linearTickValues(-max, max, count);
    }
  } else {
    values =
      scale.scale === 'log' ? logTickValues(min, max, count) : linearTickValues(min, max, count);
  }
  return values.map((value) => ({ value, position: scalePosition(scale, value) }));
}

/** One-line reason a typed range cannot be used, or null. Signed: the scale spans −max … max. */
export function rangeProblem(
  min: number,
  max: number,
  scale: ScaleKind,
  signed: boolean,
): string | null {
  if (!Number.isFinite(min) || !Number.isFinite(max)) {
    return 'minimum and maximum must be finite numbers';
  }
  if (scale === 'log' && !(min > 0)) {
    return signed
      ? 'minimum (the smallest |value| shown apart from 0) must be above 0 on a log scale'
      : 'minimum must be above 0 on a log scale';
  }
  if (!(max > min)) return 'maximum must be above the minimum';
  if (signed && !(max > 0))
    return 'maximum must be above 0: the scale runs from −maximum to maximum';
  return null;
}

/** Multiples of a 1, 2 or 5 × 10^n step inside [lo, hi], about `count` of them. */
function linearTickValues(lo: number, hi: number, count: number): number[] {
  if (!(hi > lo)) return [lo];
  const raw = (hi - lo) / Math.max(1, count);
  const exponent = Math.floor(Math.log10(raw));
  const fraction = raw / 10 ** exponent;
  const mantissa = fraction < 1.5 ? 1 : fraction < 3.5 ? 2 : fraction < 7.5 ? 5 : 10;
  const step = mantissa * 10 ** exponent;
  // Slack of 1e-9 steps so ends that are themselves multiples are not lost to rounding.
  const first = Math.ceil(lo / step - 1e-9);
  const last = Math.floor(hi / step + 1e-9);
  const values: number[] = [];
  for (let k = first; k <= last; k++) values.push(timesPowerOfTen(k * mantissa, exponent));
  return values;
}

/** Decades inside [lo, hi] (lo > 0), thinned to about `count`; 1, 2, 5 × 10^n within one decade. */
function logTickValues(lo: number, hi: number, count: number): number[] {
  if (!(lo > 0) || !(hi > lo)) return [];
  const first = Math.ceil(Math.log10(lo) - 1e-9);
  const last = Math.floor(Math.log10(hi) + 1e-9);
  if (last - first + 1 >= 2) {
    const stride = Math.max(1, Math.ceil((last - first + 1) / Math.max(1, count)));
    const values: number[] = [];
    for (let k = first; k <= last; k++) {
      // Thinning by exponent keeps the ticks on the same decades as the view zooms.
      if (k % stride === 0) values.push(timesPowerOfTen(1, k));
    }
    return values;
  }
  const values: number[] = [];
  for (let k = first - 1; k <= last; k++) {
    for (const m of [1, 2, 5]) {
      const value = timesPowerOfTen(m, k);
      if (value >= lo * (1 - 1e-9) && value <= hi * (1 + 1e-9)) values.push(value);
    }
  }
  return values.length >= 2 ? values : linearTickValues(lo, hi, count);
}

/** m × 10^e without the binary rounding of multiplying by a negative power of ten. */
function timesPowerOfTen(m: number, e: number): number {
  // + 0 turns the −0 that ceil gives just below zero into 0.
  return (e >= 0 ? m * 10 ** e : m / 10 ** -e) + 0;
}

/** Entry k covers positions [k, k + 1)/LUT_SIZE, so ±v land on mirrored entries. */
function lutIndex(t: number): number {
  const k = Math.floor(t * LUT_SIZE);
  return k >= 0 ? (k < LUT_SIZE ? k : LUT_SIZE - 1) : 0;
}

/** Each entry holds the scheme's colour at the centre of its bin. */
function buildLut(interpolate: (t: number) => string): Uint8Array {
  const lut = new Uint8Array(3 * LUT_SIZE);
  for (let k = 0; k < LUT_SIZE; k++) lut.set(parseColour(interpolate((k + 0.5) / LUT_SIZE)), 3 * k);
  return lut;
}

/** d3's interpolators give "#rrggbb" or "rgb(r, g, b)". */
function parseColour(css: string): [number, number, number] {
  if (css.startsWith('#')) {
    return [1, 3, 5].map((i) => Number.parseInt(css.slice(i, i + 2), 16)) as [
      number,
      number,
      number,
    ];
  }
  const parts = css.match(/\d+(\.\d+)?/g);
  if (parts === null || parts.length < 3) throw new Error(`unreadable colour ${css}`);
  return [Number(parts[0]), Number(parts[1]), Number(parts[2])];
}
