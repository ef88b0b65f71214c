import type { Scenario } from '../../src/io/scenario';
import { formatScenario } from '../../src/io/scenarioText';
import type { AppState } from '../store/appState';
import { mapSettingsOf } from '../store/displaySlice';
import { download, fileStem } from './download';

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
    probes: state.probes.map((probe) => ({ name: probe.name, position: [...probe.position] })),
    display: mapSettingsOf(state),
  };
}

/** Hands the document to the browser as a download named after its title. */
export function downloadScenario(state: AppState): void {
  const document_ = scenarioDocument(state);
  if (document_ === null) return;
  download(`${fileStem(document_.title)}.json`, formatScenario(document_), 'application/json');
}
