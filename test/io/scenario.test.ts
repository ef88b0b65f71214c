import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  buildCharges,
  parseScenario,
  parseScenarioText,
  type Scenario,
  ScenarioError,
  sliceSpecOf,
} from '../../src/io/scenario';
import { pathState } from '../../src/path/pathState';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';

const c = SPEED_OF_LIGHT;

function base(): Record<string, unknown> {
  return {
    format: 'conecast-scenario',
    version: 2,
    title: 'test',
    invented: true,
    note: '',
    charges: [
      {
        label: 'e',
        charge: -1.602176634e-19,
        path: {
          kind: 'preset',
          preset: 'circularOrbit',
          params: { radius: 0.01, beta: 0.5 },
          from: 0,
          to: 1e-9,
          samples: 200,
        },
      },
    ],
    view: { plane: 'xy', center: [0, 0, 0], size: [0.2, 0.1], resolution: [40, 20], time: 5e-10 },
    probes: [{ name: 'P1', position: [0.05, 0, 0] }],
    display: {
      quantity: 'E',
      component: 'Ey',
      scale: 'log',
      range: 'auto',
      arrows: 'off',
      shells: true,
    },
  };
}

/** A copy of the base document with one nested field replaced (or removed when value is undefined). */
function withField(path: (string | number)[], value: unknown): Record<string, unknown> {
  const doc = structuredClone(base());
  let node = doc as Record<string | number, unknown>;
  for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
  const last = path[path.length - 1];
  if (value === undefined) delete node[last];
  else node[last] = value;
  return doc;
}

function messageOf(input: unknown): string {
  try {
    parseScenario(input);
  } catch (error) {
    expect(error).toBeInstanceOf(ScenarioError);
    const message = (error as Error).message;
    expect(message).not.toContain('\n');
    return message;
  }
  throw new Error('expected the scenario to be rejected');
}

describe('the demo scenario', () => {
  const text = readFileSync(new URL('../../public/scenarios/demo.json', import.meta.url), 'utf8');

  it('parses, is marked invented and says so in its note', () => {
    const scenario = parseScenarioText(text);
    expect(scenario.invented).toBe(true);
    expect(scenario.note.toLowerCase()).toContain('invented');
  });

  it('builds one electron whose samples run past the view time', () => {
    const scenario = parseScenarioText(text);
    const charges = buildCharges(scenario);
    expect(charges).toHaveLength(1);
    expect(charges[0].charge).toBeLessThan(0);
    const [t0, t1] = charges[0].path.timeSpan;
    expect(t0).toBeLessThan(scenario.view.time);
    expect(t1).toBeGreaterThan(scenario.view.time);
    expect(charges[0].path.maxSpeed / c).toBeCloseTo(0.7, 6);
  });
});

describe('parseScenario accepts', () => {
  it('the base document, unchanged', () => {
    const scenario: Scenario = parseScenario(base());
    expect(scenario.charges[0].path.kind).toBe('preset');
  });

  it('a samples path with positions only', () => {
    const doc = withField(['charges', 0, 'path'], {
      kind: 'samples',
      t: [0, 1, 2, 3],
      x: [0, 1, 2, 3],
      y: [0, 0, 0, 0],
      z: [0, 0, 0, 0],
    });
    const [charge] = buildCharges(parseScenario(doc));
    const s = pathState();
    charge.path.stateAt(1.5, s);
    expect(s.px).toBeCloseTo(1.5, 12);
    expect(s.vx).toBeCloseTo(1, 12);
  });
});

