import { parseScenario, type Scenario, ScenarioError } from './scenario';

/** The key in a page address's fragment that carries a scenario: `#scenario=…`. */
export const LINK_KEY = 'scenario';
/** Longest link payload made, characters: longer links get cut short by mail and chat tools. */
export const MAX_LINK_CHARS = 100_000;
/** Most bytes a link may unpack to, so a hostile link cannot fill the memory. */
const MAX_UNPACKED_BYTES = 16 * 1024 * 1024;

/**
 * The scenario as a link payload: its JSON, compressed with raw DEFLATE and written in
 * base64url (no padding), safe in a URL fragment. Throws a ScenarioError when the payload
 * would be longer than MAX_LINK_CHARS (a scenario with imported samples usually is).
 */
export async function encodeScenarioLink(scenario: Scenario): Promise<string> {
  const text = JSON.stringify(scenario, (_key, value) =>
    value instanceof Float64Array ? Array.from(value) : value,
  );
  const packed = await pipe(new TextEncoder().encode(text), 'compress');
  const payload = toBase64Url(packed);
  if (payload.length > MAX_LINK_CHARS) {
    throw new ScenarioError(
      'link',
      `this scenario needs a link of ${payload.length} characters, more than the ${MAX_LINK_CHARS} a link may have (imported paths make it large): save it as a file instead`,
    );
  }
  return payload;
}

/**
 * The scenario a link payload carries, checked like a file (older versions migrate). Throws a
 * ScenarioError naming 'link' when the payload is damaged, or the field at fault.
 */
export async function decodeScenarioLink(payload: string): Promise<Scenario> {
  if (payload.length > MAX_LINK_CHARS) {
    throw new ScenarioError('link', `is ${payload.length} characters, more than ${MAX_LINK_CHARS}`);
  }
  const packed = fromBase64Url(payload);
  if (packed === null) {
    throw new ScenarioError(
      'link',
      'holds characters a scenario link never has; was it copied whole?',
    );
  }
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(await pipe(packed, 'decompress'));
  } catch (error) {
    if (error instanceof ScenarioError) throw error;
    throw new ScenarioError('link', 'is damaged and cannot be unpacked; was it copied whole?');
  }
  let input: unknown;
  try {
    input = JSON.parse(text);
  } catch {
    throw new ScenarioError('link', 'unpacks to text that is not a scenario');
  }
  return parseScenario(input);
}

/** The payload of `#scenario=…` in a URL fragment, or null when there is none. */
export function linkPayloadOf(hash: string): string | null {
  const fragment = hash.startsWith('#') ? hash.slice(1) : hash;
  for (const part of fragment.split('&')) {
    if (part.startsWith(`${LINK_KEY}=`)) return part.slice(LINK_KEY.length + 1);
  }
  return null;
}

async function pipe(bytes: Uint8Array, direction: 'compress' | 'decompress'): Promise<Uint8Array> {
  const stream =
    direction === 'compress'
      ? new CompressionStream('deflate-raw')
      : new DecompressionStream('deflate-raw');
  const writer = stream.writable.getWriter();
  void writer.write(bytes as Uint8Array<ArrayBuffer>).catch(() => {});
  void writer.close().catch(() => {});
  const reader = stream.readable.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.length;
    if (total > MAX_UNPACKED_BYTES) {
      void reader.cancel();
      throw new ScenarioError('link', `unpacks to more than ${MAX_UNPACKED_BYTES / 2 ** 20} MB`);
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    out.set(chunk, offset);
    offset += chunk.length;
  }
  return out;
}

const ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';
const INDEX = new Int8Array(128).fill(-1);
for (let k = 0; k < ALPHABET.length; k++) INDEX[ALPHABET.charCodeAt(k)] = k;

/** base64url without padding (RFC 4648 §5), by hand so it runs alike in browsers and Node. */
function toBase64Url(bytes: Uint8Array): string {
  let out = '';
  for (let i = 0; i < bytes.length; i += 3) {
    const n = (bytes[i] << 16) | ((bytes[i + 1] ?? 0) << 8) | (bytes[i + 2] ?? 0);
    const chars = Math.min(4, Math.ceil(((bytes.length - i) * 8) / 6));
    for (let k = 0; k < chars; k++) out += ALPHABET[(n >> (18 - 6 * k)) & 63];
  }
  return out;
}

/** The bytes of base64url text, or null when it holds a character outside the alphabet. */
function fromBase64Url(text: string): Uint8Array | null {
  if (text.length % 4 === 1) return null;
  const out = new Uint8Array(Math.floor((text.length * 6) / 8));
  let bits = 0;
  let value = 0;
  let o = 0;
  for (let i = 0; i < text.length; i++) {
    const code = text.charCodeAt(i);
    const digit = code < 128 ? INDEX[code] : -1;
    if (digit < 0) return null;
    value = (value << 6) | digit;
    bits += 6;
    if (bits >= 8) {
      bits -= 8;
      out[o++] = (value >> bits) & 255;
      value &= (1 << bits) - 1;
    }
  }
  return out;
}
