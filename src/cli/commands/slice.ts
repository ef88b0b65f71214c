import { availableParallelism } from 'node:os';
import { computeSlice, defaultNearRadius } from '../../engine/computeSlice';
import { createNodeSlicePool } from '../../engine/node/nodeSlicePool';
import type { ScenarioView } from '../../io/scenario';
import { isQuantity, QUANTITIES } from '../../io/sliceQuantities';
import { sliceToCsv, sliceToJson, sliceToNpy } from '../../io/sliceWriters';
import type { Charge } from '../../physics/charge';
import { type OptionSpecs, parseArgs } from '../args';
import { writeFileAtomic } from '../atomicWrite';
import { type CliIo, type Command, EXIT_OK } from '../command';
import { CHARGE_OPTIONS, readScenarioOption, readScenarioOrCharges, warnTo } from '../readCharges';
import { sliceGeometry } from '../sliceOptions';
import { UsageError } from '../usageError';
import { parseNumberOption } from '../values';
import { SLICE_HELP, SLICE_SUMMARY } from './sliceHelp';

const OPTIONS: OptionSpecs = {
  ...CHARGE_OPTIONS,
  time: { value: true },
  plane: { value: true },
  center: { value: true },
  size: { value: true },
  res: { value: true },
  out: { value: true },
  quantity: { value: true },
  stats: { value: false },
  threads: { value: true },
  'near-radius': { value: true },
  help: { value: false, short: 'h' },
};

export const sliceCommand: Command = {
  name: 'slice',
  summary: SLICE_SUMMARY,
  help: SLICE_HELP,
  run: runSlice,
};

const FORMATS = ['npy', 'csv', 'json'] as const;

async function runSlice(argv: readonly string[], io: CliIo): Promise<number> {
  const args = parseArgs(argv, OPTIONS, 'slice');
  if (args.positionals.length > 0) {
    throw new UsageError(
      `unexpected argument "${args.positionals[0]}"; see "conecast slice --help"`,
    );
  }
  // A scenario's view supplies the geometry and time the command line leaves out.
  const loaded = readScenarioOption(args);
  const defaults: Partial<Record<string, string>> =
    loaded === undefined ? {} : viewOptions(loaded.scenario.view);
  const given = (name: string) => args.one(name) ?? defaults[name];
  const need = (name: string, what: string) => {
    const value = given(name);
    if (value === undefined)
      throw new UsageError(`give ${what} with --${name}; see "conecast slice --help"`);
    return value;
  };
  const time = parseNumberOption(
    need('time', 'the observation time in s'),
    '--time',
    'a time in seconds',
  );
  const spec = sliceGeometry(
    need('plane', 'the plane'),
    given('center'),
    need('size', 'the extent W,H in m'),
    need('res', 'the grid NX,NY'),
    time,
  );
  const out = need('out', 'the output file');
  const format = FORMATS.find((f) => out.toLowerCase().endsWith(`.${f}`));
  if (format === undefined)
    throw new UsageError(`option --out: "${out}" must end in .npy, .csv or .json`);
  const quantity = args.one('quantity') ?? 'E';
  if (!isQuantity(quantity)) {
    throw new UsageError(
      `option --quantity needs one of ${Object.keys(QUANTITIES).join(', ')}, got "${quantity}"`,
    );
  }
  const threadsText = args.one('threads');
  const threads =
    threadsText === undefined
      ? availableParallelism()
      : parseNumberOption(threadsText, '--threads', 'a whole number of threads');
  if (!Number.isInteger(threads) || threads < 1 || threads > 256) {
    throw new UsageError(
      `option --threads needs a whole number from 1 to 256, got "${threadsText}"`,
    );
  }
  const nearText = args.one('near-radius');
  const nearRadius =
    nearText === undefined
      ? defaultNearRadius(spec)
      : parseNumberOption(nearText, '--near-radius', 'a length in m');
  if (!(nearRadius >= 0))
    throw new UsageError(`option --near-radius needs a length of 0 m or more, got "${nearText}"`);
  const charges: Charge[] = readScenarioOrCharges(args, loaded, warnTo(io));

  const { fields, ms, usedThreads } = await compute(spec, charges, threads, nearRadius);
  if (format === 'npy') {
    const { npy, sidecar } = sliceToNpy(fields, spec, quantity, nearRadius);
    writeFileAtomic(out, npy);
    writeFileAtomic(`${out}.json`, sidecar);
  } else if (format === 'csv') {
    writeFileAtomic(out, sliceToCsv(fields, spec, quantity, nearRadius));
  } else {
    writeFileAtomic(out, sliceToJson(fields, spec, quantity, nearRadius));
  }
  if (args.has('stats')) {
    const samples = charges.reduce((sum, c) => sum + c.path.count, 0);
    const stats = {
      points: spec.nx * spec.ny,
      ms: Math.round(ms * 1000) / 1000,
      threads: usedThreads,
      samples,
    };
    io.stderr.write(`${JSON.stringify(stats)}\n`);
  }
  return EXIT_OK;
}

/**
 * A scenario view as the option texts it stands for. Numbers print in shortest round-trip
 * form and the option parser rounds correctly, so each reads back as the same double.
 */
function viewOptions(view: ScenarioView): Partial<Record<string, string>> {
  return {
    time: String(view.time),
    plane: view.plane,
    center: view.center.join(','),
    size: view.size.join(','),
    res: view.resolution.join(','),
  };
}

async function compute(
  spec: Parameters<typeof computeSlice>[0],
  charges: Charge[],
  threads: number,
  nearRadius: number,
) {
  if (threads === 1) {
    const start = performance.now();
    const { fields } = computeSlice(spec, charges, { nearRadius });
    return { fields, ms: performance.now() - start, usedThreads: 1 };
  }
  const pool = createNodeSlicePool(threads);
  try {
    pool.setScene(charges);
    // A tiny slice first lets every worker start up, so ms counts only the computing.
    await pool.request({ ...spec, nx: 1, ny: 2 * threads }, { nearRadius });
    const result = await pool.request(spec, { nearRadius });
    if (result === null) throw new Error('the slice request was cancelled');
    return { fields: result.fields, ms: result.stats.ms, usedThreads: result.stats.threads };
  } finally {
    pool.dispose();
  }
}
