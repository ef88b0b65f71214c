/** Where scanNumber leaves the value it read. */
export interface ScannedNumber {
  value: number;
}

const PLUS = 43;
const MINUS = 45;
const DOT = 46;
const ZERO = 48;
const LOWER_E = 101;
const UPPER_E = 69;

/** Exact powers of ten: every 10^k with k <= 22 is a double without rounding. */
const POW10 = new Float64Array(23);
for (let k = 0; k < 23; k++) POW10[k] = 10 ** k;

/** Largest mantissa that can take one more digit and stay below 2^53, so stays exact. */
const MANTISSA_LIMIT = Math.floor((2 ** 53 - 9) / 10);
/** Exponents past this are certain to overflow or underflow; stop accumulating. */
const EXPONENT_CAP = 100_000;

/**
 * Reads a decimal number `[+-] digits [. digits] [(e|E) [+-] digits]` (at least one mantissa
 * digit) from text[start, stop) without allocating. Returns the index just past it, or -1
 * when no number starts at `start`. Short numbers take the exact fast path (mantissa below
 * 2^53, |exponent| <= 22: one correctly rounded multiply or divide); others go to Number(),
 * so every result is the correctly rounded double. Overflow gives ±Infinity; callers decide.
 */
export function scanNumber(text: string, start: number, stop: number, out: ScannedNumber): number {
  let p = start;
  let negative = false;
  let ch = p < stop ? text.charCodeAt(p) : -1;
  if (ch === PLUS || ch === MINUS) {
    negative = ch === MINUS;
    p++;
  }
  let mantissa = 0;
  let exponent = 0;
  let exact = true;
  let digits = 0;
  for (; p < stop; p++) {
    const d = text.charCodeAt(p) - ZERO;
    if (d < 0 || d > 9) break;
    digits++;
    if (mantissa <= MANTISSA_LIMIT) mantissa = mantissa * 10 + d;
    else exact = false;
  }
  if (p < stop && text.charCodeAt(p) === DOT) {
    for (p++; p < stop; p++) {
      const d = text.charCodeAt(p) - ZERO;
      if (d < 0 || d > 9) break;
      digits++;
      if (mantissa <= MANTISSA_LIMIT) {
        mantissa = mantissa * 10 + d;
        exponent--;
      } else {
        exact = false;
      }
    }
  }
  if (digits === 0) return -1;
  if (p < stop) {
    ch = text.charCodeAt(p);
    if (ch === LOWER_E || ch === UPPER_E) {
      p++;
      let expNegative = false;
      ch = p < stop ? text.charCodeAt(p) : -1;
      if (ch === PLUS || ch === MINUS) {
        expNegative = ch === MINUS;
        p++;
      }
      let expValue = 0;
      let expDigits = 0;
      for (; p < stop; p++) {
        const d = text.charCodeAt(p) - ZERO;
        if (d < 0 || d > 9) break;
        expDigits++;
        if (expValue < EXPONENT_CAP) expValue = expValue * 10 + d;
      }
      if (expDigits === 0) return -1;
      exponent += expNegative ? -expValue : expValue;
    }
  }
  let value: number;
  if (exact && mantissa === 0) value = 0;
  else if (exact && exponent >= 0 && exponent <= 22) value = mantissa * POW10[exponent];
  else if (exact && exponent < 0 && exponent >= -22) value = mantissa / POW10[-exponent];
  else value = Math.abs(Number(text.slice(start, p)));
  out.value = negative ? -value : value;
  return p;
}
