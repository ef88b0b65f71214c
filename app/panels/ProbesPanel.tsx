import { useMemo } from 'react';
import { probeReadout } from '../../src/analysis/probeReadout';
import type { Triple } from '../../src/engine/sliceSpec';
import { LENGTH_UNITS } from '../format/units';
import { useAppState } from '../hooks/useAppState';
import type { Probe } from '../store/probesSlice';
import { NumberField } from './fields/NumberField';
import { ProbeTable } from './ProbeTable';

const AXES = ['x', 'y', 'z'] as const;

/** The probes: pick one, name it, place it exactly, delete it, and read the field there. */
export function ProbesPanel() {
  const probes = useAppState((s) => s.probes);
  const selected = useAppState((s) => s.selectedProbe);
  const selectProbe = useAppState((s) => s.selectProbe);
  const addProbe = useAppState((s) => s.addProbe);
  const center = useAppState((s) => s.center);
  const probe = probes.find((candidate) => candidate.id === selected) ?? null;

  return (
    <section className="panel" aria-labelledby="probes-panel-title">
      <h2 id="probes-panel-title" className="panel-title">
        Probes
      </h2>
      {probes.length === 0 ? (
        <p className="muted">
          None yet. Choose <strong>Place probe</strong> (P) and click on the map.
        </p>
      ) : (
        <ul className="probe-list" aria-label="Probes">
          {probes.map((entry) => (
            <li key={entry.id}>
              <button
                type="button"
                className="probe-pick"
                aria-pressed={entry.id === selected}
                onClick={() => selectProbe(entry.id)}
              >
                {entry.name}
              </button>
            </li>
          ))}
        </ul>
      )}
      <div className="button-row">
        <button type="button" onClick={() => addProbe(center)}>
          Add a probe at the slice centre
        </button>
      </div>
      {probe && <ProbeDetails probe={probe} />}
    </section>
  );
}

function ProbeDetails({ probe }: { probe: Probe }) {
  const renameProbe = useAppState((s) => s.renameProbe);
  const moveProbe = useAppState((s) => s.moveProbe);
  const removeProbe = useAppState((s) => s.removeProbe);
  const charges = useAppState((s) => s.charges);
  const time = useAppState((s) => s.time);
  const readout = useMemo(
    () => (charges.length ? probeReadout(charges, probe.position, time) : null),
    [charges, probe.position, time],
  );

  return (
    <div
      className="probe-details"
      data-testid="probe-details"
      data-position={probe.position.join(',')}
      data-time={String(time)}
    >
      <div className="probe-head">
        <label className="field-row">
          <span>Name</span>
          <input
            key={probe.id + probe.name}
            defaultValue={probe.name}
            aria-label="Probe name"
            onBlur={(event) => renameProbe(probe.id, event.currentTarget.value)}
            onKeyDown={(event) => {
              if (event.key === 'Enter') renameProbe(probe.id, event.currentTarget.value);
            }}
          />
        </label>
        <button
          type="button"
          className="danger"
          aria-label={`Delete probe ${probe.name}`}
          onClick={() => removeProbe(probe.id)}
        >
          Delete
        </button>
      </div>
      <div className="probe-position">
        {AXES.map((axis, k) => (
          <NumberField
            key={axis}
            label={`Probe ${axis}`}
            value={probe.position[k]}
            units={LENGTH_UNITS}
            testId={`probe-${axis}`}
            onCommit={(value) => {
              const next = [...probe.position] as Triple;
              next[k] = value;
              moveProbe(probe.id, next);
              return null;
            }}
          />
        ))}
      </div>
      {readout && <ProbeTable readout={readout} time={time} />}
    </div>
  );
}
