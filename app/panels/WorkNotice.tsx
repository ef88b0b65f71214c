import { useAppState } from '../hooks/useAppState';
import { discardWork, switchToWork } from '../io/work';
import type { WorkRecord } from '../io/workStore';
import { appStore } from '../store/appStore';

function when(record: WorkRecord): string {
  return new Date(record.savedAt).toLocaleString();
}

/** Discards a piece of work once the user has said yes: it cannot be brought back. */
function askToDiscard(record: WorkRecord): void {
  const sure = window.confirm(
    `Discard “${record.title}”, autosaved ${when(record)}? It cannot be brought back.`,
  );
  if (sure) void discardWork(record);
}

/**
 * What the browser keeps of the user's work: the work restored on opening (with an offer to
 * discard it), other autosaved work to open or discard, and any problem keeping it.
 */
export function WorkNotice() {
  const restored = useAppState((s) => s.restoredWork);
  const others = useAppState((s) => s.otherWork);
  const autosaveProblem = useAppState((s) => s.autosaveProblem);
  const linkProblem = useAppState((s) => s.linkProblem);
  const setWorkState = useAppState((s) => s.setWorkState);
  if (!restored && others.length === 0 && !autosaveProblem && !linkProblem) return null;
  return (
    <section className="work-notice" aria-label="Work kept in this browser">
      {linkProblem && (
        <p className="scenario-error" role="alert">
          Could not open the shared link: {linkProblem}
          <button
            type="button"
            className="link-button notice-action"
            onClick={() => setWorkState({ linkProblem: null })}
          >
            Dismiss
          </button>
        </p>
      )}
      {autosaveProblem && (
        <p className="scenario-error" role="alert">
          Autosave: {autosaveProblem}.
        </p>
      )}
      {restored && (
        <p role="status" data-testid="restored-work">
          Restored your unsaved work “{restored.title}”, autosaved in this browser at{' '}
          {when(restored)}.
          <button
            type="button"
            className="link-button notice-action"
            onClick={() => appStore.getState().setWorkState({ restoredWork: null })}
          >
            Keep it
          </button>
          <button
            type="button"
            className="link-button notice-action"
            onClick={() => askToDiscard(restored)}
          >
            Discard it and open the demo
          </button>
        </p>
      )}
      {others.length > 0 && (
        <details>
          <summary>
            {others.length} more piece{others.length === 1 ? '' : 's'} of work autosaved in this
            browser
          </summary>
          <ul className="work-list">
            {others.map((record) => (
              <li key={record.id}>
                “{record.title}” <span className="muted">{when(record)}</span>
                <button
                  type="button"
                  className="link-button notice-action"
                  onClick={() => void switchToWork(record)}
                >
                  Open
                </button>
                <button
                  type="button"
                  className="link-button notice-action"
                  onClick={() => askToDiscard(record)}
                >
                  Discard
                </button>
              </li>
            ))}
          </ul>
        </details>
      )}
    </section>
  );
}
