const PREFIXES: Record<number, string> = {
  [-24]: 'y',
  [-21]: 'z',
  [-18]: 'a',
  [-15]: 'f',
  [-12]: 'p',
  [-9]: 'n',
  [-6]: 'µ',
  [-3]: 'm',
  0: '',
  3: 'k',
  6: 'M',
  9: 'G',
  12: 'T',
  15: 'P',
  18: 'E',
  21: 'Z',
  24: 'Y',
};

/** Power of 1000 (as a power of ten) whose prefix puts |value| in [1, 1000). */
export function siExponent(value: number): number {
  if (value === 0 || !Number.isFinite(value)) return 0;
  const exponent = 3 * Math.floor(Math.log10(Math.abs(value)) / 3);
  return Math.min(24, Math.max(-24, exponent));
}

/** A quantity with an SI prefix and `digits` significant figures, e.g. 1e-9 s -> "1.000 ns". */
export function formatSI(value: number, unit: string, digits = 3): string {
  if (!Number.isFinite(value)) return `${value} ${unit}`;
  if (value === 0) return `0 ${unit}`;
  // Beyond the prefixes (below yocto, above yotta) plain powers of ten read better.
  const magnitude = Math.abs(value);
  if (magnitude < 1e-24 || magnitude >= 1e27) return `${value.toExponential(digits - 1)} ${unit}`;
  let exponent = siExponent(value);
  let mantissa = Number((value / 10 ** exponent).toPrecision(digits));
  // Rounding can carry 999.7 up to 1000: move to the next prefix instead.
  if (Math.abs(mantissa) >= 1000 && exponent < 24) {
    exponent += 3;
    mantissa = Number((value / 10 ** exponent).toPrecision(digits));
  }
  // toFixed, not toPrecision, so "10" never turns into "1e+1".
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(Math.abs(mantissa))));
  return `${mantissa.toFixed(decimals)} ${PREFIXES[exponent]}${unit}`;
}
