/**
 * Time of sample i of n evenly spaced on [from, to], the last exactly `to`. (to − from)·i can
 * overflow on a range near the largest double; then the weighted mean of the ends is used,
 * which cannot, clamped so rounding stays inside [from, to].
 */
export function sampleTime(from: number, to: number, i: number, n: number): number {
  if (n === 1) return from;
  if (i === n - 1) return to;
  const t = from + ((to - from) * i) / (n - 1);
  if (Number.isFinite(t)) return t;
  const s = i / (n - 1);
  return Math.min(to, Math.max(from, from * (1 - s) + to * s));
}
