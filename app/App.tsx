import { useRef, useState } from 'react';
import { useFieldMap } from './hooks/useFieldMap';
import { CAUTIONS_ID, Cautions } from './panels/Cautions';
import { ColourBar } from './panels/ColourBar';
import { MapLegend } from './panels/MapLegend';
import { Readouts } from './panels/Readouts';
import { ScenarioSummary } from './panels/ScenarioSummary';
import { TimeControl } from './panels/TimeControl';
import { FieldView } from './view/FieldView';

export function App() {
  const fieldMap = useFieldMap();
  const [cautionsOpen, setCautionsOpen] = useState(true);
  const cautionsToggle = useRef<HTMLButtonElement>(null);

  return (
    <div className="app">
      <header className="app-header">
        <h1 className="app-name">Conecast</h1>
        <span className="app-tagline">retarded-time fields of moving point charges</span>
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
      <main className="workspace">
        <ScenarioSummary />
        <div className="workspace-body">
          <div className="field-area">
            <FieldView state={fieldMap} />
            <ColourBar range={fieldMap.map?.colourRange ?? null} />
          </div>
          <aside className="side-panel" aria-label="Slice details">
            <TimeControl />
            <Readouts map={fieldMap.map} />
            {fieldMap.error && (
              <p className="scenario-error" role="alert">
                The field could not be computed: {fieldMap.error}
              </p>
            )}
            <MapLegend />
          </aside>
        </div>
      </main>
    </div>
  );
}
