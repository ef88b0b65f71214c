import { createStore } from 'zustand/vanilla';
import { createAnalysisSlice } from './analysisSlice';
import type { AppState } from './appState';
import { createDisplaySlice } from './displaySlice';
import { createFieldSlice } from './fieldSlice';
import { createHistorySlice } from './historySlice';
import { createImportSlice } from './importSlice';
import { createProbesSlice } from './probesSlice';
import { createScenarioSlice } from './scenarioSlice';
import { createTimeSlice } from './timeSlice';
import { createToolSlice } from './toolSlice';
import { createViewSlice } from './viewSlice';
import { createWorkSlice } from './workSlice';

/** The state as a fresh page sees it; the app has one store, tests may make more. */
export function createAppStore() {
  return createStore<AppState>()((...args) => ({
    ...createScenarioSlice(...args),
    ...createHistorySlice(...args),
    ...createProbesSlice(...args),
    ...createViewSlice(...args),
    ...createDisplaySlice(...args),
    ...createTimeSlice(...args),
    ...createToolSlice(...args),
    ...createFieldSlice(...args),
    ...createAnalysisSlice(...args),
    ...createImportSlice(...args),
    ...createWorkSlice(...args),
  }));
}

export type AppStore = ReturnType<typeof createAppStore>;

/** The one store; React binds to it through hooks, per-frame code reads appStore.getState(). */
export const appStore = createAppStore();