describe('parseScenario rejects, naming the field', () => {
  it.each([
    [['charges', 0, 'path', 'params', 'beta'], 1, 'charges[0].path.params.beta: must be below 1'],
    [['charges', 0, 'path', 'params', 'beta'], 0, 'charges[0].path.params.beta: must be above 0'],
    [
      ['charges', 0, 'path', 'params', 'radius'],
      -1,
      'charges[0].path.params.radius: must be a positive length in m',
    ],
    [
      ['charges', 0, 'path', 'params', 'beta'],
      '0.5',
      'charges[0].path.params.beta: must be a number',
    ],
    [
      ['charges', 0, 'path', 'params', 'beta'],
      undefined,
      'charges[0].path.params.beta: is missing',
    ],
    [['charges', 0, 'path', 'samples'], 2.5, 'charges[0].path.samples: must be a whole number'],
    [['charges', 0, 'path', 'samples'], 1, 'charges[0].path.samples: must be at least 2'],
    [['charges', 0, 'path', 'to'], 0, 'charges[0].path.to: must be after from (0 s)'],
    [['charges', 0, 'charge'], null, 'charges[0].charge: must be a number'],
    [['charges'], [], 'charges: must hold at least one charge'],
    [['title'], '', 'title: must not be empty'],
    [['invented'], 'yes', 'invented: must be true or false'],
    [['view', 'plane'], 'xw', 'view.plane: must be "xy" or "xz" or "yz"'],
    [['view', 'size', 1], 0, 'view.size[1]: must be a positive length in m'],
    [['view', 'resolution', 0], 10_000, 'view.resolution[0]: must be at most 8192'],
    [['view', 'center'], [0, 0], 'view.center: must hold at least 3 values'],
    [['view', 'time'], Number.NaN, 'view.time: must be a number'],
    [
      ['format'],
      'something-else',
      'format: must be "conecast-scenario" (is this a Conecast scenario?)',
    ],
    [
      ['version'],
      3,
      'version: 3 was written by a newer Conecast; this build reads versions 1 to 2: update Conecast to open it',
    ],
    [['version'], '2', 'version: must be a whole number; this build reads versions 1 to 2'],
    [
      ['version'],
      0,
      'version: 0 is not a Conecast scenario version; this build reads versions 1 to 2',
    ],
    [
      ['probes', 0],
      { name: 'P1', position: [0, 0] },
      'probes[0].position: must hold at least 3 values',
    ],
    [['display'], { quantity: 'E' }, 'display.component: is missing'],
    [
      ['display', 'quantity'],
      'H',
      'display.quantity: must be "E" or "B" or "S" or "Erad" or "component" or "retardedTime"',
    ],
  ])('%j = %j', (path, value, expected) => {
    expect(messageOf(withField(path, value))).toBe(expected);
  });

  it('an unknown preset', () => {
    const doc = withField(['charges', 0, 'path', 'preset'], 'spiral');
    expect(messageOf(doc)).toBe(
      'charges[0].path.preset: must be one of "circularOrbit", "uniformMotion", "lineOscillation", "constantProperAcceleration", "brakingToRest", "undulatorWiggle", "transverseKick"',
    );
  });

  it('an unknown path kind', () => {
    const doc = withField(['charges', 0, 'path', 'kind'], 'table');
    expect(messageOf(doc)).toBe(
      'charges[0].path.kind: must be one of "preset", "samples", "sketch", "expression"',
    );
  });

  it('a misspelt parameter', () => {
    const doc = withField(['charges', 0, 'path', 'params'], { raduis: 0.01, beta: 0.5 });
    expect(messageOf(doc)).toMatch(/^charges\[0\]\.path\.params: unknown field "raduis"/);
  });

  it('an oscillation faster than light', () => {
    const doc = withField(['charges', 0, 'path'], {
      kind: 'preset',
      preset: 'lineOscillation',
      params: { amplitude: 0.1, frequency: c / (2 * Math.PI * 0.1) },
      from: 0,
      to: 1e-8,
      samples: 100,
    });
    expect(messageOf(doc)).toBe(
      'charges[0].path.params: peak speed 2π·frequency·amplitude must be below c',
    );
  });

  it('sample columns of different lengths', () => {
    const doc = withField(['charges', 0, 'path'], {
      kind: 'samples',
      t: [0, 1, 2],
      x: [0, 1],
      y: [0, 0, 0],
      z: [0, 0, 0],
    });
    expect(messageOf(doc)).toBe('charges[0].path.x: has 2 values but t has 3');
  });

  it('half a velocity group', () => {
    const doc = withField(['charges', 0, 'path'], {
      kind: 'samples',
      t: [0, 1],
      x: [0, 1],
      y: [0, 0],
      z: [0, 0],
      vx: [1, 1],
    });
    expect(messageOf(doc)).toBe('charges[0].path: vx, vy, vz must be given together');
  });

  it('text that is not JSON', () => {
    expect(() => parseScenarioText('{ "format": ')).toThrow(/^scenario: not valid JSON/);
  });

  it('text that is not JSON in one line, though the JSON parser quotes its line breaks', () => {
    // V8's message quotes the text around the fault. Found by test/io/scenario.property.test.ts.
    expect(() => parseScenarioText('[1,\n2,\r\nfoo\n]')).toThrow(
      /^scenario: not valid JSON \(Unexpected token 'o', "\[1,\\n2,\\r\\nfoo\\n\]" is not valid JSON\)$/,
    );
  });

  it('an unknown field whose name holds a line separator, in one line', () => {
    // JSON.stringify leaves U+2028 as it is. Found by test/io/scenario.property.test.ts.
    expect(messageOf({ ...base(), 'a\u2028b': 1 })).toBe('scenario: unknown field "a\\u2028b"');
  });

  it('a samples path whose t is missing or no list, without reading its length', () => {
    // These threw a TypeError from the length check of the path. Found by
    // test/io/scenario.property.test.ts.
    const path = { kind: 'samples', x: [0, 1], y: [0, 0], z: [0, 0] };
    expect(messageOf(withField(['charges', 0, 'path'], path))).toBe(
      'charges[0].path.t: is missing',
    );
    expect(messageOf(withField(['charges', 0, 'path'], { ...path, t: 5 }))).toBe(
      'charges[0].path.t: must be a list of numbers',
    );
    expect(messageOf(withField(['charges', 0, 'path'], { ...path, t: [0, 1], vx: 'fast' }))).toBe(
      'charges[0].path.vx: must be a list of numbers',
    );
  });
});

