import type { Scenario } from '../../src/io/scenario';
import type { AppState } from '../store/appState';

/** The open scenario with the view and time as they are now: what a saved file holds. */
export function scenarioDocument(state: AppState): Scenario | null {
  if (state.scenario === null) return null;
  return {
    ...state.scenario,
    view: {
      plane: state.plane,
      center: [...state.center],
      size: [...state.size],
      resolution: [...state.resolution],
      time: state.time,
    },
  };
}

/** Hands the document to the browser as a download named after its title. */
export function downloadScenario(state: AppState): void {
  const document_ = scenarioDocument(state);
  if (document_ === null) return;
  const blob = new Blob([`${JSON.stringify(document_, null, 2)}\n`], { type: 'application/json' });
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = `${fileStem(document_.title)}.json`;
  link.click();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

function fileStem(title: string): string {
  const stem = title
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
  return stem.slice(0, 60) || 'scenario';
}
