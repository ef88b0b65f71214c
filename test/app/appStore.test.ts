import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { scenarioDocument } from '../../app/io/scenarioDocument';
import { appStore, createAppStore } from '../../app/store/appStore';
import { formatScenario } from '../../src/io/scenarioText';

const demo = readFileSync(new URL('../../public/scenarios/demo.json', import.meta.url), 'utf8');

describe('the app store', () => {
  it('opens a scenario: charges built, view and time taken from it', () => {
    appStore.getState().applyScenarioText(demo, 'demo.json');
    const state = appStore.getState();
    expect(state.scenarioStatus).toBe('ready');
    expect(state.charges).toHaveLength(1);
    expect(state.plane).toBe('xy');
    expect(state.size).toEqual([0.2, 0.2]);
    expect(state.resolution).toEqual([160, 160]);
    expect(state.time).toBe(1e-9);
  });

  it('keeps the last good scenario and reports the field that is wrong', () => {
    const broken = demo.replace('"beta": 0.7', '"beta": 1.2');
    appStore.getState().applyScenarioText(broken, 'broken.json');
    const state = appStore.getState();
    expect(state.scenarioStatus).toBe('failed');
    expect(state.scenarioError).toBe('charges[0].path.params.beta: must be below 1');
    expect(state.charges).toHaveLength(1);
  });

  it('saves probes and map settings in the document and opens them again', () => {
    const store = createAppStore();
    store.getState().applyScenarioText(demo, 'demo.json');
    store.getState().addProbe([0.05, 0.02, 0]);
    store.getState().setDisplay({ quantity: 'component', component: 'Bz', scale: 'linear' });
    store.getState().setArrows('S');
    store.getState().setShells(false);
    store.getState().setTime(1.2e-9);
    const saved = formatScenario(scenarioDocument(store.getState())!);

    const fresh = createAppStore();
    fresh.getState().applyScenarioText(saved, 'saved.json');
    const state = fresh.getState();
    expect(state.probes.map((probe) => [probe.name, probe.position])).toEqual([
      ['P1', [0.05, 0.02, 0]],
    ]);
    expect(state.selectedProbe).toBe(state.probes[0].id);
    expect(state.display).toEqual({
      quantity: 'component',
      component: 'Bz',
      scale: 'linear',
      range: 'auto',
    });
    expect(state.arrows).toBe('S');
    expect(state.shells).toBe(false);
    expect(state.time).toBe(1.2e-9);
    // Saved again unchanged, the document is the same text.
    expect(formatScenario(scenarioDocument(state)!)).toBe(saved);
  });

  it('renames and re-describes a scenario as one undoable edit, refusing an empty title', () => {
    const store = createAppStore();
    store.getState().applyScenarioText(demo, 'demo.json');
    const charges = store.getState().charges;
    expect(
      store.getState().editScenarioInfo({ title: 'Invented: kicker study', invented: false }),
    ).toBeNull();
    expect(store.getState().scenario?.title).toBe('Invented: kicker study');
    expect(store.getState().scenario?.invented).toBe(false);
    // Only the description changed: the built paths stay, so the map is not computed again.
    expect(store.getState().charges).toBe(charges);
    expect(store.getState().editScenarioInfo({ title: '' })).toBe('title: must not be empty');
    store.getState().undo();
    expect(store.getState().scenario?.title).toBe('Electron on a 1 cm circular orbit at β = 0.7');
  });

  it('ignores a time that is not a number', () => {
    appStore.getState().setTime(2e-9);
    appStore.getState().setTime(Number.NaN);
    expect(appStore.getState().time).toBe(2e-9);
  });
});
