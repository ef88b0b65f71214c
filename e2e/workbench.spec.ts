import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, type Page, test } from '@playwright/test';
import { formatSI } from '../app/format/siFormat';
import {
  canvasFingerprint,
  collectErrors,
  dragThrough,
  mapDrawn,
  newMapDrawn,
  snapshot,
} from './support/workbench';

const demo = JSON.parse(readFileSync('public/scenarios/demo.json', 'utf8'));

/** The scenario the app would save now, through its own Save button. */
async function savedScenario(
  page: Page,
): Promise<{ file: string; document: { charges: unknown } }> {
  const download = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Save scenario' }).click();
  const file = join(mkdtempSync(join(tmpdir(), 'conecast-e2e-')), 'scenario.json');
  await (await download).saveAs(file);
  return { file, document: JSON.parse(readFileSync(file, 'utf8')) };
}

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await mapDrawn(page);
  await page.getByRole('button', { name: 'Dismiss cautions' }).click();
});

test('a path drawn with the mouse changes the map, its points drag, and undo brings the old path back', async ({
  page,
}) => {
  const errors = collectErrors(page);
  const first = await mapDrawn(page);
  const before = await canvasFingerprint(page);
  await snapshot(page, '01-demo');

  await page.getByRole('button', { name: 'Draw path' }).click();
  await expect(page.getByRole('button', { name: 'Draw path' })).toHaveAttribute(
    'aria-pressed',
    'true',
  );
  const box = await page.getByTestId('slice-overlay').boundingBox();
  if (box === null) throw new Error('no overlay');
  // An S-bend across the middle of the slice, drawn left to right.
  const stroke: [number, number][] = [];
  for (let k = 0; k <= 30; k++) {
    const s = k / 30;
    stroke.push([
      box.width * (0.15 + 0.7 * s),
      box.height * (0.5 - 0.25 * Math.sin(2 * Math.PI * s)),
    ]);
  }
  await dragThrough(page, stroke);
  await expect(page.getByLabel('How the charge moves')).toHaveValue('sketch');
  const sketched = await newMapDrawn(page, first);
  const after = await canvasFingerprint(page);
  expect(after.hash).not.toBe(before.hash);
  expect(after.lit).toBeGreaterThan(0.05);
  const handles = page.getByRole('button', { name: /^Control point \d+ of 8/ });
  await expect(handles).toHaveCount(8);
  await snapshot(page, '02-sketched');

  // Dragging a control point reshapes the path; the map follows.
  const handle = await handles.nth(3).boundingBox();
  if (handle === null) throw new Error('no handle');
  await page.mouse.move(handle.x + handle.width / 2, handle.y + handle.height / 2);
  await page.mouse.down();
  await page.mouse.move(handle.x + 10, handle.y + 60, { steps: 5 });
  await page.mouse.up();
  await newMapDrawn(page, sketched);
  await snapshot(page, '03-control-point-dragged');

  // A speed of light or more is refused where it is typed, and the path is kept.
  const speed = page.getByTestId('path-beta');
  await speed.fill('1');
  await speed.press('Enter');
  await expect(
    page.getByText('β must be below 1: no charge reaches the speed of light'),
  ).toBeVisible();
  await expect(page.getByLabel('How the charge moves')).toHaveValue('sketch');

  await page.getByRole('button', { name: 'Undo' }).click();
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(page.getByLabel('How the charge moves')).toHaveValue('preset');
  const { document } = await savedScenario(page);
  expect(document.charges).toEqual(demo.charges);
  await page.getByRole('button', { name: 'Redo' }).click();
  await expect(page.getByLabel('How the charge moves')).toHaveValue('sketch');
  await mapDrawn(page);
  await snapshot(page, '04-undone-and-redone');
  expect(errors).toEqual([]);
});

test('a preset is chosen, opens on its own view, and its parameters change the map', async ({
  page,
}) => {
  const errors = collectErrors(page);
  const first = await mapDrawn(page);
  await page.getByLabel('Preset motion').selectOption('lineOscillation');
  await expect(page.getByLabel('Plane', { exact: true })).toHaveValue('xz');
  const opened = await newMapDrawn(page, first);
  const before = await canvasFingerprint(page);
  await snapshot(page, '05-preset-oscillation');

  const frequency = page.getByTestId('param-frequency');
  await page.getByLabel('Unit of Frequency f').selectOption('GHz');
  await frequency.fill('1.5');
  await frequency.press('Enter');
  await newMapDrawn(page, opened);
  expect((await canvasFingerprint(page)).hash).not.toBe(before.hash);
  await snapshot(page, '06-preset-frequency-changed');

  // A peak speed 2πfA at or above c is refused with the field named; the map stays.
  const shown = await mapDrawn(page);
  const amplitude = page.getByTestId('param-amplitude');
  await page.getByLabel('Unit of Amplitude A').selectOption('cm');
  await amplitude.fill('10');
  await amplitude.press('Enter');
  await expect(page.getByText(/peak speed 2π·frequency·amplitude must be below c/)).toBeVisible();
  await expect(page.getByTestId('field-view')).toHaveAttribute('data-map-id', shown);

  await page.getByLabel('Shows').selectOption('component');
  await page.getByLabel('Component').selectOption('Ez');
  await expect(page.getByTestId('colour-bar')).toContainText('E_z');
  await page.getByLabel('Arrows').selectOption('Erad');
  await snapshot(page, '07-component-with-arrows');
  expect(errors).toEqual([]);
});

