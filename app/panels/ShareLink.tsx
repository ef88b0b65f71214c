import { useState } from 'react';
import { encodeScenarioLink } from '../../src/io/scenarioLink';
import { useAppState } from '../hooks/useAppState';
import { scenarioDocument } from '../io/scenarioDocument';
import { appStore } from '../store/appStore';

type LinkState =
  | { kind: 'closed' }
  | { kind: 'ready'; url: string; copied: boolean }
  | { kind: 'failed'; message: string };

/** A link that opens exactly this scenario, view and time in another browser. */
export function ShareLink() {
  const hasScenario = useAppState((s) => s.scenario !== null);
  const [link, setLink] = useState<LinkState>({ kind: 'closed' });
  const make = async () => {
    const document_ = scenarioDocument(appStore.getState());
    if (document_ === null) return;
    let url: string;
    try {
      const payload = await encodeScenarioLink(document_);
      url = `${window.location.origin}${window.location.pathname}#scenario=${payload}`;
    } catch (error) {
      setLink({ kind: 'failed', message: error instanceof Error ? error.message : String(error) });
      return;
    }
    let copied = false;
    try {
      await navigator.clipboard.writeText(url);
      copied = true;
    } catch {
      // No clipboard here (an insecure page, or permission refused): the link is shown to copy.
    }
    setLink({ kind: 'ready', url, copied });
  };
  return (
    <div className="share-link">
      <button
        type="button"
        className="header-button header-plain"
        disabled={!hasScenario}
        onClick={() => void make()}
      >
        Copy link
      </button>
      {link.kind !== 'closed' && (
        <div
          className="share-popover"
          role="dialog"
          aria-label="Link to this scenario"
          onKeyDown={(event) => {
            if (event.key === 'Escape') setLink({ kind: 'closed' });
          }}
        >
          {link.kind === 'ready' ? (
            <>
              <p>
                {link.copied
                  ? 'Copied to the clipboard. It opens this scenario, view and time:'
                  : 'Copy this link; it opens this scenario, view and time:'}
              </p>
              <input
                readOnly
                aria-label="Link to this scenario"
                data-testid="share-link"
                value={link.url}
                onFocus={(event) => event.currentTarget.select()}
              />
            </>
          ) : (
            <p className="scenario-error" role="alert">
              No link: {link.message}
            </p>
          )}
          <button type="button" onClick={() => setLink({ kind: 'closed' })}>
            Close
          </button>
        </div>
      )}
    </div>
  );
}