describe('buildCharges', () => {
  it('samples each preset with the argument names of its function', () => {
    const cases = [
      { preset: 'uniformMotion', params: { beta: -0.5 }, speed: 0.5 * c },
      {
        preset: 'lineOscillation',
        params: { amplitude: 0.01, frequency: 1e9 },
        speed: 2e7 * Math.PI,
      },
      { preset: 'constantProperAcceleration', params: { alpha: 1e18 }, speed: 0 },
      { preset: 'circularOrbit', params: { radius: 0.02, beta: 0.9 }, speed: 0.9 * c },
    ];
    for (const { preset, params, speed } of cases) {
      const doc = withField(['charges', 0, 'path'], {
        kind: 'preset',
        preset,
        params,
        from: 0,
        to: 1e-9,
        samples: 101,
      });
      const [charge] = buildCharges(parseScenario(doc));
      expect(charge.path.count).toBe(101);
      const s = pathState();
      charge.path.stateAt(0, s);
      expect(Math.hypot(s.vx, s.vy, s.vz)).toBeCloseTo(speed, 0);
    }
  });

  it('names the path of a sampled charge that outruns light', () => {
    const doc = withField(['charges', 0, 'path'], {
      kind: 'samples',
      t: [0, 1e-9],
      x: [0, 0.5],
      y: [0, 0],
      z: [0, 0],
    });
    const scenario = parseScenario(doc);
    expect(() => buildCharges(scenario)).toThrow(/^charges\[0\]\.path: speed reaches 1\.66782 c/);
  });

  it('names the column of a sampled charge whose times do not increase', () => {
    const doc = withField(['charges', 0, 'path'], {
      kind: 'samples',
      t: [0, 1, 1],
      x: [0, 0, 0],
      y: [0, 0, 0],
      z: [0, 0, 0],
    });
    const scenario = parseScenario(doc);
    expect(() => buildCharges(scenario)).toThrow(/^charges\[0\]\.path\.t: times must increase/);
  });
});

describe('sliceSpecOf', () => {
  it('maps a named plane, size and resolution', () => {
    const spec = sliceSpecOf(parseScenario(withField(['view', 'plane'], 'xz')).view);
    expect(spec).toEqual({
      center: [0, 0, 0],
      u: [1, 0, 0],
      v: [0, 0, 1],
      width: 0.2,
      height: 0.1,
      nx: 40,
      ny: 20,
      time: 5e-10,
    });
  });
});

