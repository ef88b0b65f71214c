/**
 * Not-a-knot cubic spline through (t[i], y[i]); writes the first and second derivatives at
 * the knots. With not-a-knot ends the spline reproduces any cubic exactly, so smooth paths
 * keep third-order accuracy up to the ends (de Boor, A Practical Guide to Splines, ch. IV).
 */
export function splineKnotDerivatives(
  t: Float64Array,
  y: Float64Array,
  slope: Float64Array,
  curvature: Float64Array,
): void {
  const n = t.length;
  if (n === 1) {
    slope[0] = 0;
    curvature[0] = 0;
    return;
  }
  if (n === 2) {
    const d = (y[1] - y[0]) / (t[1] - t[0]);
    slope[0] = d;
    slope[1] = d;
    curvature[0] = 0;
    curvature[1] = 0;
    return;
  }
  if (n === 3) {
    // Not-a-knot with three knots is the single parabola through them.
    const h0 = t[1] - t[0];
    const h1 = t[2] - t[1];
    const d0 = (y[1] - y[0]) / h0;
    const d1 = (y[2] - y[1]) / h1;
    const c2 = (d1 - d0) / (h0 + h1);
    for (let i = 0; i < 3; i++) {
      slope[i] = d0 + c2 * (2 * t[i] - t[0] - t[1]);
      curvature[i] = 2 * c2;
    }
    return;
  }
  // Second derivatives M from the usual tridiagonal system, with M0 and M(n-1) eliminated
  // by the not-a-knot conditions (continuous third derivative at t1 and t(n-2)).
  const m = n - 2;
  const lower = new Float64Array(m);
  const diag = new Float64Array(m);
  const upper = new Float64Array(m);
  const rhs = new Float64Array(m);
  for (let k = 0; k < m; k++) {
    const i = k + 1;
    const hl = t[i] - t[i - 1];
    const hr = t[i + 1] - t[i];
    lower[k] = hl;
    diag[k] = 2 * (hl + hr);
    upper[k] = hr;
    rhs[k] = 6 * ((y[i + 1] - y[i]) / hr - (y[i] - y[i - 1]) / hl);
  }
  const h0 = t[1] - t[0];
  const h1 = t[2] - t[1];
  diag[0] += h0 + (h0 * h0) / h1;
  upper[0] -= (h0 * h0) / h1;
  const hb = t[n - 1] - t[n - 2];
  const ha = t[n - 2] - t[n - 3];
  diag[m - 1] += hb + (hb * hb) / ha;
  lower[m - 1] -= (hb * hb) / ha;
  // Thomas algorithm; with m = 2 both end rows were modified above, which is still exact.
  for (let k = 1; k < m; k++) {
    const w = lower[k] / diag[k - 1];
    diag[k] -= w * upper[k - 1];
    rhs[k] -= w * rhs[k - 1];
  }
  const M = curvature;
  M[m] = rhs[m - 1] / diag[m - 1];
  for (let k = m - 2; k >= 0; k--) M[k + 1] = (rhs[k] - upper[k] * M[k + 2]) / diag[k];
  M[0] = (1 + h0 / h1) * M[1] - (h0 / h1) * M[2];
  M[n - 1] = (1 + hb / ha) * M[n - 2] - (hb / ha) * M[n - 3];
  for (let i = 0; i < n - 1; i++) {
    const h = t[i + 1] - t[i];
    slope[i] = (y[i + 1] - y[i]) / h - (h * (2 * M[i] + M[i + 1])) / 6;
  }
  slope[n - 1] = (y[n - 1] - y[n - 2]) / hb + (hb * (M[n - 2] + 2 * M[n - 1])) / 6;
}
