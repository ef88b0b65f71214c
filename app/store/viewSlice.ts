import type { PlaneName, Triple } from '../../src/engine/sliceSpec';
import type { ScenarioView } from '../../src/io/scenario';
import type { SliceCreator } from './appState';

/** Where the slice lies and how finely it is sampled; the time lives in the time slice. */
export interface ViewSlice {
  plane: PlaneName;
  /** Centre of the slice, m. */
  center: Triple;
  /** Width and height, m. */
  size: [number, number];
  /** Grid points along width and height. */
  resolution: [number, number];
  showView(view: ScenarioView): void;
}

export const createViewSlice: SliceCreator<ViewSlice> = (set) => ({
  plane: 'xy',
  center: [0, 0, 0],
  size: [0.2, 0.2],
  resolution: [64, 64],
  showView: (view) =>
    set({
      plane: view.plane,
      center: [...view.center],
      size: [...view.size],
      resolution: [...view.resolution],
    }),
});
