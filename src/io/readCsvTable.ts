import { type CsvSchema, type CsvTable, parseCsvTable } from './csvTable';
import { readTextFile } from './readTextFile';

/** Reads and parses a numeric CSV file; errors name the path as given. */
export function readCsvTable(path: string, schema: CsvSchema): CsvTable {
  return parseCsvTable(readTextFile(path), path, schema);
}
