import { InputError } from './inputError';
import { type ScannedNumber, scanNumber } from './scanNumber';

/** The columns a table may have: required ones must appear, optional ones may. */
export interface CsvSchema {
  readonly required: readonly string[];
  readonly optional?: readonly string[];
}

/** A numeric table read from CSV: one Float64Array per column and each row's source line. */
export class CsvTable {
  constructor(
    readonly file: string,
    /** Column names in file order. */
    readonly names: readonly string[],
    private readonly data: ReadonlyMap<string, Float64Array>,
    /** 1-based source line of every data row. */
    readonly lines: Int32Array,
    /** 1-based source line of the header row. */
    readonly headerLine: number,
  ) {}

  get rowCount(): number {
    return this.lines.length;
  }

  has(name: string): boolean {
    return this.data.has(name);
  }

  /** The named column; asking for one the file lacks is a programming error. */
  column(name: string): Float64Array {
    const values = this.data.get(name);
    if (values === undefined) throw new Error(`table ${this.file} has no column ${name}`);
    return values;
  }

  /** The named column, or undefined when the file lacks it. */
  optionalColumn(name: string): Float64Array | undefined {
    return this.data.get(name);
  }

  /** A copy whose columns may be changed (scaled to SI, say) without touching this one. */
  copy(): CsvTable {
    const data = new Map([...this.data].map(([name, values]) => [name, values.slice()]));
    return new CsvTable(this.file, this.names, data, this.lines, this.headerLine);
  }
}

const RETURN = 13;
const SPACE = 32;
const TAB = 9;
const HASH = 35;
const COMMA = 44;
const BYTE_ORDER_MARK = 0xfeff;
const INITIAL_CAPACITY = 1024;

const scanned: ScannedNumber = { value: 0 };

/**
 * Parses a numeric CSV table: the first line that is neither blank nor a comment (`#` after
 * optional spaces) names the columns; every later such line is one row of comma-separated
 * decimal numbers. CRLF line ends, a leading byte-order mark and spaces around fields are
 * tolerated. `file` only names the source in error messages.
 */
export function parseCsvTable(text: string, file: string, schema: CsvSchema): CsvTable {
  const len = text.length;
  let pos = len > 0 && text.charCodeAt(0) === BYTE_ORDER_MARK ? 1 : 0;
  let line = 0;
  let names: string[] | undefined;
  let headerLine = 0;
  while (pos <= len && names === undefined) {
    let end = text.indexOf('\n', pos);
    if (end < 0) end = len;
    line++;
    const content = text.slice(pos, end).trim();
    pos = end + 1;
    if (content === '' || content.charCodeAt(0) === HASH) continue;
    headerLine = line;
    names = parseHeader(content, file, line, schema);
  }
  if (names === undefined) {
    throw InputError.at(file, 0, '', 'empty file: no header row naming the columns');
  }
  const width = names.length;
  let capacity = INITIAL_CAPACITY;
  let columns: Float64Array[] = names.map(() => new Float64Array(capacity));
  let lines: Int32Array = new Int32Array(capacity);
  let rows = 0;
  while (pos <= len) {
    let end = text.indexOf('\n', pos);
    if (end < 0) end = len;
    line++;
    let stop = end;
    if (stop > pos && text.charCodeAt(stop - 1) === RETURN) stop--;
    let p = skipBlanks(text, pos, stop);
    const rowStart = pos;
    pos = end + 1;
    if (p === stop || text.charCodeAt(p) === HASH) continue;
    if (rows === capacity) {
      capacity *= 2;
      columns = columns.map((old) => growFloat(old, capacity));
      lines = growInt(lines, capacity);
    }
    for (let c = 0; c < width; c++) {
      const cellStart = p;
      const q = scanNumber(text, p, stop, scanned);
      if (q < 0) throw cellError(text, cellStart, stop, file, line, names[c]);
      p = skipBlanks(text, q, stop);
      if (c + 1 < width) {
        if (p === stop) throw countError(text, rowStart, stop, file, line, names);
        if (text.charCodeAt(p) !== COMMA) {
          throw cellError(text, cellStart, stop, file, line, names[c]);
        }
        p = skipBlanks(text, p + 1, stop);
      } else if (p !== stop) {
        if (text.charCodeAt(p) === COMMA) throw countError(text, rowStart, stop, file, line, names);
        throw cellError(text, cellStart, stop, file, line, names[c]);
      }
      const value = scanned.value;
      if (!Number.isFinite(value)) {
        throw InputError.at(
          file,
          line,
          names[c],
          `number out of range: "${cellText(text, cellStart, stop)}"`,
        );
      }
      columns[c][rows] = value;
    }
    lines[rows] = line;
    rows++;
  }
  const data = new Map<string, Float64Array>();
  for (let c = 0; c < width; c++) data.set(names[c], columns[c].slice(0, rows));
  return new CsvTable(file, names, data, lines.slice(0, rows), headerLine);
}

