import { execFileSync } from 'node:child_process';
import { join } from 'node:path';
import { expect, type Page, test } from '@playwright/test';
import { longPathCsv, scratchDir, wiggleCsv, writeScratch } from './support/trajectories';
import {
  canvasFingerprint,
  collectErrors,
  mapDrawn,
  newMapDrawn,
  snapshot,
} from './support/workbench';

const cli = (args: string[]) =>
  execFileSync(process.execPath, ['bin/conecast.js', ...args], { encoding: 'utf8' });

async function openApp(page: Page): Promise<void> {
  await page.goto('/');
  await mapDrawn(page);
  await page.getByRole('button', { name: 'Dismiss cautions' }).click();
}

async function savedScenario(page: Page): Promise<string> {
  const download = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Save scenario' }).click();
  const file = join(scratchDir(), 'scenario.json');
  await (await download).saveAs(file);
  return file;
}

test('a path imported from CSV in mm and ns changes the map and gives the fields conecast gives for that file', async ({
  page,
}) => {
  const errors = collectErrors(page);
  await openApp(page);
  const before = await mapDrawn(page);
  const demoPicture = await canvasFingerprint(page);
  const csv = writeScratch('wiggle.csv', wiggleCsv(801));

  await page.getByTestId('import-path').setInputFiles(csv);
  const dialog = page.getByRole('dialog', { name: 'Import a path from wiggle.csv' });
  await dialog.getByLabel('Lengths in').selectOption('mm');
  await dialog.getByLabel('times in').selectOption('ns');
  const summary = page.getByTestId('path-import-summary');
  await expect(summary).toContainText('801');
  await expect(summary).toContainText('1.000 ns');
  await expect(summary).toContainText('from βγ (bgx, bgy, bgz)');
  // The positions and the velocities agree in these units: no warning.
  await expect(dialog.getByRole('alert')).toHaveCount(0);
  await snapshot(page, '20-import-preview');
  await dialog.getByRole('button', { name: 'Use as the path of electron' }).click();
  await expect(dialog).toHaveCount(0);
  await expect(page.getByLabel('How the charge moves')).toHaveValue('samples');
  await expect(page.getByText('801 samples from 0 s to 1.000 ns, as imported.')).toBeVisible();
  await newMapDrawn(page, before);
  expect((await canvasFingerprint(page)).hash).not.toBe(demoPicture.hash);
  await snapshot(page, '21-imported-path');

  // The scenario saved now gives, point for point, what the CLI gives for the file itself.
  const scenario = await savedScenario(page);
  const points = writeScratch('points.csv', 'x,y,z,t\n0.1,0.05,0,8e-10\n-0.05,0.2,0.01,1.3e-9\n');
  const fromScenario = cli(['fields', '--scenario', scenario, '--points', points]);
  const fromFile = cli([
    'fields',
    ...['--trajectory', csv, '--charge', '-e', '--length-unit', 'mm', '--time-unit', 'ns'],
    ...['--points', points],
  ]);
  expect(fromScenario).toBe(fromFile);
  expect(errors).toEqual([]);
});

test('a broken CSV dropped on the page is named by line and column, and the open path stays', async ({
  page,
}) => {
  const errors = collectErrors(page);
  await openApp(page);
  const text = 't,x,y,z\n0,0,0,0\n1e-9,0.1,0,0\n2e-9,0.2,oops,0\n';
  const transfer = await page.evaluateHandle((content) => {
    const data = new DataTransfer();
    data.items.add(new File([content], 'broken.csv', { type: 'text/csv' }));
    return data;
  }, text);
  await page.dispatchEvent('body', 'drop', { dataTransfer: transfer });
  const error = page.getByTestId('path-import-error');
  await expect(error).toHaveText('broken.csv line 4, column "y": not a number: "oops"');
  await expect(page.getByRole('button', { name: 'Use as the path of electron' })).toBeDisabled();
  await snapshot(page, '22-broken-csv');
  await page.getByRole('button', { name: 'Cancel' }).click();
  await expect(page.getByLabel('How the charge moves')).toHaveValue('preset');
  expect(errors).toEqual([]);
});

test('a million-row path is read while the page goes on answering, and then drives the map', async ({
  page,
}) => {
  test.setTimeout(120_000);
  const errors = collectErrors(page);
  await openApp(page);
  const csv = writeScratch('long.csv', longPathCsv(1_000_000));
  await page.getByTestId('import-path').setInputFiles(csv);
  const reading = page.getByText('Reading long.csv…');
  await expect(reading).toBeVisible();
  // The file is read in a worker: meanwhile the page goes on drawing frames. Were it read
  // here, no frame could run until the reading had ended.
  const frames = await page.evaluate(
    () =>
      new Promise<number>((resolve) => {
        let count = 0;
        const next = () => (++count < 3 ? requestAnimationFrame(next) : resolve(count));
        requestAnimationFrame(next);
      }),
  );
  expect(frames).toBe(3);
  await expect(reading).toBeVisible();
  await expect(page.getByTestId('path-import-summary')).toContainText('1,000,000', {
    timeout: 60_000,
  });
  const before = await mapDrawn(page);
  await page.getByRole('button', { name: 'Use as the path of electron' }).click();
  await expect(page.getByText(/^1,000,000 samples from 0 s to 1\.000 ns/)).toBeVisible();
  await newMapDrawn(page, before);
  // The million-sample work is kept in the browser too.
  await expect(page.getByTestId('autosave-status')).toBeVisible({ timeout: 30_000 });
  await expect(page.getByText(/^Autosave:/)).toHaveCount(0);
  await snapshot(page, '23-million-samples');
  expect(errors).toEqual([]);
});

