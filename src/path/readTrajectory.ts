import { readTextFile } from '../io/readTextFile';
import { SI_UNITS, type TrajectoryUnits } from '../io/trajectoryUnits';
import type { SampledPath } from './sampledPath';
import { parseTrajectory } from './trajectoryCsv';

/**
 * Reads a trajectory CSV file into a path; every error names the file, line and column.
 * Kept apart from the parser, which the browser uses, because it reads the file system.
 */
export function readTrajectory(path: string, units: TrajectoryUnits = SI_UNITS): SampledPath {
  return parseTrajectory(readTextFile(path), path, units);
}
