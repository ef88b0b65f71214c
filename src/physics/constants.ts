/**
 * Physical constants in SI units.
 * Exact values are fixed by the 2019 SI redefinition; measured ones are CODATA 2018
 * (Tiesinga et al., Rev. Mod. Phys. 93, 025010, 2021).
 */

/** Speed of light in vacuum, m/s (exact). */
export const SPEED_OF_LIGHT = 299_792_458;
/** Elementary charge, C (exact). */
export const ELEMENTARY_CHARGE = 1.602176634e-19;
/** Planck constant, J s (exact). */
export const PLANCK_CONSTANT = 6.62607015e-34;
/** Vacuum magnetic permeability μ0, N/A² (CODATA 2018). */
export const VACUUM_PERMEABILITY = 1.25663706212e-6;
/** Vacuum electric permittivity ε0 = 1/(μ0 c²), F/m (CODATA 2018). */
export const VACUUM_PERMITTIVITY = 8.8541878128e-12;
/** Electron mass, kg (CODATA 2018). */
export const ELECTRON_MASS = 9.1093837015e-31;
/** Proton mass, kg (CODATA 2018). */
export const PROTON_MASS = 1.67262192369e-27;
/** Fine-structure constant (CODATA 2018). */
export const FINE_STRUCTURE = 7.2973525693e-3;
/** Classical electron radius, m (CODATA 2018). */
export const CLASSICAL_ELECTRON_RADIUS = 2.8179403262e-15;

/** 1/(4π ε0), the Coulomb constant, N m²/C². */
export const COULOMB_CONSTANT = 1 / (4 * Math.PI * VACUUM_PERMITTIVITY);
/** Electron-volt, J (exact, equal to the elementary charge in volts). */
export const ELECTRON_VOLT = ELEMENTARY_CHARGE;
/** Reduced Planck constant ħ, J s (exact). */
export const HBAR = PLANCK_CONSTANT / (2 * Math.PI);
/** Electron rest energy m_e c², J. */
export const ELECTRON_REST_ENERGY = ELECTRON_MASS * SPEED_OF_LIGHT * SPEED_OF_LIGHT;
/** Proton rest energy m_p c², J. */
export const PROTON_REST_ENERGY = PROTON_MASS * SPEED_OF_LIGHT * SPEED_OF_LIGHT;
