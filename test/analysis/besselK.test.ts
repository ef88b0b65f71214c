import { describe, expect, it } from 'vitest';
import {
  besselK,
  besselKTailIntegral,
  scaledBesselK,
  synchrotronF,
} from '../../src/analysis/besselK';
import { gaussLegendre } from '../support/quadrature';

const relative = (a: number, b: number) => Math.abs(a / b - 1);

/** Half a unit in the last quoted decimal place of a table value, relative to the value. */
function quotedPrecision(text: string): number {
  const decimals = text.split('.')[1]?.length ?? 0;
  return (0.5 * 10 ** -decimals) / Number(text);
}

describe('besselK', () => {
  // Abramowitz & Stegun, Handbook of Mathematical Functions, Table 9.8 (orders 0 and 1);
  // the digits below are from memory.
  const table: [number, number, string][] = [
    [0, 0.1, '2.4270690247'],
    [1, 0.1, '9.8538447809'],
    [0, 1, '0.4210244382'],
    [1, 1, '0.6019072302'],
    [0, 2, '0.1138938727'],
    [1, 2, '0.1398658818'],
    [0, 5, '0.0036910983'],
    [1, 5, '0.0040446134'],
  ];
  for (const [nu, x, text] of table) {
    it(`gives K_${nu}(${x}) = ${text} as tabulated (A&S Table 9.8, from memory)`, () => {
      // Tolerance: the table's last digit is rounded, so half a unit in it.
      expect(relative(besselK(nu, x), Number(text))).toBeLessThan(quotedPrecision(text));
    });
  }

  it('gives the closed forms of half-integer order, K_1/2 = √(π/2x) e^−x and K_3/2 = K_1/2 (1 + 1/x), to 1e-12 (A&S Eq. 10.2.17)', () => {
    let worst = 0;
    for (const x of [1e-4, 0.01, 0.3, 1, 2.5, 7, 30, 120, 600]) {
      // Scaled forms, so the comparison does not underflow at large x.
      const half = Math.sqrt(Math.PI / (2 * x));
      worst = Math.max(worst, relative(scaledBesselK(0.5, x), half));
      worst = Math.max(worst, relative(scaledBesselK(1.5, x), half * (1 + 1 / x)));
      worst = Math.max(worst, relative(scaledBesselK(-0.5, x), half));
    }
    console.log(`half-integer orders: worst relative error ${worst.toExponential(2)}`);
    // Tolerance: the quadrature stops when successive sums agree to 1e-13; rounding of a
    // sum of at most a few hundred positive terms adds ~1e-14.
    expect(worst).toBeLessThan(1e-12);
  });

  it('satisfies the recurrence K_ν+1 − K_ν−1 = (2ν/x) K_ν to 1e-12 (A&S Eq. 9.6.26)', () => {
    let worst = 0;
    for (const nu of [2 / 3, 1.3, 2.5, 4.2]) {
      for (const x of [1e-3, 0.05, 0.7, 3, 15, 60]) {
        const left = scaledBesselK(nu + 1, x);
        const right = scaledBesselK(nu - 1, x) + ((2 * nu) / x) * scaledBesselK(nu, x);
        worst = Math.max(worst, relative(left, right));
      }
    }
    console.log(`recurrence: worst relative error ${worst.toExponential(2)}`);
    // Tolerance: all terms are positive, so no cancellation; three quadratures at ~1e-13.
    expect(worst).toBeLessThan(1e-12);
  });

  it('approaches ½ Γ(ν) (2/x)^ν for small x (A&S Eq. 9.6.9; Γ(2/3) = 1.3541179394264, from memory)', () => {
    const gamma23 = 1.3541179394264;
    const x = 1e-6;
    const leading = 0.5 * gamma23 * (2 / x) ** (2 / 3);
    // Tolerance: the next term is I_ν's share, relative (x/2)^(2ν) Γ(1 − ν)/Γ(1 + ν) ≈ 2e-8
    // for ν = 2/3, x = 1e-6 (A&S Eq. 9.6.2); the Γ value has 14 digits.
    expect(relative(besselK(2 / 3, x), leading)).toBeLessThan(1e-7);
  });

  it('follows the large-argument expansion √(π/2x) e^−x (1 + (μ−1)/8x + (μ−1)(μ−9)/2!(8x)²) with μ = 4ν² (A&S Eq. 9.7.2)', () => {
    for (const nu of [0, 2 / 3, 5 / 3]) {
      const mu = 4 * nu * nu;
      for (const x of [50, 200]) {
        const a1 = (mu - 1) / (8 * x);
        const a2 = ((mu - 1) * (mu - 9)) / (2 * (8 * x) ** 2);
        const a3 = ((mu - 1) * (mu - 9) * (mu - 25)) / (6 * (8 * x) ** 3);
        const series = Math.sqrt(Math.PI / (2 * x)) * (1 + a1 + a2);
        // Tolerance: the first term left out, twice over (the series is asymptotic), plus rounding.
        expect(relative(scaledBesselK(nu, x), series)).toBeLessThan(2 * Math.abs(a3) + 1e-13);
      }
    }
  });

  it('refuses x ≤ 0 and non-finite arguments', () => {
    expect(() => besselK(1, 0)).toThrow(RangeError);
    expect(() => besselK(1, -2)).toThrow(RangeError);
    expect(() => besselK(Number.NaN, 1)).toThrow(RangeError);
    expect(() => synchrotronF(Number.POSITIVE_INFINITY)).toThrow(RangeError);
  });
});

