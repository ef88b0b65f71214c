import { useMemo } from 'react';
import { NAMED_PLANES, type SliceSpec } from '../../src/engine/sliceSpec';
import { useAppState } from './useAppState';

/** The slice the view and time slices describe. */
export function useSliceSpec(): SliceSpec {
  const plane = useAppState((s) => s.plane);
  const center = useAppState((s) => s.center);
  const size = useAppState((s) => s.size);
  const resolution = useAppState((s) => s.resolution);
  const time = useAppState((s) => s.time);
  return useMemo(() => {
    const axes = NAMED_PLANES[plane];
    return {
      center,
      u: axes.u,
      v: axes.v,
      width: size[0],
      height: size[1],
      nx: resolution[0],
      ny: resolution[1],
      time,
    };
  }, [plane, center, size, resolution, time]);
}
