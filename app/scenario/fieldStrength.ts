import { SPEED_OF_LIGHT as c } from '../../src/physics/constants';

const gammaOf = (beta: number) => 1 / Math.sqrt((1 - beta) * (1 + beta));

/** Bending field (T) that holds a charge q of mass m on radius ρ at βc: B = γmβc / (|q|ρ). */
export function bendingField(radius: number, beta: number, mass: number, charge: number): number {
  return (gammaOf(beta) * mass * beta * c) / (Math.abs(charge) * radius);
}

/** Radius (m) of the orbit in field B (T) at βc: ρ = γmβc / (|q|B). */
export function orbitRadius(field: number, beta: number, mass: number, charge: number): number {
  return (gammaOf(beta) * mass * beta * c) / (Math.abs(charge) * field);
}

/** Peak undulator field (T) for strength K and period λu: B0 = 2π m c K / (|q| λu). */
export function undulatorField(
  strength: number,
  period: number,
  mass: number,
  charge: number,
): number {
  return (2 * Math.PI * mass * c * strength) / (Math.abs(charge) * period);
}

/** Undulator strength K = |q| B0 λu / (2π m c) for peak field B0 (T). */
export function undulatorStrength(
  field: number,
  period: number,
  mass: number,
  charge: number,
): number {
  return (Math.abs(charge) * field * period) / (2 * Math.PI * mass * c);
}
