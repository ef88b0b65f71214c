import type { SliceSpec } from '../../src/engine/sliceSpec';
import { createBrowserSlicePool } from '../engine/browserSlicePool';
import { type FieldMap, summariseField } from '../field/fieldMap';

/** Most grid points along a side of a picture's map: 1024² is about a second on two cores. */
const PICTURE_GRID_LIMIT = 1024;

/** The grid a picture's map is computed on: a point per two pixels, at most PICTURE_GRID_LIMIT. */
function pictureSpec(spec: SliceSpec, plotWidthPixels: number): SliceSpec {
  const nx = Math.min(PICTURE_GRID_LIMIT, Math.max(spec.nx, Math.round(plotWidthPixels / 2)));
  const ny = Math.max(1, Math.round((nx * spec.height) / spec.width));
  return { ...spec, nx, ny: Math.min(ny, PICTURE_GRID_LIMIT) };
}

/**
 * The map computed afresh on the picture's own grid, in workers of its own (the view's keep
 * working), or the map as it is when its grid is already as fine.
 */
export async function pictureMap(map: FieldMap, plotWidthPixels: number): Promise<FieldMap> {
  const spec = pictureSpec(map.spec, plotWidthPixels);
  if (spec.nx <= map.spec.nx && spec.ny <= map.spec.ny) return map;
  const pool = createBrowserSlicePool(() => {});
  try {
    pool.setScene(map.charges);
    const result = await pool.request(spec);
    if (result === null) return map;
    return summariseField({
      id: -map.id,
      spec,
      requested: [spec.nx, spec.ny],
      charges: map.charges,
      fields: result.fields,
      elapsedMs: result.stats.ms,
      stats: result.stats,
      threads: result.stats.threads,
      coarse: false,
    });
  } finally {
    pool.dispose();
  }
}
