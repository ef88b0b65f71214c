import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { parseScenario, type Scenario, ScenarioError } from '../../src/io/scenario';
import { decodeScenarioLink, encodeScenarioLink } from '../../src/io/scenarioLink';
import { anyText } from '../support/codePoints';
import {
  type BuiltinKeys,
  builtinKeys,
  must,
  mustBeOneLine,
  mustKeepBuiltinKeys,
  mustLeaveBuiltinsAlone,
} from '../support/propertyChecks';
import { EDITED_DOCUMENT, VALID_DOCUMENTS } from '../support/scenarioDocuments';

// Property tests of scenario links (raw DEFLATE in base64url) on damaged and hostile payloads.
// The only error decoding may throw is a one-line ScenarioError; a link that unpacks to JSON is
// judged exactly as the same document in a file; and no payload may write to built-ins.

const RUNS = 10_000;
const BASE64URL = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';

/** Raw DEFLATE of `bytes` in base64url, as a link carries it. */
async function packed(bytes: Uint8Array): Promise<string> {
  // Straight through the stream's writer and reader: twice as quick as Blob and Response.
  const stream = new CompressionStream('deflate-raw');
  const writer = stream.writable.getWriter();
  void writer.write(bytes as Uint8Array<ArrayBuffer>);
  void writer.close();
  const reader = stream.readable.getReader();
  const chunks: Uint8Array[] = [];
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    chunks.push(value);
  }
  return Buffer.concat(chunks).toString('base64url');
}

type Outcome = { scenario: Scenario } | { error: ScenarioError };

/** What decoding `payload` gives, after checking that any error is a one-line ScenarioError. */
async function decode(payload: string, before: BuiltinKeys): Promise<Outcome> {
  let outcome: Outcome;
  try {
    outcome = { scenario: await decodeScenarioLink(payload) };
  } catch (error) {
    if (!(error instanceof ScenarioError)) throw error;
    mustBeOneLine(error.message);
    must(
      error.message === `${error.path}: ${error.reason}`,
      `not "path: reason": ${error.message}`,
    );
    outcome = { error };
  }
  mustLeaveBuiltinsAlone(before);
  return outcome;
}

/** What reading the same JSON text from a file gives. */
function fromFile(text: string): Outcome | 'not JSON' {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    return 'not JSON';
  }
  try {
    return { scenario: parseScenario(value) };
  } catch (error) {
    if (!(error instanceof ScenarioError)) throw error;
    return { error };
  }
}

/** Whether two outcomes are the same scenario or the same message. */
function sameOutcome(a: Outcome, b: Outcome): boolean {
  if ('error' in a) return 'error' in b && a.error.message === b.error.message;
  return 'scenario' in b && JSON.stringify(a.scenario) === JSON.stringify(b.scenario);
}

/** Payloads of any characters, of link characters only, and of standard base64. */
const RANDOM_PAYLOAD = fc.oneof(
  anyText(120),
  fc.string({ unit: fc.constantFrom(...BASE64URL), maxLength: 400 }),
  fc.base64String({ maxLength: 200 }),
  fc.string({
    unit: fc.constantFrom('A', '_', '-', '=', '%', '#', '&', ' ', '\n', 'é'),
    maxLength: 40,
  }),
);

/** One change to a good link: cut, flip, drop, insert, swap or append characters. */
const LINK_EDIT = fc.record({
  kind: fc.constantFrom('cut', 'flip', 'flip', 'drop', 'insert', 'swap', 'append'),
  at: fc.nat(),
  by: fc.oneof(
    fc.constantFrom(...BASE64URL),
    fc.constantFrom('=', '+', '/', '%', ' ', '\n', '\u00e9', '\u2028'),
  ),
});

