// Checks for property tests. They throw plain Errors instead of calling expect(): vitest's
// expect costs about 20 µs a call, which at 10,000 inputs and several checks an input would
// be most of the run.

/** Throws `what went wrong` unless the condition holds. */
export function must(condition: boolean, what: string): asserts condition {
  if (!condition) throw new Error(what);
}

/** JavaScript's line terminators (ECMA-262 §12.3): LF, CR, LS and PS. */
const LINE_BREAK = /[\n\r\u2028\u2029]/;

/** Throws unless `message` is a single line. */
export function mustBeOneLine(message: string): void {
  must(!LINE_BREAK.test(message), `message spans lines: ${JSON.stringify(message)}`);
}

/** The built-ins a hostile input would write to in order to reach other code. */
const WATCHED: Record<string, object> = {
  globalThis,
  'Object.prototype': Object.prototype,
  'Function.prototype': Function.prototype,
  'Array.prototype': Array.prototype,
  'String.prototype': String.prototype,
  'Number.prototype': Number.prototype,
};

/** Own keys (names and symbols) of every watched built-in, one sorted list each. */
export type BuiltinKeys = Record<string, string[]>;

export function builtinKeys(): BuiltinKeys {
  const out: BuiltinKeys = {};
  for (const [name, target] of Object.entries(WATCHED)) {
    out[name] = Reflect.ownKeys(target).map(String).sort();
  }
  return out;
}

/** Names a pollution payload typically sets; none may be readable from `{}` or globalThis. */
const PAYLOAD_NAMES = ['polluted', '__pwned', 'pwned', 'isAdmin'];

/**
 * Throws when a watched built-in has more or fewer own keys than before, or `{}` or globalThis
 * has a payload name. Quick enough for every run; mustKeepBuiltinKeys compares the names.
 */
export function mustLeaveBuiltinsAlone(before: BuiltinKeys): void {
  for (const [name, target] of Object.entries(WATCHED)) {
    const count = Reflect.ownKeys(target).length;
    if (count !== before[name].length) mustKeepBuiltinKeys(before);
  }
  const plain: Record<string, unknown> = {};
  const global = globalThis as Record<string, unknown>;
  for (const key of PAYLOAD_NAMES) {
    must(plain[key] === undefined, `{} now inherits ${key}`);
    must(global[key] === undefined, `globalThis now has ${key}`);
  }
}

/** Throws, naming the keys, when a watched built-in gained or lost an own key. */
export function mustKeepBuiltinKeys(before: BuiltinKeys): void {
  const after = builtinKeys();
  for (const name of Object.keys(WATCHED)) {
    const added = after[name].filter((key) => !before[name].includes(key));
    const removed = before[name].filter((key) => !after[name].includes(key));
    must(
      added.length === 0 && removed.length === 0,
      `${name} gained [${added.join(', ')}] and lost [${removed.join(', ')}]`,
    );
  }
}
