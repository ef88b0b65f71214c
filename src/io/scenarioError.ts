/** A scenario document that cannot be used; `path` names the field, e.g. `charges[0].path.params.beta`. */
export class ScenarioError extends Error {
  constructor(
    readonly path: string,
    readonly reason: string,
  ) {
    super(`${path}: ${reason}`);
    this.name = 'ScenarioError';
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
