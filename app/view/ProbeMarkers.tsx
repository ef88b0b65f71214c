import { useEffect, useMemo } from 'react';
import { BufferGeometry, Float32BufferAttribute } from 'three';
import type { Triple } from '../../src/engine/sliceSpec';
import type { Charge } from '../../src/physics/charge';
import { retardedPositions } from '../probe/retardedPositions';
import type { Probe } from '../store/probesSlice';

export const PROBE_COLOUR = '#ffd166';
export const RETARDED_COLOUR = '#ff9de2';

interface ProbeMarkersProps {
  origin: Triple;
  probes: readonly Probe[];
  charges: readonly Charge[];
  time: number;
  radius: number;
}

/** Each probe, the retarded position of each charge it sees now, and the line of sight between. */
export function ProbeMarkers({ origin, probes, charges, time, radius }: ProbeMarkersProps) {
  const sight = useMemo(() => {
    const positions: number[] = [];
    const retarded: Triple[] = [];
    for (const probe of probes) {
      for (const { position } of retardedPositions(charges, probe.position, time)) {
        positions.push(...relative(probe.position, origin), ...relative(position, origin));
        retarded.push(relative(position, origin));
      }
    }
    const geometry = new BufferGeometry();
    geometry.setAttribute('position', new Float32BufferAttribute(positions, 3));
    return { geometry, retarded };
  }, [origin, probes, charges, time]);
  useEffect(() => () => sight.geometry.dispose(), [sight]);

  return (
    <>
      <lineSegments geometry={sight.geometry} renderOrder={4}>
        <lineBasicMaterial color={RETARDED_COLOUR} transparent opacity={0.85} depthTest={false} />
      </lineSegments>
      {sight.retarded.map((position, k) => (
        // biome-ignore lint/suspicious/noArrayIndexKey: one marker per probe and charge, in order
        <mesh key={k} position={position} renderOrder={5}>
          <sphereGeometry args={[radius * 0.8, 16, 10]} />
          <meshBasicMaterial color={RETARDED_COLOUR} depthTest={false} toneMapped={false} />
        </mesh>
      ))}
      {probes.map((probe) => (
        <mesh key={probe.id} position={relative(probe.position, origin)} renderOrder={5}>
          <octahedronGeometry args={[radius * 1.3]} />
          <meshBasicMaterial color={PROBE_COLOUR} depthTest={false} toneMapped={false} />
        </mesh>
      ))}
    </>
  );
}

function relative(point: Triple, origin: Triple): Triple {
  return [point[0] - origin[0], point[1] - origin[1], point[2] - origin[2]];
}
