import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { anyText } from './codePoints';

// Valid scenario documents of every path kind, and generators that break them one field at a
// time with hostile values, for the property tests of the scenario reader and its links.

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };
export type JsonObject = { [key: string]: Json };

const electron = -1.602176634e-19;

const view = {
  plane: 'xy',
  center: [0, 0, 0],
  size: [0.2, 0.1],
  resolution: [40, 20],
  time: 5e-10,
};

const display = {
  quantity: 'E',
  component: 'Ey',
  scale: 'log',
  range: { min: 1e-3, max: 10 },
  arrows: 'off',
  shells: true,
};

function documentWith(paths: JsonObject[]): JsonObject {
  return {
    format: 'conecast-scenario',
    version: 2,
    title: 'property test',
    invented: true,
    note: 'Invented for the property tests.',
    charges: paths.map((path, k) => ({ label: `q${k}`, charge: electron, path })),
    view,
    probes: [{ name: 'P1', position: [0.05, 0, 0] }],
    display,
  };
}

const preset = (name: string, params: JsonObject, from: number, to: number): JsonObject => ({
  kind: 'preset',
  preset: name,
  params,
  from,
  to,
  samples: 40,
});

/** One valid path of each kind and preset; sample counts stay small so building is quick. */
const PATHS: JsonObject[] = [
  preset('circularOrbit', { radius: 0.01, beta: 0.5 }, 0, 1e-9),
  preset('uniformMotion', { beta: -0.5 }, 0, 1e-9),
  preset('lineOscillation', { amplitude: 0.01, frequency: 1e9 }, 0, 1e-9),
  preset('constantProperAcceleration', { alpha: 1e18 }, 0, 1e-9),
  preset('brakingToRest', { beta0: 0.8, stopTime: 2e-10 }, -1e-10, 4e-10),
  preset('undulatorWiggle', { gamma: 20, strength: 1.5, period: 0.02 }, 0, 2e-10),
  preset('transverseKick', { beta: 0.99, angle: 0.05, duration: 1e-10 }, -5e-11, 2e-10),
  {
    kind: 'samples',
    t: [0, 1e-9, 2e-9, 3e-9],
    x: [0, 0.01, 0.02, 0.03],
    y: [0, 0, 0, 0],
    z: [0, 0, 0, 0],
  },
  {
    kind: 'samples',
    t: [0, 1e-9, 2e-9],
    x: [0, 0.1, 0.2],
    y: [0, 0, 0],
    z: [0, 0, 0],
    vx: [1e8, 1e8, 1e8],
    vy: [0, 0, 0],
    vz: [0, 0, 0],
    ax: [0, 0, 0],
    ay: [0, 0, 0],
    az: [0, 0, 0],
  },
  {
    kind: 'sketch',
    controls: [
      [0, 0, 0],
      [0.01, 0.01, 0],
      [0.02, 0, 0],
      [0.03, -0.01, 0.005],
    ],
    speed: { kind: 'constant', beta: 0.6 },
    startTime: -1e-10,
    samples: 60,
  },
  {
    kind: 'sketch',
    controls: [
      [0, 0, 0],
      [0.02, 0, 0],
      [0.02, 0.02, 0],
    ],
    speed: { kind: 'ramp', betaStart: 0.1, betaEnd: 0.9 },
    startTime: 0,
    samples: 60,
  },
  {
    kind: 'expression',
    x: '0.01*cos(2*pi*1e8*t)',
    y: 'c*t/10',
    z: 't < 5e-10 ? 0 : 1e-3*sin(t*1e9)',
    from: 0,
    to: 1e-9,
    samples: 60,
  },
];

const demo = JSON.parse(
  readFileSync(new URL('../../public/scenarios/demo.json', import.meta.url), 'utf8'),
) as JsonObject;

/** A version-1 document: no probes and no map settings, which the migration adds. */
const versionOne: JsonObject = { ...documentWith([PATHS[0]]), version: 1 };
delete versionOne.probes;
delete versionOne.display;

