import { appStore } from '../store/appStore';
import { mayReplaceOpenWork } from './work';

/** Largest scenario file read, bytes: a million samples with velocities is about 200 MB of JSON. */
const MAX_SCENARIO_BYTES = 256 * 1024 * 1024;

/**
 * Opens a scenario file the user picked or dropped. A file that cannot be used is named with
 * the field at fault, and the scenario already open stays open.
 */
export async function openScenarioFile(file: File): Promise<void> {
  if (!mayReplaceOpenWork()) return;
  const { beginScenarioLoad, applyScenarioText, failScenarioLoad, scenario } = appStore.getState();
  if (file.size > MAX_SCENARIO_BYTES) {
    failScenarioLoad(
      file.name,
      `is ${Math.round(file.size / 2 ** 20)} MB, more than the 256 MB this page reads`,
    );
    return;
  }
  if (scenario === null) beginScenarioLoad(file.name);
  let text: string;
  try {
    text = await file.text();
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    failScenarioLoad(file.name, `could not be read (${reason})`);
    return;
  }
  applyScenarioText(text, file.name);
}
