import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseCsvTable } from '../../src/io/csvTable';
import { InputError } from '../../src/io/inputError';
import { type ImportedTrajectory, importTrajectory } from '../../src/io/trajectoryImport';
import {
  LENGTH_UNITS,
  type LengthUnitName,
  TIME_UNITS,
  type TimeUnitName,
  type TrajectoryUnits,
} from '../../src/io/trajectoryUnits';
import type { SampledPath } from '../../src/path/sampledPath';
import { parseTrajectory, TRAJECTORY_SCHEMA } from '../../src/path/trajectoryCsv';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';
import { anyText } from '../support/codePoints';
import { must, mustBeOneLine } from '../support/propertyChecks';

// Property tests of the two trajectory CSV readers (the CLI's parseTrajectory and the app's
// importTrajectory) on malformed and hostile files. The only error either may throw is an
// InputError whose one-line message starts with the file name and, when it names a line,
// names one the text has; whatever they accept is a path the field engine can use.

const c = SPEED_OF_LIGHT;
const RUNS = 10_000;
const COLUMNS = ['t', 'x', 'y', 'z', 'vx', 'vy', 'vz', 'bgx', 'bgy', 'bgz', 'ax', 'ay', 'az'];
const PATH_COLUMNS = ['t', 'x', 'y', 'z', 'vx', 'vy', 'vz', 'ax', 'ay', 'az'] as const;

/** Cells a broken or hostile file may hold where a number belongs. */
const HOSTILE_CELLS = [
  '',
  ' ',
  'NaN',
  'nan',
  'Infinity',
  '-Infinity',
  'inf',
  '1e400',
  '-1e400',
  '1e-400',
  '1e308',
  '-1.7976931348623157e308',
  '5e-324',
  '-0',
  '+0',
  '0x10',
  '0b1',
  '1_000',
  '1e',
  '1e+',
  '.',
  '-',
  '+',
  '--1',
  '1.2.3',
  '1 2',
  '١٢٣',
  '１２',
  '"1"',
  "'1'",
  '\u00a01',
  '1\u00a0',
  '1e99999999999999999999',
  '9'.repeat(400),
  `0.${'0'.repeat(400)}1`,
  '1e200',
  '-3e160',
  '1.5e154',
  '1e20',
  'true',
  'null',
  '#',
  '\r',
  '\t1\t',
  '1\r2',
  '\u2028',
  '\u2029',
  '\uFEFF1',
  'e5',
  '.e1',
  '1.e1',
  '__proto__',
  'constructor',
  '1;2',
  '1\t2',
];

/** Header names a file may give: the real ones and near misses. */
const HEADER_NAMES = [
  ...COLUMNS,
  ...COLUMNS.map((name) => `"${name}"`),
  ...COLUMNS.map((name) => ` ${name} `),
  'T',
  'X',
  'Vx',
  'time',
  '"',
  '""',
  '" t "',
  '',
  '1',
  '-0',
  '__proto__',
  'constructor',
  'prototype',
  'toString',
  'hasOwnProperty',
  'x\r',
  'x\ry',
  'z\u2028',
  '#t',
  't;x',
];

/** Pieces of a trajectory file: names, numbers, separators, line ends, comments, marks. */
const CSV_TOKENS = fc.constantFrom(
  ...HEADER_NAMES,
  ...HOSTILE_CELLS,
  '0',
  '1',
  '2.5',
  '-1e-9',
  '3e8',
  ',',
  ',',
  ',',
  ', ',
  ',,',
  ';',
  '\t',
  '\n',
  '\n',
  '\r\n',
  '\r',
  '# note\n',
  '   \n',
  '\uFEFF',
  '\0',
);

/** Headers a soup may start with, so it gets past the header row often. */
const SOUP_HEADERS = [
  '',
  't,x,y,z\n',
  't,x,y,z,vx,vy,vz\n',
  'x,y,z,t,bgx,bgy,bgz,ax,ay,az\n',
  '\uFEFF# made by hand\nt , x,y ,z\r\n',
  't,x,y,z,vx,vy,vz,bgx,bgy,bgz\n',
  't,x,y,z,vx,vy\n',
];