function editLink(link: string, edit: { kind: string; at: number; by: string }): string {
  const i = edit.at % (link.length + 1);
  switch (edit.kind) {
    case 'cut':
      return link.slice(0, i);
    case 'flip':
      return link.slice(0, i) + edit.by + link.slice(i + 1);
    case 'drop':
      return link.slice(0, i) + link.slice(i + 1);
    case 'insert':
      return link.slice(0, i) + edit.by + link.slice(i);
    case 'swap': {
      const j = (i + 1 + (edit.at % 7)) % (link.length + 1);
      const chars = [...link];
      [chars[i], chars[j]] = [chars[j] ?? '', chars[i] ?? ''];
      return chars.join('');
    }
    default:
      return link + edit.by.repeat(1 + (edit.at % 5));
  }
}

/** Bytes to compress into a link: random bytes, any text, any JSON, edited scenarios. */
const PACKED_CONTENT = fc.oneof(
  fc.uint8Array({ maxLength: 200 }).map((bytes) => ({ bytes, text: null })),
  fc
    .oneof(
      anyText(80),
      fc.jsonValue().map((v) => JSON.stringify(v) ?? ''),
    )
    .map((text) => ({ bytes: new TextEncoder().encode(text), text })),
  EDITED_DOCUMENT.map((document) => {
    const text = JSON.stringify(document);
    return { bytes: new TextEncoder().encode(text), text };
  }),
);

describe('decodeScenarioLink on generated payloads', () => {
  let links: string[] = [];
  beforeAll(async () => {
    links = await Promise.all(
      VALID_DOCUMENTS.map((document) =>
        encodeScenarioLink(parseScenario(structuredClone(document))),
      ),
    );
  });

  // Guards against a crash (in base64url decoding, a stream left erroring, invalid UTF-8) and
  // multi-line messages on payloads that were never links, and on links damaged in transit
  // (cut short by a chat tool, a character changed, one added or lost), which must be refused
  // with a ScenarioError or still give a scenario.
  it('decodes 10,000 random payloads and damaged links to a scenario or a one-line ScenarioError', async () => {
    const before = builtinKeys();
    const damaged = fc
      .tuple(
        fc.nat(VALID_DOCUMENTS.length - 1),
        fc.array(LINK_EDIT, { minLength: 1, maxLength: 3 }),
      )
      .map(([which, edits]) => edits.reduce(editLink, links[which]));
    let tried = 0;
    let refused = 0;
    await fc.assert(
      fc.asyncProperty(fc.oneof(RANDOM_PAYLOAD, damaged), async (payload) => {
        tried++;
        if ('error' in (await decode(payload, before))) refused++;
      }),
      { numRuns: RUNS, seed: 0x11c4 },
    );
    mustKeepBuiltinKeys(before);
    expect(tried).toBeGreaterThanOrEqual(RUNS);
    // Some damaged links still carry a scenario (a changed last character often does).
    expect(refused).toBeGreaterThan(RUNS / 2);
    expect(refused).toBeLessThan(RUNS);
  });

  // Guards against the link reader judging a document differently from the file reader, and
  // against crashes on well-formed DEFLATE of anything: random bytes (often invalid UTF-8),
  // random text and JSON, and hostile edits of valid scenarios.
  it('judges 10,000 packed payloads exactly as the same JSON read from a file', async () => {
    const before = builtinKeys();
    let tried = 0;
    let accepted = 0;
    await fc.assert(
      fc.asyncProperty(PACKED_CONTENT, async ({ bytes, text }) => {
        tried++;
        const outcome = await decode(await packed(bytes), before);
        if ('scenario' in outcome) accepted++;
        if (text === null) return;
        const file = fromFile(text);
        if (file === 'not JSON') {
          must(
            'error' in outcome &&
              outcome.error.message === 'link: unpacks to text that is not a scenario',
            'a link of text that is not JSON was not refused as such',
          );
        } else {
          must(sameOutcome(outcome, file), 'the link and the file disagree');
        }
      }),
      { numRuns: RUNS, seed: 0xdef1 },
    );
    mustKeepBuiltinKeys(before);
    expect(tried).toBeGreaterThanOrEqual(RUNS);
    expect(accepted).toBeGreaterThan(0);
  });
});
