import type { SlicePool } from '../../src/engine/slicePool';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import type { Charge } from '../../src/physics/charge';
import { computeFieldMap } from '../field/computeFieldMap';
import type { FieldMap } from '../field/fieldMap';
import type { AppStore } from '../store/appStore';
import { selectSliceSpec } from '../store/sliceSpecOf';
import { createBrowserSlicePool } from './browserSlicePool';

/** Changes closer together than this, ms, are one gesture (a drag, playback): coarse maps only. */
export const SETTLE_MS = 150;

/**
 * Drives the slice pool from the store: whenever the charges or the slice change, a new map
 * is requested and the result written back to the store. A change overtakes the request in
 * flight only once that request's coarse pass is on screen; while changes keep coming (a drag,
 * playback) only coarse maps are computed, and the full map follows once they stop. So the
 * picture keeps up with the pointer instead of every pass being cancelled before it ends.
 * `makePool` makes the worker pool, given where to report a worker that failed. Returns a
 * function that stops it and ends the workers.
 */
export function startFieldEngine(
  store: AppStore,
  makePool: (onFault: (message: string) => void) => SlicePool = createBrowserSlicePool,
): () => void {
  // A worker that failed was replaced and its part recomputed: the user is told, in one line.
  const pool = makePool((message) => store.getState().setFieldState({ fieldFault: message }));
  let charges: readonly Charge[] | null = null;
  let spec: SliceSpec | null = null;
  let generation = 0;
  /** A request is still in its coarse pass, which a change must not cancel. */
  let coarsePending = false;
  /** The slice or charges changed while a coarse pass was under way. */
  let changedMeanwhile = false;
  let lastChangeAt = Number.NEGATIVE_INFINITY;
  let gesture = false;
  let settleTimer: ReturnType<typeof setTimeout> | null = null;
  /** The map on its way (or on screen) is only the coarse one. */
  let coarseOnlyShown = false;

  const launch = (full = !gesture) => {
    const state = store.getState();
    coarseOnlyShown = !full;
    if (state.charges !== charges) pool.setScene(state.charges);
    charges = state.charges;
    spec = selectSliceSpec(state);
    changedMeanwhile = false;
    if (charges.length === 0) return;
    const mine = ++generation;
    const wanted = spec;
    coarsePending = true;
    state.setFieldState({ fieldPending: true });
    const coarseDone = () => {
      if (mine !== generation || !coarsePending) return;
      coarsePending = false;
      if (changedMeanwhile) launch();
    };
    const onCoarse = (coarse: FieldMap) => {
      const shown = store.getState().fieldMap;
      // A coarse pass never replaces a full map of the same slice.
      const show = mine === generation && (shown === null || shown.coarse || shown.spec !== wanted);
      // The next request goes to the workers first, so they compute while this map is drawn.
      coarseDone();
      if (show) store.getState().setFieldState({ fieldMap: coarse });
    };
    computeFieldMap(pool, wanted, charges, onCoarse, !full)
      .then((map) => {
        if (!full && map !== null) onCoarse(map);
        coarseDone();
        if (full && map !== null && mine === generation)
          store.getState().setFieldState({ fieldMap: map, fieldPending: false, fieldError: null });
      })
      .catch((error: unknown) => {
        coarseDone();
        if (mine !== generation) return;
        const message = error instanceof Error ? error.message : String(error);
        store.getState().setFieldState({ fieldPending: false, fieldError: message });
      });
  };

  const update = () => {
    const state = store.getState();
    if (state.charges === charges && selectSliceSpec(state) === spec) return;
    const now = performance.now();
    gesture = now - lastChangeAt < SETTLE_MS;
    lastChangeAt = now;
    if (settleTimer !== null) clearTimeout(settleTimer);
    settleTimer = setTimeout(settle, SETTLE_MS);
    if (coarsePending) changedMeanwhile = true;
    else launch();
  };

  /** The gesture is over: compute the full map of where it ended, unless that is under way. */
  const settle = () => {
    settleTimer = null;
    gesture = false;
    if (!coarseOnlyShown) return;
    if (coarsePending) changedMeanwhile = true;
    else launch(true);
  };

  const unsubscribe = store.subscribe(update);
  update();
  return () => {
    unsubscribe();
    if (settleTimer !== null) clearTimeout(settleTimer);
    pool.dispose();
  };
}
