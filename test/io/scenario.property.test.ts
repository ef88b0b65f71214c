import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  buildCharges,
  parseScenario,
  parseScenarioText,
  SCENARIO_FORMAT,
  type Scenario,
  ScenarioError,
} from '../../src/io/scenario';
import { formatScenario } from '../../src/io/scenarioText';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';
import { anyText, CODE_POINT } from '../support/codePoints';
import {
  type BuiltinKeys,
  builtinKeys,
  must,
  mustBeOneLine,
  mustKeepBuiltinKeys,
  mustLeaveBuiltinsAlone,
} from '../support/propertyChecks';
import { EDITED_DOCUMENT, sampleCount, VALID_DOCUMENTS } from '../support/scenarioDocuments';

// Property tests of the scenario reader on malformed and hostile documents. The only error it
// may throw is a one-line ScenarioError `path: reason`; buildCharges on what it accepts may
// only throw the same; and no document may write to Object.prototype or other built-ins.

const RUNS = 10_000;
/** buildCharges is only asked for documents this small, to keep 10,000 runs quick. */
const MOST_SAMPLES_BUILT = 20_000;
const PATH_COLUMNS = ['t', 'x', 'y', 'z', 'vx', 'vy', 'vz', 'ax', 'ay', 'az'] as const;

/** Checks that an error is a one-line ScenarioError reading `path: reason`. */
function mustBeScenarioError(error: unknown): ScenarioError {
  if (!(error instanceof ScenarioError)) throw error;
  mustBeOneLine(error.message);
  must(error.path !== '' && error.reason !== '', `empty path or reason: ${error.message}`);
  must(error.message === `${error.path}: ${error.reason}`, `not "path: reason": ${error.message}`);
  return error;
}

/** The scenario `read` gives, or undefined after checking the ScenarioError it threw. */
function attempt(read: () => Scenario): Scenario | undefined {
  try {
    return read();
  } catch (error) {
    mustBeScenarioError(error);
    return undefined;
  }
}

/**
 * Builds the charges of an accepted scenario when it is small enough: only a ScenarioError may
 * come out, and every path built is finite, in time order and below c.
 */
function checkBuild(scenario: Scenario): void {
  if (sampleCount(scenario) > MOST_SAMPLES_BUILT) return;
  let charges: ReturnType<typeof buildCharges>;
  try {
    charges = buildCharges(scenario);
  } catch (error) {
    mustBeScenarioError(error);
    return;
  }
  must(charges.length === scenario.charges.length, 'a charge went missing');
  for (const { path } of charges) {
    for (const name of PATH_COLUMNS) {
      const column = path[name];
      for (let i = 0; i < column.length; i++) {
        must(Number.isFinite(column[i]), `built a path whose ${name}[${i}] is ${column[i]}`);
      }
    }
    for (let i = 1; i < path.count; i++)
      must(path.t[i] > path.t[i - 1], 'built times out of order');
    must(path.maxSpeed < SPEED_OF_LIGHT, `built a path at ${path.maxSpeed} m/s`);
  }
}

/** Checks one value handed to parseScenario; returns the scenario when it was accepted. */
function checkValue(value: unknown, before: BuiltinKeys): Scenario | undefined {
  const scenario = attempt(() => parseScenario(value));
  mustLeaveBuiltinsAlone(before);
  return scenario;
}

/** Checks one text handed to parseScenarioText; returns the scenario when it was accepted. */
function checkText(text: string, before: BuiltinKeys): Scenario | undefined {
  const scenario = attempt(() => parseScenarioText(text));
  mustLeaveBuiltinsAlone(before);
  return scenario;
}

/** Values of every kind JavaScript has, including ones JSON cannot hold. */
const ANY_VALUE = fc.anything({
  maxDepth: 4,
  withBigInt: true,
  withBoxedValues: true,
  withDate: true,
  withMap: true,
  withNullPrototype: true,
  withObjectString: true,
  withSet: true,
  withSparseArray: true,
  withTypedArray: true,
  stringUnit: CODE_POINT,
});

/** Objects shaped like a scenario (right format tag, the usual keys) holding anything. */
const SCENARIO_SHAPED = fc.record(
  {
    format: fc.oneof(fc.constant(SCENARIO_FORMAT), ANY_VALUE),
    version: fc.oneof(fc.constantFrom(1, 2, 2.5, -0, 1e308), ANY_VALUE),
    title: ANY_VALUE,
    invented: ANY_VALUE,
    note: ANY_VALUE,
    charges: fc.oneof(
      fc.array(fc.record({ label: ANY_VALUE, charge: ANY_VALUE, path: ANY_VALUE }), {
        maxLength: 3,
      }),
      ANY_VALUE,
    ),
    view: ANY_VALUE,
    probes: ANY_VALUE,
    display: ANY_VALUE,
  },
  { requiredKeys: ['format', 'version'] },
);

