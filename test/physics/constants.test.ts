import {
  classicalElectronRadius,
  coulomb,
  electricConstant,
  electronMass,
  elementaryCharge,
  fineStructure,
  magneticConstant,
  planckConstant,
  protonMass,
  reducedPlanckConstant,
  speedOfLight,
  type Unit,
  unit,
} from 'mathjs';
import { describe, expect, it } from 'vitest';
import {
  CLASSICAL_ELECTRON_RADIUS,
  COULOMB_CONSTANT,
  ELECTRON_MASS,
  ELECTRON_REST_ENERGY,
  ELEMENTARY_CHARGE,
  FINE_STRUCTURE,
  HBAR,
  PLANCK_CONSTANT,
  PROTON_MASS,
  SPEED_OF_LIGHT,
  VACUUM_PERMEABILITY,
  VACUUM_PERMITTIVITY,
} from '../../src/physics/constants';

/**
 * Reference: mathjs's physical constants (mathjs 15, docs "Units: physical constants"),
 * which quote CODATA 2018 (Tiesinga et al., Rev. Mod. Phys. 93, 025010, 2021), the same
 * adjustment src/physics/constants.ts cites.
 */
function si(u: Unit, siUnit: string): number {
  // `.value` is stored in SI base units; check that against an explicit conversion.
  expect(u.equalBase(unit(siUnit))).toBe(true);
  expect(u.value).toBe(u.toNumber(siUnit));
  return u.value;
}

describe('physical constants', () => {
  const table: [string, number, Unit, string][] = [
    ['speed of light c', SPEED_OF_LIGHT, speedOfLight, 'm/s'],
    ['magnetic constant μ0', VACUUM_PERMEABILITY, magneticConstant, 'N/A^2'],
    ['electric constant ε0', VACUUM_PERMITTIVITY, electricConstant, 'F/m'],
    ['elementary charge e', ELEMENTARY_CHARGE, elementaryCharge, 'C'],
    ['electron mass m_e', ELECTRON_MASS, electronMass, 'kg'],
    ['proton mass m_p', PROTON_MASS, protonMass, 'kg'],
    ['Planck constant h', PLANCK_CONSTANT, planckConstant, 'J s'],
    ['classical electron radius r_e', CLASSICAL_ELECTRON_RADIUS, classicalElectronRadius, 'm'],
  ];
  for (const [name, ours, reference, siUnit] of table) {
    it(`have the CODATA 2018 value of the ${name} (mathjs, in ${siUnit})`, () => {
      // Both quote the same decimal digits, so they must be the same double.
      expect(ours).toBe(si(reference, siUnit));
    });
  }

  it('have the CODATA 2018 fine-structure constant (mathjs, dimensionless)', () => {
    expect(FINE_STRUCTURE).toBe(fineStructure);
  });

  it('satisfy ε0 μ0 c² = 1 (definition of ε0 since 2019: CODATA 2018, Tiesinga et al. §II)', () => {
    const c = SPEED_OF_LIGHT;
    const product = VACUUM_PERMITTIVITY * VACUUM_PERMEABILITY * c * c;
    console.log(`ε0 μ0 c² - 1 = ${(product - 1).toExponential(3)}`);
    // Tolerance: μ0 and ε0 are each quoted to 11 significant digits, so their product can
    // miss 1/c² by up to ~1e-11 relative; 1e-10 leaves room and is far tighter than 1e-9.
    expect(Math.abs(product - 1)).toBeLessThan(1e-10);
  });

  it('satisfy α = e²/(4π ε0 ħ c) (its definition in CODATA 2018, Tiesinga et al., from memory)', () => {
    const alpha =
      (ELEMENTARY_CHARGE * ELEMENTARY_CHARGE) /
      (4 * Math.PI * VACUUM_PERMITTIVITY * HBAR * SPEED_OF_LIGHT);
    console.log(`α relation: relative miss ${(alpha / FINE_STRUCTURE - 1).toExponential(3)}`);
    // Tolerance: α and ε0 carry 1.5e-10 relative standard uncertainty (CODATA 2018) and are
    // rounded to 11 digits; e, h and c are exact. 1e-10 is a fraction of the quoted spread.
    expect(Math.abs(alpha / FINE_STRUCTURE - 1)).toBeLessThan(1e-10);
  });

  it('satisfy r_e = e²/(4π ε0 m_e c²) (CODATA 2018 definition r_e = α ħ/(m_e c), from memory)', () => {
    const re = COULOMB_CONSTANT * ((ELEMENTARY_CHARGE * ELEMENTARY_CHARGE) / ELECTRON_REST_ENERGY);
    console.log(
      `r_e relation: relative miss ${(re / CLASSICAL_ELECTRON_RADIUS - 1).toExponential(3)}`,
    );
    // Tolerance: r_e, ε0 and m_e each carry ~3e-10 relative uncertainty (CODATA 2018) and
    // are rounded to 11 digits; 1e-10 is below that spread but above the rounding seen here.
    expect(Math.abs(re / CLASSICAL_ELECTRON_RADIUS - 1)).toBeLessThan(1e-10);
  });

  it('derive ħ = h/(2π) and k = 1/(4π ε0) as mathjs does (mathjs reducedPlanckConstant, coulomb)', () => {
    // Tolerance: both sides divide the same doubles by 2π or 4π, a few ulps at most.
    expect(Math.abs(HBAR / si(reducedPlanckConstant, 'J s') - 1)).toBeLessThan(1e-15);
    expect(Math.abs(COULOMB_CONSTANT / si(coulomb, 'N m^2 / C^2') - 1)).toBeLessThan(1e-15);
  });
});
