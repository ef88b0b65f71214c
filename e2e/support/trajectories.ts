import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const c = 299_792_458;

/** A scratch folder for files a test writes. */
export function scratchDir(): string {
  return mkdtempSync(join(tmpdir(), 'conecast-e2e-'));
}

/**
 * Invented: an electron drifting along x at 0.95 c while swinging ±3 mm in y with a 0.5 ns
 * period, over 1 ns; written in mm and ns with the velocity as βγ, as a tracking code might.
 */
export function wiggleCsv(rows: number): string {
  const vx = 0.95 * c;
  const amplitude = 3e-3;
  const omega = (2 * Math.PI) / 0.5e-9;
  const lines = ['# invented for a test: mm, ns, βγ', 't,x,y,z,bgx,bgy,bgz'];
  for (let i = 0; i < rows; i++) {
    const t = (i / (rows - 1)) * 1e-9;
    const vy = amplitude * omega * Math.cos(omega * t);
    const gamma = 1 / Math.sqrt(1 - (vx * vx + vy * vy) / (c * c));
    lines.push(
      [
        t * 1e9,
        vx * t * 1e3,
        amplitude * Math.sin(omega * t) * 1e3,
        0,
        (gamma * vx) / c,
        (gamma * vy) / c,
        0,
      ].join(','),
    );
  }
  return `${lines.join('\n')}\n`;
}

/** Invented: a million positions of a charge at 0.5 c along x with a slow sway in y, SI. */
export function longPathCsv(rows: number): string {
  const parts: string[] = ['t,x,y,z\n'];
  const dt = 1e-15;
  for (let i = 0; i < rows; i++) {
    const t = i * dt;
    parts.push(`${t},${0.5 * c * t},${1e-4 * Math.sin(t * 1e10)},0\n`);
  }
  return parts.join('');
}

/** Writes `text` as `name` in a fresh scratch folder; returns the path. */
export function writeScratch(name: string, text: string): string {
  const file = join(scratchDir(), name);
  writeFileSync(file, text);
  return file;
}
