import { Canvas } from '@react-three/fiber';
import { type CSSProperties, useState } from 'react';
import { formatSI } from '../format/siFormat';
import type { FieldMapState } from '../hooks/useFieldMap';
import { ChargeMarkers } from './ChargeMarkers';
import { ChargePaths } from './ChargePaths';
import { FieldPlane } from './FieldPlane';
import { SliceAxes } from './SliceAxes';
import { SliceCamera } from './SliceCamera';
import { axisName } from './sliceCoordinates';
import { ViewErrorBoundary } from './ViewErrorBoundary';

/**
 * The slice seen from above: |E| map, charge paths and present positions. `data-ready` turns
 * "true" once the latest map has been drawn, so tests and scripts can wait on it.
 */
export function FieldView({ state }: { state: FieldMapState }) {
  const { map, pending } = state;
  const [drawnId, setDrawnId] = useState(0);
  const ready = map !== null && !pending && drawnId === map.id;
  const spec = map?.spec;
  const aspect = spec ? spec.width / spec.height : 1;
  const label = map
    ? `Map of the electric field magnitude on the ${axisName(map.spec.u)}${axisName(map.spec.v)} slice at t = ${formatSI(map.spec.time, 's', 4)}, log colour scale` +
      (map.colourRange
        ? ` from ${formatSI(map.colourRange.min, 'V/m')} to ${formatSI(map.colourRange.max, 'V/m')}`
        : '')
    : 'Field map, not computed yet';

  return (
    <div className="field-frame" style={{ '--slice-aspect': aspect } as CSSProperties}>
      <div className="field-plot">
        <div
          className="field-view"
          data-testid="field-view"
          data-ready={ready ? 'true' : 'false'}
          data-map-id={map?.id ?? 0}
          role="img"
          aria-label={label}
          aria-busy={!ready}
        >
          <ViewErrorBoundary>
            <Canvas
              orthographic
              flat
              frameloop="demand"
              dpr={[1, 2]}
              camera={{ position: [0, 0, 1], near: 0.001, far: 10, zoom: 1 }}
              gl={{ preserveDrawingBuffer: true, antialias: true }}
            >
              <color attach="background" args={['#0c0e12']} />
              {map && spec && (
                <>
                  <SliceCamera width={spec.width} height={spec.height} />
                  <FieldPlane map={map} onDrawn={setDrawnId} />
                  <ChargePaths spec={spec} charges={map.charges} />
                  <ChargeMarkers spec={spec} charges={map.charges} />
                </>
              )}
            </Canvas>
          </ViewErrorBoundary>
          {!ready && (
            <div className="field-status">
              {map ? 'Updating…' : pending ? 'Computing field map…' : 'No scenario open'}
            </div>
          )}
        </div>
        {spec && <SliceAxes spec={spec} />}
      </div>
    </div>
  );
}
