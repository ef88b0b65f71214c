import 'fake-indexeddb/auto';
import { readFileSync } from 'node:fs';
import { describe, expect, it, vi } from 'vitest';
import { startAutosave } from '../../app/io/autosave';
import { scenarioDocument } from '../../app/io/scenarioDocument';
import { WorkStore } from '../../app/io/workStore';
import { createAppStore } from '../../app/store/appStore';
import { parseScenario, parseScenarioText, type Scenario } from '../../src/io/scenario';
import { formatScenario } from '../../src/io/scenarioText';

const demoText = readFileSync(new URL('../../public/scenarios/demo.json', import.meta.url), 'utf8');
const demo = parseScenarioText(demoText);
/** The stored document as its file text, so Float64Array and list columns compare alike. */
const asText = (stored: unknown) => formatScenario(parseScenario(stored));
const textOf = (scenario: Scenario) => formatScenario(scenario);
let databases = 0;
/** Each test its own database, so none sees another's work. */
const freshStore = () => new WorkStore(`conecast-test-${++databases}`);

/** Invented: a document whose path has `n` samples, long enough to be kept apart when ≥ 4096. */
const samplesScenario = (n = 3) =>
  parseScenario({
    ...demo,
    charges: [
      {
        ...demo.charges[0],
        path: {
          kind: 'samples',
          t: Array.from({ length: n }, (_, i) => i * 1e-12),
          x: Array.from({ length: n }, (_, i) => i * 1e-4),
          y: new Array(n).fill(0),
          z: new Array(n).fill(0),
        },
      },
    ],
  });

/** Counts the values put under keys starting with `prefix` while `action` runs. */
async function putsUnder(prefix: string, action: () => Promise<void>): Promise<number> {
  const put = vi.spyOn(IDBObjectStore.prototype, 'put');
  try {
    await action();
    return put.mock.calls.filter(([, key]) => String(key).startsWith(prefix)).length;
  } finally {
    put.mockRestore();
  }
}

describe('the work store', () => {
  it('keeps, lists newest first, gives back and forgets work', async () => {
    const store = freshStore();
    await store.save({ id: 'a', savedAt: 1000, title: 'first' }, demo);
    await store.save({ id: 'b', savedAt: 2000, title: 'second' }, samplesScenario(5000));
    expect((await store.list()).map((record) => record.id)).toEqual(['b', 'a']);
    expect(asText(await store.load('b'))).toBe(textOf(samplesScenario(5000)));
    await store.remove('b');
    expect((await store.list()).map((record) => record.id)).toEqual(['a']);
    expect(await store.load('b')).toBeUndefined();
    // Nothing of b is left behind, its long columns included.
    expect(await store.columnKeys('b')).toEqual([]);
  });

  it('writes a record and its document together or not at all', async () => {
    const store = freshStore();
    await store.save({ id: 'w', savedAt: 1000, title: 'kept' }, demo);
    // A document the browser cannot store (a function in it) aborts the whole transaction,
    // as a crash in the middle of a save would: the previous save stays whole, and the long
    // columns written first in that transaction are gone with it.
    const unstorable = { ...samplesScenario(5000), note: () => 'not data' };
    await expect(
      store.save({ id: 'w', savedAt: 2000, title: 'lost' }, unstorable),
    ).rejects.toThrow();
    expect(await store.list()).toEqual([{ id: 'w', savedAt: 1000, title: 'kept' }]);
    expect(asText(await store.load('w'))).toBe(textOf(demo));
    expect(await store.columnKeys('w')).toEqual([]);
  });

  it('writes a long column once, however often the work around it is saved', async () => {
    const store = freshStore();
    const scenario = samplesScenario(5000);
    const record = { id: 'w', savedAt: 1000, title: 'track' };
    expect(await putsUnder('column:', () => store.save(record, scenario))).toBe(4);
    const moved = {
      ...scenario,
      probes: [{ name: 'P1', position: [0, 1, 0] as [number, number, number] }],
    };
    expect(await putsUnder('column:', () => store.save({ ...record, savedAt: 2000 }, moved))).toBe(
      0,
    );
    expect(asText(await store.load('w'))).toBe(textOf(moved));
    // A new path replaces the old columns, which are deleted in the same transaction.
    const replaced = samplesScenario(6000);
    expect(
      await putsUnder('column:', () => store.save({ ...record, savedAt: 3000 }, replaced)),
    ).toBe(4);
    expect(await store.columnKeys('w')).toHaveLength(4);
    expect(asText(await store.load('w'))).toBe(textOf(replaced));
  });

  it('knows the columns of work it reads back, and does not write them again', async () => {
    const first = freshStore();
    const scenario = samplesScenario(5000);
    await first.save({ id: 'w', savedAt: 1000, title: 'track' }, scenario);
    // A new page: a fresh store on the same database reads the work back, then saves it.
    const second = new WorkStore(`conecast-test-${databases}`);
    const restored = parseScenario(await second.load('w'));
    const record = { id: 'w', savedAt: 2000, title: 'track' };
    expect(await putsUnder('column:', () => second.save(record, restored))).toBe(0);
  });
});

