import { parseScenario } from '../../src/io/scenario';
import { decodeScenarioLink, linkPayloadOf } from '../../src/io/scenarioLink';
import { appStore } from '../store/appStore';
import { type AutosaveControl, startAutosave } from './autosave';
import { DEMO_SCENARIO_URL, openScenario } from './openScenario';
import { claimWork, releaseWork } from './workLock';
import { type WorkRecord, WorkStore } from './workStore';

/** The browser's store of work in progress (IndexedDB). */
export const workStore = new WorkStore();

/** Where a shared link's scenario is said to come from. */
export const SHARED_LINK = 'shared link';

let autosave: AutosaveControl | null = null;

/** Starts autosaving the app's work (once, from main). */
export function startKeepingWork(): void {
  if (autosave !== null) return;
  autosave = startAutosave(appStore, workStore);
  let opened = appStore.getState().openedScenario;
  let workId = appStore.getState().workId;
  appStore.subscribe((state) => {
    // The open work's lock follows it: another tab cannot take work this one is saving.
    if (state.workId !== workId) {
      if (workId !== null) releaseWork(workId);
      workId = state.workId;
      if (workId !== null) void claimWork(workId);
    }
    if (state.openedScenario === opened) return;
    opened = state.openedScenario;
    // Work replaced by other work was saved on the way out: list it so it can be opened again.
    void refreshOtherWork();
  });
}

/** Lists the autosaved work other than the open one, once every save under way has landed. */
export async function refreshOtherWork(): Promise<void> {
  await autosave?.settled();
  let records: WorkRecord[];
  try {
    records = await workStore.list();
  } catch {
    return;
  }
  const current = appStore.getState().workId;
  appStore
    .getState()
    .setWorkState({ otherWork: records.filter((record) => record.id !== current) });
}

/**
 * Whether the open work may be replaced now: yes, unless it has changes the browser could
 * not keep, in which case the user is asked.
 */
export function mayReplaceOpenWork(): boolean {
  const { unkeptWork, autosaveProblem } = appStore.getState();
  if (!unkeptWork) return true;
  return window.confirm(
    `The open work has changes this browser could not keep (${autosaveProblem ?? 'unknown reason'}). Replace it anyway? Cancel, then Save scenario, to keep them in a file.`,
  );
}

/**
 * Opens what the page should start with: the scenario of a shared link in the address, else
 * the newest autosaved work not open in another tab (said so, with an offer to discard it),
 * else the demo. Other autosaved work is offered beside it; nothing kept is dropped without
 * the user asking. A scenario the user opened while this was under way is left open.
 */
export async function openStartingScenario(): Promise<void> {
  const state = appStore.getState();
  const userOpenedMeanwhile = () => appStore.getState().openedScenario !== null;
  let saved: WorkRecord[] = [];
  try {
    saved = await workStore.list();
  } catch (error) {
    state.setWorkState({
      autosaveProblem: `autosaved work could not be read (${reasonOf(error)})`,
    });
  }
  const payload = linkPayloadOf(window.location.hash);
  if (payload !== null) {
    // The link has done its job; a reload should find the autosave of any changes, not the link.
    window.history.replaceState(null, '', window.location.pathname + window.location.search);
    try {
      const scenario = await decodeScenarioLink(payload);
      if (!userOpenedMeanwhile()) appStore.getState().openScenarioDocument(scenario, SHARED_LINK);
      appStore.getState().setWorkState({ otherWork: saved });
      return;
    } catch (error) {
      appStore.getState().setWorkState({ linkProblem: reasonOf(error) });
    }
  }
  const unreadable: string[] = [];
  for (const record of saved) {
    if (userOpenedMeanwhile()) break;
    // Work open in another tab is that tab's to save; it stays listed here.
    if (!(await claimWork(record.id))) continue;
    const problem = await openWork(record);
    if (problem === null) {
      appStore.getState().setWorkState({
        restoredWork: record,
        otherWork: saved.filter((other) => other.id !== record.id),
      });
      return;
    }
    releaseWork(record.id);
    unreadable.push(`“${record.title}”: ${problem}`);
  }
  if (unreadable.length > 0) {
    appStore.getState().setWorkState({
      autosaveProblem: `autosaved work could not be opened and is kept as it is (${unreadable.join('; ')})`,
    });
  }
  if (!userOpenedMeanwhile()) await openScenario(DEMO_SCENARIO_URL);
  appStore.getState().setWorkState({ otherWork: saved });
}

/** Opens a piece of autosaved work, which goes on being saved under its record. */
export async function openWork(record: WorkRecord): Promise<string | null> {
  try {
    const stored = await workStore.load(record.id);
    if (stored === undefined) return 'it is no longer kept';
    const scenario = parseScenario(stored);
    const state = appStore.getState();
    state.openScenarioDocument(
      scenario,
      `autosaved work from ${new Date(record.savedAt).toLocaleString()}`,
    );
    state.setWorkState({ workId: record.id, autosavedAt: record.savedAt });
    return null;
  } catch (error) {
    return reasonOf(error);
  }
}

/** Switches to another piece of autosaved work; the open one stays kept. */
export async function switchToWork(record: WorkRecord): Promise<void> {
  const refuse = (problem: string) =>
    appStore
      .getState()
      .setWorkState({ autosaveProblem: `“${record.title}” could not be opened: ${problem}` });
  if (!mayReplaceOpenWork()) return;
  if (!(await claimWork(record.id))) {
    refuse('it is open in another tab');
    return;
  }
  const problem = await openWork(record);
  if (problem !== null) {
    releaseWork(record.id);
    refuse(problem);
    return;
  }
  // The work that was open has been saved on the way out; list it among the others.
  await autosave?.settled();
  appStore.getState().setWorkState({ restoredWork: null });
  await refreshOtherWork();
}

/**
 * Deletes a piece of autosaved work the user chose to discard (the caller has asked). If it
 * is open, the demo replaces it first, so no change of it can be saved again.
 */
export async function discardWork(record: WorkRecord): Promise<void> {
  const open = appStore.getState().workId === record.id;
  if (!open && !(await claimWork(record.id))) {
    appStore.getState().setWorkState({
      autosaveProblem: `“${record.title}” is open in another tab; discard it there`,
    });
    return;
  }
  autosave?.forget(record.id);
  if (open) {
    appStore.getState().setWorkState({ workId: null, unkeptWork: false });
    await openScenario(DEMO_SCENARIO_URL);
  }
  await autosave?.settled();
  try {
    await workStore.remove(record.id);
  } catch (error) {
    appStore.getState().setWorkState({ autosaveProblem: `could not discard (${reasonOf(error)})` });
    return;
  } finally {
    releaseWork(record.id);
  }
  const state = appStore.getState();
  state.setWorkState({
    otherWork: state.otherWork.filter((other) => other.id !== record.id),
    restoredWork: state.restoredWork?.id === record.id ? null : state.restoredWork,
  });
}

function reasonOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
