import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  compileMotion,
  ExpressionError,
  expressionColumns,
  type MotionExpressions,
} from '../../src/path/expressionPath';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';
import { anyText } from '../support/codePoints';
import {
  type BuiltinKeys,
  builtinKeys,
  must,
  mustBeOneLine,
  mustKeepBuiltinKeys,
  mustLeaveBuiltinsAlone,
} from '../support/propertyChecks';

// Property tests of the formula paths (a restricted mathjs) on random and hostile formulas.
// The only error compiling, evaluating or sampling may throw is an ExpressionError with a
// one-line message; and no formula may run code or reach outside: globalThis and the
// prototypes of Object, Function, Array, String and Number keep exactly their own keys.

const RUNS = 10_000;
const AXES = ['x', 'y', 'z'] as const;

/** Tokens of mathjs syntax that a formula must not be able to use, and names of things to reach. */
const HOSTILE_TOKENS = [
  'import',
  'createUnit',
  'evaluate',
  'parse',
  'compile',
  'simplify',
  'derivative',
  'resolve',
  'chain',
  'config',
  'typed',
  'help',
  'reviver',
  'map',
  'forEach',
  'matrix',
  'range',
  'constructor',
  '__proto__',
  'prototype',
  'toString',
  'valueOf',
  'bind',
  'call',
  'apply',
  'Function',
  'Object',
  'eval',
  'this',
  'globalThis',
  'window',
  'process',
  'require',
  'return',
  'new',
  'f(x)=',
  'f(t)',
  '=',
  ';',
  '.',
  '[',
  ']',
  '"',
  "'",
  '`',
  '{',
  '}',
  '->',
  '=>',
  ':',
  '!',
  '?',
  '==',
  '&',
  '|',
  '@',
  '#',
  '$',
  '\\',
  '\n',
  '[1, 2; 3, 4]',
  '5 cm',
  'cm',
  'to',
  'in',
  'i',
  'Infinity',
  'NaN',
  'true',
  'null',
  'undefined',
  '0x1F',
  '0b101',
  '1e400',
  '%',
];

/** Ordinary formula syntax: t, the constants, allowed functions, operators and numbers. */
const MATH_TOKENS = [
  't',
  't',
  'pi',
  'e',
  'c',
  'sin',
  'cos',
  'tan',
  'sqrt',
  'exp',
  'log',
  'abs',
  'atan2',
  'hypot',
  'min',
  'max',
  'mod',
  'nthRoot',
  'round',
  'sign',
  '^',
  '*',
  '/',
  '+',
  '-',
  '(',
  '(',
  ')',
  ')',
  ',',
  ' ',
  ' ',
  '<',
  'and',
  'not',
  '1',
  '2',
  '0.5',
  '1e-9',
  '3e8',
  '1e308',
];

/** Whole payloads that try to run code, define things or escape the sandbox. */
const PAYLOADS = [
  'constructor.constructor("globalThis.__pwned=1")()',
  'cos.constructor("globalThis.__pwned=1")(1)',
  'sin["constructor"]("globalThis.__pwned=1")()',
  '__proto__.polluted = 1',
  'constructor.prototype.polluted = 1',
  '{}["__proto__"]["polluted"] = 1',
  'import({__pwned: 1}, {override: true})',
  'import({sin: 1}, {override: true}); sin(t)',
  'createUnit("pwned")',
  'evaluate("globalThis.__pwned=1")',
  'parse("1").compile().evaluate()',
  'compile("1")',
  'simplify("t + t")',
  'derivative("t^2", "t")',
  'f(x) = x; f(t)',
  'f(x) = f(x); f(1)',
  'map([1, 2], f(x) = x)',
  'x = 5',
  'pi = 3',
  't = 1; t',
  '[1, 2, 3][1]',
  '{a: 1}.a',
  '"abc".length',
  'sin.name',
  'this',
  'globalThis.process.exit(1)',
  'process.exit(1)',
  'require("fs")',
  'eval("1")',
  'Function("return this")()',
  'chain(1).done()',
  'typed("f", {"number": f(x) = x})',
  '5 cm to m',
  'sqrt(-1)',
  't!',
  "t'",
  '1:3',
  'true ? t : 0',
  't > 0',
  '1/0',
  '0/0',
  '10^400',
  'log(0)',
  'round(t, 100)',
  'nthRoot(-8, t)',
  'mod(t, 0)',
  `${'('.repeat(300)}t${')'.repeat(300)}`,
  `${'sin('.repeat(80)}t${')'.repeat(80)}`,
  `t${'+t'.repeat(999)}`,
  `t${'+t'.repeat(1001)}`,
];