test('work survives a reload: restored with an offer to discard it', async ({ page }) => {
  // Three whole page loads on a software renderer.
  test.setTimeout(60_000);
  const errors = collectErrors(page);
  await openApp(page);
  await page.getByRole('button', { name: 'Add a probe at the slice centre' }).click();
  await page.getByLabel('Shows').selectOption('B');
  await expect(page.getByTestId('autosave-status')).toBeVisible();
  const title = await page.getByTestId('scenario-title').textContent();

  await page.reload();
  await mapDrawn(page);
  await expect(page.getByTestId('restored-work')).toContainText(
    `Restored your unsaved work “${title}”`,
  );
  await expect(page.getByRole('button', { name: 'Probe P1', exact: true })).toBeVisible();
  await expect(page.getByLabel('Shows')).toHaveValue('B');
  await snapshot(page, '24-restored-work');

  // Discarding asks first: the work cannot be brought back.
  page.once('dialog', (dialog) => {
    expect(dialog.message()).toContain('cannot be brought back');
    void dialog.accept();
  });
  await page.getByRole('button', { name: 'Discard it and open the demo' }).click();
  await expect(page.getByTestId('restored-work')).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Probe P1', exact: true })).toHaveCount(0);
  await expect(page.getByLabel('Shows')).toHaveValue('E');
  await page.reload();
  await mapDrawn(page);
  await expect(page.getByTestId('restored-work')).toHaveCount(0);
  expect(errors).toEqual([]);
});

test('work survives a crash of the tab', async ({ page, context }) => {
  // Two whole page loads on a software renderer.
  test.setTimeout(60_000);
  await openApp(page);
  await page.getByRole('button', { name: 'Add a probe at the slice centre' }).click();
  await page.getByLabel('Arrows').selectOption('S');
  await expect(page.getByTestId('autosave-status')).toBeVisible();
  // The tab's renderer dies without a chance to save anything more.
  const crashed = page.waitForEvent('crash');
  const session = await context.newCDPSession(page);
  void session.send('Page.crash').catch(() => {});
  await crashed;
  const next = await context.newPage();
  const errors = collectErrors(next);
  await next.goto('/');
  await mapDrawn(next);
  await expect(next.getByTestId('restored-work')).toBeVisible();
  await expect(next.getByRole('button', { name: 'Probe P1', exact: true })).toBeVisible();
  await expect(next.getByLabel('Arrows')).toHaveValue('S');
  expect(errors).toEqual([]);
});

test('a number typed and then given its unit is applied in that unit, not lost', async ({
  page,
}) => {
  const errors = collectErrors(page);
  await openApp(page);
  await page.getByRole('button', { name: 'Add a probe at the slice centre' }).click();
  const details = page.getByTestId('probe-details');
  await expect(details).toHaveAttribute('data-position', '0,0,0');
  await page.getByLabel('Probe y', { exact: true }).fill('5');
  await page.getByLabel('Unit of Probe y').selectOption('cm');
  await expect(details).toHaveAttribute('data-position', '0,0.05,0');
  await expect(page.getByLabel('Probe y', { exact: true })).toHaveValue('5');
  expect(errors).toEqual([]);
});

test('a shared link opens the same scenario, view and time in a fresh browser', async ({
  page,
  browser,
}) => {
  const errors = collectErrors(page);
  await openApp(page);
  await page.getByRole('button', { name: 'Add a probe at the slice centre' }).click();
  await page.getByRole('button', { name: /^Step forward/ }).click();
  await page.getByLabel('Shows').selectOption('Erad');
  await mapDrawn(page);
  await page.getByRole('button', { name: 'Copy link' }).click();
  const link = await page.getByTestId('share-link').inputValue();
  expect(link).toMatch(/#scenario=[A-Za-z0-9_-]+$/);
  const sameView = async (p: Page) => ({
    title: await p.getByTestId('scenario-title').textContent(),
    time: await p.getByTestId('observation-time').textContent(),
    shows: await p.getByLabel('Shows').inputValue(),
    probe: await p.getByTestId('probe-details').getAttribute('data-position'),
    colours: await p.getByTestId('colour-bar').textContent(),
  });
  const here = await sameView(page);

  const fresh = await (
    await browser.newContext({ viewport: { width: 1280, height: 800 } })
  ).newPage();
  const freshErrors = collectErrors(fresh);
  await fresh.goto(link);
  await mapDrawn(fresh);
  expect(await sameView(fresh)).toEqual(here);
  // The link has been read: a reload brings back this browser's own work, not the link.
  expect(new URL(fresh.url()).hash).toBe('');
  await snapshot(fresh, '25-opened-from-link');
  expect(errors).toEqual([]);
  expect(freshErrors).toEqual([]);
});

test('a damaged shared link is named, and the demo opens instead', async ({ page }) => {
  const errors = collectErrors(page);
  await page.goto('/#scenario=AAAAAAAAAAAAAAAA');
  await mapDrawn(page);
  await expect(page.getByRole('alert').filter({ hasText: 'shared link' })).toContainText(
    'Could not open the shared link: link: is damaged and cannot be unpacked',
  );
  await expect(page.getByTestId('scenario-title')).toContainText('circular orbit');
  expect(errors).toEqual([]);
});
