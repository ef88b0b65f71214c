import { readTrajectory } from '../path/trajectoryCsv';
import type { Charge } from '../physics/charge';
import type { ParsedArgs } from './args';
import { UsageError } from './usageError';
import { parseCharge } from './values';

/** The charges named by repeated --trajectory FILE --charge Q pairs, files read and checked. */
export function readCharges(args: ParsedArgs): Charge[] {
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
  return trajectories.map((file, k) => ({ charge: values[k], path: readTrajectory(file) }));
}
