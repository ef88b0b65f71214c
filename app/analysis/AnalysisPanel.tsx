import { useAppState } from '../hooks/useAppState';
import type { AnalysisTab } from '../store/analysisSlice';
import { PatternView } from './PatternView';
import { PowerView } from './PowerView';
import { PulseView } from './PulseView';
import { SpectrumView } from './SpectrumView';

const TABS: { tab: AnalysisTab; label: string }[] = [
  { tab: 'pulse', label: 'Pulse at probe' },
  { tab: 'spectrum', label: 'Spectrum at probe' },
  { tab: 'power', label: 'Radiated power' },
  { tab: 'pattern', label: 'Angular pattern' },
];

/** What a detector sees and where the power goes; opened from its tabs, closed to give the map room. */
export function AnalysisPanel() {
  const tab = useAppState((s) => s.analysisTab);
  const setAnalysis = useAppState((s) => s.setAnalysis);
  return (
    <section className="analysis-panel" aria-label="Analysis">
      <div className="analysis-tabs" role="tablist" aria-label="Analysis views">
        {TABS.map((entry) => (
          <button
            key={entry.tab}
            type="button"
            role="tab"
            id={`analysis-tab-${entry.tab}`}
            aria-selected={tab === entry.tab}
            aria-controls="analysis-body"
            onClick={() => setAnalysis({ analysisTab: tab === entry.tab ? null : entry.tab })}
          >
            {entry.label}
          </button>
        ))}
        {tab !== null && (
          <button
            type="button"
            className="analysis-close"
            onClick={() => setAnalysis({ analysisTab: null })}
          >
            Close
          </button>
        )}
      </div>
      {tab !== null && (
        <div id="analysis-body" role="tabpanel" aria-labelledby={`analysis-tab-${tab}`}>
          {tab === 'pulse' && <PulseView />}
          {tab === 'spectrum' && <SpectrumView />}
          {tab === 'power' && <PowerView />}
          {tab === 'pattern' && <PatternView />}
        </div>
      )}
    </section>
  );
}
