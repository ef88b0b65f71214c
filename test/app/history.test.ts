import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { withPath } from '../../app/scenario/chargeEdits';
import { type AppStore, createAppStore } from '../../app/store/appStore';
import { HISTORY_LIMIT } from '../../app/store/historySlice';
import type { ScenarioPath } from '../../src/io/scenario';
import { SPEED_OF_LIGHT as c } from '../../src/physics/constants';

const demo = readFileSync(new URL('../../public/scenarios/demo.json', import.meta.url), 'utf8');

type OrbitPath = Extract<ScenarioPath, { preset: 'circularOrbit' }>;

function openDemo(): AppStore {
  const store = createAppStore();
  store.getState().applyScenarioText(demo, 'demo.json');
  return store;
}

/** The open scenario's charges with the orbit of charge 0 run at speed β (fraction of c). */
function withBeta(store: AppStore, beta: number) {
  const charges = store.getState().scenario!.charges;
  const path = charges[0].path as OrbitPath;
  return withPath(charges, 0, { ...path, params: { ...path.params, beta } });
}

/** What undo and redo must bring back, by reference. */
function documentOf(store: AppStore) {
  const { scenario, charges, probes } = store.getState();
  return { scenario, charges, probes };
}

describe('opening and editing a scenario', () => {
  it('opens the demo with its charge built and no history', () => {
    const state = openDemo().getState();
    expect(state.scenarioStatus).toBe('ready');
    expect(state.charges).toHaveLength(1);
    expect(state.charges[0].path.timeSpan).toEqual([0, 1.5e-9]);
    expect(state.past).toEqual([]);
    expect(state.future).toEqual([]);
  });

  it('applies a valid change, rebuilds the charge and records one undo step', () => {
    const store = openDemo();
    const before = store.getState().scenario;
    expect(store.getState().editCharges(withBeta(store, 0.5), 'change the speed')).toBeNull();
    const state = store.getState();
    expect((state.scenario!.charges[0].path as OrbitPath).params.beta).toBe(0.5);
    // Circular orbit from (ρ, 0, 0), counter-clockwise: v(0) = (0, βc, 0). Sampled with exact
    // derivatives, so only rounding (1e-12) separates vy/c from β.
    expect(Math.abs(state.charges[0].path.vy[0] / c - 0.5)).toBeLessThan(1e-12);
    expect(state.past.map((step) => step.label)).toEqual(['change the speed']);
    expect(state.past[0].scenario).toBe(before);
  });

  it('refuses an invalid change with the field named and leaves everything as it was', () => {
    const store = openDemo();
    const before = store.getState();
    const reason = before.editCharges(withBeta(store, 1.2), 'change the speed');
    expect(reason).toBe('charges[0].path.params.beta: must be below 1');
    const after = store.getState();
    expect(after.scenario).toBe(before.scenario);
    expect(after.charges).toBe(before.charges);
    expect(after.past).toBe(before.past);
    expect(after.future).toBe(before.future);
  });

  it('refuses an edit when no scenario is open', () => {
    const store = createAppStore();
    expect(store.getState().editCharges([], 'edit')).toBe('no scenario is open');
    expect(store.getState().past).toEqual([]);
  });

  it('clears undo and redo when a scenario is opened', () => {
    const store = openDemo();
    store.getState().editCharges(withBeta(store, 0.5), 'first');
    store.getState().editCharges(withBeta(store, 0.4), 'second');
    store.getState().undo();
    expect(store.getState().past).toHaveLength(1);
    expect(store.getState().future).toHaveLength(1);
    store.getState().applyScenarioText(demo, 'demo.json');
    expect(store.getState().past).toEqual([]);
    expect(store.getState().future).toEqual([]);
  });
});

