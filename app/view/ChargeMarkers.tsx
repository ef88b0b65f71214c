import { useThree } from '@react-three/fiber';
import { useLayoutEffect, useRef } from 'react';
import type { Mesh } from 'three';
import type { Triple } from '../../src/engine/sliceSpec';
import { pathState } from '../../src/path/pathState';
import type { Charge } from '../../src/physics/charge';

export const NEGATIVE_COLOUR = '#46d2ff';
export const POSITIVE_COLOUR = '#ff7a59';
const RING_COLOUR = '#0b0d10';

const scratch = pathState();

interface ChargeMarkersProps {
  origin: Triple;
  charges: readonly Charge[];
  /** Marker radius, m: a fixed share of the view so it looks the same at any zoom. */
  radius: number;
  /** The instant drawn, s. */
  time: number;
}

/** A dot at each charge's present position at the instant drawn; moved in place, not re-created. */
export function ChargeMarkers({ origin, charges, radius, time }: ChargeMarkersProps) {
  const invalidate = useThree((s) => s.invalidate);
  const markers = useRef<(Mesh | null)[]>([]);

  useLayoutEffect(() => {
    for (let k = 0; k < charges.length; k++) {
      const marker = markers.current[k];
      if (!marker) continue;
      charges[k].path.stateAt(time, scratch);
      marker.position.set(scratch.px - origin[0], scratch.py - origin[1], scratch.pz - origin[2]);
    }
    invalidate();
  }, [charges, origin, time, invalidate]);

  return charges.map(({ charge }, k) => (
    <mesh
      // biome-ignore lint/suspicious/noArrayIndexKey: charges are identified by their order in the scenario
      key={k}
      ref={(mesh) => {
        markers.current[k] = mesh;
      }}
      renderOrder={6}
    >
      <sphereGeometry args={[radius, 20, 12]} />
      <meshBasicMaterial
        color={charge < 0 ? NEGATIVE_COLOUR : POSITIVE_COLOUR}
        depthTest={false}
        toneMapped={false}
      />
      <mesh renderOrder={5}>
        <sphereGeometry args={[radius * 1.5, 20, 12]} />
        <meshBasicMaterial color={RING_COLOUR} depthTest={false} toneMapped={false} />
      </mesh>
    </mesh>
  ));
}
