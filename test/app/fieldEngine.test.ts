import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { startFieldEngine } from '../../app/engine/fieldEngine';
import { createAppStore } from '../../app/store/appStore';
import { selectSliceSpec } from '../../app/store/sliceSpecOf';
import { computeSlice } from '../../src/engine/computeSlice';
import { SlicePool } from '../../src/engine/slicePool';
import { type FaultPlan, inProcessPort } from '../support/inProcessPort';

const demo = readFileSync(new URL('../../public/scenarios/demo.json', import.meta.url), 'utf8');

/** Waits until the store holds a full (not coarse) map, or fails after `ms`. */
function fullMap(store: ReturnType<typeof createAppStore>, ms = 20_000) {
  return new Promise<NonNullable<ReturnType<typeof store.getState>['fieldMap']>>(
    (resolve, reject) => {
      const timer = setTimeout(() => reject(new Error('no full map arrived')), ms);
      const check = () => {
        const map = store.getState().fieldMap;
        if (map !== null && !map.coarse && !store.getState().fieldPending) {
          clearTimeout(timer);
          unsubscribe();
          resolve(map);
        }
      };
      const unsubscribe = store.subscribe(check);
      check();
    },
  );
}

describe('the field engine under worker faults', () => {
  for (const [what, plan] of [
    ['is killed', { dieOnTile: 2 }],
    ['throws', { throwOnTile: 1 }],
  ] as const) {
    it(`recomputes the map when a worker ${what} mid-slice and tells the user in one line`, async () => {
      const store = createAppStore();
      store.getState().applyScenarioText(demo, 'demo.json');
      store.getState().setResolution(48);
      let made = 0;
      const plans: FaultPlan[] = [plan];
      const stop = startFieldEngine(
        store,
        (onFault) =>
          new SlicePool({
            createPort: () => inProcessPort(plans[made++] ?? {}),
            size: 2,
            tileTimeoutMs: 2000,
            onFault,
            minTilePoints: 0,
          }),
      );
      const map = await fullMap(store);
      const fault = store.getState().fieldFault;
      expect(fault).toMatch(/^field worker .+; replaced it and recomputed rows \d+–\d+$/);
      expect(fault).not.toContain('\n');
      // Nothing of the map is lost: it equals the slice computed on one thread.
      const reference = computeSlice(selectSliceSpec(store.getState()), store.getState().charges);
      expect(Array.from(map.fields.planes)).toEqual(Array.from(reference.fields.planes));
      expect(store.getState().fieldError).toBeNull();
      stop();
    });
  }
});
