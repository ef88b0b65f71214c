import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/io/inputError';
import { sampleMotion } from '../../src/path/analyticMotion';
import { type PathState, pathState } from '../../src/path/pathState';
import { circularOrbit } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';
import { parseTrajectory } from '../../src/path/trajectoryCsv';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';

/** The InputError that parsing `text` as beam.csv throws (fails when nothing is thrown). */
function trajectoryError(text: string): InputError {
  try {
    parseTrajectory(text, 'beam.csv');
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

/** The state with -0 read as 0: CSV text drops the sign of zero. */
function withoutSignedZero(state: PathState): PathState {
  const out = { ...state };
  for (const key of Object.keys(out) as (keyof PathState)[]) out[key] += 0;
  return out;
}

const NAMES = ['t', 'x', 'y', 'z', 'vx', 'vy', 'vz', 'ax', 'ay', 'az'] as const;

describe('parseTrajectory', () => {
  it('builds the same path as the columns it was written from', () => {
    const columns = sampleMotion(circularOrbit(0.5, 0.6), 0, 2e-9, 9);
    const rows = [NAMES.join(',')];
    for (let i = 0; i < 9; i++) {
      rows.push(NAMES.map((name) => String(columns[name]![i])).join(','));
    }
    const fromCsv = parseTrajectory(`${rows.join('\n')}\n`, 'orbit.csv');
    const direct = new SampledPath(columns);
    const a = pathState();
    const b = pathState();
    for (const t of [-1e-9, 0, 3.3e-10, 1.7e-9, 5e-9]) {
      fromCsv.stateAt(t, a);
      direct.stateAt(t, b);
      // Shortest round-trip printing makes the CSV lossless (but for the sign of zero), so
      // the paths agree bit for bit.
      expect(withoutSignedZero(a)).toEqual(withoutSignedZero(b));
    }
  });

  it('takes columns in any order and fills missing derivatives from the spline', () => {
    const path = parseTrajectory('z,y,x,t\n0,0,0,0\n0,0,1,1\n0,0,2,2\n', 'beam.csv');
    expect([...path.x]).toEqual([0, 1, 2]);
    // Positions on a straight line at 1 m/s: the spline's knot velocities are exact to rounding.
    expect(path.vx[1]).toBeCloseTo(1, 12);
    expect(path.ax[1]).toBeCloseTo(0, 12);
  });

  it('keeps given velocities and accelerations', () => {
    const path = parseTrajectory(
      't,x,y,z,vx,vy,vz,ax,ay,az\n0,0,0,0,1,2,3,4,5,6\n1,1,2,3,1,2,3,4,5,6\n',
      'beam.csv',
    );
    expect([path.vy[0], path.az[1]]).toEqual([2, 6]);
  });

  it('names the file line and column of times that do not increase', () => {
    const text = 't,x,y,z\n# start\n0,0,0,0\n\n1e-9,0,0,0\n# a gap\n1e-9,0,0,0\n';
    const error = trajectoryError(text);
    expect(error.message).toMatch(/^beam\.csv line 7, column "t": times must increase strictly/);
    expect(error.line).toBe(7);
    expect(error.column).toBe('t');
  });

  it('names the line of a sample moving faster than light', () => {
    const rows = ['t,x,y,z,vx,vy,vz'];
    for (let i = 0; i < 4; i++) rows.push(`${i * 1e-9},0,0,0,0,0,0`);
    rows.push('# too fast');
    rows.push('4e-9,0,0,0,299798454,0,0');
    const error = trajectoryError(rows.join('\n'));
    expect(error.message).toMatch(
      /^beam\.csv line 7, columns "vx", "vy", "vz": speed reaches 1\.00002 c at sample 5 \(counting from 1/,
    );
    expect(error.line).toBe(7);
  });

  it('points at the positions when a spline velocity reaches light speed', () => {
    const error = trajectoryError('t,x,y,z\n0,0,0,0\n1e-9,0.5,0,0\n');
    expect(error.message).toMatch(/^beam\.csv line 2, columns "x", "y", "z": speed reaches /);
    expect(error.message).toMatch(/velocities here come from a spline through x, y, z\)$/);
  });

  it('requires each derivative group whole', () => {
    expect(trajectoryError('t,x,y,z,ax,az\n0,0,0,0,0,0\n').message).toBe(
      'beam.csv line 1, column "ay": missing; ax, ay, az must be given together or not at all',
    );
  });

  it('requires at least one sample', () => {
    expect(trajectoryError('t,x,y,z\n').message).toBe(
      'beam.csv: no samples: a trajectory needs at least one data row',
    );
  });

  it('reports csv errors with the trajectory’s column names', () => {
    expect(trajectoryError('t,x,y\n').message).toBe(
      'beam.csv line 1: missing column "z"; header has t, x, y',
    );
    expect(trajectoryError('t,x,y,z,w\n').message).toBe(
      'beam.csv line 1, column "w": unknown column; allowed: t, x, y, z, vx, vy, vz, bgx, bgy, bgz, ax, ay, az',
    );
  });
});

describe('trajectory units and βγ columns', () => {
  it('reads lengths in mm and times in ns as the same path in SI', () => {
    const si = parseTrajectory(
      't,x,y,z,vx,vy,vz\n0,0,0,0,1e8,0,0\n1e-9,0.1,0,0,1e8,0,0\n',
      'si.csv',
    );
    // 1e8 m/s = 100 mm/ns; 0.1 m = 100 mm; 1e-9 s = 1 ns.
    const scaled = parseTrajectory(
      't,x,y,z,vx,vy,vz\n0,0,0,0,100,0,0\n1,100,0,0,100,0,0\n',
      'mm-ns.csv',
      { length: 'mm', time: 'ns' },
    );
    const a = pathState();
    const b = pathState();
    si.stateAt(0.4e-9, a);
    scaled.stateAt(0.4e-9, b);
    // Unit factors 1e-3 and 1e-9 are not exact in binary: a few ulps apart.
    for (const key of ['px', 'vx', 'ax'] as const) {
      expect(b[key]).toBeCloseTo(a[key], 12 - Math.round(Math.log10(Math.abs(a[key]) || 1)));
    }
  });

  it('turns βγ into velocity v = cβγ/√(1 + |βγ|²), exact to the last digits at γ = 10⁴', () => {
    // Uniform motion along x with βγ = √(γ² − 1) at γ = 10⁴ (Jackson 3rd ed. §11.3: p = γmv).
    const gamma = 1e4;
    const u = Math.sqrt(gamma * gamma - 1);
    const c = SPEED_OF_LIGHT;
    const beta = u / Math.sqrt(1 + u * u);
    const text = `t,x,y,z,bgx,bgy,bgz\n0,0,0,0,${u},0,0\n1e-9,${beta * c * 1e-9},0,0,${u},0,0\n`;
    const path = parseTrajectory(text, 'fast.csv');
    const s = pathState();
    path.stateAt(0.5e-9, s);
    // 1 − β = 1/(2γ²) + 1/(8γ⁴) + … = 5.0000000125e-9 (series of 1 − √(1 − 1/γ²)). A double
    // near c is spaced 6e-8 m/s, 4e-8 of c·(1 − β): the tolerance allows that rounding.
    expect(Math.abs((c - s.vx) / c / 5.0000000125e-9 - 1)).toBeLessThan(1e-7);
  });

  it('refuses βγ too large to square in a double as too close to c, not as rest', () => {
    // |βγ|² overflows past about 1.3e154. Found by test/path/trajectoryCsv.property.test.ts,
    // which read 1e200 as v = 0.
    for (const row of ['1e200,0,0', '-3e200,4e200,0', '1.7976931348623157e308,0,1']) {
      expect(trajectoryError(`t,x,y,z,bgx,bgy,bgz\n0,0,0,0,${row}\n1,1,0,0,1,0,0\n`).message).toBe(
        'beam.csv line 2, columns "bgx", "bgy", "bgz": γ = beyond 1e154 is too close to c for a velocity in double precision (it rounds to c above γ ≈ 6.7e7)',
      );
    }
  });

  it('refuses a γ whose velocity rounds to c, and takes one just below', () => {
    // 1 − β ≈ 1/(2γ²) meets the spacing of doubles near 1 (1.1e-16) at γ ≈ 6.7e7 (from the
    // definition of γ; the spacing is IEEE 754 binary64's 2⁻⁵³).
    expect(trajectoryError('t,x,y,z,bgx,bgy,bgz\n0,0,0,0,1e8,0,0\n').message).toBe(
      'beam.csv line 2, columns "bgx", "bgy", "bgz": γ = 1.00e+8 is too close to c for a velocity in double precision (it rounds to c above γ ≈ 6.7e7)',
    );
    const path = parseTrajectory('t,x,y,z,bgx,bgy,bgz\n0,0,0,0,3e7,0,0\n', 'ok.csv');
    expect(path.maxSpeed).toBeLessThan(SPEED_OF_LIGHT);
  });

  it('refuses velocities given twice, naming both groups', () => {
    expect(trajectoryError('t,x,y,z,vx,vy,vz,bgx,bgy,bgz\n0,0,0,0,0,0,0,0,0,0\n').message).toBe(
      'beam.csv line 1, columns "vx", "vy", "vz", "bgx", "bgy", "bgz": give the velocity once: as vx, vy, vz or as βγ in bgx, bgy, bgz, not both',
    );
  });

  it('names half a βγ group', () => {
    expect(trajectoryError('t,x,y,z,bgx,bgy\n0,0,0,0,0,0\n').message).toBe(
      'beam.csv line 1, column "bgz": missing; bgx, bgy, bgz must be given together or not at all',
    );
  });
});
