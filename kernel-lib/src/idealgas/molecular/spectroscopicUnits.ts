/**
 * Conversions between spectroscopic units (cm^-1, amu Angstrom^2) and SI, from the exact SI
 * constants of constants.ts (CODATA 2018).
 *
 * - Second radiation constant c2 = h c / kB, m K; a term value of x cm^-1 corresponds to the
 *   characteristic temperature theta = 100 c2 x (K).
 * - Rotational constant B = h / (8 pi^2 c I) (Herzberg, Molecular Spectra and Molecular Structure,
 *   vol. I, 1950, ch. III), with B in m^-1 here and converted to cm^-1.
 * - Atomic mass unit taken as (1 g/mol)/NA. Since 2019 the molar mass constant is 1 g/mol only to
 *   within about 4e-10 relative, which is far below the accuracy of any constant used here.
 */
import { AVOGADRO, BOLTZMANN, PLANCK, SPEED_OF_LIGHT } from "../../constants.js";

/** Second radiation constant h c / kB, in cm K (about 1.4388 cm K). */
export const SECOND_RADIATION_CONSTANT_CM_K = ((PLANCK * SPEED_OF_LIGHT) / BOLTZMANN) * 100;

/** Atomic mass unit approximated as (1e-3 kg/mol) / NA, kg. */
export const ATOMIC_MASS_UNIT_KG = 1e-3 / AVOGADRO;

/** Characteristic temperature (K) of an energy given as a wavenumber (cm^-1). */
export function wavenumberToKelvin(wavenumberInvCm: number): number {
  return SECOND_RADIATION_CONSTANT_CM_K * wavenumberInvCm;
}

/** Rotational constant B (cm^-1) of a moment of inertia given in amu Angstrom^2. */
export function rotationalConstantFromMoment(momentAmuA2: number): number {
  const momentKgM2 = momentAmuA2 * ATOMIC_MASS_UNIT_KG * 1e-20;
  const bPerMetre = PLANCK / (8 * Math.PI * Math.PI * SPEED_OF_LIGHT * momentKgM2);
  return bPerMetre / 100;
}
