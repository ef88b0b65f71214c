import { InputError } from '../io/inputError';
import { type CliIo, type Command, EXIT_FAILURE, EXIT_OK, EXIT_USAGE } from './command';
import { COMMANDS, findCommand } from './commands/index';
import { mainHelp } from './help';
import { UsageError } from './usageError';

const PROCESS_IO: CliIo = { stdout: process.stdout, stderr: process.stderr };

/**
 * Runs `conecast <args>` and resolves to the exit code. Every failure becomes one line on
 * stderr, `conecast: <message>`, never a stack trace.
 */
export async function main(args: readonly string[], io: CliIo = PROCESS_IO): Promise<number> {
  try {
    return await dispatch(args, io);
  } catch (error) {
    if (error instanceof UsageError || error instanceof InputError) {
      report(io, error.message);
      return EXIT_USAGE;
    }
    // A reader that closed the pipe early (`| head`) wanted no more output: not a failure.
    if (errorCode(error) === 'EPIPE') return EXIT_OK;
    report(io, `internal error: ${error instanceof Error ? error.message : String(error)}`);
    return EXIT_FAILURE;
  }
}

async function dispatch(args: readonly string[], io: CliIo): Promise<number> {
  const [first, ...rest] = args;
  if (first === undefined) {
    io.stderr.write(mainHelp(COMMANDS));
    return EXIT_USAGE;
  }
  if (first === '--help' || first === '-h') {
    io.stdout.write(mainHelp(COMMANDS));
    return EXIT_OK;
  }
  if (first === 'help') {
    if (rest.length === 0) {
      io.stdout.write(mainHelp(COMMANDS));
      return EXIT_OK;
    }
    io.stdout.write(requireCommand(rest[0]).help);
    return EXIT_OK;
  }
  const command = requireCommand(first);
  if (asksForHelp(rest)) {
    io.stdout.write(command.help);
    return EXIT_OK;
  }
  return command.run(rest, io);
}

function requireCommand(name: string): Command {
  const command = findCommand(name);
  if (command !== undefined) return command;
  const known = COMMANDS.map((c) => c.name).join(', ');
  const what = name.startsWith('-') ? 'unknown option' : 'unknown command';
  throw new UsageError(`${what} "${name}"; commands: ${known}; see "conecast --help"`);
}

/** Help wins over every other argument, up to a `--` that ends the options. */
function asksForHelp(args: readonly string[]): boolean {
  for (const arg of args) {
    if (arg === '--') return false;
    if (arg === '--help' || arg === '-h') return true;
  }
  return false;
}

function report(io: CliIo, message: string): void {
  // Keep the report to one line even if a message carries a line break.
  io.stderr.write(`conecast: ${message.replace(/\s*\n\s*/g, ' ')}\n`);
}

function errorCode(error: unknown): unknown {
  return (error as { code?: unknown } | null)?.code;
}
