import type { StateCreator } from 'zustand/vanilla';
import type { ScenarioSlice } from './scenarioSlice';
import type { TimeSlice } from './timeSlice';
import type { ViewSlice } from './viewSlice';

/** The whole app state: the union of its slices, declared once here. */
export type AppState = ScenarioSlice & ViewSlice & TimeSlice;

/** A slice creator that sees (and may call into) the whole state. */
export type SliceCreator<Slice> = StateCreator<AppState, [], [], Slice>;
