import { describe, expect, it } from 'vitest';
import { defaultMapSettings } from '../../src/io/mapSettings';
import {
  parseScenario,
  parseScenarioText,
  SCENARIO_VERSION,
  ScenarioError,
} from '../../src/io/scenario';
import { formatScenario } from '../../src/io/scenarioText';

/** A version-1 document as the first release wrote it (invented scene). */
function versionOne(): Record<string, unknown> {
  return {
    format: 'conecast-scenario',
    version: 1,
    title: 'Invented: a proton oscillating along x',
    invented: true,
    note: 'Invented for a test.',
    charges: [
      {
        label: 'proton',
        charge: 1.602176634e-19,
        path: {
          kind: 'preset',
          preset: 'lineOscillation',
          params: { amplitude: 0.001, frequency: 1e9 },
          from: 0,
          to: 4e-9,
          samples: 400,
        },
      },
    ],
    view: { plane: 'xy', center: [0, 0, 0], size: [1, 1], resolution: [32, 32], time: 3e-9 },
  };
}

describe('an older scenario version', () => {
  it('migrates a version-1 document to the current version with no probes and default map settings', () => {
    const scenario = parseScenario(versionOne());
    expect(scenario.version).toBe(SCENARIO_VERSION);
    expect(scenario.probes).toEqual([]);
    expect(scenario.display).toEqual(defaultMapSettings());
    expect(scenario.charges[0].path).toEqual((versionOne().charges as { path: unknown }[])[0].path);
  });

  it('refuses a version-1 document that breaks a version-1 rule, naming the field', () => {
    const doc = versionOne();
    (doc.view as Record<string, unknown>).plane = 'uv';
    expect(() => parseScenario(doc)).toThrow('view.plane: must be "xy" or "xz" or "yz"');
  });
});

describe('a newer or foreign document', () => {
  it.each([
    [{ ...versionOne(), version: 3 }, 'version: 3 was written by a newer Conecast'],
    [{ ...versionOne(), version: 1.5 }, 'version: must be a whole number'],
    [{ ...versionOne(), format: undefined }, 'format: must be "conecast-scenario"'],
    [[versionOne()], 'scenario: must be a JSON object'],
    ['conecast-scenario', 'scenario: must be a JSON object'],
  ])('is refused with one line naming the field (%#)', (input, start) => {
    let message = '';
    try {
      parseScenario(input);
    } catch (error) {
      expect(error).toBeInstanceOf(ScenarioError);
      message = (error as Error).message;
    }
    expect(message.startsWith(start)).toBe(true);
    expect(message).not.toContain('\n');
  });
});

describe('formatScenario', () => {
  const current = () => {
    const scenario = parseScenario(versionOne());
    return parseScenario({
      ...scenario,
      probes: [{ name: 'near', position: [0.1, -0.2, 1e-9] as [number, number, number] }],
      charges: [
        {
          ...scenario.charges[0],
          path: {
            kind: 'samples' as const,
            t: [0, 1e-9, 2e-9],
            x: [0, 1e-3, -2.5e-300],
            y: [0.1, 0.2, 0.30000000000000004],
            z: [0, 0, 0],
          },
        },
      ],
    });
  };

  it('reads back to the same document, every number exact', () => {
    const scenario = current();
    const again = parseScenarioText(formatScenario(scenario));
    expect(again).toEqual(scenario);
    const path = again.charges[0].path;
    // Down to the bit: 0.1 + 0.2 and a subnormal-scale value survive the text.
    expect(path.kind === 'samples' && Array.from(path.y)).toEqual([0.1, 0.2, 0.30000000000000004]);
    expect(path.kind === 'samples' && path.x[2]).toBe(-2.5e-300);
  });

  it('holds sample columns as Float64Array and passes them through when parsed again', () => {
    const parsed = current();
    const path = parsed.charges[0].path;
    expect(path.kind === 'samples' && path.t).toBeInstanceOf(Float64Array);
    const again = parseScenario(parsed).charges[0].path;
    // Passed through as they are: an edit elsewhere never copies a million samples.
    expect(again.kind === 'samples' && again.t).toBe(path.kind === 'samples' && path.t);
  });

  it('keeps a list of numbers on one line', () => {
    const text = formatScenario(current());
    expect(text).toContain('"t": [0, 1e-9, 2e-9]');
    expect(text).toContain('"position": [0.1, -0.2, 1e-9]');
    expect(text.endsWith('}\n')).toBe(true);
  });
});

describe('the samples of a whole scenario', () => {
  it('are at most four million, named on the charges', () => {
    const doc = versionOne();
    const charge = (doc.charges as Record<string, unknown>[])[0];
    const heavy = { ...charge, path: { ...(charge.path as object), samples: 1_000_000 } };
    doc.charges = [heavy, heavy, heavy, heavy];
    expect(parseScenario(doc).charges).toHaveLength(4);
    doc.charges = [heavy, heavy, heavy, heavy, { ...heavy, path: { ...heavy.path, samples: 2 } }];
    expect(() => parseScenario(doc)).toThrow(
      'charges: the paths hold 4000002 samples in all, more than the 4000000 a scenario may hold',
    );
  });
});

describe('a samples path column', () => {
  const withColumn = (x: unknown) => {
    const doc = versionOne();
    (doc.charges as Record<string, unknown>[])[0].path = {
      kind: 'samples',
      t: [0, 1, 2],
      x,
      y: [0, 0, 0],
      z: [0, 0, 0],
    };
    return doc;
  };

  it.each([
    [[0, 'a', 2], 'charges[0].path.x[1]: must be a number'],
    [[0, null, 2], 'charges[0].path.x[1]: must be a number'],
    ['0,1,2', 'charges[0].path.x: must be a list of numbers'],
    [[], 'charges[0].path.x: must hold at least 1 value'],
    [undefined, 'charges[0].path.x: is missing'],
  ])('names the first bad value of %j', (x, expected) => {
    expect(() => parseScenario(withColumn(x))).toThrow(expected);
  });

  it('accepts a million samples, the most a path may hold', () => {
    const n = 1_000_000;
    const t = Array.from({ length: n }, (_, i) => i * 1e-12);
    const zero = new Array<number>(n).fill(0);
    const doc = versionOne();
    (doc.charges as Record<string, unknown>[])[0].path = {
      kind: 'samples',
      t,
      x: zero,
      y: zero,
      z: zero,
    };
    expect(parseScenario(doc).charges[0].path.kind).toBe('samples');
    (doc.charges as Record<string, unknown>[])[0].path = {
      kind: 'samples',
      t: [...t, n * 1e-12],
      x: zero,
      y: zero,
      z: zero,
    };
    expect(() => parseScenario(doc)).toThrow('charges[0].path.t: must hold at most 1000000 values');
  });
});
