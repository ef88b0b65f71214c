import { readFileSync } from 'node:fs';
import { InputError } from './inputError';

/** Reads a UTF-8 file whole; failures become one-line input errors naming the file. */
export function readTextFile(path: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (error) {
    throw new InputError(`cannot read ${path}: ${describeFailure(error)}`, path);
  }
}

const REASONS: Readonly<Record<string, string>> = {
  ENOENT: 'no such file',
  ENOTDIR: 'no such file',
  EISDIR: 'is a directory',
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  ERR_STRING_TOO_LONG: 'file too large to read at once',
};

function describeFailure(error: unknown): string {
  const code = (error as { code?: unknown } | null)?.code;
  if (typeof code === 'string') return REASONS[code] ?? code;
  return error instanceof Error ? error.message : String(error);
}
