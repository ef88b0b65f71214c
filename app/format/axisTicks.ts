/** Evenly spaced round values (1, 2 or 5 × 10^k apart) covering [min, max], about `count` of them. */
export function linearTicks(min: number, max: number, count = 5): number[] {
  if (!(max > min)) return [min];
  const rough = (max - min) / Math.max(1, count);
  const power = 10 ** Math.floor(Math.log10(rough));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= rough) ?? 10 * power;
  const ticks: number[] = [];
  const first = Math.ceil(min / step - 1e-9);
  const last = Math.floor(max / step + 1e-9);
  // Multiply rather than accumulate so 0.1-style steps do not drift.
  for (let k = first; k <= last; k++) ticks.push(Number((k * step).toPrecision(12)));
  return ticks;
}

/** Round values for a log axis on [min, max] (both > 0): decades, or 1-2-5 over three decades or fewer. */
export function logTicks(min: number, max: number): number[] {
  if (!(min > 0 && max > min)) return [];
  const lo = Math.floor(Math.log10(min));
  const hi = Math.ceil(Math.log10(max));
  const multiples = hi - lo > 3 ? [1] : [1, 2, 5];
  const ticks: number[] = [];
  for (let k = lo; k <= hi; k++) {
    for (const m of multiples) {
      const value = Number((m * 10 ** k).toPrecision(6));
      if (value >= min * (1 - 1e-9) && value <= max * (1 + 1e-9)) ticks.push(value);
    }
  }
  return ticks;
}
