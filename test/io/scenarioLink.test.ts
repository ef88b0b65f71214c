import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseScenarioText } from '../../src/io/scenario';
import {
  decodeScenarioLink,
  encodeScenarioLink,
  linkPayloadOf,
  MAX_LINK_CHARS,
} from '../../src/io/scenarioLink';
import { mulberry32 } from '../support/random';

const demo = parseScenarioText(
  readFileSync(new URL('../../public/scenarios/demo.json', import.meta.url), 'utf8'),
);

async function refusal(payload: string): Promise<string> {
  try {
    await decodeScenarioLink(payload);
  } catch (error) {
    return (error as Error).message;
  }
  throw new Error('expected the link to be refused');
}

/** Raw DEFLATE of `bytes` in base64url, as a link would carry it. */
async function packed(bytes: Uint8Array): Promise<string> {
  const stream = new Blob([bytes as Uint8Array<ArrayBuffer>])
    .stream()
    .pipeThrough(new CompressionStream('deflate-raw'));
  const buffer = Buffer.from(await new Response(stream).arrayBuffer());
  return buffer.toString('base64url');
}

describe('a scenario link', () => {
  it('carries the demo and gives it back equal, in a fragment-safe alphabet', async () => {
    const payload = await encodeScenarioLink(demo);
    expect(payload).toMatch(/^[A-Za-z0-9_-]+$/);
    // Compression keeps the demo's link short enough to paste anywhere.
    expect(payload.length).toBeLessThan(1000);
    expect(await decodeScenarioLink(payload)).toEqual(demo);
  });

  it('agrees with Node’s own base64url (RFC 4648 §5) for every payload length mod 3', async () => {
    for (const title of ['a', 'ab', 'abc', 'abcd']) {
      const scenario = { ...demo, title };
      const payload = await encodeScenarioLink(scenario);
      const bytes = Buffer.from(payload, 'base64url');
      expect(Buffer.from(bytes).toString('base64url')).toBe(payload);
      expect((await decodeScenarioLink(payload)).title).toBe(title);
    }
  });

  it('is found in a page address fragment among other keys', () => {
    expect(linkPayloadOf('#scenario=abc_-')).toBe('abc_-');
    expect(linkPayloadOf('#x=1&scenario=QQ')).toBe('QQ');
    expect(linkPayloadOf('#other=1')).toBeNull();
    expect(linkPayloadOf('')).toBeNull();
  });

  it('refuses a scenario too large for a link, saying to save a file', async () => {
    // Noisy samples, as a tracking code writes them, do not compress away.
    const random = mulberry32(61);
    const n = 200_000;
    const t = Float64Array.from({ length: n }, (_, i) => i * 1e-12 + random() * 1e-15);
    const x = Float64Array.from({ length: n }, () => random());
    const zero = new Float64Array(n);
    const large = {
      ...demo,
      charges: [{ ...demo.charges[0], path: { kind: 'samples' as const, t, x, y: zero, z: zero } }],
    };
    await expect(encodeScenarioLink(large)).rejects.toThrow(
      /^link: this scenario needs a link of \d+ characters, more than the 100000 a link may have/,
    );
  });

  it.each([
    ['not base64url', 'abc$def', 'link: holds characters a scenario link never has'],
    ['one stray character', 'A', 'link: holds characters a scenario link never has'],
    ['not DEFLATE', 'AAAAAAAAAAAAAAAA', 'link: is damaged and cannot be unpacked'],
  ])('refuses %s in one line', async (_what, payload, start) => {
    const message = await refusal(payload);
    expect(message.startsWith(start)).toBe(true);
    expect(message).not.toContain('\n');
  });

  it('refuses a link cut short', async () => {
    const payload = await encodeScenarioLink(demo);
    const message = await refusal(payload.slice(0, payload.length - 40));
    expect(message).toMatch(/^link: (is damaged|holds characters|unpacks to text)/);
  });

  it('refuses a link that unpacks to more than 16 MB without unpacking it all', async () => {
    const bomb = await packed(new Uint8Array(64 * 1024 * 1024).fill(32));
    expect(bomb.length).toBeLessThan(MAX_LINK_CHARS);
    expect(await refusal(bomb)).toBe('link: unpacks to more than 16 MB');
  });

  it('names the field of a well-formed link whose scenario is broken', async () => {
    const broken = await packed(
      new TextEncoder().encode(JSON.stringify({ ...demo, view: { ...demo.view, plane: 'uv' } })),
    );
    expect(await refusal(broken)).toBe('view.plane: must be "xy" or "xz" or "yz"');
  });
});
