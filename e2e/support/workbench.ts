import { mkdirSync } from 'node:fs';
import { expect, type Page } from '@playwright/test';

/** Console errors and uncaught exceptions seen by the page. */
export function collectErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(message.text());
  });
  page.on('pageerror', (error) => errors.push(error.message));
  return errors;
}

/** Waits until the latest full map of the slice in view has been drawn; returns its id. */
export async function mapDrawn(page: Page): Promise<string> {
  const view = page.getByTestId('field-view');
  await expect(view).toHaveAttribute('data-ready', 'true', { timeout: 30_000 });
  return (await view.getAttribute('data-map-id')) ?? '';
}

/** Waits for a map other than `previous` to be drawn; returns its id. */
export async function newMapDrawn(page: Page, previous: string): Promise<string> {
  const view = page.getByTestId('field-view');
  await expect(view).not.toHaveAttribute('data-map-id', previous, { timeout: 30_000 });
  return mapDrawn(page);
}

/** A cheap fingerprint of the field view's pixels, to tell whether the picture changed. */
export async function canvasFingerprint(page: Page): Promise<{ hash: number; lit: number }> {
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
    let hash = 2166136261;
    let lit = 0;
    for (let p = 0; p < data.length; p += 4) {
      hash = Math.imul(hash ^ (data[p] | (data[p + 1] << 8) | (data[p + 2] << 16)), 16777619);
      if (data[p] + data[p + 1] + data[p + 2] > 90) lit++;
    }
    return { hash: hash >>> 0, lit: lit / (data.length / 4) };
  });
}

/** Saves a full-page screenshot under test-results/workbench for a person to look at. */
export async function snapshot(page: Page, name: string): Promise<void> {
  mkdirSync('test-results/workbench', { recursive: true });
  await page.screenshot({ path: `test-results/workbench/${name}.png`, fullPage: true });
}

/** Presses at `from` and drags the mouse through `points` (CSS pixels within the overlay). */
export async function dragThrough(page: Page, points: readonly [number, number][]): Promise<void> {
  const box = await page.getByTestId('slice-overlay').boundingBox();
  if (box === null) throw new Error('the slice overlay is not visible');
  const [first, ...rest] = points;
  await page.mouse.move(box.x + first[0], box.y + first[1]);
  await page.mouse.down();
  for (const [x, y] of rest) await page.mouse.move(box.x + x, box.y + y, { steps: 2 });
  await page.mouse.up();
}
