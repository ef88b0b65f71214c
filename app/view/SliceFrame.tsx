import { type ReactNode, useMemo } from 'react';
import { Matrix4, Vector3 } from 'three';
import type { SliceSpec, Triple } from '../../src/engine/sliceSpec';
import { planeNormal } from './viewGeometry';

/**
 * Children drawn in slice coordinates (a along u, b along v, n along the normal, metres from the
 * slice centre) are placed in the scene, whose axes are x, y, z and whose origin is `origin`
 * (the centre of the slice now in view, which a map computed for an earlier slice may not share).
 */
export function SliceFrame({
  spec,
  origin,
  children,
}: {
  spec: SliceSpec;
  origin: Triple;
  children: ReactNode;
}) {
  const matrix = useMemo(() => {
    const n = planeNormal(spec);
    return new Matrix4()
      .makeBasis(new Vector3(...spec.u), new Vector3(...spec.v), new Vector3(...n))
      .setPosition(
        spec.center[0] - origin[0],
        spec.center[1] - origin[1],
        spec.center[2] - origin[2],
      );
  }, [spec, origin]);
  return (
    <group matrix={matrix} matrixAutoUpdate={false}>
      {children}
    </group>
  );
}
