import { type ColourScale, colourScaleFor } from './colourScale';
import type { FieldMap } from './fieldMap';
import { type MapDisplay, type QuantityValues, quantityValues } from './mapQuantity';

/** A field map as shown: the chosen quantity per point and the colour scale it is painted with. */
export interface DisplayedMap {
  map: FieldMap;
  display: MapDisplay;
  quantity: QuantityValues;
  scale: ColourScale | null;
}

let last: DisplayedMap | null = null;

/** The displayed map for (map, display), computed once however many components ask. */
export function displayedMap(map: FieldMap | null, display: MapDisplay): DisplayedMap | null {
  if (map === null) return null;
  if (last !== null && last.map === map && last.display === display) return last;
  last = displayMap(map, display);
  return last;
}

/** The displayed map for (map, display), computed afresh and not remembered (for a picture). */
export function displayMap(map: FieldMap, display: MapDisplay): DisplayedMap {
  const quantity = quantityValues(map.fields, display);
  return { map, display, quantity, scale: colourScaleFor(quantity, display) };
}
