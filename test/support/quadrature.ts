/**
 * Gauss–Legendre nodes and weights on [a, b]: roots of P_n by Newton's method from the
 * Chebyshev-like guess cos(π(i + 3/4)/(n + 1/2)), with P_n and P_n' from the three-term
 * recurrence and w_i = 2 / ((1 - x²) P_n'(x)²) (Abramowitz & Stegun 25.4.29; Press et al.,
 * Numerical Recipes 3rd ed. §4.6, routine gauleg, from memory). Exact for polynomials of
 * degree up to 2n - 1.
 */
export function gaussLegendre(n: number, a = -1, b = 1): { x: number[]; w: number[] } {
  const x: number[] = new Array(n);
  const w: number[] = new Array(n);
  const mid = 0.5 * (a + b);
  const half = 0.5 * (b - a);
  for (let i = 0; i < n; i++) {
    let z = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 0;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = z;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * z * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      const pn = n === 1 ? z : p1;
      const pnm1 = n === 1 ? 1 : p0;
      dp = (n * (z * pn - pnm1)) / (z * z - 1);
      const dz = pn / dp;
      z -= dz;
      if (Math.abs(dz) < 1e-16) break;
    }
    x[i] = mid - half * z;
    w[i] = (2 * half) / ((1 - z * z) * dp * dp);
  }
  return { x, w };
}
