// Measures importing a million-row trajectory CSV into the production build: how long the
// worker takes to read it, the longest task on the page's own thread meanwhile (what a user
// would feel as a freeze), and the same for taking the path (document, undo, field workers,
// first full map). Invented data; prints figures; asserts nothing.
import { mkdtempSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { openBuiltApp } from './builtAppPage.mjs';

const ROWS = Number(process.argv[2] ?? 1_000_000);
const c = 299_792_458;

/** Invented: 1 ns of a charge at γ ≈ 3 along x swaying in y, written in mm, ns and βγ. */
function trackCsv(rows) {
  const parts = ['# invented for a measurement: mm, ns, βγ\nt,x,y,z,bgx,bgy,bgz\n'];
  const vx = 0.94 * c;
  const amplitude = 2e-4;
  const omega = 2e10;
  for (let i = 0; i < rows; i++) {
    const t = (i / (rows - 1)) * 1e-9;
    const vy = amplitude * omega * Math.cos(omega * t);
    const gamma = 1 / Math.sqrt(1 - (vx * vx + vy * vy) / (c * c));
    parts.push(
      `${t * 1e9},${vx * t * 1e3},${amplitude * Math.sin(omega * t) * 1e3},0,${(gamma * vx) / c},${(gamma * vy) / c},0\n`,
    );
  }
  return parts.join('');
}

const file = join(mkdtempSync(join(tmpdir(), 'conecast-measure-')), 'track.csv');
writeFileSync(file, trackCsv(ROWS));
const { page, close } = await openBuiltApp();
await page.getByRole('button', { name: 'Dismiss cautions' }).click();
await page.evaluate(() => {
  const tasks = [];
  window.longTasks = tasks;
  new PerformanceObserver((list) => {
    for (const entry of list.getEntries()) tasks.push([entry.startTime, entry.duration]);
  }).observe({ type: 'longtask', buffered: false });
});
const now = () => page.evaluate(() => performance.now());
const longestBetween = (from, to) =>
  page.evaluate(
    ([a, b]) =>
      Math.max(
        0,
        ...window.longTasks.filter(([start]) => start >= a && start <= b).map(([, d]) => d),
      ),
    [from, to],
  );

const readStart = await now();
await page.getByTestId('import-path').setInputFiles(file);
await page.getByRole('dialog').getByLabel('Lengths in').selectOption('mm');
await page.getByRole('dialog').getByLabel('times in').selectOption('ns');
await page.getByTestId('path-import-summary').waitFor({ timeout: 120_000 });
const readEnd = await now();
const mapId = await page.getByTestId('field-view').getAttribute('data-map-id');
await page.getByRole('button', { name: 'Use as the path of electron' }).click();
await page.waitForFunction(
  (previous) => {
    const view = document.querySelector('[data-testid="field-view"]');
    return (
      view?.getAttribute('data-ready') === 'true' && view.getAttribute('data-map-id') !== previous
    );
  },
  mapId,
  { timeout: 120_000 },
);
const mapEnd = await now();
await page.getByTestId('autosave-status').waitFor({ timeout: 120_000 });
const savedEnd = await now();
// A later change (a probe added) saves only the small document: the columns are kept already.
const firstSave = await page.getByTestId('autosave-status').textContent();
const editStart = await now();
await page.getByRole('button', { name: 'Add a probe at the slice centre' }).click();
await page.waitForFunction(
  (before) => document.querySelector('[data-testid="autosave-status"]')?.textContent !== before,
  firstSave,
  { timeout: 120_000 },
);
const editEnd = await now();
const summary = {
  rows: ROWS,
  fileMB: Number((statSync(file).size / 2 ** 20).toFixed(1)),
  // Two unit choices re-read the file: this spans all three readings.
  readingMs: Math.round(readEnd - readStart),
  longestPageTaskWhileReadingMs: Math.round(await longestBetween(readStart, readEnd)),
  takingToFullMapMs: Math.round(mapEnd - readEnd),
  longestPageTaskWhileTakingMs: Math.round(await longestBetween(readEnd, mapEnd)),
  autosavedAfterMs: Math.round(savedEnd - readEnd),
  longestPageTaskUntilAutosavedMs: Math.round(await longestBetween(mapEnd, savedEnd)),
  longestPageTaskForALaterChangeMs: Math.round(await longestBetween(editStart, editEnd)),
};
await close();
console.log(JSON.stringify(summary, null, 2));
