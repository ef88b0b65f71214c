import type { SliceSpec, Triple } from '../../src/engine/sliceSpec';
import { useAppState } from '../hooks/useAppState';
import { withControl, withPath } from '../scenario/chargeEdits';
import { appStore } from '../store/appStore';
import { DragHandle } from './DragHandle';
import { toSlice } from './sliceCoordinates';
import { heightAbovePlane, pixelToSlice, sliceToPixel, sliceToWorld } from './viewGeometry';

interface EditHandlesProps {
  spec: SliceSpec;
  width: number;
  height: number;
}

/** Draggable handles for the probes and for the control points of a sketched path. */
export function EditHandles({ spec, width, height }: EditHandlesProps) {
  const probes = useAppState((s) => s.probes);
  const selectedProbe = useAppState((s) => s.selectedProbe);
  const scenario = useAppState((s) => s.scenario);
  const selectedCharge = useAppState((s) => s.selectedCharge);
  const path = scenario?.charges[selectedCharge]?.path;
  const controls = path?.kind === 'sketch' ? path.controls : [];

  const pixelOf = (point: readonly number[]) => {
    const [a, b] = toSlice(spec, point[0], point[1], point[2]);
    return sliceToPixel(spec, a, b, width, height);
  };
  // A dragged point keeps its height above the plane; only its in-plane position follows the pointer.
  const movedTo = (point: Triple, x: number, y: number): Triple => {
    const [a, b] = pixelToSlice(spec, x, y, width, height);
    return sliceToWorld(spec, a, b, heightAbovePlane(spec, point));
  };
  const nudged = (point: Triple, da: number, db: number): Triple => {
    const [a, b] = toSlice(spec, point[0], point[1], point[2]);
    return sliceToWorld(
      spec,
      a + da * spec.width,
      b + db * spec.height,
      heightAbovePlane(spec, point),
    );
  };
  const moveControl = (k: number, point: Triple, record: boolean) => {
    const state = appStore.getState();
    const current = state.scenario?.charges[selectedCharge]?.path;
    if (state.scenario === null || current === undefined) return;
    state.editCharges(
      withPath(state.scenario.charges, selectedCharge, withControl(current, k, point)),
      'move a control point',
      record,
    );
  };

  return (
    <>
      {controls.map((control, k) => {
        const [x, y] = pixelOf(control);
        const point = control as Triple;
        return (
          <DragHandle
            // biome-ignore lint/suspicious/noArrayIndexKey: control points are identified by their order
            key={k}
            x={x}
            y={y}
            className="control-handle"
            label={`Control point ${k + 1} of ${controls.length} of the sketched path`}
            onDragStart={() => appStore.getState().record('move a control point')}
            onDrag={(px, py) => moveControl(k, movedTo(point, px, py), false)}
            onNudge={(da, db) => moveControl(k, nudged(point, da, db), true)}
          />
        );
      })}
      {probes.map((probe) => {
        const [x, y] = pixelOf(probe.position);
        return (
          <DragHandle
            key={probe.id}
            x={x}
            y={y}
            className="probe-handle"
            label={`Probe ${probe.name}`}
            selected={probe.id === selectedProbe}
            onSelect={() => appStore.getState().selectProbe(probe.id)}
            onDragStart={() => appStore.getState().record('move a probe')}
            onDrag={(px, py) =>
              appStore.getState().moveProbe(probe.id, movedTo(probe.position, px, py), false)
            }
            onNudge={(da, db) =>
              appStore.getState().moveProbe(probe.id, nudged(probe.position, da, db))
            }
            onDelete={() => appStore.getState().removeProbe(probe.id)}
          />
        );
      })}
    </>
  );
}
