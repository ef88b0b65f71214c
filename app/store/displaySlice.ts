import { defaultMapSettings, type MapSettings } from '../../src/io/mapSettings';
import type { ArrowQuantity } from '../field/arrowLattice';
import type { MapDisplay } from '../field/mapQuantity';
import type { SliceCreator } from './appState';

export interface DisplaySlice {
  display: MapDisplay;
  /** Which vector the arrows show, or none. */
  arrows: ArrowQuantity | 'off';
  /** Light-cone shells on or off. */
  shells: boolean;
  setDisplay(change: Partial<MapDisplay>): void;
  setArrows(arrows: ArrowQuantity | 'off'): void;
  setShells(shells: boolean): void;
}

export const createDisplaySlice: SliceCreator<DisplaySlice> = (set) => ({
  ...displayStateOf(defaultMapSettings()),
  setDisplay: (change) => set((state) => ({ display: { ...state.display, ...change } })),
  setArrows: (arrows) => set({ arrows }),
  setShells: (shells) => set({ shells }),
});

/** The display slice's fields for a scenario's map settings. */
export function displayStateOf(
  settings: MapSettings,
): Pick<DisplaySlice, 'display' | 'arrows' | 'shells'> {
  const { arrows, shells, quantity, component, scale, range } = settings;
  return { display: { quantity, component, scale, range }, arrows, shells };
}

/** The map settings a saved scenario records. */
export function mapSettingsOf(
  state: Pick<DisplaySlice, 'display' | 'arrows' | 'shells'>,
): MapSettings {
  return { ...state.display, arrows: state.arrows, shells: state.shells };
}
