import { all, create, type EvalFunction, type MathNode } from 'mathjs';
import { oneLine } from '../io/oneLine';
import { SPEED_OF_LIGHT } from '../physics/constants';
import type { PathColumns } from './sampledPath';
import { sampleTime } from './sampleTime';

/** x(t), y(t), z(t) in m as formulas in t (s). */
export interface MotionExpressions {
  x: string;
  y: string;
  z: string;
}

export type ExpressionField = 'x' | 'y' | 'z' | 'from' | 'to' | 'samples';

/** Longest formula accepted, in characters. */
export const MAX_EXPRESSION_LENGTH = 2000;
/** Most time samples an expression path may have. */
export const MAX_EXPRESSION_SAMPLES = 1_000_000;
// Deeper trees are refused before mathjs's recursive compile and evaluate see them.
const MAX_NESTING = 64;

/**
 * A formula or sampling range that cannot be used. `reason` is the bare reason; `time` is set
 * when the formula failed at one sample time; `detail` is the reason with that time.
 */
export class ExpressionError extends Error {
  readonly reason: string;
  readonly detail: string;

  constructor(
    readonly field: ExpressionField,
    reason: string,
    readonly time?: number,
  ) {
    // mathjs quotes the formula in some messages; a line break in it must not split ours.
    const bare = oneLine(reason);
    const at = time === undefined ? '' : ` at t = ${formatTime(time)} s`;
    const label = field === 'x' || field === 'y' || field === 'z' ? `${field}(t)` : field;
    super(`${label}${at}: ${bare}`);
    this.name = 'ExpressionError';
    this.reason = bare;
    this.detail = time === undefined ? bare : `${bare} (at t = ${formatTime(time)} s)`;
  }
}

const AXES = ['x', 'y', 'z'] as const;

const math = create(all);
// Kept before the instance's own parse is disabled below; node.compile() needs no eval.
const parseFormula = math.parse;
const isUnitName = (name: string) => math.Unit.isValuelessUnit(name);
const typeOf = math.typeOf;

// The functions mathjs's security notes name as risky, plus the other parse-and-run entry points.
const DISABLED_FUNCTIONS = [
  'import',
  'createUnit',
  'reviver',
  'evaluate',
  'parse',
  'compile',
  'parser',
  'simplify',
  'simplifyConstant',
  'simplifyCore',
  'derivative',
  'resolve',
  'rationalize',
  'leafCount',
  'symbolicEqual',
  'chain',
  'help',
  'config',
];
math.import(
  Object.fromEntries(
    DISABLED_FUNCTIONS.map((name) => [
      name,
      () => {
        throw new Error(`function ${name} is disabled`);
      },
    ]),
  ),
  { override: true },
);

/** Names a formula may use as values; they come from the evaluation scope, never from mathjs. */
const VALUE_SYMBOLS = new Set(['t', 'pi', 'e', 'c']);

/** Functions a formula may call, with their smallest and largest argument counts. */
const FUNCTIONS = new Map<string, readonly [number, number]>([
  ...[
    'sin',
    'cos',
    'tan',
    'sec',
    'csc',
    'cot',
    'asin',
    'acos',
    'atan',
    'sinh',
    'cosh',
    'tanh',
    'asinh',
    'acosh',
    'atanh',
    'exp',
    'expm1',
    'log2',
    'log10',
    'log1p',
    'sqrt',
    'cbrt',
    'square',
    'cube',
    'abs',
    'sign',
    'fix',
  ].map((name) => [name, [1, 1]] as const),
  ...['log', 'round', 'floor', 'ceil', 'nthRoot'].map((name) => [name, [1, 2]] as const),
  ...['atan2', 'pow', 'mod'].map((name) => [name, [2, 2]] as const),
  ...['min', 'max', 'hypot'].map((name) => [name, [1, Number.POSITIVE_INFINITY]] as const),
]);

/** mathjs operator functions a formula may use: arithmetic, comparison and logic for piecewise formulas. */
const OPERATORS = new Set([
  'add',
  'subtract',
  'multiply',
  'divide',
  'pow',
  'mod',
  'unaryMinus',
  'unaryPlus',
  'smaller',
  'larger',
  'smallerEq',
  'largerEq',
  'equal',
  'unequal',
  'and',
  'or',
  'xor',
  'not',
]);

