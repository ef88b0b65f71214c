import { describe, expect, it } from 'vitest';
import {
  type ColourScale,
  colourAtPosition,
  colourScaleFor,
  MASKED_COLOUR,
  paintValues,
  rangeProblem,
  scaleGradient,
  scalePosition,
  scaleTicks,
} from '../../app/field/colourScale';
import { type MapDisplay, quantityValues } from '../../app/field/mapQuantity';
import { allocateSliceFields, MASK_ON_CHARGE, planeOf } from '../../src/engine/slicePlanes';
import { mulberry32 } from '../support/random';

// Positions are a few logs and divisions of doubles; 1e-12 is far above their rounding.
const EXACT = 1e-12;

const sequentialLog: ColourScale = {
  kind: 'sequential',
  scale: 'log',
  min: 1e-6,
  max: 1e-3,
  scheme: 'magma',
};
const divergingLinear: ColourScale = {
  kind: 'diverging',
  scale: 'linear',
  min: 0,
  max: 4,
  scheme: 'bluered',
};
const divergingLog: ColourScale = {
  kind: 'diverging',
  scale: 'log',
  min: 1e-3,
  max: 1e3,
  scheme: 'bluered',
};

function rgb(css: string): number[] {
  return css.match(/\d+/g)!.map(Number);
}

function paintedAt(scale: ColourScale, value: number): number[] {
  const out = paintValues(new Float32Array([value]), new Uint8Array(1), scale);
  return Array.from(out.subarray(0, 3));
}

describe('scalePosition', () => {
  it('spaces decades evenly on a log scale and clamps the ends', () => {
    const decades = [1e-6, 1e-5, 1e-4, 1e-3].map((v) => scalePosition(sequentialLog, v));
    for (const [k, t] of decades.entries()) expect(t).toBeCloseTo(k / 3, 12);
    expect(scalePosition(sequentialLog, 1)).toBe(1);
    expect(scalePosition(sequentialLog, 1e-9)).toBe(0);
    expect(scalePosition(sequentialLog, 0)).toBe(0);
    expect(scalePosition(sequentialLog, -1)).toBe(0);
  });

  it('puts 0 in the middle of a diverging scale and mirrors −v about it', () => {
    for (const scale of [divergingLinear, divergingLog]) {
      expect(scalePosition(scale, 0)).toBe(0.5);
      for (const v of [1e-5, 1e-3, 0.3, 2, 17, 999, 1e6]) {
        expect(Math.abs(scalePosition(scale, v) + scalePosition(scale, -v) - 1)).toBeLessThan(
          EXACT,
        );
        expect(scalePosition(scale, v)).toBeGreaterThan(0.5);
      }
    }
    expect(scalePosition(divergingLinear, 2)).toBe(0.75);
    expect(scalePosition(divergingLinear, -4)).toBe(0);
    expect(scalePosition(divergingLinear, 9)).toBe(1);
  });

  it('keeps |v| below the threshold of a diverging log scale near the middle', () => {
    // Below the threshold log1p(x) < ln 2, so the offset from 0.5 is under 0.5·ln 2/ln(1 + 1e6).
    const bound = (0.5 * Math.LN2) / Math.log1p(1e6);
    expect(bound).toBeLessThan(0.03);
    for (const v of [1e-9, 1e-5, 9e-4]) {
      expect(Math.abs(scalePosition(divergingLog, v) - 0.5)).toBeLessThan(bound);
      expect(Math.abs(scalePosition(divergingLog, -v) - 0.5)).toBeLessThan(bound);
    }
  });

  it('spaces decades well above the threshold of a diverging log scale evenly', () => {
    const t = [1, 10, 100, 1000].map((v) => scalePosition(divergingLog, v));
    const step = t[2] - t[1];
    // log1p(10^k/1e-3) − k ln 10 shrinks as 10^-(k+3): at 10^0 the spacing is off by ~1e-3 of a decade.
    expect(Math.abs(t[1] - t[0] - step)).toBeLessThan(1e-3 * step);
    expect(Math.abs(t[3] - t[2] - step)).toBeLessThan(1e-3 * step);
    expect(t[3]).toBe(1);
  });
});

