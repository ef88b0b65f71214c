import type { z } from 'zod';
import type { SliceSpec, Triple } from '../engine/sliceSpec';
import { NAMED_PLANES } from '../engine/sliceSpec';
import type { Charge } from '../physics/charge';
import { fieldPath, ScenarioError } from './scenarioError';
import { describeIssue } from './scenarioIssues';
import { migrateScenario } from './scenarioMigrations';
import { buildPath } from './scenarioPaths';
import {
  type expressionPathSchema,
  type presetPathSchema,
  type samplesPathSchema,
  scenarioSchema,
  type sketchPathSchema,
} from './scenarioSchema';

export { ScenarioError } from './scenarioError';
export { rememberBuiltPath } from './scenarioPaths';
export {
  MAX_PATH_SAMPLES,
  type SampleColumn,
  SCENARIO_FORMAT,
  SCENARIO_VERSION,
} from './scenarioSchema';

export type Scenario = z.infer<typeof scenarioSchema>;
export type ScenarioCharge = Scenario['charges'][number];
export type ScenarioPath = ScenarioCharge['path'];
export type ScenarioView = Scenario['view'];
export type PresetName = z.infer<typeof presetPathSchema>['preset'];
export type ScenarioSamplesPath = z.infer<typeof samplesPathSchema>;
export type ScenarioSketchPath = z.infer<typeof sketchPathSchema>;
export type ScenarioSketchSpeed = ScenarioSketchPath['speed'];
export type ScenarioExpressionPath = z.infer<typeof expressionPathSchema>;

/**
 * Checks an already parsed JSON value, migrating an older version first; throws a
 * ScenarioError naming the first bad field.
 */
export function parseScenario(input: unknown): Scenario {
  const { document } = migrateScenario(input);
  const result = scenarioSchema.safeParse(document, { error: describeIssue });
  if (result.success) return result.data;
  // A misspelt key also makes the real one "missing"; the misspelling is the useful message.
  const issues = result.error.issues;
  const issue = issues.find((candidate) => candidate.code === 'unrecognized_keys') ?? issues[0];
  throw new ScenarioError(fieldPath(issue.path), issue.message);
}

/** Parses scenario JSON text; throws a ScenarioError naming the first bad field. */
export function parseScenarioText(text: string): Scenario {
  let input: unknown;
  try {
    input = JSON.parse(text);
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    throw new ScenarioError('scenario', `not valid JSON (${reason})`);
  }
  return parseScenario(input);
}

/** The charges of a scenario, in document order, each with its sampled path. */
export function buildCharges(scenario: Scenario): Charge[] {
  return scenario.charges.map((entry, k) => ({
    charge: entry.charge,
    path: buildPath(entry.path, `charges[${k}].path`),
  }));
}

/** The slice a scenario's view asks for. */
export function sliceSpecOf(view: ScenarioView): SliceSpec {
  const axes = NAMED_PLANES[view.plane];
  return {
    center: [...view.center] as Triple,
    u: [...axes.u] as Triple,
    v: [...axes.v] as Triple,
    width: view.size[0],
    height: view.size[1],
    nx: view.resolution[0],
    ny: view.resolution[1],
    time: view.time,
  };
}
