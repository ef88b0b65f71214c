import { useEffect, useId, useState } from 'react';

/** β below 1 and above `floor`; the message says why c is out of reach, never clamps. */
export function speedProblem(beta: number, floor = 0): string | null {
  if (!Number.isFinite(beta)) return 'is not a number';
  if (beta >= 1) return 'β must be below 1: no charge reaches the speed of light';
  if (beta <= floor) return `β must be above ${floor}`;
  return null;
}

type SpeedUnit = 'beta' | 'gamma';

/** β as typed text in the chosen form; γ from (1 − β)(1 + β), which keeps its digits near β = 1. */
function shown(beta: number, as: SpeedUnit): string {
  const value = as === 'beta' ? beta : 1 / Math.sqrt((1 - beta) * (1 + beta));
  return String(Number(value.toPrecision(12)));
}

interface SpeedFieldProps {
  label: string;
  /** β = v/c now in force. */
  beta: number;
  /** Lowest β allowed (exclusive): 0 for most, -1 for a signed speed. */
  floor?: number;
  onCommit(beta: number): string | null | undefined;
  testId?: string;
}

/** A speed typed as β = v/c or as the Lorentz factor γ, stored as β. */
export function SpeedField({ label, beta, floor = 0, onCommit, testId }: SpeedFieldProps) {
  const id = useId();
  const [unit, setUnit] = useState<SpeedUnit>('beta');
  const [text, setText] = useState(() => shown(beta, unit));
  const [problem, setProblem] = useState<string | null>(null);
  useEffect(() => {
    if (problem === null) setText(shown(beta, unit));
  }, [beta, unit, problem]);

  const commit = () => {
    const number = text.trim() === '' ? Number.NaN : Number(text);
    let next: number;
    if (unit === 'beta') next = number;
    else if (!(number >= 1)) {
      setProblem(Number.isFinite(number) ? 'γ must be at least 1' : `"${text}" is not a number`);
      return;
    } else next = Math.sqrt((number - 1) * (number + 1)) / number;
    if (!Number.isFinite(number)) {
      setProblem(`"${text}" is not a number`);
      return;
    }
    if (next === beta || text.trim() === shown(beta, unit)) {
      setProblem(null);
      return;
    }
    const reason = speedProblem(next, floor);
    setProblem(reason ?? onCommit(next) ?? null);
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
          onChange={(event) => setText(event.currentTarget.value)}
          onBlur={commit}
          onKeyDown={(event) => {
            if (event.key === 'Enter') commit();
          }}
        />
        <select
          aria-label={`Speed of ${label} given as`}
          value={unit}
          onChange={(event) => {
            const next = event.currentTarget.value as SpeedUnit;
            setUnit(next);
            setProblem(null);
            setText(shown(beta, next));
          }}
        >
          <option value="beta">β</option>
          <option value="gamma">γ</option>
        </select>
      </div>
      {problem && (
        <p className="field-problem" role="alert">
          {label}: {problem}
        </p>
      )}
    </div>
  );
}
