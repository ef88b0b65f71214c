import type { CsvSchema, CsvTable } from '../io/csvTable';
import { parseCsvTable } from '../io/csvTable';
import { InputError } from '../io/inputError';
import { LENGTH_UNITS, SI_UNITS, TIME_UNITS, type TrajectoryUnits } from '../io/trajectoryUnits';
import { SPEED_OF_LIGHT } from '../physics/constants';
import { type PathColumns, PathError, SampledPath } from './sampledPath';

const VELOCITY = ['vx', 'vy', 'vz'] as const;
const ACCELERATION = ['ax', 'ay', 'az'] as const;
/** Momentum per mass and c: βγ = γv/c along each axis (dimensionless). */
const MOMENTUM = ['bgx', 'bgy', 'bgz'] as const;

/**
 * Trajectory CSV columns: t, x, y, z required; velocities as vx, vy, vz or as βγ in
 * bgx, bgy, bgz (one or the other), and ax, ay, az, optional. SI unless units are given.
 */
export const TRAJECTORY_SCHEMA: CsvSchema = {
  required: ['t', 'x', 'y', 'z'],
  optional: [...VELOCITY, ...MOMENTUM, ...ACCELERATION],
};

/** Parses trajectory CSV text; `file` only names the source in error messages. */
export function parseTrajectory(
  text: string,
  file: string,
  units: TrajectoryUnits = SI_UNITS,
): SampledPath {
  return trajectoryFromTable(parseCsvTable(text, file, TRAJECTORY_SCHEMA), units);
}

/**
 * Builds the path from a parsed table, in SI: t × time unit, positions × length unit,
 * velocities × length/time, accelerations × length/time², βγ turned into v = cβγ/√(1 + |βγ|²).
 * The path's sample errors are turned into file lines. The table's columns are scaled in place.
 */
function trajectoryFromTable(table: CsvTable, units: TrajectoryUnits = SI_UNITS): SampledPath {
  return buildTrajectory(table, trajectoryColumns(table, units));
}

/** The SI columns a table describes, checked for complete groups; scales the table in place. */
export function trajectoryColumns(table: CsvTable, units: TrajectoryUnits = SI_UNITS): PathColumns {
  if (table.rowCount === 0) {
    throw InputError.at(table.file, 0, '', 'no samples: a trajectory needs at least one data row');
  }
  const metres = LENGTH_UNITS[units.length];
  const seconds = TIME_UNITS[units.time];
  const columns: PathColumns = {
    t: scaled(table.column('t'), seconds),
    x: scaled(table.column('x'), metres),
    y: scaled(table.column('y'), metres),
    z: scaled(table.column('z'), metres),
  };
  const groups = [VELOCITY, MOMENTUM, ACCELERATION].filter((group) => completeGroup(table, group));
  if (groups.includes(VELOCITY) && groups.includes(MOMENTUM)) {
    throw InputError.at(
      table.file,
      table.headerLine,
      [...VELOCITY, ...MOMENTUM],
      'give the velocity once: as vx, vy, vz or as βγ in bgx, bgy, bgz, not both',
    );
  }
  if (groups.includes(VELOCITY)) {
    const speed = metres / seconds;
    for (const name of VELOCITY) columns[name] = scaled(table.column(name), speed);
  }
  if (groups.includes(MOMENTUM)) Object.assign(columns, velocitiesFromMomentum(table));
  if (groups.includes(ACCELERATION)) {
    const acceleration = metres / (seconds * seconds);
    for (const name of ACCELERATION) columns[name] = scaled(table.column(name), acceleration);
  }
  return columns;
}

/** A path from SI columns of `table`, its sample errors named by file line and column. */
export function buildTrajectory(table: CsvTable, columns: PathColumns): SampledPath {
  try {
    return new SampledPath(columns);
  } catch (error) {
    if (error instanceof PathError) throw locatePathError(error, table);
    throw error;
  }
}

function completeGroup(table: CsvTable, group: readonly string[]): boolean {
  const missing = group.filter((name) => !table.has(name));
  if (missing.length === group.length) return false;
  if (missing.length > 0) {
    throw InputError.at(
      table.file,
      table.headerLine,
      missing,
      `missing; ${group.join(', ')} must be given together or not at all`,
    );
  }
  return true;
}

function scaled(values: Float64Array, factor: number): Float64Array {
  if (factor !== 1) for (let i = 0; i < values.length; i++) values[i] *= factor;
  return values;
}

/**
 * v = c·βγ/√(1 + |βγ|²), below c in exact arithmetic. In doubles 1 − β is resolved only down
 * to about 1e-16, so above γ ≈ 6.7e7 the velocity rounds to c: such a row is refused with that
 * reason rather than as a charge faster than light (or, overflowing, as one at rest).
 */
function velocitiesFromMomentum(table: CsvTable): Pick<PathColumns, 'vx' | 'vy' | 'vz'> {
  const c = SPEED_OF_LIGHT;
  const ux = table.column('bgx');
  const uy = table.column('bgy');
  const uz = table.column('bgz');
  const n = table.rowCount;
  const vx = new Float64Array(n);
  const vy = new Float64Array(n);
  const vz = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const gammaSquared = 1 + ux[i] * ux[i] + uy[i] * uy[i] + uz[i] * uz[i];
    const scale = c / Math.sqrt(gammaSquared);
    vx[i] = ux[i] * scale;
    vy[i] = uy[i] * scale;
    vz[i] = uz[i] * scale;
    if (
      !(gammaSquared < Number.POSITIVE_INFINITY) ||
      !(vx[i] * vx[i] + vy[i] * vy[i] + vz[i] * vz[i] < c * c)
    ) {
      const gamma = Math.sqrt(gammaSquared);
      throw InputError.at(
        table.file,
        table.lines[i],
        [...MOMENTUM],
        `γ = ${Number.isFinite(gamma) ? gamma.toPrecision(3) : 'beyond 1e154'} is too close to c for a velocity in double precision (it rounds to c above γ ≈ 6.7e7)`,
      );
    }
  }
  return { vx, vy, vz };
}

function locatePathError(error: PathError, table: CsvTable): InputError {
  const inRange = error.sample >= 0 && error.sample < table.rowCount;
  const line = inRange ? table.lines[error.sample] : table.headerLine;
  if (error.column === 'v') {
    // Speeds are checked on velocities: given ones, or the spline's through the positions.
    const given = table.has('vx') ? [...VELOCITY] : table.has('bgx') ? [...MOMENTUM] : null;
    const hint = given ? '' : ' (velocities here come from a spline through x, y, z)';
    return InputError.at(table.file, line, given ?? ['x', 'y', 'z'], error.message + hint);
  }
  const column = error.column;
  const named = table.has(column)
    ? column
    : column.startsWith('v') && table.has('bgx')
      ? `bg${column[1]}`
      : '';
  return InputError.at(table.file, line, named, error.message);
}
