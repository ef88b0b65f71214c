import type { CsvSchema, CsvTable } from './csvTable';
import { readCsvTable } from './readCsvTable';

/** Observation points CSV: x, y, z (m) and, optionally, an observation time t (s) per row. */
export const POINTS_SCHEMA: CsvSchema = { required: ['x', 'y', 'z'], optional: ['t'] };

export function readPoints(path: string): CsvTable {
  return readCsvTable(path, POINTS_SCHEMA);
}
