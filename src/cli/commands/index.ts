import type { Command } from '../command';
import { fieldsCommand } from './fields';
import { powerCommand } from './power';
import { probeCommand } from './probe';
import { sliceCommand } from './slice';

/** Every subcommand, in the order `conecast --help` lists them. */
export const COMMANDS: readonly Command[] = [
  fieldsCommand,
  sliceCommand,
  probeCommand,
  powerCommand,
];

export function findCommand(name: string): Command | undefined {
  return COMMANDS.find((command) => command.name === name);
}