describe('the braking, undulator and kick presets in a scenario', () => {
  const cases: [string, Record<string, number>, number, number][] = [
    ['brakingToRest', { beta0: 0.8, stopTime: 2e-10 }, -1e-10, 4e-10],
    ['undulatorWiggle', { gamma: 20, strength: 1.5, period: 0.02 }, 0, 2e-10],
    ['transverseKick', { beta: 0.99, angle: 0.05, duration: 1e-10 }, -5e-11, 2e-10],
  ];
  for (const [preset, params, from, to] of cases) {
    it(`builds a sub-luminal path for ${preset}`, () => {
      const doc = withField(['charges', 0, 'path'], {
        kind: 'preset',
        preset,
        params,
        from,
        to,
        samples: 400,
      });
      const [charge] = buildCharges(parseScenario(doc));
      expect(charge.path.count).toBe(400);
      // The path model checks the speed at every knot and inside every piece.
      expect(charge.path.maxSpeed).toBeLessThan(c);
    });
  }

  it('refuses an undulator whose K leaves no forward speed', () => {
    const doc = withField(['charges', 0, 'path'], {
      kind: 'preset',
      preset: 'undulatorWiggle',
      params: { gamma: 1.5, strength: 3, period: 0.02 },
      from: 0,
      to: 1e-10,
      samples: 50,
    });
    expect(messageOf(doc)).toMatch(/K²\/\(2γ²\) must stay below β²/);
  });
});

const sketchPath = (
  speed: Record<string, unknown>,
  controls: unknown = circleControls(0.02, 9),
) => ({
  kind: 'sketch',
  controls,
  speed,
  startTime: -1e-10,
  samples: 400,
});

/** Points on a half circle of radius R in the xy plane. */
function circleControls(radius: number, count: number): [number, number, number][] {
  return Array.from({ length: count }, (_, i) => {
    const angle = (Math.PI * i) / (count - 1);
    return [radius * Math.cos(angle), radius * Math.sin(angle), 0];
  });
}

const expressionPath = (x: string, y = '0', z = '0') => ({
  kind: 'expression',
  x,
  y,
  z,
  from: 0,
  to: 1e-9,
  samples: 500,
});

