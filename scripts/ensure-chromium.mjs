#!/usr/bin/env node
// Makes sure Debian's chromium is present for Playwright, which drives it by executablePath.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

const CHROMIUM = '/usr/bin/chromium';

if (existsSync(CHROMIUM)) process.exit(0);

const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
if (!isRoot) {
  console.error(
    `${CHROMIUM} not found; the browser tests need it: run "sudo apt-get install -y chromium".`,
  );
  process.exit(1);
}

for (const args of [['update'], ['install', '-y', 'chromium']]) {
  console.log(`ensure-chromium: apt-get ${args.join(' ')}`);
  const result = spawnSync('apt-get', args, {
    stdio: 'inherit',
    env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
  });
  if (result.error || result.status !== 0) {
    const reason = result.error ? result.error.message : `exit status ${result.status}`;
    console.error(`ensure-chromium: apt-get ${args[0]} failed (${reason}).`);
    process.exit(1);
  }
}

if (!existsSync(CHROMIUM)) {
  console.error(`ensure-chromium: chromium was installed but ${CHROMIUM} is still missing.`);
  process.exit(1);
}
console.log(`ensure-chromium: ${CHROMIUM} installed.`);
