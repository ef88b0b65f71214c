import 'fake-indexeddb/auto';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { startAutosave } from '../../app/io/autosave';
import { scenarioDocument } from '../../app/io/scenarioDocument';
import { packScenario, unpackScenario } from '../../app/io/storedScenario';
import { WorkStore } from '../../app/io/workStore';
import { createAppStore } from '../../app/store/appStore';
import { parseScenario, parseScenarioText } from '../../src/io/scenario';

const demoText = readFileSync(new URL('../../public/scenarios/demo.json', import.meta.url), 'utf8');
const demo = parseScenarioText(demoText);
let databases = 0;
/** Each test its own database, so none sees another's work. */
const freshStore = () => new WorkStore(`conecast-test-${++databases}`);

const samplesScenario = () => ({
  ...demo,
  charges: [
    {
      ...demo.charges[0],
      path: {
        kind: 'samples' as const,
        t: [0, 1e-9, 2e-9],
        x: [0, 0.1, 0.2],
        y: [0, 0, 0],
        z: [0, 0, 0],
      },
    },
  ],
});

describe('the work store', () => {
  it('keeps, lists newest first, gives back and forgets work', async () => {
    const store = freshStore();
    await store.save({ id: 'a', savedAt: 1000, title: 'first' }, packScenario(demo));
    await store.save({ id: 'b', savedAt: 2000, title: 'second' }, packScenario(samplesScenario()));
    expect((await store.list()).map((record) => record.id)).toEqual(['b', 'a']);
    expect(parseScenario(unpackScenario(await store.load('b')))).toEqual(samplesScenario());
    await store.remove('b');
    expect((await store.list()).map((record) => record.id)).toEqual(['a']);
    expect(await store.load('b')).toBeUndefined();
  });

  it('writes a record and its document together or not at all', async () => {
    const store = freshStore();
    await store.save({ id: 'w', savedAt: 1000, title: 'kept' }, packScenario(demo));
    // A document the browser cannot store (a function in it) aborts the whole transaction,
    // as a crash in the middle of a save would: the previous save stays whole.
    const unstorable = { ...demo, note: () => 'not data' };
    await expect(
      store.save({ id: 'w', savedAt: 2000, title: 'lost' }, unstorable),
    ).rejects.toThrow();
    expect(await store.list()).toEqual([{ id: 'w', savedAt: 1000, title: 'kept' }]);
    expect(parseScenario(unpackScenario(await store.load('w')))).toEqual(demo);
  });

  it('stores sample columns as Float64Array and gives them back as plain lists', () => {
    const packed = packScenario(samplesScenario()) as { charges: { path: { t: unknown } }[] };
    expect(packed.charges[0].path.t).toBeInstanceOf(Float64Array);
    const unpacked = unpackScenario(packed) as { charges: { path: { t: unknown } }[] };
    expect(unpacked.charges[0].path.t).toEqual([0, 1e-9, 2e-9]);
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
    expect(parseScenario(unpackScenario(await store.load(record.id)))).toEqual(
      scenarioDocument(app.getState()),
    );
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
    const kept = parseScenario(unpackScenario(await store.load(record.id)));
    expect(kept.display.quantity).toBe('B');
    // The newly opened scenario is other work: nothing of it saved yet, and no record of its own.
    expect(app.getState().workId).toBeNull();
    await autosave.stop();
    expect(await store.list()).toHaveLength(1);
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