/**
 * Compiles the three formulas; the result writes [x, y, z] (m) at time t (s) into `out`.
 * Throws an ExpressionError for a formula that does not parse or uses anything not allowed,
 * and, when called, for a value that is not a real finite number.
 */
export function compileMotion(
  expressions: MotionExpressions,
): (t: number, out: [number, number, number]) => void {
  const compiled = AXES.map((axis) => compileFormula(axis, expressions[axis]));
  const scope = new Map<string, number>([
    ['t', 0],
    ['pi', Math.PI],
    ['e', Math.E],
    ['c', SPEED_OF_LIGHT],
  ]);
  return (t, out) => {
    scope.set('t', t);
    for (let k = 0; k < 3; k++) out[k] = evaluateAt(compiled[k], AXES[k], scope, t);
  };
}

/**
 * Positions from the formulas at `samples` evenly spaced times on [from, to]; velocities and
 * accelerations are left to the path model's spline.
 */
export function expressionColumns(
  expressions: MotionExpressions,
  from: number,
  to: number,
  samples: number,
): PathColumns {
  if (!Number.isFinite(from))
    throw new ExpressionError('from', `must be a finite number (got ${from})`);
  if (!Number.isFinite(to)) throw new ExpressionError('to', `must be a finite number (got ${to})`);
  if (!(to > from)) throw new ExpressionError('to', `must be after from (${from} s)`);
  if (!Number.isInteger(samples) || samples < 2 || samples > MAX_EXPRESSION_SAMPLES) {
    throw new ExpressionError(
      'samples',
      `must be a whole number from 2 to ${MAX_EXPRESSION_SAMPLES} (got ${samples})`,
    );
  }
  const motion = compileMotion(expressions);
  const columns = {
    t: new Float64Array(samples),
    x: new Float64Array(samples),
    y: new Float64Array(samples),
    z: new Float64Array(samples),
  };
  const position: [number, number, number] = [0, 0, 0];
  for (let i = 0; i < samples; i++) {
    const t = sampleTime(from, to, i, samples);
    motion(t, position);
    columns.t[i] = t;
    columns.x[i] = position[0];
    columns.y[i] = position[1];
    columns.z[i] = position[2];
  }
  return columns;
}

function compileFormula(axis: (typeof AXES)[number], text: unknown): EvalFunction {
  if (typeof text !== 'string') throw new ExpressionError(axis, 'must be text');
  if (text.length > MAX_EXPRESSION_LENGTH) {
    throw new ExpressionError(
      axis,
      `is ${text.length} characters long; the limit is ${MAX_EXPRESSION_LENGTH}`,
    );
  }
  if (text.trim() === '') throw new ExpressionError(axis, 'is empty');
  let tree: MathNode;
  try {
    tree = parseFormula(text);
  } catch (error) {
    throw new ExpressionError(axis, describeParseFailure(error));
  }
  if (tree.type === 'ConstantNode' && (tree as unknown as { value: unknown }).value === undefined) {
    throw new ExpressionError(axis, 'is empty');
  }
  const refusal = refusalOf(tree, 0);
  if (refusal !== undefined) throw new ExpressionError(axis, refusal);
  return tree.compile();
}

function evaluateAt(
  code: EvalFunction,
  axis: (typeof AXES)[number],
  scope: Map<string, number>,
  t: number,
): number {
  let value: unknown;
  try {
    value = code.evaluate(scope);
  } catch (error) {
    throw new ExpressionError(axis, lowerFirst(messageOf(error)), t);
  }
  if (typeof value === 'number') {
    if (Number.isFinite(value)) return value;
    throw new ExpressionError(axis, 'is not a finite number', t);
  }
  const kind = typeOf(value);
  if (kind === 'Complex') throw new ExpressionError(axis, 'is a complex number, not a real one', t);
  if (kind === 'boolean') throw new ExpressionError(axis, 'is true or false, not a number', t);
  throw new ExpressionError(axis, `is a ${kind}, not a number`, t);
}

