import { useAppState } from '../hooks/useAppState';

/** When the open work was last kept in this browser. */
export function AutosaveStatus() {
  const savedAt = useAppState((s) => s.autosavedAt);
  if (savedAt === null) return null;
  return (
    <span className="autosave-status muted" role="status" data-testid="autosave-status">
      Autosaved {new Date(savedAt).toLocaleTimeString()}
    </span>
  );
}
