import { patternInPlane } from '../../analysis/angularPattern';
import { lienardPower } from '../../analysis/radiatedPower';
import { NAMED_PLANES, type PlaneName } from '../../engine/sliceSpec';
import { pathState } from '../../path/pathState';
import { type OptionSpecs, parseArgs } from '../args';
import { type CliIo, type Command, EXIT_OK } from '../command';
import { LineWriter } from '../output';
import { CHARGE_OPTIONS, readScenarioOrCharges, warnTo } from '../readCharges';
import { UsageError } from '../usageError';
import { parseNumberOption } from '../values';
import { PATTERN_HEADER, POWER_HEADER, POWER_HELP, POWER_SUMMARY } from './powerHelp';

const OPTIONS: OptionSpecs = {
  ...CHARGE_OPTIONS,
  which: { value: true },
  'source-time': { value: true },
  pattern: { value: false },
  plane: { value: true },
  angles: { value: true },
  help: { value: false, short: 'h' },
};

export const powerCommand: Command = {
  name: 'power',
  summary: POWER_SUMMARY,
  help: POWER_HELP,
  run: runPower,
};

async function runPower(argv: readonly string[], io: CliIo): Promise<number> {
  const args = parseArgs(argv, OPTIONS, 'power');
  if (args.positionals.length > 0) {
    throw new UsageError(
      `unexpected argument "${args.positionals[0]}"; see "conecast power --help"`,
    );
  }
  const timeText = args.one('source-time');
  if (timeText === undefined)
    throw new UsageError('give the emission time with --source-time T (s)');
  const sourceTime = parseNumberOption(timeText, '--source-time', 'a time in seconds');
  const pattern = args.has('pattern');
  const planeText = args.one('plane') ?? 'xy';
  if (!(planeText in NAMED_PLANES))
    throw new UsageError(`--plane must be xy, xz or yz, not "${planeText}"`);
  const anglesText = args.one('angles');
  const angles =
    anglesText === undefined ? 360 : parseNumberOption(anglesText, '--angles', 'a whole number');
  if (!Number.isInteger(angles) || angles < 4 || angles > 100_000) {
    throw new UsageError(`--angles must be a whole number from 4 to 100000, not ${anglesText}`);
  }
  if (!pattern && (args.one('plane') !== undefined || anglesText !== undefined)) {
    throw new UsageError('--plane and --angles apply to --pattern only');
  }

  const charges = readScenarioOrCharges(args, undefined, warnTo(io));
  const whichText = args.one('which');
  let index = 0;
  if (whichText !== undefined) {
    const k = parseNumberOption(whichText, '--which', 'a whole number');
    if (!Number.isInteger(k) || k < 1 || k > charges.length) {
      throw new UsageError(`--which must be from 1 to ${charges.length}, not ${whichText}`);
    }
    index = k - 1;
  } else if (charges.length > 1) {
    throw new UsageError(`${charges.length} charges given; choose one with --which K (from 1)`);
  }
  const { charge, path } = charges[index];
  const state = pathState();
  path.stateAt(sourceTime, state);
  const power = lienardPower(charge, state);
  const out = new LineWriter(io.stdout);
  if (!pattern) {
    await out.line(POWER_HEADER);
    await out.line(`${sourceTime},${power}`);
  } else {
    const { u, v } = NAMED_PLANES[planeText as PlaneName];
    const result = patternInPlane(path, charge, sourceTime, u, v, angles);
    await out.line(`# Liénard power at source time ${sourceTime} s: ${power} W`);
    await out.line(PATTERN_HEADER);
    for (let k = 0; k < angles; k++) {
      await out.line(`${result.angle[k]},${result.perSourceTime[k]},${result.perObserverTime[k]}`);
    }
  }
  await out.flush();
  return EXIT_OK;
}
