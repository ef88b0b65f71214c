import 'fake-indexeddb/auto';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  discardWork,
  refreshOtherWork,
  startKeepingWork,
  switchToWork,
  workStore,
} from '../../app/io/work';
import { appStore } from '../../app/store/appStore';
import { parseScenarioText } from '../../src/io/scenario';

const demoText = readFileSync(new URL('../../public/scenarios/demo.json', import.meta.url), 'utf8');
const demo = parseScenarioText(demoText);

/** Waits for the store to satisfy `done`, or fails after 5 s. */
function until(done: () => boolean): Promise<void> {
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error('the state never arrived')), 5000);
    const check = () => {
      if (!done()) return;
      clearTimeout(timer);
      unsubscribe();
      resolve();
    };
    const unsubscribe = appStore.subscribe(check);
    check();
  });
}

describe('work kept in the browser', () => {
  it('keeps changed work when other work replaces it, lists it, and opens it again whole', async () => {
    startKeepingWork();
    appStore.getState().applyScenarioText(demoText, 'demo.json');
    await Promise.resolve();
    appStore.getState().addProbe([0.03, -0.01, 0]);
    // Replaced before the quiet moment passed: the probe must not be lost.
    appStore
      .getState()
      .openScenarioDocument({ ...demo, title: 'Invented: second scene' }, 'b.json');
    await until(() => appStore.getState().otherWork.length === 1);
    const [kept] = appStore.getState().otherWork;
    expect(kept.title).toBe(demo.title);
    expect(appStore.getState().probes).toEqual([]);

    await switchToWork(kept);
    expect(appStore.getState().scenario?.title).toBe(demo.title);
    expect(appStore.getState().probes.map((probe) => probe.position)).toEqual([[0.03, -0.01, 0]]);
    expect(appStore.getState().workId).toBe(kept.id);

    // Discarding is asked for by the user; then, and only then, the work is gone.
    await discardWork(kept);
    expect((await workStore.list()).map((record) => record.id)).not.toContain(kept.id);
    await refreshOtherWork();
    expect(appStore.getState().otherWork.map((record) => record.id)).not.toContain(kept.id);
  });
});
