import type { Writable } from 'node:stream';

/** Where a command writes: standard output for results, standard error for messages. */
export interface CliIo {
  readonly stdout: Writable;
  readonly stderr: Writable;
}

/** One `conecast <name>` subcommand. */
export interface Command {
  readonly name: string;
  /** One line for the command list in `conecast --help`. */
  readonly summary: string;
  /** Full text for `conecast <name> --help`. */
  readonly help: string;
  /** Runs with the arguments after the command name; resolves to the exit code. */
  run(args: readonly string[], io: CliIo): Promise<number>;
}

/** Exit codes: success, an internal failure, a usage or input error. */
export const EXIT_OK = 0;
export const EXIT_FAILURE = 1;
export const EXIT_USAGE = 2;
