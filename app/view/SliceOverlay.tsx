import { type KeyboardEvent, type PointerEvent, useEffect, useRef, useState } from 'react';
import type { SliceSpec } from '../../src/engine/sliceSpec';
import { SketchError, strokeToControls } from '../../src/path/sketchPath';
import { useAppState } from '../hooks/useAppState';
import { useElementSize } from '../hooks/useElementSize';
import { sketchedPath, withPath } from '../scenario/chargeEdits';
import { appStore } from '../store/appStore';
import { EditHandles } from './EditHandles';
import { fitScale, pixelToSlice, sliceToWorld } from './viewGeometry';

type Gesture =
  | { kind: 'pan' | 'orbit' | 'place'; x: number; y: number; moved: boolean }
  | { kind: 'sketch'; points: [number, number][] };

/** Pointer travel, CSS pixels, below which a press counts as a click. */
const CLICK_SLOP = 4;
/** Zoom factor per wheel notch. */
const WHEEL_ZOOM = 1.2;

/**
 * Everything the pointer does on the slice: pan and zoom (2D) or orbit (3D), draw a path,
 * place probes; and the handles of probes and control points.
 */
export function SliceOverlay({ spec }: { spec: SliceSpec }) {
  const ref = useRef<HTMLDivElement>(null);
  const [width, height] = useElementSize(ref);
  const tool = useAppState((s) => s.tool);
  const mode = useAppState((s) => s.viewMode);
  const [gesture, setGesture] = useState<Gesture | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const specRef = useRef(spec);
  specRef.current = spec;

  // React's wheel listener is passive, so zooming without scrolling the page needs our own.
  useEffect(() => {
    const element = ref.current;
    if (element === null) return;
    const onWheel = (event: WheelEvent) => {
      event.preventDefault();
      const factor = event.deltaY > 0 ? WHEEL_ZOOM : 1 / WHEEL_ZOOM;
      const state = appStore.getState();
      if (state.viewMode === '3d') {
        state.setOrbit({ distance: Math.min(20, Math.max(0.3, state.orbit.distance * factor)) });
        return;
      }
      const rect = element.getBoundingClientRect();
      const [a, b] = pixelToSlice(
        specRef.current,
        event.clientX - rect.left,
        event.clientY - rect.top,
        rect.width,
        rect.height,
      );
      state.zoomAbout(factor, a, b);
    };
    element.addEventListener('wheel', onWheel, { passive: false });
    return () => element.removeEventListener('wheel', onWheel);
  }, []);

  const local = (event: PointerEvent<HTMLDivElement>): [number, number] => {
    const rect = event.currentTarget.getBoundingClientRect();
    return [event.clientX - rect.left, event.clientY - rect.top];
  };

  const onPointerDown = (event: PointerEvent<HTMLDivElement>) => {
    if (event.button !== 0) return;
    event.currentTarget.setPointerCapture(event.pointerId);
    setMessage(null);
    const [x, y] = local(event);
    if (mode === '3d') setGesture({ kind: 'orbit', x, y, moved: false });
    else if (tool === 'sketch')
      setGesture({ kind: 'sketch', points: [pixelToSlice(spec, x, y, width, height)] });
    else setGesture({ kind: tool === 'probe' ? 'place' : 'pan', x, y, moved: false });
  };

  const onPointerMove = (event: PointerEvent<HTMLDivElement>) => {
    if (gesture === null) return;
    const [x, y] = local(event);
    const state = appStore.getState();
    if (gesture.kind === 'sketch') {
      const point = pixelToSlice(spec, x, y, width, height);
      const last = gesture.points[gesture.points.length - 1];
      const scale = fitScale(spec, width, height);
      if (Math.hypot(point[0] - last[0], point[1] - last[1]) * scale >= 2)
        setGesture({ kind: 'sketch', points: [...gesture.points, point] });
      return;
    }
    const dx = x - gesture.x;
    const dy = y - gesture.y;
    const moved = gesture.moved || Math.hypot(dx, dy) > CLICK_SLOP;
    if (gesture.kind === 'pan' && moved) {
      const scale = fitScale(spec, width, height);
      state.panBy(-dx / scale, dy / scale);
    } else if (gesture.kind === 'orbit' && moved) {
      const { azimuth, elevation } = state.orbit;
      state.setOrbit({
        azimuth: azimuth - dx * 0.01,
        elevation: Math.min(1.55, Math.max(-1.55, elevation - dy * 0.01)),
      });
    }
    setGesture({
      ...gesture,
      x: gesture.kind === 'place' ? gesture.x : x,
      y: gesture.kind === 'place' ? gesture.y : y,
      moved,
    });
  };

  const onPointerUp = (event: PointerEvent<HTMLDivElement>) => {
    if (gesture === null) return;
    setGesture(null);
    if (gesture.kind === 'sketch') finishSketch(gesture.points);
    else if (gesture.kind === 'place' && !gesture.moved) {
      const [a, b] = pixelToSlice(spec, gesture.x, gesture.y, width, height);
      appStore.getState().addProbe(sliceToWorld(spec, a, b));
    }
    if (event.currentTarget.hasPointerCapture(event.pointerId))
      event.currentTarget.releasePointerCapture(event.pointerId);
  };

  const finishSketch = (points: [number, number][]) => {
    const state = appStore.getState();
    if (state.scenario === null) return;
    let controls: ReturnType<typeof strokeToControls>;
    try {
      controls = strokeToControls(points.map(([a, b]) => sliceToWorld(spec, a, b)));
    } catch (error) {
      if (error instanceof SketchError) {
        setMessage(`Sketch not used: ${error.message}. Press and drag to draw a longer path.`);
        return;
      }
      throw error;
    }
    const index = state.selectedCharge;
    const path = sketchedPath(controls, state.sketchSpeed);
    const problem = state.editCharges(
      withPath(state.scenario.charges, index, path),
      'sketch a path',
    );
    if (problem !== null) {
      setMessage(`Sketch not used: ${problem}`);
      return;
    }
    const [, end] = appStore.getState().charges[index].path.timeSpan;
    state.setTime(end);
  };

  // The keyboard's way round the view: arrows pan (or orbit in 3D), + and − zoom.
  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    if (event.target !== event.currentTarget) return;
    const state = appStore.getState();
    const step = event.shiftKey ? 0.25 : 0.05;
    const moves: Record<string, [number, number]> = {
      ArrowLeft: [-1, 0],
      ArrowRight: [1, 0],
      ArrowUp: [0, 1],
      ArrowDown: [0, -1],
    };
    const move = moves[event.key];
    if (move) {
      event.preventDefault();
      if (mode === '3d') {
        const { azimuth, elevation } = state.orbit;
        state.setOrbit({
          azimuth: azimuth + move[0] * step * 2,
          elevation: Math.min(1.55, Math.max(-1.55, elevation + move[1] * step * 2)),
        });
      } else state.panBy(move[0] * step * spec.width, move[1] * step * spec.height);
    } else if (event.key === '+' || event.key === '=' || event.key === '-') {
      event.preventDefault();
      const factor = event.key === '-' ? WHEEL_ZOOM : 1 / WHEEL_ZOOM;
      if (mode === '3d')
        state.setOrbit({ distance: Math.min(20, Math.max(0.3, state.orbit.distance * factor)) });
      else state.zoomAbout(factor, 0, 0);
    }
  };

  const sketchPoints =
    gesture?.kind === 'sketch'
      ? gesture.points
          .map(([a, b]) => {
            const scale = fitScale(spec, width, height);
            return `${width / 2 + a * scale},${height / 2 - b * scale}`;
          })
          .join(' ')
      : null;

  return (
    <div
      ref={ref}
      className={`slice-overlay tool-${mode === '3d' ? 'orbit' : tool}`}
      data-testid="slice-overlay"
      role="application"
      // biome-ignore lint/a11y/noNoninteractiveTabindex: the slice takes focus so the keyboard can pan and zoom it
      tabIndex={0}
      aria-label={
        mode === '3d'
          ? 'Slice in 3D: arrow keys orbit, + and − move closer or further'
          : 'Slice: arrow keys pan, + and − zoom; Tab reaches probes and control points'
      }
      onKeyDown={onKeyDown}
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={onPointerUp}
      onPointerCancel={() => setGesture(null)}
    >
      {sketchPoints !== null && (
        <svg className="sketch-stroke" width={width} height={height} aria-hidden="true">
          <polyline points={sketchPoints} />
        </svg>
      )}
      {mode === '2d' && width > 0 && <EditHandles spec={spec} width={width} height={height} />}
      {message && (
        <p className="overlay-message" role="alert">
          {message}
        </p>
      )}
    </div>
  );
}
