import type { ScenarioPath } from '../../src/io/scenario';
import { formatLength } from '../format/lengthUnit';
import { formatSI } from '../format/siFormat';
import { useAppState } from '../hooks/useAppState';
import { withPath } from '../scenario/chargeEdits';
import { SpeedField } from './fields/SpeedField';

type SketchPath = Extract<ScenarioPath, { kind: 'sketch' }>;

/** A drawn path: how it is travelled; its shape is edited by dragging its control points. */
export function SketchEditor({ index, path }: { index: number; path: SketchPath }) {
  const scenario = useAppState((s) => s.scenario);
  const charges = useAppState((s) => s.charges);
  const editCharges = useAppState((s) => s.editCharges);
  const setTool = useAppState((s) => s.setTool);
  const built = charges[index]?.path;
  const setSpeed = (speed: SketchPath['speed']) =>
    scenario === null
      ? 'no scenario is open'
      : editCharges(withPath(scenario.charges, index, { ...path, speed }), 'change the speed');
  let length = 0;
  for (let k = 1; k < path.controls.length; k++) {
    const [a, b] = [path.controls[k - 1], path.controls[k]];
    length += Math.hypot(b[0] - a[0], b[1] - a[1], b[2] - a[2]);
  }

  return (
    <div className="sketch-editor">
      <p className="muted">
        Drawn through {path.controls.length} control points (about {formatLength(length)} between
        them), smoothed so the acceleration is continuous.
        {built &&
          ` Travelled from ${formatSI(built.timeSpan[0], 's')} to ${formatSI(built.timeSpan[1], 's')}.`}{' '}
        Drag a control point on the map to reshape it, or{' '}
        <button type="button" className="link-button" onClick={() => setTool('sketch')}>
          draw it again
        </button>
        .
      </p>
      {path.speed.kind === 'constant' ? (
        <SpeedField
          label="Speed along the path"
          beta={path.speed.beta}
          testId="path-beta"
          onCommit={(beta) => setSpeed({ kind: 'constant', beta })}
        />
      ) : (
        <>
          <SpeedField
            label="Speed at start"
            beta={path.speed.betaStart}
            onCommit={(betaStart) =>
              path.speed.kind === 'ramp' ? setSpeed({ ...path.speed, betaStart }) : null
            }
          />
          <SpeedField
            label="Speed at end"
            beta={path.speed.betaEnd}
            onCommit={(betaEnd) =>
              path.speed.kind === 'ramp' ? setSpeed({ ...path.speed, betaEnd }) : null
            }
          />
        </>
      )}
    </div>
  );
}
