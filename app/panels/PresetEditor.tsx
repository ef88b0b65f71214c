import type { PresetName, ScenarioPath } from '../../src/io/scenario';
import {
  ACCELERATION_UNITS,
  ANGLE_UNITS,
  FIELD_UNITS,
  FREQUENCY_UNITS,
  LENGTH_UNITS,
  PLAIN_NUMBER,
  TIME_UNITS,
  type UnitChoice,
} from '../format/units';
import { useAppState } from '../hooks/useAppState';
import { withPath } from '../scenario/chargeEdits';
import {
  bendingField,
  orbitRadius,
  undulatorField,
  undulatorStrength,
} from '../scenario/fieldStrength';
import { massOf } from '../scenario/particles';
import { type ParamKind, PRESET_FORMS } from '../scenario/presetScenes';
import { NumberField } from './fields/NumberField';
import { SpeedField } from './fields/SpeedField';
import { applyPreset } from './PathEditor';

type PresetPath = Extract<ScenarioPath, { kind: 'preset' }>;

const UNITS: Record<Exclude<ParamKind, 'speed'>, readonly UnitChoice[]> = {
  length: LENGTH_UNITS,
  time: TIME_UNITS,
  frequency: FREQUENCY_UNITS,
  acceleration: ACCELERATION_UNITS,
  angle: ANGLE_UNITS,
  gamma: PLAIN_NUMBER,
  number: PLAIN_NUMBER,
};

/** A preset's parameters, each applied as it is committed; refusals name the parameter. */
export function PresetEditor({ index, path }: { index: number; path: PresetPath }) {
  const scenario = useAppState((s) => s.scenario);
  const editCharges = useAppState((s) => s.editCharges);
  const form = PRESET_FORMS[path.preset];
  const charge = scenario?.charges[index].charge ?? 0;
  // Field strengths need the mass, known only for the particles offered by name.
  const mass = massOf(charge);
  const params = path.params as Record<string, number>;

  const edit = (change: Partial<PresetPath>, label: string) => {
    if (scenario === null) return 'no scenario is open';
    const next = { ...path, ...change } as ScenarioPath;
    return editCharges(withPath(scenario.charges, index, next), label);
  };
  const setParam = (key: string, value: number) =>
    edit({ params: { ...params, [key]: value } } as Partial<PresetPath>, `set ${key}`);

  return (
    <div className="preset-editor">
      <label className="field-row">
        <span>Preset</span>
        <select
          aria-label="Preset motion"
          value={path.preset}
          onChange={(event) => {
            const preset = event.currentTarget.value as PresetName;
            applyPreset(index, preset, PRESET_FORMS[preset].defaults);
          }}
        >
          {(Object.keys(PRESET_FORMS) as PresetName[]).map((name) => (
            <option key={name} value={name}>
              {PRESET_FORMS[name].title}
            </option>
          ))}
        </select>
      </label>
      <p className="muted preset-summary">{form.summary}</p>
      {form.params.map((param) =>
        param.kind === 'speed' ? (
          <SpeedField
            key={`${path.preset}-${param.key}`}
            label={param.label}
            beta={params[param.key]}
            testId={`param-${param.key}`}
            onCommit={(beta) => setParam(param.key, beta)}
          />
        ) : (
          <NumberField
            key={`${path.preset}-${param.key}`}
            label={param.label}
            value={params[param.key]}
            units={UNITS[param.kind]}
            testId={`param-${param.key}`}
            onCommit={(value) => setParam(param.key, value)}
          />
        ),
      )}
      {mass !== null && path.preset === 'circularOrbit' && (
        <NumberField
          key="bending-field"
          label="or bending field B"
          value={bendingField(params.radius, params.beta, mass, charge)}
          units={FIELD_UNITS}
          testId="param-bending-field"
          onCommit={(field) => setParam('radius', orbitRadius(field, params.beta, mass, charge))}
        />
      )}
      {mass !== null && path.preset === 'undulatorWiggle' && (
        <NumberField
          key="peak-field"
          label="or peak field B0"
          value={undulatorField(params.strength, params.period, mass, charge)}
          units={FIELD_UNITS}
          testId="param-peak-field"
          onCommit={(field) =>
            setParam('strength', undulatorStrength(field, params.period, mass, charge))
          }
        />
      )}
      <button
        type="button"
        className="link-button"
        onClick={() => applyPreset(index, path.preset, params)}
      >
        Fit the view and time to these parameters
      </button>
      <details className="sample-span">
        <summary>Sampled span</summary>
        <NumberField
          label="From"
          value={path.from}
          units={TIME_UNITS}
          onCommit={(from) => edit({ from }, 'set the sample span')}
        />
        <NumberField
          label="To"
          value={path.to}
          units={TIME_UNITS}
          onCommit={(to) => edit({ to }, 'set the sample span')}
        />
        <NumberField
          label="Samples"
          value={path.samples}
          check={(n) => (Number.isInteger(n) ? null : 'must be a whole number')}
          onCommit={(samples) => edit({ samples }, 'set the sample count')}
        />
      </details>
    </div>
  );
}
