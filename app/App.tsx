import { useRef, useState } from 'react';
import { AnalysisPanel } from './analysis/AnalysisPanel';
import { useAppState } from './hooks/useAppState';
import { useFileDrop } from './hooks/useFileDrop';
import { useShortcuts } from './hooks/useShortcuts';
import { openScenarioFile } from './io/openScenarioFile';
import { downloadScenario } from './io/scenarioDocument';
import { AutosaveStatus } from './panels/AutosaveStatus';
import { CAUTIONS_ID, Cautions } from './panels/Cautions';
import { ChargesPanel } from './panels/ChargesPanel';
import { ColourBar } from './panels/ColourBar';
import { FilePicker } from './panels/fields/FilePicker';
import { MapLegend } from './panels/MapLegend';
import { MapPanel } from './panels/MapPanel';
import { PathImportDialog } from './panels/PathImportDialog';
import { PictureExport } from './panels/PictureExport';
import { ProbesPanel } from './panels/ProbesPanel';
import { Readouts } from './panels/Readouts';
import { ScenarioSummary } from './panels/ScenarioSummary';
import { ShareLink } from './panels/ShareLink';
import { SliceExport } from './panels/SliceExport';
import { TimeBar } from './panels/TimeBar';
import { Toolbar } from './panels/Toolbar';
import { WorkNotice } from './panels/WorkNotice';
import { appStore } from './store/appStore';
import { FieldView } from './view/FieldView';

export function App() {
  useShortcuts();
  useFileDrop();
  const fieldError = useAppState((s) => s.fieldError);
  const fieldFault = useAppState((s) => s.fieldFault);
  const hasScenario = useAppState((s) => s.scenario !== null);
  const [cautionsOpen, setCautionsOpen] = useState(true);
  const cautionsToggle = useRef<HTMLButtonElement>(null);

  return (
    <div className="app">
      <header className="app-header">
        <h1 className="app-name">Conecast</h1>
        <span className="app-tagline">retarded-time fields of moving point charges</span>
        <AutosaveStatus />
        <FilePicker
          label="Open scenario…"
          accept=".json,application/json"
          testId="open-scenario"
          className="header-button header-plain header-first"
          onFile={(file) => void openScenarioFile(file)}
        />
        <button
          type="button"
          className="header-button header-plain"
          disabled={!hasScenario}
          onClick={() => downloadScenario(appStore.getState())}
        >
          Save scenario
        </button>
        <ShareLink />
        <button
          ref={cautionsToggle}
          type="button"
          className="header-button"
          aria-expanded={cautionsOpen}
          aria-controls={CAUTIONS_ID}
          onClick={() => setCautionsOpen((open) => !open)}
        >
          {cautionsOpen ? 'Hide cautions' : 'Show cautions'}
        </button>
      </header>
      <Cautions
        open={cautionsOpen}
        onDismiss={() => {
          setCautionsOpen(false);
          cautionsToggle.current?.focus();
        }}
      />
      <WorkNotice />
      <main className="workspace">
        <aside className="side-panel side-left" aria-label="Charges and paths">
          <ChargesPanel />
        </aside>
        <div className="centre-column">
          <ScenarioSummary />
          <Toolbar />
          <div className="field-area">
            <FieldView />
            <ColourBar />
          </div>
          <TimeBar />
          <AnalysisPanel />
        </div>
        <aside className="side-panel side-right" aria-label="Probes, map and slice details">
          <ProbesPanel />
          <MapPanel />
          {fieldError && (
            <p className="scenario-error" role="alert">
              The field could not be computed: {fieldError}
            </p>
          )}
          {fieldFault && (
            <p className="field-problem" role="status">
              A field worker failed and was replaced; its part of the map was computed again (
              {fieldFault}).
            </p>
          )}
          <section className="panel" aria-labelledby="slice-details-title">
            <h2 id="slice-details-title" className="panel-title">
              Slice details
            </h2>
            <Readouts />
            <SliceExport />
            <PictureExport />
            <MapLegend />
          </section>
        </aside>
      </main>
      <PathImportDialog />
    </div>
  );
}
