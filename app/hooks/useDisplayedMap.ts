import { type DisplayedMap, displayedMap } from '../field/displayedMap';
import { useAppState } from './useAppState';

/** The latest field map with the quantity and colour scale the user chose. */
export function useDisplayedMap(): DisplayedMap | null {
  const map = useAppState((s) => s.fieldMap);
  const display = useAppState((s) => s.display);
  return displayedMap(map, display);
}
