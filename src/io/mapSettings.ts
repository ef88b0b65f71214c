/** What a field map shows and how: shared by the app's display and the scenario document. */

/** A magnitude, one signed component, or the retarded time. */
export const MAP_QUANTITIES = ['E', 'B', 'S', 'Erad', 'component', 'retardedTime'] as const;
export type MapQuantity = (typeof MAP_QUANTITIES)[number];

export const FIELD_COMPONENTS = [
  'Ex',
  'Ey',
  'Ez',
  'Bx',
  'By',
  'Bz',
  'Sx',
  'Sy',
  'Sz',
  'Ex_rad',
  'Ey_rad',
  'Ez_rad',
] as const;
export type FieldComponent = (typeof FIELD_COMPONENTS)[number];

export const SCALE_KINDS = ['log', 'linear'] as const;
export type ScaleKind = (typeof SCALE_KINDS)[number];

/** Vector fields the arrows can show: E, its radiation part, or the Poynting vector. */
export const ARROW_QUANTITIES = ['E', 'Erad', 'S'] as const;
export type ArrowQuantity = (typeof ARROW_QUANTITIES)[number];

/** A colour range held by hand, in the quantity's SI unit (see the app's MapDisplay). */
export interface HeldRange {
  min: number;
  max: number;
}

/** The map settings a scenario document carries. */
export interface MapSettings {
  quantity: MapQuantity;
  component: FieldComponent;
  scale: ScaleKind;
  range: 'auto' | HeldRange;
  arrows: ArrowQuantity | 'off';
  shells: boolean;
}

/** What a fresh page shows: |E| on a log scale, automatic range, shells on, no arrows. */
export function defaultMapSettings(): MapSettings {
  return {
    quantity: 'E',
    component: 'Ey',
    scale: 'log',
    range: 'auto',
    arrows: 'off',
    shells: true,
  };
}
