import {
  ELECTRON_REST_ENERGY,
  ELEMENTARY_CHARGE,
  HBAR,
  SPEED_OF_LIGHT,
  VACUUM_PERMITTIVITY,
} from '../physics/constants';

/**
 * Handbook relations for a charge on a circular orbit of radius ρ (m) at Lorentz factor γ,
 * SI units unless a name says otherwise. References: Jackson, Classical Electrodynamics
 * 3rd ed., §14.4 and §14.6; X-ray Data Booklet (LBNL, 2009) §2.1 (K.-J. Kim). The
 * electron forms at the end are computed from the constants, not from the rounded
 * handbook coefficients, so those coefficients can serve as checks.
 */

const c = SPEED_OF_LIGHT;
const GEV = 1e9 * ELEMENTARY_CHARGE;
const KEV = 1e3 * ELEMENTARY_CHARGE;

function betaOf(gamma: number): number {
  return Math.sqrt(1 - 1 / (gamma * gamma));
}

/** Critical angular frequency ω_c = (3/2) γ³ c/ρ, rad/s (Jackson 3rd ed. Eq. 14.85). */
export function criticalAngularFrequency(gamma: number, radius: number): number {
  return 1.5 * gamma * gamma * gamma * (c / radius);
}

/** Critical photon energy ε_c = ħ ω_c, J. */
export function criticalPhotonEnergy(gamma: number, radius: number): number {
  return HBAR * criticalAngularFrequency(gamma, radius);
}

/**
 * Power radiated on the orbit, W: Liénard's formula (Jackson Eq. 14.24) with β ⟂ β̇ and
 * |β̇| = β² c/ρ, P = q² c β⁴ γ⁴ / (6π ε0 ρ²).
 */
export function circularOrbitPower(
  gamma: number,
  radius: number,
  charge = ELEMENTARY_CHARGE,
): number {
  const beta = betaOf(gamma);
  const b2 = beta * beta;
  const g2 = gamma * gamma;
  return (
    (charge * charge * c * b2 * b2 * g2 * g2) /
    (6 * Math.PI * VACUUM_PERMITTIVITY * radius * radius)
  );
}

/**
 * Energy radiated per turn, J: the orbit power times the period 2πρ/(βc),
 *   U0 = q² β³ γ⁴ / (3 ε0 ρ),
 * which is the handbook form U0 = e² γ⁴ / (3 ε0 ρ) for β → 1.
 */
export function energyLossPerTurn(
  gamma: number,
  radius: number,
  charge = ELEMENTARY_CHARGE,
): number {
  const beta = betaOf(gamma);
  const g2 = gamma * gamma;
  return (charge * charge * beta * beta * beta * g2 * g2) / (3 * VACUUM_PERMITTIVITY * radius);
}

/** Radius ρ = p/(|q| B), m, of a charge with momentum p (kg m/s) in a field B (T). */
export function bendingRadius(momentum: number, field: number, charge = ELEMENTARY_CHARGE): number {
  return momentum / (Math.abs(charge) * field);
}

/** Lorentz factor of an electron of total energy E (GeV). */
export function electronGamma(energyGeV: number): number {
  return (energyGeV * GEV) / ELECTRON_REST_ENERGY;
}

/** Bending radius, m, of an electron of total energy E (GeV) in a field B (T). */
export function electronBendingRadius(energyGeV: number, field: number): number {
  const energy = energyGeV * GEV;
  const momentum = Math.sqrt(energy * energy - ELECTRON_REST_ENERGY * ELECTRON_REST_ENERGY) / c;
  return bendingRadius(momentum, field);
}

/** Critical photon energy, keV, of an electron of energy E (GeV) on radius ρ (m). */
export function electronCriticalEnergyKeV(energyGeV: number, radius: number): number {
  return criticalPhotonEnergy(electronGamma(energyGeV), radius) / KEV;
}

/** Critical photon energy, keV, of an electron of energy E (GeV) in a field B (T). */
export function electronCriticalEnergyInFieldKeV(energyGeV: number, field: number): number {
  return electronCriticalEnergyKeV(energyGeV, electronBendingRadius(energyGeV, field));
}

/** Energy loss per turn, keV, of an electron of energy E (GeV) on radius ρ (m). */
export function electronEnergyLossPerTurnKeV(energyGeV: number, radius: number): number {
  return energyLossPerTurn(electronGamma(energyGeV), radius) / KEV;
}
