import { createStore } from 'zustand/vanilla';
import type { AppState } from './appState';
import { createScenarioSlice } from './scenarioSlice';
import { createTimeSlice } from './timeSlice';
import { createViewSlice } from './viewSlice';

/** The one store; React binds to it through hooks, per-frame code reads appStore.getState(). */
export const appStore = createStore<AppState>()((...args) => ({
  ...createScenarioSlice(...args),
  ...createViewSlice(...args),
  ...createTimeSlice(...args),
}));
