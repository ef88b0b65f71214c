import { extend } from '@react-three/fiber';
import { useEffect, useMemo } from 'react';
import { BufferGeometry, Float32BufferAttribute, Line } from 'three';
import type { Triple } from '../../src/engine/sliceSpec';
import type { Charge } from '../../src/physics/charge';
import { drawnSamples } from './pathVertices';

// <line> is taken by SVG in JSX, so three's Line is registered under r3f's <threeLine> name.
extend({ ThreeLine: Line });

export const PATH_COLOUR = '#e8f1ff';
export const SELECTED_PATH_COLOUR = '#ffd166';

interface ChargePathsProps {
  /** Scene origin in the world, m: positions are drawn relative to it so Float32 keeps precision. */
  origin: Triple;
  charges: readonly Charge[];
  selected: number;
}

/** Each charge's sampled path as a thin line; the one being edited stands out. */
export function ChargePaths({ origin, charges, selected }: ChargePathsProps) {
  const geometries = useMemo(
    () =>
      charges.map(({ path }) => {
        // A long imported path is drawn through a thinned set of its samples.
        const samples = drawnSamples(path.count);
        const positions = new Float32Array(3 * samples.length);
        for (let v = 0; v < samples.length; v++) {
          const i = samples[v];
          positions[3 * v] = path.x[i] - origin[0];
          positions[3 * v + 1] = path.y[i] - origin[1];
          positions[3 * v + 2] = path.z[i] - origin[2];
        }
        const geometry = new BufferGeometry();
        geometry.setAttribute('position', new Float32BufferAttribute(positions, 3));
        return geometry;
      }),
    [origin, charges],
  );
  useEffect(
    () => () => {
      for (const geometry of geometries) geometry.dispose();
    },
    [geometries],
  );

  return geometries.map((geometry, k) => (
    // biome-ignore lint/suspicious/noArrayIndexKey: charges are identified by their order in the scenario
    <threeLine key={k} geometry={geometry} renderOrder={3}>
      <lineBasicMaterial
        color={k === selected && charges.length > 1 ? SELECTED_PATH_COLOUR : PATH_COLOUR}
        transparent
        opacity={0.6}
        depthTest={false}
      />
    </threeLine>
  ));
}
