import type { PresetName, ScenarioPath } from '../../src/io/scenario';
import { formatSI } from '../format/siFormat';
import { useAppState } from '../hooks/useAppState';
import { startPathImport } from '../io/pathImport';
import { withPath } from '../scenario/chargeEdits';
import { PRESET_FORMS, presetPath } from '../scenario/presetScenes';
import { observationSpan, suggestedRate } from '../scenario/timeSpan';
import { appStore } from '../store/appStore';
import { selectSliceSpec } from '../store/sliceSpecOf';
import { defaultExpressionPath, ExpressionEditor } from './ExpressionEditor';
import { FilePicker } from './fields/FilePicker';
import { PresetEditor } from './PresetEditor';
import { SketchEditor } from './SketchEditor';

type PathKind = ScenarioPath['kind'];

const KIND_LABELS: Record<PathKind, string> = {
  preset: 'Preset motion',
  sketch: 'Drawn path',
  expression: 'Formulas x(t), y(t), z(t)',
  samples: 'Imported samples',
};

/** Opens a preset with its own sensible view and time, as one undoable edit. */
export function applyPreset(
  index: number,
  preset: PresetName,
  params: Record<string, number>,
): string | null {
  const state = appStore.getState();
  if (state.scenario === null) return 'no scenario is open';
  const problem = state.editCharges(
    withPath(state.scenario.charges, index, presetPath(preset, params)),
    `choose the ${PRESET_FORMS[preset].title.toLowerCase()} preset`,
  );
  if (problem !== null) return problem;
  const { view } = PRESET_FORMS[preset].scene(params);
  state.showView({ ...view, resolution: state.resolution });
  state.setTime(view.time);
  const span = observationSpan(appStore.getState().charges, selectSliceSpec(appStore.getState()));
  if (span !== null) state.setRate(suggestedRate(span));
  return null;
}

/** How the selected charge moves: a preset, a drawn path, formulas, or imported samples. */
export function PathEditor({ index }: { index: number }) {
  const scenario = useAppState((s) => s.scenario);
  if (scenario === null) return null;
  const path = scenario.charges[index].path;

  const changeKind = (kind: PathKind) => {
    if (kind === path.kind) return;
    if (kind === 'preset') applyPreset(index, 'circularOrbit', PRESET_FORMS.circularOrbit.defaults);
    else if (kind === 'expression') {
      const state = appStore.getState();
      if (state.scenario)
        state.editCharges(
          withPath(state.scenario.charges, index, defaultExpressionPath()),
          'write formulas for a path',
        );
    } else if (kind === 'sketch') appStore.getState().setTool('sketch');
  };

  return (
    <div className="path-editor">
      <label className="field-row">
        <span>Path</span>
        <select
          aria-label="How the charge moves"
          value={path.kind}
          onChange={(event) => changeKind(event.currentTarget.value as PathKind)}
        >
          {(Object.keys(KIND_LABELS) as PathKind[])
            .filter((kind) => kind !== 'samples' || path.kind === 'samples')
            .map((kind) => (
              <option key={kind} value={kind}>
                {KIND_LABELS[kind]}
              </option>
            ))}
        </select>
      </label>
      {path.kind === 'preset' && <PresetEditor index={index} path={path} />}
      {path.kind === 'sketch' && <SketchEditor index={index} path={path} />}
      {path.kind === 'expression' && <ExpressionEditor index={index} path={path} />}
      {path.kind === 'samples' && (
        <p className="muted">
          {path.t.length.toLocaleString('en')} samples from {formatSI(path.t[0], 's', 4)} to{' '}
          {formatSI(path.t[path.t.length - 1], 's', 4)}, as imported.
        </p>
      )}
      <FilePicker
        label="Import a path from CSV…"
        accept=".csv,.txt,.dat,text/csv,text/plain"
        testId="import-path"
        className="link-button"
        onFile={startPathImport}
      />
    </div>
  );
}
