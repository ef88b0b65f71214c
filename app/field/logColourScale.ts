import { interpolateMagma } from 'd3-scale-chromatic';
import { MASK_CLEAR } from '../../src/engine/slicePlanes';
import type { ValueRange } from './fieldMap';

/** Colour of points on a charge, where no field is computed: a grey the colour map never uses. */
export const MASKED_COLOUR = '#8c939c';
const MASKED_RGB = [0x8c, 0x93, 0x9c] as const;

const LUT_SIZE = 256;
/** The colour map sampled once, RGB bytes per entry. */
const LUT = buildLut(interpolateMagma);

/** Where a value sits on a log scale over `range`: 0 at min, 1 at max, clamped. */
export function logPosition(range: ValueRange, value: number): number {
  if (!(value > 0)) return 0;
  const t = Math.log(value / range.min) / Math.log(range.max / range.min);
  return Math.min(1, Math.max(0, t));
}

/** CSS colour at position t in [0, 1] of the colour map. */
export function colourAt(t: number): string {
  const k = 3 * Math.round(Math.min(1, Math.max(0, t)) * (LUT_SIZE - 1));
  return `rgb(${LUT[k]}, ${LUT[k + 1]}, ${LUT[k + 2]})`;
}

/** The colour map as a CSS gradient running toward `direction`. */
export function colourGradient(direction: string, stops = 24): string {
  const parts: string[] = [];
  for (let s = 0; s < stops; s++) {
    const t = s / (stops - 1);
    parts.push(`${colourAt(t)} ${(100 * t).toFixed(1)}%`);
  }
  return `linear-gradient(${direction}, ${parts.join(', ')})`;
}

/** RGBA bytes for |E| on a log colour scale over `range`; masked points get MASKED_COLOUR. */
export function paintMagnitude(
  magnitude: Float32Array,
  mask: Uint8Array,
  range: ValueRange,
  out: Uint8Array = new Uint8Array(4 * magnitude.length),
): Uint8Array {
  const logMin = Math.log(range.min);
  const scale = (LUT_SIZE - 1) / (Math.log(range.max) - logMin);
  for (let p = 0; p < magnitude.length; p++) {
    const o = 4 * p;
    out[o + 3] = 255;
    if (mask[p] !== MASK_CLEAR) {
      out[o] = MASKED_RGB[0];
      out[o + 1] = MASKED_RGB[1];
      out[o + 2] = MASKED_RGB[2];
      continue;
    }
    const value = magnitude[p];
    let k = value > 0 ? Math.round((Math.log(value) - logMin) * scale) : 0;
    if (k < 0) k = 0;
    else if (k > LUT_SIZE - 1) k = LUT_SIZE - 1;
    out[o] = LUT[3 * k];
    out[o + 1] = LUT[3 * k + 1];
    out[o + 2] = LUT[3 * k + 2];
  }
  return out;
}

function buildLut(interpolate: (t: number) => string): Uint8Array {
  const lut = new Uint8Array(3 * LUT_SIZE);
  for (let k = 0; k < LUT_SIZE; k++) lut.set(parseColour(interpolate(k / (LUT_SIZE - 1))), 3 * k);
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
