import type { WorkRecord } from '../io/workStore';
import type { SliceCreator } from './appState';

/** Work in progress kept in this browser: what is open, when it was saved, what else is kept. */
export interface WorkSlice {
  /** The autosave record the open work is kept under; null until its first change. */
  workId: string | null;
  /** When the open work was last autosaved, ms since 1970. */
  autosavedAt: number | null;
  /** Why autosave could not keep the work, in one line. */
  autosaveProblem: string | null;
  /** The open work has changes the browser could not keep: ask before replacing it. */
  unkeptWork: boolean;
  /** The record restored when the page opened, while its notice is shown. */
  restoredWork: WorkRecord | null;
  /** Other autosaved work, newest first, offered to open or discard. */
  otherWork: readonly WorkRecord[];
  /** Why a shared link could not be opened, in one line. */
  linkProblem: string | null;
  setWorkState(change: Partial<Omit<WorkSlice, 'setWorkState'>>): void;
}

export const createWorkSlice: SliceCreator<WorkSlice> = (set) => ({
  workId: null,
  autosavedAt: null,
  autosaveProblem: null,
  unkeptWork: false,
  restoredWork: null,
  otherWork: [],
  linkProblem: null,
  setWorkState: (change) => set(change),
});
