import type { PlaneName } from '../../src/engine/sliceSpec';
import { rangeProblem } from '../field/colourScale';
import { FIELD_COMPONENTS, type MapQuantity } from '../field/mapQuantity';
import { LENGTH_UNITS } from '../format/units';
import { useAppState } from '../hooks/useAppState';
import { useDisplayedMap } from '../hooks/useDisplayedMap';
import { NORMAL_AXIS } from '../store/viewSlice';
import { NumberField } from './fields/NumberField';
import { ShellNote } from './ShellNote';

const QUANTITIES: { value: MapQuantity; label: string }[] = [
  { value: 'E', label: '|E|, electric field' },
  { value: 'B', label: '|B|, magnetic field' },
  { value: 'S', label: '|S|, Poynting vector' },
  { value: 'Erad', label: '|E_rad|, radiation part only' },
  { value: 'component', label: 'one component (signed)' },
  { value: 'retardedTime', label: 't_ret, retarded time' },
];
const RESOLUTIONS = [64, 128, 160, 256, 384, 512];
const AXES = ['x', 'y', 'z'] as const;

/** What the map shows and how: quantity, scale, range, overlays, and where the slice lies. */
export function MapPanel() {
  const display = useAppState((s) => s.display);
  const setDisplay = useAppState((s) => s.setDisplay);
  const arrows = useAppState((s) => s.arrows);
  const setArrows = useAppState((s) => s.setArrows);
  const shells = useAppState((s) => s.shells);
  const setShells = useAppState((s) => s.setShells);
  const plane = useAppState((s) => s.plane);
  const setPlane = useAppState((s) => s.setPlane);
  const center = useAppState((s) => s.center);
  const setOffset = useAppState((s) => s.setOffset);
  const resolution = useAppState((s) => s.resolution);
  const setResolution = useAppState((s) => s.setResolution);
  const shown = useDisplayedMap();
  const unit = shown?.quantity.unit ?? '';
  const signed = shown?.quantity.signed ?? false;
  const manual = display.range !== 'auto' ? display.range : null;
  const normalAxis = NORMAL_AXIS[plane];

  return (
    <section className="panel" aria-labelledby="map-panel-title">
      <h2 id="map-panel-title" className="panel-title">
        Map
      </h2>
      <label className="field-row">
        <span>Shows</span>
        <select
          aria-label="Shows"
          value={display.quantity}
          onChange={(event) => setDisplay({ quantity: event.currentTarget.value as MapQuantity })}
        >
          {QUANTITIES.map((entry) => (
            <option key={entry.value} value={entry.value}>
              {entry.label}
            </option>
          ))}
        </select>
      </label>
      {display.quantity === 'component' && (
        <label className="field-row">
          <span>Component</span>
          <select
            aria-label="Component"
            value={display.component}
            onChange={(event) =>
              setDisplay({ component: event.currentTarget.value as typeof display.component })
            }
          >
            {FIELD_COMPONENTS.map((name) => (
              <option key={name} value={name}>
                {name}
              </option>
            ))}
          </select>
        </label>
      )}
      <div className="field-row" role="radiogroup" aria-label="Colour scale">
        <span>Scale</span>
        {(['log', 'linear'] as const).map((scale) => (
          <label key={scale} className="inline-choice">
            <input
              type="radio"
              name="colour-scale"
              checked={display.scale === scale}
              onChange={() => setDisplay({ scale })}
            />
            {scale === 'log' ? (signed ? 'symmetric log' : 'log') : 'linear'}
          </label>
        ))}
      </div>
      <label className="inline-choice">
        <input
          type="checkbox"
          checked={manual === null}
          onChange={(event) => {
            if (event.currentTarget.checked) setDisplay({ range: 'auto' });
            else if (shown?.scale)
              setDisplay({ range: { min: shown.scale.min, max: shown.scale.max } });
          }}
        />
        Automatic range (untick to hold the present one)
      </label>
      {manual && (
        <div className="range-fields">
          <NumberField
            label={
              signed
                ? display.scale === 'log'
                  ? 'Linear below'
                  : 'Range minimum'
                : 'Range minimum'
            }
            value={manual.min}
            units={[{ symbol: unit, factor: 1 }]}
            check={(min) => rangeProblem(min, manual.max, display.scale, signed)}
            onCommit={(min) => {
              setDisplay({ range: { min, max: manual.max } });
              return null;
            }}
          />
          <NumberField
            label={signed ? 'Range ± maximum' : 'Range maximum'}
            value={manual.max}
            units={[{ symbol: unit, factor: 1 }]}
            check={(max) => rangeProblem(manual.min, max, display.scale, signed)}
            onCommit={(max) => {
              setDisplay({ range: { min: manual.min, max } });
              return null;
            }}
          />
        </div>
      )}
      <label className="field-row">
        <span>Arrows</span>
        <select
          aria-label="Arrows"
          value={arrows}
          onChange={(event) => setArrows(event.currentTarget.value as typeof arrows)}
        >
          <option value="off">none</option>
          <option value="E">direction of E</option>
          <option value="Erad">direction of E_rad</option>
          <option value="S">direction of S</option>
        </select>
      </label>
      <label className="inline-choice">
        <input
          type="checkbox"
          checked={shells}
          onChange={(event) => setShells(event.currentTarget.checked)}
        />
        Light-cone shells
      </label>
      {shells && <ShellNote />}
      <h3 className="panel-subtitle">Slice</h3>
      <label className="field-row">
        <span>Plane</span>
        <select
          aria-label="Plane"
          value={plane}
          onChange={(event) => setPlane(event.currentTarget.value as PlaneName)}
        >
          <option value="xy">xy (looking down z)</option>
          <option value="xz">xz (looking along y)</option>
          <option value="yz">yz (looking along x)</option>
        </select>
      </label>
      <NumberField
        label={`Offset: ${AXES[normalAxis]} =`}
        value={center[normalAxis]}
        units={LENGTH_UNITS}
        testId="slice-offset"
        onCommit={(offset) => {
          setOffset(offset);
          return null;
        }}
      />
      <label className="field-row">
        <span>Grid</span>
        <select
          aria-label="Grid"
          value={Math.max(...resolution)}
          onChange={(event) => setResolution(Number(event.currentTarget.value))}
        >
          {RESOLUTIONS.map((side) => (
            <option key={side} value={side}>
              {side} points across
            </option>
          ))}
        </select>
      </label>
    </section>
  );
}
