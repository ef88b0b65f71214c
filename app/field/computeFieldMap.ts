import type { SlicePool } from '../../src/engine/slicePool';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import type { Charge } from '../../src/physics/charge';
import { type FieldMap, summariseField } from './fieldMap';

let nextId = 1;

/**
 * Computes a slice in the pool's workers and summarises it; a coarse map (4× fewer points
 * each way) goes to onCoarse first. Resolves null when a newer request overtook this one.
 */
export async function computeFieldMap(
  pool: SlicePool,
  spec: SliceSpec,
  charges: readonly Charge[],
  onCoarse?: (map: FieldMap) => void,
): Promise<FieldMap | null> {
  const result = await pool.request(spec, {
    coarseFactor: 4,
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