const SOUP = fc.string({
  unit: fc.constantFrom(...HOSTILE_TOKENS, ...MATH_TOKENS, ...MATH_TOKENS),
  maxLength: 16,
});

/** Formulas built by a small grammar, so many of them parse and compile. */
const { formula: GRAMMAR } = fc.letrec<{ formula: string }>((tie) => ({
  formula: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    {
      weight: 8,
      arbitrary: fc.constantFrom(
        't',
        'pi',
        'e',
        'c',
        '0',
        '1',
        '2.5',
        '1e-9',
        '3e8',
        '-0',
        '1e308',
      ),
    },
    fc.constantFrom(...HOSTILE_TOKENS),
    fc
      .tuple(
        fc.constantFrom('sin', 'cos', 'sqrt', 'exp', 'log', 'abs', 'cbrt', 'sinh', 'acos', 'floor'),
        tie('formula'),
      )
      .map(([fn, arg]) => `${fn}(${arg})`),
    fc
      .tuple(
        fc.constantFrom('atan2', 'pow', 'mod', 'hypot', 'min', 'max', 'log', 'nthRoot', 'round'),
        tie('formula'),
        tie('formula'),
      )
      .map(([fn, a, b]) => `${fn}(${a}, ${b})`),
    fc
      .tuple(
        tie('formula'),
        fc.constantFrom('+', '-', '*', '/', '^', ' mod ', ' ', '<', '==', ' and ', ' or '),
        tie('formula'),
      )
      .map(([a, op, b]) => `(${a})${op}(${b})`),
    fc
      .tuple(tie('formula'), tie('formula'), tie('formula'))
      .map(([condition, a, b]) => `${condition} ? ${a} : ${b}`),
    fc.constantFrom(...PAYLOADS),
  ),
}));

const FORMULA = fc.oneof(
  { weight: 3, arbitrary: SOUP },
  { weight: 4, arbitrary: GRAMMAR },
  { weight: 2, arbitrary: fc.constantFrom(...PAYLOADS) },
  { weight: 1, arbitrary: anyText(30) },
);

const MOTION: fc.Arbitrary<MotionExpressions> = fc.record({
  x: FORMULA,
  y: fc.oneof(fc.constant('0'), FORMULA),
  z: fc.oneof(fc.constant('0'), FORMULA),
});

/** Times a compiled motion is evaluated at: zero, ordinary, negative, huge and tiny. */
const TIMES = [0, 1e-9, -2.5e-10, 0.37, -1e6, 1e300, 5e-324];

/** Checks that an error is an ExpressionError with a one-line message. */
function mustBeExpressionError(error: unknown): ExpressionError {
  if (!(error instanceof ExpressionError)) throw error;
  mustBeOneLine(error.message);
  mustBeOneLine(error.detail);
  return error;
}

/** Compiles and evaluates one motion; returns whether it compiled. */
function checkMotion(expressions: MotionExpressions, before: BuiltinKeys): boolean {
  let motion: ReturnType<typeof compileMotion>;
  try {
    motion = compileMotion(expressions);
  } catch (error) {
    const refused = mustBeExpressionError(error);
    must(AXES.includes(refused.field as 'x'), `names ${refused.field}, not a formula`);
    mustLeaveBuiltinsAlone(before);
    return false;
  }
  const out: [number, number, number] = [0, 0, 0];
  for (const t of TIMES) {
    try {
      motion(t, out);
      must(out.every(Number.isFinite), `gave [${out}] at t = ${t}`);
    } catch (error) {
      mustBeExpressionError(error);
    }
  }
  mustLeaveBuiltinsAlone(before);
  return true;
}

