import { useEffect, useId, useRef, useState } from 'react';
import { inUnit, PLAIN_NUMBER, type UnitChoice, unitFor } from '../../format/units';

interface NumberFieldProps {
  label: string;
  /** The value now in force, SI. */
  value: number;
  units?: readonly UnitChoice[];
  /** One-line reason a value (SI) cannot be used, or null. */
  check?(value: number): string | null;
  /** Applies a checked value (SI); may return a reason it was refused after all. */
  onCommit(value: number): string | null | undefined;
  testId?: string;
}

/**
 * A number typed in a unit of the user's choice, applied on Enter or when focus leaves. Text that
 * cannot be used stays in the box with the reason beside it, so nothing typed is lost.
 */
export function NumberField({
  label,
  value,
  units = PLAIN_NUMBER,
  check,
  onCommit,
  testId,
}: NumberFieldProps) {
  const id = useId();
  const [unit, setUnit] = useState(() => unitFor(value, units));
  const [text, setText] = useState(() => inUnit(value, unit));
  const [problem, setProblem] = useState<string | null>(null);
  /** Text typed and not yet applied: choosing a unit next applies it in that unit. */
  const [dirty, setDirty] = useState(false);
  const unitPicker = useRef<HTMLSelectElement>(null);

  // A value changed elsewhere (undo, another control) shows here unless the box holds a problem.
  useEffect(() => {
    if (problem === null) setText(inUnit(value, unit));
  }, [value, unit, problem]);

  const commit = (typed: string, inUnitOf: UnitChoice) => {
    setDirty(false);
    const trimmed = typed.trim();
    const number = trimmed === '' ? Number.NaN : Number(trimmed);
    if (!Number.isFinite(number)) {
      setProblem(`"${typed}" is not a number`);
      return;
    }
    const si = number * inUnitOf.factor;
    // Leaving a box unchanged is not an edit: no new map, no undo step.
    if (si === value || inUnit(value, inUnitOf) === trimmed) {
      setProblem(null);
      return;
    }
    const reason = check?.(si) ?? null;
    if (reason !== null) {
      setProblem(reason);
      return;
    }
    setProblem(onCommit(si) ?? null);
  };

  return (
    <div className="number-field">
      <label htmlFor={id}>{label}</label>
      <div className="number-field-input">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          value={text}
          data-testid={testId}
          aria-invalid={problem !== null}
          aria-describedby={problem ? `${id}-problem` : undefined}
          onChange={(event) => {
            setText(event.currentTarget.value);
            setDirty(true);
          }}
          onBlur={(event) => {
            // Typed "5", then off to pick "cm": the number waits for its unit.
            if (event.relatedTarget !== null && event.relatedTarget === unitPicker.current) return;
            commit(text, unit);
          }}
          onKeyDown={(event) => {
            if (event.key === 'Enter') commit(text, unit);
            if (event.key === 'Escape') {
              setProblem(null);
              setDirty(false);
              setText(inUnit(value, unit));
            }
          }}
        />
        {units.length > 1 ? (
          <select
            ref={unitPicker}
            aria-label={`Unit of ${label}`}
            value={unit.symbol}
            onChange={(event) => {
              const next = units.find((choice) => choice.symbol === event.currentTarget.value);
              if (next === undefined) return;
              setUnit(next);
              // A number typed just before is meant in the unit now chosen.
              if (dirty) commit(text, next);
              else if (problem === null) setText(inUnit(value, next));
            }}
            onBlur={() => {
              if (dirty) commit(text, unit);
            }}
          >
            {units.map((choice) => (
              <option key={choice.symbol} value={choice.symbol}>
                {choice.symbol}
              </option>
            ))}
          </select>
        ) : (
          units[0].symbol && <span className="unit">{units[0].symbol}</span>
        )}
      </div>
      {problem && (
        <p id={`${id}-problem`} className="field-problem" role="alert">
          {label}: {problem}
        </p>
      )}
    </div>
  );
}
