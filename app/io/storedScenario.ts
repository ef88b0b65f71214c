import type { Scenario, ScenarioPath } from '../../src/io/scenario';

const COLUMNS = ['t', 'x', 'y', 'z', 'vx', 'vy', 'vz', 'ax', 'ay', 'az'] as const;

/**
 * The document as kept in IndexedDB: sample columns as Float64Array, which the browser copies
 * in one block where a list of a million numbers is cloned number by number.
 */
export function packScenario(scenario: Scenario): unknown {
  return {
    ...scenario,
    charges: scenario.charges.map((charge) => ({
      ...charge,
      path: mapColumns(charge.path, (values) => Float64Array.from(values)),
    })),
  };
}

/** A stored document back as plain JSON-like data, ready for parseScenario to check. */
export function unpackScenario(stored: unknown): unknown {
  if (typeof stored !== 'object' || stored === null) return stored;
  const charges = (stored as { charges?: unknown }).charges;
  if (!Array.isArray(charges)) return stored;
  return {
    ...stored,
    charges: charges.map((charge) =>
      typeof charge === 'object' && charge !== null && 'path' in charge
        ? { ...charge, path: mapColumns(charge.path as ScenarioPath, toArray) }
        : charge,
    ),
  };
}

function toArray(values: ArrayLike<number>): number[] {
  return values instanceof Float64Array ? Array.from(values) : (values as number[]);
}

function mapColumns<T>(
  path: ScenarioPath,
  convert: (values: ArrayLike<number>) => T,
): ScenarioPath {
  if (typeof path !== 'object' || path === null || path.kind !== 'samples') return path;
  const out: Record<string, unknown> = { ...path };
  for (const name of COLUMNS) {
    const values = path[name] as ArrayLike<number> | undefined;
    if (values !== undefined) out[name] = convert(values);
  }
  return out as ScenarioPath;
}
