import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { appStore } from '../../app/store/appStore';

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

  it('ignores a time that is not a number', () => {
    appStore.getState().setTime(2e-9);
    appStore.getState().setTime(Number.NaN);
    expect(appStore.getState().time).toBe(2e-9);
  });
});
