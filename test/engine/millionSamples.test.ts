import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { describe, expect, it } from 'vitest';
import { defaultNearRadius } from '../../src/engine/computeSlice';
import { computeSliceRows, type KernelStats } from '../../src/engine/sliceKernel';
import { allocateSliceFields } from '../../src/engine/slicePlanes';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import { sampleMotion } from '../../src/path/analyticMotion';
import { circularOrbit } from '../../src/path/presets';
import { type PathColumns, SampledPath } from '../../src/path/sampledPath';
import type { Charge } from '../../src/physics/charge';
import { ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../../src/physics/constants';

// A full collection before each baseline, so garbage from earlier work does not count
// (V8's gc, reachable once --expose-gc is set at run time).
setFlagsFromString('--expose-gc');
const gc = runInNewContext('gc') as () => void;
setFlagsFromString('--no-expose-gc');

/** Bytes in use: the JS heap plus ArrayBuffer backing stores (where typed arrays live). */
function used(): number {
  const m = process.memoryUsage();
  return m.heapUsed + m.arrayBuffers;
}

const N = 1_000_000;
/** The path's own columns: t, x, y, z, vx, vy, vz, ax, ay, az as Float64Array. */
const COLUMN_BYTES = 10 * 8 * N;
const MB = 1024 * 1024;

// ρ = 1 m at β = 0.9: 1000 turns of 1000 samples each (period 2πρ/(βc) ≈ 23 ns).
const radius = 1;
const beta = 0.9;
const period = (2 * Math.PI * radius) / (beta * SPEED_OF_LIGHT);
const span = 1000 * period;

function sliceAt(time: number): SliceSpec {
  return {
    center: [0, 0, 0.5],
    u: [1, 0, 0],
    v: [0, 1, 0],
    width: 4,
    height: 4,
    nx: 64,
    ny: 64,
    time,
  };
}

/**
 * Builds the path from the columns and computes a 64 × 64 slice row by row, reading the
 * memory in use after the build and after every row (without collecting, so any copy made
 * on the way is still counted). Returns the largest growth over the baseline and what a
 * full collection leaves.
 */
function measure(columns: PathColumns): { peak: number; retained: number; path: SampledPath } {
  gc();
  const base = used();
  const path = new SampledPath(columns);
  let peak = used() - base;
  const charges: Charge[] = [{ charge: ELEMENTARY_CHARGE, path }];
  const spec = sliceAt(0.5 * span);
  const fields = allocateSliceFields(spec.nx, spec.ny, spec.time);
  const target = { planes: fields.planes, mask: fields.mask, points: 64 * 64, row0: 0 };
  const stats: KernelStats = { points: 0, iterations: 0, maxIterations: 0 };
  for (let j = 0; j < spec.ny; j++) {
    computeSliceRows(spec, charges, j, j + 1, target, defaultNearRadius(spec), null, stats);
    peak = Math.max(peak, used() - base);
  }
  expect(stats.points).toBe(64 * 64);
  for (const v of fields.planes) expect(Number.isFinite(v)).toBe(true);
  gc();
  return { peak, retained: used() - base, path };
}

describe('a path of a million samples', () => {
  it('builds with its velocities given and computes a 64 × 64 slice within 1.5 times its own column bytes', () => {
    const columns = sampleMotion(circularOrbit(radius, beta), -span / 2, span / 2, N);
    const { peak, retained, path } = measure(columns);
    expect(path.count).toBe(N);
    console.log(
      `10⁶ samples with velocities: peak growth ${(peak / MB).toFixed(1)} MB, retained ` +
        `${(retained / MB).toFixed(1)} MB, against ${(COLUMN_BYTES / MB).toFixed(1)} MB of columns`,
    );
    // Bound: the path keeps one copy of its ten columns (1×); the slice adds 0.2 MB and the
    // kernel allocates nothing per point. 0.5× of slack covers V8's bookkeeping and when it
    // collects; one more copy of the columns anywhere (per build, slice or row) would pass 2×.
    expect(peak).toBeLessThan(1.5 * COLUMN_BYTES);
    // Bound: what stays is the path's own columns; 1.1× allows its small objects and noise.
    expect(retained).toBeLessThan(1.1 * COLUMN_BYTES);
  });

  it('builds from positions alone, its spline adding at most 1.5 times the column bytes on the way', () => {
    const full = sampleMotion(circularOrbit(radius, beta), -span / 2, span / 2, N, false);
    const { peak, retained } = measure({ t: full.t, x: full.x, y: full.y, z: full.z });
    console.log(
      `10⁶ samples from positions: peak growth ${(peak / MB).toFixed(1)} MB, retained ` +
        `${(retained / MB).toFixed(1)} MB, against ${(COLUMN_BYTES / MB).toFixed(1)} MB of columns`,
    );
    // Bound: the path's ten columns (1×), plus the not-a-knot spline's working arrays: four
    // of n doubles per axis (0.4× each, three axes, 1.2× if none is collected in between)
    // and one scratch column (0.1×): 2.3×; 2.5× with slack as above.
    expect(peak).toBeLessThan(2.5 * COLUMN_BYTES);
    // Bound: as above, only the path's own columns stay.
    expect(retained).toBeLessThan(1.1 * COLUMN_BYTES);
  });
});