function parseHeader(content: string, file: string, line: number, schema: CsvSchema): string[] {
  const allowed = [...schema.required, ...(schema.optional ?? [])];
  const names = content.split(',').map(unquote);
  if (names.every((name) => scanNumber(name, 0, name.length, scanned) === name.length)) {
    throw InputError.at(
      file,
      line,
      '',
      `expected a header row naming the columns (${allowed.join(', ')}), got "${content}"`,
    );
  }
  const seen = new Set<string>();
  for (let i = 0; i < names.length; i++) {
    const name = names[i];
    if (name === '')
      throw InputError.at(file, line, '', `column ${i + 1} of the header has no name`);
    if (seen.has(name)) throw InputError.at(file, line, name, 'duplicate column');
    if (!allowed.includes(name)) {
      const near = allowed.find((a) => a.toLowerCase() === name.toLowerCase());
      const hint = near === undefined ? '' : ` (names are case-sensitive: "${near}"?)`;
      throw InputError.at(
        file,
        line,
        name,
        `unknown column${hint}; allowed: ${allowed.join(', ')}`,
      );
    }
    seen.add(name);
  }
  const missing = schema.required.filter((name) => !seen.has(name));
  if (missing.length > 0) {
    const what = missing.length === 1 ? 'column' : 'columns';
    throw InputError.at(
      file,
      line,
      '',
      `missing ${what} ${missing.map((m) => `"${m}"`).join(', ')}; header has ${names.join(', ')}`,
    );
  }
  return names;
}

/** Header names may come quoted from spreadsheet exports. */
function unquote(raw: string): string {
  const name = raw.trim();
  if (name.length >= 2 && name.startsWith('"') && name.endsWith('"')) {
    return name.slice(1, -1).trim();
  }
  return name;
}

function skipBlanks(text: string, p: number, stop: number): number {
  while (p < stop) {
    const ch = text.charCodeAt(p);
    if (ch !== SPACE && ch !== TAB) break;
    p++;
  }
  return p;
}

/** The cell from `start` to the next comma or the line end, trimmed; only built for errors. */
function cellText(text: string, start: number, stop: number): string {
  const comma = text.indexOf(',', start);
  return text.slice(start, comma < 0 || comma > stop ? stop : comma).trim();
}

function cellError(
  text: string,
  start: number,
  stop: number,
  file: string,
  line: number,
  column: string,
): InputError {
  const cell = cellText(text, start, stop);
  const reason = cell === '' ? 'empty field' : `not a number: "${cell}"`;
  return InputError.at(file, line, column, reason);
}

function countError(
  text: string,
  rowStart: number,
  stop: number,
  file: string,
  line: number,
  names: readonly string[],
): InputError {
  let fields = 1;
  for (let p = rowStart; p < stop; p++) if (text.charCodeAt(p) === COMMA) fields++;
  return InputError.at(
    file,
    line,
    '',
    `${fields} fields, expected ${names.length} (${names.join(', ')})`,
  );
}

function growFloat(old: Float64Array, capacity: number): Float64Array {
  const next = new Float64Array(capacity);
  next.set(old);
  return next;
}

function growInt(old: Int32Array, capacity: number): Int32Array {
  const next = new Int32Array(capacity);
  next.set(old);
  return next;
}
