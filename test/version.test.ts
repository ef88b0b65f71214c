import { readFileSync } from 'node:fs';
import { expect, it } from 'vitest';
import { CONECAST_VERSION } from '../src/version';

it('writes the same version into its outputs as package.json declares', () => {
  const pkg = JSON.parse(readFileSync(new URL('../package.json', import.meta.url), 'utf8'));
  expect(CONECAST_VERSION).toBe(pkg.version);
});
