import type { Scenario, ScenarioPath } from '../../src/io/scenario';
import { formatSI } from '../format/siFormat';
import { type ParamKind, PRESET_FORMS } from '../scenario/presetScenes';

/** One line per charge: what it is, how it moves, and the numbers that make its path. */
export function scenarioCaption(scenario: Scenario): string[] {
  const lines = scenario.charges.map(
    (charge) =>
      `${charge.label} (${formatSI(charge.charge, 'C', 4)}): ${describePath(charge.path)}`,
  );
  if (scenario.invented) lines.push('Invented scenario, for illustration.');
  return lines;
}

/** A parameter's value with its SI unit (β, γ and K are plain numbers). */
function withUnit(value: number, kind: ParamKind): string {
  const unit = SI_UNITS[kind];
  if (unit === '') return String(Number(value.toPrecision(4)));
  return formatSI(value, unit, 4);
}

const SI_UNITS: Record<ParamKind, string> = {
  length: 'm',
  time: 's',
  frequency: 'Hz',
  acceleration: 'm/s²',
  speed: '',
  gamma: '',
  angle: 'rad',
  number: '',
};

function describePath(path: ScenarioPath): string {
  switch (path.kind) {
    case 'preset': {
      const form = PRESET_FORMS[path.preset];
      const params = path.params as Record<string, number>;
      const values = form.params.map(
        (param) =>
          `${param.kind === 'speed' ? 'β' : param.label} = ${withUnit(params[param.key], param.kind)}`,
      );
      return `${form.title.toLowerCase()}, ${values.join(', ')}`;
    }
    case 'sketch':
      return path.speed.kind === 'constant'
        ? `drawn path through ${path.controls.length} points at β = ${path.speed.beta}`
        : `drawn path through ${path.controls.length} points, β from ${path.speed.betaStart} to ${path.speed.betaEnd}`;
    case 'expression':
      return `x(t) = ${path.x}, y(t) = ${path.y}, z(t) = ${path.z}`;
    case 'samples':
      return `${path.t.length} imported samples`;
  }
}
