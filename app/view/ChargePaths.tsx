import { extend } from '@react-three/fiber';
import { useEffect, useMemo } from 'react';
import { BufferGeometry, Float32BufferAttribute, Line } from 'three';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import type { Charge } from '../../src/physics/charge';
import { toSlice } from './sliceCoordinates';

// <line> is taken by SVG in JSX, so three's Line is registered under r3f's <threeLine> name.
extend({ ThreeLine: Line });

export const PATH_COLOUR = '#e8f1ff';

/** Each charge's sampled path, projected onto the slice, as a thin line above the map. */
export function ChargePaths({ spec, charges }: { spec: SliceSpec; charges: readonly Charge[] }) {
  const geometries = useMemo(
    () =>
      charges.map(({ path }) => {
        const positions = new Float32Array(3 * path.count);
        for (let i = 0; i < path.count; i++) {
          const [a, b] = toSlice(spec, path.x[i], path.y[i], path.z[i]);
          positions[3 * i] = a;
          positions[3 * i + 1] = b;
          positions[3 * i + 2] = 0.01;
        }
        const geometry = new BufferGeometry();
        geometry.setAttribute('position', new Float32BufferAttribute(positions, 3));
        return geometry;
      }),
    [spec, charges],
  );
  useEffect(
    () => () => {
      for (const geometry of geometries) geometry.dispose();
    },
    [geometries],
  );

  return geometries.map((geometry, k) => (
    // biome-ignore lint/suspicious/noArrayIndexKey: charges are identified by their order in the scenario
    <threeLine key={k} geometry={geometry} renderOrder={1}>
      <lineBasicMaterial color={PATH_COLOUR} transparent opacity={0.55} depthTest={false} />
    </threeLine>
  ));
}
