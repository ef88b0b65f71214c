import type { z } from 'zod';

const EXPECTED: Record<string, string> = {
  number: 'a number',
  int: 'a whole number',
  string: 'text',
  boolean: 'true or false',
  array: 'a list',
  object: 'an object',
  tuple: 'a list',
};

/** Zod's issues, reworded for people editing a scenario file by hand. */
export function describeIssue(issue: z.core.$ZodRawIssue): string | undefined {
  switch (issue.code) {
    case 'invalid_type':
      if (issue.input === undefined) return 'is missing';
      return `must be ${EXPECTED[issue.expected] ?? issue.expected}`;
    case 'invalid_value':
      if (issue.input === undefined) return 'is missing';
      return `must be ${issue.values.map((value) => JSON.stringify(value)).join(' or ')}`;
    case 'invalid_union':
      if ('options' in issue && Array.isArray(issue.options)) {
        return `must be one of ${issue.options.map((value) => JSON.stringify(value)).join(', ')}`;
      }
      return undefined;
    case 'unrecognized_keys':
      return `unknown field${issue.keys.length > 1 ? 's' : ''} ${issue.keys.map((key) => JSON.stringify(key)).join(', ')}`;
    case 'too_small':
      if (issue.origin === 'array')
        return `must hold at least ${plural(Number(issue.minimum), 'value')}`;
      if (issue.origin === 'string') return 'must not be empty';
      return `must be at least ${issue.minimum}`;
    case 'too_big':
      if (issue.origin === 'array')
        return `must hold at most ${plural(Number(issue.maximum), 'value')}`;
      if (issue.origin === 'string')
        return `must be at most ${plural(Number(issue.maximum), 'character')}`;
      return `must be at most ${issue.maximum}`;
    default:
      return undefined;
  }
}

function plural(count: number, noun: string): string {
  return `${count} ${noun}${count === 1 ? '' : 's'}`;
}
