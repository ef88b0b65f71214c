import { afterEach, describe, expect, it, vi } from 'vitest';
import {
  compileMotion,
  ExpressionError,
  expressionColumns,
  MAX_EXPRESSION_LENGTH,
  type MotionExpressions,
} from '../../src/path/expressionPath';
import { pathState } from '../../src/path/pathState';
import { SampledPath } from '../../src/path/sampledPath';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';

const c = SPEED_OF_LIGHT;
const at = (x: string, y = '0', z = '0'): MotionExpressions => ({ x, y, z });

function expressionErrorOf(run: () => unknown): ExpressionError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(ExpressionError);
    return error as ExpressionError;
  }
  throw new Error('expected an ExpressionError');
}

describe('compileMotion', () => {
  it('0.01*cos(2*pi*1e8*t) matches the closed form', () => {
    const motion = compileMotion(at('0.01*cos(2*pi*1e8*t)', 'c*t/2', '-3e-3'));
    const out: [number, number, number] = [0, 0, 0];
    for (let k = -20; k <= 20; k++) {
      const t = k * 7.3e-10;
      motion(t, out);
      // mathjs does the same IEEE operations in the same order, so at most an ulp of 0.01 m.
      expect(Math.abs(out[0] - 0.01 * Math.cos(2 * Math.PI * 1e8 * t))).toBeLessThanOrEqual(2e-18);
      expect(out[1]).toBe((c * t) / 2);
      expect(out[2]).toBe(-3e-3);
    }
  });

  it('knows t, pi, e, c, the usual functions and implicit multiplication', () => {
    const motion = compileMotion(
      at('2 pi t', 'e^2 + log(8, 2) + atan2(1, 1) + hypot(3, 4)', 't < 0 ? 0 : sqrt(t) mod 1'),
    );
    const out: [number, number, number] = [0, 0, 0];
    motion(0.25, out);
    // Each a handful of double operations: 1e-14 relative is rounding.
    expect(out[0]).toBeCloseTo(0.5 * Math.PI, 14);
    expect(out[1]).toBeCloseTo(Math.E ** 2 + 3 + Math.PI / 4 + 5, 13);
    expect(out[2]).toBe(0.5);
  });

  it.each([
    ['x', 'cos(t))', 'x(t): unexpected ")" at character 7'],
    ['x', 'sin(t', 'x(t): ")" expected at character 6'],
    ['x', '1 +', 'x(t): unexpected end of expression at character 4'],
    ['y', 'foo', 'y(t): unknown symbol "foo"'],
    ['y', '2*foo(t)', 'y(t): unknown function "foo"'],
    ['z', 'atan2(t)', 'z(t): atan2 takes 2 arguments, not 1'],
    ['z', '   ', 'z(t): is empty'],
    ['z', 'sin', 'z(t): "sin" is a function; write sin(…)'],
  ] as const)('names the formula and the reason: %s(t) = %j', (axis, formula, message) => {
    const expressions = { ...at('0'), [axis]: formula };
    expect(expressionErrorOf(() => compileMotion(expressions)).message).toBe(message);
  });

  it('names the time when a value is not finite', () => {
    const motion = compileMotion(at('0', '0', '1/(t - 1.2e-9)'));
    const error = expressionErrorOf(() => motion(1.2e-9, [0, 0, 0]));
    expect(error.message).toBe('z(t) at t = 1.2e-9 s: is not a finite number');
    expect([error.field, error.reason, error.time]).toEqual([
      'z',
      'is not a finite number',
      1.2e-9,
    ]);
  });
});