describe('synchrotronF', () => {
  it('equals x ∫ₓ^∞ K_5/3(ξ) dξ integrated directly over besselK, to 1e-11', () => {
    for (const x of [0.5, 1, 2, 4]) {
      // Gauss–Legendre on pieces of ξ − x; e^{−ξ} is below 1e-22 of the start past 50.
      let integral = 0;
      for (const [a, b] of [
        [0, 0.5],
        [0.5, 2],
        [2, 6],
        [6, 15],
        [15, 30],
        [30, 50],
      ]) {
        const rule = gaussLegendre(30, x + a, x + b);
        for (let i = 0; i < rule.x.length; i++) integral += rule.w[i] * besselK(5 / 3, rule.x[i]);
      }
      // Tolerance: 30-point rules on pieces where K varies by at most e^{-15}; both sides ~1e-13.
      expect(relative(synchrotronF(x), x * integral)).toBeLessThan(1e-11);
      expect(relative(besselKTailIntegral(5 / 3, x), integral)).toBeLessThan(1e-11);
    }
  });

  it('peaks at F ≈ 0.918 near x ≈ 0.286 (Jackson 3rd ed. §14.6; X-ray Data Booklet §2.1, from memory)', () => {
    // Golden-section search for the maximum on [0.1, 0.6].
    const g = 0.5 * (Math.sqrt(5) - 1);
    let a = 0.1;
    let b = 0.6;
    for (let k = 0; k < 80; k++) {
      const x1 = b - g * (b - a);
      const x2 = a + g * (b - a);
      if (synchrotronF(x1) > synchrotronF(x2)) b = x2;
      else a = x1;
    }
    const peak = 0.5 * (a + b);
    console.log(`F peaks at x = ${peak.toFixed(5)}, F = ${synchrotronF(peak).toFixed(6)}`);
    // Tolerance: the quoted figures have three digits.
    expect(Math.abs(peak - 0.286)).toBeLessThan(5e-4);
    expect(Math.abs(synchrotronF(peak) - 0.918)).toBeLessThan(5e-4);
  });

  // The synchrotron function as commonly tabulated, three digits, from memory.
  const table: [number, string][] = [
    [0.001, '0.213'],
    [0.01, '0.445'],
    [0.1, '0.818'],
    [1, '0.651'],
    [2, '0.302'],
    [3, '0.129'],
    [5, '0.0212'],
    [10, '0.000192'],
  ];
  for (const [x, text] of table) {
    it(`gives F(${x}) = ${text} as tabulated (synchrotron-function tables, e.g. X-ray Data Booklet §2.1, from memory)`, () => {
      // Tolerance: half a unit in the last quoted digit.
      expect(relative(synchrotronF(x), Number(text))).toBeLessThan(quotedPrecision(text));
    });
  }

  it('approaches (3/2) 2^(2/3) Γ(5/3) x^(1/3) ≈ 2.15 x^(1/3) for small x (A&S Eq. 9.6.9 integrated)', () => {
    const gamma53 = (2 / 3) * 1.3541179394264; // Γ(5/3) = (2/3) Γ(2/3), A&S Eq. 6.1.15
    for (const x of [1e-9, 1e-7]) {
      const leading = 1.5 * 2 ** (2 / 3) * gamma53 * x ** (1 / 3);
      // Tolerance: the next term of ∫ₓ^∞ K_5/3 is a constant, so F's is O(x), i.e. O(x^(2/3))
      // relative; its coefficient is of order one, so 10 x^(2/3).
      expect(relative(synchrotronF(x), leading)).toBeLessThan(10 * x ** (2 / 3));
    }
  });

  it('approaches √(πx/2) e^−x (1 + c1/x + c2/x²), c1 = 55/72, for large x (A&S Eq. 9.7.2 integrated term by term)', () => {
    // K_5/3 ~ √(π/2ξ) e^−ξ Σ a_k ξ^−k (μ = 100/9); ∫ₓ^∞ ξ^(−1/2−k) e^−ξ dξ ~
    // x^(−1/2−k) e^−x (1 − (k+½)/x + (k+½)(k+3/2)/x² − …), collected by powers of 1/x.
    const mu = 100 / 9;
    const a1 = (mu - 1) / 8;
    const a2 = ((mu - 1) * (mu - 9)) / (2 * 64);
    const a3 = ((mu - 1) * (mu - 9) * (mu - 25)) / (6 * 512);
    const c1 = a1 - 0.5;
    const c2 = a2 - 1.5 * a1 + 0.75;
    const c3 = a3 - 2.5 * a2 + 3.75 * a1 - 1.875;
    expect(Math.abs(c1 - 55 / 72)).toBeLessThan(1e-15);
    for (const x of [30, 100, 400]) {
      const series = Math.sqrt((Math.PI * x) / 2) * Math.exp(-x) * (1 + c1 / x + c2 / (x * x));
      // Tolerance: twice the first term left out (asymptotic series), plus rounding.
      expect(relative(synchrotronF(x), series)).toBeLessThan((2 * Math.abs(c3)) / x ** 3 + 1e-12);
    }
  });
});
