import { oneLine } from './oneLine';

/**
 * Bad input a user can fix: a file, the line (1-based, 0 for none) and the columns concerned.
 * The message is one line that names all three, ready to print: line breaks quoted from the
 * input (a header cell with a CR or U+2028 in it) are written as escapes.
 */
export class InputError extends Error {
  constructor(
    message: string,
    readonly file: string,
    readonly line = 0,
    readonly columns: readonly string[] = [],
  ) {
    super(oneLine(message));
    this.name = 'InputError';
  }

  /** The first column concerned, or '' when none. */
  get column(): string {
    return this.columns[0] ?? '';
  }

  /** An error whose message reads `file line N, column "c": reason`. */
  static at(
    file: string,
    line: number,
    columns: string | readonly string[],
    reason: string,
  ): InputError {
    const list = typeof columns === 'string' ? (columns === '' ? [] : [columns]) : columns;
    return new InputError(`${describeLocation(file, line, list)}: ${reason}`, file, line, list);
  }
}

function describeLocation(file: string, line: number, columns: readonly string[]): string {
  let where = file;
  if (line > 0) where += ` line ${line}`;
  if (columns.length === 1) where += `, column "${columns[0]}"`;
  else if (columns.length > 1) where += `, columns ${columns.map((c) => `"${c}"`).join(', ')}`;
  return where;
}
