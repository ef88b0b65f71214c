import { useState } from 'react';
import { useAppState } from '../hooks/useAppState';
import { SHARED_LINK } from '../io/work';
import { ScenarioInfoEditor } from './ScenarioInfoEditor';

/** Title of the loaded scenario, whether it is invented, and its note; and why a load failed. */
export function ScenarioSummary() {
  const scenario = useAppState((s) => s.scenario);
  const status = useAppState((s) => s.scenarioStatus);
  const error = useAppState((s) => s.scenarioError);
  const source = useAppState((s) => s.scenarioSource);
  const edited = useAppState((s) => s.scenario !== s.openedScenario);
  const [editing, setEditing] = useState(false);
  return (
    <div className="scenario-summary">
      {status === 'failed' && (
        <p className="scenario-error" role="alert">
          Could not open {source ?? 'the scenario'}: {error}
          {scenario && ' (still showing the previous scenario)'}
        </p>
      )}
      {scenario === null ? (
        status === 'loading' && <p className="muted">Loading scenario…</p>
      ) : editing ? (
        <ScenarioInfoEditor scenario={scenario} onDone={() => setEditing(false)} />
      ) : (
        <>
          <div className="scenario-title-row">
            <h2 className="scenario-title" data-testid="scenario-title">
              {scenario.title}
            </h2>
            {edited && <span className="badge">edited since opened</span>}
            {scenario.invented ? (
              <span className="badge badge-invented">Invented example</span>
            ) : (
              <span className="badge">Taken from a real setup</span>
            )}
            {source === SHARED_LINK && <span className="badge">from a shared link</span>}
            <button type="button" className="link-button" onClick={() => setEditing(true)}>
              Describe…
            </button>
          </div>
          {scenario.note && <p className="scenario-note">{scenario.note}</p>}
        </>
      )}
    </div>
  );
}