test('time plays, steps and scrubs, and the light-cone shells move with it', async ({ page }) => {
  const errors = collectErrors(page);
  const time = page.getByTestId('observation-time');
  const shells = page.getByTestId('shell-note');
  const startTime = await time.textContent();
  const startShells = await shells.textContent();

  await page.getByRole('button', { name: 'Play' }).click();
  await expect(time).not.toHaveText(startTime ?? '');
  await page.waitForTimeout(800);
  await page.getByRole('button', { name: 'Pause' }).click();
  await expect(shells).not.toHaveText(startShells ?? '');
  const played = await mapDrawn(page);
  await snapshot(page, '08-played');

  const slider = page.getByRole('slider', { name: 'Observation time' });
  await slider.fill('5e-10');
  // The slider snaps to its nearest step (1/400 of the 2.44 ns span).
  await expect(time).toHaveText(/^t = 50\d\.\d ps$/);
  const scrubbedTime = await time.textContent();
  await expect(shells).toContainText('radius now');
  const scrubbed = await newMapDrawn(page, played);
  await snapshot(page, '09-scrubbed');

  await page.getByRole('button', { name: /^Step forward/ }).click();
  await expect(time).not.toHaveText(scrubbedTime ?? '');
  await newMapDrawn(page, scrubbed);
  expect(errors).toEqual([]);
});

test('a probe placed on the map reads the same field as conecast fields at that point and time', async ({
  page,
}) => {
  const errors = collectErrors(page);
  await page.getByRole('button', { name: 'Place probe' }).click();
  const box = await page.getByTestId('slice-overlay').boundingBox();
  if (box === null) throw new Error('no overlay');
  await page.mouse.click(box.x + box.width * 0.72, box.y + box.height * 0.3);
  const details = page.getByTestId('probe-details');
  await expect(details).toBeVisible();
  await expect(page.getByRole('button', { name: 'Probe P1', exact: true })).toBeVisible();
  await snapshot(page, '10-probe-placed');

  const position = (await details.getAttribute('data-position')) ?? '';
  const t = (await details.getAttribute('data-time')) ?? '';
  const { file } = await savedScenario(page);
  const points = join(mkdtempSync(join(tmpdir(), 'conecast-e2e-')), 'points.csv');
  writeFileSync(points, `x,y,z\n${position}\n`);
  const output = execFileSync(
    process.execPath,
    ['bin/conecast.js', 'fields', '--scenario', file, '--points', points, '--time', t],
    { encoding: 'utf8' },
  );
  const [header, row] = output.trim().split('\n');
  const cli = Object.fromEntries(
    header.split(',').map((name, k) => [name, Number(row.split(',')[k])]),
  );

  const readout = page.getByTestId('probe-readout');
  const shown = async (quantity: string) => {
    const cell = readout.locator(`[data-quantity="${quantity}"]`).first();
    return { value: Number(await cell.getAttribute('data-value')), text: await cell.textContent() };
  };
  const checks: [string, string, string][] = [
    ['Ex', 'Ex', 'V/m'],
    ['Ey', 'Ey', 'V/m'],
    ['Ez', 'Ez', 'V/m'],
    ['Bx', 'Bx', 'T'],
    ['By', 'By', 'T'],
    ['Bz', 'Bz', 'T'],
    ['Sx', 'Sx', 'W/m²'],
    ['Sy', 'Sy', 'W/m²'],
    ['E_radx', 'Ex_rad', 'V/m'],
    ['E_rady', 'Ey_rad', 'V/m'],
    ['t_ret', 't_ret', 's'],
  ];
  for (const [quantity, column, unit] of checks) {
    const app = await shown(quantity);
    // Same formulas on the same doubles; only the two JavaScript engines' Math libraries differ.
    expect(Math.abs(app.value - cli[column]), `${quantity} against ${column}`).toBeLessThanOrEqual(
      1e-12 * Math.max(Math.abs(cli[column]), 1e-300),
    );
    expect(app.text).toBe(formatSI(cli[column], unit, 5));
  }
  await expect(page.getByTestId('cross-check')).toContainText('relative difference');

  // The probe moves with the arrow keys and goes with Delete.
  const handle = page.getByRole('button', { name: 'Probe P1', exact: true });
  await handle.focus();
  await page.keyboard.press('ArrowLeft');
  await expect(details).not.toHaveAttribute('data-position', position);
  await page.keyboard.press('Delete');
  await expect(page.getByRole('button', { name: 'Probe P1', exact: true })).toHaveCount(0);
  await page.keyboard.press('Control+z');
  await expect(page.getByRole('button', { name: 'Probe P1', exact: true })).toBeVisible();
  expect(errors).toEqual([]);
});

test('the 3D view orbits the slice and draws the light-cone spheres', async ({ page }) => {
  const errors = collectErrors(page);
  await page.getByRole('button', { name: 'Orbit 3D' }).click();
  await mapDrawn(page);
  const before = await canvasFingerprint(page);
  expect(before.lit).toBeGreaterThan(0.02);
  await dragThrough(page, [
    [300, 300],
    [360, 280],
    [420, 260],
  ]);
  await expect.poll(async () => (await canvasFingerprint(page)).hash).not.toBe(before.hash);
  await snapshot(page, '11-orbit-3d');
  expect(errors).toEqual([]);
});
