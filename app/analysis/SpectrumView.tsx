import { useMemo } from 'react';
import { energySpectrum, SPECTRUM_WINDOWS, type SpectrumWindow } from '../../src/analysis/spectrum';
import { spectrumToCsv } from '../../src/io/probeCsv';
import { formatSI } from '../format/siFormat';
import { useAppState } from '../hooks/useAppState';
import { download, fileStem } from '../io/download';
import { LineChart } from './LineChart';
import { spectrumMarks } from './spectrumMarks';
import { usePulse } from './usePulse';

const UNIT = 'J/(m²·Hz)';

/** The energy spectral density per unit area of the selected probe's pulse. */
export function SpectrumView() {
  const pulse = usePulse();
  const window = useAppState((s) => s.spectrumWindow);
  const log = useAppState((s) => s.spectrumLog);
  const setAnalysis = useAppState((s) => s.setAnalysis);
  const scenario = useAppState((s) => s.scenario);
  const selectedCharge = useAppState((s) => s.selectedCharge);
  const spectrum = useMemo(
    () => (pulse ? energySpectrum(pulse.series, window) : null),
    [pulse, window],
  );
  const marks = useMemo(() => {
    const path = scenario?.charges[selectedCharge]?.path;
    return path && pulse ? spectrumMarks(path, pulse.probe.position) : [];
  }, [scenario, selectedCharge, pulse]);
  // The zero-frequency bin has no place on a log axis.
  const shown = useMemo(() => {
    if (spectrum === null) return null;
    const start = log.f ? 1 : 0;
    return { f: spectrum.f.subarray(start), density: spectrum.energyDensity.subarray(start) };
  }, [spectrum, log.f]);

  return (
    <div className="analysis-view">
      <div className="analysis-controls">
        <label className="inline-choice">
          <span>Window</span>
          <select
            aria-label="FFT window"
            value={window}
            onChange={(event) =>
              setAnalysis({ spectrumWindow: event.currentTarget.value as SpectrumWindow })
            }
          >
            {SPECTRUM_WINDOWS.map((name) => (
              <option key={name} value={name}>
                {name === 'hann' ? 'Hann' : 'none (rectangular)'}
              </option>
            ))}
          </select>
        </label>
        <label className="inline-choice">
          <input
            type="checkbox"
            checked={log.f}
            onChange={(event) =>
              setAnalysis({ spectrumLog: { ...log, f: event.currentTarget.checked } })
            }
          />
          log frequency
        </label>
        <label className="inline-choice">
          <input
            type="checkbox"
            checked={log.density}
            onChange={(event) =>
              setAnalysis({ spectrumLog: { ...log, density: event.currentTarget.checked } })
            }
          />
          log density
        </label>
      </div>
      {pulse === null || shown === null || spectrum === null ? (
        <p className="muted">Select or place a probe: its pulse is transformed here.</p>
      ) : (
        <>
          <p className="muted sampling-note">
            Probe {pulse.probe.name}, energy per unit area per unit frequency (one-sided),
            {` ${spectrum.f.length} bins of ${formatSI(spectrum.df, 'Hz')}`}.
            {marks.length > 0 && ' Dashed: the frequency the path predicts.'}{' '}
            <button
              type="button"
              className="link-button"
              onClick={() =>
                download(
                  `probe-${fileStem(pulse.probe.name)}-spectrum.csv`,
                  spectrumToCsv(spectrum),
                  'text/csv',
                )
              }
            >
              Save the spectrum as CSV
            </button>
          </p>
          <LineChart
            label={`Energy spectral density at probe ${pulse.probe.name}, ${UNIT}, against frequency in Hz`}
            x={shown.f}
            series={[{ label: 'd²W/dA df', values: shown.density, colour: '#46d2ff' }]}
            xUnit="Hz"
            yUnit={UNIT}
            logX={log.f}
            logY={log.density}
            marks={marks}
            testId="spectrum-chart"
          />
        </>
      )}
    </div>
  );
}
