import type { SliceCreator } from './appState';

export interface TimeSlice {
  /** Observation time, s. */
  time: number;
  playing: boolean;
  /** Simulated seconds per second of playback. */
  rate: number;
  setTime(time: number): void;
  setPlaying(playing: boolean): void;
  setRate(rate: number): void;
}

export const createTimeSlice: SliceCreator<TimeSlice> = (set) => ({
  time: 0,
  playing: false,
  rate: 1e-10,
  setTime: (time) => {
    if (Number.isFinite(time)) set({ time });
  },
  setPlaying: (playing) => set({ playing }),
  setRate: (rate) => {
    if (rate > 0 && Number.isFinite(rate)) set({ rate });
  },
});
