import type { Command } from '../command';
import { fieldsCommand } from './fields';
import { sliceCommand } from './slice';

/** Every subcommand, in the order `conecast --help` lists them. */
export const COMMANDS: readonly Command[] = [fieldsCommand, sliceCommand];

export function findCommand(name: string): Command | undefined {
  return COMMANDS.find((command) => command.name === name);
}
