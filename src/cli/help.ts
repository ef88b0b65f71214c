import type { Command } from './command';

/** Text of `conecast --help`: what the tool does and the list of commands. */
export function mainHelp(commands: readonly Command[]): string {
  const width = Math.max(...commands.map((command) => command.name.length));
  const list = commands
    .map((command) => `  ${command.name.padEnd(width)}  ${command.summary}`)
    .join('\n');
  return `conecast: electromagnetic fields of moving point charges at the retarded time

Usage:
  conecast <command> [options]
  conecast help <command>        the options of one command (or: conecast <command> --help)
  conecast --help                this text

Commands:
${list}

Units are SI throughout: seconds, metres, m/s, m/s^2, coulombs; fields come out in V/m
(E), T (B) and W/m^2 (Poynting vector). Inputs and outputs are CSV files with a header
row; see "conecast help fields" for their columns.

Exit status: 0 on success, 2 for a usage or input error (one line on standard error),
1 for an internal error.
`;
}
