import type { AppState } from '../store/appState';
import type { AppStore } from '../store/appStore';
import { scenarioDocument } from './scenarioDocument';
import type { WorkStore } from './workStore';

/** Quiet time after the last change before the work is saved, ms: a drag saves once. */
export const AUTOSAVE_DELAY_MS = 800;

/** What the user made: the document, its probes and how its map is shown. */
function madeParts(state: AppState): readonly unknown[] {
  return [state.scenario, state.probes, state.display, state.arrows, state.shells];
}

/** Where the user is looking: kept with work already kept, never a reason to keep it. */
function viewParts(state: AppState): readonly unknown[] {
  return [state.plane, state.center, state.size, state.resolution, state.time];
}

function same(a: readonly unknown[], b: readonly unknown[]): boolean {
  return a.every((part, k) => part === b[k]);
}

interface Snapshot {
  made: readonly unknown[];
  view: readonly unknown[];
}

const snapshotOf = (state: AppState): Snapshot => ({
  made: madeParts(state),
  view: viewParts(state),
});

/** What the rest of the app may ask of the autosave. */
export interface AutosaveControl {
  /** Never saves under `id` again, and forgets a change waiting (its work is being discarded). */
  forget(id: string): void;
  /** Resolves once every save begun so far has landed or failed. */
  settled(): Promise<void>;
  /** Saves what is waiting and stops. */
  stop(): Promise<void>;
}

/**
 * Keeps the open work in the browser. Once the user changes what they made (charges, paths,
 * probes, map settings) after opening a document, it is saved, after a quiet moment and never
 * during playback, under a record of its own; from then on every change is saved, the view
 * and time included. Merely looking around (panning, playing) keeps nothing. Opening other
 * work first saves any change still waiting. A save that fails is tried again with the next
 * change, and `unkeptWork` says so meanwhile.
 */
export function startAutosave(store: AppStore, workStore: WorkStore): AutosaveControl {
  let opened = store.getState().openedScenario;
  /** What was last opened or saved; null until the opening has settled. */
  let saved: Snapshot | null = null;
  let timer: ReturnType<typeof setTimeout> | null = null;
  /** The state to save when the timer fires (or at once, if other work is opened first). */
  let waiting: AppState | null = null;
  let writing: Promise<void> = Promise.resolve();
  const forgotten = new Set<string>();

  const settle = () => {
    saved = snapshotOf(store.getState());
  };

  /** Whether `state` holds something to keep that `saved` lacks. */
  const worthSaving = (state: AppState): boolean => {
    if (saved === null || state.scenario === null) return false;
    const madeChanged = !same(madeParts(state), saved.made);
    const viewChanged = !same(viewParts(state), saved.view);
    return madeChanged || (viewChanged && state.workId !== null);
  };

  const save = (state: AppState): Promise<void> => {
    const document = scenarioDocument(state);
    if (document === null) return writing;
    const stillOpen = () => store.getState().openedScenario === state.openedScenario;
    const id = state.workId ?? newWorkId();
    if (forgotten.has(id)) return writing;
    const before = saved;
    if (stillOpen()) {
      // Counted as saved from now on, so the bookkeeping below does not look like a change.
      saved = snapshotOf(state);
      store.getState().setWorkState({ workId: id });
    }
    // Saves run one after another, so an older one never lands after a newer.
    writing = writing.then(async () => {
      const savedAt = Date.now();
      try {
        await workStore.save({ id, savedAt, title: document.title }, document);
      } catch (error) {
        const reason = error instanceof Error ? error.message : String(error);
        // Not kept: the next change, hiding the page or opening other work tries again (and
        // opening other work asks first).
        if (stillOpen()) {
          saved = before;
          waiting ??= state;
        }
        store.getState().setWorkState({
          unkeptWork: stillOpen(),
          autosaveProblem: `could not keep the work in this browser (${reason}); save the scenario to a file to keep it`,
        });
        return;
      }
      if (stillOpen()) {
        store.getState().setWorkState({
          autosavedAt: savedAt,
          autosaveProblem: null,
          unkeptWork: false,
        });
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
    if (!worthSaving(state)) return;
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
    forget: (id) => {
      forgotten.add(id);
      if (waiting?.workId === id || store.getState().workId === id) {
        if (timer !== null) clearTimeout(timer);
        timer = null;
        waiting = null;
      }
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