describe('paintValues', () => {
  it('paints masked and NaN points grey', () => {
    const rgba = paintValues(
      new Float32Array([1e-4, 5e-4, Number.NaN]),
      new Uint8Array([0, MASK_ON_CHARGE, 0]),
      sequentialLog,
    );
    expect(MASKED_COLOUR).toBe('#8c939c');
    const grey = [0x8c, 0x93, 0x9c];
    expect(Array.from(rgba.subarray(4, 8))).toEqual([...grey, 255]);
    expect(Array.from(rgba.subarray(8, 12))).toEqual([...grey, 255]);
    expect(Array.from(rgba.subarray(0, 3))).not.toEqual(grey);
  });

  it('paints the colour colourAtPosition gives at scalePosition, in every mode', () => {
    const random = mulberry32(7);
    const scales: ColourScale[] = [
      sequentialLog,
      { kind: 'sequential', scale: 'linear', min: -2, max: 3, scheme: 'viridis' },
      divergingLinear,
      divergingLog,
    ];
    for (const scale of scales) {
      const values = new Float32Array(300);
      for (let p = 0; p < values.length; p++) {
        const magnitude = 10 ** (12 * random() - 8);
        values[p] = scale.kind === 'diverging' && random() < 0.5 ? -magnitude : magnitude;
        if (scale.scale === 'linear') values[p] = 10 * random() - 5;
      }
      const rgba = paintValues(values, new Uint8Array(values.length), scale);
      for (let p = 0; p < values.length; p++) {
        const expected = rgb(colourAtPosition(scale.scheme, scalePosition(scale, values[p])));
        expect(Array.from(rgba.subarray(4 * p, 4 * p + 3))).toEqual(expected);
        expect(rgba[4 * p + 3]).toBe(255);
      }
    }
  });

  it('paints ±v with mirrored colours: near-white at 0, red for positive, blue for negative', () => {
    const zero = paintedAt(divergingLinear, 0);
    expect(Math.min(...zero)).toBeGreaterThan(230);
    const [rPlus, , bPlus] = paintedAt(divergingLinear, 4);
    const [rMinus, , bMinus] = paintedAt(divergingLinear, -4);
    expect(rPlus).toBeGreaterThan(bPlus);
    expect(bMinus).toBeGreaterThan(rMinus);
    expect(paintedAt(divergingLog, 3)).toEqual(
      rgb(colourAtPosition('bluered', scalePosition(divergingLog, 3))),
    );
  });

  it('paints small magnitudes dark and large ones light on magma', () => {
    const brightness = (v: number) => paintedAt(sequentialLog, v).reduce((a, b) => a + b);
    expect(brightness(1e-9)).toBeLessThan(40);
    expect(brightness(1e-3)).toBeGreaterThan(600);
  });

  it('fills a given output buffer', () => {
    const out = new Uint8Array(8);
    expect(paintValues(new Float32Array([1, 2]), new Uint8Array(2), divergingLinear, out)).toBe(
      out,
    );
  });
});

describe('colourScaleFor', () => {
  const fields = allocateSliceFields(200, 1, 3e-9);
  const ex = planeOf(fields, 'Ex');
  const delay = planeOf(fields, 'delay');
  for (let p = 0; p < 200; p++) {
    ex[p] = (p % 2 === 0 ? 1 : -1) * (p + 1);
    delay[p] = 1e-9 + p * 1e-11;
  }
  const display = (overrides: Partial<MapDisplay>): MapDisplay => ({
    quantity: 'E',
    component: 'Ex',
    scale: 'log',
    range: 'auto',
    ...overrides,
  });

  it('takes the auto range with magma for a magnitude', () => {
    const q = quantityValues(fields, display({}));
    expect(colourScaleFor(q, display({}))).toEqual({
      kind: 'sequential',
      scale: 'log',
      ...q.autoRange,
      scheme: 'magma',
    });
  });

  it('lets a manual range override auto, and falls back to auto when it is unusable', () => {
    const q = quantityValues(fields, display({}));
    const manual = display({ range: { min: 5, max: 50 } });
    expect(colourScaleFor(q, manual)).toMatchObject({ min: 5, max: 50 });
    const unusable = display({ range: { min: 0, max: 50 } });
    expect(colourScaleFor(q, unusable)).toMatchObject(q.autoRange!);
  });

  it('starts a linear magnitude scale at zero', () => {
    const q = quantityValues(fields, display({}));
    expect(colourScaleFor(q, display({ scale: 'linear' }))).toMatchObject({
      min: 0,
      max: q.autoRange!.max,
    });
  });

  it('gives a signed component a diverging scale', () => {
    const d = display({ quantity: 'component' });
    const scale = colourScaleFor(quantityValues(fields, d), d);
    expect(scale).toMatchObject({ kind: 'diverging', scheme: 'bluered', scale: 'log' });
  });

  it('shows the retarded time on a linear viridis scale, a manual range typed with the offset', () => {
    const d = display({ quantity: 'retardedTime', range: { min: 0.5e-9, max: 1.5e-9 } });
    const q = quantityValues(fields, d);
    const scale = colourScaleFor(q, d)!;
    expect(scale.kind).toBe('sequential');
    expect(scale.scale).toBe('linear');
    expect(scale.scheme).toBe('viridis');
    // 0.5 ns − 3 ns in doubles: off by an ulp or so of 3e-9.
    expect(scale.min).toBeCloseTo(-2.5e-9, 20);
    expect(scale.max).toBeCloseTo(-1.5e-9, 20);
  });

  it('gives no scale when there is no range', () => {
    const empty = allocateSliceFields(2, 2, 0);
    expect(colourScaleFor(quantityValues(empty, display({})), display({}))).toBeNull();
  });
});

