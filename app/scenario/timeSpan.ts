import type { SliceSpec } from '../../src/engine/sliceSpec';
import type { Charge } from '../../src/physics/charge';
import { SPEED_OF_LIGHT } from '../../src/physics/constants';

/** Times the slider offers, s. */
export interface TimeSpan {
  start: number;
  end: number;
}

/** Slider positions across the span; a step moves one of them. */
export const TIME_STEPS = 400;

/**
 * From the first sample of any path to the last, plus the time light takes to cross the view,
 * so the radiation from the end of a path can be watched leaving.
 */
export function observationSpan(charges: readonly Charge[], spec: SliceSpec): TimeSpan | null {
  if (charges.length === 0) return null;
  let start = Number.POSITIVE_INFINITY;
  let end = Number.NEGATIVE_INFINITY;
  for (const { path } of charges) {
    const [t0, t1] = path.timeSpan;
    start = Math.min(start, t0);
    end = Math.max(end, t1);
  }
  end += Math.hypot(spec.width, spec.height) / SPEED_OF_LIGHT;
  return end > start ? { start, end } : null;
}

/** Playback rates offered, s per s: 1, 2 and 5 × 10ⁿ from attoseconds to seconds. */
export const PLAYBACK_RATES: readonly number[] = Array.from({ length: 57 }, (_, k) => {
  const decade = Math.floor(k / 3) - 18;
  return Number(([1, 2, 5][k % 3] * 10 ** decade).toPrecision(1));
});

/** The offered rate that plays the span in about eight seconds. */
export function suggestedRate(span: TimeSpan): number {
  const wanted = (span.end - span.start) / 8;
  let best = PLAYBACK_RATES[0];
  for (const rate of PLAYBACK_RATES) if (rate <= wanted) best = rate;
  return best;
}
