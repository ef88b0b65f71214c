import { expect, type Page, test } from '@playwright/test';

/** Console errors and uncaught exceptions seen by the page. */
function collectErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(message.text());
  });
  page.on('pageerror', (error) => errors.push(error.message));
  return errors;
}

/** Colour statistics of the field view's WebGL canvas, read back through a 2D canvas. */
async function canvasColours(page: Page) {
  return page.evaluate(() => {
    const source = document.querySelector<HTMLCanvasElement>('[data-testid="field-view"] canvas');
    if (source === null) throw new Error('no canvas in the field view');
    const copy = document.createElement('canvas');
    copy.width = source.width;
    copy.height = source.height;
    const context = copy.getContext('2d');
    if (context === null) throw new Error('no 2D context');
    context.drawImage(source, 0, 0);
    const { data } = context.getImageData(0, 0, copy.width, copy.height);
    const distinct = new Set<number>();
    let lit = 0;
    const pixels = data.length / 4;
    for (let p = 0; p < pixels; p++) {
      const r = data[4 * p];
      const g = data[4 * p + 1];
      const b = data[4 * p + 2];
      distinct.add((r << 16) | (g << 8) | b);
      // Brighter than the near-black the empty canvas is cleared to.
      if (r + g + b > 90) lit++;
    }
    return {
      width: copy.width,
      height: copy.height,
      distinct: distinct.size,
      litShare: lit / pixels,
    };
  });
}

test('opens the demo scenario and draws its field map', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/');

  const view = page.getByTestId('field-view');
  await expect(view).toHaveAttribute('data-ready', 'true', { timeout: 20_000 });

  await expect(page.getByTestId('scenario-title')).toHaveText(
    'Electron on a 1 cm circular orbit at β = 0.7',
  );
  await expect(page.getByText('Invented example')).toBeVisible();
  await expect(page.getByTestId('observation-time')).toHaveText('t = 1.000 ns');
  await expect(page.getByTestId('field-range')).toContainText('V/m');

  const cautions = page.getByRole('region', { name: 'Cautions' });
  await expect(cautions).toContainText('Synchrotron light is ionizing radiation');
  await expect(cautions).toContainText('not a shielding, dose or exposure assessment');
  await expect(cautions).toContainText('radiation-safety officer');

  const colours = await canvasColours(page);
  expect(colours.width).toBeGreaterThan(200);
  expect(colours.distinct).toBeGreaterThan(100);
  expect(colours.litShare).toBeGreaterThan(0.1);

  await page.screenshot({ path: 'test-results/app-demo.png', fullPage: true });
  expect(errors).toEqual([]);
});

test('cautions can be dismissed and reopened from the keyboard', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/');
  const cautions = page.getByRole('region', { name: 'Cautions' });
  await expect(cautions).toBeVisible();

  await page.getByRole('button', { name: 'Dismiss cautions' }).focus();
  await page.keyboard.press('Enter');
  await expect(cautions).toHaveCount(0);
  const toggle = page.getByRole('button', { name: 'Show cautions' });
  await expect(toggle).toBeFocused();

  await page.keyboard.press('Enter');
  await expect(cautions).toBeVisible();
  await expect(cautions).toBeFocused();
  expect(errors).toEqual([]);
});

test('the observation time follows the slider and the map is redrawn', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/');
  const view = page.getByTestId('field-view');
  await expect(view).toHaveAttribute('data-ready', 'true', { timeout: 20_000 });
  const firstMap = await view.getAttribute('data-map-id');

  const slider = page.getByRole('slider', { name: 'Observation time' });
  await slider.focus();
  await page.keyboard.press('ArrowRight');
  // One step is 1/400 of the 2.44 ns the slider offers; the slider snaps to its steps.
  await expect(page.getByTestId('observation-time')).toHaveText(/^t = 1\.00[5-9] ns$/);
  await expect(view).toHaveAttribute('data-ready', 'true');
  await expect(view).not.toHaveAttribute('data-map-id', firstMap ?? '');
  expect(errors).toEqual([]);
});

test('a broken scenario is reported with the field at fault', async ({ page }) => {
  const errors = collectErrors(page);
  await page.route('**/scenarios/demo.json', async (route) => {
    const response = await route.fetch();
    const text = (await response.text()).replace('"beta": 0.7', '"beta": 1.3');
    await route.fulfill({ response, body: text });
  });
  await page.goto('/');
  await expect(page.getByRole('alert')).toHaveText(
    'Could not open scenarios/demo.json: charges[0].path.params.beta: must be below 1',
  );
  await expect(page.getByTestId('field-view')).toHaveAttribute('data-ready', 'false');
  expect(errors).toEqual([]);
});
