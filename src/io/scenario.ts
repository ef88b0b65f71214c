import { z } from 'zod';
import type { SliceSpec, Triple } from '../engine/sliceSpec';
import { NAMED_PLANES } from '../engine/sliceSpec';
import { type AnalyticMotion, sampleMotion } from '../path/analyticMotion';
import { compileMotion, ExpressionError, expressionColumns } from '../path/expressionPath';
import {
  brakingToRest,
  circularOrbit,
  constantProperAcceleration,
  lineOscillation,
  transverseKick,
  undulatorWiggle,
  uniformMotion,
} from '../path/presets';
import { PathError, SampledPath } from '../path/sampledPath';
import { checkSketch, MAX_SKETCH_CONTROLS, SketchError, sketchColumns } from '../path/sketchPath';
import type { Charge } from '../physics/charge';
import { SPEED_OF_LIGHT } from '../physics/constants';

// The app must run under a CSP without 'unsafe-eval'; jitless also skips zod's eval probe.
z.config({ jitless: true });

/** The `format` tag every scenario document carries. */
export const SCENARIO_FORMAT = 'conecast-scenario';
/** The document version this build reads and writes. */
export const SCENARIO_VERSION = 1;

/** A scenario document that cannot be used; `path` names the field, e.g. `charges[0].path.params.beta`. */
export class ScenarioError extends Error {
  constructor(
    readonly path: string,
    readonly reason: string,
  ) {
    super(`${path}: ${reason}`);
    this.name = 'ScenarioError';
  }
}

const MAX_PATH_SAMPLES = 1_000_000;
const MAX_GRID_SIDE = 8192;

const positive = (unit: string) =>
  z.number().refine((value) => value > 0, { error: `must be a positive ${unit}` });
const speedFraction = z
  .number()
  .refine((b) => b < 1, { error: 'must be below 1' })
  .refine((b) => b > -1, { error: 'must be above -1' });

/** One schema per preset, each with the argument names of its function in src/path/presets. */
const presetPath = <P extends string, S extends z.ZodType>(preset: P, params: S) =>
  z.strictObject({
    kind: z.literal('preset'),
    preset: z.literal(preset),
    params,
    /** First sample time, s. */
    from: z.number(),
    /** Last sample time, s. */
    to: z.number(),
    /** Number of evenly spaced samples on [from, to]. */
    samples: z.int().min(2).max(MAX_PATH_SAMPLES),
  });

const presetPathSchema = z.discriminatedUnion('preset', [
  presetPath(
    'circularOrbit',
    z.strictObject({
      radius: positive('length in m'),
      beta: speedFraction.refine((b) => b > 0, { error: 'must be above 0' }),
    }),
  ),
  presetPath('uniformMotion', z.strictObject({ beta: speedFraction })),
  presetPath(
    'lineOscillation',
    z
      .strictObject({ amplitude: positive('length in m'), frequency: positive('frequency in Hz') })
      .refine(({ amplitude, frequency }) => 2 * Math.PI * frequency * amplitude < SPEED_OF_LIGHT, {
        error: 'peak speed 2π·frequency·amplitude must be below c',
      }),
  ),
  presetPath(
    'constantProperAcceleration',
    z.strictObject({ alpha: positive('acceleration in m/s²') }),
  ),
  presetPath(
    'brakingToRest',
    z.strictObject({
      beta0: speedFraction.refine((b) => b > 0, { error: 'must be above 0' }),
      stopTime: positive('time in s'),
    }),
  ),
  presetPath(
    'undulatorWiggle',
    z
      .strictObject({
        gamma: z.number().refine((g) => g > 1, { error: 'must be above 1' }),
        strength: positive('undulator parameter K'),
        period: positive('length in m'),
      })
      .refine(({ gamma, strength }) => strength * strength < 2 * (gamma * gamma - 1), {
        error: 'K²/(2γ²) must stay below β² (raise gamma or lower strength)',
      }),
  ),
  presetPath(
    'transverseKick',
    z.strictObject({
      beta: speedFraction.refine((b) => b > 0, { error: 'must be above 0' }),
      angle: z.number(),
      duration: positive('time in s'),
    }),
  ),
]);

const column = z.array(z.number()).min(1);
const OPTIONAL_GROUPS = [
  ['vx', 'vy', 'vz'],
  ['ax', 'ay', 'az'],
] as const;

