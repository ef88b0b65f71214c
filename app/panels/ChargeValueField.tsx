import { useAppState } from '../hooks/useAppState';
import { NAMED_CHARGES } from '../scenario/particles';
import { NumberField } from './fields/NumberField';

/** The charge of one particle: electron, proton or a value in coulombs. */
export function ChargeValueField({ index }: { index: number }) {
  const scenario = useAppState((s) => s.scenario);
  const editCharges = useAppState((s) => s.editCharges);
  if (scenario === null) return null;
  const entry = scenario.charges[index];
  const named = NAMED_CHARGES.find((candidate) => candidate.charge === entry.charge);
  const setCharge = (charge: number, label = entry.label) =>
    editCharges(
      scenario.charges.map((c, k) => (k === index ? { ...c, charge, label } : c)),
      'change a charge',
    );

  return (
    <div className="charge-value">
      <label className="field-row">
        <span>Particle</span>
        <select
          aria-label="Particle"
          value={named?.name ?? 'custom'}
          onChange={(event) => {
            const choice = NAMED_CHARGES.find((c) => c.name === event.currentTarget.value);
            if (choice) setCharge(choice.charge, choice.name);
          }}
        >
          {NAMED_CHARGES.map((choice) => (
            <option key={choice.name} value={choice.name}>
              {choice.name}
            </option>
          ))}
          <option value="custom">other charge (C)</option>
        </select>
      </label>
      <NumberField
        label="Charge q"
        value={entry.charge}
        units={[{ symbol: 'C', factor: 1 }]}
        check={(q) => (q === 0 ? 'a charge of 0 C has no field' : null)}
        onCommit={(q) => setCharge(q, NAMED_CHARGES.find((c) => c.charge === q)?.name ?? 'charge')}
      />
    </div>
  );
}
