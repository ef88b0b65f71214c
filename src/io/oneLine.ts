const LINE_BREAKS = /[\n\r\u2028\u2029]/g;
const ESCAPES: Record<string, string> = {
  '\n': '\\n',
  '\r': '\\r',
  '\u2028': '\\u2028',
  '\u2029': '\\u2029',
};

/**
 * The text with every line terminator (ECMA-262 §12.3) written as its escape, so a message
 * quoting input stays on one line.
 */
export function oneLine(text: string): string {
  return text.replace(LINE_BREAKS, (ch) => ESCAPES[ch]);
}
