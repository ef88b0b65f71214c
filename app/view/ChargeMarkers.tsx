import { useFrame, useThree } from '@react-three/fiber';
import { useEffect, useRef } from 'react';
import type { Group } from 'three';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import { pathState } from '../../src/path/pathState';
import type { Charge } from '../../src/physics/charge';
import { appStore } from '../store/appStore';
import { toSlice } from './sliceCoordinates';

export const MARKER_COLOUR = '#46d2ff';
const RING_COLOUR = '#0b0d10';

const scratch = pathState();

/** A dot at each charge's present position; moved per frame from the store's time, not by re-rendering. */
export function ChargeMarkers({ spec, charges }: { spec: SliceSpec; charges: readonly Charge[] }) {
  const invalidate = useThree((s) => s.invalidate);
  const markers = useRef<(Group | null)[]>([]);
  // Radius in slice metres: a fixed share of the view, so the dot looks the same at any zoom.
  const radius = 0.011 * Math.min(spec.width, spec.height);

  useEffect(
    () =>
      appStore.subscribe((state, previous) => {
        if (state.time !== previous.time) invalidate();
      }),
    [invalidate],
  );

  useFrame(() => {
    const { time } = appStore.getState();
    charges.forEach(({ path }, k) => {
      const marker = markers.current[k];
      if (!marker) return;
      path.stateAt(time, scratch);
      const [a, b] = toSlice(spec, scratch.px, scratch.py, scratch.pz);
      marker.position.set(a, b, 0.02);
    });
  });

  return charges.map((_, k) => (
    <group
      // biome-ignore lint/suspicious/noArrayIndexKey: charges are identified by their order in the scenario
      key={k}
      ref={(group) => {
        markers.current[k] = group;
      }}
    >
      <mesh renderOrder={2}>
        <circleGeometry args={[radius * 1.45, 32]} />
        <meshBasicMaterial color={RING_COLOUR} depthTest={false} toneMapped={false} />
      </mesh>
      <mesh renderOrder={3}>
        <circleGeometry args={[radius, 32]} />
        <meshBasicMaterial color={MARKER_COLOUR} depthTest={false} toneMapped={false} />
      </mesh>
    </group>
  ));
}
