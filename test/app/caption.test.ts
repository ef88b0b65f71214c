import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { scenarioCaption } from '../../app/export/caption';
import { parseScenarioText } from '../../src/io/scenario';

const demo = parseScenarioText(
  readFileSync(new URL('../../public/scenarios/demo.json', import.meta.url), 'utf8'),
);

describe('the caption of a picture', () => {
  it('gives every preset parameter with its own unit', () => {
    expect(scenarioCaption(demo)).toEqual([
      'electron (-160.2 zC): circular orbit, Radius ρ = 10.00 mm, β = 0.7',
      'Invented scenario, for illustration.',
    ]);
  });
});
