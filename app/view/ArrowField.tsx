import { useEffect, useMemo } from 'react';
import { BufferGeometry, Float32BufferAttribute } from 'three';
import type { Triple } from '../../src/engine/sliceSpec';
import { type ArrowQuantity, arrowSegments } from '../field/arrowLattice';
import type { FieldMap } from '../field/fieldMap';
import { SliceFrame } from './SliceFrame';

export const ARROW_COLOUR = '#ffffff';
/** Arrows along the longer side of the slice. */
export const ARROWS_ACROSS = 24;

/** The in-plane direction of E, its radiation part or S on a coarse lattice. */
interface ArrowFieldProps {
  map: FieldMap;
  quantity: ArrowQuantity;
  origin: Triple;
}

export function ArrowField({ map, quantity, origin }: ArrowFieldProps) {
  const geometry = useMemo(() => {
    const result = new BufferGeometry();
    const segments = arrowSegments(map.fields, map.spec, quantity, ARROWS_ACROSS);
    result.setAttribute('position', new Float32BufferAttribute(segments, 3));
    return result;
  }, [map, quantity]);
  useEffect(() => () => geometry.dispose(), [geometry]);
  return (
    <SliceFrame spec={map.spec} origin={origin}>
      <lineSegments geometry={geometry} renderOrder={2}>
        <lineBasicMaterial color={ARROW_COLOUR} transparent opacity={0.75} depthTest={false} />
      </lineSegments>
    </SliceFrame>
  );
}
