import { useId, useMemo } from 'react';

import { formatSI } from '../format/siFormat';
import { useAppState } from '../hooks/useAppState';
import { useSliceGeometry } from '../hooks/useSliceSpec';
import { observationSpan, PLAYBACK_RATES, TIME_STEPS } from '../scenario/timeSpan';

// Made once: the list is long and the bar re-renders at every move of the time.
const RATE_OPTIONS = PLAYBACK_RATES.map((choice) => (
  <option key={choice} value={choice}>
    {formatSI(choice, 's', 1)} per s
  </option>
));

/** Play, pause, step and scrub the observation time; choose how fast it plays. */
export function TimeBar() {
  const id = useId();
  const time = useAppState((s) => s.time);
  const playing = useAppState((s) => s.playing);
  const rate = useAppState((s) => s.rate);
  const setTime = useAppState((s) => s.setTime);
  const setPlaying = useAppState((s) => s.setPlaying);
  const setRate = useAppState((s) => s.setRate);
  const charges = useAppState((s) => s.charges);
  const spec = useSliceGeometry();
  const span = useMemo(() => observationSpan(charges, spec), [charges, spec]);
  if (span === null) return null;
  const step = (span.end - span.start) / TIME_STEPS;
  const text = `t = ${formatSI(time, 's', 4)}`;
  const stepBy = (direction: number) => {
    setPlaying(false);
    setTime(Math.min(span.end, Math.max(span.start, time + direction * step)));
  };

  return (
    <fieldset className="time-bar">
      <legend className="visually-hidden">Observation time controls</legend>
      <button
        type="button"
        className="time-button"
        onClick={() => setPlaying(!playing)}
        aria-label={playing ? 'Pause' : 'Play'}
        aria-keyshortcuts="Space"
        data-testid="play-toggle"
      >
        {playing ? '❚❚' : '▶'}
      </button>
      <button
        type="button"
        className="time-button"
        onClick={() => stepBy(-1)}
        aria-label={`Step back ${formatSI(step, 's')}`}
      >
        ◀︎|
      </button>
      <button
        type="button"
        className="time-button"
        onClick={() => stepBy(1)}
        aria-label={`Step forward ${formatSI(step, 's')}`}
      >
        |▶︎
      </button>
      <div className="time-slider">
        <label htmlFor={id} className="visually-hidden">
          Observation time
        </label>
        <input
          id={id}
          type="range"
          min={span.start}
          max={span.end}
          step={step}
          value={time}
          aria-valuetext={text}
          onChange={(event) => {
            setPlaying(false);
            setTime(Number(event.currentTarget.value));
          }}
        />
        <div className="time-slider-scale" aria-hidden="true">
          <span>{formatSI(span.start, 's', 3)}</span>
          <span>{formatSI(span.end, 's', 3)}</span>
        </div>
      </div>
      <output htmlFor={id} className="time-readout" data-testid="observation-time">
        {text}
      </output>
      <label className="rate-choice">
        <span>Rate</span>
        <select
          value={rate}
          aria-label="Playback rate"
          onChange={(event) => setRate(Number(event.currentTarget.value))}
        >
          {RATE_OPTIONS}
        </select>
      </label>
    </fieldset>
  );
}
