import type { StateCreator } from 'zustand/vanilla';
import type { AnalysisSlice } from './analysisSlice';
import type { DisplaySlice } from './displaySlice';
import type { FieldSlice } from './fieldSlice';
import type { HistorySlice } from './historySlice';
import type { ImportSlice } from './importSlice';
import type { ProbesSlice } from './probesSlice';
import type { ScenarioSlice } from './scenarioSlice';
import type { TimeSlice } from './timeSlice';
import type { ToolSlice } from './toolSlice';
import type { ViewSlice } from './viewSlice';
import type { WorkSlice } from './workSlice';

/** The whole app state: the union of its slices, declared once here. */
export type AppState = ScenarioSlice &
  HistorySlice &
  ProbesSlice &
  ViewSlice &
  DisplaySlice &
  TimeSlice &
  ToolSlice &
  FieldSlice &
  AnalysisSlice &
  ImportSlice &
  WorkSlice;

/** A slice creator that sees (and may call into) the whole state. */
export type SliceCreator<Slice> = StateCreator<AppState, [], [], Slice>;