const samplesPathSchema = z
  .strictObject({
    kind: z.literal('samples'),
    /** Sample times, s, strictly increasing. */
    t: column,
    /** Positions, m. */
    x: column,
    y: column,
    z: column,
    /** Velocities, m/s (all three or none). */
    vx: column.optional(),
    vy: column.optional(),
    vz: column.optional(),
    /** Accelerations, m/s² (all three or none). */
    ax: column.optional(),
    ay: column.optional(),
    az: column.optional(),
  })
  .superRefine((path, ctx) => {
    const n = path.t.length;
    for (const name of ['x', 'y', 'z', 'vx', 'vy', 'vz', 'ax', 'ay', 'az'] as const) {
      const values = path[name];
      if (values !== undefined && values.length !== n) {
        ctx.addIssue({
          code: 'custom',
          path: [name],
          message: `has ${values.length} values but t has ${n}`,
        });
      }
    }
    for (const group of OPTIONAL_GROUPS) {
      const given = group.filter((name) => path[name] !== undefined);
      if (given.length !== 0 && given.length !== group.length) {
        ctx.addIssue({ code: 'custom', message: `${group.join(', ')} must be given together` });
      }
    }
  });

const triple = z.tuple([z.number(), z.number(), z.number()]);

const sketchSpeedSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('constant'), beta: z.number() }),
  /** β changes linearly in time from betaStart to betaEnd over the whole curve. */
  z.strictObject({ kind: z.literal('ramp'), betaStart: z.number(), betaEnd: z.number() }),
]);

const sketchPathSchema = z
  .strictObject({
    kind: z.literal('sketch'),
    /** Points the curve passes through, m. */
    controls: z.array(triple).min(2).max(MAX_SKETCH_CONTROLS),
    speed: sketchSpeedSchema,
    /** Time the charge leaves the first point, s. */
    startTime: z.number(),
    /** Number of evenly spaced samples from start to end of the curve. */
    samples: z.int().min(2).max(MAX_PATH_SAMPLES),
  })
  .superRefine((path, ctx) => {
    try {
      checkSketch(path.controls, path.speed, path.startTime, path.samples);
    } catch (error) {
      if (!(error instanceof SketchError)) throw error;
      ctx.addIssue({ code: 'custom', path: sketchIssuePath(error), message: error.message });
    }
  });

const expressionPathSchema = z
  .strictObject({
    kind: z.literal('expression'),
    /** Position formulas in t (s), giving m. */
    x: z.string(),
    y: z.string(),
    z: z.string(),
    /** First sample time, s. */
    from: z.number(),
    /** Last sample time, s. */
    to: z.number(),
    /** Number of evenly spaced samples on [from, to]. */
    samples: z.int().min(2).max(MAX_PATH_SAMPLES),
  })
  .superRefine((path, ctx) => {
    if (!(path.to > path.from)) {
      ctx.addIssue({
        code: 'custom',
        path: ['to'],
        message: `must be after from (${path.from} s)`,
      });
    }
    try {
      compileMotion(path);
    } catch (error) {
      if (!(error instanceof ExpressionError)) throw error;
      ctx.addIssue({ code: 'custom', path: [error.field], message: error.detail });
    }
  });

const pathSchema = z.discriminatedUnion('kind', [
  presetPathSchema,
  samplesPathSchema,
  sketchPathSchema,
  expressionPathSchema,
]);

const chargeSchema = z.strictObject({
  label: z.string().min(1),
  /** Charge, C (an electron is -1.602176634e-19). */
  charge: z.number(),
  path: pathSchema,
});

const gridSide = z.int().min(1).max(MAX_GRID_SIDE);

const viewSchema = z.strictObject({
  plane: z.enum(['xy', 'xz', 'yz']),
  /** Centre of the slice, m. */
  center: triple,
  /** Width and height of the slice, m. */
  size: z.tuple([positive('length in m'), positive('length in m')]),
  /** Grid points along width and height. */
  resolution: z.tuple([gridSide, gridSide]),
  /** Observation time, s. */
  time: z.number(),
});

export const scenarioSchema = z
  .strictObject({
    format: z.literal(SCENARIO_FORMAT),
    version: z.literal(SCENARIO_VERSION),
    title: z.string().min(1),
    /** True when the scenario is made up for illustration, not taken from a real machine. */
    invented: z.boolean(),
    note: z.string(),
    charges: z.array(chargeSchema).min(1, { error: 'must hold at least one charge' }),
    view: viewSchema,
  })
  .superRefine((scenario, ctx) => {
    scenario.charges.forEach(({ path }, k) => {
      if (path.kind === 'preset' && !(path.to > path.from)) {
        ctx.addIssue({
          code: 'custom',
          path: ['charges', k, 'path', 'to'],
          message: `must be after from (${path.from} s)`,
        });
      }
    });
  });

export type Scenario = z.infer<typeof scenarioSchema>;
export type ScenarioCharge = Scenario['charges'][number];
export type ScenarioPath = ScenarioCharge['path'];
export type ScenarioView = Scenario['view'];
export type PresetName = z.infer<typeof presetPathSchema>['preset'];
export type ScenarioSketchPath = z.infer<typeof sketchPathSchema>;
export type ScenarioSketchSpeed = ScenarioSketchPath['speed'];
export type ScenarioExpressionPath = z.infer<typeof expressionPathSchema>;

