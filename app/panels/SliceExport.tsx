import { useState } from 'react';
import { defaultNearRadius } from '../../src/engine/computeSlice';
import { QUANTITIES, type Quantity } from '../../src/io/sliceQuantities';
import { sliceToCsv, sliceToJson, sliceToNpy } from '../../src/io/sliceWriters';
import { useAppState } from '../hooks/useAppState';
import { download, fileStem } from '../io/download';

/** The map's slice as data, through the same writers as `conecast slice`. */
export function SliceExport() {
  const map = useAppState((s) => s.fieldMap);
  const pending = useAppState((s) => s.fieldPending);
  const title = useAppState((s) => s.scenario?.title ?? 'slice');
  const [quantity, setQuantity] = useState<Quantity>('all');
  // Only a full map of the slice in view is exported, never the coarse pass.
  const ready = map !== null && !map.coarse && !pending;
  const save = (format: 'npy' | 'csv' | 'json') => {
    if (map === null) return;
    const { spec, fields } = map;
    const nearRadius = defaultNearRadius(spec);
    const stem = `${fileStem(title)}-slice`;
    if (format === 'npy') {
      const { npy, sidecar } = sliceToNpy(fields, spec, quantity, nearRadius);
      download(`${stem}.npy`, npy, 'application/octet-stream');
      download(`${stem}.npy.json`, sidecar, 'application/json');
    } else if (format === 'csv') {
      download(`${stem}.csv`, sliceToCsv(fields, spec, quantity, nearRadius), 'text/csv');
    } else {
      download(`${stem}.json`, sliceToJson(fields, spec, quantity, nearRadius), 'application/json');
    }
  };
  return (
    <div className="slice-export">
      <label className="field-row">
        <span>Export</span>
        <select
          aria-label="Quantities to export"
          value={quantity}
          onChange={(event) => setQuantity(event.currentTarget.value as Quantity)}
        >
          {(Object.keys(QUANTITIES) as Quantity[]).map((name) => (
            <option key={name} value={name}>
              {name === 'all' ? 'all components' : `${name} (x, y, z)`}
            </option>
          ))}
        </select>
      </label>
      <div className="button-row">
        {(['npy', 'csv', 'json'] as const).map((format) => (
          <button key={format} type="button" disabled={!ready} onClick={() => save(format)}>
            Save slice as .{format}
          </button>
        ))}
      </div>
      {!ready && <p className="muted">Waiting for the full map of this slice.</p>}
    </div>
  );
}
