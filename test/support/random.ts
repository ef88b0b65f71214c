/**
 * Seeded pseudo-random numbers for reproducible tests: mulberry32 (Tommy Ettinger's
 * 32-bit generator, public domain; written from memory). Returns uniform floats in [0, 1).
 */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Uniform float in [lo, hi) from a generator. */
export function uniform(random: () => number, lo: number, hi: number): number {
  return lo + (hi - lo) * random();
}

/** A point uniform in the ball of radius r (rejection sampling). */
export function pointInBall(random: () => number, r: number): [number, number, number] {
  for (;;) {
    const x = 2 * random() - 1;
    const y = 2 * random() - 1;
    const z = 2 * random() - 1;
    const s = x * x + y * y + z * z;
    if (s <= 1 && s > 0) return [r * x, r * y, r * z];
  }
}

/** A unit vector uniform on the sphere. */
export function unitVector(random: () => number): [number, number, number] {
  const [x, y, z] = pointInBall(random, 1);
  const n = Math.hypot(x, y, z);
  return [x / n, y / n, z / n];
}