const UNITS: fc.Arbitrary<TrajectoryUnits> = fc.record({
  length: fc.constantFrom(...(Object.keys(LENGTH_UNITS) as LengthUnitName[])),
  time: fc.constantFrom(...(Object.keys(TIME_UNITS) as TimeUnitName[])),
});

/** File names as users have them: spaces, quotes, other scripts, words that look like places. */
const FILE_NAME = fc.oneof(
  fc.constantFrom('beam.csv', 'my beam (2).csv', 'trajectory line 3.csv', 'ü"x".csv', ''),
  anyText(12).filter((name) => !/[\n\r\u2028\u2029]/.test(name)),
);

/** A whole file: raw code points or a soup of CSV pieces, maybe behind a good header. */
const RANDOM_TEXT = fc.oneof(
  anyText(200),
  fc
    .tuple(fc.constantFrom(...SOUP_HEADERS), fc.string({ unit: CSV_TOKENS, maxLength: 60 }))
    .map(([header, soup]) => header + soup),
);

interface Motion {
  velocity: 'none' | 'velocity' | 'momentum' | 'both';
  accelerations: boolean;
  shape: 'line' | 'circle';
  beta: number;
  direction: [number, number, number];
  rows: number;
  /** Angle turned per step on a circle, or a scale for the step on a line. */
  step: number;
  jitter: number[];
  format: 'shortest' | 'exponential' | 'precision';
  digits: number;
  order: number[];
  layout: { bom: boolean; crlf: boolean; comments: number[]; finalNewline: boolean };
}

const MOTION: fc.Arbitrary<Motion> = fc.record({
  velocity: fc.constantFrom('none', 'velocity', 'momentum', 'both'),
  accelerations: fc.boolean(),
  shape: fc.constantFrom('line', 'circle'),
  beta: fc.double({ min: 0, max: 0.95, noNaN: true }),
  direction: fc.tuple(
    fc.double({ min: -1, max: 1, noNaN: true }),
    fc.double({ min: -1, max: 1, noNaN: true }),
    fc.double({ min: -1, max: 1, noNaN: true }),
  ),
  rows: fc.integer({ min: 1, max: 16 }),
  step: fc.double({ min: 1e-3, max: 1.5, noNaN: true }),
  jitter: fc.array(fc.double({ min: 0, max: 0.5, noNaN: true }), { minLength: 16, maxLength: 16 }),
  format: fc.constantFrom('shortest', 'exponential', 'precision'),
  digits: fc.integer({ min: 1, max: 17 }),
  order: fc.array(fc.nat(), { minLength: 13, maxLength: 13 }),
  layout: fc.record({
    bom: fc.boolean(),
    crlf: fc.boolean(),
    comments: fc.array(fc.nat(20), { maxLength: 3 }),
    finalNewline: fc.boolean(),
  }),
});

interface Mutation {
  kind:
    | 'cell'
    | 'dropCell'
    | 'addCell'
    | 'swapLines'
    | 'duplicateLine'
    | 'insertLine'
    | 'deleteLine'
    | 'joinLines'
    | 'splitLine'
    | 'header';
  a: number;
  b: number;
  token: string;
}

const MUTATION: fc.Arbitrary<Mutation> = fc.record({
  kind: fc.constantFrom(
    'cell',
    'cell',
    'cell',
    'dropCell',
    'addCell',
    'swapLines',
    'duplicateLine',
    'insertLine',
    'deleteLine',
    'joinLines',
    'splitLine',
    'header',
  ),
  a: fc.nat(),
  b: fc.nat(),
  token: fc.oneof(
    fc.constantFrom(...HOSTILE_CELLS, ...HEADER_NAMES),
    fc.double().map(String),
    fc.string({ unit: 'binary-ascii', maxLength: 6 }),
  ),
});

