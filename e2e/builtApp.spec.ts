import { expect, type Page, test } from '@playwright/test';
import { CONTENT_SECURITY_POLICY } from '../vite.config';
import { wiggleCsv, writeScratch } from './support/trajectories';
import { collectErrors, mapDrawn, snapshot } from './support/workbench';

/** The built app, as a user installs it, served by `vite preview` with its policy. */
const BUILT = 'http://localhost:4173/';

/** Every Content-Security-Policy violation the page reports, as "directive blocked-uri". */
async function watchViolations(page: Page): Promise<() => Promise<string[]>> {
  await page.addInitScript(() => {
    const seen: string[] = [];
    (window as unknown as { cspViolations: string[] }).cspViolations = seen;
    document.addEventListener('securitypolicyviolation', (event) =>
      seen.push(`${event.violatedDirective} ${event.blockedURI}`),
    );
  });
  return () =>
    page.evaluate(() => [...(window as unknown as { cspViolations: string[] }).cspViolations]);
}

test('the built app carries a strict policy that refuses code made from strings', async ({
  page,
}) => {
  const violations = await watchViolations(page);
  await page.goto(BUILT);
  await mapDrawn(page);
  const policy = await page
    .locator('meta[http-equiv="Content-Security-Policy"]')
    .getAttribute('content');
  expect(policy).toBe(CONTENT_SECURITY_POLICY);
  expect(policy).not.toContain('unsafe-eval');
  expect(policy).not.toContain('unsafe-inline');
  // A string handed to setTimeout is compiled like eval: the policy must stop it.
  await page.evaluate(() => setTimeout('document.title = "ran"', 0));
  await expect.poll(violations).toContain('script-src eval');
  expect(await page.title()).toBe('Conecast');
});

test('under the policy the whole app works: formulas, import, link, saving and the picture', async ({
  page,
}) => {
  const errors = collectErrors(page);
  const violations = await watchViolations(page);
  await page.goto(BUILT);
  await mapDrawn(page);
  await page.getByRole('button', { name: 'Dismiss cautions' }).click();
  expect(await page.evaluate(() => crossOriginIsolated)).toBe(true);

  // The formula evaluator compiles without eval or new Function.
  const before = await mapDrawn(page);
  await page.getByLabel('How the charge moves').selectOption('expression');
  await expect(page.getByTestId('field-view')).not.toHaveAttribute('data-map-id', before);
  await mapDrawn(page);

  // The import worker runs under the policy.
  await page.getByTestId('import-path').setInputFiles(writeScratch('wiggle.csv', wiggleCsv(201)));
  await page.getByRole('dialog').getByLabel('Lengths in').selectOption('mm');
  await page.getByRole('dialog').getByLabel('times in').selectOption('ns');
  await expect(page.getByTestId('path-import-summary')).toContainText('201');
  await page.getByRole('button', { name: 'Use as the path of electron' }).click();
  await mapDrawn(page);

  await page.getByRole('button', { name: 'Copy link' }).click();
  await expect(page.getByTestId('share-link')).toHaveValue(/#scenario=/);
  await page.getByRole('button', { name: 'Close' }).click();
  const saved = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Save scenario' }).click();
  expect((await saved).suggestedFilename()).toMatch(/\.json$/);
  const picture = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Save picture (PNG)' }).click();
  expect((await picture).suggestedFilename()).toMatch(/\.png$/);
  await expect(page.getByTestId('autosave-status')).toBeVisible();
  await snapshot(page, '26-built-app-under-policy');

  expect(await violations()).toEqual([]);
  expect(errors).toEqual([]);
});