/** Valid documents: the demo, one per path, all paths at once, and an old version. */
export const VALID_DOCUMENTS: readonly JsonObject[] = [
  demo,
  ...PATHS.map((path) => documentWith([path])),
  documentWith(PATHS),
  versionOne,
];

/** JSON texts of values no field expects; parsed with JSON.parse so `__proto__` is an own key. */
const HOSTILE_JSON = [
  '1e308',
  '-1e308',
  '1.7976931348623157e308',
  '5e-324',
  '-5e-324',
  '-0',
  '0',
  '1',
  '-1',
  '2',
  '0.5',
  '0.9999999999999999',
  '1.0000000000000002',
  '9007199254740993',
  '1000000',
  '1000001',
  '8192',
  '8193',
  '65',
  '1e21',
  '"NaN"',
  '"Infinity"',
  '"-Infinity"',
  '"1e999"',
  '""',
  '" "',
  '"0.5"',
  '"__proto__"',
  '"constructor"',
  '"\\n"',
  '"\\r"',
  '"\\u2028"',
  '"\\u0000"',
  '"\\ud800"',
  '"import({}, {})"',
  '"constructor.constructor(\\"globalThis.__pwned=1\\")()"',
  '"sin(t"',
  '"t"',
  '"circularOrbit"',
  '"samples"',
  '"expression"',
  'true',
  'false',
  'null',
  '[]',
  '{}',
  '[1, 2, 3]',
  '[0, 0]',
  '[0, 0, 0, 0]',
  '["1", "2", "3"]',
  '[null]',
  '[[0, 0, 0], [0, 0, 0]]',
  '{"__proto__": {"polluted": true}}',
  '{"constructor": {"prototype": {"polluted": true}}}',
  '{"prototype": {"polluted": true}}',
  '{"__proto__": null}',
  '{"kind": "samples"}',
  '{"kind": "preset", "preset": "__proto__"}',
  '{"min": 1, "max": 1}',
].map((text) => JSON.parse(text) as Json);

/** Keys a hostile document adds: prototype names, near misses and real field names. */
const HOSTILE_KEYS = [
  '__proto__',
  'constructor',
  'prototype',
  'toString',
  'valueOf',
  'hasOwnProperty',
  'polluted',
  'kind',
  'samples',
  't',
  'vx',
  'ax',
  'params',
  'Format',
  '',
  ' ',
  '\n',
  '\r',
  '\u2028',
  '\u2029',
  '0',
  'length',
];

const HOSTILE_VALUE: fc.Arbitrary<Json> = fc.oneof(
  { weight: 6, arbitrary: fc.constantFrom(...HOSTILE_JSON) },
  { weight: 2, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }) },
  { weight: 1, arbitrary: fc.integer({ min: -3, max: 2_000_000 }) },
  { weight: 1, arbitrary: anyText(20) },
  { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 2 }) as fc.Arbitrary<Json> },
  // Deep nesting, as lists or objects.
  {
    weight: 1,
    arbitrary: fc
      .tuple(fc.integer({ min: 10, max: 1000 }), fc.boolean())
      .map(([depth, list]) =>
        JSON.parse(
          list
            ? '['.repeat(depth) + ']'.repeat(depth)
            : '{"a":'.repeat(depth) + '1' + '}'.repeat(depth),
        ),
      ),
  },
  // Long text and long lists.
  { weight: 1, arbitrary: fc.integer({ min: 100, max: 12_000 }).map((n) => 'x'.repeat(n)) },
  {
    weight: 1,
    arbitrary: fc.integer({ min: 5, max: 2000 }).map((n) => Array.from({ length: n }, (_, i) => i)),
  },
);

/**
 * One edit: replace or remove the node at a position, add a key or item under it, or scale a
 * number there (which keeps many documents valid, so that building them gets exercised).
 */
interface Edit {
  op: 'replace' | 'remove' | 'add' | 'scale';
  at: number;
  key: string;
  value: Json;
  factor: number;
}

