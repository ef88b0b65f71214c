import { useEffect, useMemo } from 'react';
import { BufferGeometry, Float32BufferAttribute } from 'three';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import type { Charge } from '../../src/physics/charge';
import { lightConeShells, type Shell } from '../field/lightConeShells';
import type { ViewMode } from '../store/viewSlice';
import { SliceFrame } from './SliceFrame';

export const SHELL_COLOUR = '#9ef0c4';
/** Shells drawn per charge; older light has left the view by then. */
export const SHELL_COUNT = 8;
const CIRCLE_SEGMENTS = 120;

interface ShellLinesProps {
  spec: SliceSpec;
  charges: readonly Charge[];
  time: number;
  spacing: number;
  mode: ViewMode;
}

/**
 * Light-cone shells: where the light emitted at regular past instants has got to now. On the
 * slice each is the circle where its sphere meets the plane; in 3D the spheres are drawn too.
 */
export function ShellLines({ spec, charges, time, spacing, mode }: ShellLinesProps) {
  const shells = useMemo(
    () => charges.flatMap(({ path }) => lightConeShells(path, spec, time, spacing, SHELL_COUNT)),
    [charges, spec, time, spacing],
  );
  const circles = useMemo(() => circleGeometry(shells), [shells]);
  const centres = useMemo(() => centreGeometry(shells), [shells]);
  useEffect(() => () => circles.dispose(), [circles]);
  useEffect(() => () => centres.dispose(), [centres]);
  const origin = spec.center;

  return (
    <>
      <SliceFrame spec={spec} origin={spec.center}>
        <lineSegments geometry={circles} renderOrder={2}>
          <lineBasicMaterial color={SHELL_COLOUR} transparent opacity={0.7} depthTest={false} />
        </lineSegments>
        <points geometry={centres} renderOrder={2}>
          <pointsMaterial color={SHELL_COLOUR} size={4} sizeAttenuation={false} depthTest={false} />
        </points>
      </SliceFrame>
      {mode === '3d' &&
        shells.map((shell) => (
          <mesh
            key={`${shell.emitted}:${shell.center.join(',')}`}
            position={[
              shell.center[0] - origin[0],
              shell.center[1] - origin[1],
              shell.center[2] - origin[2],
            ]}
            renderOrder={1}
          >
            <sphereGeometry args={[shell.radius, 24, 12]} />
            <meshBasicMaterial
              color={SHELL_COLOUR}
              wireframe
              transparent
              opacity={0.06}
              depthWrite={false}
            />
          </mesh>
        ))}
    </>
  );
}

/** All cut circles as one set of line segments, in slice coordinates. */
function circleGeometry(shells: readonly Shell[]): BufferGeometry {
  const cuts = shells.filter((shell) => shell.cut !== null);
  const positions = new Float32Array(cuts.length * CIRCLE_SEGMENTS * 6);
  let o = 0;
  for (const { cut } of cuts) {
    if (cut === null) continue;
    for (let s = 0; s < CIRCLE_SEGMENTS; s++) {
      const p0 = (2 * Math.PI * s) / CIRCLE_SEGMENTS;
      const p1 = (2 * Math.PI * (s + 1)) / CIRCLE_SEGMENTS;
      positions[o++] = cut.a + cut.radius * Math.cos(p0);
      positions[o++] = cut.b + cut.radius * Math.sin(p0);
      positions[o++] = 0;
      positions[o++] = cut.a + cut.radius * Math.cos(p1);
      positions[o++] = cut.b + cut.radius * Math.sin(p1);
      positions[o++] = 0;
    }
  }
  const geometry = new BufferGeometry();
  geometry.setAttribute('position', new Float32BufferAttribute(positions, 3));
  return geometry;
}

/** The emission points, projected onto the slice. */
function centreGeometry(shells: readonly Shell[]): BufferGeometry {
  const cuts = shells.filter((shell) => shell.cut !== null);
  const positions = new Float32Array(cuts.length * 3);
  cuts.forEach(({ cut }, k) => {
    if (cut === null) return;
    positions[3 * k] = cut.a;
    positions[3 * k + 1] = cut.b;
  });
  const geometry = new BufferGeometry();
  geometry.setAttribute('position', new Float32BufferAttribute(positions, 3));
  return geometry;
}
