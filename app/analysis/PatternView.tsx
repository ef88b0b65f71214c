import { useMemo } from 'react';
import { beamingHalfAngle, patternInPlane } from '../../src/analysis/angularPattern';
import { pathState } from '../../src/path/pathState';
import { formatSI } from '../format/siFormat';
import { TIME_UNITS } from '../format/units';
import { useAppState } from '../hooks/useAppState';
import { useSliceGeometry } from '../hooks/useSliceSpec';
import { NumberField } from '../panels/fields/NumberField';
import { axisName } from '../view/sliceCoordinates';

const ANGLES = 360;
const SIZE = 240;

/** The source time of the pattern: the one set, or the middle of the charge's sampled span. */
export function usePatternSourceTime(): number | null {
  const charges = useAppState((s) => s.charges);
  const selected = useAppState((s) => s.selectedCharge);
  const chosen = useAppState((s) => s.patternSourceTime);
  const charge = charges[selected];
  if (charge === undefined) return null;
  if (chosen !== null) return chosen;
  const [t0, t1] = charge.path.timeSpan;
  return (t0 + t1) / 2;
}

/** dP/dΩ of the selected charge in the slice's plane at one source time, as a polar plot. */
export function PatternView() {
  const charges = useAppState((s) => s.charges);
  const selected = useAppState((s) => s.selectedCharge);
  const per = useAppState((s) => s.patternPer);
  const sphere = useAppState((s) => s.patternSphere);
  const setAnalysis = useAppState((s) => s.setAnalysis);
  const mode = useAppState((s) => s.viewMode);
  const geometry = useSliceGeometry();
  const sourceTime = usePatternSourceTime();
  const charge = charges[selected];
  const result = useMemo(() => {
    if (charge === undefined || sourceTime === null) return null;
    const pattern = patternInPlane(
      charge.path,
      charge.charge,
      sourceTime,
      geometry.u,
      geometry.v,
      ANGLES,
    );
    const values = per === 'source' ? pattern.perSourceTime : pattern.perObserverTime;
    let peak = 0;
    for (let k = 0; k < values.length; k++) peak = Math.max(peak, values[k]);
    const state = pathState();
    charge.path.stateAt(sourceTime, state);
    const vu = state.vx * geometry.u[0] + state.vy * geometry.u[1] + state.vz * geometry.u[2];
    const vv = state.vx * geometry.v[0] + state.vy * geometry.v[1] + state.vz * geometry.v[2];
    return {
      pattern,
      values,
      peak,
      cone: beamingHalfAngle(charge.path, sourceTime),
      heading: Math.hypot(vu, vv) > 0 ? Math.atan2(vv, vu) : null,
    };
  }, [charge, sourceTime, geometry, per]);
  if (result === null || sourceTime === null) return <p className="muted">No scenario open.</p>;

  const half = SIZE / 2;
  const radius = half - 16;
  const points: string[] = [];
  for (let k = 0; k < result.values.length; k++) {
    const r = result.peak > 0 ? (radius * result.values[k]) / result.peak : 0;
    const angle = result.pattern.angle[k];
    points.push(
      `${(half + r * Math.cos(angle)).toFixed(2)},${(half - r * Math.sin(angle)).toFixed(2)}`,
    );
  }
  const ray = (angle: number) => ({
    x2: half + radius * Math.cos(angle),
    y2: half - radius * Math.sin(angle),
  });
  const plane = `${axisName(geometry.u)}${axisName(geometry.v)}`;

  return (
    <div className="analysis-view pattern-view">
      <div className="analysis-controls">
        <NumberField
          label="Source time"
          value={sourceTime}
          units={TIME_UNITS}
          onCommit={(t) => {
            setAnalysis({ patternSourceTime: t });
            return null;
          }}
        />
        <fieldset className="inline-choice">
          <legend className="visually-hidden">Power per unit of</legend>
          {(['source', 'observer'] as const).map((choice) => (
            <label key={choice} className="inline-choice">
              <input
                type="radio"
                name="pattern-per"
                checked={per === choice}
                onChange={() => setAnalysis({ patternPer: choice })}
              />
              per unit {choice} time
            </label>
          ))}
        </fieldset>
        <label className="inline-choice">
          <input
            type="checkbox"
            checked={sphere}
            onChange={(event) => setAnalysis({ patternSphere: event.currentTarget.checked })}
          />
          shaded sphere in the 3D view{mode === '2d' ? ' (switch to Orbit 3D)' : ''}
        </label>
      </div>
      <div className="pattern-body">
        <svg
          width={SIZE}
          height={SIZE}
          role="img"
          aria-label={`Polar plot of dP/dΩ per unit ${per} time in the ${plane} plane at source time ${formatSI(sourceTime, 's', 4)}, peak ${formatSI(result.peak, 'W/sr', 3)}`}
          data-testid="pattern-plot"
        >
          <circle cx={half} cy={half} r={radius} className="polar-ring" />
          <circle cx={half} cy={half} r={radius / 2} className="polar-ring" />
          <line x1={half - radius} y1={half} x2={half + radius} y2={half} className="polar-ring" />
          <line x1={half} y1={half - radius} x2={half} y2={half + radius} className="polar-ring" />
          {result.heading !== null && (
            <>
              <line
                x1={half}
                y1={half}
                {...ray(result.heading + result.cone)}
                className="polar-cone"
              />
              <line
                x1={half}
                y1={half}
                {...ray(result.heading - result.cone)}
                className="polar-cone"
              />
            </>
          )}
          <polygon points={points.join(' ')} className="polar-curve" />
          <text x={SIZE - 14} y={half - 4} className="polar-label">
            {axisName(geometry.u)}
          </text>
          <text x={half + 4} y={12} className="polar-label">
            {axisName(geometry.v)}
          </text>
        </svg>
        <p className="muted pattern-note" data-testid="pattern-note">
          dP/dΩ per unit {per} time in the {plane} plane, at source time{' '}
          {formatSI(sourceTime, 's', 4)}. Peak {formatSI(result.peak, 'W/sr', 4)} (outer ring), half
          ring half of it. Dashed: the beaming cone 1/γ = {formatSI(result.cone, 'rad', 3)} about
          the velocity.
          {per === 'observer'
            ? ' Per unit observer time is per unit source time divided by 1 − n·β: what a detector collects.'
            : ' Per unit source time integrates to the Liénard power.'}
        </p>
      </div>
    </div>
  );
}
