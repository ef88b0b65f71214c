import type { AppState } from '../store/appState';
import type { AppStore } from '../store/appStore';
import { scenarioDocument } from './scenarioDocument';
import type { WorkStore } from './workStore';

/** Quiet time after the last change before the work is saved, ms: a drag saves once. */
export const AUTOSAVE_DELAY_MS = 800;

/** The parts of the state a saved document is made of, compared by reference. */
function partsOf(state: AppState): readonly unknown[] {
  return [
    state.scenario,
    state.probes,
    state.display,
    state.arrows,
    state.shells,
    state.plane,
    state.center,
    state.size,
    state.resolution,
    state.time,
  ];
}

function sameParts(a: readonly unknown[], b: readonly unknown[]): boolean {
  return a.every((part, k) => part === b[k]);
}

/** What the rest of the app may ask of the autosave. */
export interface AutosaveControl {
  /** Forgets a change waiting to be saved (its work is being discarded). */
  dropWaiting(): void;
  /** Resolves once every save begun so far has landed or failed. */
  settled(): Promise<void>;
  /** Saves what is waiting and stops. */
  stop(): Promise<void>;
}

/**
 * Keeps the open work in the browser: once the user changes anything after opening a
 * document, it is saved (after a quiet moment, never during playback) under a record of its
 * own, and saved again after every later change. Opening other work first saves any change
 * still waiting.
 */
export function startAutosave(store: AppStore, workStore: WorkStore): AutosaveControl {
  let opened = store.getState().openedScenario;
  /** What was last opened or saved; null until the opening has settled. */
  let saved: readonly unknown[] | null = null;
  let timer: ReturnType<typeof setTimeout> | null = null;
  /** The state to save when the timer fires (or at once, if other work is opened first). */
  let waiting: AppState | null = null;
  let writing: Promise<void> = Promise.resolve();

  const settle = () => {
    saved = partsOf(store.getState());
  };

  const save = (state: AppState): Promise<void> => {
    const document = scenarioDocument(state);
    if (document === null) return writing;
    const stillOpen = () => store.getState().openedScenario === state.openedScenario;
    const id = state.workId ?? newWorkId();
    if (stillOpen()) {
      // Counted as saved from now on, so the bookkeeping below does not look like a change.
      saved = partsOf(state);
      store.getState().setWorkState({ workId: id });
    }
    // Saves run one after another, so an older one never lands after a newer.
    writing = writing.then(async () => {
      const savedAt = Date.now();
      try {
        await workStore.save({ id, savedAt, title: document.title }, document);
      } catch (error) {
        const reason = error instanceof Error ? error.message : String(error);
        store.getState().setWorkState({
          autosaveProblem: `could not keep the work in this browser (${reason}); save the scenario to a file to keep it`,
        });
        return;
      }
      if (stillOpen()) {
        store.getState().setWorkState({ autosavedAt: savedAt, autosaveProblem: null });
      }
    });
    return writing;
  };

  const flush = (): Promise<void> => {
    if (timer !== null) clearTimeout(timer);
    timer = null;
    const state = waiting;
    waiting = null;
    return state === null ? writing : save(state);
  };

  const unsubscribe = store.subscribe((state, previous) => {
    if (state.openedScenario !== opened) {
      opened = state.openedScenario;
      if (waiting !== null) {
        // The work that was open has unsaved changes: keep them before they are gone.
        waiting = previous;
        void flush();
      }
      saved = null;
      // Opening sets scenario, probes, view and time in several steps; settle after them.
      queueMicrotask(settle);
      return;
    }
    if (saved === null || state.scenario === null || sameParts(partsOf(state), saved)) return;
    waiting = state;
    if (timer !== null) clearTimeout(timer);
    if (!state.playing) timer = setTimeout(() => void flush(), AUTOSAVE_DELAY_MS);
  });

  const onHide = () => {
    if (document.visibilityState === 'hidden') void flush();
  };
  if (typeof document !== 'undefined') document.addEventListener('visibilitychange', onHide);
  if (store.getState().openedScenario !== null) settle();

  return {
    dropWaiting: () => {
      if (timer !== null) clearTimeout(timer);
      timer = null;
      waiting = null;
    },
    settled: () => writing,
    stop: async () => {
      unsubscribe();
      if (typeof document !== 'undefined') document.removeEventListener('visibilitychange', onHide);
      await flush();
    },
  };
}

function newWorkId(): string {
  return `work-${Date.now().toString(36)}-${Math.floor(Math.random() * 2 ** 32).toString(36)}`;
}
