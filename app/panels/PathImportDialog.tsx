import { useEffect, useRef } from 'react';
import { type TrajectorySummary, unitsMismatch } from '../../src/io/trajectoryImport';
import {
  isLengthUnit,
  isTimeUnit,
  LENGTH_UNITS,
  TIME_UNITS,
  type TrajectoryUnits,
} from '../../src/io/trajectoryUnits';
import { formatSI } from '../format/siFormat';
import { useAppState } from '../hooks/useAppState';
import { changeImportUnits, closePathImport, takeImportedPath } from '../io/pathImport';
import { appStore } from '../store/appStore';

/** The symbols offered (the ASCII spellings 'um' and 'us' are for the command line). */
const LENGTH_CHOICES = Object.keys(LENGTH_UNITS).filter((unit) => unit !== 'um');
const TIME_CHOICES = Object.keys(TIME_UNITS).filter((unit) => unit !== 'us');

/** The preview of a trajectory file: its units, what it holds, and where it goes. */
export function PathImportDialog() {
  const pending = useAppState((s) => s.pathImport);
  const label = useAppState((s) => s.scenario?.charges[s.selectedCharge]?.label ?? 'the charge');
  const first = useRef<HTMLSelectElement>(null);
  const open = pending !== null;
  useEffect(() => {
    if (open) first.current?.focus();
  }, [open]);
  if (pending === null) return null;
  const close = closePathImport;
  const take = (mode: 'replace' | 'add') => {
    const problem = takeImportedPath(mode);
    if (problem !== null)
      appStore.getState().updatePathImport({ status: 'failed', error: problem });
  };
  const { units } = pending;
  return (
    <div className="dialog-backdrop">
      <div
        className="dialog"
        role="dialog"
        aria-modal="true"
        aria-labelledby="path-import-title"
        onKeyDown={(event) => {
          if (event.key === 'Escape') close();
        }}
      >
        <h2 id="path-import-title" className="panel-title">
          Import a path from {pending.name}
        </h2>
        <p className="muted">
          Columns t, x, y, z; velocities as vx, vy, vz or as βγ in bgx, bgy, bgz; accelerations ax,
          ay, az: the format of <code>conecast fields --trajectory</code>.
        </p>
        <div className="dialog-units">
          <label className="inline-choice">
            Lengths in
            <select
              ref={first}
              value={units.length}
              onChange={(event) => {
                const length = event.currentTarget.value;
                if (isLengthUnit(length)) changeImportUnits({ ...units, length });
              }}
            >
              {LENGTH_CHOICES.map((unit) => (
                <option key={unit}>{unit}</option>
              ))}
            </select>
          </label>
          <label className="inline-choice">
            times in
            <select
              value={units.time}
              onChange={(event) => {
                const time = event.currentTarget.value;
                if (isTimeUnit(time)) changeImportUnits({ ...units, time });
              }}
            >
              {TIME_CHOICES.map((unit) => (
                <option key={unit}>{unit}</option>
              ))}
            </select>
          </label>
          <span className="muted">
            (velocities in {units.length}/{units.time}, accelerations in {units.length}/{units.time}
            ²)
          </span>
        </div>
        {pending.status === 'reading' && (
          <p role="status" className="muted">
            Reading {pending.name}…
          </p>
        )}
        {pending.status === 'failed' && (
          <p role="alert" className="scenario-error" data-testid="path-import-error">
            {pending.error}
          </p>
        )}
        {pending.status === 'ready' && pending.result && (
          <ImportSummary summary={pending.result.summary} units={units} />
        )}
        <label className="inline-choice">
          <input
            type="checkbox"
            checked={pending.fitView}
            onChange={(event) =>
              appStore.getState().updatePathImport({ fitView: event.currentTarget.checked })
            }
          />
          Fit the slice and time to this path
        </label>
        <div className="button-row">
          <button
            type="button"
            disabled={pending.status !== 'ready'}
            onClick={() => take('replace')}
          >
            Use as the path of {label}
          </button>
          <button type="button" disabled={pending.status !== 'ready'} onClick={() => take('add')}>
            Add as a new charge
          </button>
          <button type="button" onClick={close}>
            Cancel
          </button>
        </div>
      </div>
    </div>
  );
}

const VELOCITY_SOURCES: Record<TrajectorySummary['velocity'], string> = {
  velocity: 'given (vx, vy, vz)',
  momentum: 'from βγ (bgx, bgy, bgz)',
  none: 'from a spline through the positions',
};

/** The unit a column is read in: the chosen length and time units, or 1 for βγ. */
function columnUnit(name: string, units: TrajectoryUnits): string {
  if (name === 't') return units.time;
  if (name.startsWith('bg')) return '1';
  if (name.startsWith('v')) return `${units.length}/${units.time}`;
  if (name.startsWith('a')) return `${units.length}/${units.time}²`;
  return units.length;
}

function ImportSummary({ summary, units }: { summary: TrajectorySummary; units: TrajectoryUnits }) {
  const [t0, t1] = summary.timeSpan;
  const extent = (k: number) =>
    `${formatSI(summary.min[k], 'm', 4)} to ${formatSI(summary.max[k], 'm', 4)}`;
  const rows: [string, string][] = [
    ['Samples', summary.rows.toLocaleString('en')],
    ['Time', `${formatSI(t0, 's', 4)} to ${formatSI(t1, 's', 4)}`],
    ['x', extent(0)],
    ['y', extent(1)],
    ['z', extent(2)],
    [
      'Velocity',
      `${VELOCITY_SOURCES[summary.velocity]}; accelerations ${summary.accelerations ? 'given' : 'from a spline'}`,
    ],
    ['Fastest', `β = ${summary.maxBeta.toPrecision(10)}, γ = ${summary.maxGamma.toPrecision(6)}`],
  ];
  // Velocities are held in m/s: near c their doubles resolve 1 − β only to about 2⁻⁵³.
  const betaResolution = 1.1e-16 * 2 * summary.maxGamma * summary.maxGamma;
  const mismatch = unitsMismatch(summary);
  return (
    <div className="import-summary" data-testid="path-import-summary">
      {betaResolution > 1e-4 && (
        <p className="field-problem" role="alert">
          γ reaches {summary.maxGamma.toPrecision(3)}: velocities in double precision resolve 1 − β
          here only to {(100 * betaResolution).toPrecision(2)} %, so fields straight ahead of the
          charge are that uncertain.
        </p>
      )}
      {mismatch && (
        <p className="field-problem" role="alert">
          Check the units: {mismatch}.
        </p>
      )}
      <dl className="summary-list">
        {rows.map(([term, value]) => (
          <div key={term} className="summary-pair">
            <dt>{term}</dt>
            <dd>{value}</dd>
          </div>
        ))}
      </dl>
      <table className="import-rows">
        <caption className="muted">First rows as written in the file</caption>
        <thead>
          <tr>
            {summary.names.map((name) => (
              <th key={name} scope="col">
                {name} <span className="unit">({columnUnit(name, units)})</span>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {summary.firstRows.map((row, r) => (
            // biome-ignore lint/suspicious/noArrayIndexKey: rows are fixed for one reading
            <tr key={r}>
              {row.map((value, c) => (
                // biome-ignore lint/suspicious/noArrayIndexKey: columns are fixed for one reading
                <td key={c}>{value.toPrecision(6)}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