describe('sketch and expression paths in a scenario', () => {
  it('builds a sketch travelled at constant β, starting at its start time', () => {
    const doc = withField(['charges', 0, 'path'], sketchPath({ kind: 'constant', beta: 0.6 }));
    const scenario = parseScenario(doc);
    expect(scenario.charges[0].path.kind).toBe('sketch');
    const [charge] = buildCharges(scenario);
    expect(charge.path.count).toBe(400);
    expect(charge.path.timeSpan[0]).toBe(-1e-10);
    // The sketch's own speed is βc exactly; SampledPath's interpolation adds well under 1e-6.
    expect(charge.path.maxSpeed / c).toBeCloseTo(0.6, 6);
  });

  it('builds a sketch on a ramp, ending at betaEnd', () => {
    const doc = withField(
      ['charges', 0, 'path'],
      sketchPath({ kind: 'ramp', betaStart: 0.1, betaEnd: 0.9 }),
    );
    const [charge] = buildCharges(parseScenario(doc));
    const s = pathState();
    charge.path.stateAt(charge.path.timeSpan[1], s);
    // The last sample's velocity is βc·tangent from closed forms: rounding only.
    expect(Math.hypot(s.vx, s.vy, s.vz) / c).toBeCloseTo(0.9, 12);
  });

  it('builds an expression path whose positions are the formulas', () => {
    const doc = withField(['charges', 0, 'path'], expressionPath('0.01*cos(2*pi*1e8*t)', 'c*t/10'));
    const [charge] = buildCharges(parseScenario(doc));
    const s = pathState();
    charge.path.stateAt(0, s);
    expect(s.px).toBe(0.01);
    // y = ct/10 is linear, which the spline reproduces up to rounding.
    expect(s.vy / c).toBeCloseTo(0.1, 9);
  });

  it.each([
    [
      { kind: 'constant', beta: 1 },
      'speed.beta: must be below 1: no charge reaches the speed of light',
    ],
    [{ kind: 'constant', beta: 0 }, 'speed.beta: must be above 0'],
    [
      { kind: 'ramp', betaStart: 0.5, betaEnd: 1.2 },
      'speed.betaEnd: must be below 1: no charge reaches the speed of light',
    ],
    [{ kind: 'warp', beta: 0.5 }, 'speed.kind: must be one of "constant", "ramp"'],
    [{ kind: 'constant', beta: 0.5, gamma: 2 }, 'speed: unknown field "gamma"'],
  ])('refuses the sketch speed %j, naming the field', (speed, expected) => {
    const doc = withField(['charges', 0, 'path'], sketchPath(speed));
    expect(messageOf(doc)).toBe(`charges[0].path.${expected}`);
  });

  it('refuses sketch controls that cannot make a curve', () => {
    const repeated = withField(
      ['charges', 0, 'path'],
      sketchPath({ kind: 'constant', beta: 0.5 }, [
        [0, 0, 0],
        [1, 0, 0],
        [1, 0, 0],
      ]),
    );
    expect(messageOf(repeated)).toBe(
      'charges[0].path.controls[2]: repeats point 2 (counting from 1); consecutive points must differ',
    );
    const single = withField(
      ['charges', 0, 'path'],
      sketchPath({ kind: 'constant', beta: 0.5 }, [[0, 0, 0]]),
    );
    expect(messageOf(single)).toBe('charges[0].path.controls: must hold at least 2 values');
    const flat = withField(
      ['charges', 0, 'path'],
      sketchPath({ kind: 'constant', beta: 0.5 }, [
        [0, 0],
        [1, 0],
      ]),
    );
    expect(messageOf(flat)).toBe('charges[0].path.controls[0]: must hold at least 3 values');
    const many = withField(
      ['charges', 0, 'path'],
      sketchPath({ kind: 'constant', beta: 0.5 }, circleControls(1, 201)),
    );
    expect(messageOf(many)).toBe('charges[0].path.controls: must hold at most 200 values');
  });

  it('buildCharges names the field of a sketch that skipped parsing', () => {
    // A document assembled in code, not parsed: buildCharges must still refuse β ≥ 1 and say where.
    const scenario = parseScenario(base());
    const unchecked = {
      ...scenario,
      charges: [{ ...scenario.charges[0], path: sketchPath({ kind: 'constant', beta: 1 }) }],
    } as Scenario;
    expect(() => buildCharges(unchecked)).toThrow(
      'charges[0].path.speed.beta: must be below 1: no charge reaches the speed of light',
    );
  });

  it('names the charge and formula of an unknown symbol', () => {
    const doc = structuredClone(base()) as { charges: Record<string, unknown>[] };
    doc.charges.push({ label: 'p', charge: 1.602176634e-19, path: expressionPath('foo * t') });
    expect(messageOf(doc)).toBe('charges[1].path.x: unknown symbol "foo"');
  });

  it.each([
    [expressionPath('0', 'cos(t))'), 'charges[0].path.y: unexpected ")" at character 7'],
    [expressionPath('0', '0', 'import({}, {})'), 'charges[0].path.z: unknown function "import"'],
    [{ ...expressionPath('t'), to: 0 }, 'charges[0].path.to: must be after from (0 s)'],
    [{ ...expressionPath('t'), samples: 1 }, 'charges[0].path.samples: must be at least 2'],
    [{ ...expressionPath('t'), x: 5 }, 'charges[0].path.x: must be text'],
  ])('refuses the expression path %j', (path, expected) => {
    expect(messageOf(withField(['charges', 0, 'path'], path))).toBe(expected);
  });

  it('buildCharges names the formula and time of a value that is not real', () => {
    const doc = withField(['charges', 0, 'path'], expressionPath('sqrt(t - 5e-10) * 1e-3'));
    const scenario = parseScenario(doc);
    expect(() => buildCharges(scenario)).toThrow(
      'charges[0].path.x: is a complex number, not a real one (at t = 0 s)',
    );
  });

  it('buildCharges names the path of a formula that outruns light', () => {
    const doc = withField(['charges', 0, 'path'], expressionPath('2*c*t'));
    const scenario = parseScenario(doc);
    expect(() => buildCharges(scenario)).toThrow(/^charges\[0\]\.path: speed reaches 2\.00000 c/);
  });
});
