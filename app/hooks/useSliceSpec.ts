import type { SliceSpec } from '../../src/engine/sliceSpec';
import { selectSliceSpec } from '../store/sliceSpecOf';
import { useAppState } from './useAppState';

/** The slice now in view (its map may still be on its way). */
export function useSliceSpec(): SliceSpec {
  return useAppState(selectSliceSpec);
}
