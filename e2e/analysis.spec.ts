import { expect, test } from '@playwright/test';
import { collectErrors, mapDrawn, snapshot } from './support/workbench';

const PRESETS = [
  'uniformMotion',
  'lineOscillation',
  'circularOrbit',
  'brakingToRest',
  'constantProperAcceleration',
  'undulatorWiggle',
  'transverseKick',
] as const;

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await mapDrawn(page);
  await page.getByRole('button', { name: 'Dismiss cautions' }).click();
});

test('a probe opens its pulse and its spectrum, with the critical frequency of the orbit marked', async ({
  page,
}) => {
  const errors = collectErrors(page);
  await page.getByRole('tab', { name: 'Pulse at probe' }).click();
  await expect(page.getByText('Select or place a probe to see what it records')).toBeVisible();
  await page.getByRole('button', { name: 'Place probe' }).click();
  const box = await page.getByTestId('slice-overlay').boundingBox();
  if (box === null) throw new Error('no overlay');
  await page.mouse.click(box.x + box.width * 0.85, box.y + box.height * 0.5);
  const chart = page.getByTestId('pulse-chart');
  await expect(chart.locator('canvas')).toBeVisible();
  await expect(page.getByTestId('sampling-note')).toContainText(/\d+ samples\. step .+s/);
  await expect(chart).toHaveAttribute('aria-label', /V\/m/);
  await page.getByLabel('Quantity of the pulse').selectOption('S');
  await expect(chart).toHaveAttribute('aria-label', /W\/m²/);
  await chart.scrollIntoViewIfNeeded();
  await snapshot(page, '12-pulse');

  await page.getByRole('tab', { name: 'Spectrum at probe' }).click();
  const spectrum = page.getByTestId('spectrum-chart');
  await expect(spectrum.locator('canvas')).toBeVisible();
  await expect(spectrum).toHaveAttribute('aria-label', /J\/\(m²·Hz\)/);
  await expect(page.getByText('Dashed: the frequency the path predicts.')).toBeVisible();
  await page.getByLabel('FFT window').selectOption('none');
  await expect(spectrum.locator('canvas')).toBeVisible();
  await spectrum.scrollIntoViewIfNeeded();
  await snapshot(page, '13-spectrum');
  expect(errors).toEqual([]);
});

test('the power and pattern views work for every preset', async ({ page }) => {
  test.setTimeout(120_000);
  const errors = collectErrors(page);
  for (const preset of PRESETS) {
    const before = await mapDrawn(page);
    await page.getByLabel('Preset motion').selectOption(preset);
    if (preset !== 'circularOrbit')
      await expect(page.getByTestId('field-view')).not.toHaveAttribute('data-map-id', before);
    await mapDrawn(page);
    await page.getByRole('tab', { name: 'Radiated power' }).click();
    await expect(page.getByTestId('power-summary')).toContainText(
      /peak .+W, energy radiated over the path .+J/,
    );
    await expect(page.getByTestId('power-chart').locator('canvas')).toBeVisible();
    await page.getByTestId('power-chart').scrollIntoViewIfNeeded();
    await snapshot(page, `14-power-${preset}`);
    await page.getByRole('tab', { name: 'Angular pattern' }).click();
    await expect(page.getByTestId('pattern-plot').locator('polygon')).toHaveCount(1);
    await expect(page.getByTestId('pattern-note')).toContainText('1/γ');
    await page.getByTestId('pattern-plot').scrollIntoViewIfNeeded();
    await snapshot(page, `15-pattern-${preset}`);
  }
  await page.getByText('per unit observer time').click();
  await expect(page.getByTestId('pattern-note')).toContainText('what a detector collects');
  await page.getByRole('button', { name: 'Orbit 3D' }).click();
  await mapDrawn(page);
  await snapshot(page, '16-pattern-sphere-3d');
  expect(errors).toEqual([]);
});

test('two charges on one path radiate four times one alone', async ({ page }) => {
  const errors = collectErrors(page);
  await page.getByRole('button', { name: 'Add a charge' }).click();
  await mapDrawn(page);
  await page.getByRole('tab', { name: 'Radiated power' }).click();
  await page.getByRole('button', { name: /^Compare all charges together/ }).click();
  // Equal charges on the same path: the fields add, so the power is 4× one and 2× the sum.
  await expect(page.getByTestId('coherence')).toContainText('(ratio 2.00');
  await page.getByTestId('coherence').scrollIntoViewIfNeeded();
  await snapshot(page, '17-coherence');
  expect(errors).toEqual([]);
});
