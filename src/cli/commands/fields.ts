import { FIELDS_HEADER, fieldsRow } from '../../io/fieldsCsv';
import { InputError } from '../../io/inputError';
import { readPoints } from '../../io/pointsCsv';
import type { Charge } from '../../physics/charge';
import { fieldSample } from '../../physics/fieldSample';
import { evaluateFields, poyntingVector } from '../../physics/fields';
import { vec3 } from '../../physics/vec3';
import { type OptionSpecs, type ParsedArgs, parseArgs } from '../args';
import { type CliIo, type Command, EXIT_OK } from '../command';
import { LineWriter } from '../output';
import { CHARGE_OPTIONS, readScenarioOrCharges, warnTo } from '../readCharges';
import { UsageError } from '../usageError';
import { parseNumberOption } from '../values';
import { FIELDS_HELP, FIELDS_SUMMARY } from './fieldsHelp';

const OPTIONS: OptionSpecs = {
  ...CHARGE_OPTIONS,
  points: { value: true },
  time: { value: true },
  help: { value: false, short: 'h' },
};

export const fieldsCommand: Command = {
  name: 'fields',
  summary: FIELDS_SUMMARY,
  help: FIELDS_HELP,
  run: runFields,
};

/** What the command line asks for, checked before any file is read. */
interface FieldsRequest {
  args: ParsedArgs;
  points: string;
  time: number | undefined;
}

async function runFields(argv: readonly string[], io: CliIo): Promise<number> {
  const request = parseRequest(argv);
  const charges: Charge[] = readScenarioOrCharges(request.args, undefined, warnTo(io));
  const points = readPoints(request.points);
  const ownTimes = points.optionalColumn('t');
  if (ownTimes !== undefined && request.time !== undefined) {
    throw InputError.at(
      request.points,
      points.headerLine,
      't',
      'the points give their own times, so --time must not be given too',
    );
  }
  if (ownTimes === undefined && request.time === undefined) {
    throw InputError.at(
      request.points,
      points.headerLine,
      '',
      'no t column, so give the observation time with --time T (s)',
    );
  }
  const x = points.column('x');
  const y = points.column('y');
  const z = points.column('z');
  const fixedTime = request.time ?? 0;
  const out = new LineWriter(io.stdout);
  const sample = fieldSample();
  const poynting = vec3();
  await out.line(FIELDS_HEADER);
  for (let i = 0; i < points.rowCount; i++) {
    const t = ownTimes === undefined ? fixedTime : ownTimes[i];
    evaluateFields(charges, x[i], y[i], z[i], t, sample);
    poyntingVector(poynting, sample);
    await out.line(fieldsRow(x[i], y[i], z[i], t, sample, poynting));
  }
  await out.flush();
  return EXIT_OK;
}

function parseRequest(argv: readonly string[]): FieldsRequest {
  const args = parseArgs(argv, OPTIONS, 'fields');
  if (args.positionals.length > 0) {
    throw new UsageError(
      `unexpected argument "${args.positionals[0]}"; see "conecast fields --help"`,
    );
  }
  const points = args.one('points');
  if (points === undefined) {
    throw new UsageError('give the observation points with --points POINTS.csv');
  }
  const timeText = args.one('time');
  return {
    args,
    points,
    time:
      timeText === undefined
        ? undefined
        : parseNumberOption(timeText, '--time', 'a time in seconds'),
  };
}
