import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { type Download, expect, type Page, test } from '@playwright/test';
import { decodeNpyFloat32 } from '../src/io/npy';
import { collectErrors, mapDrawn, snapshot } from './support/workbench';

const scratch = () => mkdtempSync(join(tmpdir(), 'conecast-export-'));
const cli = (args: string[]) =>
  execFileSync(process.execPath, ['bin/conecast.js', ...args], {
    encoding: 'utf8',
    maxBuffer: 1 << 28,
  });

/** Clicks and saves every download the click starts (a .npy comes with its .npy.json). */
async function downloadsOf(
  page: Page,
  click: () => Promise<void>,
  count: number,
): Promise<string[]> {
  const dir = scratch();
  const seen: Download[] = [];
  const listener = (download: Download) => seen.push(download);
  page.on('download', listener);
  await click();
  // A picture computes its map afresh first: allow for that.
  await expect.poll(() => seen.length, { timeout: 30_000 }).toBe(count);
  page.off('download', listener);
  const files: string[] = [];
  for (const download of seen) {
    const file = join(dir, download.suggestedFilename());
    await download.saveAs(file);
    files.push(file);
  }
  return files;
}

async function savedScenario(page: Page): Promise<string> {
  const [file] = await downloadsOf(
    page,
    () => page.getByRole('button', { name: 'Save scenario' }).click(),
    1,
  );
  return file;
}

/** Relative difference, with float32 rounding of values near zero allowed for. */
function close(a: number, b: number, scale: number): boolean {
  return Math.abs(a - b) <= 2e-6 * Math.max(Math.abs(a), Math.abs(b)) + 1e-7 * scale;
}

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await mapDrawn(page);
  await page.getByRole('button', { name: 'Dismiss cautions' }).click();
});

test('the slice exported as .npy and .csv equals conecast slice for the same scenario', async ({
  page,
}) => {
  const errors = collectErrors(page);
  await page.getByLabel('Grid').selectOption('64');
  await mapDrawn(page);
  const scenario = await savedScenario(page);
  const files = await downloadsOf(
    page,
    () => page.getByRole('button', { name: 'Save slice as .npy' }).click(),
    2,
  );
  const npyFile = files.find((f) => f.endsWith('.npy'));
  const sidecarFile = files.find((f) => f.endsWith('.npy.json'));
  if (!npyFile || !sidecarFile) throw new Error(`unexpected downloads ${files.join(', ')}`);
  const [csvFile] = await downloadsOf(
    page,
    () => page.getByRole('button', { name: 'Save slice as .csv' }).click(),
    1,
  );

  const dir = scratch();
  cli(['slice', '--scenario', scenario, '--quantity', 'all', '--out', join(dir, 'cli.npy')]);
  cli(['slice', '--scenario', scenario, '--quantity', 'all', '--out', join(dir, 'cli.csv')]);
  const app = decodeNpyFloat32(new Uint8Array(readFileSync(npyFile)));
  const ref = decodeNpyFloat32(new Uint8Array(readFileSync(join(dir, 'cli.npy'))));
  expect(app.shape).toEqual(ref.shape);
  expect(app.shape.slice(0, 2)).toEqual([64, 64]);
  // The same solver and formulas in two JavaScript engines, rounded to float32: a few ulps apart.
  let scale = 0;
  for (let k = 0; k < ref.data.length; k++) scale = Math.max(scale, Math.abs(ref.data[k]));
  let worst = 0;
  for (let k = 0; k < ref.data.length; k++) {
    if (!close(app.data[k], ref.data[k], scale)) worst++;
  }
  expect(worst).toBe(0);
  const appSidecar = JSON.parse(readFileSync(sidecarFile, 'utf8'));
  const refSidecar = JSON.parse(readFileSync(join(dir, 'cli.npy.json'), 'utf8'));
  expect(appSidecar).toEqual(refSidecar);

  const appCsv = readFileSync(csvFile, 'utf8').trimEnd().split('\n');
  const refCsv = readFileSync(join(dir, 'cli.csv'), 'utf8').trimEnd().split('\n');
  expect(appCsv.length).toBe(refCsv.length);
  const comments = refCsv.filter((line) => line.startsWith('#'));
  expect(appCsv.slice(0, comments.length + 1)).toEqual(refCsv.slice(0, comments.length + 1));
  for (let k = comments.length + 1; k < refCsv.length; k += 97) {
    const a = appCsv[k].split(',').map(Number);
    const b = refCsv[k].split(',').map(Number);
    for (let c = 0; c < a.length; c++) {
      expect(close(a[c], b[c], Math.abs(b[c]) + 1e-30), `line ${k + 1} column ${c + 1}`).toBe(true);
    }
  }
  expect(errors).toEqual([]);
});

