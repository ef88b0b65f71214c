import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { withPath } from '../../app/scenario/chargeEdits';
import { createAppStore } from '../../app/store/appStore';
import { HISTORY_LIMIT, HISTORY_SAMPLES } from '../../app/store/historySlice';
import type { ScenarioSamplesPath } from '../../src/io/scenario';

const demo = readFileSync(new URL('../../public/scenarios/demo.json', import.meta.url), 'utf8');

describe('undo history with a million-sample path', () => {
  it('shares the path among all its steps instead of copying it', () => {
    const store = createAppStore();
    store.getState().applyScenarioText(demo, 'demo.json');
    const n = 1_000_000;
    const dt = 1e-15;
    const path: ScenarioSamplesPath = {
      kind: 'samples',
      t: Float64Array.from({ length: n }, (_, i) => i * dt),
      x: Float64Array.from({ length: n }, (_, i) => 1.5e8 * i * dt),
      y: new Float64Array(n),
      z: new Float64Array(n),
    };
    expect(
      store.getState().editCharges(withPath(store.getState().scenario!.charges, 0, path), 'import'),
    ).toBeNull();
    const built = store.getState().charges[0].path;
    // Far more edits than undo keeps, none of them touching the path.
    for (let k = 0; k < HISTORY_LIMIT + 50; k++) {
      store.getState().addProbe([0.001 * k, 0, 0]);
    }
    const { past, scenario, charges } = store.getState();
    expect(past).toHaveLength(HISTORY_LIMIT);
    // Every step holds the same columns and the same built path: memory stays one path's worth.
    const samples = past.map((step) => step.scenario!.charges[0].path as ScenarioSamplesPath);
    expect(samples.every((step) => step.t === path.t && step.x === path.x)).toBe(true);
    expect(past.every((step) => step.charges[0].path === built)).toBe(true);
    expect((scenario!.charges[0].path as ScenarioSamplesPath).t).toBe(path.t);
    expect(charges[0].path).toBe(built);
  });

  it('forgets the oldest steps when edits keep making new long paths', () => {
    const store = createAppStore();
    store.getState().applyScenarioText(demo, 'demo.json');
    const n = 1_000_000;
    const dt = 1e-15;
    // Twelve imports of a new million-sample path: undo may not hold twelve million samples.
    for (let k = 0; k < 12; k++) {
      const path: ScenarioSamplesPath = {
        kind: 'samples',
        t: Float64Array.from({ length: n }, (_, i) => i * dt),
        x: Float64Array.from({ length: n }, (_, i) => (1 + k / 100) * 1e8 * i * dt),
        y: new Float64Array(n),
        z: new Float64Array(n),
      };
      expect(
        store
          .getState()
          .editCharges(withPath(store.getState().scenario!.charges, 0, path), `import ${k}`),
      ).toBeNull();
    }
    const { past } = store.getState();
    const distinct = new Set(past.flatMap((step) => step.charges.map((charge) => charge.path)));
    let samples = 0;
    for (const path of distinct) samples += path.count;
    expect(samples).toBeLessThanOrEqual(HISTORY_SAMPLES);
    // Still as many steps as fit: the last few imports can be undone.
    expect(past.length).toBeGreaterThanOrEqual(4);
    expect(past.at(-1)?.label).toBe('import 11');
  });
});
