import { chooseSampling, probeSeries } from '../../analysis/probeSeries';
import { energySpectrum, SPECTRUM_WINDOWS, type SpectrumWindow } from '../../analysis/spectrum';
import type { Triple } from '../../engine/sliceSpec';
import { PROBE_HEADER, probeRow, SPECTRUM_HEADER, spectrumRow } from '../../io/probeCsv';
import { type OptionSpecs, parseArgs } from '../args';
import { type CliIo, type Command, EXIT_OK } from '../command';
import { LineWriter } from '../output';
import { CHARGE_OPTIONS, readScenarioOrCharges, warnTo } from '../readCharges';
import { parseList } from '../sliceOptions';
import { UsageError } from '../usageError';
import { parseNumberOption } from '../values';
import { PROBE_HELP, PROBE_SUMMARY } from './probeHelp';

const OPTIONS: OptionSpecs = {
  ...CHARGE_OPTIONS,
  at: { value: true },
  from: { value: true },
  to: { value: true },
  samples: { value: true },
  spectrum: { value: false },
  window: { value: true },
  help: { value: false, short: 'h' },
};

/** Most samples one run takes: 2²⁴ rows of CSV is already gigabytes. */
const MAX_SAMPLES = 2 ** 24;

export const probeCommand: Command = {
  name: 'probe',
  summary: PROBE_SUMMARY,
  help: PROBE_HELP,
  run: runProbe,
};

async function runProbe(argv: readonly string[], io: CliIo): Promise<number> {
  const args = parseArgs(argv, OPTIONS, 'probe');
  if (args.positionals.length > 0) {
    throw new UsageError(
      `unexpected argument "${args.positionals[0]}"; see "conecast probe --help"`,
    );
  }
  const atText = required(args.one('at'), '--at X,Y,Z (m)');
  const at = parseList(atText, '--at', 3, 'X,Y,Z in m') as Triple;
  const from = parseNumberOption(
    required(args.one('from'), '--from T0 (s)'),
    '--from',
    'a time in seconds',
  );
  const to = parseNumberOption(
    required(args.one('to'), '--to T1 (s)'),
    '--to',
    'a time in seconds',
  );
  if (!(to > from)) throw new UsageError(`--to ${to} must be after --from ${from}`);
  const spectrum = args.has('spectrum');
  const windowText = args.one('window') ?? 'hann';
  if (!SPECTRUM_WINDOWS.includes(windowText as SpectrumWindow)) {
    throw new UsageError(`--window must be ${SPECTRUM_WINDOWS.join(' or ')}, not "${windowText}"`);
  }
  if (args.one('window') !== undefined && !spectrum) {
    throw new UsageError('--window applies to --spectrum only');
  }
  const samplesText = args.one('samples');
  let samples: number | undefined;
  if (samplesText !== undefined) {
    samples = parseNumberOption(samplesText, '--samples', 'a whole number');
    if (!Number.isInteger(samples) || samples < 2 || samples > MAX_SAMPLES) {
      throw new UsageError(
        `--samples must be a whole number from 2 to ${MAX_SAMPLES}, not ${samplesText}`,
      );
    }
    if (spectrum && (samples & (samples - 1)) !== 0) {
      throw new UsageError(
        `--samples must be a power of two with --spectrum (e.g. ${2 ** Math.round(Math.log2(samples))}), not ${samples}`,
      );
    }
  }

  const charges = readScenarioOrCharges(args, undefined, warnTo(io));
  let sampling: { from: number; step: number; samples: number };
  if (samples === undefined) {
    const chosen = chooseSampling(charges, at, from, to);
    // The chosen power-of-two count spans the window with both ends included.
    sampling = { from, samples: chosen.samples, step: (to - from) / (chosen.samples - 1) };
    io.stderr.write(`conecast probe: ${chosen.samples} samples; ${chosen.reason}\n`);
  } else {
    sampling = { from, samples, step: (to - from) / (samples - 1) };
  }
  const series = probeSeries(charges, at, sampling);
  const out = new LineWriter(io.stdout);
  if (spectrum) {
    const result = energySpectrum(series, windowText as SpectrumWindow);
    await out.line(SPECTRUM_HEADER);
    for (let k = 0; k < result.f.length; k++) await out.line(spectrumRow(result, k));
  } else {
    await out.line(PROBE_HEADER);
    for (let k = 0; k < series.t.length; k++) await out.line(probeRow(series, k));
  }
  await out.flush();
  return EXIT_OK;
}

function required(value: string | undefined, what: string): string {
  if (value === undefined) throw new UsageError(`give ${what}`);
  return value;
}
