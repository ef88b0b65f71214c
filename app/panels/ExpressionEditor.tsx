import { useId, useState } from 'react';
import type { ScenarioPath } from '../../src/io/scenario';
import { TIME_UNITS } from '../format/units';
import { useAppState } from '../hooks/useAppState';
import { withPath } from '../scenario/chargeEdits';
import { NumberField } from './fields/NumberField';

type ExpressionPath = Extract<ScenarioPath, { kind: 'expression' }>;

/** An invented starting point: a charge circling at 2 cm, 1 GHz (β ≈ 0.42). */
export function defaultExpressionPath(): ExpressionPath {
  return {
    kind: 'expression',
    x: '0.02 * cos(2 * pi * 1e9 * t)',
    y: '0.02 * sin(2 * pi * 1e9 * t)',
    z: '0',
    from: 0,
    to: 3e-9,
    samples: 1201,
  };
}

const COORDINATES = ['x', 'y', 'z'] as const;

/**
 * Positions as formulas in t (s) giving metres, with pi, e and c (m/s) known. The draft is kept
 * until it is applied; a refusal names the formula and what is wrong, and loses nothing typed.
 */
export function ExpressionEditor({ index, path }: { index: number; path: ExpressionPath }) {
  const id = useId();
  const scenario = useAppState((s) => s.scenario);
  const editCharges = useAppState((s) => s.editCharges);
  const [draft, setDraft] = useState<ExpressionPath>(path);
  const [problem, setProblem] = useState<string | null>(null);

  const apply = (next: ExpressionPath) => {
    if (scenario === null) return 'no scenario is open';
    const reason = editCharges(withPath(scenario.charges, index, next), 'edit the path formulas');
    setProblem(reason);
    return reason;
  };

  return (
    <form
      className="expression-editor"
      aria-label="Path formulas"
      onSubmit={(event) => {
        event.preventDefault();
        apply(draft);
      }}
    >
      {COORDINATES.map((axis) => (
        <div key={axis} className="formula-row">
          <label htmlFor={`${id}-${axis}`}>{axis}(t) =</label>
          <input
            id={`${id}-${axis}`}
            className="formula"
            spellCheck={false}
            value={draft[axis]}
            data-testid={`formula-${axis}`}
            onChange={(event) => setDraft({ ...draft, [axis]: event.currentTarget.value })}
          />
          <span className="unit">m</span>
        </div>
      ))}
      <NumberField
        label="From"
        value={draft.from}
        units={TIME_UNITS}
        onCommit={(from) => {
          setDraft((d) => ({ ...d, from }));
          return null;
        }}
      />
      <NumberField
        label="To"
        value={draft.to}
        units={TIME_UNITS}
        onCommit={(to) => {
          setDraft((d) => ({ ...d, to }));
          return null;
        }}
      />
      <NumberField
        label="Samples"
        value={draft.samples}
        check={(n) => (Number.isInteger(n) && n >= 2 ? null : 'must be a whole number, at least 2')}
        onCommit={(samples) => {
          setDraft((d) => ({ ...d, samples }));
          return null;
        }}
      />
      <p className="muted">t in s, results in m; known: pi, e, c (m/s) and the usual functions.</p>
      <button type="submit">Apply formulas</button>
      {problem && (
        <p className="field-problem" role="alert">
          Not applied: {problem}
        </p>
      )}
    </form>
  );
}
