import type { Scenario } from '../../src/io/scenario';
import type { Charge } from '../../src/physics/charge';
import type { SliceCreator } from './appState';
import type { Probe } from './probesSlice';

/** What undo and redo restore: the user's own work, not how it is being looked at. */
export interface DocumentSnapshot {
  /** What the edit that followed this snapshot did, e.g. "sketch a path". */
  label: string;
  scenario: Scenario | null;
  charges: readonly Charge[];
  probes: readonly Probe[];
}

/** Edits remembered; older ones are forgotten first. */
export const HISTORY_LIMIT = 200;
/**
 * Path samples undo may hold in all (80 bytes each, so about 400 MB), counting each built path
 * once however many steps share it: a run of edits to a million-sample formula path forgets its
 * oldest steps instead of filling the memory.
 */
export const HISTORY_SAMPLES = 5_000_000;

/** The steps kept: at most HISTORY_LIMIT, fewer where their distinct paths hold too many samples. */
function bounded(past: readonly DocumentSnapshot[]): readonly DocumentSnapshot[] {
  let kept = past.slice(-HISTORY_LIMIT);
  const samplesOf = (steps: readonly DocumentSnapshot[]) => {
    const paths = new Set(steps.flatMap((step) => step.charges.map((charge) => charge.path)));
    let total = 0;
    for (const path of paths) total += path.count;
    return total;
  };
  while (kept.length > 1 && samplesOf(kept) > HISTORY_SAMPLES) kept = kept.slice(1);
  return kept;
}

export interface HistorySlice {
  past: readonly DocumentSnapshot[];
  future: readonly DocumentSnapshot[];
  /** Remembers the document as it is now, before an edit called `label`; clears redo. */
  record(label: string): void;
  undo(): void;
  redo(): void;
  clearHistory(): void;
}

export const createHistorySlice: SliceCreator<HistorySlice> = (set, get) => {
  const snapshot = (label: string): DocumentSnapshot => {
    const { scenario, charges, probes } = get();
    return { label, scenario, charges, probes };
  };
  // The selected charge stays in range when the restored document has fewer charges.
  const restore = (target: DocumentSnapshot) =>
    set((state) => ({
      scenario: target.scenario,
      charges: target.charges,
      probes: target.probes,
      selectedCharge: Math.min(state.selectedCharge, Math.max(0, target.charges.length - 1)),
    }));
  return {
    past: [],
    future: [],
    record: (label) =>
      set((state) => ({
        past: bounded([...state.past, snapshot(label)]),
        future: [],
      })),
    undo: () => {
      const { past, future } = get();
      const target = past.at(-1);
      if (target === undefined) return;
      const current = snapshot(target.label);
      set({ past: past.slice(0, -1), future: [...future, current] });
      restore(target);
    },
    redo: () => {
      const { past, future } = get();
      const target = future.at(-1);
      if (target === undefined) return;
      const current = snapshot(target.label);
      set({ future: future.slice(0, -1), past: [...past, current] });
      restore(target);
    },
    clearHistory: () => set({ past: [], future: [] }),
  };
};
