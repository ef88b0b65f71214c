import { ELECTRON_MASS, ELEMENTARY_CHARGE, PROTON_MASS } from '../../src/physics/constants';

/** Particles offered by name, with what field-strength conversions need; others are typed in C. */
export const NAMED_CHARGES = [
  { name: 'electron', charge: -ELEMENTARY_CHARGE, mass: ELECTRON_MASS },
  { name: 'proton', charge: ELEMENTARY_CHARGE, mass: PROTON_MASS },
] as const;

/** Mass of a charge offered by name (kg), or null when only the charge is known. */
export function massOf(charge: number): number | null {
  return NAMED_CHARGES.find((particle) => particle.charge === charge)?.mass ?? null;
}
