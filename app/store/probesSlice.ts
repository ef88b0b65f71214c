import type { Triple } from '../../src/engine/sliceSpec';
import type { SliceCreator } from './appState';

/** A named observation point, m. */
export interface Probe {
  id: string;
  name: string;
  position: Triple;
}

export interface ProbesSlice {
  probes: readonly Probe[];
  selectedProbe: string | null;
  /** Places a probe and selects it; returns its id. */
  addProbe(position: Triple): string;
  /** Moves a probe; `record` false while a drag is under way (the drag recorded once at its start). */
  moveProbe(id: string, position: Triple, record?: boolean): void;
  renameProbe(id: string, name: string): void;
  removeProbe(id: string): void;
  selectProbe(id: string | null): void;
  /** Replaces every probe with a document's (no undo step: opening a document clears undo). */
  replaceProbes(probes: readonly { name: string; position: Triple }[]): void;
}

let nextProbe = 1;

export const createProbesSlice: SliceCreator<ProbesSlice> = (set, get) => ({
  probes: [],
  selectedProbe: null,
  addProbe: (position) => {
    const taken = new Set(get().probes.map((probe) => probe.name));
    let n = get().probes.length + 1;
    while (taken.has(`P${n}`)) n++;
    const probe: Probe = { id: newProbeId(), name: `P${n}`, position: [...position] };
    get().record('place a probe');
    set((state) => ({ probes: [...state.probes, probe], selectedProbe: probe.id }));
    return probe.id;
  },
  moveProbe: (id, position, record = true) => {
    if (!position.every(Number.isFinite)) return;
    if (record) get().record('move a probe');
    set((state) => ({
      probes: state.probes.map((probe) =>
        probe.id === id ? { ...probe, position: [...position] } : probe,
      ),
    }));
  },
  renameProbe: (id, name) => {
    const trimmed = name.trim();
    const probe = get().probes.find((candidate) => candidate.id === id);
    if (probe === undefined || trimmed === '' || trimmed === probe.name) return;
    get().record('rename a probe');
    set((state) => ({
      probes: state.probes.map((p) => (p.id === id ? { ...p, name: trimmed } : p)),
    }));
  },
  removeProbe: (id) => {
    if (!get().probes.some((probe) => probe.id === id)) return;
    get().record('delete a probe');
    set((state) => ({
      probes: state.probes.filter((probe) => probe.id !== id),
      selectedProbe: state.selectedProbe === id ? null : state.selectedProbe,
    }));
  },
  selectProbe: (id) => set({ selectedProbe: id }),
  replaceProbes: (probes) => {
    const next = probes.map((probe) => ({
      id: newProbeId(),
      name: probe.name,
      position: [...probe.position] as Triple,
    }));
    set({ probes: next, selectedProbe: next[0]?.id ?? null });
  },
});

function newProbeId(): string {
  return `probe-${nextProbe++}`;
}
