import { renameSync, rmSync, writeFileSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { UsageError } from './usageError';

/**
 * Writes a file whole or not at all: into a temporary file beside it, then renamed over
 * the target, so an interrupted run never leaves a half-written output.
 */
export function writeFileAtomic(path: string, data: string | Uint8Array): void {
  const temporary = join(dirname(path), `.${basename(path)}.${process.pid}.partial`);
  try {
    writeFileSync(temporary, data);
    renameSync(temporary, path);
  } catch (error) {
    rmSync(temporary, { force: true });
    const reason =
      (error as { code?: string }).code === 'ENOENT'
        ? 'no such folder'
        : String((error as Error).message);
    throw new UsageError(`cannot write ${path}: ${reason}`);
  }
}
