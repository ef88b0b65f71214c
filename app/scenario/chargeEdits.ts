import type { Triple } from '../../src/engine/sliceSpec';
import type { ScenarioCharge, ScenarioPath } from '../../src/io/scenario';
import type { Point3, SketchSpeed } from '../../src/path/sketchPath';

/** Samples of a sketched path: enough for smooth curvature, few enough to rebuild during a drag. */
export const SKETCH_SAMPLES = 600;

/** The charges with charge `index` given a new path. */
export function withPath(
  charges: readonly ScenarioCharge[],
  index: number,
  path: ScenarioPath,
): ScenarioCharge[] {
  return charges.map((charge, k) => (k === index ? { ...charge, path } : charge));
}

/** A sketched path through `controls`, travelled from t = 0 at `speed`. */
export function sketchedPath(controls: readonly Point3[], speed: SketchSpeed): ScenarioPath {
  return {
    kind: 'sketch',
    controls: controls.map((point) => [point[0], point[1], point[2]]),
    speed,
    startTime: 0,
    samples: SKETCH_SAMPLES,
  };
}

/** A sketched path with control point `k` moved to `point`; other kinds are returned unchanged. */
export function withControl(path: ScenarioPath, k: number, point: Triple): ScenarioPath {
  if (path.kind !== 'sketch') return path;
  return {
    ...path,
    controls: path.controls.map((control, j) => (j === k ? [...point] : control)),
  };
}