/** Writes a number the way the motion's format says. */
function write(value: number, motion: Motion): string {
  if (motion.format === 'exponential') return value.toExponential(motion.digits - 1);
  if (motion.format === 'precision') return value.toPrecision(motion.digits);
  return String(value);
}

/**
 * The lines of a plausible trajectory file in the given units: a straight line or a circle at
 * a speed below c, with velocities (as v or βγ) and accelerations when the motion asks.
 */
function trajectoryLines(motion: Motion, units: TrajectoryUnits): string[] {
  const metres = LENGTH_UNITS[units.length];
  const seconds = TIME_UNITS[units.time];
  const [dx, dy, dz] = motion.direction;
  const norm = Math.sqrt(dx * dx + dy * dy + dz * dz) || 1;
  const speed = motion.beta * c;
  // One step takes about a nanosecond on a line; a circle turns motion.step radians per step.
  const radius = 0.01;
  const omega = speed / radius || 1e9;
  const dt = motion.shape === 'circle' ? motion.step / omega : motion.step * 1e-9;
  const names = ['t', 'x', 'y', 'z'];
  if (motion.velocity === 'velocity' || motion.velocity === 'both') names.push('vx', 'vy', 'vz');
  if (motion.velocity === 'momentum' || motion.velocity === 'both') {
    names.push('bgx', 'bgy', 'bgz');
  }
  if (motion.accelerations) names.push('ax', 'ay', 'az');
  const order = names
    .map((name, k) => ({ name, key: motion.order[k] }))
    .sort((p, q) => p.key - q.key)
    .map((entry) => entry.name);
  const gamma = 1 / Math.sqrt(1 - motion.beta * motion.beta);
  const lines = [order.join(',')];
  let t = 0;
  for (let i = 0; i < motion.rows; i++) {
    t += dt * (1 + motion.jitter[i]);
    const s: Record<string, number> = { t };
    if (motion.shape === 'line') {
      const v = [(speed * dx) / norm, (speed * dy) / norm, (speed * dz) / norm];
      Object.assign(s, { x: v[0] * t, y: v[1] * t, z: v[2] * t, vx: v[0], vy: v[1], vz: v[2] });
      Object.assign(s, { ax: 0, ay: 0, az: 0 });
    } else {
      const phase = omega * t;
      const [cos, sin] = [Math.cos(phase), Math.sin(phase)];
      Object.assign(s, { x: radius * cos, y: radius * sin, z: 0 });
      Object.assign(s, { vx: -speed * sin, vy: speed * cos, vz: 0 });
      Object.assign(s, { ax: -omega * speed * cos, ay: -omega * speed * sin, az: 0 });
    }
    s.bgx = (gamma * s.vx) / c;
    s.bgy = (gamma * s.vy) / c;
    s.bgz = (gamma * s.vz) / c;
    const scale: Record<string, number> = {
      t: seconds,
      x: metres,
      y: metres,
      z: metres,
      vx: metres / seconds,
      vy: metres / seconds,
      vz: metres / seconds,
      ax: metres / seconds ** 2,
      ay: metres / seconds ** 2,
      az: metres / seconds ** 2,
      bgx: 1,
      bgy: 1,
      bgz: 1,
    };
    lines.push(order.map((name) => write(s[name] / scale[name], motion)).join(','));
  }
  for (const at of motion.layout.comments) {
    lines.splice(at % (lines.length + 1), 0, at % 2 === 0 ? '# comment, 1, 2' : '  ');
  }
  return lines;
}

