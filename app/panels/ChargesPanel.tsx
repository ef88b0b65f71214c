import type { ScenarioCharge } from '../../src/io/scenario';
import { formatSI } from '../format/siFormat';
import { useAppState } from '../hooks/useAppState';
import { ChargeValueField } from './ChargeValueField';
import { PathEditor } from './PathEditor';

/** The charges in the scenario: pick one to edit, add one, remove one. */
export function ChargesPanel() {
  const scenario = useAppState((s) => s.scenario);
  const selected = useAppState((s) => s.selectedCharge);
  const selectCharge = useAppState((s) => s.selectCharge);
  const editCharges = useAppState((s) => s.editCharges);
  if (scenario === null) return null;
  const charges = scenario.charges;
  const charge = charges[selected];

  const addCharge = () => {
    const copy: ScenarioCharge = { ...charge, label: `${charge.label} ${charges.length + 1}` };
    if (editCharges([...charges, copy], 'add a charge') === null) selectCharge(charges.length);
  };
  const removeCharge = () => {
    editCharges(
      charges.filter((_, k) => k !== selected),
      'remove a charge',
    );
  };

  return (
    <section className="panel" aria-labelledby="charges-panel-title">
      <h2 id="charges-panel-title" className="panel-title">
        Charges
      </h2>
      <ul className="charge-list" aria-label="Charges">
        {charges.map((entry, k) => (
          // biome-ignore lint/suspicious/noArrayIndexKey: charges are identified by their order
          <li key={k}>
            <button
              type="button"
              className="charge-pick"
              aria-pressed={k === selected}
              onClick={() => selectCharge(k)}
            >
              {entry.label} <span className="muted">{formatSI(entry.charge, 'C', 4)}</span>
            </button>
          </li>
        ))}
      </ul>
      <div className="button-row">
        <button type="button" onClick={addCharge}>
          Add a charge
        </button>
        <button type="button" onClick={removeCharge} disabled={charges.length < 2}>
          Remove {charge.label}
        </button>
      </div>
      <ChargeValueField key={`charge-${selected}`} index={selected} />
      <PathEditor key={`path-${selected}`} index={selected} />
    </section>
  );
}
