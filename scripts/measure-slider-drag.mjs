// Measures how closely the drawn map follows the time slider while it is dragged, on the
// production build: one slider step per animation frame, a 256 × 256 grid, this machine's GPU
// (or software WebGL). Prints frame times and the lag in frames; asserts nothing.
import { openBuiltApp } from './builtAppPage.mjs';

const FRAMES = 240;
const GRID = process.argv[2] ?? '256';

const { page, close } = await openBuiltApp();
await page.getByLabel('Grid').selectOption(GRID);
await page.waitForFunction(
  () =>
    document.querySelector('[data-testid="field-view"]')?.getAttribute('data-ready') === 'true' &&
    document.querySelector('[data-testid="field-view"]')?.getAttribute('aria-busy') === 'false',
  null,
  { timeout: 60_000 },
);
await page.waitForTimeout(500);

const result = await page.evaluate(async (frames) => {
  const slider = document.querySelector('input[type="range"]');
  const view = document.querySelector('[data-testid="field-view"]');
  const setValue = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value').set;
  const min = Number(slider.min);
  const step = Number(slider.step);
  const start = Number(slider.value);
  const records = [];
  const sent = [];
  await new Promise((done) => {
    let frame = 0;
    const tick = (now) => {
      // What the screen shows at the start of this frame, before this frame's slider move.
      const drawn = Number(view.getAttribute('data-drawn-time'));
      records.push({ now, drawn, sentSoFar: sent.length });
      if (frame === frames) return done();
      const value = min + Math.round((start - min) / step + frame + 1) * step;
      setValue.call(slider, String(value));
      slider.dispatchEvent(new Event('input', { bubbles: true }));
      sent.push(Number(slider.value));
      frame++;
      requestAnimationFrame(tick);
    };
    requestAnimationFrame(tick);
  });
  const settleStart = performance.now();
  await new Promise((done) => {
    const wait = () => (view.getAttribute('data-ready') === 'true' ? done() : setTimeout(wait, 5));
    wait();
  });
  const settleMs = performance.now() - settleStart;
  // Lag of a frame: how many slider moves behind the drawn map is (0: shows the latest move).
  const lags = [];
  const intervals = [];
  for (let k = 1; k < records.length; k++) {
    intervals.push(records[k].now - records[k - 1].now);
    const { drawn, sentSoFar } = records[k];
    let lag = Number.POSITIVE_INFINITY;
    for (let j = sentSoFar - 1; j >= 0; j--) {
      if (Math.abs(sent[j] - drawn) <= 1e-6 * step) {
        lag = sentSoFar - 1 - j;
        break;
      }
    }
    lags.push(lag);
  }
  return { intervals, lags, settleMs };
}, FRAMES);
await close();

const sorted = (values) => [...values].sort((a, b) => a - b);
const quantile = (values, q) =>
  sorted(values)[Math.min(values.length - 1, Math.floor(q * values.length))];
const share = (predicate) => result.lags.filter(predicate).length / result.lags.length;
const summary = {
  grid: `${GRID} × ${GRID}`,
  frames: result.intervals.length,
  frameMs: {
    median: Number(quantile(result.intervals, 0.5).toFixed(1)),
    p90: Number(quantile(result.intervals, 0.9).toFixed(1)),
    max: Number(Math.max(...result.intervals).toFixed(1)),
  },
  lagFrames: {
    withinOne: Number(share((lag) => lag <= 1).toFixed(3)),
    median: quantile(result.lags, 0.5),
    p90: quantile(result.lags, 0.9),
  },
  fullMapAfterReleaseMs: Math.round(result.settleMs),
};
console.log(JSON.stringify(summary, null, 2));
