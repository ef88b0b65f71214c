import { describe, expect, it } from 'vitest';
import { type OptionSpecs, parseArgs } from '../../src/cli/args';
import { UsageError } from '../../src/cli/usageError';

const SPECS: OptionSpecs = {
  file: { value: true, repeat: true },
  time: { value: true },
  help: { value: false, short: 'h' },
};

function usageMessage(argv: string[]): string {
  try {
    parseArgs(argv, SPECS, 'demo');
  } catch (error) {
    if (error instanceof UsageError) return error.message;
    throw error;
  }
  throw new Error('expected a UsageError');
}

describe('parseArgs', () => {
  it('keeps repeated values in order, in both spellings', () => {
    const args = parseArgs(
      ['--file', 'a.csv', '--file=b.csv', '--time=-1e-9', '-h'],
      SPECS,
      'demo',
    );
    expect(args.all('file')).toEqual(['a.csv', 'b.csv']);
    expect(args.one('time')).toBe('-1e-9');
    expect(args.has('help')).toBe(true);
    expect(args.has('missing')).toBe(false);
    expect(args.all('missing')).toEqual([]);
  });

  it('takes a value that starts with one dash, such as a negative number', () => {
    expect(parseArgs(['--time', '-e'], SPECS, 'demo').one('time')).toBe('-e');
  });

  it('keeps positionals, and everything after --', () => {
    const args = parseArgs(['x', '--time', '1', '--', '--file', '-'], SPECS, 'demo');
    expect(args.positionals).toEqual(['x', '--file', '-']);
    expect(args.all('file')).toEqual([]);
  });

  it('rejects unknown options, missing values, values on flags and repeats of single options', () => {
    const see = '; see "conecast demo --help"';
    expect(usageMessage(['--nope'])).toBe(`unknown option --nope for demo${see}`);
    expect(usageMessage(['--nope=3'])).toBe(`unknown option --nope for demo${see}`);
    expect(usageMessage(['-x'])).toBe(`unknown option -x for demo${see}`);
    expect(usageMessage(['--time'])).toBe(`option --time needs a value${see}`);
    expect(usageMessage(['--time', '--file', 'a'])).toBe(`option --time needs a value${see}`);
    expect(usageMessage(['--help=yes'])).toBe(`option --help takes no value${see}`);
    expect(usageMessage(['--time', '1', '--time=2'])).toBe(
      `option --time given more than once${see}`,
    );
  });

  it('does not mistake inherited object keys for options', () => {
    expect(usageMessage(['--toString'])).toMatch(/^unknown option --toString/);
  });
});
