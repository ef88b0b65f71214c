import { useFrame, useThree } from '@react-three/fiber';
import { useEffect, useMemo, useRef } from 'react';
import {
  DataTexture,
  DoubleSide,
  NearestFilter,
  RGBAFormat,
  SRGBColorSpace,
  UnsignedByteType,
} from 'three';
import type { ColourScale } from '../field/colourScale';
import { paintValues } from '../field/colourScale';
import type { FieldMap } from '../field/fieldMap';
import type { QuantityValues } from '../field/mapQuantity';

interface FieldPlaneProps {
  map: FieldMap;
  quantity: QuantityValues;
  scale: ColourScale | null;
  /** Called once the frame showing map `id` (for observation time `time`, s) has been drawn. */
  onDrawn(id: number, time: number): void;
}

/** The slice as a quad textured with the chosen quantity, one texel per grid point. */
export function FieldPlane({ map, quantity, scale, onDrawn }: FieldPlaneProps) {
  const invalidate = useThree((s) => s.invalidate);
  const { nx, ny, mask } = map.fields;
  // One texture per grid size, repainted in place as maps arrive: no allocation per frame.
  const texture = useMemo(() => {
    const result = new DataTexture(
      new Uint8Array(4 * nx * ny),
      nx,
      ny,
      RGBAFormat,
      UnsignedByteType,
    );
    result.colorSpace = SRGBColorSpace;
    // Nearest so every grid point shows as its own cell: no smoothing the data did not have.
    result.magFilter = NearestFilter;
    result.minFilter = NearestFilter;
    result.generateMipmaps = false;
    return result;
  }, [nx, ny]);
  useEffect(() => () => texture.dispose(), [texture]);

  useEffect(() => {
    const data = texture.image.data as Uint8Array;
    if (scale === null) data.fill(0);
    else paintValues(quantity.values, mask, scale, data);
    texture.needsUpdate = true;
    invalidate();
  }, [texture, quantity, mask, scale, invalidate]);

  const drawn = useRef(0);
  useFrame(() => {
    if (drawn.current === map.id) return;
    drawn.current = map.id;
    const { id } = map;
    const { time } = map.spec;
    // Frame callbacks run just before the render of the same frame; report after it.
    setTimeout(() => onDrawn(id, time), 0);
  });

  return (
    <mesh renderOrder={0}>
      <planeGeometry args={[map.spec.width, map.spec.height]} />
      <meshBasicMaterial map={texture} toneMapped={false} side={DoubleSide} />
    </mesh>
  );
}