/** Checks an already parsed JSON value; throws a ScenarioError naming the first bad field. */
export function parseScenario(input: unknown): Scenario {
  checkHeader(input);
  const result = scenarioSchema.safeParse(input, { error: describeIssue });
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

function buildPath(path: ScenarioPath, where: string): SampledPath {
  try {
    switch (path.kind) {
      case 'samples':
        return new SampledPath(path);
      case 'preset':
        return new SampledPath(sampleMotion(presetMotion(path), path.from, path.to, path.samples));
      case 'sketch':
        return new SampledPath(
          sketchColumns(path.controls, path.speed, path.startTime, path.samples),
        );
      case 'expression':
        return new SampledPath(expressionColumns(path, path.from, path.to, path.samples));
    }
  } catch (error) {
    if (error instanceof PathError) {
      // Speed errors concern the whole path ('v'); the others name a real column.
      const column = path.kind === 'samples' && error.column !== 'v' ? `.${error.column}` : '';
      throw new ScenarioError(where + column, error.message);
    }
    if (error instanceof SketchError) {
      throw new ScenarioError(`${where}.${fieldPath(sketchIssuePath(error))}`, error.message);
    }
    if (error instanceof ExpressionError) {
      throw new ScenarioError(`${where}.${error.field}`, error.detail);
    }
    throw error;
  }
}

/** Where in a sketch path a SketchError points: speed.beta, controls[3], samples, ... */
function sketchIssuePath(error: SketchError): (string | number)[] {
  switch (error.field) {
    case 'beta':
    case 'betaStart':
    case 'betaEnd':
      return ['speed', error.field];
    case 'controls':
      return error.index === undefined ? ['controls'] : ['controls', error.index];
    default:
      return [error.field];
  }
}

function presetMotion(path: z.infer<typeof presetPathSchema>): AnalyticMotion {
  switch (path.preset) {
    case 'circularOrbit':
      return circularOrbit(path.params.radius, path.params.beta);
    case 'uniformMotion':
      return uniformMotion(path.params.beta);
    case 'lineOscillation':
      return lineOscillation(path.params.amplitude, path.params.frequency);
    case 'constantProperAcceleration':
      return constantProperAcceleration(path.params.alpha);
    case 'brakingToRest':
      return brakingToRest(path.params.beta0, path.params.stopTime);
    case 'undulatorWiggle':
      return undulatorWiggle(path.params.gamma, path.params.strength, path.params.period);
    case 'transverseKick':
      return transverseKick(path.params.beta, path.params.angle, path.params.duration);
  }
}

/** Format and version first, so an old or foreign file gets that message, not a list of field errors. */
function checkHeader(input: unknown): void {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    throw new ScenarioError('scenario', 'must be a JSON object');
  }
  const { format, version } = input as Record<string, unknown>;
  if (format !== SCENARIO_FORMAT) {
    throw new ScenarioError('format', `must be "${SCENARIO_FORMAT}"`);
  }
  if (typeof version === 'number' && version !== SCENARIO_VERSION) {
    throw new ScenarioError(
      'version',
      `${version} is not supported; this build reads version ${SCENARIO_VERSION}`,
    );
  }
}

const EXPECTED: Record<string, string> = {
  number: 'a number',
  int: 'a whole number',
  string: 'text',
  boolean: 'true or false',
  array: 'a list',
  object: 'an object',
  tuple: 'a list',
};

/** Zod's issues, reworded for people editing a scenario file by hand. */
function describeIssue(issue: z.core.$ZodRawIssue): string | undefined {
  switch (issue.code) {
    case 'invalid_type':
      if (issue.input === undefined) return 'is missing';
      return `must be ${EXPECTED[issue.expected] ?? issue.expected}`;
    case 'invalid_value':
      return `must be ${issue.values.map((value) => JSON.stringify(value)).join(' or ')}`;
    case 'invalid_union':
      if ('options' in issue && Array.isArray(issue.options)) {
        return `must be one of ${issue.options.map((value) => JSON.stringify(value)).join(', ')}`;
      }
      return undefined;
    case 'unrecognized_keys':
      return `unknown field${issue.keys.length > 1 ? 's' : ''} ${issue.keys.map((key) => JSON.stringify(key)).join(', ')}`;
    case 'too_small':
      if (issue.origin === 'array')
        return `must hold at least ${plural(Number(issue.minimum), 'value')}`;
      if (issue.origin === 'string') return 'must not be empty';
      return `must be at least ${issue.minimum}`;
    case 'too_big':
      if (issue.origin === 'array')
        return `must hold at most ${plural(Number(issue.maximum), 'value')}`;
      return `must be at most ${issue.maximum}`;
    default:
      return undefined;
  }
}

function plural(count: number, noun: string): string {
  return `${count} ${noun}${count === 1 ? '' : 's'}`;
}

/** ['charges', 0, 'path', 'params', 'beta'] -> 'charges[0].path.params.beta'. */
function fieldPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out === '' ? 'scenario' : out;
}
