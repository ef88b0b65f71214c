import { useMemo } from 'react';
import { seriesToCsv } from '../../src/io/probeCsv';
import { TIME_UNITS } from '../format/units';
import { useAppState } from '../hooks/useAppState';
import { download, fileStem } from '../io/download';
import { NumberField } from '../panels/fields/NumberField';
import type { PulseQuantity } from '../store/analysisSlice';
import { LineChart } from './LineChart';
import { usePulse, usePulseWindow } from './usePulse';

export const COMPONENT_COLOURS = ['#46d2ff', '#ff9de2', '#9ef0c4'] as const;
const UNITS: Record<PulseQuantity, string> = { E: 'V/m', B: 'T', S: 'W/m²' };

/** What the selected probe records over an observer-time window: E, B or S against t. */
export function PulseView() {
  const pulse = usePulse();
  const window = usePulseWindow();
  const quantity = useAppState((s) => s.pulseQuantity);
  const setAnalysis = useAppState((s) => s.setAnalysis);
  const chart = useMemo(() => {
    if (pulse === null) return null;
    const { series } = pulse;
    const columns = {
      E: [series.ex, series.ey, series.ez],
      B: [series.bx, series.by, series.bz],
      S: [series.sx, series.sy, series.sz],
    }[quantity];
    return {
      x: series.t,
      series: columns.map((values, k) => ({
        label: `${quantity}${'xyz'[k]}`,
        values,
        colour: COMPONENT_COLOURS[k],
      })),
    };
  }, [pulse, quantity]);

  if (window === null) return <p className="muted">No scenario open.</p>;
  return (
    <div className="analysis-view">
      <div className="analysis-controls">
        <label className="inline-choice">
          <span>Shows</span>
          <select
            aria-label="Quantity of the pulse"
            value={quantity}
            onChange={(event) =>
              setAnalysis({ pulseQuantity: event.currentTarget.value as PulseQuantity })
            }
          >
            <option value="E">E (V/m)</option>
            <option value="B">B (T)</option>
            <option value="S">S (W/m²)</option>
          </select>
        </label>
        <NumberField
          label="Window from"
          value={window.from}
          units={TIME_UNITS}
          check={(from) => (from < window.to ? null : 'must be before the end of the window')}
          onCommit={(from) => {
            setAnalysis({ pulseWindow: { from, to: window.to } });
            return null;
          }}
        />
        <NumberField
          label="to"
          value={window.to}
          units={TIME_UNITS}
          check={(to) => (to > window.from ? null : 'must be after the start of the window')}
          onCommit={(to) => {
            setAnalysis({ pulseWindow: { from: window.from, to } });
            return null;
          }}
        />
      </div>
      {pulse === null || chart === null ? (
        <p className="muted">Select or place a probe to see what it records over time.</p>
      ) : (
        <>
          <p className="muted sampling-note" data-testid="sampling-note">
            Probe {pulse.probe.name}: {pulse.sampling.samples} samples. {pulse.sampling.reason}{' '}
            <button
              type="button"
              className="link-button"
              onClick={() =>
                download(
                  `probe-${fileStem(pulse.probe.name)}-series.csv`,
                  seriesToCsv(pulse.series),
                  'text/csv',
                )
              }
            >
              Save the series as CSV
            </button>
          </p>
          <LineChart
            label={`${quantity} at probe ${pulse.probe.name} against observer time, ${UNITS[quantity]}`}
            x={chart.x}
            series={chart.series}
            xUnit="s"
            yUnit={UNITS[quantity]}
            testId="pulse-chart"
          />
        </>
      )}
    </div>
  );
}
