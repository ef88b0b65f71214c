import { expect, test } from '@playwright/test';
import { sampleMotion } from '../src/path/analyticMotion';
import { circularOrbit } from '../src/path/presets';
import { SampledPath } from '../src/path/sampledPath';
import { ELEMENTARY_CHARGE, SPEED_OF_LIGHT } from '../src/physics/constants';
import { fieldSample } from '../src/physics/fieldSample';
import { evaluateFields } from '../src/physics/fields';

// Dev-server URL of a project file (Vite serves the workspace under /@fs/).
const source = (file: string) => `/@fs${process.cwd()}/${file}`;

test('the browser field workers compute the same slice as the Node field core, to 1e-6', async ({
  page,
}) => {
  await page.goto('/');
  const result = await page.evaluate(
    async ({ poolModule, motionModule, presetModule, pathModule }) => {
      const { createBrowserSlicePool } = await import(poolModule);
      const { sampleMotion } = await import(motionModule);
      const { circularOrbit } = await import(presetModule);
      const { SampledPath } = await import(pathModule);
      const period = (2 * Math.PI * 0.01) / (0.9 * 299_792_458);
      const path = new SampledPath(
        sampleMotion(circularOrbit(0.01, 0.9), -3 * period, period, 1500),
      );
      const faults: string[] = [];
      const pool = createBrowserSlicePool((m: string) => faults.push(m));
      pool.setScene([{ charge: -1.602176634e-19, path }]);
      const spec = {
        center: [0, 0, 0],
        u: [1, 0, 0],
        v: [0, 1, 0],
        width: 0.1,
        height: 0.1,
        nx: 48,
        ny: 40,
        time: 0.4 * period,
      };
      const done = await pool.request(spec);
      pool.dispose();
      return {
        threads: done.stats.threads,
        faults,
        isolated: globalThis.crossOriginIsolated,
        planes: Array.from(done.fields.planes as Float32Array),
        mask: Array.from(done.fields.mask as Uint8Array),
      };
    },
    {
      poolModule: source('app/engine/browserSlicePool.ts'),
      motionModule: source('src/path/analyticMotion.ts'),
      presetModule: source('src/path/presets.ts'),
      pathModule: source('src/path/sampledPath.ts'),
    },
  );
  expect(result.faults).toEqual([]);
  expect(result.threads).toBeGreaterThanOrEqual(1);
  expect(result.isolated).toBe(true);

  // The same scene in Node, point by point.
  const period = (2 * Math.PI * 0.01) / (0.9 * SPEED_OF_LIGHT);
  const path = new SampledPath(sampleMotion(circularOrbit(0.01, 0.9), -3 * period, period, 1500));
  const charges = [{ charge: -ELEMENTARY_CHARGE, path }];
  const nx = 48;
  const ny = 40;
  const n = nx * ny;
  const out = fieldSample();
  let worst = 0;
  for (let j = 0; j < ny; j += 3) {
    for (let i = 0; i < nx; i += 4) {
      const p = j * nx + i;
      if (result.mask[p] !== 0) continue;
      const x = ((i + 0.5) / nx - 0.5) * 0.1;
      const y = ((j + 0.5) / ny - 0.5) * 0.1;
      evaluateFields(charges, x, y, 0, 0.4 * period, out);
      const e = [result.planes[p], result.planes[n + p], result.planes[2 * n + p]];
      const err =
        Math.hypot(e[0] - out.ex, e[1] - out.ey, e[2] - out.ez) /
        Math.hypot(out.ex, out.ey, out.ez);
      worst = Math.max(worst, err);
    }
  }
  // float32 hand-over rounds at 6e-8 relative; the contract is 1e-6.
  expect(worst).toBeLessThan(1e-6);
});
