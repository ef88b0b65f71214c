import type { SliceCreator } from './appState';

export interface TimeSlice {
  /** Observation time, s. */
  time: number;
  setTime(time: number): void;
}

export const createTimeSlice: SliceCreator<TimeSlice> = (set) => ({
  time: 0,
  setTime: (time) => {
    if (Number.isFinite(time)) set({ time });
  },
});
