import { describe, expect, it } from 'vitest';
import { lienardPower } from '../../src/analysis/radiatedPower';
import {
  bendingRadius,
  circularOrbitPower,
  criticalAngularFrequency,
  criticalPhotonEnergy,
  electronBendingRadius,
  electronCriticalEnergyInFieldKeV,
  electronCriticalEnergyKeV,
  electronEnergyLossPerTurnKeV,
  electronGamma,
  energyLossPerTurn,
} from '../../src/analysis/synchrotron';
import { sampleMotion } from '../../src/path/analyticMotion';
import { pathState } from '../../src/path/pathState';
import { circularOrbit } from '../../src/path/presets';
import { SampledPath } from '../../src/path/sampledPath';
import {
  ELECTRON_MASS,
  ELEMENTARY_CHARGE,
  HBAR,
  PROTON_MASS,
  SPEED_OF_LIGHT,
} from '../../src/physics/constants';
import { mulberry32, uniform } from '../support/random';

const c = SPEED_OF_LIGHT;
const e = ELEMENTARY_CHARGE;

const energies = [0.5, 1.5, 1.9, 3, 6, 8]; // GeV: the range of electron storage rings
const fields = [0.3, 0.8, 1.27, 1.5, 5]; // T
const radii = [1, 4.4, 10, 23, 4000]; // m

describe('the electron engineering forms', () => {
  it('give ε_c[keV] = 0.665 E²[GeV] B[T] (X-ray Data Booklet §2.1, handbook, from memory)', () => {
    let worst = 0;
    for (const E of energies) {
      for (const B of fields) {
        const ours = electronCriticalEnergyInFieldKeV(E, B);
        worst = Math.max(worst, Math.abs(ours / (0.665 * E * E * B) - 1));
      }
    }
    console.log(`ε_c vs 0.665 E²B: worst ${worst.toExponential(2)}`);
    // Tolerance: 0.665 is rounded to three digits (±7.5e-4 relative); 1e-3.
    expect(worst).toBeLessThan(1e-3);
  });

  it('give ε_c[keV] = 2.218 E³[GeV]/ρ[m] (X-ray Data Booklet §2.1, handbook, from memory)', () => {
    let worst = 0;
    for (const E of energies) {
      for (const rho of radii) {
        worst = Math.max(
          worst,
          Math.abs(electronCriticalEnergyKeV(E, rho) / ((2.218 * E ** 3) / rho) - 1),
        );
      }
    }
    console.log(`ε_c vs 2.218 E³/ρ: worst ${worst.toExponential(2)}`);
    // Tolerance: 2.218 is rounded to four digits (±2.3e-4 relative); 3e-4.
    expect(worst).toBeLessThan(3e-4);
  });

  it('give ρ[m] = 3.3356 E[GeV]/B[T] (X-ray Data Booklet §2.1, handbook, from memory)', () => {
    let worst = 0;
    for (const E of energies) {
      for (const B of fields) {
        worst = Math.max(worst, Math.abs(electronBendingRadius(E, B) / ((3.3356 * E) / B) - 1));
      }
    }
    console.log(`ρ vs 3.3356 E/B: worst ${worst.toExponential(2)}`);
    // Tolerance: five digits (±1.5e-5) and β = 1 - 5e-7 at 0.5 GeV; 2e-5.
    expect(worst).toBeLessThan(2e-5);
  });

  it('give U0[keV] = 88.5 E⁴[GeV]/ρ[m] (Sands, The Physics of Electron Storage Rings, SLAC-121, C_γ = 8.85e-5 m/GeV³, handbook, from memory)', () => {
    let worst = 0;
    for (const E of energies) {
      for (const rho of radii) {
        worst = Math.max(
          worst,
          Math.abs(electronEnergyLossPerTurnKeV(E, rho) / ((88.5 * E ** 4) / rho) - 1),
        );
      }
    }
    console.log(`U0 vs 88.5 E⁴/ρ: worst ${worst.toExponential(2)}`);
    // Tolerance: 88.5 is rounded to three digits (±5.6e-4 relative); 1e-3.
    expect(worst).toBeLessThan(1e-3);
  });
});

