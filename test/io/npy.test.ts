import { describe, expect, it } from 'vitest';
import { decodeNpyFloat32, encodeNpyFloat32 } from '../../src/io/npy';

// The format as NumPy publishes it: numpy.lib.format, "The .npy format" (NEP 1), version 1.0.
describe('the .npy writer', () => {
  const data = Float32Array.from({ length: 2 * 3 * 4 }, (_, i) => i * 0.5 - 3);
  const bytes = encodeNpyFloat32(data, [2, 3, 4]);

  it('starts with the magic string and version 1.0', () => {
    expect(Array.from(bytes.subarray(0, 6))).toEqual([0x93, 0x4e, 0x55, 0x4d, 0x50, 0x59]);
    expect([bytes[6], bytes[7]]).toEqual([1, 0]);
  });

  it('has a little-endian header length that aligns the data to 64 bytes', () => {
    const headerLength = bytes[8] + 256 * bytes[9];
    expect((10 + headerLength) % 64).toBe(0);
    expect(bytes.length).toBe(10 + headerLength + data.length * 4);
  });

  it('holds a Python dict literal header with descr, fortran_order and shape, ended by a newline', () => {
    const headerLength = bytes[8] + 256 * bytes[9];
    const header = String.fromCharCode(...bytes.subarray(10, 10 + headerLength));
    expect(header.endsWith('\n')).toBe(true);
    expect(header.trimEnd()).toBe("{'descr': '<f4', 'fortran_order': False, 'shape': (2, 3, 4), }");
  });

  it('stores the values as little-endian float32 in C order', () => {
    const headerLength = bytes[8] + 256 * bytes[9];
    const view = new DataView(bytes.buffer, 10 + headerLength);
    for (let i = 0; i < data.length; i++) expect(view.getFloat32(4 * i, true)).toBe(data[i]);
    expect(decodeNpyFloat32(bytes).data).toEqual(data);
    expect(decodeNpyFloat32(bytes).shape).toEqual([2, 3, 4]);
  });

  it('writes a one-dimensional shape with the trailing comma Python needs', () => {
    const one = encodeNpyFloat32(new Float32Array(5), [5]);
    expect(String.fromCharCode(...one.subarray(10, 80))).toContain("'shape': (5,)");
  });

  it('refuses a shape that does not match the data', () => {
    expect(() => encodeNpyFloat32(new Float32Array(5), [2, 3])).toThrow(
      /holds 6 values, data has 5/,
    );
  });
});
