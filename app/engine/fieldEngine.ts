import type { SlicePool } from '../../src/engine/slicePool';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import type { Charge } from '../../src/physics/charge';
import { computeFieldMap } from '../field/computeFieldMap';
import type { AppStore } from '../store/appStore';
import { selectSliceSpec } from '../store/sliceSpecOf';
import { createBrowserSlicePool } from './browserSlicePool';

/**
 * Drives the slice pool from the store: whenever the charges or the slice change, a new map
 * is requested (overtaking any older one) and the result is written back to the store.
 * Returns a function that stops it and ends the workers.
 */
export function startFieldEngine(
  store: AppStore,
  pool: SlicePool = createBrowserSlicePool((message) =>
    store.getState().setFieldState({ fieldFault: message }),
  ),
): () => void {
  let charges: readonly Charge[] | null = null;
  let spec: SliceSpec | null = null;
  let generation = 0;

  const update = () => {
    const state = store.getState();
    const nextSpec = selectSliceSpec(state);
    if (state.charges === charges && nextSpec === spec) return;
    if (state.charges !== charges) pool.setScene(state.charges);
    charges = state.charges;
    spec = nextSpec;
    if (charges.length === 0) return;
    const mine = ++generation;
    state.setFieldState({ fieldPending: true });
    computeFieldMap(pool, nextSpec, charges, (coarse) => {
      const shown = store.getState().fieldMap;
      // A coarse pass never replaces a full map of the same slice.
      if (mine === generation && (shown === null || shown.coarse || shown.spec !== nextSpec))
        store.getState().setFieldState({ fieldMap: coarse });
    })
      .then((map) => {
        if (map !== null && mine === generation)
          store.getState().setFieldState({ fieldMap: map, fieldPending: false, fieldError: null });
      })
      .catch((error: unknown) => {
        if (mine !== generation) return;
        const message = error instanceof Error ? error.message : String(error);
        store.getState().setFieldState({ fieldPending: false, fieldError: message });
      });
  };

  const unsubscribe = store.subscribe(update);
  update();
  return () => {
    unsubscribe();
    pool.dispose();
  };
}