describe('the circular-orbit relations', () => {
  it('give ε_c = (3/2) ħ c γ³/ρ and ω_c = (3/2) γ³ c/ρ (Jackson 3rd ed. Eq. 14.85, from memory)', () => {
    // An independent route: γ from E = γ m c² for a proton at 7 TeV in a 2804 m bend
    // (LHC-like figures, common practice), ε_c = 3ħcγ³/(2ρ) by hand.
    const gamma = (7e12 * e) / (PROTON_MASS * c * c);
    const rho = 2804;
    const byHand = (3 * HBAR * c * gamma ** 3) / (2 * rho);
    // Tolerance: a handful of roundings.
    expect(Math.abs(criticalPhotonEnergy(gamma, rho) / byHand - 1)).toBeLessThan(1e-14);
    expect(Math.abs(criticalAngularFrequency(gamma, rho) * HBAR - byHand) / byHand).toBeLessThan(
      1e-14,
    );
    // About 44 eV (common practice: the LHC's synchrotron light is in the UV), from memory.
    expect(byHand / e).toBeGreaterThan(40);
    expect(byHand / e).toBeLessThan(48);
  });

  it('give the electron γ = E/(m_e c²) and ρ = p/(eB) (Jackson 3rd ed. §12.2; m_e c² = 0.51099895 MeV, CODATA 2018, from memory)', () => {
    // Tolerance: the quoted m_e c² has 8 digits.
    expect(Math.abs(electronGamma(0.51099895e-3) - 1)).toBeLessThan(1e-8);
    // p = γ m β c; for γ = 2, β = √3/2.
    const gamma = 2;
    const p = gamma * ELECTRON_MASS * c * (Math.sqrt(3) / 2);
    expect(Math.abs(bendingRadius(p, 0.01) / (p / (e * 0.01)) - 1)).toBeLessThan(1e-15);
    const E = (gamma * ELECTRON_MASS * c * c) / (1e9 * e); // GeV
    // Tolerance: rounding of E² - (mc²)² at γ = 2 (no cancellation to speak of).
    expect(Math.abs(electronBendingRadius(E, 0.01) / (p / (e * 0.01)) - 1)).toBeLessThan(1e-13);
  });

  for (const gamma of [10, 1000]) {
    it(`give U0 = P · 2πρ/(βc) with P the Liénard power of a sampled orbit at γ = ${gamma} (Jackson 3rd ed. Eq. 14.24)`, () => {
      const beta = Math.sqrt(1 - 1 / (gamma * gamma));
      const rho = 10;
      const period = (2 * Math.PI * rho) / (beta * c);
      // 500 samples per turn, exact derivatives at the knots.
      const path = new SampledPath(sampleMotion(circularOrbit(rho, beta), 0, period, 501));
      const random = mulberry32(gamma);
      const s = pathState();
      const exact = energyLossPerTurn(gamma, rho);
      let worst = 0;
      for (let k = 0; k < 50; k++) {
        path.stateAt(uniform(random, 0, period), s);
        const fromPath = lienardPower(e, s) * period;
        worst = Math.max(worst, Math.abs(fromPath / exact - 1));
      }
      const fromPower = circularOrbitPower(gamma, rho) * period;
      console.log(
        `γ = ${gamma}: U0 from the sampled path's Liénard power off by ${worst.toExponential(2)}`,
      );
      // Tolerance: γ⁶ [β̇² - (β×β̇)²] = γ⁴ β̇² holds only on the exact orbit, and γ⁴ turns
      // a relative speed error δ into 4γ²δ. Between knots the quintic Hermite speed is off
      // by δ ≈ 6e-5 (ωh)⁵ (remainder term h⁶ f⁽⁶⁾ s³(1-s)³/720, differentiated); allow
      // 1e-3 (ωh)⁵ for the next orders and the acceleration's share: 4γ² · 1e-3 (ωh)⁵.
      const omegaH = (2 * Math.PI) / 500;
      expect(worst).toBeLessThan(4 * gamma * gamma * 1e-3 * omegaH ** 5 + 1e-13);
      expect(Math.abs(fromPower / exact - 1)).toBeLessThan(1e-14);
    });
  }
});
