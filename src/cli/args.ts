import { UsageError } from './usageError';

/** How one `--name` option is given. */
export interface OptionSpec {
  /** Takes a value, as `--name value` or `--name=value`; otherwise it is a flag. */
  readonly value: boolean;
  /** May be given more than once; the values are kept in order. */
  readonly repeat?: boolean;
  /** One-letter alias, given as `-x`. */
  readonly short?: string;
}

export type OptionSpecs = Readonly<Record<string, OptionSpec>>;

/** Options and positional arguments of one command line. */
export class ParsedArgs {
  constructor(
    private readonly values: ReadonlyMap<string, readonly string[]>,
    private readonly flags: ReadonlySet<string>,
    readonly positionals: readonly string[],
  ) {}

  /** Every value of a repeatable option, in command-line order. */
  all(name: string): readonly string[] {
    return this.values.get(name) ?? [];
  }

  /** The value of a single option, or undefined when it is absent. */
  one(name: string): string | undefined {
    return this.values.get(name)?.[0];
  }

  has(name: string): boolean {
    return this.flags.has(name) || this.values.has(name);
  }
}

/**
 * Parses argv against the option specs of `command` (named in messages). A value may begin
 * with one dash (`--charge -e`) but not two, so a forgotten value is caught as missing rather
 * than swallowing the next option. `--` ends the options.
 */
export function parseArgs(
  argv: readonly string[],
  specs: OptionSpecs,
  command: string,
): ParsedArgs {
  const values = new Map<string, string[]>();
  const flags = new Set<string>();
  const positionals: string[] = [];
  const seeHelp = `; see "conecast ${command} --help"`;
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (arg === '--') {
      positionals.push(...argv.slice(i + 1));
      break;
    }
    if (!arg.startsWith('-') || arg === '-') {
      positionals.push(arg);
      continue;
    }
    const equals = arg.indexOf('=');
    const written = equals < 0 ? arg : arg.slice(0, equals);
    const name = resolveName(written, specs);
    const spec = name === undefined ? undefined : specs[name];
    if (name === undefined || spec === undefined) {
      throw new UsageError(`unknown option ${written} for ${command}${seeHelp}`);
    }
    if (!spec.value) {
      if (equals >= 0) throw new UsageError(`option ${written} takes no value${seeHelp}`);
      flags.add(name);
      continue;
    }
    let value: string;
    if (equals >= 0) {
      value = arg.slice(equals + 1);
    } else {
      const next = argv[i + 1];
      if (next === undefined || next.startsWith('--')) {
        throw new UsageError(`option ${written} needs a value${seeHelp}`);
      }
      value = next;
      i++;
    }
    const list = values.get(name);
    if (list === undefined) values.set(name, [value]);
    else if (spec.repeat) list.push(value);
    else throw new UsageError(`option ${written} given more than once${seeHelp}`);
  }
  return new ParsedArgs(values, flags, positionals);
}

function resolveName(written: string, specs: OptionSpecs): string | undefined {
  if (written.startsWith('--')) {
    const name = written.slice(2);
    return Object.hasOwn(specs, name) ? name : undefined;
  }
  const letter = written.slice(1);
  return Object.keys(specs).find((name) => specs[name].short === letter);
}
