import type { ImportedTrajectory } from '../../src/io/trajectoryImport';
import type { TrajectoryUnits } from '../../src/io/trajectoryUnits';
import type { SliceCreator } from './appState';

/** A trajectory file being looked at before it becomes a charge's path. */
export interface PathImport {
  file: Blob;
  /** Tells the import worker this is the file it read before (for a change of units). */
  fileId: number;
  name: string;
  units: TrajectoryUnits;
  status: 'reading' | 'ready' | 'failed';
  result: ImportedTrajectory | null;
  /** One line naming file, line and column of the first problem. */
  error: string | null;
  /** Fit the slice and time to the path when it is taken. */
  fitView: boolean;
}

export interface ImportSlice {
  pathImport: PathImport | null;
  setPathImport(next: PathImport | null): void;
  updatePathImport(change: Partial<PathImport>): void;
}

export const createImportSlice: SliceCreator<ImportSlice> = (set) => ({
  pathImport: null,
  setPathImport: (pathImport) => set({ pathImport }),
  updatePathImport: (change) =>
    set((state) => (state.pathImport ? { pathImport: { ...state.pathImport, ...change } } : {})),
});
