import { useAppState } from '../hooks/useAppState';
import { SpeedField } from './fields/SpeedField';

/** How the next drawn path is travelled: one β throughout, or β changing steadily from start to end. */
export function SketchSpeedControls() {
  const speed = useAppState((s) => s.sketchSpeed);
  const setSpeed = useAppState((s) => s.setSketchSpeed);
  return (
    <fieldset className="sketch-speed">
      <legend className="visually-hidden">Speed along the drawn path</legend>
      <label className="inline-choice">
        <span>Speed</span>
        <select
          aria-label="Speed along the drawn path"
          value={speed.kind}
          onChange={(event) =>
            setSpeed(
              event.currentTarget.value === 'ramp'
                ? {
                    kind: 'ramp',
                    betaStart: speed.kind === 'ramp' ? speed.betaStart : 0.5,
                    betaEnd: speed.kind === 'ramp' ? speed.betaEnd : speed.beta,
                  }
                : {
                    kind: 'constant',
                    beta: speed.kind === 'constant' ? speed.beta : speed.betaEnd,
                  },
            )
          }
        >
          <option value="constant">constant</option>
          <option value="ramp">changing linearly in time</option>
        </select>
      </label>
      {speed.kind === 'constant' ? (
        <SpeedField
          label="Sketch speed"
          beta={speed.beta}
          testId="sketch-beta"
          onCommit={(beta) => {
            setSpeed({ kind: 'constant', beta });
            return null;
          }}
        />
      ) : (
        <>
          <SpeedField
            label="Speed at start"
            beta={speed.betaStart}
            onCommit={(betaStart) => {
              setSpeed({ ...speed, betaStart });
              return null;
            }}
          />
          <SpeedField
            label="Speed at end"
            beta={speed.betaEnd}
            onCommit={(betaEnd) => {
              setSpeed({ ...speed, betaEnd });
              return null;
            }}
          />
        </>
      )}
    </fieldset>
  );
}
