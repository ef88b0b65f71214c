// Builds the app, serves it with `vite preview` and opens it in Debian's chromium: the common
// start of the measuring scripts, which look at the production build as a user gets it.
import { spawn, spawnSync } from 'node:child_process';
import { chromium } from '@playwright/test';

const PORT = 4173;

/** Builds, serves and opens the app; resolves to the page, ready, and a function that ends all. */
export async function openBuiltApp() {
  try {
    await fetch(`http://localhost:${PORT}/`);
    console.error(`port ${PORT} is already serving something; stop it first`);
    process.exit(1);
  } catch {}
  const build = spawnSync('npx', ['vite', 'build', '--logLevel', 'error'], { stdio: 'inherit' });
  if (build.status !== 0) process.exit(build.status ?? 1);
  const server = spawn('npx', ['vite', 'preview', '--port', String(PORT), '--strictPort'], {
    stdio: 'ignore',
    detached: true,
  });
  const stopServer = () => {
    try {
      process.kill(-server.pid);
    } catch {}
  };
  process.on('exit', stopServer);
  await waitForServer();
  const browser = await chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: [
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
  const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
  await page.goto(`http://localhost:${PORT}/`);
  const view = page.getByTestId('field-view');
  await view.and(page.locator('[data-ready="true"]')).waitFor({ timeout: 60_000 });
  return {
    page,
    close: async () => {
      await browser.close();
      stopServer();
    },
  };
}

async function waitForServer() {
  for (let attempt = 0; attempt < 100; attempt++) {
    try {
      if ((await fetch(`http://localhost:${PORT}/`)).ok) return;
    } catch {}
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error('the preview server did not start');
}
