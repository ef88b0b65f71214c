import { NAMED_PLANES, type SliceSpec } from '../../src/engine/sliceSpec';
import type { AppState } from './appState';

type SpecInputs = Pick<AppState, 'plane' | 'center' | 'size' | 'resolution' | 'time'>;

let lastInputs: SpecInputs | null = null;
let lastSpec: SliceSpec | null = null;

/** The slice the view and time describe; the same object while none of them changes. */
export function selectSliceSpec(state: SpecInputs): SliceSpec {
  const previous = lastInputs;
  if (
    previous !== null &&
    lastSpec !== null &&
    previous.plane === state.plane &&
    previous.center === state.center &&
    previous.size === state.size &&
    previous.resolution === state.resolution &&
    previous.time === state.time
  ) {
    return lastSpec;
  }
  const axes = NAMED_PLANES[state.plane];
  lastInputs = {
    plane: state.plane,
    center: state.center,
    size: state.size,
    resolution: state.resolution,
    time: state.time,
  };
  lastSpec = {
    center: state.center,
    u: axes.u,
    v: axes.v,
    width: state.size[0],
    height: state.size[1],
    nx: state.resolution[0],
    ny: state.resolution[1],
    time: state.time,
  };
  return lastSpec;
}