describe('compileMotion refuses hostile and non-numeric input without running it', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
  });

  it.each([
    ['import({}, {})', 'unknown function "import"'],
    ['evaluate("1")', 'unknown function "evaluate"'],
    ['createUnit("x")', 'unknown function "createUnit"'],
    ['parse("1")', 'unknown function "parse"'],
    ['constructor', 'unknown symbol "constructor"'],
    ['__proto__', 'unknown symbol "__proto__"'],
    ['toString()', 'unknown function "toString"'],
    ['cos.constructor', 'properties and indexing (. and […]) are not allowed'],
    ['cos["constructor"]("return 1")(1)', 'only named functions such as sin(t) may be called'],
    ['f(x) = x', 'defining functions is not allowed'],
    ['t = 1', 'assignments (=) are not allowed'],
    ['1; 2', 'only one formula is allowed (no ; or line breaks)'],
    ['[1,2]', 'lists and matrices ([…]) are not allowed'],
    ['{a: 1}', 'objects ({…}) are not allowed'],
    ['"1"', 'text in quotes is not allowed'],
    ['true', 'true is not allowed; only plain numbers are'],
    ['5 cm', 'unknown symbol "cm" (units are not supported: lengths are in m, times in s)'],
    ['`1`', 'unexpected "`1`" at character 1'],
    [`${'('.repeat(400)}t${')'.repeat(400)}`, 'is nested too deeply'],
    [`${'sin('.repeat(70)}t${')'.repeat(70)}`, 'is nested too deeply (more than 64 levels)'],
  ])('%j', (formula, reason) => {
    expect(expressionErrorOf(() => compileMotion(at(formula))).message).toBe(`x(t): ${reason}`);
  });

  it('a formula whose parse error quotes a line break, in one line', () => {
    // mathjs quotes the part it stopped at. Found by test/path/expressionPath.property.test.ts.
    const error = expressionErrorOf(() => compileMotion(at('t +\u2028 1')));
    expect(error.message).toBe('x(t): syntax error in part "\\u2028 1" at character 4');
    expect(error.detail).toBe('syntax error in part "\\u2028 1" at character 4');
  });

  it('a formula longer than the limit, before parsing it', () => {
    const long = `t${'+t'.repeat(MAX_EXPRESSION_LENGTH)}`;
    expect(expressionErrorOf(() => compileMotion(at('0', long))).message).toBe(
      `y(t): is ${long.length} characters long; the limit is ${MAX_EXPRESSION_LENGTH}`,
    );
  });

  it('a value that is complex or true/false, at the time it occurs', () => {
    expect(expressionErrorOf(() => compileMotion(at('sqrt(-1)'))(0, [0, 0, 0])).message).toBe(
      'x(t) at t = 0 s: is a complex number, not a real one',
    );
    expect(expressionErrorOf(() => compileMotion(at('t > 1'))(2, [0, 0, 0])).message).toBe(
      'x(t) at t = 2 s: is true or false, not a number',
    );
  });

  it('leaves prototypes and globals untouched, and works with eval and Function unavailable', () => {
    const attempts = [
      '__proto__.polluted = 1',
      'constructor.prototype.polluted = 1',
      'cos.constructor("globalThis.pwned = 1")(1)',
      'import({sin: 1}, {override: true})',
    ];
    for (const formula of attempts) expressionErrorOf(() => compileMotion(at(formula)));
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect((globalThis as Record<string, unknown>).pwned).toBeUndefined();
    // Under a CSP without 'unsafe-eval' these throw; compiling and evaluating must not need them.
    // Function stays readable (mathjs checks Function.prototype) but cannot be called or constructed.
    const refuse = () => {
      throw new Error('eval is not allowed here');
    };
    vi.stubGlobal('eval', refuse);
    vi.stubGlobal('Function', new Proxy(Function, { apply: refuse, construct: refuse }));
    const out: [number, number, number] = [0, 0, 0];
    compileMotion(at('sin(2 pi t)', 'max(t, 0)', 'c t'))(0.25, out);
    // sin(π/2) is 1 to within an ulp.
    expect(out[0]).toBeCloseTo(1, 15);
    expect(out[1]).toBe(0.25);
  });
});

describe('expressionColumns', () => {
  it('samples positions only, and SampledPath recovers the velocity of x = A cos(ωt)', () => {
    const w = 2 * Math.PI * 1e8;
    const columns = expressionColumns(at('0.01*cos(2*pi*1e8*t)'), 0, 2e-8, 2001);
    expect(columns.t).toHaveLength(2001);
    expect(columns.vx).toBeUndefined();
    expect(columns.t[2000]).toBe(2e-8);
    const path = new SampledPath(columns);
    const s = pathState();
    for (let k = 0; k < 1000; k++) {
      const t = (2e-8 * (k + 0.37)) / 1000;
      path.stateAt(t, s);
      // v = -Aω sin(ωt). A not-a-knot spline's slope error is O((ωh)³); with ωh = 6.3e-3 it was
      // measured at 4.5e-8 of Aω, so 1e-6 leaves margin and still fails a wrong derivative.
      expect(Math.abs(s.vx + 0.01 * w * Math.sin(w * t)) / (0.01 * w)).toBeLessThan(1e-6);
    }
  });

  it('samples a range as wide as doubles allow at finite, increasing times', () => {
    // (to − from)·i overflowed to Infinity here. Found by
    // test/path/expressionPath.property.test.ts.
    expect(Array.from(expressionColumns(at('0'), -1e308, 0, 4).t)).toEqual([
      -1e308, -6.666666666666667e307, -3.3333333333333337e307, 0,
    ]);
    expect(Array.from(expressionColumns(at('0'), -1e308, 1e308, 5).t)).toEqual([
      -1e308, -5e307, 0, 5e307, 1e308,
    ]);
  });

  it.each([
    [0, Number.NaN, 10, 'to: must be a finite number (got NaN)'],
    [1, 1, 10, 'to: must be after from (1 s)'],
    [0, 1, 1, 'samples: must be a whole number from 2 to 1000000 (got 1)'],
    [0, 1, 2.5, 'samples: must be a whole number from 2 to 1000000 (got 2.5)'],
    [Number.POSITIVE_INFINITY, 1, 10, 'from: must be a finite number (got Infinity)'],
  ])('refuses from = %d, to = %d, samples = %d', (from, to, samples, message) => {
    expect(expressionErrorOf(() => expressionColumns(at('t'), from, to, samples)).message).toBe(
      message,
    );
  });
});