function mutate(lines: string[], mutation: Mutation): string[] {
  const out = [...lines];
  if (out.length === 0) return [mutation.token];
  const i = mutation.a % out.length;
  const j = mutation.b % out.length;
  const cells = out[i].split(',');
  const k = mutation.b % cells.length;
  switch (mutation.kind) {
    case 'cell':
      cells[k] = mutation.token;
      out[i] = cells.join(',');
      break;
    case 'dropCell':
      cells.splice(k, 1);
      out[i] = cells.join(',');
      break;
    case 'addCell':
      cells.splice(k, 0, mutation.token);
      out[i] = cells.join(',');
      break;
    case 'swapLines':
      [out[i], out[j]] = [out[j], out[i]];
      break;
    case 'duplicateLine':
      out.splice(j, 0, out[i]);
      break;
    case 'insertLine':
      out.splice(i, 0, mutation.token);
      break;
    case 'deleteLine':
      out.splice(i, 1);
      break;
    case 'joinLines':
      if (i + 1 < out.length) out.splice(i, 2, out[i] + mutation.token + out[i + 1]);
      break;
    case 'splitLine': {
      const at = mutation.b % (out[i].length + 1);
      out.splice(i, 1, out[i].slice(0, at), out[i].slice(at));
      break;
    }
    case 'header': {
      const header = out[0].split(',');
      header[mutation.b % header.length] = mutation.token;
      out[0] = header.join(',');
      break;
    }
  }
  return out;
}

/** A plausible file with up to four edits, and the units to read it in. */
const NEAR_VALID = fc
  .record({ motion: MOTION, units: UNITS, mutations: fc.array(MUTATION, { maxLength: 4 }) })
  .map(({ motion, units, mutations }) => {
    let lines = trajectoryLines(motion, units);
    for (const mutation of mutations) lines = mutate(lines, mutation);
    const { bom, crlf, finalNewline } = motion.layout;
    const text =
      (bom ? '\uFEFF' : '') + lines.join(crlf ? '\r\n' : '\n') + (finalNewline ? '\n' : '');
    return { text, units };
  });

/** Checks what a path the readers accepted must be: finite, in time order, below c. */
function mustBeUsable(path: SampledPath | ImportedTrajectory['path']): void {
  const n = path.t.length;
  for (const name of PATH_COLUMNS) {
    const column = path[name];
    must(column.length === n, `column ${name} has ${column.length} values, t has ${n}`);
    for (let i = 0; i < n; i++) {
      must(Number.isFinite(column[i]), `accepted a path whose ${name}[${i}] is ${column[i]}`);
    }
  }
  for (let i = 1; i < n; i++)
    must(path.t[i] > path.t[i - 1], `accepted times out of order at ${i}`);
  must(path.maxSpeed >= 0 && path.maxSpeed < c, `accepted a maximum speed of ${path.maxSpeed} m/s`);
}

/** Checks that an error is an InputError whose message is one line and names a real place. */
function mustBeInputError(error: unknown, text: string, file: string): InputError {
  if (!(error instanceof InputError)) throw error;
  const message = error.message;
  mustBeOneLine(message);
  must(message.startsWith(file) && error.file === file, `does not start with the file: ${message}`);
  const where = message.slice(file.length);
  if (error.line > 0) {
    must(/^ line \d+[:,]/.test(where), `names no line: ${message}`);
    must(
      where.startsWith(` line ${error.line}`),
      `names a line other than ${error.line}: ${message}`,
    );
    must(
      error.line <= text.split('\n').length,
      `names line ${error.line}, past the end: ${message}`,
    );
  } else {
    must(!where.startsWith(' line '), `names a line but has line 0: ${message}`);
  }
  return error;
}

/**
 * The speed βγ columns give at each sample: |v|/c = |βγ|/√(1 + |βγ|²), computed here so that
 * no square overflows. It rounds to 1 past |βγ| ≈ 1e8, where the reader may refuse the speed or
 * keep one within rounding of c.
 */
function betaFromMomentum(ux: number, uy: number, uz: number): number {
  const size = Math.max(Math.abs(ux), Math.abs(uy), Math.abs(uz));
  if (size === 0) return 0;
  const [sx, sy, sz] = [ux / size, uy / size, uz / size];
  const u = size * Math.sqrt(sx * sx + sy * sy + sz * sz);
  return 1 / Math.sqrt(1 + 1 / (u * u));
}

