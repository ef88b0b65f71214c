import { useState } from 'react';
import type { Scenario } from '../../src/io/scenario';
import { appStore } from '../store/appStore';

/** The scenario's title, note and whether it is invented, edited together. */
export function ScenarioInfoEditor({ scenario, onDone }: { scenario: Scenario; onDone(): void }) {
  const [title, setTitle] = useState(scenario.title);
  const [note, setNote] = useState(scenario.note);
  const [invented, setInvented] = useState(scenario.invented);
  const [problem, setProblem] = useState<string | null>(null);
  return (
    <form
      className="scenario-info-editor"
      aria-label="Describe the scenario"
      onSubmit={(event) => {
        event.preventDefault();
        const reason = appStore
          .getState()
          .editScenarioInfo({ title: title.trim(), note, invented });
        if (reason === null) onDone();
        else setProblem(reason);
      }}
    >
      <label className="field-row">
        <span>Title</span>
        <input
          value={title}
          maxLength={200}
          onChange={(event) => setTitle(event.currentTarget.value)}
        />
      </label>
      <label className="field-row">
        <span>Note</span>
        <textarea value={note} rows={3} onChange={(event) => setNote(event.currentTarget.value)} />
      </label>
      <label className="inline-choice">
        <input
          type="checkbox"
          checked={invented}
          onChange={(event) => setInvented(event.currentTarget.checked)}
        />
        Invented for illustration, not taken from a real setup
      </label>
      {problem && (
        <p className="field-problem" role="alert">
          {problem}
        </p>
      )}
      <div className="button-row">
        <button type="submit">Keep</button>
        <button type="button" onClick={onDone}>
          Cancel
        </button>
      </div>
    </form>
  );
}
