import { oneLine } from './oneLine';

/**
 * A scenario document that cannot be used; `path` names the field, e.g.
 * `charges[0].path.params.beta`. The message is one line: line breaks quoted from the document
 * (a key with U+2028 in it, JSON text in a parser's message) are written as escapes.
 */
export class ScenarioError extends Error {
  readonly path: string;
  readonly reason: string;

  constructor(path: string, reason: string) {
    const where = oneLine(path);
    const why = oneLine(reason);
    super(`${where}: ${why}`);
    this.name = 'ScenarioError';
    this.path = where;
    this.reason = why;
  }
}

/** ['charges', 0, 'path', 'params', 'beta'] -> 'charges[0].path.params.beta'. */
export function fieldPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out === '' ? 'scenario' : out;
}
