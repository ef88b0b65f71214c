import { Writable } from 'node:stream';
import { afterAll, describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main';
import { scratchFolder } from './cliSupport';

/** A stream that keeps what is written to it. */
class Capture extends Writable {
  text = '';
  override _write(chunk: Buffer | string, _encoding: string, done: (error?: Error) => void): void {
    this.text += chunk.toString();
    done();
  }
}

async function run(args: string[], stdout: Writable = new Capture()) {
  const stderr = new Capture();
  const status = await main(args, { stdout, stderr });
  return { status, stdout: stdout instanceof Capture ? stdout.text : '', stderr: stderr.text };
}

const scratch = scratchFolder();
afterAll(() => scratch.remove());
const beam = scratch.file('beam.csv', 't,x,y,z\n0,0,0,0\n1e-9,0.01,0,0\n');
const untimed = scratch.file('untimed.csv', 'x,y,z\n1,0,0\n');
const timed = scratch.file('timed.csv', 'x,y,z,t\n1,0,0,0\n');

describe('main', () => {
  it('prints the same help for "help fields" and "fields --help"', async () => {
    const a = await run(['help', 'fields']);
    const b = await run(['fields', '--trajectory', 'x.csv', '--help']);
    expect(a.status).toBe(0);
    expect(b.status).toBe(0);
    expect(a.stdout).toBe(b.stdout);
    expect(a.stdout).toMatch(/^conecast fields: /);
  });

  it('shows the overview on stderr with exit code 2 when given nothing', async () => {
    const result = await run([]);
    expect(result.status).toBe(2);
    expect(result.stderr).toContain('conecast <command>');
  });

  it('answers an unknown command with one line', async () => {
    for (const args of [['sweep'], ['help', 'radiate'], ['--verbose']]) {
      const result = await run(args);
      expect(result.status).toBe(2);
      expect(result.stderr).toMatch(
        /^conecast: unknown (command|option) "[^"]+"; commands: fields, slice, probe, power; see "conecast --help"\n$/,
      );
    }
  });

  it('reports usage errors as one line with exit code 2', async () => {
    const cases: [string[], string][] = [
      [
        ['fields', '--points', untimed],
        'give the charges with --scenario FILE.json, or at least one --trajectory FILE.csv with its --charge Q',
      ],
      [
        [
          'fields',
          '--trajectory',
          beam,
          '--trajectory',
          beam,
          '--charge',
          'e',
          '--points',
          untimed,
        ],
        '2 --trajectory but 1 --charge; give one --charge per --trajectory, in the same order',
      ],
      [
        ['fields', '--trajectory', beam, '--charge', 'e'],
        'give the observation points with --points POINTS.csv',
      ],
      [
        ['fields', '--trajectory', beam, '--charge', 'lots', '--points', untimed],
        'option --charge needs a charge in coulombs, or e or -e, got "lots"',
      ],
      [
        ['fields', '--trajectory', beam, '--charge', 'e', '--points', untimed, '--time', '1 ns'],
        'option --time needs a time in seconds, got "1 ns"',
      ],
      [
        ['fields', 'extra', '--trajectory', beam],
        'unexpected argument "extra"; see "conecast fields --help"',
      ],
    ];
    for (const [args, message] of cases) {
      const result = await run(args);
      expect(result.stderr).toBe(`conecast: ${message}\n`);
      expect(result.status).toBe(2);
      expect(result.stdout).toBe('');
    }
  });

  it('needs exactly one source of observation times', async () => {
    const none = await run(['fields', '--trajectory', beam, '--charge', 'e', '--points', untimed]);
    expect(none.stderr).toBe(
      `conecast: ${untimed} line 1: no t column, so give the observation time with --time T (s)\n`,
    );
    const both = await run([
      'fields',
      '--trajectory',
      beam,
      '--charge',
      'e',
      '--points',
      timed,
      '--time',
      '0',
    ]);
    expect(both.stderr).toBe(
      `conecast: ${timed} line 1, column "t": the points give their own times, so --time must not be given too\n`,
    );
    expect([none.status, both.status]).toEqual([2, 2]);
  });

  it('reads e and -e as the elementary charge', async () => {
    const plus = await run(['fields', '--trajectory', beam, '--charge', 'e', '--points', timed]);
    const minus = await run(['fields', '--trajectory', beam, '--charge=-e', '--points', timed]);
    const ex = (text: string) => Number(text.trimEnd().split('\n')[1].split(',')[5]);
    expect(ex(plus.stdout)).toBeGreaterThan(0);
    // Flipping the charge flips the field: negation is exact in floating point.
    expect(ex(minus.stdout)).toBe(-ex(plus.stdout));
  });

  it('turns an unexpected failure into one line with exit code 1', async () => {
    const broken = new Writable({
      write(_chunk, _encoding, done) {
        done(new Error('disk on fire\nsecond line'));
      },
    });
    const result = await run(
      ['fields', '--trajectory', beam, '--charge', 'e', '--points', timed],
      broken,
    );
    expect(result.status).toBe(1);
    expect(result.stderr).toBe('conecast: internal error: disk on fire second line\n');
  });
});
