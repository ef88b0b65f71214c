import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Writable } from 'node:stream';
import { main } from '../../src/cli/main';
import type { PathColumns } from '../../src/path/sampledPath';

export interface CliRun {
  status: number | null;
  stdout: string;
  stderr: string;
}

/** Runs the real command line as a user would, from the project root. */
export function runCli(args: readonly string[]): CliRun {
  const result = spawnSync(process.execPath, ['bin/conecast.js', ...args], {
    cwd: join(import.meta.dirname, '..', '..'),
    encoding: 'utf8',
  });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

/** A scratch folder in the system temp dir; `remove` deletes it with everything inside. */
export function scratchFolder(): {
  dir: string;
  file(name: string, text: string): string;
  remove(): void;
} {
  const dir = mkdtempSync(join(tmpdir(), 'conecast-test-'));
  return {
    dir,
    file(name, text) {
      const path = join(dir, name);
      writeFileSync(path, text);
      return path;
    },
    remove() {
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

const PATH_NAMES = ['t', 'x', 'y', 'z', 'vx', 'vy', 'vz', 'ax', 'ay', 'az'] as const;

/** Trajectory CSV text for the columns present, numbers in shortest round-trip form. */
export function trajectoryText(columns: PathColumns): string {
  const names = PATH_NAMES.filter((name) => columns[name] !== undefined);
  const rows = [names.join(',')];
  for (let i = 0; i < columns.t.length; i++) {
    rows.push(names.map((name) => String(columns[name]![i])).join(','));
  }
  return `${rows.join('\n')}\n`;
}

/** Parses the CLI's output CSV into its header and numeric rows. */
export function outputRows(stdout: string): { header: string; rows: number[][] } {
  const [header, ...lines] = stdout.trimEnd().split('\n');
  return { header, rows: lines.map((line) => line.split(',').map(Number)) };
}

/** Runs `conecast <args>` in this process through main, capturing what it writes. */
export async function runInProcess(args: readonly string[]): Promise<CliRun> {
  const stdout = new Capture();
  const stderr = new Capture();
  const status = await main(args, { stdout, stderr });
  return { status, stdout: stdout.text, stderr: stderr.text };
}

/** A stream that keeps what is written to it. */
class Capture extends Writable {
  text = '';
  override _write(chunk: Buffer | string, _encoding: string, done: (error?: Error) => void): void {
    this.text += chunk.toString();
    done();
  }
}
