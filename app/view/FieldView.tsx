import { Canvas } from '@react-three/fiber';
import { type CSSProperties, useMemo, useState } from 'react';
import type { DisplayedMap } from '../field/displayedMap';
import { formatSI } from '../format/siFormat';
import { useAppState } from '../hooks/useAppState';
import { useDisplayedMap } from '../hooks/useDisplayedMap';
import { useSliceGeometry } from '../hooks/useSliceSpec';
import { appStore } from '../store/appStore';
import { FieldScene } from './FieldScene';
import { ScaleBar } from './ScaleBar';
import { SliceAxes } from './SliceAxes';
import { SliceOverlay } from './SliceOverlay';
import { axisName } from './sliceCoordinates';
import { ViewErrorBoundary } from './ViewErrorBoundary';

/**
 * The slice, its map and everything drawn over it. `data-ready` turns "true" once the latest
 * full map of the slice in view has been drawn, so tests and scripts can wait on it.
 */
export function FieldView() {
  const spec = useSliceGeometry();
  const shown = useDisplayedMap();
  const pending = useAppState((s) => s.fieldPending);
  const mode = useAppState((s) => s.viewMode);
  const [drawn, setDrawn] = useState({ id: 0, time: Number.NaN, mode });
  const [onDrawn] = useState(
    () => (id: number, time: number) => setDrawn({ id, time, mode: appStore.getState().viewMode }),
  );
  const map = shown?.map ?? null;
  const ready =
    map !== null && !pending && !map.coarse && drawn.id === map.id && drawn.mode === mode;
  const aspect = spec.width / spec.height;
  // The same element while the scene's inputs stand still: reporting a drawn frame must not
  // make the canvas render its scene again.
  const canvas = useMemo(
    () => (
      <ViewErrorBoundary>
        <Canvas
          key={mode}
          orthographic={mode === '2d'}
          flat
          frameloop="demand"
          dpr={[1, 2]}
          gl={{ preserveDrawingBuffer: true, antialias: false }}
        >
          <color attach="background" args={['#0c0e12']} />
          <FieldScene spec={spec} shown={shown} onDrawn={onDrawn} />
        </Canvas>
      </ViewErrorBoundary>
    ),
    [mode, spec, shown, onDrawn],
  );

  return (
    <div className="field-frame" style={{ '--slice-aspect': aspect } as CSSProperties}>
      <div className="field-plot">
        <section
          className="field-view"
          data-testid="field-view"
          data-ready={ready ? 'true' : 'false'}
          data-map-id={map?.id ?? 0}
          data-map-time={map?.spec.time ?? ''}
          data-drawn-time={Number.isNaN(drawn.time) ? '' : drawn.time}
          aria-label="Field view"
          aria-busy={!ready}
        >
          <div className="field-canvas" role="img" aria-label={describeMap(shown)}>
            {canvas}
          </div>
          <SliceOverlay spec={spec} />
          {mode === '2d' && <ScaleBar spec={spec} />}
          {!ready && (
            <div className="field-status" aria-live="polite">
              {map ? 'Updating…' : pending ? 'Computing field map…' : 'No scenario open'}
            </div>
          )}
        </section>
        {mode === '2d' && <SliceAxes spec={spec} />}
      </div>
    </div>
  );
}

function describeMap(shown: DisplayedMap | null): string {
  if (shown === null) return 'Field map, not computed yet';
  const { map, quantity, scale } = shown;
  const plane = `${axisName(map.spec.u)}${axisName(map.spec.v)}`;
  const range = scale
    ? ` from ${formatSI(scale.min, quantity.unit)} to ${formatSI(scale.max, quantity.unit)}`
    : '';
  return `Map of ${quantity.label} on the ${plane} slice at t = ${formatSI(map.spec.time, 's', 4)}, ${scale?.scale ?? 'no'} colour scale${range}`;
}
