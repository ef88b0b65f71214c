import type { Scenario } from './scenario';

/**
 * A scenario as JSON text for a file: two-space indentation like JSON.stringify(doc, null, 2),
 * but a list of plain numbers stays on one line, so a million-sample path is a few long lines
 * rather than millions of short ones. JSON.parse of the text gives the document back exactly
 * (sample columns kept as Float64Array come back as lists).
 */
export function formatScenario(scenario: Scenario): string {
  return `${formatValue(scenario, '')}\n`;
}

function formatValue(value: unknown, indent: string): string {
  // A sample column kept as Float64Array is written as the list of numbers it holds.
  if (value instanceof Float64Array) return value.length === 0 ? '[]' : `[${value.join(', ')}]`;
  if (Array.isArray(value)) {
    if (value.length === 0) return '[]';
    if (value.every((item) => typeof item === 'number')) return `[${value.join(', ')}]`;
    const inner = `${indent}  `;
    return `[\n${value.map((item) => inner + formatValue(item, inner)).join(',\n')}\n${indent}]`;
  }
  if (typeof value === 'object' && value !== null) {
    const entries = Object.entries(value).filter(([, item]) => item !== undefined);
    if (entries.length === 0) return '{}';
    const inner = `${indent}  `;
    const lines = entries.map(
      ([key, item]) => `${inner}${JSON.stringify(key)}: ${formatValue(item, inner)}`,
    );
    return `{\n${lines.join(',\n')}\n${indent}}`;
  }
  return JSON.stringify(value) ?? 'null';
}
