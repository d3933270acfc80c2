/**
 * Physical constants, SI. Source: CODATA 2018 recommended values (exact since the 2019 SI
 * redefinition for R, kB, NA, h). Tests check them against an independent registry package.
 */
/** Molar gas constant, J/(mol K). CODATA 2018 (exact: NA * kB). */
export const R = 8.314462618;
/** Boltzmann constant, J/K (exact). */
export const BOLTZMANN = 1.380649e-23;
/** Avogadro constant, 1/mol (exact). */
export const AVOGADRO = 6.02214076e23;
/** Planck constant, J s (exact). */
export const PLANCK = 6.62607015e-34;
/** Speed of light in vacuum, m/s (exact). */
export const SPEED_OF_LIGHT = 299792458;
/** Standard atmosphere, Pa (exact by definition). */
export const STANDARD_ATMOSPHERE_PA = 101325;
