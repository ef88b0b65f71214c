/**
 * A power of 1000 that brings the largest |value| into [1, 1000). uPlot picks its ticks among
 * round numbers from about 1e-16 to 1e16 only, so a spectrum in 1e-34 J/(m²·Hz) or a window
 * of attoseconds is handed to it divided by this, and labelled multiplied back.
 */
export function axisFactor(columns: readonly ArrayLike<number>[]): number {
  let largest = 0;
  for (const values of columns) {
    for (let i = 0; i < values.length; i++) {
      const size = Math.abs(values[i]);
      if (size > largest && size < Number.POSITIVE_INFINITY) largest = size;
    }
  }
  return largest > 0 ? 10 ** (3 * Math.floor(Math.log10(largest) / 3)) : 1;
}
