import { z } from 'zod';
import { compileMotion, ExpressionError } from '../path/expressionPath';
import { MAX_PATH_SAMPLES } from '../path/pathLimits';
import { checkSketch, MAX_SKETCH_CONTROLS, SketchError } from '../path/sketchPath';
import { SPEED_OF_LIGHT } from '../physics/constants';
import {
  ARROW_QUANTITIES,
  defaultMapSettings,
  FIELD_COMPONENTS,
  MAP_QUANTITIES,
  SCALE_KINDS,
} from './mapSettings';

// The app must run under a CSP without 'unsafe-eval'; jitless also skips zod's eval probe.
z.config({ jitless: true });

/** The `format` tag every scenario document carries. */
export const SCENARIO_FORMAT = 'conecast-scenario';
/** The document version this build writes; older ones are migrated on reading. */
export const SCENARIO_VERSION = 2;

export { MAX_PATH_SAMPLES };

const MAX_GRID_SIDE = 8192;
/** Most samples all paths of a scenario may hold together (80 bytes each, several copies). */
export const MAX_SCENARIO_SAMPLES = 4_000_000;
/** Most probes a scenario may hold. */
export const MAX_PROBES = 1000;

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

export const presetPathSchema = z.discriminatedUnion('preset', [
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

/**
 * A column of samples as a document gives it: a list of numbers (JSON) or a Float64Array. A
 * parsed document always holds Float64Array: compact, copied in one block when stored or
 * sent, and passed through as it is when the document is parsed again after an edit.
 */
export type SampleColumn = number[] | Float64Array;

/**
 * A column of numbers, checked in one plain loop: zod's per-element array check costs seconds
 * at a million samples. The first bad value is named by its index.
 */
const column = z
  .custom<SampleColumn>()
  .superRefine((values, ctx) => {
    // A column that is no list stops the checks of the path around it (continue: false), which
    // read every column's length.
    if (values === undefined) {
      ctx.addIssue({ code: 'custom', message: 'is missing', continue: false });
      return;
    }
    if (!Array.isArray(values) && !(values instanceof Float64Array)) {
      ctx.addIssue({ code: 'custom', message: 'must be a list of numbers', continue: false });
      return;
    }
    if (values.length === 0) {
      ctx.addIssue({ code: 'custom', message: 'must hold at least 1 value' });
      return;
    }
    if (values.length > MAX_PATH_SAMPLES) {
      ctx.addIssue({ code: 'custom', message: `must hold at most ${MAX_PATH_SAMPLES} values` });
      return;
    }
    for (let i = 0; i < values.length; i++) {
      const value: unknown = values[i];
      if (typeof value !== 'number' || !Number.isFinite(value)) {
        ctx.addIssue({ code: 'custom', path: [i], message: 'must be a number' });
        return;
      }
    }
  })
  .transform((values) => (values instanceof Float64Array ? values : Float64Array.from(values)));

const OPTIONAL_GROUPS = [
  ['vx', 'vy', 'vz'],
  ['ax', 'ay', 'az'],
] as const;

export const samplesPathSchema = z
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

export const sketchPathSchema = z
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

/** Longest formula accepted, characters: far more than any motion needs. */
const MAX_FORMULA_LENGTH = 2000;

export const expressionPathSchema = z
  .strictObject({
    kind: z.literal('expression'),
    /** Position formulas in t (s), giving m. */
    x: z.string().max(MAX_FORMULA_LENGTH),
    y: z.string().max(MAX_FORMULA_LENGTH),
    z: z.string().max(MAX_FORMULA_LENGTH),
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
  label: z.string().min(1).max(100),
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

/** A named observation point (version 2). */
const probeSchema = z.strictObject({
  name: z.string().min(1).max(100),
  /** Position, m. */
  position: triple,
});

/** What the map shows and how (version 2); see src/io/mapSettings. */
const mapSettingsSchema = z.strictObject({
  quantity: z.enum(MAP_QUANTITIES),
  component: z.enum(FIELD_COMPONENTS),
  scale: z.enum(SCALE_KINDS),
  /** 'auto', or the colour range held by hand in the quantity's SI unit. */
  range: z.union([
    z.literal('auto'),
    z
      .strictObject({ min: z.number(), max: z.number() })
      .refine(({ min, max }) => max > min, { error: 'max must be above min' }),
  ]),
  arrows: z.enum(['off', ...ARROW_QUANTITIES]),
  shells: z.boolean(),
});

export const scenarioSchema = z
  .strictObject({
    format: z.literal(SCENARIO_FORMAT),
    version: z.literal(SCENARIO_VERSION),
    title: z.string().min(1).max(200),
    /** True when the scenario is made up for illustration, not taken from a real machine. */
    invented: z.boolean(),
    note: z.string().max(10_000),
    charges: z.array(chargeSchema).min(1, { error: 'must hold at least one charge' }).max(64),
    view: viewSchema,
    /** Probes, in the order the app lists them; optional, none when absent. */
    probes: z
      .array(probeSchema)
      .max(MAX_PROBES)
      .default(() => []),
    /** Map settings; optional, the app's defaults when absent. */
    display: mapSettingsSchema.default(defaultMapSettings),
  })
  .superRefine((scenario, ctx) => {
    const total = scenario.charges.reduce((sum, { path }) => sum + pathSamples(path), 0);
    if (total > MAX_SCENARIO_SAMPLES) {
      ctx.addIssue({
        code: 'custom',
        path: ['charges'],
        message: `the paths hold ${total} samples in all, more than the ${MAX_SCENARIO_SAMPLES} a scenario may hold`,
      });
    }
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

/** Samples a path will have once built. */
function pathSamples(path: z.infer<typeof pathSchema>): number {
  return path.kind === 'samples' ? path.t.length : path.samples;
}

/** Where in a sketch path a SketchError points: speed.beta, controls[3], samples, ... */
export function sketchIssuePath(error: SketchError): (string | number)[] {
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
