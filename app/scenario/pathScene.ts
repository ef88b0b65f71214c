import type { PlaneName, Triple } from '../../src/engine/sliceSpec';
import type { TrajectorySummary } from '../../src/io/trajectoryImport';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';
import { SIZE_LIMITS } from '../store/viewSlice';

/** The slice and time that show an imported path and the light it sent out. */
export interface PathScene {
  plane: PlaneName;
  center: Triple;
  size: [number, number];
  time: number;
}

const PLANE_OF_AXES: Record<string, PlaneName> = { '01': 'xy', '02': 'xz', '12': 'yz' };

/**
 * The plane of the path's two largest extents, through the middle of its bounding box, seen
 * at the last sample time: wide enough for the path and for the light that has left it by
 * then (c times the path's duration), but not so wide that a slow, long path shrinks to a dot.
 */
export function sceneForPath(summary: TrajectorySummary): PathScene {
  const extent = summary.max.map((max, k) => max - summary.min[k]);
  const [a, b] = [0, 1, 2].sort((p, q) => extent[q] - extent[p] || p - q).slice(0, 2);
  const plane = PLANE_OF_AXES[`${Math.min(a, b)}${Math.max(a, b)}`];
  const center = summary.max.map((max, k) => (max + summary.min[k]) / 2) as Triple;
  const [t0, t1] = summary.timeSpan;
  const reach = Math.max(extent[a], extent[b]);
  const light = SPEED_OF_LIGHT * (t1 - t0);
  const span = reach > 0 ? Math.max(reach, Math.min(light, 20 * reach)) : light;
  const width = Math.min(SIZE_LIMITS.max, Math.max(SIZE_LIMITS.min * 10, 1.2 * span));
  return { plane, center, size: [width, width], time: t1 };
}
