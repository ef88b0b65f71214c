import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = join(import.meta.dirname, '..', '..');

/** Every source file the app and the command line are built from. */
function sourceFiles(folder: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(folder)) {
    const path = join(folder, name);
    if (statSync(path).isDirectory()) out.push(...sourceFiles(path));
    else if (/\.(ts|tsx|js|mjs)$/.test(name)) out.push(path);
  }
  return out;
}

/**
 * Constructs that turn text into code or markup. The built app's policy (vite.config.ts) would
 * refuse the first kind at run time; this check keeps them out of the source in the first place.
 */
const FORBIDDEN: [RegExp, string][] = [
  [/\beval\s*\(/, 'eval('],
  [/\bnew\s+Function\b/, 'new Function'],
  [/(?<![.\w])Function\s*\(/, 'Function('],
  [/\bset(?:Timeout|Interval)\s*\(\s*['"`]/, 'a timer given a string'],
  [/\binnerHTML\b|\bouterHTML\b|insertAdjacentHTML/, 'HTML from text'],
  [/dangerouslySetInnerHTML/, 'dangerouslySetInnerHTML'],
  [/\bdocument\.write\b/, 'document.write'],
];

describe('the sources', () => {
  const files = ['app', 'src', 'bin'].flatMap((folder) => sourceFiles(join(ROOT, folder)));

  it('are all looked at', () => {
    // The app, the engine and the command line: well over a hundred files.
    expect(files.length).toBeGreaterThan(150);
  });

  it('never make code or markup from text', () => {
    const found: string[] = [];
    for (const file of files) {
      const lines = readFileSync(file, 'utf8').split('\n');
      lines.forEach((line, k) => {
        for (const [pattern, what] of FORBIDDEN) {
          if (pattern.test(line)) found.push(`${relative(ROOT, file)}:${k + 1}: ${what}`);
        }
      });
    }
    expect(found).toEqual([]);
  });

  it('are checked by patterns that do catch each construct', () => {
    const samples = [
      'eval("1")',
      'const f = new Function("return 1")',
      'Function("return this")()',
      "setTimeout('go()', 0)",
      'node.innerHTML = text',
      '<div dangerouslySetInnerHTML={x} />',
      'document.write(x)',
    ];
    samples.forEach((sample, k) => {
      expect(FORBIDDEN[k][0].test(sample), sample).toBe(true);
    });
    expect(FORBIDDEN[2][0].test('isTypedFunction(x)')).toBe(false);
  });
});