test('a probe series saved as CSV equals conecast probe with the same window and samples', async ({
  page,
}) => {
  const errors = collectErrors(page);
  await page.getByRole('button', { name: 'Add a probe at the slice centre' }).click();
  await page.getByTestId('probe-x').fill('6');
  await page.getByLabel('Unit of Probe x').selectOption('cm');
  await page.getByTestId('probe-x').press('Enter');
  await page.getByRole('tab', { name: 'Pulse at probe' }).click();
  await expect(page.getByTestId('pulse-chart').locator('canvas')).toBeVisible();
  const [csv] = await downloadsOf(
    page,
    () => page.getByRole('button', { name: 'Save the series as CSV' }).click(),
    1,
  );
  const rows = readFileSync(csv, 'utf8').trimEnd().split('\n');
  expect(rows[0]).toBe(
    't_s,Ex_V_per_m,Ey_V_per_m,Ez_V_per_m,Bx_T,By_T,Bz_T,Sx_W_per_m2,Sy_W_per_m2,Sz_W_per_m2',
  );
  const first = Number(rows[1].split(',')[0]);
  const last = Number(rows[rows.length - 1].split(',')[0]);
  const scenario = await savedScenario(page);
  const position = (await page.getByTestId('probe-details').getAttribute('data-position')) ?? '';
  const out = cli([
    'probe',
    '--scenario',
    scenario,
    '--at',
    position,
    '--from',
    String(first),
    '--to',
    String(last),
    '--samples',
    String(rows.length - 1),
  ])
    .trimEnd()
    .split('\n');
  expect(out.length).toBe(rows.length);
  for (let k = 1; k < rows.length; k += 211) {
    const a = rows[k].split(',').map(Number);
    const b = out[k].split(',').map(Number);
    // The same code in two JavaScript engines: equal to the last few digits.
    for (let c = 0; c < a.length; c++) {
      const ok = Math.abs(a[c] - b[c]) <= 1e-9 * Math.abs(b[c]) + 1e-300;
      expect(ok, `row ${k} column ${c}`).toBe(true);
    }
  }
  await snapshot(page, '18-probe-series-saved');
  expect(errors).toEqual([]);
});

test('a scenario file opens from the picker, and a broken one is named without losing the open one', async ({
  page,
}) => {
  const errors = collectErrors(page);
  const demo = JSON.parse(readFileSync('public/scenarios/demo.json', 'utf8'));
  const dir = scratch();
  const good = join(dir, 'faster.json');
  writeFileSync(
    good,
    JSON.stringify({
      ...demo,
      title: 'Invented: the same orbit at β = 0.9',
      charges: [
        {
          ...demo.charges[0],
          path: { ...demo.charges[0].path, params: { radius: 0.01, beta: 0.9 } },
        },
      ],
    }),
  );
  await page.getByTestId('open-scenario').setInputFiles(good);
  await expect(page.getByTestId('scenario-title')).toHaveText(
    'Invented: the same orbit at β = 0.9',
  );
  await mapDrawn(page);

  const broken = join(dir, 'broken.json');
  writeFileSync(broken, JSON.stringify({ ...demo, view: { ...demo.view, resolution: [160, 0] } }));
  await page.getByTestId('open-scenario').setInputFiles(broken);
  await expect(page.getByRole('alert').first()).toContainText(
    'Could not open broken.json: view.resolution[1]',
  );
  await expect(page.getByTestId('scenario-title')).toHaveText(
    'Invented: the same orbit at β = 0.9',
  );
  await snapshot(page, '19-broken-scenario-refused');
  expect(errors).toEqual([]);
});

test('the picture for a report decodes at the width asked for, with its colour bar', async ({
  page,
}) => {
  const errors = collectErrors(page);
  await page.getByLabel('Picture width').selectOption('2400');
  await page.getByLabel('Picture background').selectOption('light');
  const [png] = await downloadsOf(
    page,
    () => page.getByRole('button', { name: 'Save picture (PNG)' }).click(),
    1,
  );
  const bytes = readFileSync(png).toString('base64');
  const found = await page.evaluate(async (data) => {
    const blob = await (await fetch(`data:image/png;base64,${data}`)).blob();
    const image = await createImageBitmap(blob);
    const canvas = document.createElement('canvas');
    canvas.width = image.width;
    canvas.height = image.height;
    const context = canvas.getContext('2d');
    if (context === null) throw new Error('no 2D context');
    context.drawImage(image, 0, 0);
    // Where renderPicture puts the colour bar: the layout scales with width / 1200.
    const u = image.width / 1200;
    const left = 90 * u;
    const plotWidth = image.width - left - 220 * u;
    const top = (70 + 22 * 2) * u;
    const plotHeight = plotWidth; // the demo's slice is square
    const barX = Math.round(left + plotWidth + 54 * u);
    const column = context.getImageData(barX, Math.round(top), 1, Math.round(plotHeight)).data;
    const colours = new Set<number>();
    for (let p = 0; p < column.length; p += 4)
      colours.add((column[p] << 16) | (column[p + 1] << 8) | column[p + 2]);
    const corner = context.getImageData(image.width - 5, 5, 1, 1).data;
    // Colour steps along a row through the middle of the map: one per grid cell at most.
    const row = context.getImageData(
      Math.round(left),
      Math.round(top + plotHeight / 2),
      Math.round(plotWidth),
      1,
    ).data;
    let steps = 0;
    for (let p = 4; p < row.length; p += 4) {
      if (row[p] !== row[p - 4] || row[p + 1] !== row[p - 3] || row[p + 2] !== row[p - 2]) steps++;
    }
    return {
      width: image.width,
      height: image.height,
      barColours: colours.size,
      corner: Array.from(corner),
      mapSteps: steps,
    };
  }, bytes);
  expect(found.width).toBe(2400);
  expect(found.height).toBeGreaterThan(2000);
  expect(found.barColours).toBeGreaterThan(100);
  // Computed afresh on a finer grid than the 160 points across on screen (a point per two
  // pixels, at most 1024): far more colour steps across than the screen's grid could give.
  expect(found.mapSteps).toBeGreaterThan(400);
  expect(found.corner).toEqual([255, 255, 255, 255]);
  expect(errors).toEqual([]);
});
