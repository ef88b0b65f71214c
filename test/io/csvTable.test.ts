import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type CsvSchema, parseCsvTable } from '../../src/io/csvTable';
import { InputError } from '../../src/io/inputError';
import { readCsvTable } from '../../src/io/readCsvTable';

const XYZ: CsvSchema = { required: ['x', 'y', 'z'], optional: ['t'] };

/** The InputError that parsing `text` throws (fails the test when nothing is thrown). */
function parseError(text: string, schema: CsvSchema = XYZ, file = 'points.csv'): InputError {
  try {
    parseCsvTable(text, file, schema);
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('parseCsvTable', () => {
  it('reads columns by header name, in any order, with each row’s source line', () => {
    const text = '# made by hand\n  # indented comment\nz, y ,x\n3,2,1\n\n  \n6,5,4\n# done\n';
    const table = parseCsvTable(text, 'points.csv', XYZ);
    expect(table.names).toEqual(['z', 'y', 'x']);
    expect(table.headerLine).toBe(3);
    expect(table.rowCount).toBe(2);
    expect([...table.column('x')]).toEqual([1, 4]);
    expect([...table.column('z')]).toEqual([3, 6]);
    expect([...table.lines]).toEqual([4, 7]);
    expect(table.has('t')).toBe(false);
    expect(table.optionalColumn('t')).toBeUndefined();
  });

  it('tolerates CRLF line ends, a byte-order mark, a missing final newline and spaces around fields', () => {
    const text = '\uFEFFx,y,z,t\r\n 1 ,\t2, 3 ,4\r\n\r\n5,6,7,8';
    const table = parseCsvTable(text, 'points.csv', XYZ);
    expect([...table.column('t')]).toEqual([4, 8]);
    expect([...table.column('x')]).toEqual([1, 5]);
    expect([...table.lines]).toEqual([2, 4]);
  });

  it('accepts quoted header names as spreadsheets write them', () => {
    const table = parseCsvTable('"x","y","z"\n1,2,3\n', 'points.csv', XYZ);
    expect([...table.column('y')]).toEqual([2]);
  });

  it('reads the usual decimal notations', () => {
    const cells = ['-1.5', '+2', '.25', '7.', '1e3', '-2.5E-3', '1e+2', '007', '-0', '0e-999'];
    const expected = [-1.5, 2, 0.25, 7, 1000, -0.0025, 100, 7, -0, 0];
    const text = `x,y,z\n${cells.map((cell) => `${cell},0,0`).join('\n')}\n`;
    const x = parseCsvTable(text, 'points.csv', XYZ).column('x');
    for (let i = 0; i < cells.length; i++) expect(Object.is(x[i], expected[i])).toBe(true);
  });

  it('gives back every double exactly as JavaScript prints it', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ noNaN: true, noDefaultInfinity: true }), { minLength: 1 }),
        (values) => {
          const text = `x,y,z\n${values.map((v) => `${v},${-v},0`).join('\n')}\n`;
          const table = parseCsvTable(text, 'points.csv', XYZ);
          const x = table.column('x');
          const y = table.column('y');
          for (let i = 0; i < values.length; i++) {
            // String() keeps no sign on -0, so compare with == there and bit-exactly elsewhere.
            expect(x[i] === values[i] && (values[i] !== 0 || x[i] === 0)).toBe(true);
            expect(Object.is(y[i], -values[i]) || (values[i] === 0 && y[i] === 0)).toBe(true);
          }
        },
      ),
    );
  });

  it('rounds long decimal strings correctly, as Number() does', () => {
    const cells = [
      '0.1000000000000000055511151231257827',
      '9007199254740993',
      '1.7976931348623157e308',
      '4.9e-324',
      '123456789012345678901234567890',
      '0.000000000000000000000000000001234',
    ];
    const text = `x,y,z\n${cells.map((cell) => `${cell},0,0`).join('\n')}\n`;
    const x = parseCsvTable(text, 'points.csv', XYZ).column('x');
    for (let i = 0; i < cells.length; i++) expect(x[i]).toBe(Number(cells[i]));
  });

  it('names file, line and column for a cell that is not a number', () => {
    const error = parseError('x,y,z\n1,2,3\n# note\n4,5,6\n7,abc,9\n');
    expect(error.message).toBe('points.csv line 5, column "y": not a number: "abc"');
    expect(error.file).toBe('points.csv');
    expect(error.line).toBe(5);
    expect(error.column).toBe('y');
  });

  it('rejects notations other than plain decimals', () => {
    for (const cell of [
      'Infinity',
      'NaN',
      '0x10',
      '1_000',
      '1e',
      '--1',
      '1.2.3',
      '1 2',
      '.',
      'e5',
    ]) {
      const error = parseError(`x,y,z\n0,0,${cell}\n`);
      expect(error.message).toBe(`points.csv line 2, column "z": not a number: "${cell}"`);
    }
  });

  it('rejects numbers too large for a double', () => {
    expect(parseError('x,y,z\n1e400,0,0\n').message).toBe(
      'points.csv line 2, column "x": number out of range: "1e400"',
    );
  });

  it('reports an empty field by its column', () => {
    expect(parseError('x,y,z\n1,,3\n').message).toBe('points.csv line 2, column "y": empty field');
    expect(parseError('x,y,z\n1,2,\n').message).toBe('points.csv line 2, column "z": empty field');
  });

  it('reports rows with too few or too many fields', () => {
    expect(parseError('x,y,z\n1,2\n').message).toBe(
      'points.csv line 2: 2 fields, expected 3 (x, y, z)',
    );
    expect(parseError('x,y,z\n\n1,2,3,4\n').message).toBe(
      'points.csv line 3: 4 fields, expected 3 (x, y, z)',
    );
  });

  it('reports unknown, duplicate, nameless and missing header columns', () => {
    expect(parseError('x,y,z,q\n').message).toBe(
      'points.csv line 1, column "q": unknown column; allowed: x, y, z, t',
    );
    expect(parseError('x,Y,z\n').message).toBe(
      'points.csv line 1, column "Y": unknown column (names are case-sensitive: "y"?); allowed: x, y, z, t',
    );
    expect(parseError('x,y,x\n').message).toBe('points.csv line 1, column "x": duplicate column');
    expect(parseError('x,,z\n').message).toBe(
      'points.csv line 1: column 2 of the header has no name',
    );
    expect(parseError('# c\nx\n').message).toBe(
      'points.csv line 2: missing columns "y", "z"; header has x',
    );
  });

  it('keeps a message on one line when the text it quotes holds a line break', () => {
    // A file with old Mac line ends (CR only) is one long header line; U+2028 and U+2029 are
    // line terminators too (ECMA-262 §12.3). Found by test/path/trajectoryCsv.property.test.ts.
    expect(parseError('x,y,z\r1,2,3\r').message).toBe(
      'points.csv line 1, column "z\\r1": unknown column; allowed: x, y, z, t',
    );
    expect(parseError('x,y,z\n1,2\u20283,4\n').message).toBe(
      'points.csv line 2, column "y": not a number: "2\\u20283"',
    );
    expect(parseError('x,y\u2029y,z\n').message).toBe(
      'points.csv line 1, column "y\\u2029y": unknown column; allowed: x, y, z, t',
    );
  });

  it('says when the first row holds numbers instead of column names', () => {
    expect(parseError('1,2,3\n').message).toBe(
      'points.csv line 1: expected a header row naming the columns (x, y, z, t), got "1,2,3"',
    );
  });

  it('rejects a file with no header row', () => {
    for (const text of ['', '\n\n', '# only a comment\n']) {
      expect(parseError(text).message).toBe(
        'points.csv: empty file: no header row naming the columns',
      );
    }
  });

  it('gives an empty table for a header without rows', () => {
    const table = parseCsvTable('x,y,z\n', 'points.csv', XYZ);
    expect(table.rowCount).toBe(0);
    expect(table.column('x').length).toBe(0);
  });

  it('reads a million rows in well under a few seconds', () => {
    const n = 1_000_000;
    const rows: string[] = ['x,y,z,t'];
    for (let i = 0; i < n; i++) rows.push(`${i * 1e-3},${(i % 977) * 0.5},-1.25e-6,${i}`);
    const text = rows.join('\n');
    const start = performance.now();
    const table = parseCsvTable(text, 'big.csv', XYZ);
    const elapsed = performance.now() - start;
    expect(table.rowCount).toBe(n);
    expect(table.column('t')[n - 1]).toBe(n - 1);
    expect(table.lines[n - 1]).toBe(n + 1);
    // Takes about 0.3 s here; the bound only catches a slide into per-cell allocation.
    expect(elapsed).toBeLessThan(5000);
  });
});

describe('readCsvTable', () => {
  it('names a missing file in one line', () => {
    expect(() => readCsvTable('no/such/points.csv', XYZ)).toThrow(
      'cannot read no/such/points.csv: no such file',
    );
  });
});