describe('formula paths on generated formulas', () => {
  // Guards against: a formula that runs code, defines functions or units, or reaches an object
  // through ., [], constructor or __proto__ (a sandbox escape); errors other than
  // ExpressionError from mathjs's parser, typed functions or evaluation; non-finite positions.
  it('compile 10,000 random and hostile motions, or refuse them, without reaching outside', () => {
    const before = builtinKeys();
    let tried = 0;
    let compiled = 0;
    fc.assert(
      fc.property(MOTION, (expressions) => {
        tried++;
        if (checkMotion(expressions, before)) compiled++;
      }),
      { numRuns: RUNS, seed: 0xf0c5 },
    );
    mustKeepBuiltinKeys(before);
    expect(tried).toBeGreaterThanOrEqual(RUNS);
    // Both outcomes must be exercised for the property to mean anything.
    expect(compiled).toBeGreaterThan(RUNS / 10);
    expect(compiled).toBeLessThan(RUNS);
  });

  // Guards against sampling that throws anything but ExpressionError for a hostile range
  // (NaN, ±Infinity, -0, 1e308, reversed) or count, and against columns a path cannot use:
  // wrong length, times that are not finite or go backwards, ends other than from and to.
  it('sample 10,000 formulas on hostile ranges into finite, ordered columns or refuse them', () => {
    const before = builtinKeys();
    let tried = 0;
    let sampled = 0;
    const bound = fc.oneof(
      fc.double(),
      fc.constantFrom(
        0,
        -0,
        1e-9,
        -1e-9,
        1,
        1e308,
        -1e308,
        5e-324,
        Number.MAX_VALUE,
        -Number.MAX_VALUE,
      ),
    );
    const count = fc.oneof(
      fc.integer({ min: -2, max: 12 }),
      fc.constantFrom(2.5, Number.NaN, Number.POSITIVE_INFINITY, 1_000_001, 2 ** 53),
    );
    fc.assert(
      fc.property(
        fc.oneof(MOTION, fc.constant({ x: 't', y: '0', z: '0' })),
        bound,
        bound,
        count,
        (expressions, from, to, samples) => {
          tried++;
          let columns: ReturnType<typeof expressionColumns>;
          try {
            columns = expressionColumns(expressions, from, to, samples);
          } catch (error) {
            mustBeExpressionError(error);
            mustLeaveBuiltinsAlone(before);
            return;
          }
          sampled++;
          const { t, x, y, z } = columns;
          must(t.length === samples && x.length === samples, `${t.length} samples, not ${samples}`);
          must(t[0] === from && t[samples - 1] === to, `runs ${t[0]} to ${t[samples - 1]}`);
          for (let i = 0; i < samples; i++) {
            must(Number.isFinite(t[i]), `t[${i}] = ${t[i]} on [${from}, ${to}]`);
            must(i === 0 || t[i] >= t[i - 1], `t[${i}] = ${t[i]} before t[${i - 1}] = ${t[i - 1]}`);
            const at = [x[i], y[i], z[i]];
            must(at.every(Number.isFinite), `position [${at}] at t = ${t[i]}`);
          }
          mustLeaveBuiltinsAlone(before);
        },
      ),
      { numRuns: RUNS, seed: 0x5a3b },
    );
    mustKeepBuiltinKeys(before);
    expect(tried).toBeGreaterThanOrEqual(RUNS);
    expect(sampled).toBeGreaterThan(RUNS / 20);
  });

  it('leaves mathjs as it was: the allowed functions still give their values', () => {
    const out: [number, number, number] = [0, 0, 0];
    compileMotion({ x: 'sin(pi/2) + cos(0)', y: 'hypot(3, 4)', z: 'c' })(0, out);
    // sin(π/2) and cos(0) are 1 to within an ulp; 3-4-5 is exact.
    expect(out[0]).toBeCloseTo(2, 15);
    expect(out[1]).toBe(5);
    expect(out[2]).toBe(SPEED_OF_LIGHT);
  });
});
