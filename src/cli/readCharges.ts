import { InputError } from '../io/inputError';
import { readTextFile } from '../io/readTextFile';
import { buildCharges, parseScenarioText, type Scenario, ScenarioError } from '../io/scenario';
import { importTrajectory, unitsMismatch } from '../io/trajectoryImport';
import {
  isLengthUnit,
  isTimeUnit,
  LENGTH_UNITS,
  TIME_UNITS,
  type TrajectoryUnits,
} from '../io/trajectoryUnits';
import { pathFromTransfer } from '../path/pathTransfer';
import type { Charge } from '../physics/charge';
import type { OptionSpecs, ParsedArgs } from './args';
import type { CliIo } from './command';
import { UsageError } from './usageError';
import { parseCharge } from './values';

/** The options every command takes to name its charges. */
export const CHARGE_OPTIONS: OptionSpecs = {
  trajectory: { value: true, repeat: true },
  charge: { value: true, repeat: true },
  scenario: { value: true },
  'length-unit': { value: true },
  'time-unit': { value: true },
};

/** Help lines for the unit options, shared by every command. */
export const UNIT_OPTIONS_HELP = `  --length-unit U    unit of the trajectory files' x, y, z (and of velocities and
                     accelerations, with --time-unit): ${Object.keys(LENGTH_UNITS).join(', ')};
                     default m
  --time-unit U      unit of the trajectory files' t: ${Object.keys(TIME_UNITS).join(', ')};
                     default s`;

/** A scenario file named by --scenario, read, checked and built. */
export interface LoadedScenario {
  file: string;
  scenario: Scenario;
  /** The scenario's charges, in document order, each with its sampled path. */
  charges: Charge[];
}

/**
 * The scenario named by --scenario FILE.json, or undefined when the option is absent.
 * Refuses --scenario together with --trajectory or --charge (a usage error, before any file
 * is read). A file that is not a usable scenario is an InputError whose one-line message
 * names the file and the field, e.g. `FILE.json: charges[0].path.params.beta: must be below 1`.
 */
export function readScenarioOption(args: ParsedArgs): LoadedScenario | undefined {
  const file = args.one('scenario');
  if (file === undefined) return undefined;
  if (args.has('trajectory') || args.has('charge')) {
    throw new UsageError(
      'give the charges either with --scenario FILE.json or with --trajectory and --charge, not both',
    );
  }
  if (args.has('length-unit') || args.has('time-unit')) {
    throw new UsageError(
      '--length-unit and --time-unit apply to trajectory files; a scenario is always in SI units',
    );
  }
  const text = readTextFile(file);
  try {
    const scenario = parseScenarioText(text);
    return { file, scenario, charges: buildCharges(scenario) };
  } catch (error) {
    if (error instanceof ScenarioError) throw new InputError(`${file}: ${error.message}`, file);
    throw error;
  }
}

/**
 * The charges from --scenario FILE.json, or from repeated --trajectory FILE --charge Q pairs;
 * `loaded` is the scenario already read by readScenarioOption, when the caller has it.
 */
export function readScenarioOrCharges(
  args: ParsedArgs,
  loaded: LoadedScenario | undefined = readScenarioOption(args),
  warn: (message: string) => void = () => {},
): Charge[] {
  if (loaded !== undefined) return loaded.charges;
  if (args.all('trajectory').length === 0 && args.all('charge').length === 0) {
    throw new UsageError(
      'give the charges with --scenario FILE.json, or at least one --trajectory FILE.csv with its --charge Q',
    );
  }
  return readCharges(args, warn);
}

/**
 * The charges named by repeated --trajectory FILE --charge Q pairs, files read and checked as
 * the app's import checks them: `warn` hears of a file whose positions and velocities disagree
 * about how far the charge moves, which is what a wrong unit looks like.
 */
export function readCharges(
  args: ParsedArgs,
  warn: (message: string) => void = () => {},
): Charge[] {
  const trajectories = args.all('trajectory');
  const chargeTexts = args.all('charge');
  if (trajectories.length === 0) {
    throw new UsageError('give at least one --trajectory FILE.csv with its --charge Q');
  }
  if (chargeTexts.length !== trajectories.length) {
    throw new UsageError(
      `${trajectories.length} --trajectory but ${chargeTexts.length} --charge; ` +
        'give one --charge per --trajectory, in the same order',
    );
  }
  const values = chargeTexts.map((text) => parseCharge(text, '--charge'));
  const units = trajectoryUnits(args);
  return trajectories.map((file, k) => {
    const { summary, path } = importTrajectory(readTextFile(file), file, units);
    const mismatch = unitsMismatch(summary);
    if (mismatch !== null) {
      warn(
        `warning: ${file}: ${mismatch}; check --length-unit and --time-unit (now ${units.length} and ${units.time})`,
      );
    }
    return { charge: values[k], path: pathFromTransfer(path) };
  });
}

/** The units of --length-unit and --time-unit, SI where absent. */
function trajectoryUnits(args: ParsedArgs): TrajectoryUnits {
  const length = args.one('length-unit') ?? 'm';
  const time = args.one('time-unit') ?? 's';
  if (!isLengthUnit(length)) {
    throw new UsageError(
      `--length-unit "${length}" is not one of ${Object.keys(LENGTH_UNITS).join(', ')}`,
    );
  }
  if (!isTimeUnit(time)) {
    throw new UsageError(
      `--time-unit "${time}" is not one of ${Object.keys(TIME_UNITS).join(', ')}`,
    );
  }
  return { length, time };
}

/** A warning as one line on standard error, prefixed like the command's errors. */
export function warnTo(io: CliIo): (message: string) => void {
  return (message) => io.stderr.write(`conecast: ${message}\n`);
}