describe('scaleTicks', () => {
  it('puts 1, 2, 5 × 10^n steps on a linear scale', () => {
    const linear: ColourScale = { ...sequentialLog, scale: 'linear', min: 0, max: 1 };
    expect(scaleTicks(linear).map((t) => t.value)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    const odd: ColourScale = { ...linear, min: 0.013, max: 0.071 };
    expect(scaleTicks(odd).map((t) => t.value)).toEqual([0.02, 0.03, 0.04, 0.05, 0.06, 0.07]);
  });

  it('puts decades on a log scale, evenly placed', () => {
    const ticks = scaleTicks(sequentialLog);
    expect(ticks.map((t) => t.value)).toEqual([1e-6, 1e-5, 1e-4, 1e-3]);
    for (const [k, t] of ticks.entries()) expect(t.position).toBeCloseTo(k / 3, 12);
  });

  it('thins many decades on a log scale to about the count asked for', () => {
    const wide: ColourScale = { ...sequentialLog, min: 1e-12, max: 1e3 };
    // 16 decades at about 5 ticks: every 4th exponent.
    expect(scaleTicks(wide, 5).map((t) => t.value)).toEqual([1e-12, 1e-8, 1e-4, 1]);
  });

  it('puts 0 and ± decades on a diverging log scale', () => {
    const scale = { ...divergingLog, min: 1, max: 100 };
    const ticks = scaleTicks(scale);
    expect(ticks.map((t) => t.value)).toEqual([-100, -10, -1, 0, 1, 10, 100]);
    for (const t of ticks) expect(t.position).toBe(scalePosition(scale, t.value));
    expect(ticks[3].position).toBe(0.5);
  });

  it('spans −max … max on a diverging linear scale', () => {
    const ticks = scaleTicks(divergingLinear);
    expect(ticks.map((t) => t.value)).toEqual([-4, -2, 0, 2, 4]);
    expect(ticks.map((t) => t.position)).toEqual([0, 0.25, 0.5, 0.75, 1]);
  });
});

describe('rangeProblem', () => {
  it('explains why a typed range is unusable, in one line', () => {
    expect(rangeProblem(0, 10, 'log', false)).toBe('minimum must be above 0 on a log scale');
    expect(rangeProblem(5, 5, 'linear', false)).toBe('maximum must be above the minimum');
    expect(rangeProblem(Number.NaN, 5, 'linear', false)).toBe(
      'minimum and maximum must be finite numbers',
    );
    expect(rangeProblem(-5, -1, 'linear', true)).toMatch(/^maximum must be above 0/);
    expect(rangeProblem(-1, 10, 'log', true)).toMatch(/above 0 on a log scale$/);
  });

  it('accepts usable ranges', () => {
    expect(rangeProblem(1e-6, 1e-3, 'log', false)).toBeNull();
    expect(rangeProblem(-3, 7, 'linear', false)).toBeNull();
    expect(rangeProblem(1e-3, 1e3, 'log', true)).toBeNull();
  });
});

describe('scaleGradient', () => {
  it('runs the scheme from the low end to the high end', () => {
    const css = scaleGradient(sequentialLog, 'to top');
    expect(css.startsWith('linear-gradient(to top, ')).toBe(true);
    expect(css).toContain(`${colourAtPosition('magma', 0)} 0.0%`);
    expect(css).toContain(`${colourAtPosition('magma', 1)} 100.0%`);
  });
});