/** Pieces of JSON text: brackets, keys of a scenario, hostile numbers and escapes. */
const JSON_TOKENS = fc.constantFrom(
  '{',
  '}',
  '[',
  ']',
  ':',
  ',',
  ' ',
  '\n',
  '\r\n',
  '\u2028',
  '"',
  '\\',
  '"format"',
  `"${SCENARIO_FORMAT}"`,
  '"version"',
  '"charges"',
  '"path"',
  '"kind"',
  '"__proto__"',
  '"constructor"',
  '2',
  '1',
  '-0',
  '1e999',
  '0x10',
  'NaN',
  'Infinity',
  'null',
  'true',
  'undefined',
  '"\\u0000"',
  '"\\ud800"',
  "'single'",
  '//',
  '/*',
);

/** Texts that are not JSON, nearly JSON, or the JSON of a document cut or bent somewhere. */
const RANDOM_TEXT = fc.oneof(
  anyText(200),
  fc.string({ unit: JSON_TOKENS, maxLength: 50 }),
  fc
    .record({
      document: EDITED_DOCUMENT,
      cut: fc.nat(),
      flip: fc.nat(),
      by: fc.string({ maxLength: 3 }),
    })
    .map(({ document, cut, flip, by }) => {
      const text = JSON.stringify(document);
      const at = flip % (text.length + 1);
      const bent = text.slice(0, at) + by + text.slice(at + 1);
      return bent.slice(0, bent.length - (cut % 8 === 0 ? cut % bent.length : 0));
    }),
);

describe('parseScenario on generated documents', () => {
  // Guards against a crash (a TypeError reading a property of null, a BigInt mixed with
  // numbers) on values no file gives but code might: Maps, typed arrays, sparse arrays,
  // null-prototype objects, boxed primitives, dates.
  it('refuses 10,000 arbitrary JavaScript values only with a one-line ScenarioError', () => {
    const before = builtinKeys();
    let tried = 0;
    fc.assert(
      fc.property(fc.oneof(ANY_VALUE, SCENARIO_SHAPED, fc.jsonValue()), (value) => {
        tried++;
        const scenario = checkValue(value, before);
        if (scenario !== undefined) checkBuild(scenario);
      }),
      { numRuns: RUNS, seed: 0x5ce0 },
    );
    mustKeepBuiltinKeys(before);
    expect(tried).toBeGreaterThanOrEqual(RUNS);
  });

  // Guards against stray exceptions and multi-line messages from the JSON parser's own errors,
  // which quote the text they stopped in.
  it('refuses 10,000 random and damaged texts only with a one-line ScenarioError', () => {
    const before = builtinKeys();
    let tried = 0;
    fc.assert(
      fc.property(RANDOM_TEXT, (text) => {
        tried++;
        const scenario = checkText(text, before);
        if (scenario !== undefined) checkBuild(scenario);
      }),
      { numRuns: RUNS, seed: 0x7e47 },
    );
    mustKeepBuiltinKeys(before);
    expect(tried).toBeGreaterThanOrEqual(RUNS);
  });

  // Guards against: a crash or multi-line message on a near-valid document with one field
  // replaced, removed or added (huge numbers, -0, "NaN", deep nesting, long text,
  // `__proto__`/`constructor`/`prototype` as own keys); Object.prototype being polluted; the
  // reader changing the document it was given; a build that throws anything but a
  // ScenarioError or makes an unusable path; and a document that stops opening once saved.
  it('reads 10,000 edited documents as scenarios or refuses them with a ScenarioError', () => {
    const before = builtinKeys();
    let tried = 0;
    let accepted = 0;
    fc.assert(
      fc.property(EDITED_DOCUMENT, (document) => {
        tried++;
        const text = JSON.stringify(document);
        const fromValue = checkValue(document, before);
        must(JSON.stringify(document) === text, 'parseScenario changed the document it read');
        const fromText = checkText(text, before);
        // JSON text loses only the sign of zero, which no check depends on.
        must((fromValue === undefined) === (fromText === undefined), 'value and text disagree');
        if (fromText === undefined) return;
        accepted++;
        checkBuild(fromText);
        const saved = formatScenario(fromText);
        must(attempt(() => parseScenarioText(saved)) !== undefined, `no longer opens: ${saved}`);
        mustLeaveBuiltinsAlone(before);
      }),
      { numRuns: RUNS, seed: 0xed17 },
    );
    mustKeepBuiltinKeys(before);
    expect(tried).toBeGreaterThanOrEqual(RUNS);
    // Both outcomes must be exercised for the property to mean anything.
    expect(accepted).toBeGreaterThan(RUNS / 20);
    expect(accepted).toBeLessThan(RUNS);
  });

  it('starts from documents that are all valid', () => {
    for (const document of VALID_DOCUMENTS) {
      const scenario = parseScenario(structuredClone(document));
      expect(buildCharges(scenario).length).toBe(scenario.charges.length);
    }
  });
});