describe('undo and redo', () => {
  it('restore scenario, built charges and probes step by step in both directions', () => {
    const store = openDemo();
    const documents = [documentOf(store)];
    store.getState().editCharges(withBeta(store, 0.5), 'change the speed');
    documents.push(documentOf(store));
    store.getState().addProbe([0.05, 0, 0]);
    documents.push(documentOf(store));
    store.getState().editCharges(withBeta(store, 0.3), 'change the speed again');
    documents.push(documentOf(store));

    for (let k = 2; k >= 0; k--) {
      store.getState().undo();
      expect(documentOf(store)).toStrictEqual(documents[k]);
      expect(store.getState().charges).toBe(documents[k].charges);
    }
    store.getState().undo(); // nothing left: a no-op
    expect(documentOf(store)).toStrictEqual(documents[0]);
    for (let k = 1; k <= 3; k++) {
      store.getState().redo();
      expect(store.getState().scenario).toBe(documents[k].scenario);
      expect(store.getState().charges).toBe(documents[k].charges);
      expect(store.getState().probes).toBe(documents[k].probes);
    }
  });

  it('forgets redo once a new edit is made', () => {
    const store = openDemo();
    store.getState().editCharges(withBeta(store, 0.5), 'first');
    store.getState().undo();
    store.getState().editCharges(withBeta(store, 0.3), 'second');
    expect(store.getState().future).toEqual([]);
    const current = documentOf(store);
    store.getState().redo();
    expect(documentOf(store)).toStrictEqual(current);
  });

  it('gives a whole drag one undo step when it records once and edits without recording', () => {
    const store = openDemo();
    const start = documentOf(store);
    store.getState().record('drag the speed');
    for (const beta of [0.6, 0.5, 0.4, 0.3]) {
      expect(store.getState().editCharges(withBeta(store, beta), 'drag', false)).toBeNull();
    }
    expect(store.getState().past.map((step) => step.label)).toEqual(['drag the speed']);
    store.getState().undo();
    expect(documentOf(store)).toStrictEqual(start);
  });

  it('keeps at most HISTORY_LIMIT steps, forgetting the oldest first', () => {
    const store = openDemo();
    for (let k = 0; k < HISTORY_LIMIT + 5; k++) store.getState().record(`edit ${k}`);
    const past = store.getState().past;
    expect(past).toHaveLength(HISTORY_LIMIT);
    expect(past[0].label).toBe('edit 5');
    expect(past.at(-1)?.label).toBe(`edit ${HISTORY_LIMIT + 4}`);
  });

  it('keeps the selected charge in range when undo removes the charge that was added', () => {
    const store = openDemo();
    const charges = store.getState().scenario!.charges;
    store.getState().editCharges([...charges, { ...charges[0], label: 'second' }], 'add');
    store.getState().selectCharge(1);
    store.getState().undo();
    const state = store.getState();
    expect(state.charges).toHaveLength(1);
    expect(state.selectedCharge).toBe(0);
  });
});

describe('probes', () => {
  it('names new probes P1, P2, P3 and selects the newest', () => {
    const store = createAppStore();
    const ids = [0, 1, 2].map((k) => store.getState().addProbe([k, 0, 0]));
    expect(store.getState().probes.map((probe) => probe.name)).toEqual(['P1', 'P2', 'P3']);
    expect(new Set(ids).size).toBe(3);
    expect(store.getState().selectedProbe).toBe(ids[2]);
  });

  it('never repeats a name still in use after a probe is removed', () => {
    const store = createAppStore();
    const first = store.getState().addProbe([0, 0, 0]);
    store.getState().addProbe([1, 0, 0]);
    store.getState().removeProbe(first);
    store.getState().addProbe([2, 0, 0]);
    // Two probes left, P2 taken: the count-based name P3 is free.
    expect(store.getState().probes.map((probe) => probe.name)).toEqual(['P2', 'P3']);
  });

  it('moves a probe as one undo step, and not at all to a non-finite point', () => {
    const store = createAppStore();
    const id = store.getState().addProbe([0, 0, 0]);
    store.getState().moveProbe(id, [0.1, 0.2, 0.3]);
    expect(store.getState().probes[0].position).toEqual([0.1, 0.2, 0.3]);
    expect(store.getState().past).toHaveLength(2);
    for (const bad of [Number.NaN, Number.POSITIVE_INFINITY]) {
      store.getState().moveProbe(id, [bad, 0, 0]);
    }
    expect(store.getState().probes[0].position).toEqual([0.1, 0.2, 0.3]);
    expect(store.getState().past).toHaveLength(2);
    store.getState().undo();
    expect(store.getState().probes[0].position).toEqual([0, 0, 0]);
  });

  it('moves a probe without an undo step while a drag is under way', () => {
    const store = createAppStore();
    const id = store.getState().addProbe([0, 0, 0]);
    store.getState().moveProbe(id, [0.5, 0, 0], false);
    expect(store.getState().probes[0].position).toEqual([0.5, 0, 0]);
    expect(store.getState().past).toHaveLength(1);
  });

  it('renames a probe undoably, trimmed, and ignores a blank name', () => {
    const store = createAppStore();
    const id = store.getState().addProbe([0, 0, 0]);
    store.getState().renameProbe(id, '   ');
    expect(store.getState().probes[0].name).toBe('P1');
    expect(store.getState().past).toHaveLength(1);
    store.getState().renameProbe(id, '  detector ');
    expect(store.getState().probes[0].name).toBe('detector');
    store.getState().undo();
    expect(store.getState().probes[0].name).toBe('P1');
  });

  it('removes a probe undoably and drops it from the selection', () => {
    const store = createAppStore();
    const id = store.getState().addProbe([0, 0, 0]);
    store.getState().removeProbe(id);
    expect(store.getState().probes).toEqual([]);
    expect(store.getState().selectedProbe).toBeNull();
    store.getState().removeProbe(id); // already gone: no step recorded
    expect(store.getState().past).toHaveLength(2);
    store.getState().undo();
    expect(store.getState().probes.map((probe) => probe.id)).toEqual([id]);
  });
});
