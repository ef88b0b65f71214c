import { useMemo } from 'react';
import { NAMED_PLANES, type SliceSpec } from '../../src/engine/sliceSpec';
import { selectSliceSpec } from '../store/sliceSpecOf';
import { useAppState } from './useAppState';

/** The slice now in view (its map may still be on its way). */
export function useSliceSpec(): SliceSpec {
  return useAppState(selectSliceSpec);
}

/**
 * Where the slice lies, without its time (set to 0): the same object while only the time
 * moves, so what draws the geometry is not redone at every step of the time.
 */
export function useSliceGeometry(): SliceSpec {
  const plane = useAppState((s) => s.plane);
  const center = useAppState((s) => s.center);
  const size = useAppState((s) => s.size);
  const resolution = useAppState((s) => s.resolution);
  return useMemo(() => {
    const { u, v } = NAMED_PLANES[plane];
    return {
      center,
      u,
      v,
      width: size[0],
      height: size[1],
      nx: resolution[0],
      ny: resolution[1],
      time: 0,
    };
  }, [plane, center, size, resolution]);
}