/**
 * Reads `text` with both readers and checks the outcome; they must agree, since the app and
 * the CLI read the same files. Returns whether the file was accepted.
 */
function checkBothReaders(text: string, file: string, units: TrajectoryUnits): boolean {
  let path: SampledPath | undefined;
  let failure: InputError | undefined;
  try {
    path = parseTrajectory(text, file, units);
  } catch (error) {
    failure = mustBeInputError(error, text, file);
  }
  let imported: ImportedTrajectory | undefined;
  try {
    imported = importTrajectory(text, file, units);
  } catch (error) {
    const refused = mustBeInputError(error, text, file);
    must(refused.message === failure?.message, `the readers disagree: ${refused.message}`);
  }
  if (path === undefined || imported === undefined) {
    must(path === undefined && imported === undefined, 'one reader accepted, the other refused');
    return false;
  }
  mustBeUsable(path);
  mustBeUsable(imported.path);
  const { summary } = imported;
  must(summary.rows === path.count, `the summary counts ${summary.rows} rows, not ${path.count}`);
  for (const name of PATH_COLUMNS) {
    const [a, b] = [path[name], imported.path[name]];
    for (let i = 0; i < a.length; i++) {
      must(Object.is(a[i], b[i]), `the readers disagree on ${name}[${i}]`);
    }
  }
  must(summary.maxBeta < 1 && Number.isFinite(summary.maxGamma), `γ = ${summary.maxGamma}`);
  const table = parseCsvTable(text, file, TRAJECTORY_SCHEMA);
  if (table.has('bgx')) {
    const [ux, uy, uz] = [table.column('bgx'), table.column('bgy'), table.column('bgz')];
    for (let i = 0; i < path.count; i++) {
      const expected = betaFromMomentum(ux[i], uy[i], uz[i]);
      const got = Math.sqrt(path.vx[i] ** 2 + path.vy[i] ** 2 + path.vz[i] ** 2) / c;
      // A handful of roundings in each formula: 1e-12 of c is far above them and far below
      // any real disagreement.
      must(
        Math.abs(got - expected) <= 1e-12,
        `βγ = (${ux[i]}, ${uy[i]}, ${uz[i]}) at row ${i + 1} gave |v| = ${got} c, not ${expected} c`,
      );
    }
  }
  return true;
}

describe('trajectory CSV readers on generated files', () => {
  // Guards against crashes (TypeError, RangeError) and stray messages on arbitrary bytes and on
  // soups of CSV pieces: empty files, odd line ends, stray quotes, control characters.
  it('refuse 10,000 random texts only with a one-line InputError that names a real line', () => {
    let tried = 0;
    fc.assert(
      fc.property(RANDOM_TEXT, FILE_NAME, UNITS, (text, file, units) => {
        tried++;
        checkBothReaders(text, file, units);
      }),
      { numRuns: RUNS, seed: 0x7a1e },
    );
    expect(tried).toBeGreaterThanOrEqual(RUNS);
  });

  // Guards against accepting a broken path (a non-finite column, times out of order, a speed
  // of c or more, βγ read wrongly) and against crashes on almost-right files: a cell replaced
  // by NaN, 1e400 or text, a cell too many or too few, rows swapped, repeated or split.
  it('read 10,000 edited trajectories as usable paths or refuse them with an InputError', () => {
    let tried = 0;
    let accepted = 0;
    fc.assert(
      fc.property(NEAR_VALID, FILE_NAME, ({ text, units }, file) => {
        tried++;
        if (checkBothReaders(text, file, units)) accepted++;
      }),
      { numRuns: RUNS, seed: 0x5eed },
    );
    expect(tried).toBeGreaterThanOrEqual(RUNS);
    // Both outcomes must be exercised for the property to mean anything.
    expect(accepted).toBeGreaterThan(RUNS / 10);
    expect(accepted).toBeLessThan(RUNS);
  });
});