describe('autosave', () => {
  it('saves nothing for a scenario only opened, and the document once it is changed', async () => {
    const app = createAppStore();
    const store = freshStore();
    const autosave = startAutosave(app, store);
    app.getState().applyScenarioText(demoText, 'demo.json');
    await Promise.resolve();
    await autosave.settled();
    expect(await store.list()).toEqual([]);

    app.getState().addProbe([0.01, 0.02, 0]);
    await autosave.stop();
    const [record] = await store.list();
    expect(record.title).toBe(demo.title);
    expect(app.getState().workId).toBe(record.id);
    expect(asText(await store.load(record.id))).toBe(textOf(scenarioDocument(app.getState())!));
  });

  it('saves a change still waiting before another scenario replaces it', async () => {
    const app = createAppStore();
    const store = freshStore();
    const autosave = startAutosave(app, store);
    app.getState().applyScenarioText(demoText, 'demo.json');
    await Promise.resolve();
    app.getState().setDisplay({ quantity: 'B' });
    // Opened before the quiet moment has passed: the change must not be lost.
    app.getState().openScenarioDocument({ ...demo, title: 'Invented: another scene' }, 'b.json');
    await autosave.settled();
    const [record] = await store.list();
    expect(record.title).toBe(demo.title);
    const kept = parseScenario(await store.load(record.id));
    expect(kept.display.quantity).toBe('B');
    // The newly opened scenario is other work: nothing of it saved yet, and no record of its own.
    expect(app.getState().workId).toBeNull();
    await autosave.stop();
    expect(await store.list()).toHaveLength(1);
  });

  it('keeps nothing for looking around, but keeps the view with work already kept', async () => {
    const app = createAppStore();
    const store = freshStore();
    const autosave = startAutosave(app, store);
    app.getState().applyScenarioText(demoText, 'demo.json');
    await Promise.resolve();
    app.getState().panBy(0.01, 0);
    app.getState().setTime(1.2e-9);
    await autosave.settled();
    await new Promise((resolve) => setTimeout(resolve, 1000));
    expect(await store.list()).toEqual([]);

    app.getState().setDisplay({ scale: 'linear' });
    await autosave.stop();
    const restart = startAutosave(app, store);
    app.getState().setTime(1.4e-9);
    await restart.stop();
    const kept = parseScenario(await store.load(app.getState().workId!));
    expect(kept.display.scale).toBe('linear');
    expect(kept.view.time).toBe(1.4e-9);
  });

  it('tries a failed save again before other work replaces it, and says meanwhile it is not kept', async () => {
    const app = createAppStore();
    const store = freshStore();
    const save = store.save.bind(store);
    let fail = true;
    store.save = (record, document) =>
      fail ? Promise.reject(new Error('QuotaExceededError')) : save(record, document);
    const autosave = startAutosave(app, store);
    app.getState().applyScenarioText(demoText, 'demo.json');
    await Promise.resolve();
    app.getState().addProbe([0.01, 0, 0]);
    await new Promise((resolve) => setTimeout(resolve, 1000));
    await autosave.settled();
    expect(app.getState().unkeptWork).toBe(true);
    expect(await store.list()).toEqual([]);

    // Room again; the user opens other work without changing anything more.
    fail = false;
    app.getState().openScenarioDocument({ ...demo, title: 'Invented: next scene' }, 'b.json');
    await autosave.settled();
    const [record] = await store.list();
    expect(record.title).toBe(demo.title);
    expect(parseScenario(await store.load(record.id)).probes).toHaveLength(1);
    await autosave.stop();
  });

  it('says so when the browser will not keep the work', async () => {
    const app = createAppStore();
    const failing = freshStore();
    failing.save = () => Promise.reject(new Error('QuotaExceededError'));
    const autosave = startAutosave(app, failing);
    app.getState().applyScenarioText(demoText, 'demo.json');
    await Promise.resolve();
    app.getState().setShells(false);
    await autosave.stop();
    expect(app.getState().autosaveProblem).toBe(
      'could not keep the work in this browser (QuotaExceededError); save the scenario to a file to keep it',
    );
  });
});
