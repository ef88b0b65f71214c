import type { CsvSchema, CsvTable } from '../io/csvTable';
import { parseCsvTable } from '../io/csvTable';
import { InputError } from '../io/inputError';
import { readTextFile } from '../io/readTextFile';
import { type PathColumns, PathError, SampledPath } from './sampledPath';

const VELOCITY = ['vx', 'vy', 'vz'] as const;
const ACCELERATION = ['ax', 'ay', 'az'] as const;

/** Trajectory CSV columns: t (s), x, y, z (m); vx, vy, vz (m/s) and ax, ay, az (m/s²) optional. */
export const TRAJECTORY_SCHEMA: CsvSchema = {
  required: ['t', 'x', 'y', 'z'],
  optional: [...VELOCITY, ...ACCELERATION],
};

/** Reads a trajectory CSV file into a path; every error names the file, line and column. */
export function readTrajectory(path: string): SampledPath {
  return parseTrajectory(readTextFile(path), path);
}

/** Parses trajectory CSV text; `file` only names the source in error messages. */
export function parseTrajectory(text: string, file: string): SampledPath {
  return trajectoryFromTable(parseCsvTable(text, file, TRAJECTORY_SCHEMA));
}

/** Builds the path from a parsed table, turning the path's sample errors into file lines. */
export function trajectoryFromTable(table: CsvTable): SampledPath {
  if (table.rowCount === 0) {
    throw InputError.at(table.file, 0, '', 'no samples: a trajectory needs at least one data row');
  }
  const columns: PathColumns = {
    t: table.column('t'),
    x: table.column('x'),
    y: table.column('y'),
    z: table.column('z'),
  };
  for (const group of [VELOCITY, ACCELERATION]) {
    const missing = group.filter((name) => !table.has(name));
    if (missing.length === 3) continue;
    if (missing.length > 0) {
      throw InputError.at(
        table.file,
        table.headerLine,
        missing,
        `missing; ${group.join(', ')} must be given together or not at all`,
      );
    }
    for (const name of group) columns[name] = table.column(name);
  }
  try {
    return new SampledPath(columns);
  } catch (error) {
    if (error instanceof PathError) throw locatePathError(error, table);
    throw error;
  }
}

function locatePathError(error: PathError, table: CsvTable): InputError {
  const inRange = error.sample >= 0 && error.sample < table.rowCount;
  const line = inRange ? table.lines[error.sample] : table.headerLine;
  const given = table.has('vx');
  if (error.column === 'v') {
    // Speeds are checked on velocities: given ones, or the spline's through the positions.
    const columns = given ? [...VELOCITY] : ['x', 'y', 'z'];
    const hint = given ? '' : ' (velocities here come from a spline through x, y, z)';
    return InputError.at(table.file, line, columns, error.message + hint);
  }
  return InputError.at(
    table.file,
    line,
    table.has(error.column) ? error.column : '',
    error.message,
  );
}
