/**
 * Physical constants, SI. CODATA 2018 recommended values (Tiesinga et al., Rev. Mod. Phys. 93,
 * 025010 (2021)); e, k, N_A and R are exact by the 2019 SI definition.
 */

/** Molar gas constant, J/(K·mol) (exact: N_A·k). */
export const R = 8.314462618;
/** Elementary charge, C (exact). */
export const ELEMENTARY_CHARGE = 1.602176634e-19;
/** Boltzmann constant, J/K (exact). */
export const BOLTZMANN = 1.380649e-23;
/** Avogadro constant, 1/mol (exact). */
export const AVOGADRO = 6.02214076e23;
/** Vacuum electric permittivity, F/m (CODATA 2018). */
export const VACUUM_PERMITTIVITY = 8.8541878128e-12;
/** 0 °C in kelvin (exact by definition). */
export const ZERO_CELSIUS_K = 273.15;
/** Reference temperature θ of tabulated constants, K (25 °C). */
export const THETA_K = 298.15;
/** ln 10. */
export const LN10 = Math.LN10;
