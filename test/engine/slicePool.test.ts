import { describe, expect, it } from 'vitest';
import { computeSlice } from '../../src/engine/computeSlice';
import { SlicePool } from '../../src/engine/slicePool';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import type { SceneCommand, WorkerPort } from '../../src/engine/workerProtocol';
import { sampleMotion } from '../../src/path/analyticMotion';
import { circularOrbit, lineOscillation } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';
import { ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../../src/physics/constants';
import { type FaultPlan, inProcessPort } from '../support/inProcessPort';

const radius = 0.01;
const beta = 0.6;
const period = (2 * Math.PI * radius) / (beta * SPEED_OF_LIGHT);
const charges = [
  {
    charge: -ELEMENTARY_CHARGE,
    path: new SampledPath(sampleMotion(circularOrbit(radius, beta), -4 * period, 2 * period, 1200)),
  },
  {
    charge: ELEMENTARY_CHARGE,
    path: new SampledPath(sampleMotion(lineOscillation(0.004, 2e9), -4 * period, 2 * period, 800)),
  },
];
const spec: SliceSpec = {
  center: [0.002, -0.001, 0.003],
  u: [1, 0, 0],
  v: [0, 0.6, 0.8],
  width: 0.08,
  height: 0.06,
  nx: 40,
  ny: 30,
  time: 0.5 * period,
};

function poolWith(plans: FaultPlan[], faults: string[] = []): SlicePool {
  let made = 0;
  return new SlicePool({
    createPort: () => inProcessPort(plans[made++] ?? {}),
    size: 2,
    tileTimeoutMs: 200,
    onFault: (m) => faults.push(m),
    // Four tiles per worker even on this small slice, so faults can strike mid-slice.
    minTilePoints: 0,
  });
}

describe('the slice pool', () => {
  it('gives exactly the single-thread slice, tile by tile', async () => {
    const pool = poolWith([]);
    pool.setScene(charges);
    const result = await pool.request(spec);
    const reference = computeSlice(spec, charges);
    expect(result).not.toBeNull();
    // Same kernel, same rows, same warm-start order within a row: bit-identical results.
    expect(Array.from(result!.fields.planes)).toEqual(Array.from(reference.fields.planes));
    expect(Array.from(result!.fields.mask)).toEqual(Array.from(reference.fields.mask));
    expect(result!.stats.points).toBe(spec.nx * spec.ny);
    pool.dispose();
  });

  it('warm-starts the next frame from the previous delays and still matches', async () => {
    const pool = poolWith([]);
    pool.setScene(charges);
    await pool.request(spec);
    const later = { ...spec, time: spec.time + 1e-12 };
    const warm = await pool.request(later);
    const reference = computeSlice(later, charges);
    const a = warm!.fields.planes;
    const b = reference.fields.planes;
    let worst = 0;
    for (let i = 0; i < a.length; i++)
      worst = Math.max(worst, Math.abs(a[i] - b[i]) / (Math.abs(b[i]) + 1e-30));
    // Both solves converge to the same root; float32 storage rounds at ~6e-8.
    expect(worst).toBeLessThan(1e-6);
    pool.dispose();
  });

  it('resolves an overtaken request to null and finishes only the newest', async () => {
    const pool = poolWith([]);
    pool.setScene(charges);
    const first = pool.request(spec);
    const second = pool.request({ ...spec, time: spec.time + 1e-11 });
    const third = pool.request({ ...spec, time: spec.time + 2e-11 });
    expect(await first).toBeNull();
    expect(await second).toBeNull();
    const done = await third;
    expect(done?.fields.time).toBe(spec.time + 2e-11);
    pool.dispose();
  });

  it('never queues more tiles than one request holds, however many requests flood in', async () => {
    const log: string[] = [];
    const pool = new SlicePool({ createPort: () => inProcessPort({}, log), size: 2 });
    pool.setScene(charges);
    const requests = [];
    for (let k = 0; k < 50; k++)
      requests.push(pool.request({ ...spec, time: spec.time + k * 1e-12 }));
    const results = await Promise.all(requests);
    expect(results.slice(0, 49).every((r) => r === null)).toBe(true);
    expect(results[49]).not.toBeNull();
    // Overtaken requests reach at most one tile per worker before being dropped.
    const tilesPerRequest = Math.ceil(spec.ny / Math.ceil(spec.ny / 8));
    expect(log.length).toBeLessThanOrEqual(tilesPerRequest + 2 * 49);
    pool.dispose();
  });

  for (const [name, plan] of [
    ['throws', { throwOnTile: 2 }],
    ['is killed', { dieOnTile: 1 }],
    ['hangs', { hangOnTile: 3 }],
  ] as const) {
    it(`replaces a worker that ${name} mid-slice, recomputes its tile and says so`, async () => {
      const faults: string[] = [];
      const pool = poolWith([plan], faults);
      pool.setScene(charges);
      const result = await pool.request(spec);
      const reference = computeSlice(spec, charges);
      expect(Array.from(result!.fields.planes)).toEqual(Array.from(reference.fields.planes));
      expect(result!.stats.faults).toBe(1);
      expect(faults).toHaveLength(1);
      expect(faults[0]).toMatch(/^field worker .+; replaced it and recomputed rows \d+–\d+$/);
      pool.dispose();
    });
  }

  it('falls back to this thread for a tile that fails twice', async () => {
    const faults: string[] = [];
    const pool = poolWith(
      [{ throwOnTile: 1 }, { throwOnTile: 1 }, { throwOnTile: 1 }, { throwOnTile: 1 }],
      faults,
    );
    pool.setScene(charges);
    const result = await pool.request(spec);
    const reference = computeSlice(spec, charges);
    expect(Array.from(result!.fields.planes)).toEqual(Array.from(reference.fields.planes));
    expect(faults.length).toBeGreaterThanOrEqual(2);
    pool.dispose();
  });

  it('delivers a coarse map first when asked', async () => {
    const pool = poolWith([]);
    pool.setScene(charges);
    const coarse: number[] = [];
    const result = await pool.request(spec, {
      coarseFactor: 4,
      onCoarse: (f) => coarse.push(f.nx, f.ny),
    });
    expect(coarse).toEqual([10, 8]);
    expect(result!.fields.nx).toBe(40);
    pool.dispose();
  });

  it('shares a scene with its workers through one block of memory, and keeps a path a new scene keeps', () => {
    const scenes: SceneCommand[] = [];
    const recording = (): WorkerPort => ({
      post: (command) => {
        // Each new worker is first given the empty scene; only real ones count here.
        if (command.type === 'scene' && command.charges.length > 0) scenes.push(command);
      },
      onMessage: () => {},
      onFailure: () => {},
      terminate: () => {},
    });
    const pool = new SlicePool({ createPort: recording, size: 2 });
    pool.setScene(charges);
    // Both workers were given the same shared columns: one copy, not one per worker.
    expect(scenes).toHaveLength(2);
    expect(scenes[0].charges[0].path.t.buffer).toBeInstanceOf(SharedArrayBuffer);
    expect(scenes[1].charges[0].path.t).toBe(scenes[0].charges[0].path.t);
    // A new scene with the first charge changed in value but not in path copies nothing again.
    pool.setScene([{ ...charges[0], charge: 2 * charges[0].charge }, charges[1]]);
    expect(scenes[2].charges[0].path.t).toBe(scenes[0].charges[0].path.t);
    expect(scenes[2].charges[1].path.t).toBe(scenes[0].charges[1].path.t);
    pool.dispose();
  });
});
