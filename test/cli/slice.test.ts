import { readFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import { sliceGeometry } from '../../src/cli/sliceOptions';
import { slicePoint, type Triple } from '../../src/engine/sliceSpec';
import { decodeNpyFloat32 } from '../../src/io/npy';
import { sampleMotion } from '../../src/path/analyticMotion';
import { circularOrbit } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';
import { ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../../src/physics/constants';
import { fieldSample } from '../../src/physics/fieldSample';
import { evaluateFields } from '../../src/physics/fields';
import { CONECAST_VERSION } from '../../src/version';
import { runCli, scratchFolder, trajectoryText } from './cliSupport';

const radius = 0.01;
const beta = 0.7;
const period = (2 * Math.PI * radius) / (beta * SPEED_OF_LIGHT);
const columns = sampleMotion(circularOrbit(radius, beta), -3 * period, period, 600);
const folder = scratchFolder();
const trajectory = folder.file('orbit.csv', trajectoryText(columns));
const charges = [{ charge: -ELEMENTARY_CHARGE, path: new SampledPath(columns) }];
const time = 0.25 * period;
const common = [
  '--trajectory',
  trajectory,
  '--charge',
  '-e',
  '--time',
  String(time),
  '--plane',
  'xy',
  '--center',
  '0.001,0,0',
  '--size',
  '0.1,0.08',
  '--res',
  '24,16',
];
const spec = sliceGeometry('xy', '0.001,0,0', '0.1,0.08', '24,16', time);

afterAll(() => folder.remove());

function worstAgainstPointFields(get: (p: number, component: number) => number): number {
  const out = fieldSample();
  const point: Triple = [0, 0, 0];
  let worst = 0;
  for (let j = 0; j < spec.ny; j += 3) {
    for (let i = 0; i < spec.nx; i += 5) {
      slicePoint(spec, i, j, point);
      evaluateFields(charges, point[0], point[1], point[2], time, out);
      const ref = [out.ex, out.ey, out.ez];
      const p = j * spec.nx + i;
      const got = [get(p, 0), get(p, 1), get(p, 2)];
      worst = Math.max(
        worst,
        Math.hypot(got[0] - ref[0], got[1] - ref[1], got[2] - ref[2]) / Math.hypot(...ref),
      );
    }
  }
  return worst;
}

describe('conecast slice', () => {
  it('writes a NumPy file of shape ny × nx × 3 that matches conecast fields, with its description beside it', () => {
    const out = `${folder.dir}/e.npy`;
    const run = runCli(['slice', ...common, '--out', out, '--stats']);
    expect(run.stderr).toMatch(/^\{"points":384,"ms":[\d.]+,"threads":\d+,"samples":600\}\n$/);
    expect(run.status).toBe(0);
    const npy = decodeNpyFloat32(new Uint8Array(readFileSync(out)));
    expect(npy.shape).toEqual([16, 24, 3]);
    expect(npy.fortranOrder).toBe(false);
    // float32 storage: relative rounding 6e-8; the contract is 1e-6.
    expect(worstAgainstPointFields((p, c) => npy.data[3 * p + c])).toBeLessThan(1e-6);
    const sidecar = JSON.parse(readFileSync(`${out}.json`, 'utf8'));
    expect(sidecar.components).toEqual(['Ex', 'Ey', 'Ez']);
    expect(sidecar.units.Ex).toBe('V/m');
    expect(sidecar.conecast).toBe(CONECAST_VERSION);
    expect(sidecar.time).toBe(time);
    expect(sidecar.spec.nx).toBe(24);
  });

  it('writes CSV with positions and named components, and JSON with every component of all', () => {
    const csvOut = `${folder.dir}/e.csv`;
    expect(runCli(['slice', ...common, '--out', csvOut, '--threads', '1']).status).toBe(0);
    const lines = readFileSync(csvOut, 'utf8').trimEnd().split('\n');
    const comments = lines.filter((l) => l.startsWith('#'));
    expect(comments.join('\n')).toContain(`conecast ${CONECAST_VERSION}`);
    expect(comments.join('\n')).toContain('Ex V/m');
    const rows = lines.filter((l) => !l.startsWith('#'));
    expect(rows[0]).toBe('x,y,z,Ex,Ey,Ez');
    const values = rows.slice(1).map((r) => r.split(',').map(Number));
    expect(values).toHaveLength(384);
    const point: Triple = [0, 0, 0];
    slicePoint(spec, 5, 2, point);
    expect(values[2 * 24 + 5].slice(0, 3)).toEqual(point);
    expect(worstAgainstPointFields((p, c) => values[p][3 + c])).toBeLessThan(1e-6);

    const jsonOut = `${folder.dir}/all.json`;
    expect(runCli(['slice', ...common, '--out', jsonOut, '--quantity', 'all']).status).toBe(0);
    const doc = JSON.parse(readFileSync(jsonOut, 'utf8'));
    expect(doc.components).toEqual([
      'Ex',
      'Ey',
      'Ez',
      'Bx',
      'By',
      'Bz',
      'Ex_rad',
      'Ey_rad',
      'Ez_rad',
      'Sx',
      'Sy',
      'Sz',
      'delay',
      'on_charge',
    ]);
    expect(doc.units.Sx).toBe('W/m^2');
    expect(worstAgainstPointFields((p, c) => doc.data[['Ex', 'Ey', 'Ez'][c]][p])).toBeLessThan(
      1e-6,
    );
  });

  it('says in one line what is wrong with a bad plane, size or output', () => {
    const badPlane = runCli([
      'slice',
      ...common.slice(0, 6),
      '--plane',
      '0,0,0;1,0,0;1,1,0',
      '--size',
      '1,1',
      '--res',
      '2,2',
      '--out',
      `${folder.dir}/x.npy`,
    ]);
    expect(badPlane.status).toBe(2);
    expect(badPlane.stderr).toMatch(/^conecast: option --plane: U and V must be orthogonal/);
    const badOut = runCli(['slice', ...common, '--out', `${folder.dir}/x.txt`]);
    expect(badOut.stderr).toBe(
      `conecast: option --out: "${folder.dir}/x.txt" must end in .npy, .csv or .json\n`,
    );
  });

  it('reads a custom plane as ORIGIN;U;V and moves the centre onto it', () => {
    const custom = sliceGeometry('0,0,1;1,1,0;0,0,2', '5,5,5', '1,2', '3,4', 0);
    expect(custom.u[0]).toBeCloseTo(Math.SQRT1_2, 15);
    expect(custom.v).toEqual([0, 0, 1]);
    // Normal is (1,-1,0)/√2: the centre (5,5,5) already lies on the plane x = y through the origin.
    expect(custom.center).toEqual([5, 5, 5]);
  });
});
