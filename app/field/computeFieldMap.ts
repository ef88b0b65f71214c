import type { SlicePool } from '../../src/engine/slicePool';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import type { Charge } from '../../src/physics/charge';
import { type FieldMap, summariseField } from './fieldMap';

let nextId = 1;

/** Grid points along each side of a coarse pass: 1 in COARSE_FACTOR of the full grid's. */
export const COARSE_FACTOR = 4;

/**
 * Computes a slice in the pool's workers and summarises it; a coarse map (4× fewer points
 * each way) goes to onCoarse first. With `coarseOnly` the coarse map is all that is computed
 * (and is what resolves). Resolves null when a newer request overtook this one.
 */
export async function computeFieldMap(
  pool: SlicePool,
  spec: SliceSpec,
  charges: readonly Charge[],
  onCoarse?: (map: FieldMap) => void,
  coarseOnly = false,
): Promise<FieldMap | null> {
  if (coarseOnly) {
    const coarseSpec = {
      ...spec,
      nx: Math.max(1, Math.ceil(spec.nx / COARSE_FACTOR)),
      ny: Math.max(1, Math.ceil(spec.ny / COARSE_FACTOR)),
    };
    const coarse = await pool.request(coarseSpec);
    if (coarse === null) return null;
    return summariseField({
      id: nextId++,
      spec: coarseSpec,
      requested: [spec.nx, spec.ny],
      charges,
      fields: coarse.fields,
      elapsedMs: coarse.stats.ms,
      stats: coarse.stats,
      threads: coarse.stats.threads,
      coarse: true,
    });
  }
  const result = await pool.request(spec, {
    coarseFactor: COARSE_FACTOR,
    onCoarse: (fields) =>
      onCoarse?.(
        summariseField({
          id: nextId++,
          spec: { ...spec, nx: fields.nx, ny: fields.ny },
          requested: [spec.nx, spec.ny],
          charges,
          fields,
          elapsedMs: 0,
          stats: { points: fields.nx * fields.ny, iterations: 0, maxIterations: 0 },
          threads: pool.size,
          coarse: true,
        }),
      ),
  });
  if (result === null) return null;
  return summariseField({
    id: nextId++,
    spec,
    requested: [spec.nx, spec.ny],
    charges,
    fields: result.fields,
    elapsedMs: result.stats.ms,
    stats: result.stats,
    threads: result.stats.threads,
    coarse: false,
  });
}
