/**
 * Modified Bessel functions of the second kind K_ν(x) for real ν and x > 0, and the
 * synchrotron function F(x) = x ∫ₓ^∞ K_{5/3}(ξ) dξ, both from integral representations:
 *   K_ν(x) = ∫₀^∞ exp(−x cosh t) cosh(νt) dt   (Abramowitz & Stegun, Handbook of
 *   Mathematical Functions, Eq. 9.6.24),
 * and, swapping the order of integration in ∫ₓ^∞ K_{5/3}(ξ) dξ (Fubini, the integrand is
 * positive), ∫ₓ^∞ K_ν(ξ) dξ = ∫₀^∞ exp(−x cosh t) cosh(νt) / cosh t dt.
 *
 * Both integrands are even, analytic in the strip |Im t| < π/2 and fall off double
 * exponentially, so the trapezoidal rule on the half line converges geometrically in 1/h
 * (Trefethen & Weideman, SIAM Review 56, 385, 2014, §5): the step is halved until two
 * successive sums agree to TOLERANCE, which gives ~1e-13 relative in practice.
 */

/** Successive trapezoidal sums agreeing to this (relative) end the refinement. */
const TOLERANCE = 1e-13;
/** Coarsest step in t: the rule is already near convergence there for moderate x. */
const FIRST_STEP = 0.5;
/** Finest step allowed: far below what any x > 0 of interest needs. */
const FINEST_STEP = 2 ** -12;
/** Terms below this fraction of the sum, past the integrand's peak, end the tail. */
const TAIL = 1e-18;

/**
 * Trapezoidal sum h·(g(0)/2 + Σ_{k≥1} g(kh)) of the scaled integrand
 * g(t) = exp(−x (cosh t − 1)) cosh(νt) / cosh(t)^power, i.e. e^x times the true integrand,
 * so the sum stays representable for large x. With `oddOnly`, only the odd multiples of h
 * (the points a halving adds), without the factor h.
 */
function trapezoid(nu: number, x: number, power: 0 | 1, h: number, oddOnly: boolean): number {
  // The integrand exp(νt − x cosh t) peaks where x sinh t = ν; the tail test waits past that.
  const peak = Math.asinh(Math.abs(nu) / x);
  let sum = 0;
  const first = oddOnly ? 1 : 0;
  const stride = oddOnly ? 2 : 1;
  for (let k = first; ; k += stride) {
    const t = k * h;
    const ch = Math.cosh(t);
    const decay = -x * (ch - 1);
    // cosh(νt) e^decay as two exponentials, so neither overflows on its own.
    let g = 0.5 * (Math.exp(nu * t + decay) + Math.exp(-nu * t + decay));
    if (power === 1) g /= ch;
    if (k === 0) g *= 0.5;
    sum += g;
    if (t > peak && g <= TAIL * sum) break;
  }
  return sum;
}

/** e^x ∫₀^∞ exp(−x cosh t) cosh(νt) / cosh(t)^power dt by step-halving trapezoidal sums. */
function scaledIntegral(nu: number, x: number, power: 0 | 1): number {
  let h = FIRST_STEP;
  let sum = trapezoid(nu, x, power, h, false);
  let estimate = h * sum;
  while (h > FINEST_STEP) {
    h *= 0.5;
    sum += trapezoid(nu, x, power, h, true);
    const next = h * sum;
    const converged = Math.abs(next - estimate) <= TOLERANCE * Math.abs(next);
    estimate = next;
    if (converged) break;
  }
  return estimate;
}

function checkArguments(nu: number, x: number, what: string): void {
  if (!Number.isFinite(nu)) throw new RangeError(`${what}: the order must be finite, not ${nu}`);
  if (!(x > 0) || !Number.isFinite(x)) {
    throw new RangeError(`${what}: the argument must be positive and finite, not ${x}`);
  }
}

/** K_ν(x) for real ν and x > 0 (A&S Eq. 9.6.24); K_{−ν} = K_ν. Underflows to 0 past x ≈ 700. */
export function besselK(nu: number, x: number): number {
  checkArguments(nu, x, 'besselK');
  return Math.exp(-x) * scaledIntegral(nu, x, 0);
}

/** e^x K_ν(x): the same without the underflow for large x. */
export function scaledBesselK(nu: number, x: number): number {
  checkArguments(nu, x, 'scaledBesselK');
  return scaledIntegral(nu, x, 0);
}

/** ∫ₓ^∞ K_ν(ξ) dξ for x > 0, from the single integral ∫₀^∞ e^{−x cosh t} cosh(νt)/cosh t dt. */
export function besselKTailIntegral(nu: number, x: number): number {
  checkArguments(nu, x, 'besselKTailIntegral');
  return Math.exp(-x) * scaledIntegral(nu, x, 1);
}

/**
 * The synchrotron function F(x) = x ∫ₓ^∞ K_{5/3}(ξ) dξ, x = ω/ω_c: the shape of the spectrum
 * of a charge on a circular orbit summed over all directions (Jackson, Classical
 * Electrodynamics 3rd ed., §14.6, Eq. 14.91). Peaks at F ≈ 0.918 near x ≈ 0.286.
 */
export function synchrotronF(x: number): number {
  checkArguments(5 / 3, x, 'synchrotronF');
  return x * Math.exp(-x) * scaledIntegral(5 / 3, x, 1);
}
