import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sampleMotion } from '../../src/path/analyticMotion';
import { circularOrbit, lineOscillation } from '../../src/path/presets';
import { type PathColumns, SampledPath } from '../../src/path/sampledPath';
import { ELEMENTARY_CHARGE, VACUUM_PERMEABILITY } from '../../src/physics/constants';
import { type FieldSample, fieldSample } from '../../src/physics/fieldSample';
import { evaluateFields } from '../../src/physics/fields';
import {
  type CliRun,
  outputRows,
  runCli,
  runInProcess,
  scratchFolder,
  trajectoryText,
} from './cliSupport';

const HEADER = 'x,y,z,t,t_ret,Ex,Ey,Ez,Bx,By,Bz,Ex_rad,Ey_rad,Ez_rad,Sx,Sy,Sz,on_charge';
const e = ELEMENTARY_CHARGE;

// An orbit sampled with exact derivatives on [0, 2 ns] (it radiates), and an oscillation given
// by positions only, so the path model builds its derivatives from the spline.
const ORBIT = sampleMotion(circularOrbit(0.05, 0.5), 0, 2e-9, 201);
const WIGGLE = sampleMotion(lineOscillation(0.01, 4e8), 0, 2e-9, 81, false);

/** Points with their own times: inside the sampled span, on the charge, before and after it. */
const TIMED_POINTS = [
  [0.3, 0.1, -0.2, 1.5e-9],
  [-0.4, 0.25, 0.05, 1.9e-9],
  [0.05, 0, 0, 0],
  [0.6, -0.3, 0.2, 2e-8],
  [-0.2, 0.5, 0.1, -5e-9],
];
const LATE_ROW = 3;
const EARLY_ROW = 4;
const GRID = [
  [0.3, 0.2, 0.1],
  [-0.25, -0.3, 0.4],
  [0.1, 0.6, -0.2],
];

/** The orbit with t in ns, x, y, z in mm, velocities in mm/ns (1 mm/ns = 1e6 m/s) and accelerations in mm/ns² (1e15 m/s²). */
function inMillimetresAndNanoseconds(): PathColumns {
  return {
    t: Array.from(ORBIT.t, (t) => t * 1e9),
    x: Array.from(ORBIT.x, (x) => x * 1e3),
    y: Array.from(ORBIT.y, (y) => y * 1e3),
    z: Array.from(ORBIT.z, (z) => z * 1e3),
    vx: Array.from(ORBIT.vx!, (v) => v * 1e-6),
    vy: Array.from(ORBIT.vy!, (v) => v * 1e-6),
    vz: Array.from(ORBIT.vz!, (v) => v * 1e-6),
    // 1 mm/ns² = 1e15 m/s².
    ax: Array.from(ORBIT.ax!, (a) => a * 1e-15),
    ay: Array.from(ORBIT.ay!, (a) => a * 1e-15),
    az: Array.from(ORBIT.az!, (a) => a * 1e-15),
  };
}

/** Field components in the CLI's column order, from E through the Poynting vector. */
function fieldColumns(f: FieldSample): number[] {
  const m = 1 / VACUUM_PERMEABILITY;
  return [
    f.ex,
    f.ey,
    f.ez,
    f.bx,
    f.by,
    f.bz,
    f.erx,
    f.ery,
    f.erz,
    (f.ey * f.bz - f.ez * f.by) * m,
    (f.ez * f.bx - f.ex * f.bz) * m,
    (f.ex * f.by - f.ey * f.bx) * m,
  ];
}

/** Fields of one charge on `path` at (r, t), computed in this process. */
function inProcess(charge: number, path: SampledPath, r: number[], t: number): FieldSample {
  return evaluateFields([{ charge, path }], r[0], r[1], r[2], t, fieldSample());
}

/** The path's straight-line continuation from sample k: one knot, so always extrapolated. */
function straightLineFrom(columns: PathColumns, k: number): SampledPath {
  const at = (name: keyof PathColumns) => [columns[name]![k]];
  return new SampledPath({
    t: at('t'),
    x: at('x'),
    y: at('y'),
    z: at('z'),
    vx: at('vx'),
    vy: at('vy'),
    vz: at('vz'),
    ax: [0],
    ay: [0],
    az: [0],
  });
}

