// Benchmark of the slice engine: ratios measured in one run (npm run bench [-- --json]).
import { availableParallelism } from 'node:os';
import { computeSlice } from '../src/engine/computeSlice';
import { createNodeSlicePool } from '../src/engine/node/nodeSlicePool';
import { planeOf } from '../src/engine/slicePlanes';
import type { SliceSpec } from '../src/engine/sliceSpec';
import { sampleMotion } from '../src/path/analyticMotion';
import { pathState } from '../src/path/pathState';
import { circularOrbit } from '../src/path/presets';
import { SampledPath } from '../src/path/sampledPath';
import type { Charge } from '../src/physics/charge';
import { ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../src/physics/constants';
import { clearFields, fieldSample } from '../src/physics/fieldSample';
import { addLienardWiechert } from '../src/physics/lienardWiechert';
import { naiveRetardedTime } from './naiveRetarded';

interface Row {
  name: string;
  points: number;
  samples: number;
  charges: number;
  threads: number;
  ms: number;
  pointsPerSec: number;
}

const json = process.argv.includes('--json');
const cores = availableParallelism();
const radius = 0.01;
const beta = 0.8;
const period = (2 * Math.PI * radius) / (beta * SPEED_OF_LIGHT);
const time = 0;

function orbitCharges(count: number, samples: number): Charge[] {
  const charges: Charge[] = [];
  for (let k = 0; k < count; k++) {
    // Invented bench scene: charges spread round one orbit, each sampled over four turns.
    const phase = (k / count) * period;
    const motion = circularOrbit(radius, beta);
    const path = new SampledPath(
      sampleMotion((t, o) => motion(t + phase, o), -4 * period, 0.5 * period, samples),
    );
    charges.push({ charge: -ELEMENTARY_CHARGE, path });
  }
  return charges;
}

function gridSpec(n: number): SliceSpec {
  return {
    center: [0, 0, 0],
    u: [1, 0, 0],
    v: [0, 1, 0],
    width: 0.2,
    height: 0.2,
    nx: n,
    ny: n,
    time,
  };
}

/** Median of `repeats` timed runs after `warmups` untimed ones (workers need a dozen to JIT). */
async function timed(run: () => Promise<void> | void, repeats = 5, warmups = 12): Promise<number> {
  for (let w = 0; w < warmups; w++) await run();
  const times: number[] = [];
  for (let r = 0; r < repeats; r++) {
    const start = performance.now();
    await run();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}

function row(name: string, spec: SliceSpec, charges: Charge[], threads: number, ms: number): Row {
  const points = spec.nx * spec.ny;
  return {
    name,
    points,
    samples: charges[0].path.count,
    charges: charges.length,
    threads,
    ms: Math.round(ms * 100) / 100,
    pointsPerSec: Math.round((points / ms) * 1000),
  };
}

async function enginePool(spec: SliceSpec, charges: Charge[], threads: number): Promise<number> {
  const pool = createNodeSlicePool(threads);
  try {
    pool.setScene(charges);
    let frame = 0;
    // Successive frames 1 ps apart, as a playing view asks for them.
    return await timed(async () => {
      await pool.request({ ...spec, time: spec.time + frame++ * 1e-12 });
    });
  } finally {
    pool.dispose();
  }
}

function kernelOnly(spec: SliceSpec, charges: Charge[]): number {
  const { fields } = computeSlice(spec, charges);
  const delays = Float64Array.from(planeOf(fields, 'delay'));
  const state = pathState();
  const out = fieldSample();
  const { path, charge } = charges[0];
  return timedSync(() => {
    let hint = -1;
    for (let j = 0; j < spec.ny; j++) {
      const y = ((j + 0.5) / spec.ny - 0.5) * spec.height;
      for (let i = 0; i < spec.nx; i++) {
        const x = ((i + 0.5) / spec.nx - 0.5) * spec.width;
        hint = path.stateAt(spec.time - delays[j * spec.nx + i], state, hint);
        clearFields(out);
        addLienardWiechert(charge, x, y, 0, state, out);
      }
    }
  });
}

function timedSync(run: () => void): number {
  for (let w = 0; w < 4; w++) run();
  const times: number[] = [];
  for (let r = 0; r < 5; r++) {
    const start = performance.now();
    run();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return times[2];
}

function naive(spec: SliceSpec, charges: Charge[]): number {
  const state = pathState();
  const out = fieldSample();
  const { path, charge } = charges[0];
  return timedSync(() => {
    for (let j = 0; j < spec.ny; j++) {
      const y = ((j + 0.5) / spec.ny - 0.5) * spec.height;
      for (let i = 0; i < spec.nx; i++) {
        const x = ((i + 0.5) / spec.nx - 0.5) * spec.width;
        const tr = naiveRetardedTime(path, x, y, 0, spec.time, state);
        path.stateAt(tr, state);
        clearFields(out);
        addLienardWiechert(charge, x, y, 0, state, out);
      }
    }
  });
}

/** Least-squares slope of log(ms) against log(x). */
function growth(xs: number[], ms: number[]): number {
  const lx = xs.map(Math.log);
  const ly = ms.map(Math.log);
  const mx = lx.reduce((a, b) => a + b, 0) / lx.length;
  const my = ly.reduce((a, b) => a + b, 0) / ly.length;
  let num = 0;
  let den = 0;
  for (let k = 0; k < lx.length; k++) {
    num += (lx[k] - mx) * (ly[k] - my);
    den += (lx[k] - mx) ** 2;
  }
  return Math.round((num / den) * 1000) / 1000;
}

function say(text: string): void {
  if (!json) process.stderr.write(`${text}\n`);
}

const rows: Row[] = [];
const base = orbitCharges(1, 10_000);
const spec256 = gridSpec(256);

say('kernel and one-thread engine, 256², 10⁴ samples');
const kernelMs = kernelOnly(spec256, base);
rows.push(row('kernel (retarded time known)', spec256, base, 1, kernelMs));
const engine1 = await enginePool(spec256, base, 1);
rows.push(row('engine', spec256, base, 1, engine1));
const engineAll = await enginePool(spec256, base, cores);
rows.push(row('engine', spec256, base, cores, engineAll));

say('naive bisection against the engine, 128², 10⁵ samples');
const many = orbitCharges(1, 100_000);
const spec128 = gridSpec(128);
const naiveMs = naive(spec128, many);
rows.push(row('naive bisection', spec128, many, 1, naiveMs));
const engineNaiveCase = await enginePool(spec128, many, 1);
rows.push(row('engine', spec128, many, 1, engineNaiveCase));

say('grid sizes, 10⁴ samples, all cores');
const gridPoints: number[] = [];
const gridMs: number[] = [];
for (const n of [128, 256, 512, 1024]) {
  const spec = gridSpec(n);
  const ms = await enginePool(spec, base, cores);
  rows.push(row(`engine grid ${n}²`, spec, base, cores, ms));
  gridPoints.push(n * n);
  gridMs.push(ms);
}

say('path samples, 256², all cores');
const sampleCounts: number[] = [];
const sampleMs: number[] = [];
for (const samples of [1_000, 10_000, 100_000, 1_000_000]) {
  const charges = samples === 10_000 ? base : samples === 100_000 ? many : orbitCharges(1, samples);
  const ms = await enginePool(spec256, charges, cores);
  rows.push(row(`engine samples ${samples}`, spec256, charges, cores, ms));
  sampleCounts.push(samples);
  sampleMs.push(ms);
}

say('charges, 256², 10⁴ samples, all cores');
const chargeCounts: number[] = [];
const chargeMs: number[] = [];
for (const count of [1, 2, 8]) {
  const charges = count === 1 ? base : orbitCharges(count, 10_000);
  const ms = await enginePool(spec256, charges, cores);
  rows.push(row(`engine charges ${count}`, spec256, charges, cores, ms));
  chargeCounts.push(count);
  chargeMs.push(ms);
}

const round = (x: number) => Math.round(x * 1000) / 1000;
const ratios = {
  engineToKernel: round(kernelMs / engine1),
  engineToNaive: round(naiveMs / engineNaiveCase),
  parallelSpeedup: round(engine1 / engineAll),
  growthInGridPoints: growth(gridPoints, gridMs),
  growthInSamples: growth(sampleCounts, sampleMs),
  growthInCharges: growth(chargeCounts, chargeMs),
};

if (json) {
  process.stdout.write(`${JSON.stringify({ cores, rows, ratios })}\n`);
} else {
  console.table(rows);
  console.table(ratios);
}
