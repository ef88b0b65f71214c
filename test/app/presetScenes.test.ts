import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { PRESET_FORMS, presetPath } from '../../app/scenario/presetScenes';
import { buildCharges, type PresetName, parseScenario } from '../../src/io/scenario';
import { SPEED_OF_LIGHT as c } from '../../src/physics/constants';

const demo = JSON.parse(
  readFileSync(new URL('../../public/scenarios/demo.json', import.meta.url), 'utf8'),
);
const PRESETS = Object.keys(PRESET_FORMS) as PresetName[];

/** The demo document with its one charge on `preset` and the view the preset's scene asks for. */
function documentFor(preset: PresetName, params: Record<string, number>) {
  const { view } = PRESET_FORMS[preset].scene(params);
  return {
    ...demo,
    charges: [{ ...demo.charges[0], path: presetPath(preset, params) }],
    view: { ...view, resolution: demo.view.resolution },
  };
}

describe('preset scenes', () => {
  it.each(PRESETS)('%s: the defaults give one value per parameter', (preset) => {
    const form = PRESET_FORMS[preset];
    expect(Object.keys(form.defaults).sort()).toEqual(form.params.map((p) => p.key).sort());
  });

  it.each(PRESETS)('%s: the defaults build into a valid scenario', (preset) => {
    const { defaults } = PRESET_FORMS[preset];
    const scene = PRESET_FORMS[preset].scene(defaults);
    const scenario = parseScenario(documentFor(preset, defaults));
    const [charge] = buildCharges(scenario);
    // The last sample time is from + (n − 1)·step in doubles: 1e-12 of the span covers it.
    const [start, end] = charge.path.timeSpan;
    const slack = 1e-12 * (scene.to - scene.from);
    expect(Math.abs(start - scene.from)).toBeLessThanOrEqual(slack);
    expect(Math.abs(end - scene.to)).toBeLessThanOrEqual(slack);
    expect(charge.path.count).toBe(scene.samples);
  });

  it.each(PRESETS)('%s: the view is positive and its time is one the slider offers', (preset) => {
    const { from, to, view } = PRESET_FORMS[preset].scene(PRESET_FORMS[preset].defaults);
    expect(view.size[0]).toBeGreaterThan(0);
    expect(view.size[1]).toBeGreaterThan(0);
    // Slider span: samples plus the light-crossing time of the view diagonal (distance / c,
    // c exact by SI definition). Compared exactly: the scene's times are what the slider uses.
    const crossing = Math.hypot(view.size[0], view.size[1]) / c;
    expect(view.time).toBeGreaterThanOrEqual(from);
    expect(view.time).toBeLessThanOrEqual(to + crossing);
  });

  it.each([
    [0.01, 0.7], // the defaults
    [0.01, 0.05],
    [1, 0.99],
    [1e-4, 0.3],
  ])(
    'samples a circular orbit of radius %f m at β = %f over at least 3 periods',
    (radius, beta) => {
      const params = { radius, beta };
      const scene = PRESET_FORMS.circularOrbit.scene(params);
      // Uniform circular motion: period = 2πρ / (βc).
      const period = (2 * Math.PI * radius) / (beta * c);
      // 1e-12 relative: the scene computes the same period, rounding only.
      expect(scene.to - scene.from).toBeGreaterThanOrEqual(3 * period * (1 - 1e-12));
      expect(() => parseScenario(documentFor('circularOrbit', params))).not.toThrow();
    },
  );

  it('gives presetPath the span and samples of the scene', () => {
    const params = { beta: 0.5 };
    const { from, to, samples } = PRESET_FORMS.uniformMotion.scene(params);
    expect(presetPath('uniformMotion', params)).toEqual({
      kind: 'preset',
      preset: 'uniformMotion',
      params,
      from,
      to,
      samples,
    });
  });
});
