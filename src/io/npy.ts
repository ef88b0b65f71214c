/**
 * NumPy's .npy format, version 1.0: magic "\x93NUMPY", version bytes 1 0, a little-endian
 * uint16 header length, then an ASCII Python dict literal padded with spaces and ended by a
 * newline so the data starts on a 64-byte boundary, then the raw array in C order.
 */
const MAGIC = [0x93, 0x4e, 0x55, 0x4d, 0x50, 0x59];
const ALIGN = 64;

/** Encodes a float32 array of the given shape (C order) as a complete .npy file. */
export function encodeNpyFloat32(data: Float32Array, shape: readonly number[]): Uint8Array {
  const count = shape.reduce((a, b) => a * b, 1);
  if (count !== data.length) {
    throw new Error(
      `npy shape (${shape.join(', ')}) holds ${count} values, data has ${data.length}`,
    );
  }
  const shapeText = shape.length === 1 ? `(${shape[0]},)` : `(${shape.join(', ')})`;
  let header = `{'descr': '<f4', 'fortran_order': False, 'shape': ${shapeText}, }`;
  const unpadded = MAGIC.length + 2 + 2 + header.length + 1;
  header += ' '.repeat((ALIGN - (unpadded % ALIGN)) % ALIGN) + '\n';
  const headerBytes = new TextEncoder().encode(header);
  const out = new Uint8Array(MAGIC.length + 4 + headerBytes.length + data.length * 4);
  out.set(MAGIC, 0);
  out[6] = 1;
  out[7] = 0;
  out[8] = headerBytes.length & 0xff;
  out[9] = headerBytes.length >> 8;
  out.set(headerBytes, 10);
  const view = new DataView(out.buffer, 10 + headerBytes.length);
  for (let i = 0; i < data.length; i++) view.setFloat32(i * 4, data[i], true);
  return out;
}

export interface NpyArray {
  descr: string;
  fortranOrder: boolean;
  shape: number[];
  data: Float32Array;
}

/** Reads a version 1.0 little-endian float32 .npy file, checking each part of the format. */
export function decodeNpyFloat32(bytes: Uint8Array): NpyArray {
  for (let i = 0; i < MAGIC.length; i++) {
    if (bytes[i] !== MAGIC[i]) throw new Error('not an .npy file: bad magic string');
  }
  if (bytes[6] !== 1) throw new Error(`unsupported .npy version ${bytes[6]}.${bytes[7]}`);
  const headerLength = bytes[8] | (bytes[9] << 8);
  const header = new TextDecoder('latin1').decode(bytes.subarray(10, 10 + headerLength));
  if (!header.endsWith('\n')) throw new Error('.npy header must end with a newline');
  const descr = /'descr':\s*'([^']*)'/.exec(header)?.[1];
  const fortran = /'fortran_order':\s*(True|False)/.exec(header)?.[1];
  const shapeText = /'shape':\s*\(([^)]*)\)/.exec(header)?.[1];
  if (descr === undefined || fortran === undefined || shapeText === undefined) {
    throw new Error('.npy header lacks descr, fortran_order or shape');
  }
  if (descr !== '<f4') throw new Error(`.npy dtype ${descr} is not little-endian float32`);
  const shape = shapeText
    .split(',')
    .map((s) => s.trim())
    .filter((s) => s.length > 0)
    .map(Number);
  const count = shape.reduce((a, b) => a * b, 1);
  const start = 10 + headerLength;
  if (bytes.length - start !== count * 4) {
    throw new Error(`.npy data has ${bytes.length - start} bytes, shape needs ${count * 4}`);
  }
  const view = new DataView(bytes.buffer, bytes.byteOffset + start, count * 4);
  const data = new Float32Array(count);
  for (let i = 0; i < count; i++) data[i] = view.getFloat32(i * 4, true);
  return { descr, fortranOrder: fortran === 'True', shape, data };
}
