/** Most vertices a drawn path gets: far more than a view has pixels, far fewer than 10⁶. */
export const MAX_DRAWN_VERTICES = 20_000;

/**
 * Which samples of a path of `count` are drawn: every one up to `max`, else every stride-th
 * from the first, and always the last, so the line still ends where the path ends.
 */
export function drawnSamples(count: number, max = MAX_DRAWN_VERTICES): Int32Array {
  const stride = Math.max(1, Math.ceil(count / max));
  const regular = Math.floor((count - 1) / stride) + 1;
  const endsOnLast = (count - 1) % stride === 0;
  const out = new Int32Array(endsOnLast ? regular : regular + 1);
  for (let v = 0; v < regular; v++) out[v] = v * stride;
  if (!endsOnLast) out[regular] = count - 1;
  return out;
}
