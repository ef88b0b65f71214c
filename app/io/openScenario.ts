import { appStore } from '../store/appStore';

/** The invented demo, served from public/scenarios (relative, so the app works under any base path). */
export const DEMO_SCENARIO_URL = 'scenarios/demo.json';

/** Fetches a scenario document and hands it to the store; failures end up in the store too. */
export async function openScenario(url: string): Promise<void> {
  const { beginScenarioLoad, applyScenarioText, failScenarioLoad } = appStore.getState();
  beginScenarioLoad(url);
  let text: string;
  try {
    const response = await fetch(url);
    if (!response.ok) throw new Error(`HTTP ${response.status} ${response.statusText}`.trim());
    text = await response.text();
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    failScenarioLoad(url, `could not be fetched (${reason})`);
    return;
  }
  applyScenarioText(text, url);
}
