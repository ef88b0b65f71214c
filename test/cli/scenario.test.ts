import { readFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import { buildCharges, parseScenarioText, sliceSpecOf } from '../../src/io/scenario';
import { runInProcess, scratchFolder, trajectoryText } from './cliSupport';

/** A scenario with two charges: an electron on a 1 cm orbit and a proton drifting at 0.3 c. */
function scenarioDocument(): Record<string, unknown> {
  return {
    format: 'conecast-scenario',
    version: 1,
    title: 'Two charges for the command-line tests',
    invented: true,
    note: 'Invented for the tests.',
    charges: [
      {
        label: 'electron',
        charge: -1.602176634e-19,
        path: {
          kind: 'preset',
          preset: 'circularOrbit',
          params: { radius: 0.01, beta: 0.7 },
          from: 0,
          to: 1.5e-9,
          samples: 301,
        },
      },
      {
        label: 'proton',
        charge: 1.602176634e-19,
        path: {
          kind: 'preset',
          preset: 'uniformMotion',
          params: { beta: 0.3 },
          from: 0,
          to: 1.5e-9,
          samples: 4,
        },
      },
    ],
    view: {
      plane: 'xz',
      center: [0.01, 0, -0.02],
      size: [0.2, 0.1],
      resolution: [12, 8],
      time: 1e-9,
    },
  };
}

const folder = scratchFolder();
afterAll(() => folder.remove());
const scenarioText = JSON.stringify(scenarioDocument(), null, 2);
const scenarioFile = folder.file('two.json', scenarioText);
const scenario = parseScenarioText(scenarioText);
const built = buildCharges(scenario);
// The built paths written out as trajectory CSVs, with every column the scenario produced.
const trajectoryFiles = built.map(({ path }, k) =>
  folder.file(`path${k}.csv`, trajectoryText(path)),
);
const trajectoryArgs = built.flatMap(({ charge }, k) => [
  '--trajectory',
  trajectoryFiles[k],
  '--charge',
  String(charge),
]);
const points = folder.file(
  'points.csv',
  'x,y,z,t\n0.05,0.02,-0.01,1e-9\n-0.1,0.3,0.2,1.2e-9\n0.4,-0.2,0.1,5e-10\n',
);

/** The stderr of a failed run, checked to be exactly one line after an exit code of 2. */
function oneLineFailure(run: { status: number | null; stdout: string; stderr: string }): string {
  expect(run.status).toBe(2);
  expect(run.stdout).toBe('');
  expect(run.stderr.endsWith('\n')).toBe(true);
  expect(run.stderr.trimEnd().split('\n')).toHaveLength(1);
  return run.stderr.trimEnd();
}

describe('conecast fields --scenario', () => {
  it('prints the same digits as the same charges given as trajectory CSVs and --charge', async () => {
    const fromScenario = await runInProcess([
      'fields',
      '--scenario',
      scenarioFile,
      '--points',
      points,
    ]);
    const fromCsv = await runInProcess(['fields', ...trajectoryArgs, '--points', points]);
    expect(fromScenario.stderr).toBe('');
    expect(fromScenario.status).toBe(0);
    expect(fromCsv.status).toBe(0);
    // Round-trip printing and correctly rounded reading give the same doubles, so the same
    // paths and the same text, digit for digit.
    expect(fromScenario.stdout).toBe(fromCsv.stdout);
    expect(fromScenario.stdout.trimEnd().split('\n')).toHaveLength(4);
  });

  it('refuses --scenario together with --trajectory or --charge in one line', async () => {
    const cases = [
      ['fields', '--scenario', scenarioFile, ...trajectoryArgs.slice(0, 4), '--points', points],
      ['fields', '--scenario', scenarioFile, '--charge', 'e', '--points', points],
    ];
    for (const args of cases) {
      expect(oneLineFailure(await runInProcess(args))).toBe(
        'conecast: give the charges either with --scenario FILE.json or with --trajectory and --charge, not both',
      );
    }
  });

  it('refuses trajectory units with --scenario, which is always in SI', async () => {
    const run = await runInProcess([
      'fields',
      '--scenario',
      scenarioFile,
      '--length-unit',
      'mm',
      '--points',
      points,
    ]);
    expect(oneLineFailure(run)).toBe(
      'conecast: --length-unit and --time-unit apply to trajectory files; a scenario is always in SI units',
    );
  });

  it('names the file and the field of a broken scenario in one line', async () => {
    const doc = scenarioDocument();
    const charges = doc.charges as { path: { params: { beta: number } } }[];
    charges[0].path.params.beta = 1.2;
    const bad = folder.file('fast.json', JSON.stringify(doc));
    const message = oneLineFailure(
      await runInProcess(['fields', '--scenario', bad, '--points', points]),
    );
    expect(message).toBe(`conecast: ${bad}: charges[0].path.params.beta: must be below 1`);
  });

  it('names a scenario file that is not JSON', async () => {
    const bad = folder.file('notes.json', 'beta = 0.7\n');
    const message = oneLineFailure(
      await runInProcess(['fields', '--scenario', bad, '--points', points]),
    );
    expect(message.startsWith(`conecast: ${bad}: scenario: not valid JSON`)).toBe(true);
  });

  it('names a missing scenario file', async () => {
    const missing = `${folder.dir}/missing.json`;
    const message = oneLineFailure(
      await runInProcess(['fields', '--scenario', missing, '--points', points]),
    );
    expect(message).toBe(`conecast: cannot read ${missing}: no such file`);
  });

  it('asks for the charges when neither --scenario nor --trajectory is given', async () => {
    const message = oneLineFailure(await runInProcess(['fields', '--points', points]));
    expect(message).toBe(
      'conecast: give the charges with --scenario FILE.json, or at least one --trajectory FILE.csv with its --charge Q',
    );
  });
});

describe('conecast slice --scenario', () => {
  const view = scenario.view;
  const explicitView = [
    '--time',
    String(view.time),
    '--plane',
    view.plane,
    '--center',
    view.center.join(','),
    '--size',
    view.size.join(','),
    '--res',
    view.resolution.join(','),
  ];

  async function sliceJson(args: string[], name: string) {
    const out = `${folder.dir}/${name}.json`;
    const run = await runInProcess(['slice', ...args, '--out', out, '--threads', '1']);
    expect(run.stderr).toBe('');
    expect(run.status).toBe(0);
    return JSON.parse(readFileSync(out, 'utf8'));
  }

  it("takes time, plane, centre, size and grid from the scenario's view", async () => {
    const fromScenario = await sliceJson(['--scenario', scenarioFile], 'view');
    expect(fromScenario.spec).toEqual(sliceSpecOf(view));
    expect(fromScenario.time).toBe(view.time);
    // The same charges and the same geometry spelt out: the same file, to the bit.
    const spelt = await sliceJson([...trajectoryArgs, ...explicitView], 'spelt');
    expect(fromScenario).toEqual(spelt);
  });

  it('lets options given on the command line win over the view', async () => {
    const doc = await sliceJson(
      ['--scenario', scenarioFile, '--time', '1.2e-9', '--res', '5,3', '--plane', 'xy'],
      'override',
    );
    expect(doc.spec).toEqual({
      ...sliceSpecOf(view),
      u: [1, 0, 0],
      v: [0, 1, 0],
      nx: 5,
      ny: 3,
      time: 1.2e-9,
    });
  });

  it('refuses --scenario together with --trajectory in one line', async () => {
    const run = await runInProcess([
      'slice',
      '--scenario',
      scenarioFile,
      ...trajectoryArgs.slice(0, 4),
      '--out',
      `${folder.dir}/both.json`,
    ]);
    expect(oneLineFailure(run)).toBe(
      'conecast: give the charges either with --scenario FILE.json or with --trajectory and --charge, not both',
    );
  });

  it('names the file and the field of a broken scenario in one line', async () => {
    const doc = scenarioDocument();
    (doc.view as { resolution: number[] }).resolution = [0, 8];
    const bad = folder.file('grid.json', JSON.stringify(doc));
    const run = await runInProcess(['slice', '--scenario', bad, '--out', `${folder.dir}/x.json`]);
    expect(oneLineFailure(run)).toBe(`conecast: ${bad}: view.resolution[0]: must be at least 1`);
  });

  it('documents --scenario in the help of both commands', async () => {
    for (const command of ['fields', 'slice']) {
      const run = await runInProcess([command, '--help']);
      expect(run.status).toBe(0);
      expect(run.stdout).toContain('--scenario FILE');
    }
  });
});
