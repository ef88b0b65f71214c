import { readFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import { buildCharges, parseScenarioText } from '../../src/io/scenario';
import { COULOMB_CONSTANT, SPEED_OF_LIGHT } from '../../src/physics/constants';
import { fieldSample } from '../../src/physics/fieldSample';
import { evaluateFields, poyntingVector } from '../../src/physics/fields';
import { vec3 } from '../../src/physics/vec3';
import { outputRows, runInProcess, scratchFolder } from './cliSupport';

const demoText = readFileSync(new URL('../../public/scenarios/demo.json', import.meta.url), 'utf8');
const scratch = scratchFolder();
const demo = scratch.file('demo.json', demoText);
const charges = buildCharges(parseScenarioText(demoText));
afterAll(() => scratch.remove());

describe('conecast probe', () => {
  it('writes E, B and S at the probe for evenly spaced times, equal to the field evaluation', async () => {
    const run = await runInProcess([
      'probe',
      '--scenario',
      demo,
      '--at',
      '0.05,0.02,0',
      '--from',
      '5e-10',
      '--to',
      '1e-9',
      '--samples',
      '11',
    ]);
    expect(run.stderr).toBe('');
    const { header, rows } = outputRows(run.stdout);
    expect(header).toBe(
      't_s,Ex_V_per_m,Ey_V_per_m,Ez_V_per_m,Bx_T,By_T,Bz_T,Sx_W_per_m2,Sy_W_per_m2,Sz_W_per_m2',
    );
    expect(rows).toHaveLength(11);
    expect(rows[0][0]).toBe(5e-10);
    // Both ends are included; the last time differs from 1e-9 by rounding of the step only.
    expect(Math.abs(rows[10][0] - 1e-9)).toBeLessThan(1e-24);
    const sample = fieldSample();
    const s = vec3();
    for (const row of rows) {
      evaluateFields(charges, 0.05, 0.02, 0, row[0], sample);
      poyntingVector(s, sample);
      // The same code on the same doubles: exactly equal.
      expect(row.slice(1)).toEqual([
        sample.ex,
        sample.ey,
        sample.ez,
        sample.bx,
        sample.by,
        sample.bz,
        s.x,
        s.y,
        s.z,
      ]);
    }
  });

  it('chooses the sampling itself when --samples is left out, and says why on standard error', async () => {
    const run = await runInProcess([
      'probe',
      '--scenario',
      demo,
      '--at',
      '0.05,0,0',
      '--from',
      '0',
      '--to',
      '1e-9',
    ]);
    expect(run.status).toBe(0);
    expect(run.stderr).toMatch(/^conecast probe: \d+ samples; .+/);
    const n = outputRows(run.stdout).rows.length;
    expect(n & (n - 1)).toBe(0);
  });

  it('writes the energy spectral density with its units in the header', async () => {
    const run = await runInProcess([
      'probe',
      '--scenario',
      demo,
      '--at',
      '0.5,0,0',
      '--from',
      '2e-9',
      '--to',
      '3e-9',
      '--samples',
      '256',
      '--spectrum',
    ]);
    const { header, rows } = outputRows(run.stdout);
    expect(header).toBe('f_Hz,energy_spectral_density_J_per_m2_Hz');
    expect(rows).toHaveLength(129);
    expect(rows.every(([f, d]) => f >= 0 && d >= 0)).toBe(true);
  });

  it('refuses a sample count that is not a power of two for a spectrum, and a window that ends before it starts', async () => {
    const odd = await runInProcess([
      'probe',
      '--scenario',
      demo,
      '--at',
      '0,0,1',
      '--from',
      '0',
      '--to',
      '1e-9',
      '--samples',
      '100',
      '--spectrum',
    ]);
    expect(odd.status).toBe(2);
    expect(odd.stderr).toMatch(/power of two/);
    const backwards = await runInProcess([
      'probe',
      '--scenario',
      demo,
      '--at',
      '0,0,1',
      '--from',
      '1e-9',
      '--to',
      '0',
    ]);
    expect(backwards.status).toBe(2);
    expect(backwards.stderr).toMatch(/--to 0 must be after --from 1e-9/);
    const nowhere = await runInProcess([
      'probe',
      '--scenario',
      demo,
      '--from',
      '0',
      '--to',
      '1e-9',
    ]);
    expect(nowhere.stderr).toMatch(/give --at X,Y,Z/);
  });
});

describe('conecast power', () => {
  it('gives the Liénard power of a circular orbit, (2/3) k q² c β⁴ γ⁴ / ρ²', async () => {
    const run = await runInProcess(['power', '--scenario', demo, '--source-time', '3e-10']);
    const { header, rows } = outputRows(run.stdout);
    expect(header).toBe('source_time_s,power_W');
    const beta = 0.7;
    const gamma = 1 / Math.sqrt(1 - beta * beta);
    const q = -1.602176634e-19;
    // Jackson, Classical Electrodynamics 3rd ed., Eq. 14.44 (circular motion, SI form).
    const expected =
      ((2 / 3) * COULOMB_CONSTANT * q * q * SPEED_OF_LIGHT * beta ** 4 * gamma ** 4) / 0.01 ** 2;
    // 3e-10 s is a sample time, where the path holds the exact acceleration: rounding only.
    expect(Math.abs(rows[0][1] / expected - 1)).toBeLessThan(1e-9);
  });

  it('writes the pattern in a plane, strongest along the velocity, per source and per observer time', async () => {
    const run = await runInProcess([
      'power',
      '--scenario',
      demo,
      '--source-time',
      '0',
      '--pattern',
      '--angles',
      '720',
    ]);
    const lines = run.stdout.trimEnd().split('\n');
    expect(lines[0]).toMatch(/^# Liénard power at source time 0 s: [\d.e+-]+ W$/);
    const { header, rows } = outputRows(lines.slice(1).join('\n'));
    expect(header).toBe('angle_rad,dP_dOmega_source_W_per_sr,dP_dOmega_observer_W_per_sr');
    expect(rows).toHaveLength(720);
    // At t = 0 the charge is at (ρ, 0, 0) moving along +y: the observer-time peak is at 90°.
    const peak = rows.reduce((best, row) => (row[2] > best[2] ? row : best));
    expect(Math.abs(peak[0] - Math.PI / 2)).toBeLessThan((2 * Math.PI) / 720 + 1e-12);
    // Per observer time is per source time over κ = 1 − n·β: larger ahead of the charge.
    expect(peak[2]).toBeGreaterThan(peak[1]);
  });

  it('asks which charge when a scenario holds several', async () => {
    const two = JSON.parse(demoText);
    two.charges.push({ ...two.charges[0], label: 'second' });
    const file = scratch.file('two.json', JSON.stringify(two));
    const run = await runInProcess(['power', '--scenario', file, '--source-time', '0']);
    expect(run.status).toBe(2);
    expect(run.stderr).toMatch(/2 charges given; choose one with --which K/);
    const chosen = await runInProcess([
      'power',
      '--scenario',
      file,
      '--which',
      '2',
      '--source-time',
      '0',
    ]);
    expect(chosen.status).toBe(0);
  });
});