function relativeDistance(a: number[], b: number[]): number {
  let diff = 0;
  let size = 0;
  for (let i = 0; i < a.length; i++) {
    diff = Math.max(diff, Math.abs(a[i] - b[i]));
    size = Math.max(size, Math.abs(b[i]));
  }
  return diff / size;
}

/** The stderr of a failed run, checked to be exactly one line after an exit code of 2. */
function oneLineFailure(run: CliRun): string {
  expect(run.status).toBe(2);
  expect(run.stdout).toBe('');
  expect(run.stderr.endsWith('\n')).toBe(true);
  expect(run.stderr.trimEnd().split('\n')).toHaveLength(1);
  return run.stderr.trimEnd();
}

describe('conecast fields', () => {
  const scratch = scratchFolder();
  let orbitFile = '';
  let wiggleFile = '';
  let timedFile = '';
  let gridFile = '';

  beforeAll(() => {
    orbitFile = scratch.file('orbit.csv', trajectoryText(ORBIT));
    wiggleFile = scratch.file('wiggle.csv', trajectoryText(WIGGLE));
    timedFile = scratch.file(
      'timed.csv',
      `# x,y,z in m, t in s\nx,y,z,t\n${TIMED_POINTS.map((p) => p.join(',')).join('\n')}\n`,
    );
    gridFile = scratch.file(
      'grid.csv',
      `x,y,z\r\n${GRID.map((p) => p.join(',')).join('\r\n')}\r\n`,
    );
  });

  afterAll(() => scratch.remove());

  describe('with one charge and per-point times', () => {
    let run: CliRun;
    beforeAll(() => {
      run = runCli(['fields', '--trajectory', orbitFile, '--charge', '-e', '--points', timedFile]);
    });

    it('writes the header row first and one row per point in input order', () => {
      expect(run.stderr).toBe('');
      expect(run.status).toBe(0);
      const { header, rows } = outputRows(run.stdout);
      expect(header).toBe(HEADER);
      expect(rows.map((row) => row.slice(0, 4))).toEqual(TIMED_POINTS);
    });

    it('matches evaluateFields called in this process exactly', () => {
      const path = new SampledPath(ORBIT);
      const { rows } = outputRows(run.stdout);
      for (let i = 0; i < TIMED_POINTS.length; i++) {
        const point = TIMED_POINTS[i];
        const f = inProcess(-e, path, point, point[3]);
        // Same code on the same doubles, printed in round-trip form: equal to the last bit
        // (but for the sign of zero, which String() drops).
        const expected = [f.tRet, ...fieldColumns(f), f.onCharge ? 1 : 0].map((v) => v + 0);
        expect(rows[i].slice(4)).toEqual(expected);
      }
      expect(rows[0][11]).not.toBe(0);
    });

    it('flags a point on the charge and writes zero fields there', () => {
      const row = outputRows(run.stdout).rows[2];
      expect(row[17]).toBe(1);
      expect(row.slice(5, 17).every((value) => value === 0)).toBe(true);
    });

    it('continues the path in a straight line before and after the samples', () => {
      const { rows } = outputRows(run.stdout);
      const cases = [
        { row: LATE_ROW, knot: ORBIT.t.length - 1 },
        { row: EARLY_ROW, knot: 0 },
      ];
      for (const { row, knot } of cases) {
        const point = TIMED_POINTS[row];
        const reference = inProcess(-e, straightLineFrom(ORBIT, knot), point, point[3]);
        const [t0, tN] = [ORBIT.t[0], ORBIT.t[ORBIT.t.length - 1]];
        expect(rows[row][4] < t0 || rows[row][4] > tN).toBe(true);
        // The retarded-time bracket depends on the path's top speed, so the two solves take
        // different steps to the same root: agreement to rounding, not to the bit.
        expect(relativeDistance(rows[row].slice(5, 17), fieldColumns(reference))).toBeLessThan(
          1e-12,
        );
        expect(Math.abs(rows[row][4] - reference.tRet)).toBeLessThan(1e-12 * Math.abs(point[3]));
        // Straight-line motion does not radiate.
        expect(rows[row].slice(11, 14)).toEqual([0, 0, 0]);
      }
    });
  });

  it('superposes two charges and reports the first charge’s retarded time', () => {
    const time = 1.2e-9;
    const q2 = 3.2e-19;
    const run = runCli([
      'fields',
      `--trajectory=${orbitFile}`,
      '--charge=-e',
      '--trajectory',
      wiggleFile,
      '--charge',
      String(q2),
      '--points',
      gridFile,
      '--time',
      String(time),
    ]);
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
    const { header, rows } = outputRows(run.stdout);
    expect(header).toBe(HEADER);
    const orbit = new SampledPath(ORBIT);
    const wiggle = new SampledPath(WIGGLE);
    for (let i = 0; i < GRID.length; i++) {
      const f1 = inProcess(-e, orbit, GRID[i], time);
      const f2 = inProcess(q2, wiggle, GRID[i], time);
      expect(rows[i].slice(0, 5)).toEqual([...GRID[i], time, f1.tRet]);
      const sum = fieldSample();
      for (const key of ['ex', 'ey', 'ez', 'bx', 'by', 'bz', 'erx', 'ery', 'erz'] as const) {
        sum[key] = f1[key] + f2[key];
      }
      // One addition per component: a few units in the last place of the larger term.
      const scale = Math.max(...fieldColumns(f1).slice(0, 9).map(Math.abs));
      const out = rows[i].slice(5, 14);
      const expected = fieldColumns(sum).slice(0, 9);
      for (let k = 0; k < 9; k++)
        expect(Math.abs(out[k] - expected[k])).toBeLessThan(1e-15 * scale);
      // S is a product of summed fields, so compare it relative to its own size.
      expect(relativeDistance(rows[i].slice(14, 17), fieldColumns(sum).slice(9))).toBeLessThan(
        1e-14,
      );
      expect(rows[i][17]).toBe(0);
    }
  });

  it('stops with one line naming file, line and column for non-increasing times', () => {
    const bad = scratch.file(
      'beam.csv',
      't,x,y,z\n# start\n0,0,0,0\n\n1e-9,0,0,0\n2e-9,0,0,0\n2e-9,0,0,0\n',
    );
    const message = oneLineFailure(
      runCli([
        'fields',
        '--trajectory',
        bad,
        '--charge',
        '1e-9',
        '--points',
        gridFile,
        '--time',
        '0',
      ]),
    );
    const prefix = `conecast: ${bad} line 7, column "t": times must increase strictly`;
    expect(message.slice(0, prefix.length)).toBe(prefix);
  });

  it('stops with one line naming file, line and column for a bad point', () => {
    const bad = scratch.file('points.csv', 'x,y,z\n1,2,3\n4,abc,6\n');
    const message = oneLineFailure(
      runCli([
        'fields',
        '--trajectory',
        orbitFile,
        '--charge',
        'e',
        '--points',
        bad,
        '--time',
        '0',
      ]),
    );
    expect(message).toBe(`conecast: ${bad} line 3, column "y": not a number: "abc"`);
  });

  it('reads a trajectory written in mm and ns as the same charge in SI', async () => {
    const inMmNs = inMillimetresAndNanoseconds();
    const scaledFile = scratch.file('orbit-mm-ns.csv', trajectoryText(inMmNs));
    const si = await runInProcess([
      'fields',
      '--trajectory',
      orbitFile,
      '--charge',
      '-e',
      '--points',
      timedFile,
    ]);
    const scaled = await runInProcess([
      'fields',
      '--trajectory',
      scaledFile,
      '--charge',
      '-e',
      '--points',
      timedFile,
      '--length-unit',
      'mm',
      '--time-unit',
      'ns',
    ]);
    expect(scaled.stderr).toBe('');
    const a = outputRows(si.stdout).rows;
    const b = outputRows(scaled.stdout).rows;
    expect(b).toHaveLength(a.length);
    // Writing and reading back through unit factors rounds each sample by a few ulps; the
    // fields follow to well within 1e-9 relative of the largest component.
    for (let r = 0; r < a.length; r++) {
      const scale = Math.max(...a[r].slice(5, 11).map(Math.abs));
      for (let c = 5; c < 11; c++) {
        expect(Math.abs(b[r][c] - a[r][c])).toBeLessThanOrEqual(1e-9 * scale);
      }
    }
  });

  it('warns on standard error when a file seems read in the wrong units, and still answers', async () => {
    // The orbit in mm and ns with its velocity as βγ, read as m and s: the positions then move
    // 1e-6 as far per step as βγ says (mm/ns read as m/s), as in the app's import preview.
    const mmNs = inMillimetresAndNanoseconds();
    const c = 299_792_458;
    const rows = ['t,x,y,z,bgx,bgy,bgz'];
    for (let i = 0; i < ORBIT.t.length; i++) {
      const [vx, vy, vz] = [ORBIT.vx![i], ORBIT.vy![i], ORBIT.vz![i]];
      const gamma = 1 / Math.sqrt(1 - (vx * vx + vy * vy + vz * vz) / (c * c));
      const momentum = [(gamma * vx) / c, (gamma * vy) / c, (gamma * vz) / c];
      rows.push([mmNs.t[i], mmNs.x[i], mmNs.y[i], mmNs.z[i], ...momentum].join(','));
    }
    const scaledFile = scratch.file('orbit-mm-ns-momentum.csv', `${rows.join('\n')}\n`);
    const run = await runInProcess([
      'fields',
      '--trajectory',
      scaledFile,
      '--charge',
      '-e',
      '--points',
      timedFile,
    ]);
    expect(run.status).toBe(0);
    expect(run.stderr).toBe(
      `conecast: warning: ${scaledFile}: the positions move 1.00e-6 times as far per step as the velocities say; check --length-unit and --time-unit (now m and s)\n`,
    );
    const right = await runInProcess([
      ...['fields', '--trajectory', scaledFile, '--charge', '-e', '--points', timedFile],
      ...['--length-unit', 'mm', '--time-unit', 'ns'],
    ]);
    expect(right.stderr).toBe('');
  });

  it.each([
    [['--length-unit', 'inch'], '--length-unit "inch" is not one of nm, µm, um, mm, cm, m, km'],
    [['--time-unit', 'min'], '--time-unit "min" is not one of as, fs, ps, ns, µs, us, ms, s'],
  ])('refuses an unknown unit %j in one line', async (extra, expected) => {
    const run = await runInProcess([
      'fields',
      '--trajectory',
      orbitFile,
      '--charge',
      '-e',
      '--points',
      gridFile,
      '--time',
      '0',
      ...extra,
    ]);
    expect(run.status).toBe(2);
    expect(run.stderr).toBe(`conecast: ${expected}\n`);
  });

  it('names a missing trajectory file', () => {
    const missing = `${scratch.dir}/beam-missing.csv`;
    const message = oneLineFailure(
      runCli([
        'fields',
        '--trajectory',
        missing,
        '--charge',
        'e',
        '--points',
        gridFile,
        '--time',
        '0',
      ]),
    );
    expect(message).toBe(`conecast: cannot read ${missing}: no such file`);
  });
});

describe('conecast help', () => {
  it('lists the fields command, the units and where to find the columns', () => {
    const run = runCli(['--help']);
    expect(run.status).toBe(0);
    for (const text of ['conecast <command>', 'fields', 'V/m', 'W/m^2', 'conecast help fields']) {
      expect(run.stdout).toContain(text);
    }
    // Every command is listed with its summary.
    for (const command of ['fields', 'slice', 'probe', 'power']) {
      expect(run.stdout).toMatch(new RegExp(`^  ${command} +\\S`, 'm'));
    }
  });

  it('describes every option, column and unit of fields', () => {
    const run = runCli(['fields', '--help']);
    expect(run.status).toBe(0);
    const expected = [
      '--trajectory',
      '--charge',
      '--points',
      '--time',
      'coulombs',
      'e or -e',
      HEADER,
      't_ret',
      'vx,vy,vz',
      'bgx,bgy,bgz',
      'ax,ay,az',
      '--length-unit',
      '--time-unit',
      'm/s^2',
      'V/m',
      'W/m^2',
      'on_charge',
      'straight line',
    ];
    for (const text of expected) expect(run.stdout).toContain(text);
  });
});
