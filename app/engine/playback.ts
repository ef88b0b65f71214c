import { observationSpan } from '../scenario/timeSpan';
import type { AppStore } from '../store/appStore';
import { selectSliceSpec } from '../store/sliceSpecOf';

/** Longest frame gap played in full, s: after a stall the time jumps at most this much. */
const MAX_FRAME = 0.1;

/**
 * Advances the observation time while `playing` is set, at `rate` simulated seconds per second,
 * wrapping from the end of the span back to its start. Returns a function that stops it.
 */
export function startPlayback(store: AppStore): () => void {
  let frame = 0;
  let last = 0;
  const tick = (now: number) => {
    const state = store.getState();
    if (!state.playing) {
      frame = 0;
      return;
    }
    const dt = last === 0 ? 0 : Math.min(MAX_FRAME, (now - last) / 1000);
    last = now;
    const span = observationSpan(state.charges, selectSliceSpec(state));
    if (span !== null) {
      let next = state.time + state.rate * dt;
      if (next > span.end || next < span.start) next = span.start;
      state.setTime(next);
    }
    frame = requestAnimationFrame(tick);
  };
  const unsubscribe = store.subscribe((state, previous) => {
    if (state.playing && !previous.playing && frame === 0) {
      last = 0;
      frame = requestAnimationFrame(tick);
    }
  });
  return () => {
    unsubscribe();
    cancelAnimationFrame(frame);
  };
}
