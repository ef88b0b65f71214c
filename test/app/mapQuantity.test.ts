import { describe, expect, it } from 'vitest';
import { quantityValues } from '../../app/field/mapQuantity';
import { allocateSliceFields, MASK_ON_CHARGE, planeOf } from '../../src/engine/slicePlanes';
import { SPEED_OF_LIGHT, VACUUM_PERMEABILITY } from '../../src/physics/constants';

const c = SPEED_OF_LIGHT;
// Values are stored as float32 (relative spacing 6e-8); a handful of roundings stay below 1e-6.
const FLOAT32_RELATIVE = 1e-6;

function expectRelative(actual: number, expected: number, tolerance = FLOAT32_RELATIVE) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance * Math.abs(expected));
}

describe('quantityValues', () => {
  it('gives |E| per point, 0 where masked, and leaves masked points out of the ranges', () => {
    const fields = allocateSliceFields(2, 2, 0);
    planeOf(fields, 'Ex').set([3, 0, 1e-3, 1e9]);
    planeOf(fields, 'Ey').set([4, 2, 0, 0]);
    fields.mask[3] = MASK_ON_CHARGE;
    const q = quantityValues(fields, { quantity: 'E', component: 'Ex' });
    expect(Array.from(q.values)).toEqual([5, 2, Math.fround(1e-3), 0]);
    expect(q.signed).toBe(false);
    expect(q.unit).toBe('V/m');
    expect(q.label).toBe('|E|');
    expect(q.offset).toBe(0);
    expect(q.dataRange).toEqual({ min: Math.fround(1e-3), max: 5 });
  });

  it('computes S = E × B / μ0, which for a plane wave is E²/(μ0 c) along the propagation', () => {
    // Plane wave along +x: E = E0 ŷ, B = (E0/c) ẑ, so S = E0²/(μ0 c) x̂ (Jackson, Classical
    // Electrodynamics, 3rd ed., §7.1). Point 1: along +z, E = E0 x̂, B = (E0/c) ŷ.
    const e0 = 250;
    const fields = allocateSliceFields(2, 1, 0);
    planeOf(fields, 'Ey')[0] = e0;
    planeOf(fields, 'Bz')[0] = e0 / c;
    planeOf(fields, 'Ex')[1] = e0;
    planeOf(fields, 'By')[1] = e0 / c;
    const intensity = (e0 * e0) / (VACUUM_PERMEABILITY * c);
    const magnitude = quantityValues(fields, { quantity: 'S', component: 'Sx' });
    expect(magnitude.unit).toBe('W/m²');
    expect(magnitude.label).toBe('|S|');
    expectRelative(magnitude.values[0], intensity);
    expectRelative(magnitude.values[1], intensity);
    const sx = quantityValues(fields, { quantity: 'component', component: 'Sx' });
    const sz = quantityValues(fields, { quantity: 'component', component: 'Sz' });
    expect(sx.label).toBe('S_x');
    expect(sx.signed).toBe(true);
    expectRelative(sx.values[0], intensity);
    expect(sx.values[1]).toBe(0);
    expect(sz.values[0]).toBe(0);
    expectRelative(sz.values[1], intensity);
  });

  it('matches the explicit cross product for vectors in general position', () => {
    const fields = allocateSliceFields(1, 1, 0);
    const e = [1.5, -2, 0.7];
    const b = [3e-9, 1e-9, -2e-9];
    planeOf(fields, 'Ex')[0] = e[0];
    planeOf(fields, 'Ey')[0] = e[1];
    planeOf(fields, 'Ez')[0] = e[2];
    planeOf(fields, 'Bx')[0] = b[0];
    planeOf(fields, 'By')[0] = b[1];
    planeOf(fields, 'Bz')[0] = b[2];
    const expected = [
      e[1] * b[2] - e[2] * b[1],
      e[2] * b[0] - e[0] * b[2],
      e[0] * b[1] - e[1] * b[0],
    ].map((s) => s / VACUUM_PERMEABILITY);
    const components = ['Sx', 'Sy', 'Sz'] as const;
    components.forEach((component, k) => {
      const q = quantityValues(fields, { quantity: 'component', component });
      // Inputs are float32-rounded before the product, so allow a few float32 steps.
      expectRelative(q.values[0], expected[k], 1e-6);
    });
  });

  it('spans the auto range of a magnitude over its 1% to 99.5% quantiles, so a peak does not set the top', () => {
    const fields = allocateSliceFields(1000, 1, 0);
    const ex = planeOf(fields, 'Ex');
    for (let p = 0; p < 1000; p++) ex[p] = p + 1;
    ex[999] = 1e12;
    const q = quantityValues(fields, { quantity: 'E', component: 'Ex' });
    // Sorted values 1 … 999, 1e12: index round(0.01·999) = 10 holds 11, round(0.995·999) = 994 holds 995.
    expect(q.autoRange).toEqual({ min: 11, max: 995 });
    expect(q.dataRange).toEqual({ min: 1, max: Math.fround(1e12) });
  });

  it('gives a uniform magnitude an auto range a decade wide', () => {
    const fields = allocateSliceFields(2, 2, 0);
    planeOf(fields, 'Bz').fill(2);
    const q = quantityValues(fields, { quantity: 'B', component: 'Bx' });
    expect(q.unit).toBe('T');
    expect(q.autoRange).toEqual({ min: 0.2, max: 2 });
  });

  it('ranges a signed component by |v|: the high quantile as extent, the low one of |v| > 0 as threshold', () => {
    const fields = allocateSliceFields(1001, 1, 0);
    const ey = planeOf(fields, 'Ey_rad');
    // |v| = 1 … 1000 with alternating signs, one exact zero that both quantiles must skip.
    for (let p = 0; p < 1000; p++) ey[p] = (p % 2 === 0 ? 1 : -1) * (p + 1);
    ey[1000] = 0;
    const q = quantityValues(fields, { quantity: 'component', component: 'Ey_rad' });
    expect(q.signed).toBe(true);
    expect(q.label).toBe('E_rad,y');
    expect(q.unit).toBe('V/m');
    expect(q.autoRange).toEqual({ min: 11, max: 995 });
    expect(q.dataRange).toEqual({ min: -1000, max: 999 });
  });

  it('holds the retarded time as t_ret − t = −delay with the observation time as offset', () => {
    const fields = allocateSliceFields(3, 1, 5e-9);
    planeOf(fields, 'delay').set([1e-9, 2e-9, 4e-9]);
    fields.mask[2] = MASK_ON_CHARGE;
    const q = quantityValues(fields, { quantity: 'retardedTime', component: 'Ex' });
    expect(q.unit).toBe('s');
    expect(q.label).toBe('t_ret');
    expect(q.offset).toBe(5e-9);
    expect(q.signed).toBe(false);
    expect(Array.from(q.values)).toEqual([-Math.fround(1e-9), -Math.fround(2e-9), 0]);
    expect(q.autoRange).toEqual({ min: -Math.fround(2e-9), max: -Math.fround(1e-9) });
  });

  it('reports no ranges when every point is masked', () => {
    const fields = allocateSliceFields(2, 2, 0);
    planeOf(fields, 'Ex').fill(1);
    fields.mask.fill(MASK_ON_CHARGE);
    for (const quantity of ['E', 'component', 'retardedTime'] as const) {
      const q = quantityValues(fields, { quantity, component: 'Ex' });
      expect(q.dataRange).toBeNull();
      expect(q.autoRange).toBeNull();
    }
  });

  it('labels the radiation part and leaves non-finite values out of the ranges', () => {
    const fields = allocateSliceFields(3, 1, 0);
    planeOf(fields, 'Ez_rad').set([1, Number.NaN, 10]);
    const q = quantityValues(fields, { quantity: 'Erad', component: 'Ex' });
    expect(q.label).toBe('|E_rad|');
    expect(q.dataRange).toEqual({ min: 1, max: 10 });
  });
});
