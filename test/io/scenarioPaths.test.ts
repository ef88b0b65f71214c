import { describe, expect, it } from 'vitest';
import { buildCharges, parseScenario } from '../../src/io/scenario';

function doc(path: Record<string, unknown>): Record<string, unknown> {
  return {
    format: 'conecast-scenario',
    version: 2,
    title: 'invented test scene',
    invented: true,
    note: '',
    charges: [{ label: 'e', charge: -1.602176634e-19, path }],
    view: { plane: 'xy', center: [0, 0, 0], size: [1, 1], resolution: [8, 8], time: 0 },
  };
}

const orbit = (beta: number) => ({
  kind: 'preset',
  preset: 'circularOrbit',
  params: { radius: 0.01, beta },
  from: 0,
  to: 1e-9,
  samples: 300,
});

describe('building the paths of a parsed document', () => {
  it('reuses the path built for the same preset, though parsing made new objects', () => {
    const first = parseScenario(doc(orbit(0.5)));
    const again = parseScenario(doc(orbit(0.5)));
    expect(again.charges[0].path).not.toBe(first.charges[0].path);
    expect(buildCharges(again)[0].path).toBe(buildCharges(first)[0].path);
  });

  it('builds afresh when a parameter changes', () => {
    const a = buildCharges(parseScenario(doc(orbit(0.5))))[0].path;
    const b = buildCharges(parseScenario(doc(orbit(0.6))))[0].path;
    expect(b).not.toBe(a);
    expect(b.maxSpeed).toBeGreaterThan(a.maxSpeed);
  });

  it('reuses a samples path only while every column is the same array', () => {
    // Columns as a parsed document holds them (Float64Array), which parsing passes through.
    const t = Float64Array.of(0, 1, 2, 3);
    const x = Float64Array.of(0, 1, 2, 3);
    const zero = new Float64Array(4);
    const samples = (xs: Float64Array) => ({ kind: 'samples', t, x: xs, y: zero, z: zero });
    const a = buildCharges(parseScenario(doc(samples(x))))[0].path;
    expect(buildCharges(parseScenario(doc(samples(x))))[0].path).toBe(a);
    const moved = buildCharges(parseScenario(doc(samples(Float64Array.of(0, 1, 2, 4)))))[0].path;
    expect(moved).not.toBe(a);
    expect(moved.x[3]).toBe(4);
  });

  it('reads list columns from a file into Float64Array once, then passes them through', () => {
    const first = parseScenario(
      doc({ kind: 'samples', t: [0, 1], x: [0, 1], y: [0, 0], z: [0, 0] }),
    );
    const path = first.charges[0].path;
    expect(path.kind === 'samples' && path.t).toBeInstanceOf(Float64Array);
    const again = parseScenario(first);
    expect(buildCharges(again)[0].path).toBe(buildCharges(first)[0].path);
  });
});
