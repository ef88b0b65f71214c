import type { PathTransfer } from '../engine/workerProtocol';
import { MAX_PATH_SAMPLES } from '../path/pathLimits';
import { pathColumnsOf } from '../path/pathTransfer';
import { buildTrajectory, TRAJECTORY_SCHEMA, trajectoryColumns } from '../path/trajectoryCsv';
import { SPEED_OF_LIGHT } from '../physics/constants';
import { type CsvTable, parseCsvTable } from './csvTable';
import { InputError } from './inputError';
import type { TrajectoryUnits } from './trajectoryUnits';

/** Rows of the file shown as they are written, so a user can check the columns and units. */
const PREVIEW_ROWS = 5;

/** What a user checks before taking an imported path: its size, span, extent and speed. */
export interface TrajectorySummary {
  rows: number;
  /** Column names in file order. */
  names: string[];
  /** The first rows as written in the file (its own units), one array per row. */
  firstRows: number[][];
  /** Which velocity the file gives: 'velocity' (vx…), 'momentum' (βγ) or 'none' (from a spline). */
  velocity: 'velocity' | 'momentum' | 'none';
  accelerations: boolean;
  /** First and last sample time, s. */
  timeSpan: [number, number];
  /** Smallest and largest x, y, z over the samples, m. */
  min: [number, number, number];
  max: [number, number, number];
  /** Largest speed on the path as a fraction of c, and its Lorentz factor. */
  maxBeta: number;
  maxGamma: number;
  /**
   * How far the positions move per step against what the given velocities say (median
   * over the steps of |Δr| / (|v̄|·Δt)): about 1 when they agree, far from 1 when the units
   * of the positions, times or velocities are off. Null when no velocities are given.
   */
  positionsPerVelocity: number | null;
}

/** Positions and velocities may disagree by this factor before a file's units are doubted. */
const UNITS_TOLERANCE = 1.05;

/**
 * "the positions move 1.00e-6 times as far per step as the velocities say" when the summary's
 * positions and velocities disagree beyond 5 % (a wrong unit, most often), else null.
 */
export function unitsMismatch(summary: TrajectorySummary): string | null {
  const ratio = summary.positionsPerVelocity;
  if (ratio === null || Math.abs(Math.log(ratio)) <= Math.log(UNITS_TOLERANCE)) return null;
  const shown = ratio >= 1e-3 && ratio < 1e4 ? ratio.toPrecision(3) : ratio.toExponential(2);
  return `the positions move ${shown} times as far per step as the velocities say`;
}

/** Steps looked at for positionsPerVelocity: an even spread is enough for a median. */
const CONSISTENCY_STEPS = 4096;

export interface ImportedTrajectory {
  summary: TrajectorySummary;
  /** The path with every derivative filled in, SI, ready for the field engine. */
  path: PathTransfer;
}

/**
 * Reads trajectory CSV text as a path: the same format as `conecast fields --trajectory`,
 * with the given units. Throws an InputError naming file, line and column of the first
 * problem; at most MAX_PATH_SAMPLES rows.
 */
export function importTrajectory(
  text: string,
  file: string,
  units: TrajectoryUnits,
): ImportedTrajectory {
  return importFromTable(readTrajectoryTable(text, file), units);
}

/** The table of trajectory CSV text, checked for its columns and its length, as written. */
export function readTrajectoryTable(text: string, file: string): CsvTable {
  const table = parseCsvTable(text, file, TRAJECTORY_SCHEMA);
  if (table.rowCount > MAX_PATH_SAMPLES) {
    throw InputError.at(
      file,
      table.lines[MAX_PATH_SAMPLES],
      '',
      `more than ${MAX_PATH_SAMPLES} samples, the most a path may hold; thin the file out`,
    );
  }
  return table;
}

/**
 * The path a trajectory table describes in the given units, with its summary. The table is
 * left as it was, so another choice of units can be tried on it without reading the file again.
 */
export function importFromTable(written: CsvTable, units: TrajectoryUnits): ImportedTrajectory {
  const firstRows: number[][] = [];
  for (let r = 0; r < Math.min(PREVIEW_ROWS, written.rowCount); r++) {
    firstRows.push(written.names.map((name) => written.column(name)[r]));
  }
  const table = written.copy();
  const columns = trajectoryColumns(table, units);
  const built = buildTrajectory(table, columns);
  // The path is built for this result alone: its columns go as they are, not copied.
  const path = pathColumnsOf(built);
  const beta = Math.min(built.maxSpeed / SPEED_OF_LIGHT, 1);
  return {
    summary: {
      rows: table.rowCount,
      names: [...table.names],
      firstRows,
      velocity: table.has('vx') ? 'velocity' : table.has('bgx') ? 'momentum' : 'none',
      accelerations: table.has('ax'),
      timeSpan: built.timeSpan,
      min: [minOf(path.x), minOf(path.y), minOf(path.z)],
      max: [maxOf(path.x), maxOf(path.y), maxOf(path.z)],
      maxBeta: beta,
      maxGamma: 1 / Math.sqrt((1 - beta) * (1 + beta)),
      positionsPerVelocity: table.has('vx') || table.has('bgx') ? medianStepRatio(path) : null,
    },
    path,
  };
}

function minOf(values: Float64Array): number {
  let min = Number.POSITIVE_INFINITY;
  for (let i = 0; i < values.length; i++) if (values[i] < min) min = values[i];
  return min;
}

function maxOf(values: Float64Array): number {
  let max = Number.NEGATIVE_INFINITY;
  for (let i = 0; i < values.length; i++) if (values[i] > max) max = values[i];
  return max;
}

/** Median over evenly spread steps of |Δr| / (|v_i + v_i+1|/2 · Δt); null with fewer than 2 samples. */
function medianStepRatio(path: PathTransfer): number | null {
  const n = path.t.length;
  if (n < 2) return null;
  const stride = Math.max(1, Math.floor((n - 1) / CONSISTENCY_STEPS));
  const ratios: number[] = [];
  for (let i = 0; i + 1 < n; i += stride) {
    const dt = path.t[i + 1] - path.t[i];
    const dx = path.x[i + 1] - path.x[i];
    const dy = path.y[i + 1] - path.y[i];
    const dz = path.z[i + 1] - path.z[i];
    const vx = (path.vx[i] + path.vx[i + 1]) / 2;
    const vy = (path.vy[i] + path.vy[i + 1]) / 2;
    const vz = (path.vz[i] + path.vz[i + 1]) / 2;
    const moved = Math.sqrt(dx * dx + dy * dy + dz * dz);
    const expected = Math.sqrt(vx * vx + vy * vy + vz * vz) * dt;
    if (expected > 0 && moved > 0) ratios.push(moved / expected);
  }
  if (ratios.length === 0) return null;
  ratios.sort((a, b) => a - b);
  return ratios[Math.floor(ratios.length / 2)];
}
