import { useId, useMemo } from 'react';
import { formatSI } from '../format/siFormat';
import { useAppState } from '../hooks/useAppState';

/** Steps across the sampled span; arrow keys move one step. */
const STEPS = 300;

/** A slider for the observation time over the span where the charges' paths are sampled. */
export function TimeControl() {
  const id = useId();
  const time = useAppState((s) => s.time);
  const setTime = useAppState((s) => s.setTime);
  const charges = useAppState((s) => s.charges);
  const span = useMemo(() => {
    if (charges.length === 0) return null;
    let start = Number.POSITIVE_INFINITY;
    let end = Number.NEGATIVE_INFINITY;
    for (const { path } of charges) {
      const [t0, t1] = path.timeSpan;
      start = Math.min(start, t0);
      end = Math.max(end, t1);
    }
    return end > start ? { start, end } : null;
  }, [charges]);
  if (span === null) return null;
  const text = `t = ${formatSI(time, 's', 4)}`;
  return (
    <div className="time-control">
      <div className="time-control-head">
        <label htmlFor={id}>Observation time</label>
        <output htmlFor={id} data-testid="observation-time">
          {text}
        </output>
      </div>
      <input
        id={id}
        type="range"
        min={span.start}
        max={span.end}
        step={(span.end - span.start) / STEPS}
        value={time}
        aria-valuetext={text}
        onChange={(event) => setTime(Number(event.currentTarget.value))}
      />
      <div className="time-control-scale" aria-hidden="true">
        <span>{formatSI(span.start, 's', 3)}</span>
        <span>{formatSI(span.end, 's', 3)}</span>
      </div>
    </div>
  );
}