const EDIT: fc.Arbitrary<Edit> = fc.record({
  op: fc.constantFrom('replace', 'replace', 'remove', 'add', 'scale', 'scale'),
  factor: fc.constantFrom(-1, 0, 0.5, 0.999, 1.001, 2, 10, 1e3, 1e-3, 1e6, 1e-6, 1e100),
  at: fc.nat(),
  key: fc.oneof(
    { weight: 3, arbitrary: fc.constantFrom(...HOSTILE_KEYS) },
    { weight: 1, arbitrary: fc.string({ maxLength: 8 }) },
  ),
  value: HOSTILE_VALUE,
});

type Path = (string | number)[];

/** Positions of every node in a document, outside values an edit put there too deep to matter. */
function nodePaths(value: unknown, path: Path, out: Path[]): Path[] {
  out.push(path);
  if (path.length > 8 || typeof value !== 'object' || value === null) return out;
  if (Array.isArray(value)) {
    // Long columns: their ends are enough.
    const indices = value.length > 6 ? [0, 1, value.length - 1] : value.map((_, i) => i);
    for (const i of indices) nodePaths(value[i], [...path, i], out);
  } else {
    for (const key of Object.keys(value)) {
      nodePaths((value as Record<string, unknown>)[key], [...path, key], out);
    }
  }
  return out;
}

function valueAt(document: Json, path: Path): unknown {
  let node: unknown = document;
  for (const key of path) node = (node as Record<string | number, unknown>)[key];
  return node;
}

/** Sets an own, enumerable property, even `__proto__`, as JSON.parse would. */
function setOwn(target: object, key: string | number, value: unknown): void {
  Object.defineProperty(target, key, {
    value,
    enumerable: true,
    writable: true,
    configurable: true,
  });
}

function applyEdit(document: Json, { op, at, key, value: shared, factor }: Edit): Json {
  // Generated values may be shared between runs (constantFrom): edit a copy.
  const edit = { op, at, key, value: JSON.parse(JSON.stringify(shared)) as Json };
  let paths = nodePaths(document, [], []);
  if (op === 'scale') {
    paths = paths.filter((path) => typeof valueAt(document, path) === 'number');
    if (paths.length === 0) return document;
  }
  const path = paths[edit.at % paths.length];
  if (path.length === 0) return edit.op === 'replace' ? edit.value : document;
  let parent = document as Record<string | number, Json>;
  for (const key of path.slice(0, -1)) parent = parent[key] as Record<string | number, Json>;
  const last = path[path.length - 1];
  const node = parent[last];
  switch (edit.op) {
    case 'scale':
      if (typeof node === 'number') parent[last] = node * factor;
      break;
    case 'replace':
      setOwn(parent, last, edit.value);
      break;
    case 'remove':
      if (Array.isArray(parent)) parent.splice(last as number, 1);
      else delete parent[last];
      break;
    case 'add':
      if (Array.isArray(node)) node.push(edit.value);
      else if (typeof node === 'object' && node !== null) setOwn(node, edit.key, edit.value);
      else if (Array.isArray(parent)) parent.push(edit.value);
      else setOwn(parent, edit.key, edit.value);
      break;
  }
  return document;
}

/** A copy of a valid document with one to three hostile edits; JSON-representable throughout. */
export const EDITED_DOCUMENT: fc.Arbitrary<Json> = fc
  .record({
    base: fc.nat(VALID_DOCUMENTS.length - 1),
    edits: fc.array(EDIT, { minLength: 1, maxLength: 3 }),
  })
  .map(({ base, edits }) => {
    let document = JSON.parse(JSON.stringify(VALID_DOCUMENTS[base])) as Json;
    for (const edit of edits) document = applyEdit(document, edit);
    return document;
  });

/** Samples the document asks buildCharges to make, or Infinity when it cannot tell. */
export function sampleCount(scenario: { charges: { path: unknown }[] }): number {
  let total = 0;
  for (const { path } of scenario.charges) {
    const p = path as { kind: string; samples?: number; t?: unknown[] };
    total += p.kind === 'samples' ? (p.t?.length ?? 0) : (p.samples ?? Number.POSITIVE_INFINITY);
  }
  return total;
}