/** Why a parsed formula is refused, or undefined when every node in it is allowed. */
function refusalOf(node: MathNode, depth: number): string | undefined {
  if (depth > MAX_NESTING) return `is nested too deeply (more than ${MAX_NESTING} levels)`;
  const children = (...nodes: readonly MathNode[]) => {
    for (const child of nodes) {
      const refusal = refusalOf(child, depth + 1);
      if (refusal !== undefined) return refusal;
    }
    return undefined;
  };
  const n = node as unknown as Record<string, unknown>;
  switch (node.type) {
    case 'ConstantNode': {
      const value = n.value;
      if (typeof value === 'number') {
        return Number.isFinite(value) ? undefined : `${value} is not allowed; use finite numbers`;
      }
      if (typeof value === 'string') return 'text in quotes is not allowed';
      return `${String(value)} is not allowed; only plain numbers are`;
    }
    case 'SymbolNode': {
      const name = n.name as string;
      if (VALUE_SYMBOLS.has(name)) return undefined;
      if (FUNCTIONS.has(name)) return `"${name}" is a function; write ${name}(…)`;
      if (isUnitName(name)) {
        return `unknown symbol "${name}" (units are not supported: lengths are in m, times in s)`;
      }
      return `unknown symbol "${name}"`;
    }
    case 'ParenthesisNode':
      return children(n.content as MathNode);
    case 'OperatorNode':
      if (!OPERATORS.has(n.fn as string)) return `operator "${n.op}" is not allowed`;
      return children(...(n.args as MathNode[]));
    case 'FunctionNode': {
      const fn = n.fn as MathNode;
      if (fn.type !== 'SymbolNode') return 'only named functions such as sin(t) may be called';
      const name = (fn as unknown as { name: string }).name;
      const arity = FUNCTIONS.get(name);
      if (arity === undefined) return `unknown function "${name}"`;
      const args = n.args as MathNode[];
      if (args.length < arity[0] || args.length > arity[1]) {
        return `${name} takes ${describeArity(arity)}, not ${args.length}`;
      }
      return children(...args);
    }
    case 'ConditionalNode':
      return children(n.condition as MathNode, n.trueExpr as MathNode, n.falseExpr as MathNode);
    case 'RelationalNode':
      return children(...(n.params as MathNode[]));
    case 'ArrayNode':
      return 'lists and matrices ([…]) are not allowed';
    case 'AssignmentNode':
      return 'assignments (=) are not allowed';
    case 'FunctionAssignmentNode':
      return 'defining functions is not allowed';
    case 'BlockNode':
      return 'only one formula is allowed (no ; or line breaks)';
    case 'AccessorNode':
    case 'IndexNode':
      return 'properties and indexing (. and […]) are not allowed';
    case 'ObjectNode':
      return 'objects ({…}) are not allowed';
    case 'RangeNode':
      return 'ranges (:) are not allowed';
    default:
      return `${node.type} is not allowed`;
  }
}

function describeArity([least, most]: readonly [number, number]): string {
  const plural = (count: number) => `${count} argument${count === 1 ? '' : 's'}`;
  if (least === most) return plural(least);
  if (most === Number.POSITIVE_INFINITY) return `at least ${plural(least)}`;
  return `${least} or ${plural(most)}`;
}

/** mathjs's parse errors, reworded: 'Unexpected operator ) (char 7)' -> 'unexpected ")" at character 7'. */
function describeParseFailure(error: unknown): string {
  if (error instanceof RangeError) return 'is nested too deeply';
  const message = messageOf(error);
  const char = (error as { char?: unknown }).char;
  const bare = message.replace(/ \(char \d+\)$/, '');
  const unexpected =
    /^Unexpected (?:operator|part) "?(.*?)"?$/.exec(bare) ??
    /^Syntax error in part "(.*)"$/.exec(bare);
  const expected = /^Parenthesis (\S) expected$/.exec(bare);
  let reason: string;
  if (unexpected) reason = `unexpected "${unexpected[1]}"`;
  else if (expected) reason = `"${expected[1]}" expected`;
  else reason = lowerFirst(bare);
  return typeof char === 'number' ? `${reason} at character ${char}` : reason;
}

function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

function lowerFirst(text: string): string {
  return text.charAt(0).toLowerCase() + text.slice(1);
}

/** Six significant digits, without trailing zeros: 1.2e-9, not 1.20000e-9. */
function formatTime(t: number): string {
  return String(Number(t.toPrecision(6)));
}
