import { useFrame, useThree } from '@react-three/fiber';
import { useEffect, useMemo, useRef } from 'react';
import { DataTexture, NearestFilter, RGBAFormat, SRGBColorSpace, UnsignedByteType } from 'three';
import type { FieldMap } from '../field/fieldMap';
import { paintMagnitude } from '../field/logColourScale';

interface FieldPlaneProps {
  map: FieldMap;
  /** Called once the frame showing map `id` has been drawn. */
  onDrawn(id: number): void;
}

/** The slice as a quad textured with |E| on the log colour scale, one texel per grid point. */
export function FieldPlane({ map, onDrawn }: FieldPlaneProps) {
  const invalidate = useThree((s) => s.invalidate);
  const texture = useMemo(() => {
    const { nx, ny, mask } = map.fields;
    const range = map.colourRange ?? { min: 1, max: 10 };
    const data = paintMagnitude(map.magnitude, mask, range);
    const result = new DataTexture(data, nx, ny, RGBAFormat, UnsignedByteType);
    result.colorSpace = SRGBColorSpace;
    // Nearest so every grid point shows as its own cell: no smoothing the data did not have.
    result.magFilter = NearestFilter;
    result.minFilter = NearestFilter;
    result.generateMipmaps = false;
    result.needsUpdate = true;
    return result;
  }, [map]);

  useEffect(() => {
    invalidate();
    return () => texture.dispose();
  }, [texture, invalidate]);

  const drawn = useRef(0);
  useFrame(() => {
    if (drawn.current === map.id) return;
    drawn.current = map.id;
    const id = map.id;
    // Frame callbacks run just before the render of the same frame; report after it.
    setTimeout(() => onDrawn(id), 0);
  });

  return (
    <mesh renderOrder={0}>
      <planeGeometry args={[map.spec.width, map.spec.height]} />
      <meshBasicMaterial map={texture} toneMapped={false} />
    </mesh>
  );
}
