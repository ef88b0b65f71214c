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
  display: { quantity: 'E', component: 'Ey', scale: 'log', range: 'auto' },
  arrows: 'off',
  shells: true,
  setDisplay: (change) => set((state) => ({ display: { ...state.display, ...change } })),
  setArrows: (arrows) => set({ arrows }),
  setShells: (shells) => set({ shells }),
});
