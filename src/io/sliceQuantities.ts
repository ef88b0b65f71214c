import { PLANE_UNITS, planeOf, type SliceFields } from '../engine/slicePlanes';
import { VACUUM_PERMEABILITY } from '../physics/constants';

/** What a slice export can hold, and the components each choice writes, in order. */
export const QUANTITIES = {
  E: ['Ex', 'Ey', 'Ez'],
  B: ['Bx', 'By', 'Bz'],
  S: ['Sx', 'Sy', 'Sz'],
  Erad: ['Ex_rad', 'Ey_rad', 'Ez_rad'],
  all: [
    'Ex',
    'Ey',
    'Ez',
    'Bx',
    'By',
    'Bz',
    'Ex_rad',
    'Ey_rad',
    'Ez_rad',
    'Sx',
    'Sy',
    'Sz',
    'delay',
    'on_charge',
  ],
} as const;

export type Quantity = keyof typeof QUANTITIES;
export type Component = (typeof QUANTITIES)['all'][number];

export const COMPONENT_UNITS: Record<Component, string> = {
  ...PLANE_UNITS,
  Sx: 'W/m^2',
  Sy: 'W/m^2',
  Sz: 'W/m^2',
  on_charge: '1',
};

export const COMPONENT_MEANINGS: Record<Component, string> = {
  Ex: 'electric field',
  Ey: 'electric field',
  Ez: 'electric field',
  Bx: 'magnetic flux density',
  By: 'magnetic flux density',
  Bz: 'magnetic flux density',
  Ex_rad: 'acceleration (radiation) part of E',
  Ey_rad: 'acceleration (radiation) part of E',
  Ez_rad: 'acceleration (radiation) part of E',
  Sx: 'Poynting vector E x B / mu0',
  Sy: 'Poynting vector E x B / mu0',
  Sz: 'Poynting vector E x B / mu0',
  delay: 'light travel time t - t_ret from the first charge',
  on_charge:
    '1 where the point is on a charge, within nearRadius of one, or so near that E or S would exceed float32 (fields set to 0)',
};

export function isQuantity(name: string): name is Quantity {
  return Object.hasOwn(QUANTITIES, name);
}

/** One component of a slice as a float32 array of nx·ny values, row-major j·nx + i. */
export function componentOf(fields: SliceFields, component: Component): Float32Array {
  const n = fields.nx * fields.ny;
  switch (component) {
    case 'Sx':
    case 'Sy':
    case 'Sz':
      return poyntingComponent(fields, component);
    case 'on_charge': {
      const out = new Float32Array(n);
      for (let p = 0; p < n; p++) out[p] = fields.mask[p];
      return out;
    }
    default:
      return planeOf(fields, component);
  }
}

function poyntingComponent(fields: SliceFields, component: 'Sx' | 'Sy' | 'Sz'): Float32Array {
  const ex = planeOf(fields, 'Ex');
  const ey = planeOf(fields, 'Ey');
  const ez = planeOf(fields, 'Ez');
  const bx = planeOf(fields, 'Bx');
  const by = planeOf(fields, 'By');
  const bz = planeOf(fields, 'Bz');
  const n = fields.nx * fields.ny;
  const out = new Float32Array(n);
  const m = 1 / VACUUM_PERMEABILITY;
  for (let p = 0; p < n; p++) {
    if (component === 'Sx') out[p] = (ey[p] * bz[p] - ez[p] * by[p]) * m;
    else if (component === 'Sy') out[p] = (ez[p] * bx[p] - ex[p] * bz[p]) * m;
    else out[p] = (ex[p] * by[p] - ey[p] * bx[p]) * m;
  }
  return out;
}
