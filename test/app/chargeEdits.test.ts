import { describe, expect, it } from 'vitest';
import { sketchedPath, withControl, withPath } from '../../app/scenario/chargeEdits';
import type {
  ScenarioCharge,
  ScenarioPath,
  ScenarioSketchPath as SketchPath,
} from '../../src/io/scenario';

const orbit: ScenarioPath = {
  kind: 'preset',
  preset: 'circularOrbit',
  params: { radius: 0.01, beta: 0.7 },
  from: 0,
  to: 1e-9,
  samples: 101,
};
const sketch = sketchedPath(
  [
    [0, 0, 0],
    [0.05, 0.02, 0],
    [0.1, 0, 0],
  ],
  { kind: 'constant', beta: 0.9 },
) as SketchPath;
const charges: ScenarioCharge[] = ['a', 'b', 'c'].map((label) => ({
  label,
  charge: -1.602176634e-19,
  path: orbit,
}));

describe('withPath', () => {
  it('gives only the indexed charge the new path', () => {
    const next = withPath(charges, 1, sketch);
    expect(next[0]).toBe(charges[0]);
    expect(next[2]).toBe(charges[2]);
    expect(next[1]).toEqual({ ...charges[1], path: sketch });
    expect(charges[1].path).toBe(orbit); // the input is left alone
  });
});

describe('withControl', () => {
  it('moves one control point of a sketched path and nothing else', () => {
    const { controls, ...rest } = withControl(sketch, 1, [0.05, -0.03, 0.01]) as SketchPath;
    expect(controls).toEqual([
      [0, 0, 0],
      [0.05, -0.03, 0.01],
      [0.1, 0, 0],
    ]);
    const { controls: before, ...restBefore } = sketch;
    expect(rest).toEqual(restBefore);
    expect(before[1]).toEqual([0.05, 0.02, 0]); // the input is left alone
  });

  it('leaves paths that are not sketches unchanged', () => {
    expect(withControl(orbit, 0, [1, 1, 1])).toBe(orbit);
  });
});
