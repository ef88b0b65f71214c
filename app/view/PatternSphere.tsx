import { interpolateMagma } from 'd3-scale-chromatic';
import { useEffect, useMemo } from 'react';
import { Color, Float32BufferAttribute, SphereGeometry } from 'three';
import { patternOnSphere } from '../../src/analysis/angularPattern';
import type { Triple } from '../../src/engine/sliceSpec';
import { pathState } from '../../src/path/pathState';
import type { Charge } from '../../src/physics/charge';

const N_THETA = 48;
const N_PHI = 96;

interface PatternSphereProps {
  charge: Charge;
  sourceTime: number;
  per: 'source' | 'observer';
  origin: Triple;
  radius: number;
}

/** dP/dΩ shaded on a sphere around the charge at the source time: light where power goes. */
export function PatternSphere({ charge, sourceTime, per, origin, radius }: PatternSphereProps) {
  const geometry = useMemo(() => {
    const pattern = patternOnSphere(charge.path, charge.charge, sourceTime, N_THETA, N_PHI);
    const values = per === 'source' ? pattern.perSourceTime : pattern.perObserverTime;
    let peak = 0;
    for (let k = 0; k < values.length; k++) peak = Math.max(peak, values[k]);
    const sphere = new SphereGeometry(radius, N_PHI, N_THETA);
    const position = sphere.getAttribute('position');
    const colours = new Float32Array(3 * position.count);
    const colour = new Color();
    for (let p = 0; p < position.count; p++) {
      const x = position.getX(p);
      const y = position.getY(p);
      const z = position.getZ(p);
      // θ from +z and φ from +x, as patternOnSphere samples them, cell-centred.
      const theta = Math.acos(Math.max(-1, Math.min(1, z / radius)));
      const phi = (Math.atan2(y, x) + 2 * Math.PI) % (2 * Math.PI);
      const j = Math.min(N_THETA - 1, Math.floor((theta / Math.PI) * N_THETA));
      const i = Math.min(N_PHI - 1, Math.floor((phi / (2 * Math.PI)) * N_PHI));
      const share = peak > 0 ? values[j * N_PHI + i] / peak : 0;
      colour.setStyle(interpolateMagma(0.08 + 0.92 * Math.sqrt(share)));
      colours[3 * p] = colour.r;
      colours[3 * p + 1] = colour.g;
      colours[3 * p + 2] = colour.b;
    }
    sphere.setAttribute('color', new Float32BufferAttribute(colours, 3));
    return sphere;
  }, [charge, sourceTime, per, radius]);
  useEffect(() => () => geometry.dispose(), [geometry]);
  const state = pathState();
  charge.path.stateAt(sourceTime, state);
  return (
    <mesh
      geometry={geometry}
      position={[state.px - origin[0], state.py - origin[1], state.pz - origin[2]]}
      renderOrder={7}
    >
      <meshBasicMaterial vertexColors transparent opacity={0.85} depthWrite={false} />
    </mesh>
  );
}
